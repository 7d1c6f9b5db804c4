// Schur polynomials, divided differences and Sturm real-rootedness (src/algebra/schur.ts,
// divided.ts, sturm.ts) against closed formulas and second algorithms.

import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { schurPolynomial } from '../../src/algebra/schur.js';
import { dividedDifference } from '../../src/algebra/divided.js';
import { isRealRootedCoefficients } from '../../src/algebra/sturm.js';
import { padd, pdivExact, pequals, pmul, ppow, psub, variable, type PolyLike } from '../../src/algebra/polynomial.js';
import { renameVariables, substitute, univariateCoefficients } from '../../src/algebra/polynomialOps.js';
import { schubertPolynomial } from '../../src/algebra/schubertPolynomials.js';
import { indexedVarId, varId } from '../../src/algebra/variables.js';
import { makeRat, type Scalar } from '../../src/numbers/rational.js';
import { sdiv, smul } from '../../src/numbers/scalar.js';
import { polyArb } from './arbitraries.js';

const x = (i: number) => variable(`x[${i}]`);
const partitionsOf = (n: number, max = n): number[][] =>
  n === 0
    ? [[]]
    : Array.from({ length: Math.min(n, max) }, (_, k) => k + 1)
        .reverse()
        .flatMap((p) => partitionsOf(n - p, p).map((r) => [p, ...r]));

describe('Schur polynomials', () => {
  it('equal the bialternant a_{lambda+delta} / a_delta (Macdonald, SFHP, I (3.1)), for |lambda| <= 5, m <= 3', () => {
    for (let m = 1; m <= 3; m++) {
      const alt = (exps: number[]): PolyLike => {
        // det(x_i^{e_j}) by Leibniz over S_m
        let s: PolyLike = 0;
        const perms =
          m === 1
            ? [[0]]
            : m === 2
              ? [
                  [0, 1],
                  [1, 0],
                ]
              : [
                  [0, 1, 2],
                  [0, 2, 1],
                  [1, 0, 2],
                  [1, 2, 0],
                  [2, 0, 1],
                  [2, 1, 0],
                ];
        const signs = m === 1 ? [1] : m === 2 ? [1, -1] : [1, -1, -1, 1, 1, -1];
        perms.forEach((p, k) => {
          let t: PolyLike = signs[k];
          for (let i = 0; i < m; i++) t = pmul(t, ppow(x(i + 1), exps[p[i]]));
          s = padd(s, t);
        });
        return s;
      };
      const delta = Array.from({ length: m }, (_, i) => m - 1 - i);
      for (let n = 0; n <= 5; n++)
        for (const lam of partitionsOf(n)) {
          if (lam.length > m) {
            expect(schurPolynomial(lam, 'x', m)).toBe(0);
            continue;
          }
          const e = delta.map((d, i) => d + (lam[i] ?? 0));
          expect(pequals(schurPolynomial(lam, 'x', m), pdivExact(alt(e), alt(delta)))).toBe(true);
        }
    }
  });
  it('at x = 1 give the hook-content formula prod (m + c(u)) / h(u) (Stanley, EC2, Cor. 7.21.4)', () => {
    for (let m = 1; m <= 5; m++)
      for (let n = 0; n <= 6; n++)
        for (const lam of partitionsOf(n)) {
          let expected: Scalar = 1;
          const conj = (j: number) => lam.filter((p) => p > j).length;
          lam.forEach((row, i) => {
            for (let j = 0; j < row; j++) expected = sdiv(smul(expected, m + j - i), row - j - 1 + conj(j) - i - 1 + 1);
          });
          const ones = new Map(Array.from({ length: m }, (_, i) => [indexedVarId('x', i + 1), 1 as PolyLike]));
          expect(substitute(schurPolynomial(lam, 'x', m), ones)).toEqual(expected);
        }
  });
  it('equal the Schubert polynomial of the Grassmannian permutation with descent at m (Macdonald, Notes, (4.8))', () => {
    for (const [lam, m] of [
      [[2, 1], 2],
      [[3, 1], 2],
      [[2, 2], 3],
      [[2, 1, 1], 3],
    ] as [number[], number][]) {
      const w: number[] = [];
      for (let i = 1; i <= m; i++) w.push(i + (lam[m - i] ?? 0));
      for (let v = 1; w.length < m + lam[0]; v++) if (!w.slice(0, m).includes(v)) w.push(v);
      expect(pequals(schubertPolynomial(w, 'x'), schurPolynomial(lam, 'x', m))).toBe(true);
    }
  });
});

describe('divided differences', () => {
  it('equal (p - s p) / (a - b) by exact division (fast-check)', () => {
    const a = varId('x[1]'),
      b = varId('x[2]');
    fc.assert(
      fc.property(polyArb, (p) => {
        const swapped = renameVariables(
          p,
          new Map([
            [a, b],
            [b, a],
          ]),
        );
        expect(pequals(dividedDifference(p, a, b), pdivExact(psub(p, swapped), psub(x(1), x(2))))).toBe(true);
      }),
      { numRuns: 100 },
    );
  });
  it('satisfy the Leibniz rule d(fg) = d(f) g + s(f) d(g) (fast-check)', () => {
    const a = varId('x[1]'),
      b = varId('x[2]');
    fc.assert(
      fc.property(polyArb, polyArb, (f, g) => {
        const sf = renameVariables(
          f,
          new Map([
            [a, b],
            [b, a],
          ]),
        );
        const rhs = padd(pmul(dividedDifference(f, a, b), g), pmul(sf, dividedDifference(g, a, b)));
        expect(pequals(dividedDifference(pmul(f, g), a, b), rhs)).toBe(true);
      }),
      { numRuns: 60 },
    );
  });
});

describe('real-rootedness by Sturm sequences', () => {
  const q = variable('q');
  const qid = varId('q');
  const coeffs = (p: PolyLike) => univariateCoefficients(p, qid);
  it('Eulerian polynomials are real-rooted (OEIS A008292 rows; Frobenius)', () => {
    for (const row of [[1], [1, 1], [1, 4, 1], [1, 11, 11, 1], [1, 26, 66, 26, 1], [1, 57, 302, 302, 57, 1]])
      expect(isRealRootedCoefficients(row)).toBe(true);
  });
  it('decides known cases, with multiple and irrational roots', () => {
    expect(isRealRootedCoefficients([1, 0, 1])).toBe(false); // q^2 + 1
    expect(isRealRootedCoefficients([-2, 0, 1])).toBe(true); // q^2 - 2
    expect(isRealRootedCoefficients([-2, 0, 0, 1])).toBe(false); // q^3 - 2
    expect(isRealRootedCoefficients(coeffs(pmul(padd(ppow(q, 2), 1), ppow(psub(q, 1), 2))))).toBe(false);
    expect(isRealRootedCoefficients(coeffs(pmul(ppow(psub(q, 1), 3), ppow(padd(q, 2), 2))))).toBe(true);
    expect(isRealRootedCoefficients([1, 2, 2, 1])).toBe(false); // [3]_q! = (1+q)(1+q+q^2)
    expect(isRealRootedCoefficients([5])).toBe(true);
  });
  it('products of linear factors are real-rooted; adding an irreducible quadratic factor breaks it (fast-check)', () => {
    const rootArb = fc
      .tuple(fc.integer({ min: -6, max: 6 }), fc.integer({ min: 1, max: 3 }))
      .map(([a, b]) => makeRat(BigInt(a), BigInt(b)));
    fc.assert(
      fc.property(
        fc.array(rootArb, { minLength: 1, maxLength: 6 }),
        fc.integer({ min: 1, max: 5 }),
        fc.integer({ min: -3, max: 3 }),
        (roots, c, shift) => {
          let p: PolyLike = 1;
          for (const r of roots) p = pmul(p, psub(q, r));
          expect(isRealRootedCoefficients(coeffs(p))).toBe(true);
          const quad = padd(ppow(psub(q, shift), 2), c); // (q - s)^2 + c, c > 0
          expect(isRealRootedCoefficients(coeffs(pmul(p, quad)))).toBe(false);
        },
      ),
      { numRuns: 100 },
    );
  });
});
