// Doubly indexed indeterminates (print order: base, then index lists lexicographically), polynomial
// text read back (a second reading of Polynomial.toText), and minors against Bareiss elimination
// (E. H. Bareiss, Math. Comp. 22 (1968)) on numeric matrices.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { minorsOf, subsets } from '../../../src/algebra/ideals/genericMatrix.js';
import { Ideal } from '../../../src/algebra/ideals/ideal.js';
import { idealDimensionData } from '../../../src/algebra/ideals/invariants.js';
import { determinant, Matrix } from '../../../src/algebra/matrix.js';
import { pequals, polyText, variable } from '../../../src/algebra/polynomial.js';
import { parsePolynomialText } from '../../../src/algebra/polynomialText.js';
import { rankOf, varId, varIndices, varName } from '../../../src/algebra/variables.js';
import { seq } from '../../../src/numbers/scalar.js';
import { polyArb } from '../arbitraries.js';

describe('doubly indexed indeterminates', () => {
  it('canonical names and print order', () => {
    expect(varName(varId('w[ 1 , 02 ]'))).toBe('w[1,2]');
    expect(varIndices(varId('w[3,4]'))).toEqual([3, 4]);
    const order = ['w', 'w[1]', 'w[1,1]', 'w[1,2]', 'w[1,10]', 'w[2]', 'w[2,1]', 'w[10,1]'];
    const ids = order.map(varId);
    const sorted = ids.slice().sort((a, b) => rankOf(a) - rankOf(b));
    expect(sorted.map(varName)).toEqual(order);
    expect(() => varId('w[1,]')).toThrow(/not a valid indeterminate name/);
  });
  it('a polynomial in z[i,j] prints row by row', () => {
    const p = polyText(parsePolynomialText('v[2,1]*v[1,2] + v[1,1]'));
    expect(p).toBe('v[1,2]*v[2,1] + v[1,1]');
  });
});

describe('polynomial text read back', () => {
  it('parsePolynomialText(toText(p)) == p', () => {
    fc.assert(
      fc.property(polyArb, (p) => pequals(parsePolynomialText(polyText(p)), p)),
      { numRuns: 300 },
    );
  });
  it('refuses what is not a printed polynomial', () => {
    expect(() => parsePolynomialText('x + * y')).toThrow(/cannot read/);
    expect(() => parsePolynomialText('')).toThrow(/empty/);
    expect(() => parsePolynomialText('x*2')).toThrow(/coefficient must come first/);
  });
});

describe('minors', () => {
  it('agree with Bareiss determinants of the submatrices (random numeric 4×4, all k)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -4, max: 4 }), { minLength: 16, maxLength: 16 }), (e) => {
        const M = new Matrix(4, 4, e);
        for (let k = 1; k <= 4; k++) {
          const want: number[] = [];
          for (const rs of subsets(4, k))
            for (const cs of subsets(4, k)) {
              const d = determinant(
                new Matrix(
                  k,
                  k,
                  rs.flatMap((i) => cs.map((j) => e[i * 4 + j])),
                ),
              );
              if (!seq(d, 0)) want.push(Number(d));
            }
          expect(minorsOf(M, k).map(Number)).toEqual(want);
        }
      }),
      { numRuns: 60 },
    );
  });
});

describe('over F_p', () => {
  it('the field changes the ideal: (x + y, x - y) is (x, y) over Q but a principal ideal over F_2', () => {
    const x = variable('fp[1]'),
      y = variable('fp[2]');
    const gens = [parsePolynomialText('fp[1] + fp[2]'), parsePolynomialText('fp[1] - fp[2]')];
    expect(idealDimensionData(Ideal.of(gens)).dim).toBe(0);
    expect(idealDimensionData(Ideal.of(gens, [], 2)).dim).toBe(1);
    expect(idealDimensionData(Ideal.of([x, y], [], 32003)).dim).toBe(0);
    // 2*x vanishes mod 2: the zero ideal of a ring in one variable.
    expect(idealDimensionData(Ideal.of([parsePolynomialText('2*fp[1]')], [], 2))).toMatchObject({ dim: 1, degree: 1 });
  });
});
