// The exact stationary solver (src/algebra/linear/stationary.ts) on the loop chain on perfect matchings.
//
// Source for the numbers: OEIS A029729 (degree of the variety of pairs of commuting n x n
// matrices: 1, 3, 31, 1145, 154881, 77899563, ...), whose comment (2004)
// identifies it with the ratio of ground-state entries of H = sum_i (3 - 2 e_i - b_i) on the
// Brauer loop model with 2n points and periodic boundary: the stationary measure of our chain,
// since H psi = 0 says exactly that psi is invariant under (1/6n) sum_i (2 e_i + b_i). Proofs:
// "Inhomogeneous model of crossing loops and multidegrees of some algebraic varieties", Comm. Math.
// Phys. 262 (2006); "A scheme related to the Brauer loop model", Adv. Math. 214 (2007).

import { describe, expect, it } from 'vitest';
import { stationaryDense } from '../../../src/algebra/linear/denseRational.js';
import { lastSolveStats, stationaryFraction } from '../../../src/algebra/linear/stationary.js';
import { makeRat } from '../../../src/numbers/rational.js';
import { allCrossing, allNested, loopChain } from './loopChainFixture.js';

const A029729 = [1n, 3n, 31n, 1145n, 154881n];

/** The stationary weights scaled by the smallest one (as exact rationals, given as [num, den]). */
function scaled(n: number, join: number, cross: number, lump = true) {
  const lc = loopChain(n, join, cross);
  const f = stationaryFraction(lc.chain, { lump });
  const min = f.nums.reduce((a, b) => (b < a ? b : a));
  return { lc, f, min, stats: { ...lastSolveStats! } };
}

describe('the loop chain, join 2/3 and exchange 1/3 (OEIS A029729)', () => {
  for (const lump of [true, false]) {
    it(`n = 1..4: integers scaled by the smallest, smallest at i <-> i+n, nested one A029729 (lumping ${lump ? 'on' : 'off'})`, () => {
      for (let n = 1; n <= 4; n++) {
        const { lc, f, min } = scaled(n, 2, 1, lump);
        expect(f.nums.every((a) => a % min === 0n)).toBe(true);
        expect(f.nums[lc.indexOf(allCrossing(n))]).toBe(min);
        expect(f.nums[lc.indexOf(allNested(n))] / min).toBe(A029729[n - 1]);
        // A029729's own wording: the smallest entry on a noncrossing matching, over the smallest.
        let smallestNoncrossing: bigint | null = null;
        lc.states.forEach((p, k) => {
          const noncrossing = p.every((j, i) => p.every((l, k2) => !(i < k2 && k2 < j && j < l)));
          if (noncrossing && (smallestNoncrossing === null || f.nums[k] < smallestNoncrossing)) smallestNoncrossing = f.nums[k];
        });
        expect(smallestNoncrossing! / min).toBe(A029729[n - 1]);
      }
    });
  }

  it('agrees with dense rational elimination (second algorithm) for n <= 3', () => {
    for (let n = 1; n <= 3; n++) {
      const lc = loopChain(n, 2, 1);
      const f = stationaryFraction(lc.chain);
      expect(stationaryDense(lc.chain)).toEqual(f.nums.map((a) => makeRat(a, f.den)));
    }
  });

  it('the measure is invariant under rotating the circle (the chain commutes with rotation)', () => {
    const n = 4;
    const { lc, f } = scaled(n, 2, 1);
    lc.states.forEach((p, k) => {
      const r = p.map((_, i) => (p[(i + 2 * n - 1) % (2 * n)] + 1) % (2 * n));
      expect(f.nums[lc.indexOf(r)]).toBe(f.nums[k]);
    });
  });

  // Timed: about 0.05 s with lumping and 0.3 s without on one core, so it stays in the normal tier
  // with a generous timeout (the issue asks for under 10 s).
  it('n = 5 (945 states) solves exactly and gives 154881 for the nested matching, with and without lumping', () => {
    for (const lump of [true, false]) {
      const t0 = performance.now();
      const { lc, f, min, stats } = scaled(5, 2, 1, lump);
      const ms = performance.now() - t0;
      expect(stats.states).toBe(945);
      expect(stats.lumped).toBe(lump);
      expect(f.nums.every((a) => a % min === 0n)).toBe(true);
      expect(f.nums[lc.indexOf(allCrossing(5))]).toBe(min);
      expect(f.nums[lc.indexOf(allNested(5))] / min).toBe(154881n);
      expect(ms).toBeLessThan(10_000);
    }
  }, 30_000);
});

describe('the loop chain with a fair coin (the weights stop being integers)', () => {
  it('n = 2 still gives integers 2, 2, 1 (computed here by hand: by symmetry the two noncrossing matchings are equal, and balance at the crossing one gives 2:1)', () => {
    const { lc, f, min } = scaled(2, 1, 1);
    expect(f.nums.map((a) => a / min)).toEqual(lc.states.map((p) => (p[0] === 2 ? 1n : 2n)));
    expect(stationaryDense(lc.chain)).toEqual(f.nums.map((a) => makeRat(a, f.den)));
  });
  it('from n = 3 on the scaled weights are not all integers', () => {
    for (const n of [3, 4]) {
      const { f, min } = scaled(n, 1, 1);
      expect(f.nums.some((a) => a % min !== 0n)).toBe(true);
    }
    const lc = loopChain(3, 1, 1);
    const f = stationaryFraction(lc.chain);
    expect(stationaryDense(lc.chain)).toEqual(f.nums.map((a) => makeRat(a, f.den)));
  });
});
