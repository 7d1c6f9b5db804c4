// The transition probabilities P(s, t) = w(s, t) / total(s) of a chain as residues modulo a prime.

import { Rat, type Scalar } from '../../numbers/rational.js';
import { intMod, invMod, mulMod } from './modular.js';
import type { SparseChain } from './sparseChain.js';

/** The residue of an exact number, or -1 when its denominator vanishes modulo p. */
export function scalarMod(a: Scalar, p: number): number {
  if (!(a instanceof Rat)) return intMod(a, p);
  const d = intMod(a.den, p);
  if (d === 0) return -1;
  return mulMod(intMod(a.num, p), invMod(d, p), p);
}

/**
 * One residue per entry of the chain (same indexing as c.target), or null when p divides a
 * denominator or a row total (the prime is then unusable for this chain).
 */
export function transitionResidues(c: SparseChain, p: number): Float64Array | null {
  const out = new Float64Array(c.target.length);
  for (let s = 0; s < c.size; s++) {
    const t = scalarMod(c.total[s], p);
    if (t <= 0) return null;
    const inv = invMod(t, p);
    for (let k = c.rowStart[s]; k < c.rowStart[s + 1]; k++) {
      const w = scalarMod(c.weight[k], p);
      if (w < 0) return null;
      out[k] = mulMod(w, inv, p);
    }
  }
  return out;
}
