import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  charpoly,
  charpolyCoefficients,
  determinant,
  Matrix,
  matrixPower,
  matrixProduct,
  matrixScale,
  matrixSum,
  rank,
  transpose,
} from '../../src/algebra/matrix.js';
import { polyText, variable } from '../../src/algebra/polynomial.js';
import { makeRat, type Scalar } from '../../src/numbers/rational.js';
import { sadd, sdiv, seq, smul, spow, ssub, sneg } from '../../src/numbers/scalar.js';
import { factorialInt } from '../../src/numbers/integer.js';
import { decodeValue } from '../../src/values/decode.js';
import { scalarArb } from './arbitraries.js';

/** Leibniz expansion: the second algorithm for determinants. */
function leibniz(m: Matrix): Scalar {
  const n = m.rows;
  let total: Scalar = 0;
  const perm = Array.from({ length: n }, (_, i) => i);
  const rec = (k: number, sign: number, prod: Scalar) => {
    if (k === n) {
      total = sadd(total, sign > 0 ? prod : sneg(prod));
      return;
    }
    for (let i = k; i < n; i++) {
      [perm[k], perm[i]] = [perm[i], perm[k]];
      rec(k + 1, i === k ? sign : -sign, smul(prod, m.entries[k * n + perm[k]] as Scalar));
      [perm[k], perm[i]] = [perm[i], perm[k]];
    }
  };
  rec(0, 1, 1);
  return total;
}

const squareArb = (n: number) => fc.array(scalarArb, { minLength: n * n, maxLength: n * n }).map((e) => new Matrix(n, n, e));

describe('determinant', () => {
  it('Hilbert matrices: det H_n = c_n^4 / c_{2n}, c_n = 1!2!...(n-1)! (M.-D. Choi, "Tricks or treats with the Hilbert matrix", Amer. Math. Monthly 90 (1983) 301-312)', () => {
    const c = (n: number): Scalar => {
      let r: Scalar = 1;
      for (let i = 1; i < n; i++) r = smul(r, factorialInt(i));
      return r;
    };
    for (let n = 1; n <= 9; n++) {
      const rows = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => makeRat(1n, BigInt(i + j + 1))));
      const expected = sdiv(smul(smul(c(n), c(n)), smul(c(n), c(n))), c(2 * n));
      expect(seq(determinant(Matrix.from(rows)), expected)).toBe(true);
    }
    // OEIS A005249 (1/det H_n): 12, 2160, 6048000 for n = 2, 3, 4.
    const h = (n: number) =>
      Matrix.from(Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => makeRat(1n, BigInt(i + j + 1)))));
    expect([2, 3, 4].map((n) => sdiv(1, determinant(h(n))))).toEqual([12, 2160, 6048000]);
  });
  it('Vandermonde matrices: det = prod_{i<j} (x_j - x_i) (the classical formula)', () => {
    fc.assert(
      fc.property(fc.array(scalarArb, { minLength: 1, maxLength: 6 }), (xs) => {
        const n = xs.length;
        const rows = xs.map((x) => Array.from({ length: n }, (_, j) => spow(x, j)));
        let expected: Scalar = 1;
        for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) expected = smul(expected, ssub(xs[j], xs[i]));
        expect(seq(determinant(Matrix.from(rows)), expected)).toBe(true);
      }),
      { numRuns: 60 },
    );
  });
  it('agrees with the Leibniz expansion, and det(AB) = det A det B, det(A^T) = det A', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 5 }).chain((n) => fc.tuple(squareArb(n), squareArb(n))),
        ([a, b]) => {
          expect(seq(determinant(a), leibniz(a))).toBe(true);
          expect(seq(determinant(matrixProduct(a, b)), smul(determinant(a), determinant(b)))).toBe(true);
          expect(seq(determinant(transpose(a)), determinant(a))).toBe(true);
        },
      ),
      { numRuns: 80 },
    );
  });
  it('singular matrices and zero pivots', () => {
    expect(
      determinant(
        Matrix.from([
          [0, 1],
          [1, 0],
        ]),
      ),
    ).toBe(-1);
    expect(
      determinant(
        Matrix.from([
          [1, 2],
          [2, 4],
        ]),
      ),
    ).toBe(0);
    expect(determinant(Matrix.from([]))).toBe(1);
    expect(() => determinant(Matrix.from([[1, 2]]))).toThrow(/square/);
  });
});

describe('rank', () => {
  it('counts independent rows; rank of a product is at most each rank', () => {
    expect(
      rank(
        Matrix.from([
          [1, 2, 3],
          [2, 4, 6],
          [1, 0, 1],
        ]),
      ),
    ).toBe(2);
    expect(
      rank(
        Matrix.from([
          [0, 0],
          [0, 0],
        ]),
      ),
    ).toBe(0);
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 4 }).chain((n) => fc.tuple(squareArb(n), squareArb(n))),
        ([a, b]) => {
          const r = rank(matrixProduct(a, b));
          expect(r).toBeLessThanOrEqual(Math.min(rank(a), rank(b)));
          expect(rank(a) === a.rows).toBe(!seq(determinant(a), 0));
          expect(rank(transpose(a))).toBe(rank(a));
        },
      ),
      { numRuns: 60 },
    );
  });
});

describe('characteristic polynomial', () => {
  it('of a companion matrix is its polynomial (R. Horn, C. Johnson, Matrix Analysis, 2nd ed., Thm 3.3.14)', () => {
    // Companion of t^4 - 2t^3 + 5t - 7: ones on the subdiagonal, last column -a_0, ..., -a_3.
    const a = [-7, 5, 0, -2];
    const n = a.length;
    const rows = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (j === n - 1 ? -a[i] : i === j + 1 ? 1 : 0)));
    expect(polyText(charpoly(Matrix.from(rows), variable('t')))).toBe('t^4 - 2*t^3 + 5*t - 7');
  });
  it('has constant term (-1)^n det M, trace as second coefficient, and satisfies Cayley–Hamilton', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 4 }).chain(squareArb), (m) => {
        const n = m.rows;
        const c = charpolyCoefficients(m);
        expect(seq(c[0], n % 2 === 0 ? determinant(m) : sneg(determinant(m)))).toBe(true);
        let tr: Scalar = 0;
        for (let i = 0; i < n; i++) tr = sadd(tr, m.entries[i * n + i] as Scalar);
        expect(seq(c[n - 1], sneg(tr))).toBe(true);
        let sum = matrixScale(0, m);
        for (let i = 0; i <= n; i++) sum = matrixSum(sum, matrixScale(c[i], matrixPower(m, i)));
        expect(sum.entries.every((x) => seq(x as Scalar, 0))).toBe(true);
      }),
      { numRuns: 60 },
    );
  });
  it('evaluates at a number', () => {
    expect(
      charpoly(
        Matrix.from([
          [2, 1],
          [1, 2],
        ]),
        3,
      ),
    ).toBe(0); // eigenvalues 1 and 3
  });
});

describe('text and record forms', () => {
  it('prints in the language syntax and round-trips through the record encoding', () => {
    const m = Matrix.from([
      [1, makeRat(1n, 2n)],
      [2n ** 60n, -3],
    ]);
    expect(m.toText()).toBe('matrix([[1, 1/2], [1152921504606846976, -3]])');
    expect(m.encode()).toEqual({
      matrix: [
        [1, '1/2'],
        ['1152921504606846976', -3],
      ],
    });
    expect((decodeValue(m.encode()) as Matrix).equals(m)).toBe(true);
    expect(() => Matrix.from([[1, 2], [3]])).toThrow(/equal lengths/);
  });
});
