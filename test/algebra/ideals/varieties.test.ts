// Determinantal and commuting varieties, and the ideal invariants on textbook examples.
//
// Determinantal varieties (W. Bruns, U. Vetter, Determinantal Rings, LNM 1327 (1988); the degree
// formula as in J. Herzog, N. V. Trung, Adv. Math. 96 (1992), Cor. 6.5): for the ideal of
// (r+1)-minors of a generic m×n matrix, m <= n,
//   dim = r (m + n - r),   degree = prod_{i=0}^{m-r-1} (n+i)! i! / ((r+i)! (n-r+i)!);
// for r = 1 (the Segre embedding of P^{m-1} × P^{n-1}) the Hilbert function is
// HF(d) = C(d+m-1, m-1) C(d+n-1, n-1).
// Commuting variety of pairs of n×n matrices: dim n² + n (T. S. Motzkin, O. Taussky, Trans. Amer.
// Math. Soc. 80 (1955)) and degree 1, 3, 31 for n = 1, 2, 3 (OEIS A029729); the ideal of the
// entries of XY - YX itself has these (the issue records an independent check: dim 6 and 12,
// degree 3 and 31).

import { describe, expect, it } from 'vitest';
import { genericMatrix, minorsOf } from '../../../src/algebra/ideals/genericMatrix.js';
import { Ideal } from '../../../src/algebra/ideals/ideal.js';
import {
  grevlexInitial,
  idealDimensionData,
  idealHilbertFunction,
  idealHilbertNumerator,
  initialIdealOf,
} from '../../../src/algebra/ideals/invariants.js';
import { matrixDifference, matrixProduct, matrixDeterminant, Matrix, determinant } from '../../../src/algebra/matrix.js';
import { hilbertFunctionValue } from '../../../src/algebra/monomialIdeals/invariants.js';
import * as polyOps from '../../../src/algebra/polynomial.js';
import { polyText, variable } from '../../../src/algebra/polynomial.js';
import { substitute } from '../../../src/algebra/polynomialOps.js';
import { termOrder } from '../../../src/algebra/groebner/index.js';
import { binomialInt, factorialInt } from '../../../src/numbers/integer.js';
import { varId } from '../../../src/algebra/variables.js';

function determinantalDegree(m: number, n: number, r: number): bigint {
  let num = 1n,
    den = 1n;
  for (let i = 0; i <= m - r - 1; i++) {
    num *= BigInt(factorialInt(n + i)) * BigInt(factorialInt(i));
    den *= BigInt(factorialInt(r + i)) * BigInt(factorialInt(n - r + i));
  }
  return num / den;
}

describe('determinantal varieties', () => {
  for (const [m, n, r] of [
    [2, 2, 1],
    [2, 3, 1],
    [2, 4, 1],
    [3, 3, 1],
    [3, 3, 2],
    [3, 4, 1],
    [3, 4, 2],
  ]) {
    it(`rank <= ${r} in ${m}×${n}: dim, degree, Hilbert function`, () => {
      const I = Ideal.of(minorsOf(genericMatrix('z', m, n), r + 1));
      const d = idealDimensionData(I);
      expect(d.dim).toBe(r * (m + n - r));
      expect(BigInt(d.degree)).toBe(determinantalDegree(m, n, r));
      if (r === 1)
        for (let k = 0; k <= 5; k++)
          expect(BigInt(idealHilbertFunction(I, k))).toBe(BigInt(binomialInt(k + m - 1, m - 1)) * BigInt(binomialInt(k + n - 1, n - 1)));
    }, 60_000);
  }

  it('the Hilbert function of the initial ideal agrees with counting standard monomials', () => {
    const I = Ideal.of(minorsOf(genericMatrix('z', 3, 3), 2));
    const M = grevlexInitial(I);
    const N = idealHilbertNumerator(I);
    // Count monomials of degree 2 outside in(I) among the 9 variables by listing them.
    let count = 0;
    const e = new Int32Array(9);
    for (let a = 0; a < 9; a++)
      for (let b = a; b < 9; b++) {
        e.fill(0);
        e[a]++;
        e[b]++;
        if (!M.contains(e)) count++;
      }
    expect(Number(hilbertFunctionValue(N, 9, 2))).toBe(count);
    expect(count).toBe(36); // HF(2) = C(4,2)^2 for the Segre P^2 × P^2
  });
});

describe('the commuting variety', () => {
  const commutator = (n: number) => {
    const X = genericMatrix('a', n, n),
      Y = genericMatrix('b', n, n);
    return matrixDifference(matrixProduct(X, Y), matrixProduct(Y, X)).entries.slice();
  };
  it('n = 2: dim 6, degree 3; n = 3: dim 12, degree 31 (over Q and over F_32003)', () => {
    const I2 = Ideal.of(commutator(2));
    expect(idealDimensionData(I2)).toMatchObject({ dim: 6, degree: 3 });
    const I3 = Ideal.of(commutator(3));
    expect(idealDimensionData(I3)).toMatchObject({ dim: 12, degree: 31 });
    expect(idealDimensionData(Ideal.of(commutator(3), [], 32003))).toMatchObject({ dim: 12, degree: 31 });
  }, 120_000);
  it('n = 1: the zero ideal of the ring of a[1,1], b[1,1]: dim 2, degree 1', () => {
    const I1 = Ideal.of(commutator(1), [varId('a[1,1]'), varId('b[1,1]')]);
    expect(idealDimensionData(I1)).toMatchObject({ dim: 2, degree: 1 });
  });
});

describe('textbook ideals', () => {
  it("the twisted cubic (Cox, Little, O'Shea, ch. 1 §2 and ch. 9): dim 2 as a cone, degree 3", () => {
    const [x, y, z, w] = ['tc[1]', 'tc[2]', 'tc[3]', 'tc[4]'].map(variable);
    const I = Ideal.of(
      minorsOf(
        Matrix.from([
          [x, y, z],
          [y, z, w],
        ]),
        2,
      ),
    );
    expect(idealDimensionData(I)).toMatchObject({ dim: 2, degree: 3 });
    expect(idealHilbertNumerator(I).map(Number)).toEqual([1, 0, -3, 2]); // (1 - t)^2 (1 + 2t) over (1 - t)^4
  });
  it('affine: a circle meets a line in 2 points; the affine twisted cubic has dim 1, degree 3', () => {
    const x = variable('af[1]'),
      y = variable('af[2]'),
      z = variable('af[3]');
    const { padd, psub, pmul, ppow } = polyOps;
    const circle = psub(padd(pmul(x, x), pmul(y, y)), 1);
    expect(idealDimensionData(Ideal.of([circle, psub(x, y)]))).toMatchObject({ dim: 0, degree: 2 });
    expect(idealDimensionData(Ideal.of([psub(y, ppow(x, 2)), psub(z, ppow(x, 3))]))).toMatchObject({ dim: 1, degree: 3 });
  });
  it('determinants of polynomial matrices: expansion agrees with Bareiss after substitution', () => {
    const Z = genericMatrix('z', 4, 4);
    const det = matrixDeterminant(Z);
    const values = new Map<number, number>();
    const nums: number[] = [];
    for (let k = 0; k < 16; k++) nums.push(((k * 7 + 3) % 11) - 5);
    Z.entries.forEach((e, k) => values.set((e as { vars: Int32Array }).vars[0], nums[k]));
    expect(polyText(substitute(det, values))).toBe(String(determinant(new Matrix(4, 4, nums))));
    expect((det as { length: number }).length).toBe(24);
  });
  it('initial ideals depend on the order (lex vs grevlex) but not their Hilbert function', () => {
    const x = variable('o[1]'),
      y = variable('o[2]'),
      z = variable('o[3]');
    const { psub, pmul } = polyOps;
    const I = Ideal.of([psub(pmul(x, x), pmul(y, z)), psub(pmul(y, y), pmul(x, z))]);
    const lex = initialIdealOf(I, termOrder('lex', Array.from(I.ring)));
    const grevlex = initialIdealOf(I, I.grevlex());
    expect(lex.equals(grevlex)).toBe(false);
    for (let d = 0; d < 6; d++) expect(idealHilbertFunction(I, d)).toBe(idealHilbertFunction(Ideal.fromMonomialIdeal(lex), d));
  });
});

describe('the stop check', () => {
  it('an installed stop check ends a basis computation with a clear error', async () => {
    const { setIdealStop } = await import('../../../src/algebra/ideals/stop.js');
    const X = genericMatrix('s', 3, 3),
      Y = genericMatrix('u', 3, 3);
    const I = Ideal.of(matrixDifference(matrixProduct(X, Y), matrixProduct(Y, X)).entries.slice());
    setIdealStop(() => true);
    try {
      expect(() => idealDimensionData(I)).toThrow(/stopped/);
    } finally {
      setIdealStop(undefined);
    }
  });
});
