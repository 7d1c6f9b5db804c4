// Exact primality by the Miller–Rabin strong-probable-prime test with a fixed set of bases for which
// the test is proved deterministic below a bound. The bounds are the least strong pseudoprimes to
// all of the first k prime bases (OEIS A014233): psi_4 = 3215031751 (Pomerance, Selfridge and
// Wagstaff 1980; Jaeschke 1993) and psi_13 = 3317044064679887385961981 (Sorenson and Webster,
// "Strong pseudoprimes to twelve prime bases", Math. Comp. 86 (2017)). Past psi_13 no such proof
// exists, so isPrime refuses rather than guess.

import type { Int } from '../../numbers/integer.js';

const SMALL_PRIMES = [2, 3, 5, 7, 11, 13, 17, 19, 23, 29, 31, 37, 41, 43, 47, 53, 59, 61, 67, 71, 73, 79, 83, 89, 97];

/** Below this, bases 2, 3, 5, 7 decide primality. */
export const PSI4 = 3215031751;
/** Below this, the first 13 prime bases 2, ..., 41 decide primality. */
export const PSI13 = 3317044064679887385961981n;
const BASES13 = [2n, 3n, 5n, 7n, 11n, 13n, 17n, 19n, 23n, 29n, 31n, 37n, 41n];

/** b^e mod m for numbers with m < 2^26, so every product of two residues is exact. */
function powModSmall(b: number, e: number, m: number): number {
  let r = 1;
  b %= m;
  while (e > 0) {
    if (e & 1) r = (r * b) % m;
    b = (b * b) % m;
    e = Math.floor(e / 2);
  }
  return r;
}

function powModBig(b: bigint, e: bigint, m: bigint): bigint {
  let r = 1n;
  b %= m;
  while (e > 0n) {
    if (e & 1n) r = (r * b) % m;
    b = (b * b) % m;
    e >>= 1n;
  }
  return r;
}

/**
 * Whether odd n > 2 is a strong probable prime to base a (a not divisible by n): with
 * n - 1 = d 2^s, d odd, either a^d = 1 or a^(d 2^r) = -1 mod n for some 0 <= r < s.
 */
export function isStrongProbablePrime(n: bigint, a: bigint): boolean {
  let d = n - 1n,
    s = 0;
  while ((d & 1n) === 0n) {
    d >>= 1n;
    s++;
  }
  let x = powModBig(a, d, n);
  if (x === 1n || x === n - 1n) return true;
  for (let r = 1; r < s; r++) {
    x = (x * x) % n;
    if (x === n - 1n) return true;
  }
  return false;
}

function isSprpSmall(n: number, a: number): boolean {
  let d = n - 1,
    s = 0;
  while (d % 2 === 0) {
    d /= 2;
    s++;
  }
  let x = powModSmall(a, d, n);
  if (x === 1 || x === n - 1) return true;
  for (let r = 1; r < s; r++) {
    x = (x * x) % n;
    if (x === n - 1) return true;
  }
  return false;
}

/** true/false, or undefined when n is at least psi_13 and no proved test applies. */
export function isPrimeExact(n: Int): boolean | undefined {
  if (typeof n === 'number') {
    if (n < 2) return false;
    for (const p of SMALL_PRIMES) {
      if (n === p) return true;
      if (n % p === 0) return false;
    }
    if (n < 97 * 97) return true;
    if (n < 2 ** 26) return [2, 3, 5, 7].every((a) => isSprpSmall(n, a)); // 2^26 < psi_4
  }
  const N = BigInt(n);
  if (N >= PSI13) return undefined;
  for (const p of SMALL_PRIMES) if (N % BigInt(p) === 0n) return false;
  return BASES13.every((a) => isStrongProbablePrime(N, a));
}
