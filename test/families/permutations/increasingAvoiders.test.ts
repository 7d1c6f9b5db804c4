import * as fc from 'fast-check';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { describe, expect, it } from 'vitest';
import { rskRows } from '../../../src/library/rsk.js';
import {
  inverseRsk,
  increasingAvoiderCount,
  monotonePattern,
  partitionsWithPartsAtMost,
} from '../../../src/families/permutations/increasingAvoiders.js';
import { avoiders } from '../../../src/families/permutations/avoiders.js';
import { nextPermutation } from '../../../src/families/permutations/permutation.js';
import { containsPattern } from '../../../src/families/permutations/patterns.js';

/** Count by generating the class (the family's enumeration), the second algorithm. */
function generatedCount(n: number, pat: string): bigint {
  let c = 0n;
  avoiders.enumerate(avoiders.prepare([n, pat] as never), () => {
    c++;
  });
  return c;
}

describe('avoiders of 12...k and k...21 through Robinson–Schensted', () => {
  it('inverse row insertion undoes row insertion on all of S_n, n <= 7', () => {
    for (let n = 0; n <= 7; n++) {
      const a = Array.from({ length: n }, (_, i) => i + 1);
      do {
        const { P, Q } = rskRows(a);
        expect(inverseRsk(P, Q)).toEqual(a);
      } while (nextPermutation(a));
    }
  });

  it('counts: sum of (f^lambda)^2 over lambda_1 < k agrees with generation (and OEIS A005802 for 1234)', () => {
    // A005802 recalled from memory: 1, 1, 2, 6, 23, 103, 513, 2761, 15767, 94359
    expect([...Array(10).keys()].map((n) => increasingAvoiderCount(n, 4))).toEqual([
      1n,
      1n,
      2n,
      6n,
      23n,
      103n,
      513n,
      2761n,
      15767n,
      94359n,
    ]);
    for (const k of [2, 3, 4, 5, 6]) {
      for (let n = 0; n <= 8; n++) {
        const inc = Array.from({ length: k }, (_, i) => i + 1).join('');
        expect(increasingAvoiderCount(n, k), `12..${k} at n = ${n}`).toBe(generatedCount(n, inc));
      }
    }
    expect(avoiders.count(avoiders.prepare([9, '54321'] as never))).toBe(generatedCount(9, '54321'));
  }, 120_000);

  it('recognises the monotone patterns and bounds the shape table', () => {
    expect(monotonePattern([1, 2, 3, 4])).toBe(1);
    expect(monotonePattern([4, 3, 2, 1])).toBe(-1);
    expect(monotonePattern([1, 3, 2])).toBe(0);
    // partitions of 8 with parts at most 3: 10 (count by hand: 332, 3311, 3221, 32111, 311111, 2222, 22211, 221111, 2111111, 11111111)
    expect(partitionsWithPartsAtMost(8, 3)!.length).toBe(10);
  });

  it('samples 1234, 12345 and 4321 at n = 60 (members)', () => {
    for (const pat of ['1234', '12345', '4321']) {
      const p = avoiders.prepare([60, pat] as never);
      const arb = avoiders.arbitrary(p);
      const rng = new fc.Random(xoroshiro128plus(11));
      for (let i = 0; i < 10; i++) {
        const w = arb.generate(rng, undefined).value;
        expect(avoiders.isMember(p, w)).toBe(true);
        expect(containsPattern(w.a, 60, [...pat.slice(0, -1)].map(Number))).toBe(true);
      }
    }
  }, 60_000);
});
