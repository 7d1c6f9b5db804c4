// Exact arithmetic modulo word-size primes, in doubles. Every prime here is below 2^23, so a
// product of two residues is below 2^46 and exact in a double; the dense elimination uses the
// remaining 7 bits to add up to 64 products before it has to reduce (see modularKernel.ts).

/** Primes are taken downward from this bound (2^23), so the list is the same on every run. */
export const PRIME_BOUND = 1 << 23;

const primeCache: number[] = [];

function isPrimeSmall(q: number): boolean {
  if (q < 2) return false;
  if (q % 2 === 0) return q === 2;
  for (let d = 3; d * d <= q; d += 2) if (q % d === 0) return false;
  return true;
}

/** The k-th prime below PRIME_BOUND, counting down from it (k = 0 is the largest). */
export function modPrime(k: number): number {
  let q = primeCache.length ? primeCache[primeCache.length - 1] - 1 : PRIME_BOUND - 1;
  while (primeCache.length <= k) {
    while (!isPrimeSmall(q)) q--;
    primeCache.push(q);
    q--;
  }
  return primeCache[k];
}

/** a*b mod p for residues 0 <= a, b < p < 2^23: the product is exact, the quotient is corrected. */
export function mulMod(a: number, b: number, p: number): number {
  const x = a * b;
  const r = x - Math.floor(x / p) * p;
  return r < 0 ? r + p : r >= p ? r - p : r;
}

/** Reduce any exactly represented integer (|x| < 2^53) to 0..p-1. */
export function reduce(x: number, p: number): number {
  const r = x % p;
  return r < 0 ? r + p : r;
}

/** a^-1 mod p by the extended Euclidean algorithm; 0 when a = 0 (callers check). */
export function invMod(a: number, p: number): number {
  let r0 = p,
    r1 = a,
    t0 = 0,
    t1 = 1;
  while (r1 !== 0) {
    const q = Math.floor(r0 / r1);
    let t = r0 - q * r1;
    r0 = r1;
    r1 = t;
    t = t0 - q * t1;
    t0 = t1;
    t1 = t;
  }
  if (r0 !== 1) return 0;
  return t0 < 0 ? t0 + p : t0;
}

/** The residue of an integer given as number or bigint. */
export function intMod(a: number | bigint, p: number): number {
  if (typeof a === 'number') return reduce(a, p);
  const r = Number(a % BigInt(p));
  return r < 0 ? r + p : r;
}
