// Generic matrices of indeterminates and their minors: genericMatrix('z', m, n) is the m×n matrix
// whose (i, j) entry is the indeterminate z[i,j]; minorsOf(M, k) lists the k×k minors of any
// matrix of numbers or polynomials, exactly.

import { fail } from '../../base/errors.js';
import { Matrix, polynomialDeterminant } from '../matrix.js';
import { isPolynomial, variable, type PolyLike } from '../polynomial.js';
import { sisZero } from '../../numbers/scalar.js';

/** Beyond this a generic matrix has too many indeterminates to be useful in a check. */
export const GENERIC_MATRIX_MAX_ENTRIES = 400;

export function genericMatrix(base: string, m: number, n: number): Matrix {
  if (!Number.isSafeInteger(m) || !Number.isSafeInteger(n) || m < 0 || n < 0)
    fail(`a generic matrix needs nonnegative sizes, not ${m}×${n}`);
  if (m * n > GENERIC_MATRIX_MAX_ENTRIES) fail(`a generic ${m}×${n} matrix has more than ${GENERIC_MATRIX_MAX_ENTRIES} entries`);
  const e: PolyLike[] = [];
  for (let i = 1; i <= m; i++) for (let j = 1; j <= n; j++) e.push(variable(`${base}[${i},${j}]`));
  return new Matrix(m, n, e);
}

/** The k-element subsets of {0..n-1}, in lexicographic order. */
export function subsets(n: number, k: number): number[][] {
  const out: number[][] = [];
  const cur: number[] = [];
  const rec = (start: number) => {
    if (cur.length === k) {
      out.push(cur.slice());
      return;
    }
    for (let i = start; i <= n - (k - cur.length); i++) {
      cur.push(i);
      rec(i + 1);
      cur.pop();
    }
  };
  rec(0);
  return out;
}

/** Beyond this many minors the list is refused (a check would not finish). */
export const MINORS_MAX = 200_000;

function binom(n: number, k: number): number {
  let r = 1;
  for (let i = 1; i <= k; i++) r = (r * (n - k + i)) / i;
  return Math.round(r);
}

/**
 * The k×k minors of M on the rows `rowsOf` and columns `colsOf` (0-based; all rows and columns by
 * default), row subsets outer and column subsets inner, both lexicographic; zero minors are
 * left out.
 */
export function minorsOf(M: Matrix, k: number, rowsOf?: readonly number[], colsOf?: readonly number[]): PolyLike[] {
  const R = rowsOf ?? Array.from({ length: M.rows }, (_, i) => i);
  const C = colsOf ?? Array.from({ length: M.cols }, (_, j) => j);
  if (!Number.isSafeInteger(k) || k < 1) fail(`the size of a minor must be a positive integer, not ${k}`);
  if (k > R.length || k > C.length) return [];
  if (binom(R.length, k) * binom(C.length, k) > MINORS_MAX)
    fail(`a ${M.rows}×${M.cols} matrix has more than ${MINORS_MAX.toLocaleString('en-US')} minors of size ${k}`);
  const out: PolyLike[] = [];
  for (const rs of subsets(R.length, k))
    for (const cs of subsets(C.length, k)) {
      const d = polynomialDeterminant(
        M.entries,
        M.cols,
        rs.map((i) => R[i]),
        cs.map((j) => C[j]),
      );
      if (isPolynomial(d) || !sisZero(d)) out.push(d);
    }
  return out;
}
