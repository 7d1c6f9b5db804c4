// Modular arithmetic in doubles (src/algebra/linear/modular.ts) against BigInt arithmetic.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { intMod, invMod, modPrime, mulMod, PRIME_BOUND } from '../../../src/algebra/linear/modular.js';

const isPrime = (q: number) => {
  if (q < 2) return false;
  for (let d = 2; d * d <= q; d++) if (q % d === 0) return false;
  return true;
};

describe('modular arithmetic', () => {
  it('modPrime lists the primes below 2^23 downward: 8388593, 8388587, 8388581, ... (checked by trial division)', () => {
    expect(modPrime(0)).toBe(8388593);
    expect(modPrime(1)).toBe(8388587);
    for (let k = 0; k < 30; k++) {
      const q = modPrime(k);
      expect(isPrime(q) && q < PRIME_BOUND).toBe(true);
      if (k > 0) for (let x = q + 1; x < modPrime(k - 1); x++) expect(isPrime(x)).toBe(false);
    }
  });
  it('mulMod agrees with BigInt products', () => {
    fc.assert(
      fc.property(fc.nat(40), fc.nat(), fc.nat(), (k, a0, b0) => {
        const p = modPrime(k);
        const a = a0 % p,
          b = b0 % p;
        expect(mulMod(a, b, p)).toBe(Number((BigInt(a) * BigInt(b)) % BigInt(p)));
      }),
    );
    const p = modPrime(0);
    expect(mulMod(p - 1, p - 1, p)).toBe(1);
  });
  it('invMod inverts, intMod reduces bigints and negatives', () => {
    fc.assert(
      fc.property(fc.nat(40), fc.integer({ min: 1 }), fc.bigInt(), (k, a0, x) => {
        const p = modPrime(k);
        const a = a0 % p || 1;
        expect(mulMod(a, invMod(a, p), p)).toBe(1);
        const r = intMod(x, p);
        expect(BigInt(r)).toBe(((x % BigInt(p)) + BigInt(p)) % BigInt(p));
      }),
    );
  });
});
