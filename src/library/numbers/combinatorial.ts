// Exact combinatorial numbers: factorials, binomials, Catalan, Stirling, Bell and Fibonacci numbers.
// Results are Int (a JS number while safe, a bigint beyond). Each function takes plain arguments
// already range-checked by its caller in ../numbers.ts.

import { iadd, imul, Int, normBig, toBig } from '../../numbers/integer.js';

/** Product lo * (lo+step) * ... up to hi inclusive, by binary splitting (fast for big results). */
function rangeProduct(lo: number, hi: number, step: number): bigint {
  if (lo > hi) return 1n;
  const terms = Math.floor((hi - lo) / step) + 1;
  if (terms <= 16) {
    let r = 1n;
    for (let x = lo; x <= hi; x += step) r *= BigInt(x);
    return r;
  }
  const mid = lo + step * Math.floor(terms / 2);
  return rangeProduct(lo, mid - step, step) * rangeProduct(mid, hi, step);
}

/** n! for n >= 0. */
export function factorial(n: number): Int {
  if (n <= 18) {
    let r = 1;
    for (let i = 2; i <= n; i++) r *= i;
    return r;
  }
  return normBig(rangeProduct(2, n, 1));
}

/** n!! = n (n-2) (n-4) ... down to 1 or 2, for n >= -1; (-1)!! = 0!! = 1. */
export function doubleFactorial(n: number): Int {
  if (n <= 0) return 1;
  return normBig(rangeProduct(n % 2 === 0 ? 2 : 1, n, 2));
}

/** lo * (lo+1) * ... * (lo+count-1) for bigints, by binary splitting. */
function consecutiveProduct(lo: bigint, count: number): bigint {
  if (count <= 16) {
    let r = 1n;
    for (let i = 0; i < count; i++) r *= lo + BigInt(i);
    return r;
  }
  const half = Math.floor(count / 2);
  return consecutiveProduct(lo, half) * consecutiveProduct(lo + BigInt(half), count - half);
}

/**
 * C(n, k) = n(n-1)...(n-k+1)/k! for an integer n of any sign and k >= 0, with k as given (the
 * caller may swap k with n - k first when n >= 0). A product of k consecutive integers is divisible
 * by k!, so the one division is exact.
 */
export function fallingBinomial(n: bigint, k: number): bigint {
  if (k <= 16) {
    // Each partial product of i consecutive integers is divisible by i!, so every step is exact.
    let r = 1n;
    for (let i = 1; i <= k; i++) r = (r * (n - BigInt(k - i))) / BigInt(i);
    return r;
  }
  return consecutiveProduct(n - BigInt(k - 1), k) / rangeProduct(2, k, 1);
}

/** C(n, k) for integers n (any sign) and k, with C(n, k) = 0 for k < 0; k or n - k must be small. */
export function binomial(n: Int, k: Int, kMax: number): Int | undefined {
  if (typeof n === 'number' && typeof k === 'number' && n >= 0 && n <= 60) {
    if (k < 0 || k > n) return 0;
    return smallBinomial(n, Math.min(k, n - k));
  }
  const N = toBig(n),
    K = toBig(k);
  if (K < 0n) return 0;
  if (N >= 0n) {
    if (K > N) return 0;
    const j = K < N - K ? K : N - K;
    if (j > BigInt(kMax)) return undefined;
    if (N <= 60n) return smallBinomial(Number(N), Number(j));
    return normBig(fallingBinomial(N, Number(j)));
  }
  // n < 0: the polynomial in n, which is (-1)^k C(k - n - 1, k) (upper negation).
  if (K > BigInt(kMax)) return undefined;
  return normBig(fallingBinomial(N, Number(K)));
}

/** C(n, k) for 0 <= k <= n <= 60 without bigints where the intermediate products stay safe. */
function smallBinomial(n: number, k: number): Int {
  let r = 1;
  for (let i = 1; i <= k; i++) {
    const p = r * (n - k + i); // r = C(n-k+i-1, i-1), so p / i = C(n-k+i, i) exactly
    if (!Number.isSafeInteger(p)) return normBig(fallingBinomial(BigInt(n), k));
    r = p / i;
  }
  return r;
}

/** The n-th Catalan number C(2n, n)/(n+1), n >= 0. */
export function catalan(n: number): Int {
  return normBig(fallingBinomial(BigInt(2 * n), n) / BigInt(n + 1));
}

// ---- Stirling and Bell numbers: triangles by their recurrences, small rows cached. ----

const CACHED_ROWS = 200;
const stirling1Rows: Int[][] = [[1]];
const stirling2Rows: Int[][] = [[1]];

/** Row n of a triangle with T(n, k) = T(n-1, k-1) + mult(n, k) T(n-1, k), T(0, 0) = 1. */
function nextRow(prev: readonly Int[], n: number, mult: (n: number, k: number) => number): Int[] {
  const row = new Array<Int>(n + 1);
  for (let k = 0; k <= n; k++) {
    const left = k >= 1 ? prev[k - 1] : 0;
    const up = k <= n - 1 ? imul(mult(n, k), prev[k]) : 0;
    row[k] = iadd(left, up);
  }
  return row;
}

const mult1 = (n: number) => n - 1; // c(n, k) = c(n-1, k-1) + (n-1) c(n-1, k)
const mult2 = (_n: number, k: number) => k; // S(n, k) = S(n-1, k-1) + k S(n-1, k)

function triangleEntry(rows: Int[][], mult: (n: number, k: number) => number, n: number, k: number): Int {
  if (k < 0 || k > n) return 0;
  const cached = Math.min(n, CACHED_ROWS);
  while (rows.length <= cached) rows.push(nextRow(rows[rows.length - 1], rows.length, mult));
  if (n <= CACHED_ROWS) return rows[n][k];
  // Beyond the cache: roll one row forward, keeping only columns 0..k.
  let row: Int[] = rows[CACHED_ROWS].slice(0, k + 1);
  for (let m = CACHED_ROWS + 1; m <= n; m++) {
    const width = Math.min(m, k);
    const next = new Array<Int>(width + 1);
    for (let j = 0; j <= width; j++) {
      const left = j >= 1 ? row[j - 1] : 0;
      const up = j <= m - 1 && j < row.length ? imul(mult(m, j), row[j]) : 0;
      next[j] = iadd(left, up);
    }
    row = next;
  }
  return row[k];
}

/** Unsigned Stirling number of the first kind c(n, k): permutations of n with k cycles. */
export function stirling1(n: number, k: number): Int {
  return triangleEntry(stirling1Rows, mult1, n, k);
}

/** Stirling number of the second kind S(n, k): partitions of an n-set into k blocks. */
export function stirling2(n: number, k: number): Int {
  return triangleEntry(stirling2Rows, mult2, n, k);
}

// Bell numbers by the Bell triangle (Aitken's array): each row starts with the last entry of the
// previous row, and each entry is its left neighbour plus the entry above that neighbour. The
// first entries of the rows are B(0), B(1), ...
const bells: Int[] = [1];
let bellRow: Int[] = [1];

/** The Bell number B(n): set partitions of an n-set. */
export function bell(n: number): Int {
  while (bells.length <= n) {
    const next = new Array<Int>(bellRow.length + 1);
    next[0] = bellRow[bellRow.length - 1];
    for (let j = 1; j <= bellRow.length; j++) next[j] = iadd(next[j - 1], bellRow[j - 1]);
    bellRow = next;
    bells.push(next[0]);
  }
  return bells[n];
}

/** F(n) with F(0) = 0, F(1) = 1, extended to negative n by F(-n) = (-1)^(n+1) F(n). */
export function fibonacci(n: number): Int {
  if (n < 0) {
    const f = fibonacci(-n);
    return -n % 2 === 0 ? (typeof f === 'number' ? -f + 0 : normBig(-f)) : f;
  }
  if (n <= 78) {
    // F(78) < 2^53, so plain numbers are exact.
    let a = 0,
      b = 1;
    for (let i = 0; i < n; i++) [a, b] = [b, a + b];
    return a;
  }
  // Fast doubling: F(2m) = F(m) (2F(m+1) - F(m)), F(2m+1) = F(m)^2 + F(m+1)^2.
  let a = 0n,
    b = 1n; // F(m), F(m+1) with m = the bits of n read so far
  for (let bit = 31 - Math.clz32(n); bit >= 0; bit--) {
    const c = a * (2n * b - a);
    const d = a * a + b * b;
    if ((n >> bit) & 1) {
      a = d;
      b = c + d;
    } else {
      a = c;
      b = d;
    }
  }
  return normBig(a);
}
