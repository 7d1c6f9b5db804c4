import { describe, expect, it } from 'vitest';
import { partialPermutations, partialPermutationCount } from '../../../src/families/partialPermutations/partialPermutations.js';
import { checkEnumeration, checkShrinks, chiSquareUniform } from '../partitions/uniformity.js';

// OEIS A002720: number of partial permutations of an n-set, sum_r C(n,r)^2 r!.
const A002720 = [1, 2, 7, 34, 209, 1546, 13327, 130922];

const formula = (k: number, n: number) => {
  let s = 0n;
  // sum_r C(k,r) C(n,r) r! = sum_r k!/(k-r)! * C(n, r)
  for (let r = 0; r <= Math.min(k, n); r++) {
    let falling = 1n;
    for (let t = 0; t < r; t++) falling *= BigInt(k - t);
    let binom = 1n;
    for (let t = 0; t < r; t++) binom = (binom * BigInt(n - t)) / BigInt(t + 1);
    s += falling * binom;
  }
  return s;
};

describe('partialPermutations(k, n)', () => {
  it('counts sum_r C(k,r) C(n,r) r!, OEIS A002720 on the diagonal', () => {
    for (let n = 0; n < A002720.length; n++) expect(partialPermutationCount(n, n)).toBe(BigInt(A002720[n]));
    for (let k = 0; k <= 6; k++) for (let n = 0; n <= 6; n++) expect(partialPermutationCount(k, n)).toBe(formula(k, n));
  });
  it('enumerates the count of distinct members', () => {
    for (let k = 0; k <= 4; k++) for (let n = 0; n <= 4; n++) checkEnumeration(partialPermutations, { k, n });
  });
  it('samples uniformly (chi-square at 2 x 3: 13 matrices; 3 x 3: 34)', () => {
    for (const [k, n] of [
      [2, 3],
      [3, 3],
    ]) {
      const all = checkEnumeration(partialPermutations, { k, n });
      const { chi, threshold } = chiSquareUniform(partialPermutations.arbitrary!({ k, n }), all, 1000 * all.length);
      expect(chi).toBeLessThan(threshold);
    }
  });
  it('shrinks to strictly simpler members', () => {
    checkShrinks(partialPermutations, { k: 3, n: 3 }, checkEnumeration(partialPermutations, { k: 3, n: 3 }));
  });
});
