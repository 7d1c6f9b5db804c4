// From residues modulo several primes back to rationals: Chinese remaindering, then rational
// reconstruction (Wang, "A p-adic algorithm for univariate partial fractions", SYMSAC 1981; the
// bound |n|, d <= sqrt(M/2) makes the answer unique: von zur Gathen and Gerhard, Modern Computer
// Algebra, 3rd ed., Section 5.10). A vector is reconstructed with a running common denominator,
// so after the first few entries the rest are recovered as plain integers.

import { bigGcd } from '../../numbers/integer.js';

/** Integers known modulo `modulus` (0 <= values[i] < modulus). */
export interface ResidueVector {
  readonly length: number;
  readonly modulus: bigint;
  readonly values: readonly bigint[];
}

/** x ≡ a (mod m), x ≡ b (mod p) with 0 <= x < m p, for coprime m and p. */
export class CrtVector implements ResidueVector {
  modulus = 1n;
  values: bigint[];

  constructor(readonly length: number) {
    this.values = new Array<bigint>(length).fill(0n);
  }

  /** Fold in the residues modulo a new prime p. */
  add(residues: ArrayLike<number>, p: number): void {
    const m = this.modulus;
    const P = BigInt(p);
    const mModP = Number(m % P);
    const inv = BigInt(invModBig(mModP, p));
    for (let i = 0; i < this.length; i++) {
      const a = this.values[i];
      const aModP = Number(a % P);
      let diff = residues[i] - aModP;
      if (diff < 0) diff += p;
      if (diff !== 0) this.values[i] = a + m * ((BigInt(diff) * inv) % P);
    }
    this.modulus = m * P;
  }
}

function invModBig(a: number, p: number): number {
  // p < 2^23, so plain doubles are exact here.
  let r0 = p,
    r1 = a,
    t0 = 0,
    t1 = 1;
  while (r1 !== 0) {
    const q = Math.floor(r0 / r1);
    [r0, r1] = [r1, r0 - q * r1];
    [t0, t1] = [t1, t0 - q * t1];
  }
  return t0 < 0 ? t0 + p : t0;
}

/** floor(sqrt(n)) for n >= 0, by Newton's method on integers. */
export function isqrt(n: bigint): bigint {
  if (n < 2n) return n;
  let x = 1n << BigInt((n.toString(2).length >> 1) + 1);
  for (;;) {
    const y = (x + n / x) >> 1n;
    if (y >= x) return x;
    x = y;
  }
}

/**
 * The fraction n/d with |n| <= bound, 0 < d <= bound and n ≡ a d (mod m), if there is one
 * (unique when 2 bound^2 < m). Returns null otherwise.
 */
export function rationalReconstruct(a: bigint, m: bigint, bound: bigint): [bigint, bigint] | null {
  a %= m;
  if (a < 0n) a += m;
  if (a <= bound) return [a, 1n];
  if (m - a <= bound) return [a - m, 1n];
  let r0 = m,
    r1 = a,
    t0 = 0n,
    t1 = 1n;
  while (r1 > bound) {
    const q = r0 / r1;
    [r0, r1] = [r1, r0 - q * r1];
    [t0, t1] = [t1, t0 - q * t1];
  }
  if (t1 === 0n) return null;
  let n = r1,
    d = t1;
  if (d < 0n) {
    n = -n;
    d = -d;
  }
  if (d > bound || bigGcd(n, d) !== 1n) return null;
  return [n, d];
}

/** A rational vector with one denominator: entry i is nums[i] / den. */
export interface CommonFraction {
  nums: bigint[];
  den: bigint;
}

/**
 * Rational reconstruction of every entry, sharing denominators: entry i is reconstructed from
 * (value_i * D) mod M, where D is the product of the denominators found so far. Null when some
 * entry has no reconstruction within the bound (more primes are needed).
 */
export function reconstructVector(crt: ResidueVector): CommonFraction | null {
  const m = crt.modulus;
  const bound = isqrt(m / 2n);
  const nums: bigint[] = new Array(crt.length);
  const dens: bigint[] = new Array(crt.length);
  let D = 1n;
  for (let i = 0; i < crt.length; i++) {
    const v = D === 1n ? crt.values[i] : (crt.values[i] * D) % m;
    const r = rationalReconstruct(v, m, bound);
    if (!r) return null;
    D *= r[1];
    if (D > bound) return null;
    nums[i] = r[0];
    dens[i] = D;
  }
  // Entry i is nums[i] / dens[i]; bring all to the final denominator D.
  for (let i = 0; i < crt.length; i++) if (dens[i] !== D) nums[i] *= D / dens[i];
  return { nums, den: D };
}

/** Whether the fraction vector agrees with the residues modulo p (nums ≡ x * den). */
export function agreesModP(f: CommonFraction, residues: ArrayLike<number>, p: number): boolean {
  const P = BigInt(p);
  let den = Number(f.den % P);
  if (den < 0) den += p;
  for (let i = 0; i < f.nums.length; i++) {
    let n = Number(f.nums[i] % P);
    if (n < 0) n += p;
    // residues[i] * den mod p, exactly: both are below 2^23.
    const prod = residues[i] * den;
    if (prod % p !== n) return false;
  }
  return true;
}
