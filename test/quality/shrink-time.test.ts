// Shrinking a sampled case of size 25 takes under a second. Timed two
// ways: the shrinker called directly on a failing case of size 25, and whole runs sampling only at
// n = 25 (the sampling itself is a few cases, so the run's time bounds the shrink's).

import * as fc from 'fast-check';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { describe, expect, it } from 'vitest';
import { check, compileOne, doc } from '../runner/helpers.js';
import { shrinkCase } from '../../src/runner/shrink.js';
import { Permutation } from '../../src/families/permutations/permutation.js';
import * as B from '../runner/brute.js';

function randomPermutation(seed: number, n: number): number[] {
  const rng = new fc.Random(xoroshiro128plus(seed));
  const a = Array.from({ length: n }, (_, i) => i + 1);
  for (let i = n - 1; i > 0; i--) {
    const j = rng.nextInt(0, i);
    [a[i], a[j]] = [a[j], a[i]];
  }
  return a;
}

describe('shrink time at size 25', () => {
  it('shrinkCase on failing permutations of 25 takes under a second and reaches 132', () => {
    const cc = compileOne(doc({ for: ['n: 1..2', 'w: permutations(n)'], claim: 'maj(w) <= inv(w)', sample: ['n: 25..25'] }));
    let worst = 0,
      tried = 0;
    for (let seed = 1; tried < 10; seed++) {
      const w = randomPermutation(seed, 25);
      if (B.maj(w) <= B.inv(w)) continue;
      tried++;
      const t0 = performance.now();
      const r = shrinkCase(cc, [25, Permutation.from(w)], new Map([['n', [25, 25]]]), {});
      worst = Math.max(worst, performance.now() - t0);
      expect(r.bindings[0]).toBe(3);
      expect((r.bindings[1] as Permutation).toText()).toBe('perm([1, 3, 2])');
    }
    console.log(`shrink time: maj(w) <= inv(w) from n = 25, slowest of 10: ${worst.toFixed(0)} ms`);
    expect(worst).toBeLessThan(1000);
  });

  for (const [name, claim, minN] of [
    ['cycles(w) <= 5', 'cycles(w) <= 5', 6],
    ['maj(w) <= inv(w)', 'maj(w) <= inv(w)', 3],
  ] as const) {
    it(`whole runs of "${name}" sampled at n = 25: under a second each, shrinkSteps reported`, () => {
      const y = doc({ for: ['n: 1..2', 'w: permutations(n)'], claim, sample: ['n: 25..25', 'count: 500'] });
      let worst = 0;
      for (let s = 1; s <= 10; s++) {
        const r = check(y, { seed: String(s), exhaustive: false });
        const c = r.counterexample!;
        expect(c.shrunkFrom).toEqual({ n: 25 });
        expect(c.shrinkSteps).toBeGreaterThan(0);
        expect(c.size.n).toBe(minN);
        worst = Math.max(worst, r.ms);
      }
      console.log(`shrink time: ${name} from n = 25, slowest whole run of 10: ${worst.toFixed(0)} ms`);
      expect(worst).toBeLessThan(1000);
    });
  }
});
