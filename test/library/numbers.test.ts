// Numbers and sequences (src/library/numbers.ts) against OEIS tables and second algorithms.

import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import '../../src/library/numbers.js';
import { getFunction } from '../../src/library/registry.js';
import { Int, normBig } from '../../src/numbers/integer.js';
import { makeRat } from '../../src/numbers/rational.js';
import { EvalError } from '../../src/base/errors.js';
import { isStrongProbablePrime } from '../../src/library/numbers/primality.js';
import type { Value } from '../../src/values/value.js';

const call = (name: string, ...args: Value[]): Value => getFunction(name)!.impl(...args);
const big = (v: Value): bigint => BigInt(v as Int);
/** Results are normalised: a bigint never lies in the safe range. */
const MAX = BigInt(Number.MAX_SAFE_INTEGER);
const normal = (v: Value): boolean => typeof v !== 'bigint' || v > MAX || v < -MAX;
const intArb = fc.oneof(fc.integer({ min: -1000, max: 1000 }), fc.bigInt({ min: -(10n ** 30n), max: 10n ** 30n }).map(normBig));

describe('factorials', () => {
  it('factorial matches OEIS A000142', () => {
    const a000142 = [1, 1, 2, 6, 24, 120, 720, 5040, 40320, 362880, 3628800];
    expect(a000142.map((_, n) => call('factorial', n))).toEqual(a000142);
  });
  it('factorial promotes to bigint and agrees with a plain product (second algorithm)', () => {
    let p = 1n;
    for (let n = 1; n <= 300; n++) {
      p *= BigInt(n);
      const f = call('factorial', n);
      expect(big(f)).toBe(p);
      expect(normal(f)).toBe(true);
    }
    expect(typeof call('factorial', 18)).toBe('number');
    expect(typeof call('factorial', 19)).toBe('bigint'); // 19! > 2^53
  });
  it('doubleFactorial of odd numbers matches OEIS A001147, of even ones A000165', () => {
    const a001147 = [1, 1, 3, 15, 105, 945, 10395, 135135, 2027025, 34459425, 654729075];
    expect(a001147.map((_, n) => call('doubleFactorial', 2 * n - 1))).toEqual(a001147);
    const a000165 = [1, 2, 8, 48, 384, 3840, 46080, 645120, 10321920];
    expect(a000165.map((_, n) => call('doubleFactorial', 2 * n))).toEqual(a000165);
  });
  it('n!! * (n-1)!! = n! (second algorithm), also past the safe range', () => {
    for (let n = 1; n <= 120; n++)
      expect(big(call('doubleFactorial', n)) * big(call('doubleFactorial', n - 1))).toBe(big(call('factorial', n)));
  });
  it('rejects arguments out of range with a clear message', () => {
    expect(() => call('factorial', -1)).toThrow(/factorial\(n\) needs n >= 0, got n = -1/);
    expect(() => call('factorial', 10n ** 20n)).toThrow(EvalError);
    expect(() => call('doubleFactorial', -2)).toThrow(/n >= -1/);
  });
});

describe('binomial', () => {
  it("matches Pascal's triangle (OEIS A007318) built by addition, up to n = 120", () => {
    let row: bigint[] = [1n];
    for (let n = 0; n <= 120; n++) {
      for (let k = -2; k <= n + 2; k++) {
        const v = call('binomial', n, k);
        expect(big(v)).toBe(k < 0 || k > n ? 0n : row[k]);
        expect(normal(v)).toBe(true);
      }
      row = [1n, ...row.slice(1).map((x, i) => x + row[i]), 1n];
    }
  });
  it('first rows of OEIS A007318', () => {
    expect([0, 1, 2, 3, 4, 5, 6].map((k) => call('binomial', 6, k))).toEqual([1, 6, 15, 20, 15, 6, 1]);
  });
  it('negative n by upper negation, C(n, k) = (-1)^k C(k-n-1, k) (Concrete Mathematics eq. 5.14)', () => {
    expect([0, 1, 2, 3, 4].map((k) => call('binomial', -1, k))).toEqual([1, -1, 1, -1, 1]);
    for (let n = -30; n < 0; n++)
      for (let k = 0; k <= 30; k++) {
        const s = k % 2 === 0 ? 1n : -1n;
        expect(big(call('binomial', n, k))).toBe(s * big(call('binomial', k - n - 1, k)));
      }
  });
  it('huge n with small k, and symmetry for huge k', () => {
    const N = 10n ** 30n;
    expect(big(call('binomial', normBig(N), 2))).toBe((N * (N - 1n)) / 2n);
    expect(big(call('binomial', normBig(N), normBig(N - 2n)))).toBe((N * (N - 1n)) / 2n);
    expect(() => call('binomial', 10n ** 30n, 10n ** 15n)).toThrow(/limited to/);
  });
  it('Catalan numbers: OEIS A000108, and the recurrence C(n+1) = sum C(i) C(n-i)', () => {
    const a000108 = [1, 1, 2, 5, 14, 42, 132, 429, 1430, 4862, 16796, 58786, 208012, 742900];
    expect(a000108.map((_, n) => call('catalan', n))).toEqual(a000108);
    const c: bigint[] = [1n];
    for (let n = 0; n < 80; n++) c.push(c.reduce((s, x, i) => s + x * c[n - i], 0n));
    c.forEach((x, n) => expect(big(call('catalan', n))).toBe(x));
  });
});

describe('Stirling and Bell numbers', () => {
  it('stirling1 rows match OEIS A132393 (unsigned; A008275/A048994 up to sign)', () => {
    const a132393 = [
      [1],
      [0, 1],
      [0, 1, 1],
      [0, 2, 3, 1],
      [0, 6, 11, 6, 1],
      [0, 24, 50, 35, 10, 1],
      [0, 120, 274, 225, 85, 15, 1],
      [0, 720, 1764, 1624, 735, 175, 21, 1],
    ];
    a132393.forEach((row, n) => expect(row.map((_, k) => call('stirling1', n, k))).toEqual(row));
    // A048994 is the signed triangle s(n,k) = (-1)^(n-k) c(n,k): row 4 is 0, -6, 11, -6, 1.
    const a048994row4 = [0, -6, 11, -6, 1];
    expect(a048994row4.map((x, k) => ((4 - k) % 2 === 0 ? 1 : -1) * (call('stirling1', 4, k) as number))).toEqual(a048994row4);
  });
  it('stirling2 rows match OEIS A008277 / A048993', () => {
    const a008277 = [[1], [1, 1], [1, 3, 1], [1, 7, 6, 1], [1, 15, 25, 10, 1], [1, 31, 90, 65, 15, 1], [1, 63, 301, 350, 140, 21, 1]];
    a008277.forEach((row, i) => expect(row.map((_, j) => call('stirling2', i + 1, j + 1))).toEqual(row));
    expect(call('stirling2', 0, 0)).toBe(1);
    expect(call('stirling2', 5, 0)).toBe(0);
    expect(call('stirling2', 3, 7)).toBe(0);
    expect(call('stirling2', 3, -1)).toBe(0);
    expect(call('stirling2', 3, 10n ** 30n)).toBe(0);
  });
  it('stirling1 equals the coefficients of the rising factorial x(x+1)...(x+n-1) (second algorithm), past the cache', () => {
    let poly: bigint[] = [1n]; // coefficients of x^0, x^1, ...
    for (let n = 1; n <= 230; n++) {
      const next = new Array<bigint>(n + 1).fill(0n);
      poly.forEach((c, k) => {
        next[k + 1] += c;
        next[k] += BigInt(n - 1) * c;
      });
      poly = next;
      if (n % 23 === 0 || n <= 12) for (let k = 0; k <= n; k++) expect(big(call('stirling1', n, k))).toBe(poly[k]);
    }
  });
  it('stirling2 equals the explicit formula (1/k!) sum (-1)^j C(k,j) (k-j)^n (second algorithm), past the cache', () => {
    const explicit = (n: number, k: number): bigint => {
      let s = 0n,
        c = 1n,
        f = 1n;
      for (let j = 0; j <= k; j++) {
        s += (j % 2 === 0 ? 1n : -1n) * c * BigInt(k - j) ** BigInt(n);
        c = (c * BigInt(k - j)) / BigInt(j + 1);
      }
      for (let i = 2; i <= k; i++) f *= BigInt(i);
      return s / f;
    };
    for (const n of [1, 2, 7, 15, 40, 199, 200, 201, 260])
      for (const k of [1, 2, 3, Math.floor(n / 2), n - 1, n]) if (k >= 1) expect(big(call('stirling2', n, k))).toBe(explicit(n, k));
  });
  it('row sums: sum_k c(n,k) = n! and sum_k S(n,k) = B(n)', () => {
    for (const n of [0, 1, 5, 10, 50, 210]) {
      let s1 = 0n,
        s2 = 0n;
      for (let k = 0; k <= n; k++) {
        s1 += big(call('stirling1', n, k));
        s2 += big(call('stirling2', n, k));
      }
      expect(s1).toBe(big(call('factorial', n)));
      expect(s2).toBe(big(call('bell', n)));
    }
  });
  it('bell matches OEIS A000110 and the recurrence B(n+1) = sum C(n,k) B(k)', () => {
    const a000110 = [1, 1, 2, 5, 15, 52, 203, 877, 4140, 21147, 115975, 678570, 4213597, 27644437];
    expect(a000110.map((_, n) => call('bell', n))).toEqual(a000110);
    const b: bigint[] = [1n];
    for (let n = 0; n < 120; n++) b.push(b.reduce((s, x, k) => s + big(call('binomial', n, k)) * x, 0n));
    b.forEach((x, n) => expect(big(call('bell', n))).toBe(x));
  });
  it('refuses sizes past the limit', () => {
    expect(() => call('bell', 5000)).toThrow(/bell\(n\) is limited to n <= 1000/);
    expect(() => call('stirling1', -1, 0)).toThrow(/n >= 0/);
  });
});

describe('fibonacci', () => {
  it('matches OEIS A000045', () => {
    const a000045 = [0, 1, 1, 2, 3, 5, 8, 13, 21, 34, 55, 89, 144, 233, 377, 610, 987, 1597, 2584, 4181, 6765];
    expect(a000045.map((_, n) => call('fibonacci', n))).toEqual(a000045);
  });
  it('fast doubling agrees with the plain recurrence (second algorithm) up to n = 500', () => {
    let a = 0n,
      b = 1n;
    for (let n = 0; n <= 500; n++) {
      const f = call('fibonacci', n);
      expect(big(f)).toBe(a);
      expect(normal(f)).toBe(true);
      [a, b] = [b, a + b];
    }
  });
  it('negative indices: F(-n) = (-1)^(n+1) F(n) (OEIS A039834 lists F(-n) = 1, -1, 2, -3, 5, ...)', () => {
    expect([1, 2, 3, 4, 5, 6].map((n) => call('fibonacci', -n))).toEqual([1, -1, 2, -3, 5, -8]);
    expect(call('fibonacci', -0)).toBe(0);
    for (let n = 1; n < 200; n++) expect(big(call('fibonacci', -n))).toBe((n % 2 === 1 ? 1n : -1n) * big(call('fibonacci', n)));
  });
});

describe('integer helpers', () => {
  it('gcd * lcm = |a * b| (fast-check, with big integers)', () => {
    fc.assert(
      fc.property(intArb, intArb, (a, b) => {
        const g = big(call('gcd', a, b)),
          l = big(call('lcm', a, b));
        const p = big(a) * big(b);
        expect(g * l).toBe(p < 0n ? -p : p);
        expect(g >= 0n && l >= 0n).toBe(true);
        if (g !== 0n) expect(big(a) % g === 0n && big(b) % g === 0n).toBe(true);
        expect(normal(call('gcd', a, b)) && normal(call('lcm', a, b))).toBe(true);
      }),
    );
    expect(call('gcd', 0, 0)).toBe(0);
    expect(call('gcd', 12, -18)).toBe(6);
    expect(call('lcm', 4, 6)).toBe(12);
  });
  it('quo and mod are floor division: a = b*quo + mod with mod between 0 and b (fast-check)', () => {
    fc.assert(
      fc.property(
        intArb,
        intArb.filter((b) => b !== 0),
        (a, b) => {
          const q = big(call('quo', a, b)),
            r = big(call('mod', a, b)),
            A = big(a),
            B = big(b);
          expect(B * q + r).toBe(A);
          if (B > 0n) expect(r >= 0n && r < B).toBe(true);
          else expect(r <= 0n && r > B).toBe(true);
          expect(normal(call('quo', a, b)) && normal(call('mod', a, b))).toBe(true);
        },
      ),
    );
    expect(call('quo', -7, 2)).toBe(-4);
    expect(call('mod', -7, 3)).toBe(2);
    expect(call('mod', 7, -3)).toBe(-2);
    expect(() => call('quo', 1, 0)).toThrow(/division by zero/);
    expect(() => call('mod', 1, 0)).toThrow(/division by zero/);
  });
  it('divides agrees with mod (fast-check)', () => {
    fc.assert(fc.property(intArb, intArb, (a, b) => call('divides', a, b) === (a === 0 ? b === 0 : call('mod', b, a) === 0)));
    expect(call('divides', 0, 0)).toBe(true);
    expect(call('divides', 0, 5)).toBe(false);
    expect(call('divides', -3, 12)).toBe(true);
  });
  it('isInteger, numerator, denominator, floor, ceil, abs on exact numbers', () => {
    const r = makeRat(-6n, 4n); // -3/2
    expect(call('isInteger', r)).toBe(false);
    expect(call('isInteger', makeRat(6n, 3n))).toBe(true);
    expect(call('numerator', r)).toBe(-3);
    expect(call('denominator', r)).toBe(2);
    expect(call('numerator', 5)).toBe(5);
    expect(call('denominator', 5)).toBe(1);
    expect(call('floor', makeRat(-7n, 2n))).toBe(-4);
    expect(call('ceil', makeRat(-7n, 2n))).toBe(-3);
    expect(call('floor', makeRat(7n, 2n))).toBe(3);
    expect(call('ceil', makeRat(7n, 2n))).toBe(4);
    expect(call('abs', -5)).toBe(5);
    expect(call('abs', makeRat(-3n, 4n))).toEqual(makeRat(3n, 4n));
    expect(call('abs', -(10n ** 20n))).toBe(10n ** 20n);
  });
  it('floor(x) <= x < floor(x) + 1 and ceil(x) = -floor(-x) (fast-check)', () => {
    fc.assert(
      fc.property(fc.bigInt({ min: -(10n ** 20n), max: 10n ** 20n }), fc.bigInt({ min: 1n, max: 10n ** 6n }), (p, q) => {
        const x = makeRat(p, q);
        const f = big(call('floor', x)),
          c = big(call('ceil', x));
        expect(f * q <= p && p < (f + 1n) * q).toBe(true);
        expect(c).toBe(-big(call('floor', makeRat(-p, q))));
      }),
    );
  });
});

describe('isPrime', () => {
  it('agrees with the sieve of Eratosthenes below 200000; pi(10^5) = 9592 (OEIS A006880)', () => {
    const N = 200_000;
    const composite = new Uint8Array(N + 1);
    for (let i = 2; i * i <= N; i++) if (!composite[i]) for (let j = i * i; j <= N; j += i) composite[j] = 1;
    let below1e5 = 0;
    for (let n = -5; n <= N; n++) {
      const expected = n >= 2 && !composite[n];
      if (call('isPrime', n) !== expected) expect(`isPrime(${n})`).toBe(String(expected));
      if (expected && n <= 100_000) below1e5++;
    }
    expect(below1e5).toBe(9592);
    // First primes, OEIS A000040.
    expect([...Array(30).keys()].filter((n) => call('isPrime', n))).toEqual([2, 3, 5, 7, 11, 13, 17, 19, 23, 29]);
  });
  it('Mersenne numbers 2^p - 1 for p <= 81 are prime exactly for p in OEIS A000043', () => {
    const a000043 = [2, 3, 5, 7, 13, 17, 19, 31, 61];
    for (let p = 2; p <= 81; p++) expect([p, call('isPrime', normBig(2n ** BigInt(p) - 1n))]).toEqual([p, a000043.includes(p)]);
  });
  it('composites with no small factor, in the number and the bigint range, against trial division', () => {
    const isPrimeTrial = (n: number) => {
      if (n < 2) return false;
      for (let d = 2; d * d <= n; d++) if (n % d === 0) return false;
      return true;
    };
    const primesNear = (start: number, count: number) => {
      const out: number[] = [];
      for (let n = start; out.length < count; n++) if (isPrimeTrial(n)) out.push(n);
      return out;
    };
    const ps = primesNear(1_000_000_000, 8);
    for (const p of ps) expect(call('isPrime', p)).toBe(true);
    for (const p of ps) for (const q of ps) expect(call('isPrime', normBig(BigInt(p) * BigInt(q)))).toBe(false);
    const small = primesNear(8_000, 20);
    for (const p of small) for (const q of small) expect(call('isPrime', p * q)).toBe(false);
    fc.assert(
      fc.property(fc.integer({ min: 2 ** 26, max: 2 ** 36 }), (n) => call('isPrime', n) === isPrimeTrial(n)),
      { numRuns: 300 },
    );
  });
  it('the strong-probable-prime test is fooled exactly where OEIS A014233 says, and isPrime is not', () => {
    // A014233: the least odd composites that are strong pseudoprimes to all of the first k prime bases.
    const a014233: [bigint, bigint[]][] = [
      [2047n, [2n]],
      [1373653n, [2n, 3n]],
      [25326001n, [2n, 3n, 5n]],
      [3215031751n, [2n, 3n, 5n, 7n]],
      [2152302898747n, [2n, 3n, 5n, 7n, 11n]],
    ];
    for (const [n, bases] of a014233) {
      for (const a of bases) expect(isStrongProbablePrime(n, a)).toBe(true);
      expect(call('isPrime', normBig(n))).toBe(false);
    }
    // psi_12 = 318665857834031151167461 (A014233), composite: its factorisation (from memory) is checked here.
    const psi12 = 318665857834031151167461n;
    expect(399165290221n * 798330580441n).toBe(psi12);
    for (const a of [2n, 3n, 5n, 7n, 11n, 13n, 17n, 19n, 23n, 29n, 31n, 37n]) expect(isStrongProbablePrime(psi12, a)).toBe(true);
    expect(call('isPrime', psi12)).toBe(false);
  });
  it('the bound psi_13 of the bases used is a strong pseudoprime to all 13 of them (A014233)', () => {
    const psi13 = 3317044064679887385961981n;
    expect(1287836182261n * 2575672364521n).toBe(psi13); // factorisation from memory, checked here
    for (const a of [2n, 3n, 5n, 7n, 11n, 13n, 17n, 19n, 23n, 29n, 31n, 37n, 41n]) expect(isStrongProbablePrime(psi13, a)).toBe(true);
    expect(() => call('isPrime', psi13)).toThrow(EvalError);
    expect(call('isPrime', psi13 - 1n)).toBe(false); // even, just below the bound
  });
  it('refuses where no proved deterministic test applies', () => {
    expect(() => call('isPrime', 2n ** 89n - 1n)).toThrow(/proved exact only for n < 3317044064679887385961981/);
  });
});
