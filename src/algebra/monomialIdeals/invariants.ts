// Invariants of S/M for a monomial ideal M, read off the numerator of its Hilbert series:
// with H(S/M; t) = N(t) / (1 - t)^n and N(t) = (1 - t)^c Q(t), Q(1) != 0, the codimension is c,
// the Krull dimension n - c and the degree Q(1) (e.g. D. Eisenbud, Commutative Algebra with a
// View Toward Algebraic Geometry, §12.1 and Exercise 19.xx; R. Stanley, Combinatorics and
// Commutative Algebra, I.2). The unit ideal has dimension -1, codimension n + 1 (the convention
// of an empty variety) and degree 0. Hilbert function values are
// HF(d) = sum_i N_i * C(d - i + n - 1, n - 1).

import { fail } from '../../base/errors.js';
import { binomialInt, iadd, imul, type Int } from '../../numbers/integer.js';
import { hilbertNumeratorCoefficients, type HilbertOptions } from './hilbertSeries.js';
import type { MonomialIdeal } from './monomialIdeal.js';

export interface DimensionData {
  /** Krull dimension of S/M (-1 for the unit ideal). */
  dim: number;
  codim: number;
  /** Q(1): the degree (0 for the unit ideal). */
  degree: Int;
  /** The numerator N(t), coefficients from degree 0. */
  numerator: Int[];
}

/** Dimension, codimension and degree from a numerator N(t) over n variables. */
export function dimensionFromNumerator(numerator: readonly Int[], n: number): DimensionData {
  let q = numerator.slice();
  while (q.length && q[q.length - 1] === 0) q.pop();
  if (q.length === 0) return { dim: -1, codim: n + 1, degree: 0, numerator: [] };
  let c = 0;
  for (;;) {
    let at1: Int = 0;
    for (const x of q) at1 = iadd(at1, x);
    if (at1 !== 0) return { dim: n - c, codim: c, degree: at1, numerator: numerator.slice() };
    // Divide by (1 - t): the quotient's coefficients are the prefix sums.
    const next: Int[] = [];
    let s: Int = 0;
    for (let i = 0; i + 1 < q.length; i++) {
      s = iadd(s, q[i]);
      next.push(s);
    }
    q = next;
    c++;
    if (c > n) fail('internal: a Hilbert numerator divisible by (1 - t) more than n times');
  }
}

export function monomialDimensionData(M: MonomialIdeal, opts: HilbertOptions = {}): DimensionData {
  return dimensionFromNumerator(hilbertNumeratorCoefficients(M, opts), M.nv);
}

/** HF(d) = dim_k (S/M)_d from the numerator, for n variables. */
export function hilbertFunctionValue(numerator: readonly Int[], n: number, d: number): Int {
  if (d < 0) return 0;
  let s: Int = 0;
  if (n === 0) return numerator[d] ?? 0;
  for (let i = 0; i < numerator.length && i <= d; i++) {
    if (numerator[i] === 0) continue;
    s = iadd(s, imul(numerator[i], binomialInt(d - i + n - 1, n - 1)));
  }
  return s;
}
