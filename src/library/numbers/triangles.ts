// Narayana, Eulerian and Motzkin numbers, exactly (bigint, normalised to Int by the caller).

import { binomialBig } from '../../families/subsets/subsets.js';

/** N(n, k) = C(n, k) C(n, k-1) / n for 1 <= k <= n; N(0, 0) = 1; 0 elsewhere. */
export function narayana(n: number, k: number): bigint {
  if (n === 0) return k === 0 ? 1n : 0n;
  if (k < 1 || k > n) return 0n;
  return (binomialBig(n, k) * binomialBig(n, k - 1)) / BigInt(n);
}

/** A(n, k): permutations of 1..n with k descents, by A(n, k) = (k+1) A(n-1, k) + (n-k) A(n-1, k-1). */
export function eulerianRow(n: number): bigint[] {
  let row = [1n];
  for (let m = 1; m <= n; m++) {
    const next: bigint[] = new Array(m).fill(0n);
    for (let k = 0; k < m; k++) next[k] = BigInt(k + 1) * (row[k] ?? 0n) + BigInt(m - k) * (k > 0 ? (row[k - 1] ?? 0n) : 0n);
    row = next;
  }
  return row;
}

/** M(n) by (n+2) M(n) = (2n+1) M(n-1) + 3(n-1) M(n-2), M(0) = M(1) = 1 (OEIS A001006). */
export function motzkin(n: number): bigint {
  let a = 1n,
    b = 1n; // M(k-2), M(k-1)
  if (n <= 1) return 1n;
  for (let k = 2; k <= n; k++) {
    const c = (BigInt(2 * k + 1) * b + BigInt(3 * (k - 1)) * a) / BigInt(k + 2);
    a = b;
    b = c;
  }
  return b;
}
