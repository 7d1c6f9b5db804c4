// Monotone triangles of order n, the form in which asms(n) works: rows 1..n, row k a strictly
// increasing k-tuple, each row interlacing the next (a[k+1][i] <= a[k][i] <= a[k+1][i+1]), the last
// row 1, 2, ..., n. Row k lists the columns where the first k rows of the alternating sign matrix
// sum to 1 (Mills, Robbins and Rumsey, J. Combin. Theory A 34 (1983)). Stored flat: entry (k, i),
// both 1-based, at index k(k-1)/2 + i - 1.

export const at = (k: number, i: number) => (k * (k - 1)) / 2 + i - 1;

/** The smallest (componentwise) monotone triangle: row k = 1..k. */
export function bottomTriangle(n: number): number[] {
  const t: number[] = [];
  for (let k = 1; k <= n; k++) for (let i = 1; i <= k; i++) t.push(i);
  return t;
}

/** The largest: row k = n-k+1..n. */
export function topTriangle(n: number): number[] {
  const t: number[] = [];
  for (let k = 1; k <= n; k++) for (let i = 1; i <= k; i++) t.push(n - k + i);
  return t;
}

/** The interval an entry (k, i), k < n, may take given all the others. */
export function entryRange(t: readonly number[], k: number, i: number): [number, number] {
  let lo = t[at(k + 1, i)],
    hi = t[at(k + 1, i + 1)];
  if (i > 1) {
    lo = Math.max(lo, t[at(k, i - 1)] + 1);
    if (k > 1) lo = Math.max(lo, t[at(k - 1, i - 1)]);
  }
  if (i < k) {
    hi = Math.min(hi, t[at(k, i + 1)] - 1);
    if (k > 1) hi = Math.min(hi, t[at(k - 1, i)]);
  }
  return [lo, hi];
}

/**
 * One move of the monotone chain: raise (up) or lower entry (k, i) by one when that keeps a
 * monotone triangle. Monotone: if s <= t componentwise, the same move keeps s <= t.
 */
export function move(t: number[], k: number, i: number, up: boolean): void {
  const [lo, hi] = entryRange(t, k, i);
  const e = at(k, i);
  if (up) {
    if (t[e] < hi) t[e]++;
  } else if (t[e] > lo) t[e]--;
}

/** Write the alternating sign matrix of triangle t into rows (n x n). */
export function triangleToAsm(t: readonly number[], n: number, rows: number[][]): void {
  for (let k = 1; k <= n; k++) {
    const r = rows[k - 1];
    r.fill(0);
    for (let i = 1; i <= k; i++) r[t[at(k, i)] - 1] += 1;
    for (let i = 1; i < k; i++) r[t[at(k - 1, i)] - 1] -= 1;
  }
}

export function asmToTriangle(rows: readonly (readonly number[])[]): number[] {
  const n = rows.length;
  const sums = new Array<number>(n).fill(0);
  const t: number[] = [];
  for (let k = 0; k < n; k++) {
    for (let j = 0; j < n; j++) sums[j] += rows[k][j];
    for (let j = 0; j < n; j++) if (sums[j] === 1) t.push(j + 1);
  }
  return t;
}
