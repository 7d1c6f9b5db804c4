// Exact integers. A value is a JS number while it is a safe integer and a BigInt only outside
// that range, so the common case stays fast and nothing is ever rounded.
// Invariant every function here keeps: a bigint result is never within the safe range.

import { fail } from '../base/errors.js';

export type Int = number | bigint;

const MAX = BigInt(Number.MAX_SAFE_INTEGER);
const MIN = -MAX;

/** Normalise a BigInt: back to a number when it fits. */
export function normBig(b: bigint): Int {
  return b <= MAX && b >= MIN ? Number(b) : b;
}

export function isInt(v: unknown): v is Int {
  return (typeof v === 'number' && Number.isInteger(v)) || typeof v === 'bigint';
}

export function toBig(a: Int): bigint {
  return typeof a === 'bigint' ? a : BigInt(a);
}

/** A JS number for indexing and sizes; fails if the integer is too large to be one. */
export function toSmall(a: Int, what = 'value'): number {
  if (typeof a === 'number') return a;
  fail(`${what} ${a} is too large here`);
}

export function iadd(a: Int, b: Int): Int {
  if (typeof a === 'number' && typeof b === 'number') {
    const s = a + b;
    if (Number.isSafeInteger(s)) return s;
  }
  return normBig(toBig(a) + toBig(b));
}

export function isub(a: Int, b: Int): Int {
  if (typeof a === 'number' && typeof b === 'number') {
    const s = a - b;
    if (Number.isSafeInteger(s)) return s;
  }
  return normBig(toBig(a) - toBig(b));
}

export function imul(a: Int, b: Int): Int {
  if (typeof a === 'number' && typeof b === 'number') {
    const p = a * b;
    if (Number.isSafeInteger(p)) return p === 0 ? 0 : p; // no -0
  }
  return normBig(toBig(a) * toBig(b));
}

export function ineg(a: Int): Int {
  return typeof a === 'number' ? (a === 0 ? 0 : -a) : normBig(-a);
}

export function iabs(a: Int): Int {
  return isNeg(a) ? ineg(a) : a;
}

export function isZero(a: Int): boolean {
  return a === 0 || a === 0n;
}

export function isNeg(a: Int): boolean {
  return typeof a === 'number' ? a < 0 : a < 0n;
}

export function isign(a: Int): -1 | 0 | 1 {
  if (typeof a === 'number') return a < 0 ? -1 : a > 0 ? 1 : 0;
  return a < 0n ? -1 : a > 0n ? 1 : 0;
}

export function icmp(a: Int, b: Int): -1 | 0 | 1 {
  if (typeof a === 'number' && typeof b === 'number') return a < b ? -1 : a > b ? 1 : 0;
  const x = toBig(a),
    y = toBig(b);
  return x < y ? -1 : x > y ? 1 : 0;
}

export function ieq(a: Int, b: Int): boolean {
  // By the invariant, a number and a bigint are never equal.
  return a === b;
}

/** Floor division, as mathematicians expect: quo(-7, 2) = -4, so that mod is nonnegative for b > 0. */
export function iquo(a: Int, b: Int): Int {
  if (isZero(b)) fail('division by zero');
  if (typeof a === 'number' && typeof b === 'number') return Math.floor(a / b) + 0;
  const x = toBig(a),
    y = toBig(b);
  let q = x / y;
  if (x % y !== 0n && x < 0n !== y < 0n) q -= 1n;
  return normBig(q);
}

/** a - b*quo(a, b): has the sign of b (nonnegative for b > 0). */
export function imod(a: Int, b: Int): Int {
  if (isZero(b)) fail('division by zero');
  if (typeof a === 'number' && typeof b === 'number') {
    const r = a % b;
    return (r !== 0 && r < 0 !== b < 0 ? r + b : r) + 0;
  }
  const x = toBig(a),
    y = toBig(b);
  let r = x % y;
  if (r !== 0n && r < 0n !== y < 0n) r += y;
  return normBig(r);
}

export function bigGcd(a: bigint, b: bigint): bigint {
  if (a < 0n) a = -a;
  if (b < 0n) b = -b;
  while (b !== 0n) [a, b] = [b, a % b];
  return a;
}

export function igcd(a: Int, b: Int): Int {
  if (typeof a === 'number' && typeof b === 'number') {
    a = Math.abs(a);
    b = Math.abs(b);
    while (b !== 0) [a, b] = [b, a % b];
    return a;
  }
  return normBig(bigGcd(toBig(a), toBig(b)));
}

export function ilcm(a: Int, b: Int): Int {
  if (isZero(a) || isZero(b)) return 0;
  return iabs(imul(iquo(a, igcd(a, b)), b));
}

/** a^e for e >= 0. */
export function ipow(a: Int, e: number): Int {
  if (e < 0) fail('negative exponent of an integer is a rational; use 1/a^k');
  if (typeof a === 'number') {
    const p = a ** e;
    if (Number.isSafeInteger(p)) return p;
  }
  // Refuse, before trying, a power with more bits than an exact integer here may have.
  const bits = toBig(iabs(a)).toString(2).length;
  if (bits > 1 && (bits - 1) * e > MAX_POWER_BITS)
    fail(
      `${bits <= 64 ? intToString(a) : `(a number of ${Math.round(bits / 3.3219)} digits)`}^${e} would have about ${Math.round(((bits - 1) * e) / 3.3219)} digits; hunch computes exact integers of at most about ${Math.round(MAX_POWER_BITS / 3.3219)} digits`,
    );
  return normBig(toBig(a) ** BigInt(e));
}

/** The largest power ipow computes, in bits (about 20 million digits). */
export const MAX_POWER_BITS = 2 ** 26;

/** Parse a decimal integer literal exactly. */
export function parseInt10(text: string): Int {
  return normBig(BigInt(text));
}

export function intToString(a: Int): string {
  return a.toString();
}

/** n! as an exact integer. */
export function factorialInt(n: number): Int {
  if (n < 0) fail(`factorial of a negative number (${n})`);
  let r: Int = 1;
  for (let i = 2; i <= n; i++) r = imul(r, i);
  return r;
}

/** Binomial coefficient C(n, k), 0 outside 0 <= k <= n. */
export function binomialInt(n: number, k: number): Int {
  if (k < 0 || k > n || n < 0) return 0;
  k = Math.min(k, n - k);
  let r = 1n;
  for (let i = 1; i <= k; i++) r = (r * BigInt(n - k + i)) / BigInt(i);
  return normBig(r);
}
