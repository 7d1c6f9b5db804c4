import * as fc from 'fast-check';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { describe, expect, it } from 'vitest';
import { dyckPaths, catalanBig } from '../../../src/families/dyckPaths/dyckPaths.js';
import type { DyckPath } from '../../../src/families/dyckPaths/dyckPath.js';
import { DYCK_TO_AVOIDER, dyckBijectionFor, maximaFilling, stackOutput } from '../../../src/families/permutations/dyckBijections.js';
import { avoiders } from '../../../src/families/permutations/avoiders.js';
import { containsPattern } from '../../../src/families/permutations/patterns.js';

const PATTERNS = ['123', '132', '213', '231', '312', '321'];

function allPaths(n: number): number[][] {
  const out: number[][] = [];
  dyckPaths.enumerate({ n }, (d: DyckPath) => {
    out.push(d.steps.slice());
  });
  return out;
}

describe('Dyck path bijections onto the avoiders of one pattern of length 3', () => {
  it('small values worked by hand (stack word and left-to-right maxima)', () => {
    // UUDD: push 1, push 2, pop 2, pop 1 -> 21; UDUD -> 12; UUDDUD -> 213
    expect(stackOutput([1, 1, -1, -1])).toEqual([2, 1]);
    expect(stackOutput([1, -1, 1, -1])).toEqual([1, 2]);
    expect(stackOutput([1, 1, -1, -1, 1, -1])).toEqual([2, 1, 3]);
    // UUDUDD: maxima 2 at position 1 and 3 at position 2, then 1 -> 231
    expect(maximaFilling([1, 1, -1, 1, -1, -1])).toEqual([2, 3, 1]);
    expect(maximaFilling([1, 1, 1, -1, -1, -1])).toEqual([3, 1, 2]);
  });

  it('is a bijection onto the class for n <= 8: every image avoids, all distinct, Catalan many (OEIS A000108)', () => {
    for (const pat of PATTERNS) {
      const p = [...pat].map(Number);
      const map = DYCK_TO_AVOIDER[pat];
      for (let n = 0; n <= 8; n++) {
        const seen = new Set<string>();
        for (const s of allPaths(n)) {
          const w = map(s);
          expect(w.slice().sort((x, y) => x - y)).toEqual(Array.from({ length: n }, (_, i) => i + 1));
          expect(containsPattern(w, n, p), `${w.join('')} avoids ${pat}`).toBe(false);
          seen.add(w.join(','));
        }
        expect(BigInt(seen.size), `${pat} at n = ${n}`).toBe(catalanBig(n));
        // second algorithm: the class by generation has the same size
        expect(avoiders.count(avoiders.prepare([n, pat] as never))).toBe(catalanBig(n));
      }
    }
  });

  it('applies to exactly one pattern of length 3', () => {
    expect(dyckBijectionFor([[1, 3, 2]])).toBeDefined();
    expect(
      dyckBijectionFor([
        [1, 3, 2],
        [3, 2, 1],
      ]),
    ).toBeUndefined();
    expect(dyckBijectionFor([[1, 3, 4, 2]])).toBeUndefined();
  });

  it('the avoiders family samples every length-3 class at n = 60 and n = 200 (members, distinct)', () => {
    for (const pat of PATTERNS) {
      for (const n of [60, 200]) {
        const p = avoiders.prepare([n, pat] as never);
        const arb = avoiders.arbitrary(p);
        const rng = new fc.Random(xoroshiro128plus(n));
        const keys = new Set<string>();
        for (let i = 0; i < 20; i++) {
          const w = arb.generate(rng, undefined).value;
          expect(avoiders.isMember(p, w)).toBe(true);
          keys.add(w.key());
        }
        expect(keys.size).toBe(20);
      }
    }
  });

  it('length 2 and patterns longer than n are sampled exactly at any size', () => {
    const rng = new fc.Random(xoroshiro128plus(3));
    const p12 = avoiders.prepare([40, '12'] as never);
    expect(avoiders.arbitrary(p12).generate(rng, undefined).value.key()).toBe(avoiders.arbitrary(p12).generate(rng, undefined).value.key());
    expect(avoiders.isMember(p12, avoiders.arbitrary(p12).generate(rng, undefined).value)).toBe(true);
    const long = avoiders.prepare([5, '1234567'] as never);
    expect(avoiders.isMember(long, avoiders.arbitrary(long).generate(rng, undefined).value)).toBe(true);
  });

  it('a class with no exact sampler past the listed sizes says rejection failed, naming the pattern and the bound', () => {
    const p = avoiders.prepare([40, '1342'] as never);
    const rng = new fc.Random(xoroshiro128plus(1));
    expect(() => avoiders.arbitrary(p).generate(rng, undefined)).toThrow(/could not sample avoiders\(40, "1342"\).*up to size 9/s);
  }, 60_000);
});
