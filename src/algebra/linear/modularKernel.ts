// The stationary vector of an irreducible chain modulo one prime p: the kernel of A = P^T - I
// (factored by modularLU.ts), normalised to sum 1. Used by the multi-prime path of stationary.ts,
// for chains whose weights are too large for p-adic lifting in doubles.

import { invMod, mulMod } from './modular.js';
import { factorModP, type PivotPlan } from './modularLU.js';
import { transitionResidues } from './residues.js';
import type { SparseChain } from './sparseChain.js';

export type { PivotPlan } from './modularLU.js';

export interface KernelOptions {
  plan?: PivotPlan;
  /** Called now and then with the fraction of this prime's elimination that is done. */
  onProgress?: (fraction: number) => void;
}

export interface KernelResult {
  /** x[s] mod p, summing to 1 mod p. */
  x: Float64Array;
  plan: PivotPlan;
}

/**
 * The stationary vector of the irreducible chain c modulo p, or null when p is unlucky for it (a
 * denominator or a pivot vanishes mod p, or the normalising sum does).
 */
export function stationaryModP(c: SparseChain, p: number, options: KernelOptions = {}): KernelResult | null {
  const m = c.size;
  const res = transitionResidues(c, p);
  if (!res) return null;
  const lu = factorModP(c, res, new Float64Array(m).fill(p - 1), p, options);
  if (!lu) return null;
  const x = lu.kernel();
  let sum = 0;
  for (let s = 0; s < m; s++) {
    sum += x[s];
    if (sum >= p) sum -= p;
  }
  if (sum === 0) return null;
  const norm = invMod(sum, p);
  for (let s = 0; s < m; s++) x[s] = mulMod(x[s], norm, p);
  return { x, plan: lu.plan };
}
