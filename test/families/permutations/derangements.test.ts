import { describe, expect, it } from 'vitest';
import { derangements } from '../../../src/families/permutations/derangements.js';
import { lexCompare, nextPermutation } from '../../../src/families/permutations/permutation.js';
import { checkEarlyStop, checkEnumeration } from '../familyChecks.js';

describe('derangements', () => {
  it('counts OEIS A000166: 1, 0, 1, 2, 9, 44, 265, 1854, 14833, 133496', () => {
    const a000166 = [1, 0, 1, 2, 9, 44, 265, 1854, 14833, 133496];
    a000166.forEach((v, n) => expect(derangements.count(derangements.prepare([n]))).toBe(BigInt(v)));
  });
  it('enumerates exactly the fixed-point-free permutations (filtering S_n as a second algorithm), lexicographically', () => {
    for (let n = 0; n <= 7; n++) {
      const all = checkEnumeration(derangements, [n], (a, b) => lexCompare(a.a, b.a));
      const a = Array.from({ length: n }, (_, i) => i + 1);
      const brute: string[] = [];
      do if (a.every((v, i) => v !== i + 1)) brute.push(a.join(','));
      while (nextPermutation(a));
      expect(all.map((w) => w.key())).toEqual(brute);
    }
    checkEarlyStop(derangements, [5], 4);
  });
});
