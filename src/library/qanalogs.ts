// q-analogues (LIBRARY.md §2): [n]_q, [n]_q! and the Gaussian binomial coefficients. Computed as
// integer coefficient lists and then evaluated at q, so q may be an indeterminate, a number or
// any polynomial (qint(3, 2) = 7).

import { fail } from '../base/errors.js';
import type { PolyLike } from '../algebra/polynomial.js';
import { evaluateCoefficients } from '../algebra/polynomialOps.js';
import { iadd, isub, type Int } from '../numbers/integer.js';
import { smallIntArg } from './integerArgs.js';
import { defineFunction, type ParamDecl } from './registry.js';

const topic = 'polynomials';
const Q_MAX = 2000;
/**
 * Bounds that keep every call within about a second (found by fuzzing: qfactorial(1000, q),
 * qbinomial(400, 200, q) and qint(4000000, 2) each ran for minutes). [n]_q! has degree
 * n(n-1)/2 and is built in about n^3/6 steps; [n choose k]_q has degree k(n-k), built in about
 * k times that; [n]_q has n terms, and evaluating it at a number of size q takes about n^2 log q.
 */
const QFACTORIAL_MAX = 300;
const QBINOMIAL_DEGREE_MAX = 40_000;
const QINT_MAX = 100_000;

/** Coefficients of [n]_q = 1 + q + ... + q^{n-1}. */
export function qintCoefficients(n: number): Int[] {
  return new Array(n).fill(1);
}

/** Coefficients of [n]_q! = [1]_q [2]_q ... [n]_q (the Mahonian distribution of inversions). */
export function qfactorialCoefficients(n: number): Int[] {
  let c: Int[] = [1];
  for (let i = 2; i <= n; i++) {
    // Multiplying by 1 + q + ... + q^{i-1} is a sliding window sum.
    const out: Int[] = new Array(c.length + i - 1).fill(0);
    let window: Int = 0;
    for (let k = 0; k < out.length; k++) {
      if (k < c.length) window = iadd(window, c[k]);
      if (k - i >= 0 && k - i < c.length) window = isub(window, c[k - i]);
      out[k] = window;
    }
    c = out;
  }
  return c;
}

/**
 * Coefficients of the Gaussian binomial [n choose k]_q, by the product formula
 * prod_{i=1..k} (1 - q^{n-k+i}) / (1 - q^i): multiplying by 1 - q^a is a shifted difference and
 * dividing exactly by 1 - q^i a running sum with stride i, so after step i the degree is
 * i(n-k) (Andrews, The Theory of Partitions, Thm 3.1 and (3.3.1)).
 */
export function qbinomialCoefficients(n: number, k: number): Int[] {
  if (k < 0 || k > n) return [];
  k = Math.min(k, n - k);
  let c: Int[] = [1];
  for (let i = 1; i <= k; i++) {
    const a = n - k + i;
    // times (1 - q^a)
    const m: Int[] = new Array(c.length + a).fill(0);
    for (let j = 0; j < c.length; j++) {
      m[j] = iadd(m[j], c[j]);
      m[j + a] = isub(m[j + a], c[j]);
    }
    // divided by (1 - q^i): d[j] = m[j] + d[j - i]; the quotient has degree (c.length - 1) + a - i
    const d: Int[] = new Array(c.length + a - i).fill(0);
    for (let j = 0; j < d.length; j++) d[j] = j >= i ? iadd(m[j], d[j - i]) : m[j];
    c = d;
  }
  return c;
}

const qParam: ParamDecl = { name: 'q', type: 'scalarOrPolynomial' };

defineFunction({
  name: 'qint',
  topic,
  params: [{ name: 'n', type: 'integer' }, qParam],
  returns: 'scalarOrPolynomial',
  description: 'the q-integer [n]_q = 1 + q + ... + q^(n-1), for n >= 0 ([0]_q = 0)',
  example: 'qint(4, q)',
  exampleValue: 'q^3 + q^2 + q + 1',
  source: 'G. E. Andrews, The Theory of Partitions (1976), ch. 3',
  impl: (n, q) => evaluateCoefficients(qintCoefficients(smallIntArg('qint(n, q)', 'n', n, 0, QINT_MAX)), q as PolyLike),
});

defineFunction({
  name: 'qfactorial',
  topic,
  params: [{ name: 'n', type: 'integer' }, qParam],
  returns: 'scalarOrPolynomial',
  description: 'the q-factorial [n]_q! = [1]_q [2]_q ... [n]_q, the generating function of inversions on S_n',
  example: 'qfactorial(3, q)',
  exampleValue: 'q^3 + 2*q^2 + 2*q + 1',
  source: 'OEIS A008302 (Mahonian numbers); R. P. Stanley, Enumerative Combinatorics I, 2nd ed., Cor. 1.3.13',
  impl: (n, q) => evaluateCoefficients(qfactorialCoefficients(smallIntArg('qfactorial(n, q)', 'n', n, 0, QFACTORIAL_MAX)), q as PolyLike),
});

defineFunction({
  name: 'qbinomial',
  topic,
  params: [{ name: 'n', type: 'integer' }, { name: 'k', type: 'integer' }, qParam],
  returns: 'scalarOrPolynomial',
  description:
    'the Gaussian binomial coefficient [n choose k]_q = [n]_q! / ([k]_q! [n-k]_q!), 0 unless 0 <= k <= n; defined for n >= 0 (a negative n is an error, unlike binomial)',
  example: 'qbinomial(4, 2, q)',
  exampleValue: 'q^4 + q^3 + 2*q^2 + q + 1',
  source: 'OEIS A008967 (triangle of Gaussian binomial coefficients); G. E. Andrews, The Theory of Partitions, Thm 3.1',
  impl: (n, k, q) => {
    const nn = smallIntArg('qbinomial(n, k, q)', 'n', n, 0, Q_MAX);
    const kk = k as Int;
    if (typeof kk === 'bigint' || kk < 0 || kk > nn) return 0;
    if (nn > Q_MAX) fail(`qbinomial(n, k, q) is limited to n <= ${Q_MAX}`);
    if (kk * (nn - kk) > QBINOMIAL_DEGREE_MAX)
      fail(`qbinomial(n, k, q) is limited to degree k(n - k) <= ${QBINOMIAL_DEGREE_MAX}, got ${kk}(${nn} - ${kk}) = ${kk * (nn - kk)}`);
    return evaluateCoefficients(qbinomialCoefficients(nn, kk), q as PolyLike);
  },
});
