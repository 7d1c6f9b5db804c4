import { describe, expect, it } from 'vitest';
import { involutions } from '../../../src/families/permutations/involutions.js';
import { lexCompare, nextPermutation } from '../../../src/families/permutations/permutation.js';
import { checkEarlyStop, checkEnumeration } from '../familyChecks.js';

describe('involutions', () => {
  it('counts OEIS A000085: 1, 1, 2, 4, 10, 26, 76, 232, 764, 2620, 9496', () => {
    const a000085 = [1, 1, 2, 4, 10, 26, 76, 232, 764, 2620, 9496];
    a000085.forEach((v, n) => expect(involutions.count(involutions.prepare([n]))).toBe(BigInt(v)));
  });
  it('enumerates exactly the involutions of S_n (filtering S_n as a second algorithm), lexicographically', () => {
    for (let n = 0; n <= 7; n++) {
      const all = checkEnumeration(involutions, [n], (a, b) => lexCompare(a.a, b.a));
      const a = Array.from({ length: n }, (_, i) => i + 1);
      const brute: string[] = [];
      do if (a.every((v, i) => a[v - 1] === i + 1)) brute.push(a.join(','));
      while (nextPermutation(a));
      expect(all.map((w) => w.key())).toEqual(brute);
    }
    checkEarlyStop(involutions, [5], 3);
  });
});
