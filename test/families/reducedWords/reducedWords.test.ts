import { describe, expect, it } from 'vitest';
import { reducedWords } from '../../../src/families/reducedWords/reducedWords.js';
import { isReducedWordOf } from '../../../src/families/reducedWords/reducedWordCounts.js';
import { permutations } from '../../../src/families/permutations/permutations.js';
import { hookLengthCount } from '../../../src/families/tableaux/shapes.js';
import { Permutation, inversions } from '../../../src/families/permutations/permutation.js';
import { checkEnumeration, checkShrinks, chiSquareUniform, listAll } from '../partitions/uniformity.js';

const longest = (n: number) => Array.from({ length: n }, (_, i) => n - i);
// OEIS A005118: reduced words of the longest element of S_n, n = 1..7.
const A005118 = [1, 1, 2, 16, 768, 292864, 1100742656];

/** All words of length l over 1..n-1 that are reduced words of w: brute force from the definition. */
function bruteForce(w: number[]): number {
  const n = w.length, l = inversions(w);
  let c = 0;
  const word = new Array<number>(l).fill(1);
  const go = (k: number) => {
    if (k === l) {
      if (isReducedWordOf(word, w)) c++;
      return;
    }
    for (let a = 1; a < n; a++) {
      word[k] = a;
      go(k + 1);
    }
  };
  go(0);
  return c;
}

describe('reducedWords(w)', () => {
  it('counts reduced words of the longest element (OEIS A005118)', () => {
    for (let n = 1; n <= 7; n++) expect(reducedWords.count({ w: longest(n), length: 0 })).toBe(BigInt(A005118[n - 1]));
  });
  it('equals f^staircase (Stanley 1984, European J. Combin. 5: w0 words = SYT of staircase shape)', () => {
    for (let n = 1; n <= 7; n++) {
      const stair = Array.from({ length: n - 1 }, (_, i) => n - 1 - i);
      expect(reducedWords.count({ w: longest(n), length: 0 })).toBe(hookLengthCount(stair));
    }
  });
  it('enumerates exactly the reduced words, lexicographically, against brute force on S_4', () => {
    for (const w of listAll(permutations, { n: 4 })) {
      const p = reducedWords.prepare([w]);
      const all = checkEnumeration(reducedWords, p);
      expect(all.length).toBe(bruteForce(w.a));
      for (let i = 1; i < all.length; i++) expect(reducedWords.compare(all[i - 1], all[i])).toBeLessThan(0);
    }
  });
  it('w = s_{a_1} * ... * s_{a_l} with (u*v)[i] = u[v[i]]: 312 has the single word 2 1', () => {
    const all = checkEnumeration(reducedWords, reducedWords.prepare([new Permutation([3, 1, 2])]));
    expect(all.map((x) => x.letters)).toEqual([[2, 1]]);
  });
  it('samples uniformly (chi-square on w0 of S_4: 16 words)', () => {
    const p = reducedWords.prepare([new Permutation(longest(4))]);
    const all = checkEnumeration(reducedWords, p);
    const { chi, threshold } = chiSquareUniform(reducedWords.arbitrary!(p), all, 16000);
    expect(chi).toBeLessThan(threshold);
  });
  it('shrinks to lexicographically smaller reduced words', () => {
    const p = reducedWords.prepare([new Permutation(longest(5))]);
    expect(checkShrinks(reducedWords, p, checkEnumeration(reducedWords, p))).toBeGreaterThan(0);
  });
});
