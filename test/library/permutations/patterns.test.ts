// Pattern containment (src/library/permutations/patterns.ts) against brute force and the
// published counts of pattern classes.

import { describe, expect, it } from 'vitest';
import '../../../src/library/permutations.js';
import { EvalError } from '../../../src/base/errors.js';
import { allPerms, call, perm, standardise } from './helpers.js';

/** Occurrences by brute force: every set of positions, standardised (a second algorithm). */
function countBrute(a: number[], p: number[]): number {
  const n = a.length,
    k = p.length,
    target = p.join();
  let c = 0;
  const pick = (start: number, chosen: number[]) => {
    if (chosen.length === k) {
      if (standardise(chosen.map((i) => a[i])).join() === target) c++;
      return;
    }
    for (let i = start; i < n; i++) pick(i + 1, [...chosen, i]);
  };
  pick(0, []);
  return c;
}

const patternsUpTo4 = [0, 1, 2, 3, 4].flatMap((k) => allPerms(k));

describe('contains, avoids, patternCount', () => {
  it('patternCount agrees with brute force for every pattern of length <= 4 on S_0..S_6', () => {
    for (let n = 0; n <= 6; n++)
      for (const a of allPerms(n))
        for (const p of patternsUpTo4) {
          const c = countBrute(a, p);
          const w = perm(a),
            pat = perm(p);
          expect(call('patternCount', w, pat)).toBe(c);
          expect(call('contains', w, pat)).toBe(c > 0);
          expect(call('avoids', w, pat)).toBe(c === 0);
        }
  });
  it('patterns of length 5 on S_7 against brute force (a sample of patterns)', () => {
    for (const p of [
      [1, 3, 5, 2, 4],
      [5, 4, 3, 2, 1],
      [2, 4, 1, 5, 3],
      [1, 2, 3, 4, 5],
    ])
      for (const a of allPerms(7).filter((_, i) => i % 7 === 0)) expect(call('patternCount', perm(a), p)).toBe(countBrute(a, p));
  });
  it('every pattern of length 3 is avoided by Catalan many permutations (OEIS A000108), n = 1..8', () => {
    const a000108 = [1, 2, 5, 14, 42, 132, 429, 1430];
    for (const p of allPerms(3))
      for (let n = 1; n <= 8; n++) expect(allPerms(n).filter((a) => call('avoids', perm(a), perm(p))).length).toBe(a000108[n - 1]);
  });
  it('1342-avoiders number OEIS A022558, 1234-avoiders OEIS A005802 (n = 1..8)', () => {
    const a022558 = [1, 2, 6, 23, 103, 512, 2740, 15485];
    const a005802 = [1, 2, 6, 23, 103, 513, 2761, 15767];
    for (let n = 1; n <= 8; n++) {
      const S = allPerms(n).map(perm);
      expect(S.filter((w) => call('avoids', w, '1342')).length).toBe(a022558[n - 1]);
      expect(S.filter((w) => call('avoids', w, '1234')).length).toBe(a005802[n - 1]);
    }
  });
  it('identities: patternCount(w, 21) = inv(w), patternCount(w, 1) = n, and the counts over S_k sum to C(n, k)', () => {
    for (const a of allPerms(6)) {
      const w = perm(a);
      expect(call('patternCount', w, '21')).toBe(call('inv', w));
      expect(call('patternCount', w, [1])).toBe(6);
      expect(call('patternCount', w, '')).toBe(1);
      expect(allPerms(3).reduce((s, p) => s + (call('patternCount', w, p) as number), 0)).toBe(20);
    }
    expect(call('patternCount', perm([1, 2]), '123')).toBe(0);
    expect(call('contains', perm([]), '')).toBe(true);
  });
  it('a pattern may be a permutation, a list or a digit string, with the same answers', () => {
    const w = perm([2, 4, 1, 3, 5]);
    expect(call('patternCount', w, perm([2, 3, 1]))).toBe(1);
    expect(call('patternCount', w, [2, 3, 1])).toBe(1);
    expect(call('patternCount', w, '231')).toBe(1);
    expect(call('contains', w, '2413')).toBe(true);
    expect(call('avoids', w, '321')).toBe(true);
  });
  it('rejects what is not a pattern, with the offending text', () => {
    expect(() => call('contains', perm([1, 2]), '1224')).toThrow(/contains\(w, p\): the pattern "1224" is not a permutation of 1..4/);
    expect(() => call('contains', perm([1, 2]), '13a')).toThrow(/must be a string of digits 1-9/);
    expect(() => call('avoids', perm([1, 2]), [0, 1])).toThrow(/the pattern \[0, 1\] is not a permutation of 1..2/);
    expect(() => call('patternCount', perm([1, 2]), ['a'])).toThrow(/must be a list of integers/);
    expect(() => call('patternCount', perm([1, 2]), [10n ** 20n])).toThrow(EvalError);
  });
});
