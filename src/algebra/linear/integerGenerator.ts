// A chain's balance equations with integer coefficients, for p-adic lifting in doubles. Row s of
// the chain is scaled by L_s, the least common denominator of its weights: w'(s, t) = w(s, t) L_s
// and T'_s = total(s) L_s are integers with P(s, t) = w'(s, t) / T'_s. The matrix
//   G[t][s] = w'(s, t) - T'_s [s = t]
// is P^T - I with column s multiplied by T'_s, so G y = 0 exactly when x(s) = T'_s y(s) is
// stationary (x P = x). Every column of G sums to 0.

import { denOf, numOf, Rat } from '../../numbers/rational.js';
import { bigGcd } from '../../numbers/integer.js';
import type { SparseChain } from './sparseChain.js';

/**
 * The largest row sum of |G[t][s]| allowed: then sum_s |G[t][s]| z(s) with residues z(s) < 2^23
 * stays below 2^52, exact in a double (see padicLifting.ts).
 */
export const ROW_LIMIT = 2 ** 29;

export interface IntegerGenerator {
  /** w'(s, t), indexed like the chain's entries. */
  readonly weight: Float64Array;
  /** T'_s. */
  readonly total: Float64Array;
}

/**
 * The integer form of the chain's balance equations, or null when some coefficient or row sum of
 * |G| is above ROW_LIMIT (the caller then solves modulo several primes instead).
 */
export function integerGenerator(c: SparseChain): IntegerGenerator | null {
  const n = c.size;
  const weight = new Float64Array(c.target.length);
  const total = new Float64Array(n);
  for (let s = 0; s < n; s++) {
    const start = c.rowStart[s],
      end = c.rowStart[s + 1];
    let plain = typeof c.total[s] === 'number';
    for (let k = start; k < end && plain; k++) plain = typeof c.weight[k] === 'number';
    if (plain) {
      // Integer weights below 2^53 (numbers are safe integers by the Int convention).
      for (let k = start; k < end; k++) weight[k] = c.weight[k] as number;
      total[s] = c.total[s] as number;
    } else {
      let L = 1n;
      for (let k = start; k < end; k++) {
        const w = c.weight[k];
        if (w instanceof Rat) L = (L / bigGcd(L, w.den)) * w.den;
      }
      const T = (numOf(c.total[s]) * L) / denOf(c.total[s]);
      if (T > BigInt(ROW_LIMIT)) return null;
      total[s] = Number(T);
      for (let k = start; k < end; k++) {
        const w = c.weight[k];
        weight[k] = Number((numOf(w) * L) / denOf(w)); // <= T: weights are positive
      }
    }
    if (total[s] > ROW_LIMIT) return null;
  }
  // Row sums of |G|: the incoming weights of t plus T'_t.
  const rowAbs = Float64Array.from(total);
  for (let s = 0; s < n; s++) {
    for (let k = c.rowStart[s]; k < c.rowStart[s + 1]; k++) rowAbs[c.target[k]] += weight[k];
  }
  for (let t = 0; t < n; t++) if (rowAbs[t] > ROW_LIMIT) return null;
  return { weight, total };
}
