// Chinese remaindering and rational reconstruction (src/algebra/linear/reconstruction.ts):
// round trips on random fractions, and the uniqueness bound of von zur Gathen and Gerhard,
// Modern Computer Algebra, Theorem 5.26 (|n|, d <= sqrt(M/2)).

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { modPrime } from '../../../src/algebra/linear/modular.js';
import { agreesModP, CrtVector, isqrt, rationalReconstruct, reconstructVector } from '../../../src/algebra/linear/reconstruction.js';
import { bigGcd } from '../../../src/numbers/integer.js';

const modOf = (n: bigint, d: bigint, p: number): number => {
  const P = BigInt(p);
  // n * d^-1 mod p via Fermat's little theorem, in BigInt.
  let inv = 1n,
    b = ((d % P) + P) % P,
    e = P - 2n;
  while (e > 0n) {
    if (e & 1n) inv = (inv * b) % P;
    b = (b * b) % P;
    e >>= 1n;
  }
  return Number(((((n % P) + P) % P) * inv) % P);
};

describe('rational reconstruction', () => {
  it('isqrt is the integer square root', () => {
    fc.assert(
      fc.property(fc.bigInt({ min: 0n, max: 10n ** 40n }), (n) => {
        const r = isqrt(n);
        expect(r * r <= n && (r + 1n) * (r + 1n) > n).toBe(true);
      }),
    );
  });
  it('recovers n/d from n d^-1 mod M whenever |n|, d <= sqrt(M/2)', () => {
    fc.assert(
      fc.property(fc.bigInt({ min: -(10n ** 12n), max: 10n ** 12n }), fc.bigInt({ min: 1n, max: 10n ** 12n }), (n0, d0) => {
        const g = bigGcd(n0, d0) || 1n;
        const n = n0 / g,
          d = d0 / g;
        const crt = new CrtVector(1);
        for (let k = 0; k < 4; k++) crt.add([modOf(n, d, modPrime(k))], modPrime(k)); // M ~ 2^92
        const bound = isqrt(crt.modulus / 2n);
        expect(rationalReconstruct(crt.values[0], crt.modulus, bound)).toEqual([n, d]);
      }),
    );
  });
  // As the solver does it: add primes until the reconstruction exists and agrees modulo one more
  // prime; it is then the true vector. (With too few primes the shared denominator can push a
  // numerator past the bound, and reconstructVector rightly answers null: more primes needed.)
  it('reconstructs vectors with a common denominator once enough primes agree', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.integer({ min: -1000, max: 1000 }), fc.integer({ min: 1, max: 50 })), { minLength: 1, maxLength: 8 }),
        (fr) => {
          const crt = new CrtVector(fr.length);
          const residues = (k: number) => fr.map(([n, d]) => modOf(BigInt(n), BigInt(d), modPrime(k)));
          let v: ReturnType<typeof reconstructVector> = null;
          for (let k = 0; k < 8; k++) {
            crt.add(residues(k), modPrime(k));
            v = reconstructVector(crt);
            if (v && agreesModP(v, residues(k + 1), modPrime(k + 1))) break;
            v = null;
          }
          expect(v).not.toBeNull();
          fr.forEach(([n, d], i) => expect(v!.nums[i] * BigInt(d)).toBe(BigInt(n) * v!.den));
        },
      ),
    );
  });
  it('fails rather than guesses when the modulus is too small', () => {
    const p = modPrime(0);
    const crt = new CrtVector(1);
    crt.add([modOf(123456789n, 987654321n, p)], p); // needs M > 2 * 10^18
    const v = reconstructVector(crt);
    expect(v === null || v.nums[0] * 987654321n !== 123456789n * v.den).toBe(true);
  });
});
