// Arithmetic modulo a prime p < 2^31 in doubles. A product of two residues can exceed 2^53 when
// p > 2^26.5, so `mulModP` splits one factor into 16-bit halves there (every partial product
// then stays below 2^47); for smaller p the product is exact and one floor division reduces it.

import { fail } from '../../base/errors.js';
import { Rat, type Scalar } from '../../numbers/rational.js';

/** Below this bound a product of two residues is exact in a double. */
export const EXACT_PRODUCT_BOUND = 94906265; // floor(sqrt(2^53))

export function isPrime(q: number): boolean {
  if (!Number.isSafeInteger(q) || q < 2) return false;
  if (q % 2 === 0) return q === 2;
  if (q % 3 === 0) return q === 3;
  for (let d = 5; d * d <= q; d += 6) if (q % d === 0 || q % (d + 2) === 0) return false;
  return true;
}

/** Fails unless p is a prime below 2^31. */
export function checkPrime(p: number): void {
  if (!Number.isSafeInteger(p) || p < 2 || p >= 2 ** 31 || !isPrime(p)) fail(`the characteristic must be a prime below 2^31, not ${p}`);
}

/** a*b mod p for residues 0 <= a, b < p < 2^31. */
export function mulModP(a: number, b: number, p: number): number {
  if (p < EXACT_PRODUCT_BOUND) {
    const x = a * b;
    return x - Math.floor(x / p) * p;
  }
  const hi = Math.floor(b / 65536),
    lo = b - hi * 65536;
  let r = a * hi;
  r -= Math.floor(r / p) * p;
  r = r * 65536 + a * lo;
  return r - Math.floor(r / p) * p;
}

/** a^-1 mod p (a not divisible by p), by the extended Euclidean algorithm. */
export function invModP(a: number, p: number): number {
  let r0 = p,
    r1 = a % p,
    t0 = 0,
    t1 = 1;
  if (r1 < 0) r1 += p;
  while (r1 !== 0) {
    const q = Math.floor(r0 / r1);
    let t = r0 - q * r1;
    r0 = r1;
    r1 = t;
    t = t0 - q * t1;
    t0 = t1;
    t1 = t;
  }
  if (r0 !== 1) fail(`${a} is not invertible modulo ${p}`);
  return t0 < 0 ? t0 + p : t0;
}

function intModP(a: number | bigint, p: number): number {
  if (typeof a === 'number') {
    const r = a % p;
    return r < 0 ? r + p : r;
  }
  const r = Number(a % BigInt(p));
  return r < 0 ? r + p : r;
}

/** The residue of an exact number modulo p; fails when p divides its denominator. */
export function scalarModP(a: Scalar, p: number): number {
  if (!(a instanceof Rat)) return intModP(a, p);
  const d = intModP(a.den, p);
  if (d === 0) fail(`the coefficient ${a.toString()} has no value modulo ${p} (its denominator is divisible by ${p})`);
  return mulModP(intModP(a.num, p), invModP(d, p), p);
}

/** The residue of an exact number modulo p, or -1 when p divides its denominator. */
export function scalarModPOrNone(a: Scalar, p: number): number {
  if (!(a instanceof Rat)) return intModP(a, p);
  const d = intModP(a.den, p);
  if (d === 0) return -1;
  return mulModP(intModP(a.num, p), invModP(d, p), p);
}

const primeList: number[] = [];

/**
 * The k-th prime counting down from 2^21 (k = 0 is the largest). The modular Gröbner basis
 * computations over Q use these: at this size (p-1)^2 * 2048 < 2^53, so row reductions can add
 * up 2048 products before they must reduce.
 */
export function reconstructionPrime(k: number): number {
  let q = primeList.length ? primeList[primeList.length - 1] - 1 : 2 ** 21 - 1;
  while (primeList.length <= k) {
    while (!isPrime(q)) q--;
    primeList.push(q);
    q--;
  }
  return primeList[k];
}
