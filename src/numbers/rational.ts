// Exact rationals. A rational with denominator 1 is never a Rat: it is an Int. So a Rat always
// has den > 1 and gcd(num, den) = 1, and equality of normalised values is structural.

import { fail } from '../base/errors.js';
import { bigGcd, Int, isInt, normBig, toBig } from './integer.js';

export class Rat {
  /** Use makeRat: the constructor trusts that (num, den) is normalised with den > 1. */
  constructor(
    readonly num: bigint,
    readonly den: bigint,
  ) {}

  toString(): string {
    return `${this.num}/${this.den}`;
  }
}

/** An integer or a rational. */
export type Scalar = Int | Rat;

export function isScalar(v: unknown): v is Scalar {
  return isInt(v) || v instanceof Rat;
}

/** num/den, normalised; an Int when the denominator divides. */
export function makeRat(num: bigint, den: bigint): Scalar {
  if (den === 0n) fail('division by zero');
  if (den < 0n) {
    num = -num;
    den = -den;
  }
  const g = bigGcd(num, den);
  if (g !== 1n) {
    num /= g;
    den /= g;
  }
  return den === 1n ? normBig(num) : new Rat(num, den);
}

export function numOf(a: Scalar): bigint {
  return a instanceof Rat ? a.num : toBig(a);
}

export function denOf(a: Scalar): bigint {
  return a instanceof Rat ? a.den : 1n;
}

/** Parse "3/7", "-2", "12" exactly. */
export function parseScalar(text: string): Scalar {
  const m = /^\s*(-?\d+)\s*(?:\/\s*(-?\d+)\s*)?$/.exec(text);
  if (!m) fail(`not an exact number: ${JSON.stringify(text)}`);
  return makeRat(BigInt(m[1]), m[2] === undefined ? 1n : BigInt(m[2]));
}
