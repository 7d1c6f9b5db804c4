import { describe, expect, it } from 'vitest';
import { avoiders } from '../../../src/families/permutations/avoiders.js';
import { containsPattern, patternArg } from '../../../src/families/permutations/patterns.js';
import { Permutation, nextPermutation } from '../../../src/families/permutations/permutation.js';
import { checkEarlyStop, checkEnumeration } from '../familyChecks.js';
import { bona1342, closedFormCount, symmetryClass } from '../../../src/families/permutations/avoiderCounts.js';

/** Second algorithm: filter all of S_n with a direct containment test over all k-subsets of positions. */
function bruteCount(n: number, pats: number[][]): number {
  const a = Array.from({ length: n }, (_, i) => i + 1);
  let c = 0;
  const naive = (w: number[], p: number[]): boolean => {
    const k = p.length;
    const idx = Array.from({ length: k }, (_, i) => i);
    if (k > w.length) return false;
    for (;;) {
      let ok = true;
      for (let s = 0; s < k && ok; s++) for (let t = s + 1; t < k && ok; t++) if (w[idx[s]] < w[idx[t]] !== p[s] < p[t]) ok = false;
      if (ok) return true;
      let i = k - 1;
      while (i >= 0 && idx[i] === w.length - k + i) i--;
      if (i < 0) return false;
      idx[i]++;
      for (let j = i + 1; j < k; j++) idx[j] = idx[j - 1] + 1;
    }
  };
  do {
    if (pats.every((p) => !naive(a, p))) c++;
  } while (nextPermutation(a));
  return c;
}

const count = (n: number, ...ps: unknown[]) => Number(avoiders.count(avoiders.prepare([n, ...ps] as never)));

describe('avoiders', () => {
  it('reads patterns as digit strings, lists and permutations', () => {
    expect(patternArg('1342')).toEqual([1, 3, 4, 2]);
    expect(patternArg([2, 1])).toEqual([2, 1]);
    expect(patternArg(Permutation.from([1, 3, 2]))).toEqual([1, 3, 2]);
    expect(() => patternArg('1224')).toThrow(/not a permutation/);
    expect(() => avoiders.prepare([4])).toThrow(/at least one pattern/);
  });

  it('finds patterns, also when a position is forced to be the largest entry', () => {
    expect(containsPattern([2, 4, 1, 3], 4, [2, 1])).toBe(true);
    expect(containsPattern([1, 2, 3], 3, [2, 1])).toBe(false);
    // 1342 occurs in 1 4 5 3 only with 5 as the pattern's 4
    expect(containsPattern([1, 4, 5, 3], 4, [1, 3, 4, 2], 2)).toBe(true);
    expect(containsPattern([1, 4, 5, 3], 4, [1, 3, 4, 2], 1)).toBe(false);
  });

  it('counts 1342-avoiders (OEIS A022558: 1, 1, 2, 6, 23, 103, 512, 2740, 15485, 91245)', () => {
    const a022558 = [1, 1, 2, 6, 23, 103, 512, 2740, 15485, 91245];
    a022558.forEach((v, n) => expect(count(n, '1342')).toBe(v));
  });

  it('counts 1234-avoiders (OEIS A005802: 1, 1, 2, 6, 23, 103, 513, 2761, 15767, 94359)', () => {
    // Values of A005802 recalled from memory; the brute-force filter below checks the small terms independently.
    const a005802 = [1, 1, 2, 6, 23, 103, 513, 2761, 15767, 94359];
    a005802.forEach((v, n) => expect(count(n, [1, 2, 3, 4])).toBe(v));
  });

  it('counts 132- and 231-avoiders by Catalan numbers (OEIS A000108), also by generation', () => {
    const a000108 = [1, 1, 2, 5, 14, 42, 132, 429, 1430, 4862];
    a000108.forEach((v, n) => {
      expect(count(n, '132')).toBe(v);
      expect(count(n, '231')).toBe(v);
      // two copies of the pattern bypass the closed form and count by generation
      expect(count(n, '132', '132')).toBe(v);
      expect(count(n, [2, 3, 1], '231')).toBe(v);
    });
  });

  it('agrees with filtering S_n for several pattern sets (brute force as a second algorithm)', () => {
    const sets = [['1342'], ['1234'], ['2143'], ['1324'], ['123', '321'], ['2413', '3142'], ['12'], ['1']];
    for (const s of sets) {
      for (let n = 0; n <= 7; n++) expect(count(n, ...s)).toBe(bruteCount(n, s.map(patternArg)));
    }
  });

  it('enumerates every avoider once; members avoid the patterns', () => {
    for (let n = 0; n <= 7; n++) checkEnumeration(avoiders, [n, '1342']);
    checkEnumeration(avoiders, [6, '321', '2143']);
    checkEarlyStop(avoiders, [5, '123'], 10);
    const p = avoiders.prepare([4, '132'] as never);
    expect(avoiders.isMember(p, Permutation.from([1, 3, 2, 4]))).toBe(false);
    expect(avoiders.isMember(p, Permutation.from([3, 4, 1, 2]))).toBe(true);
  });
});

describe('closed forms for one pattern', () => {
  it("Bóna's formula gives A022558 (1, 1, 2, 6, 23, 103, 512, 2740, 15485, 91245, 555662, 3475090, 22214707)", () => {
    const a022558 = [1, 1, 2, 6, 23, 103, 512, 2740, 15485, 91245, 555662, 3475090, 22214707, 144640291n];
    a022558.forEach((v, n) => expect(bona1342(n)).toBe(BigInt(v)));
  });
  it('the symmetry class of 1342 has 8 patterns, and each is counted alike by generation', () => {
    const cls = [...symmetryClass([1, 3, 4, 2])];
    expect(cls.sort()).toEqual(['1342', '1423', '2314', '2431', '3124', '3241', '4132', '4213']);
    for (const q of cls) for (let n = 0; n <= 8; n++) expect(count(n, q, q)).toBe(count(n, '1342'));
  });
  it('agrees with generation for every pattern of length <= 4 that has a closed form', () => {
    for (const q of ['1', '12', '21', '123', '132', '213', '231', '312', '321', '1342', '2413']) {
      for (let n = 0; n <= 7; n++) {
        const c = closedFormCount(n, patternArg(q));
        if (c !== undefined) expect(Number(c)).toBe(count(n, q, q));
      }
    }
  });
});
