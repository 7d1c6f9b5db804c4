// The pivot Hilbert series of monomial ideals against a second algorithm: counting the standard
// monomials (those outside M) degree by degree, which is the definition of the Hilbert function
// (R. Stanley, Combinatorics and Commutative Algebra, 2nd ed., I.2). Also: coarsening the
// multigraded K-polynomial gives the Z-graded one; textbook values for small ideals.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { hilbertNumeratorCoefficients, kPolynomialTerms } from '../../../src/algebra/monomialIdeals/hilbertSeries.js';
import { dimensionFromNumerator, hilbertFunctionValue, monomialDimensionData } from '../../../src/algebra/monomialIdeals/invariants.js';
import { MonomialIdeal, minimalMonomials } from '../../../src/algebra/monomialIdeals/monomialIdeal.js';
import { facetsOf, minimalCovers } from '../../../src/algebra/monomialIdeals/stanleyReisner.js';
import { varId } from '../../../src/algebra/variables.js';
import type { Int } from '../../../src/numbers/integer.js';

const ring = (n: number) => Int32Array.from({ length: n }, (_, i) => varId(`v[${i + 1}]`));
const ideal = (n: number, gens: number[][]) =>
  MonomialIdeal.of(
    ring(n),
    gens.map((g) => Int32Array.from(g)),
  );

/** The number of monomials of degree d in n variables outside M, by listing them. */
function naiveHF(M: MonomialIdeal, d: number): number {
  const n = M.nv;
  let count = 0;
  const e = new Int32Array(n);
  const rec = (v: number, left: number) => {
    if (v === n - 1) {
      e[v] = left;
      if (!M.contains(e)) count++;
      return;
    }
    for (let a = 0; a <= left; a++) {
      e[v] = a;
      rec(v + 1, left - a);
    }
  };
  if (n === 0) return d === 0 && !M.isUnit() ? 1 : 0;
  rec(0, d);
  return count;
}

const idealArb = fc.integer({ min: 1, max: 4 }).chain((n) =>
  fc.record({
    n: fc.constant(n),
    gens: fc.array(fc.array(fc.integer({ min: 0, max: 3 }), { minLength: n, maxLength: n }), { maxLength: 6 }),
  }),
);

describe('pivot Hilbert series', () => {
  it('agrees with counting standard monomials in degrees 0..8 (random ideals)', () => {
    fc.assert(
      fc.property(idealArb, ({ n, gens }) => {
        const M = ideal(n, gens);
        const N = hilbertNumeratorCoefficients(M);
        for (let d = 0; d <= 8; d++) expect(Number(hilbertFunctionValue(N, n, d))).toBe(naiveHF(M, d));
      }),
      { numRuns: 150 },
    );
  });

  it('the multigraded K-polynomial coarsens to the Z-graded numerator', () => {
    fc.assert(
      fc.property(idealArb, ({ n, gens }) => {
        const M = ideal(n, gens);
        const fine = kPolynomialTerms(
          M,
          Array.from({ length: n }, (_, v) => Int32Array.from({ length: n }, (_, c) => (c === v ? 1 : 0))),
        );
        const coarse: Int[] = [];
        for (const [d, c] of fine.values()) {
          const s = d.reduce((a, b) => a + b, 0);
          while (coarse.length <= s) coarse.push(0);
          coarse[s] = Number(coarse[s]) + Number(c);
        }
        while (coarse.length && coarse[coarse.length - 1] === 0) coarse.pop();
        expect(coarse.map(Number)).toEqual(hilbertNumeratorCoefficients(M).map(Number));
      }),
      { numRuns: 100 },
    );
  });

  it('textbook values', () => {
    // k[x,y]/(x^2, xy): numerator 1 - 2t^2 + t^3, dim 1, degree 1 (the line y-axis with an embedded point).
    expect(
      hilbertNumeratorCoefficients(
        ideal(2, [
          [2, 0],
          [1, 1],
        ]),
      ),
    ).toEqual([1, 0, -2, 1]);
    expect(
      monomialDimensionData(
        ideal(2, [
          [2, 0],
          [1, 1],
        ]),
      ),
    ).toMatchObject({ dim: 1, codim: 1, degree: 1 });
    // A complete intersection of degrees 2, 3 in 4 variables: degree 6, dim 2.
    expect(
      monomialDimensionData(
        ideal(4, [
          [2, 0, 0, 0],
          [0, 3, 0, 0],
        ]),
      ),
    ).toMatchObject({ dim: 2, degree: 6 });
    // The zero ideal: the whole space, degree 1; the unit ideal: empty.
    expect(monomialDimensionData(ideal(3, []))).toMatchObject({ dim: 3, codim: 0, degree: 1 });
    expect(monomialDimensionData(ideal(3, [[0, 0, 0]]))).toMatchObject({ dim: -1, degree: 0 });
    expect(dimensionFromNumerator([1, -3, 3, -1], 3)).toMatchObject({ dim: 0, degree: 1 });
  });

  it('is bounded', () => {
    const M = ideal(4, [
      [1, 1, 0, 0],
      [0, 1, 1, 0],
      [0, 0, 1, 1],
      [1, 0, 0, 1],
      [1, 0, 1, 0],
    ]);
    expect(() => hilbertNumeratorCoefficients(M, { maxSteps: 2 })).toThrow(/bound of 2 steps/);
    expect(() => kPolynomialTerms(M, [], { shouldStop: () => true })).toThrow(/stopped/);
  });
});

describe('minimal generators and the Stanley–Reisner complex', () => {
  it('minimal generators drop multiples and repeats', () => {
    expect(
      minimalMonomials([Int32Array.of(1, 1), Int32Array.of(1, 0), Int32Array.of(1, 0), Int32Array.of(0, 2)]).map((g) => Array.from(g)),
    ).toEqual([
      [0, 2],
      [1, 0],
    ]);
  });

  it('facets are the maximal faces, by brute force over all subsets', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 6 }).chain((n) =>
          fc.record({
            n: fc.constant(n),
            gens: fc.array(fc.array(fc.integer({ min: 0, max: 1 }), { minLength: n, maxLength: n }), { maxLength: 6 }),
          }),
        ),
        ({ n, gens }) => {
          const M = ideal(n, gens);
          if (M.isUnit()) return;
          const faces: number[][] = [];
          for (let mask = 0; mask < 1 << n; mask++) {
            const e = Int32Array.from({ length: n }, (_, v) => (mask >> v) & 1);
            if (!M.gens.some((g) => g.every((x, v) => x <= e[v]))) faces.push([...Array(n).keys()].filter((v) => e[v]));
          }
          const maximal = faces.filter((f) => !faces.some((g) => g.length > f.length && f.every((v) => g.includes(v))));
          const key = (l: number[][]) => l.map((f) => f.join(',')).sort();
          expect(key(facetsOf(M))).toEqual(key(maximal));
          // Minimal primes have codimension >= codim, with equality attained.
          const codim = monomialDimensionData(M).codim;
          expect(Math.min(...minimalCovers(M).map((c) => c.length))).toBe(codim);
        },
      ),
      { numRuns: 150 },
    );
  });
});
