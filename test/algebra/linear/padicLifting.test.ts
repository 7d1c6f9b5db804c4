// The factorisation modulo p (src/algebra/linear/modularLU.ts), the integer generator
// (integerGenerator.ts) and p-adic lifting (padicLifting.ts, after Dixon, Numerische Mathematik
// 40 (1982)), checked against their defining equations in BigInt arithmetic; and the solver's
// multi-prime path, taken for weights too large for lifting in doubles, against dense rational
// elimination (denseRational.ts, the second algorithm).

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { closedClasses } from '../../../src/algebra/linear/closedClasses.js';
import { stationaryDense } from '../../../src/algebra/linear/denseRational.js';
import { integerGenerator, ROW_LIMIT } from '../../../src/algebra/linear/integerGenerator.js';
import { modPrime } from '../../../src/algebra/linear/modular.js';
import { factorModP } from '../../../src/algebra/linear/modularLU.js';
import { PadicKernel } from '../../../src/algebra/linear/padicLifting.js';
import { lastSolveStats, stationaryMeasure } from '../../../src/algebra/linear/stationary.js';
import { buildChain, type SparseChain } from '../../../src/algebra/linear/sparseChain.js';
import { makeRat, type Scalar } from '../../../src/numbers/rational.js';

/** Irreducible chains: a directed cycle plus random extra moves with small exact weights. */
const chainArb = (maxSize: number, weight: fc.Arbitrary<Scalar>) =>
  fc
    .integer({ min: 1, max: maxSize })
    .chain((size) =>
      fc
        .array(fc.array(fc.tuple(fc.nat(size - 1), weight), { maxLength: 3 }), { minLength: size, maxLength: size })
        .map((extra) => buildChain(size, (s) => [[(s + 1) % size, 1] as [number, Scalar], ...extra[s]])),
    );

const smallWeight = fc.oneof(
  fc.integer({ min: 1, max: 6 }),
  fc.tuple(fc.integer({ min: 1, max: 9 }), fc.integer({ min: 2, max: 9 })).map(([n, d]) => makeRat(BigInt(n), BigInt(d))),
);

/** (G v)(t) over the integers, G[t][s] = w'(s, t) - T'_s [s = t]. */
function generatorTimes(c: SparseChain, v: readonly bigint[]): bigint[] {
  const g = integerGenerator(c)!;
  const out = new Array<bigint>(c.size).fill(0n);
  for (let s = 0; s < c.size; s++) {
    for (let k = c.rowStart[s]; k < c.rowStart[s + 1]; k++) out[c.target[k]] += BigInt(g.weight[k]) * v[s];
    out[s] -= BigInt(g.total[s]) * v[s];
  }
  return out;
}

describe('integer generator', () => {
  it("has integer entries with P(s, t) = w'(s, t) / T'_s and columns summing to 0", () => {
    fc.assert(
      fc.property(chainArb(8, smallWeight), (c) => {
        const g = integerGenerator(c)!;
        for (let s = 0; s < c.size; s++) {
          let sum = 0;
          for (let k = c.rowStart[s]; k < c.rowStart[s + 1]; k++) {
            expect(Number.isInteger(g.weight[k])).toBe(true);
            // w'/T' = w/total, cross-multiplied over the integers.
            const w = c.weight[k],
              t = c.total[s];
            const [wn, wd] = typeof w === 'object' ? [w.num, w.den] : [BigInt(w), 1n];
            const [tn, td] = typeof t === 'object' ? [t.num, t.den] : [BigInt(t), 1n];
            expect(BigInt(g.weight[k]) * tn * wd).toBe(BigInt(g.total[s]) * wn * td);
            sum += g.weight[k];
          }
          expect(sum).toBe(g.total[s]);
        }
      }),
      { numRuns: 100 },
    );
  });
  it('is refused (null) when a row sum of |G| passes 2^29', () => {
    expect(integerGenerator(buildChain(2, (s) => [[1 - s, ROW_LIMIT]]))).toBeNull();
    expect(
      integerGenerator(
        buildChain(2, (s) => [
          [1 - s, 1],
          [s, makeRat(1n, 2n ** 30n)],
        ]),
      ),
    ).toBeNull();
    expect(integerGenerator(buildChain(2, (s) => [[1 - s, 2 ** 20]]))).not.toBeNull();
  });
});

describe('factorisation modulo p', () => {
  it('solve(rhs, v) satisfies every equation but the free one, with x[free] = v', () => {
    fc.assert(
      fc.property(chainArb(12, smallWeight), fc.array(fc.nat(), { minLength: 12, maxLength: 12 }), fc.nat(), (c, raw, v0) => {
        const p = modPrime(3);
        const g = integerGenerator(c)!;
        const off = g.weight.map((w) => w % p);
        const diag = g.total.map((t) => (p - (t % p)) % p);
        const lu = factorModP(c, off, diag, p);
        if (!lu) return; // an unlucky prime: not for these small chains, but allowed
        const rhs = Float64Array.from({ length: c.size }, (_, i) => raw[i] % p);
        const want = Array.from(rhs, BigInt);
        const v = v0 % p;
        const x = lu.solve(rhs, v);
        expect(x[lu.free]).toBe(v);
        const gx = generatorTimes(c, Array.from(x, BigInt));
        const P = BigInt(p);
        for (let t = 0; t < c.size; t++) if (t !== lu.free) expect((((gx[t] - want[t]) % P) + P) % P).toBe(0n);
      }),
      { numRuns: 150 },
    );
  });
});

describe('p-adic lifting', () => {
  it('after k digits, y(free) = 1 and G y = 0 modulo p^k on every row', () => {
    fc.assert(
      fc.property(chainArb(10, smallWeight), fc.integer({ min: 1, max: 5 }), (c, digits) => {
        const K = PadicKernel.start(c, integerGenerator(c)!, modPrime(0));
        if (!K) return;
        for (let i = 0; i < digits; i++) K.step();
        expect(K.modulus).toBe(BigInt(modPrime(0)) ** BigInt(digits));
        expect(K.values[K.lu.free]).toBe(1n);
        // Row free too: the columns of G sum to 0.
        for (const e of generatorTimes(c, K.values)) expect(e % K.modulus).toBe(0n);
      }),
      { numRuns: 150 },
    );
  });
});

describe('the solver', () => {
  it('lifts p-adically for small weights, with one prime', () => {
    const c = buildChain(3, (s) => [
      [(s + 1) % 3, 2],
      [(s + 2) % 3, makeRat(1n, 3n)],
      [0, 1],
    ]);
    expect(stationaryMeasure(c)).toEqual(stationaryDense(c));
    expect(lastSolveStats!.method).toBe('lifting');
    expect(lastSolveStats!.primes).toBe(1);
  });
  it('falls back to several primes for huge weights, and agrees with dense rational elimination', () => {
    // By hand: from 1 to 2 with weight 2^60 (staying put with weight 1), back with weight 1 (staying
    // put with weight 1),
    // so pi(1) 2^60/(2^60+1) = pi(2) 1/2: pi = (2^60+1, 2^61) / (3 2^60 + 1).
    const big = 2n ** 60n;
    const c = buildChain(2, (s) =>
      s === 0
        ? [
            [1, big],
            [0, 1],
          ]
        : [
            [0, 1],
            [1, 1],
          ],
    );
    expect(stationaryMeasure(c)).toEqual([makeRat(big + 1n, 3n * big + 1n), makeRat(2n * big, 3n * big + 1n)]);
    expect(lastSolveStats!.method).toBe('primes');
    const huge = fc.oneof(
      fc.bigInt({ min: 2n ** 40n, max: 2n ** 70n }).map((b) => (b <= BigInt(Number.MAX_SAFE_INTEGER) ? Number(b) : b)),
      fc.tuple(fc.integer({ min: 1, max: 9 }), fc.bigInt({ min: 2n ** 35n, max: 2n ** 40n })).map(([n, d]) => makeRat(BigInt(n), d)),
      smallWeight,
    );
    fc.assert(
      fc.property(chainArb(6, huge), fc.boolean(), (c, lump) => {
        const classes = closedClasses(c);
        if (classes.length !== 1) return;
        expect(stationaryMeasure(c, { lump })).toEqual(stationaryDense(c));
        // (With lumping, or on a smaller closed class, the system solved is another chain.)
        if (!lump && classes[0].length === c.size && integerGenerator(c) === null) expect(lastSolveStats!.method).toBe('primes');
      }),
      { numRuns: 100 },
    );
  });
});
