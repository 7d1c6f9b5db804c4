import { describe, expect, it } from 'vitest';
import { reducedWords } from '../../../src/families/reducedWords/reducedWords.js';
import { isReducedWordOf } from '../../../src/families/reducedWords/reducedWordCounts.js';
import { permutations } from '../../../src/families/permutations/permutations.js';
import { hookLengthCount } from '../../../src/families/tableaux/shapes.js';
import { Permutation, inversions } from '../../../src/families/permutations/permutation.js';
import { edelmanGreeneWord } from '../../../src/families/reducedWords/edelmanGreene.js';
import { reducedWordCount } from '../../../src/families/reducedWords/reducedWordCounts.js';
import { standardTableaux } from '../../../src/families/tableaux/standardTableaux.js';
import * as fc from 'fast-check';
import { checkEnumeration, checkShrinks, chiSquareUniform, listAll } from '../partitions/uniformity.js';

const longest = (n: number) => Array.from({ length: n }, (_, i) => n - i);
// OEIS A005118: reduced words of the longest element of S_n, n = 1..7.
const A005118 = [1, 1, 2, 16, 768, 292864, 1100742656];

/** All words of length l over 1..n-1 that are reduced words of w: brute force from the definition. */
function bruteForce(w: number[]): number {
  const n = w.length,
    l = inversions(w);
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
  it('samples uniformly (chi-square on w0 of S_4 by Edelman–Greene, and on 15432 and 24531 by counts)', () => {
    for (const w of [longest(4), [1, 5, 4, 3, 2], [2, 4, 5, 3, 1]]) {
      const p = reducedWords.prepare([new Permutation(w)]);
      const all = checkEnumeration(reducedWords, p);
      const { chi, threshold } = chiSquareUniform(reducedWords.arbitrary!(p), all, 1000 * all.length);
      expect(chi).toBeLessThan(threshold);
    }
  });
  it('shrinks to lexicographically smaller reduced words', () => {
    const p = reducedWords.prepare([new Permutation(longest(5))]);
    expect(checkShrinks(reducedWords, p, checkEnumeration(reducedWords, p))).toBeGreaterThan(0);
  });
  it('the count of w0 by the hook length formula agrees with the recursion on descents (n <= 8)', () => {
    for (let n = 2; n <= 8; n++) expect(reducedWords.count({ w: longest(n), length: 0 })).toBe(reducedWordCount(longest(n)));
  });
  it('Edelman–Greene maps the staircase tableaux bijectively onto the reduced words of w0 (n <= 5; Edelman and Greene, Adv. Math. 63 (1987))', () => {
    for (let n = 2; n <= 5; n++) {
      const stair = Array.from({ length: n - 1 }, (_, i) => n - 1 - i);
      const seen = new Set<string>();
      standardTableaux.enumerate({ parts: stair, n: (n * (n - 1)) / 2 }, (t) => {
        const word = edelmanGreeneWord(t.rows);
        expect(isReducedWordOf(word, longest(n))).toBe(true);
        seen.add(word.join(','));
      });
      expect(seen.size).toBe(A005118[n - 1]);
    }
  });
  it('samples reduced words of w0 at n = 12 and n = 20 (random sorting networks) without enumerating S_n', () => {
    for (const n of [12, 20]) {
      const p = reducedWords.prepare([new Permutation(longest(n))]);
      for (const r of fc.sample(reducedWords.arbitrary!(p), { numRuns: 3, seed: 5 })) expect(reducedWords.isMember(p, r)).toBe(true);
    }
    // Stanley's formula (OEIS A005118): a(n) = binomial(n, 2)! / prod_{i=1}^{n-1} (2i-1)^(n-i).
    for (const n of [9, 12, 15]) {
      let num = 1n,
        den = 1n;
      for (let k = 2; k <= (n * (n - 1)) / 2; k++) num *= BigInt(k);
      for (let i = 1; i < n; i++) den *= BigInt(2 * i - 1) ** BigInt(n - i);
      expect(reducedWords.count(reducedWords.prepare([new Permutation(longest(n))]))).toBe(num / den);
    }
  });
});
