// Sequences computed from their defining sums and products (not from the recurrences under test).

import { normBig, type Int } from '../../../src/numbers/integer.js';

export function binom(n: number, k: number): bigint {
  if (k < 0 || k > n) return 0n;
  let r = 1n;
  for (let i = 1; i <= k; i++) r = (r * BigInt(n - k + i)) / BigInt(i);
  return r;
}

export function fact(n: number): bigint {
  let r = 1n;
  for (let i = 2; i <= n; i++) r *= BigInt(i);
  return r;
}

export function terms(from: number, to: number, f: (n: number) => bigint): Int[] {
  const out: Int[] = [];
  for (let n = from; n <= to; n++) out.push(normBig(f(n)));
  return out;
}

export const catalan = (n: number) => binom(2 * n, n) / BigInt(n + 1);
/** Motzkin numbers, OEIS A001006: sum_k C(n, 2k) Catalan(k). */
export const motzkin = (n: number) => {
  let s = 0n;
  for (let k = 0; 2 * k <= n; k++) s += binom(n, 2 * k) * catalan(k);
  return s;
};
/** Central Delannoy numbers, OEIS A001850: sum_k C(n, k) C(n + k, k). */
export const delannoy = (n: number) => {
  let s = 0n;
  for (let k = 0; k <= n; k++) s += binom(n, k) * binom(n + k, k);
  return s;
};
/** Franel numbers, OEIS A000172: sum_k C(n, k)^3. */
export const franel = (n: number) => {
  let s = 0n;
  for (let k = 0; k <= n; k++) s += binom(n, k) ** 3n;
  return s;
};
/** Apéry numbers, OEIS A005259: sum_k (C(n, k) C(n + k, k))^2. */
export const apery = (n: number) => {
  let s = 0n;
  for (let k = 0; k <= n; k++) s += (binom(n, k) * binom(n + k, k)) ** 2n;
  return s;
};
/** Baxter permutations, OEIS A001181 (n >= 1): sum_{k=1..n} C(n+1,k-1) C(n+1,k) C(n+1,k+1) / (C(n+1,1) C(n+1,2)). */
export const baxter = (n: number) => {
  let s = 0n;
  for (let k = 1; k <= n; k++) s += binom(n + 1, k - 1) * binom(n + 1, k) * binom(n + 1, k + 1);
  return s / (binom(n + 1, 1) * binom(n + 1, 2));
};
/** Alternating sign matrices, OEIS A005130: prod_{k=0}^{n-1} (3k+1)!/(n+k)!. */
export const asm = (n: number) => {
  let num = 1n,
    den = 1n;
  for (let k = 0; k < n; k++) {
    num *= fact(3 * k + 1);
    den *= fact(n + k);
  }
  return num / den;
};
export const fibonacci = (n: number) => {
  let a = 0n,
    b = 1n;
  for (let i = 0; i < n; i++) [a, b] = [b, a + b];
  return a;
};
/** Pell numbers, OEIS A000129: sum_k C(n, 2k+1) 2^k. */
export const pell = (n: number) => {
  let s = 0n;
  for (let k = 0; 2 * k + 1 <= n; k++) s += binom(n, 2 * k + 1) * 2n ** BigInt(k);
  return s;
};
/** Large Schröder numbers, OEIS A006318 (r(0) = 1): sum_k C(n+k, 2k) Catalan(k). */
export const schroeder = (n: number) => {
  let s = 0n;
  for (let k = 0; k <= n; k++) s += binom(n + k, 2 * k) * catalan(k);
  return s;
};
