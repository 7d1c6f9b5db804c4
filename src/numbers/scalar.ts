// Arithmetic on Scalar = Int | Rat with the integer fast path first.

import { fail } from '../base/errors.js';
import { iadd, icmp, imul, ineg, isub, isZero, Int, toBig, normBig, ipow } from './integer.js';
import { makeRat, Rat, Scalar, numOf, denOf } from './rational.js';

export function sadd(a: Scalar, b: Scalar): Scalar {
  if (!(a instanceof Rat) && !(b instanceof Rat)) return iadd(a, b);
  return makeRat(numOf(a) * denOf(b) + numOf(b) * denOf(a), denOf(a) * denOf(b));
}

export function ssub(a: Scalar, b: Scalar): Scalar {
  if (!(a instanceof Rat) && !(b instanceof Rat)) return isub(a, b);
  return makeRat(numOf(a) * denOf(b) - numOf(b) * denOf(a), denOf(a) * denOf(b));
}

export function smul(a: Scalar, b: Scalar): Scalar {
  if (!(a instanceof Rat) && !(b instanceof Rat)) return imul(a, b);
  return makeRat(numOf(a) * numOf(b), denOf(a) * denOf(b));
}

export function sdiv(a: Scalar, b: Scalar): Scalar {
  if (sisZero(b)) fail('division by zero');
  if (typeof a === 'number' && typeof b === 'number' && a % b === 0) return a / b + 0;
  return makeRat(numOf(a) * denOf(b), denOf(a) * numOf(b));
}

export function sneg(a: Scalar): Scalar {
  return a instanceof Rat ? new Rat(-a.num, a.den) : ineg(a);
}

export function sisZero(a: Scalar): boolean {
  return !(a instanceof Rat) && isZero(a);
}

export function sisOne(a: Scalar): boolean {
  return a === 1;
}

export function scmp(a: Scalar, b: Scalar): -1 | 0 | 1 {
  if (!(a instanceof Rat) && !(b instanceof Rat)) return icmp(a, b);
  const x = numOf(a) * denOf(b),
    y = numOf(b) * denOf(a);
  return x < y ? -1 : x > y ? 1 : 0;
}

export function seq(a: Scalar, b: Scalar): boolean {
  if (a instanceof Rat) return b instanceof Rat && a.num === b.num && a.den === b.den;
  return a === b;
}

/** a^e for any integer e (negative exponents invert). */
export function spow(a: Scalar, e: number): Scalar {
  if (e >= 0) {
    if (!(a instanceof Rat)) return ipow(a, e);
    return new Rat(a.num ** BigInt(e), a.den ** BigInt(e));
  }
  if (sisZero(a)) fail('division by zero: 0 to a negative power');
  return sdiv(1, spow(a, -e));
}

export function sIsInteger(a: Scalar): a is Int {
  return !(a instanceof Rat);
}

/** Largest integer <= a. */
export function sfloor(a: Scalar): Int {
  if (!(a instanceof Rat)) return a;
  let q = a.num / a.den;
  if (a.num < 0n) q -= 1n; // den > 1 so the division was inexact
  return normBig(q);
}

export function sceil(a: Scalar): Int {
  if (!(a instanceof Rat)) return a;
  let q = a.num / a.den;
  if (a.num > 0n) q += 1n;
  return normBig(q);
}

export function sabs(a: Scalar): Scalar {
  return scmp(a, 0) < 0 ? sneg(a) : a;
}

export function scalarToString(a: Scalar): string {
  return a.toString();
}

export { toBig };
