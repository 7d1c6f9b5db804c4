// Matrices with exact entries: rational numbers, or polynomials (generic matrices of
// indeterminates z[i,j]). Determinant by fraction-free (Bareiss) elimination for numbers and by
// expansion along rows over column subsets for polynomials, rank, transpose, products, and the
// characteristic polynomial by the Faddeev–LeVerrier recurrence (exact over the rationals: its
// divisions are by 1, 2, ..., n). Rank and the characteristic polynomial need numeric entries.

import { fail } from '../base/errors.js';
import { normBig } from '../numbers/integer.js';
import { isScalar, parseScalar, Rat, type Scalar } from '../numbers/rational.js';
import { sadd, sdiv, seq, sisZero, smul, sneg, ssub } from '../numbers/scalar.js';
import { registerDecoder } from '../protocol/decode.js';
import type { Structured } from '../protocol/structured.js';
import { isPolynomial, padd, pmul, pneg, polyText, psub, type PolyLike } from './polynomial.js';
import { parsePolynomialText } from './polynomialText.js';

export class Matrix implements Structured {
  readonly kind = 'matrix';

  /** Trusts that `entries` is rows×cols (use Matrix.from for user data). Row-major. */
  constructor(
    readonly rows: number,
    readonly cols: number,
    readonly entries: readonly PolyLike[],
  ) {}

  /** Whether every entry is a number (not a polynomial). */
  isNumeric(): this is Matrix & { entries: readonly Scalar[] } {
    return !this.entries.some(isPolynomial);
  }

  static from(rows: readonly (readonly unknown[])[]): Matrix {
    if (!Array.isArray(rows)) fail('a matrix is a list of rows');
    const r = rows.length;
    const c = r === 0 ? 0 : rows[0].length;
    const entries: PolyLike[] = [];
    rows.forEach((row, i) => {
      if (!Array.isArray(row)) fail(`row ${i + 1} of the matrix is not a list`);
      if (row.length !== c) fail(`the rows of a matrix must have equal lengths: row 1 has ${c} entries, row ${i + 1} has ${row.length}`);
      for (const x of row) {
        if (!isScalar(x) && !isPolynomial(x)) fail(`a matrix entry must be a number or a polynomial, not ${String(x)}`);
        entries.push(x);
      }
    });
    return new Matrix(r, c, entries);
  }

  static identity(n: number): Matrix {
    const e: Scalar[] = new Array(n * n).fill(0);
    for (let i = 0; i < n; i++) e[i * n + i] = 1;
    return new Matrix(n, n, e);
  }

  /** Entry at 1-based row i, column j. */
  at(i: number, j: number): PolyLike {
    if (i < 1 || i > this.rows || j < 1 || j > this.cols) fail(`entry (${i}, ${j}) is outside a ${this.rows}×${this.cols} matrix`);
    return this.entries[(i - 1) * this.cols + (j - 1)];
  }

  rowList(): PolyLike[][] {
    const out: PolyLike[][] = [];
    for (let i = 0; i < this.rows; i++) out.push(this.entries.slice(i * this.cols, (i + 1) * this.cols));
    return out;
  }

  equals(other: Structured): boolean {
    const o = other as Matrix;
    if (o.rows !== this.rows || o.cols !== this.cols) return false;
    for (let i = 0; i < this.entries.length; i++) if (!entryEquals(o.entries[i], this.entries[i])) return false;
    return true;
  }

  key(): string {
    return `${this.rows}x${this.cols}:${this.entries.map(polyText).join(',')}`;
  }

  toText(): string {
    return `matrix([${this.rowList()
      .map((r) => `[${r.map(polyText).join(', ')}]`)
      .join(', ')}])`;
  }

  /** Numbers as in CLI.md (big ones and rationals as strings); polynomials as their text. */
  encode(): unknown {
    const enc = (x: PolyLike) => (typeof x === 'number' ? x : isPolynomial(x) ? x.toText() : x.toString());
    return { matrix: this.rowList().map((r) => r.map(enc)) };
  }
}

registerDecoder('matrix', (x) => {
  if (!Array.isArray(x)) fail('a matrix is a list of rows');
  const rows = x.map((row) => {
    if (!Array.isArray(row)) fail('a matrix is a list of rows');
    return row.map((v) => {
      if (typeof v === 'number' && Number.isSafeInteger(v)) return v;
      if (typeof v === 'string') return /^-?\d+(\/\d+)?$/.test(v) ? parseScalar(v) : parsePolynomialText(v);
      fail(`a matrix entry must be an exact number, not ${JSON.stringify(v)}`);
    });
  });
  return Matrix.from(rows);
});

function entryEquals(a: PolyLike, b: PolyLike): boolean {
  if (isPolynomial(a)) return isPolynomial(b) && a.equals(b);
  return !isPolynomial(b) && seq(a, b);
}

/** The matrix's numeric entries, or an error naming what needs them. */
function numericEntries(m: Matrix, what: string): Scalar[] {
  if (!m.isNumeric()) fail(`${what} needs a matrix of numbers; this one has polynomial entries`);
  return m.entries.slice() as Scalar[];
}

export function isMatrix(v: unknown): v is Matrix {
  return v instanceof Matrix;
}

function requireSquare(m: Matrix, what: string): void {
  if (m.rows !== m.cols) fail(`${what} needs a square matrix, not a ${m.rows}×${m.cols} one`);
}

/** Determinant by Bareiss elimination: every division is exact, entries stay small. */
export function determinant(m: Matrix): Scalar {
  requireSquare(m, 'the determinant');
  const n = m.rows;
  if (n === 0) return 1;
  // Clear denominators row by row so the elimination runs over the integers.
  const a: Scalar[] = numericEntries(m, 'the determinant by elimination');
  let denom: Scalar = 1;
  for (let i = 0; i < n; i++) {
    let l = 1n;
    for (let j = 0; j < n; j++) {
      const x = a[i * n + j];
      if (x instanceof Rat) l = (l / gcdBig(l, x.den)) * x.den;
    }
    if (l !== 1n) {
      const lv = normBig(l);
      for (let j = 0; j < n; j++) a[i * n + j] = smul(a[i * n + j], lv);
      denom = smul(denom, lv);
    }
  }
  let sign = 1;
  let prev: Scalar = 1;
  for (let k = 0; k < n - 1; k++) {
    if (sisZero(a[k * n + k])) {
      let p = k + 1;
      while (p < n && sisZero(a[p * n + k])) p++;
      if (p === n) return 0;
      for (let j = 0; j < n; j++) [a[k * n + j], a[p * n + j]] = [a[p * n + j], a[k * n + j]];
      sign = -sign;
    }
    const pivot = a[k * n + k];
    for (let i = k + 1; i < n; i++) {
      for (let j = k + 1; j < n; j++) {
        a[i * n + j] = sdiv(ssub(smul(pivot, a[i * n + j]), smul(a[i * n + k], a[k * n + j])), prev);
      }
      a[i * n + k] = 0;
    }
    prev = pivot;
  }
  const d = a[n * n - 1];
  return sdiv(sign < 0 ? sneg(d) : d, denom);
}

/** The determinant of a matrix of numbers or polynomials, exactly. */
export function matrixDeterminant(m: Matrix): PolyLike {
  requireSquare(m, 'the determinant');
  if (m.isNumeric()) return determinant(m);
  return polynomialDeterminant(m.entries, m.cols, range(m.rows), range(m.rows));
}

function range(n: number): number[] {
  return Array.from({ length: n }, (_, i) => i);
}

/** Largest size of a determinant of polynomials (8! = 40,320 terms at most). */
export const POLYNOMIAL_DETERMINANT_MAX = 8;

/**
 * det of the submatrix of a (row-major, `cols` columns) on the given rows and columns (0-based,
 * increasing), by expansion along the rows: the minor on the last k rows and a k-subset of the
 * columns is computed once per subset (2^n subsets at most, no division).
 */
export function polynomialDeterminant(a: readonly PolyLike[], cols: number, rows: readonly number[], columns: readonly number[]): PolyLike {
  const k = rows.length;
  if (columns.length !== k) fail('a minor needs as many rows as columns');
  if (k === 0) return 1;
  if (k > POLYNOMIAL_DETERMINANT_MAX)
    fail(
      `a determinant of a ${k}×${k} matrix of polynomials can have ${k}! terms; sizes up to ${POLYNOMIAL_DETERMINANT_MAX} are supported`,
    );
  // memo over bitmasks of positions in `columns`, for the rows rows[k - popcount .. k-1].
  const memo = new Map<number, PolyLike>();
  const det = (mask: number, depth: number): PolyLike => {
    // depth = index in rows of the row to expand; mask = the columns still available.
    if (depth === k) return 1;
    const known = memo.get(mask);
    if (known !== undefined) return known;
    let sum: PolyLike = 0,
      sign = 1;
    const r = rows[depth];
    for (let c = 0; c < k; c++) {
      if (!(mask & (1 << c))) continue;
      const x = a[r * cols + columns[c]];
      if (!(x === 0)) {
        const rest = det(mask & ~(1 << c), depth + 1);
        const term = pmul(x, rest);
        sum = sign > 0 ? padd(sum, term) : psub(sum, term);
      }
      sign = -sign;
    }
    memo.set(mask, sum);
    return sum;
  };
  return det((1 << k) - 1, 0);
}

function gcdBig(a: bigint, b: bigint): bigint {
  while (b !== 0n) [a, b] = [b, a % b];
  return a < 0n ? -a : a;
}

/** Rank over the rationals, by Gaussian elimination. */
export function rank(m: Matrix): number {
  const r = m.rows,
    c = m.cols;
  const a = numericEntries(m, 'the rank');
  let rk = 0;
  for (let col = 0; col < c && rk < r; col++) {
    let p = rk;
    while (p < r && sisZero(a[p * c + col])) p++;
    if (p === r) continue;
    for (let j = 0; j < c; j++) [a[rk * c + j], a[p * c + j]] = [a[p * c + j], a[rk * c + j]];
    const piv = a[rk * c + col];
    for (let i = rk + 1; i < r; i++) {
      const f = sdiv(a[i * c + col], piv);
      if (sisZero(f)) continue;
      for (let j = col; j < c; j++) a[i * c + j] = ssub(a[i * c + j], smul(f, a[rk * c + j]));
    }
    rk++;
  }
  return rk;
}

export function transpose(m: Matrix): Matrix {
  const e: PolyLike[] = new Array(m.rows * m.cols);
  for (let i = 0; i < m.rows; i++) for (let j = 0; j < m.cols; j++) e[j * m.rows + i] = m.entries[i * m.cols + j];
  return new Matrix(m.cols, m.rows, e);
}

export function matrixProduct(a: Matrix, b: Matrix): Matrix {
  if (a.cols !== b.rows) fail(`cannot multiply a ${a.rows}×${a.cols} matrix by a ${b.rows}×${b.cols} matrix`);
  const numeric = a.isNumeric() && b.isNumeric();
  const e: PolyLike[] = new Array(a.rows * b.cols);
  for (let i = 0; i < a.rows; i++)
    for (let j = 0; j < b.cols; j++) {
      if (numeric) {
        let s: Scalar = 0;
        for (let k = 0; k < a.cols; k++) s = sadd(s, smul(a.entries[i * a.cols + k] as Scalar, b.entries[k * b.cols + j] as Scalar));
        e[i * b.cols + j] = s;
      } else {
        let s: PolyLike = 0;
        for (let k = 0; k < a.cols; k++) s = padd(s, pmul(a.entries[i * a.cols + k], b.entries[k * b.cols + j]));
        e[i * b.cols + j] = s;
      }
    }
  return new Matrix(a.rows, b.cols, e);
}

export function matrixSum(a: Matrix, b: Matrix): Matrix {
  if (a.rows !== b.rows || a.cols !== b.cols) fail(`cannot add a ${a.rows}×${a.cols} matrix and a ${b.rows}×${b.cols} matrix`);
  return new Matrix(
    a.rows,
    a.cols,
    a.entries.map((x, i) => padd(x, b.entries[i])),
  );
}

export function matrixScale(c: PolyLike, m: Matrix): Matrix {
  return new Matrix(
    m.rows,
    m.cols,
    m.entries.map((x) => pmul(c, x)),
  );
}

/** M^k for k >= 0 (square M), by repeated squaring. */
export function matrixPower(m: Matrix, k: number): Matrix {
  requireSquare(m, 'a matrix power');
  if (k < 0) fail(`negative powers of matrices are not supported (power ${k})`);
  if (k > 16 && !m.isNumeric()) fail(`powers of a matrix of polynomials are limited to 16 (power ${k}): the entries grow too fast`);
  let r = Matrix.identity(m.rows),
    b = m;
  while (k > 0) {
    if (k & 1) r = matrixProduct(r, b);
    k = Math.floor(k / 2);
    if (k > 0) b = matrixProduct(b, b);
  }
  return r;
}

/**
 * Coefficients c[0..n] of det(t·I - M) = sum c[i] t^i, by Faddeev–LeVerrier:
 * N_1 = I, c[n-k] = -tr(M N_k)/k, N_{k+1} = M N_k + c[n-k] I.
 */
export function charpolyCoefficients(m: Matrix): Scalar[] {
  requireSquare(m, 'the characteristic polynomial');
  const n = m.rows;
  numericEntries(m, 'the characteristic polynomial');
  const c: Scalar[] = new Array(n + 1).fill(0);
  c[n] = 1;
  let N = Matrix.identity(n);
  for (let k = 1; k <= n; k++) {
    const MN = matrixProduct(m, N);
    let tr: Scalar = 0;
    for (let i = 0; i < n; i++) tr = sadd(tr, MN.entries[i * n + i] as Scalar);
    c[n - k] = sneg(sdiv(tr, k));
    if (k < n) {
      const e = MN.entries.slice();
      for (let i = 0; i < n; i++) e[i * n + i] = padd(e[i * n + i], c[n - k]);
      N = new Matrix(n, n, e);
    }
  }
  return c;
}

/** det(t·I - M), with t any polynomial or number (Horner evaluation of the coefficients). */
export function charpoly(m: Matrix, t: PolyLike): PolyLike {
  const c = charpolyCoefficients(m);
  let r: PolyLike = 0;
  for (let i = c.length - 1; i >= 0; i--) r = padd(pmul(r, t), c[i]);
  return r;
}

export function matrixDifference(a: Matrix, b: Matrix): Matrix {
  if (a.rows !== b.rows || a.cols !== b.cols) fail(`cannot subtract a ${b.rows}×${b.cols} matrix from a ${a.rows}×${a.cols} matrix`);
  return new Matrix(
    a.rows,
    a.cols,
    a.entries.map((x, i) => psub(x, b.entries[i])),
  );
}

export function matrixNegate(m: Matrix): Matrix {
  return new Matrix(m.rows, m.cols, m.entries.map(pneg));
}
