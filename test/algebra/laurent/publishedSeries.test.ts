// Generating-function identities against published sources, and rational-function arithmetic
// against evaluation at random rational points.

import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { evaluate } from '../../../src/language/expr/index.js';
import { valueEquals, valueToText } from '../../../src/values/operations.js';
import { fromTerms, pmul, psub, ppow, variable, type PolyLike } from '../../../src/algebra/polynomial.js';
import { substitute } from '../../../src/algebra/polynomialOps.js';
import { makeRational, partsOf, rfAdd, rfDiv, rfMul, rfSub, type RationalLike } from '../../../src/algebra/rationalFunction.js';
import { seriesCoefficient } from '../../../src/algebra/seriesCoefficients.js';
import { varId } from '../../../src/algebra/variables.js';
import { makeRat, type Scalar } from '../../../src/numbers/rational.js';
import { sadd, sdiv, sisZero, smul, ssub } from '../../../src/numbers/scalar.js';
import '../../../src/library/index.js';

const run = (s: string) => evaluate(s, [], ['q', 't']);
const q = variable('q'),
  Q = varId('q'),
  T = varId('t');

describe('published identities', () => {
  it('q-Vandermonde with q^-1 (G. E. Andrews, The Theory of Partitions, ch. 3, eq. (3.3.10), at q -> q^-1)', () => {
    // [m+n, k]_{1/q} = sum_j [m, k-j]_{1/q} [n, j]_{1/q} q^{-j(m-k+j)}
    for (let m = 0; m <= 4; m++)
      for (let n = 0; n <= 4; n++)
        for (let k = 0; k <= m + n; k++) {
          const rhs = `sum(qbinomial(${m}, ${k} - j, q^-1)*qbinomial(${n}, j, q^-1)*q^(-j*(${m} - ${k} + j)) for j in 0..${k})`;
          expect(run(`qbinomial(${m + n}, ${k}, q^-1) == ${rhs}`)).toBe(true);
          // and [N, k]_{1/q} = q^{-k(N-k)} [N, k]_q (Andrews, ch. 3; the degree of [N, k]_q is k(N-k))
          expect(run(`qbinomial(${m + n}, ${k}, q^-1) == q^(-${k}*(${m + n} - ${k}))*qbinomial(${m + n}, ${k}, q)`)).toBe(true);
        }
  });
  it('1/((1-q)...(1-q^k)) counts partitions into at most k parts (OEIS A008284, A000041)', () => {
    // A008284: T(n, k) partitions of n into exactly k parts; at most k parts of n is T(n + k, k).
    const A008284 = [
      [1],
      [1, 1],
      [1, 1, 1],
      [1, 2, 1, 1],
      [1, 2, 2, 1, 1],
      [1, 3, 3, 2, 1, 1],
      [1, 3, 4, 3, 2, 1, 1],
      [1, 4, 5, 5, 3, 2, 1, 1],
      [1, 4, 7, 6, 5, 3, 2, 1, 1],
      [1, 5, 8, 9, 7, 5, 3, 2, 1, 1],
    ];
    for (let k = 1; k <= 4; k++) {
      const f = run(`1/${Array.from({ length: k }, (_, i) => `(1 - q^${i + 1})`).join('/')}`) as RationalLike;
      for (let n = 0; n + k <= 10; n++) expect(seriesCoefficient(f, Q, n)).toBe(A008284[n + k - 1][k - 1]);
    }
    // A000041, n = 0..20, through 1/prod_{i<=20} (1 - q^i).
    const A000041 = [1, 1, 2, 3, 5, 7, 11, 15, 22, 30, 42, 56, 77, 101, 135, 176, 231, 297, 385, 490, 627];
    let den: PolyLike = 1;
    for (let i = 1; i <= 20; i++) den = pmul(den, psub(1, ppow(q, i)));
    const f = makeRational(1, den);
    expect(A000041.map((_, n) => seriesCoefficient(f, Q, n))).toEqual(A000041);
  });
  it('1/(1 - q - q^2) has the Fibonacci numbers as coefficients (OEIS A000045: F(n+1))', () => {
    const A000045 = [0, 1, 1, 2, 3, 5, 8, 13, 21, 34, 55, 89, 144, 233, 377, 610];
    const f = run('1/(1 - q - q^2)') as RationalLike;
    for (let n = 0; n + 1 < A000045.length; n++) expect(seriesCoefficient(f, Q, n)).toBe(A000045[n + 1]);
    expect(seriesCoefficient(f, Q, 99)).toBe(354224848179261915075n); // F(100), OEIS A000045
    expect(valueToText(run('coefficient(1/(1 - q - q^2), q, 30)'))).toBe('1346269');
  });
  it('Catalan numbers from the rational generating functions of Dyck paths of bounded height', () => {
    // Paths of height <= h: F_0 = 1, F_h = 1/(1 - q F_{h-1}) (P. Flajolet, "Combinatorial aspects
    // of continued fractions", Discrete Math. 32 (1980)); a rational function whose coefficients
    // agree with the Catalan numbers (OEIS A000108) up to q^h, and at q^(h+1) miss only the one path
    // of height h+1. (The Catalan numbers are not C-finite; each truncation is.)
    const A000108 = [1, 1, 2, 5, 14, 42, 132, 429, 1430, 4862];
    let F: RationalLike = 1;
    for (let h = 1; h <= 8; h++) {
      F = rfDiv(1, rfSub(1, rfMul(q, F)));
      for (let n = 0; n <= h; n++) expect(seriesCoefficient(F, Q, n)).toBe(A000108[n]);
      expect(seriesCoefficient(F, Q, h + 1)).toBe(A000108[h + 1] - 1);
    }
  });
});

describe('arithmetic agrees with evaluation at rational points', () => {
  const coef = fc.integer({ min: -4, max: 4 });
  const polyArb = fc.array(fc.tuple(fc.integer({ min: 0, max: 3 }), fc.integer({ min: 0, max: 1 }), coef), { maxLength: 4 }).map((ts) =>
    fromTerms(
      [Q, T],
      ts.map(([a, b, c]) => [[a, b], c] as [number[], Scalar]),
    ),
  );
  const rfArb = fc
    .tuple(polyArb, polyArb)
    .filter(([, d]) => !(typeof d === 'number' && d === 0))
    .map(([n, d]) => makeRational(n, d));
  const point = fc.tuple(fc.integer({ min: -6, max: 6 }), fc.integer({ min: 1, max: 5 })).map(([a, b]) => makeRat(BigInt(a), BigInt(b)));
  const at = (f: RationalLike, x: Scalar, y: Scalar): Scalar | undefined => {
    const vals = new Map<number, PolyLike>([
      [Q, x],
      [T, y],
    ]);
    try {
      const [n, d] = partsOf(f).map((p) => substitute(p, vals) as Scalar);
      return sisZero(d) ? undefined : sdiv(n, d);
    } catch {
      return undefined; // a negative power of 0: a pole of a Laurent polynomial
    }
  };
  it('+ - * / and the text round trip', () => {
    fc.assert(
      fc.property(rfArb, rfArb, point, point, (f, g, x, y) => {
        const fx = at(f, x, y),
          gx = at(g, x, y);
        expect(valueEquals(run(valueToText(f)), f)).toBe(true);
        if (fx === undefined || gx === undefined) return;
        const check = (h: RationalLike, want: Scalar) => {
          const hx = at(h, x, y);
          if (hx !== undefined) expect(valueToText(hx)).toBe(valueToText(want));
        };
        check(rfAdd(f, g), sadd(fx, gx));
        check(rfSub(f, g), ssub(fx, gx));
        check(rfMul(f, g), smul(fx, gx));
        if (!sisZero(gx)) check(rfDiv(f, g), sdiv(fx, gx));
      }),
      { numRuns: 150 },
    );
  });
});
