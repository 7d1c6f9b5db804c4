// Hecke insertion (src/library/tableaux/hecke.ts) against the theorem of Buch, Kresch, Shimozono,
// Tamvakis and Yong (Math. Ann. 340 (2008), Thm 1 and §2): P is an increasing tableau whose reading
// word has the Demazure product of the word, Q is a set-valued tableau of the same shape using
// every label once, and a -> (P, Q) is injective; on reduced words it is Edelman–Greene insertion.

import { describe, expect, it } from 'vitest';
import '../../src/library/index.js';
import { getFunction } from '../../src/library/registry.js';
import { heckeInsert } from '../../src/library/tableaux/hecke.js';
import { edelmanGreeneInsert } from '../../src/library/tableaux/insertion.js';
import { readingWordOf } from '../../src/families/tableaux/tableauOrder.js';
import { reducedWords } from '../../src/families/reducedWords/reducedWords.js';
import { Permutation } from '../../src/families/permutations/permutation.js';
import { Word } from '../../src/families/words/word.js';
import { Tableau } from '../../src/families/tableaux/tableau.js';
import { allPerms } from './permutations/helpers.js';

/** The 0-Hecke (Demazure) product s_{a_1} ⋆ ... ⋆ s_{a_k} acting on positions. */
function demazure(word: readonly number[], n: number): string {
  const w = Array.from({ length: n }, (_, i) => i + 1);
  for (const a of word) if (w[a - 1] < w[a]) [w[a - 1], w[a]] = [w[a], w[a - 1]];
  return w.join(',');
}

function words(len: number, k: number): number[][] {
  let out: number[][] = [[]];
  for (let i = 0; i < len; i++) out = out.flatMap((w) => Array.from({ length: k }, (_, v) => [...w, v + 1]));
  return out;
}

describe('Hecke insertion', () => {
  it('all words of length <= 6 over 1..3: P increasing with the Demazure product of the word, Q set-valued increasing with every label once, one shape, injective', () => {
    for (let len = 0; len <= 6; len++) {
      const seen = new Set<string>();
      for (const a of words(len, 3)) {
        const { P, Q } = heckeInsert(a);
        for (let r = 0; r < P.length; r++)
          for (let c = 0; c < P[r].length; c++) {
            if (c > 0) expect(P[r][c]).toBeGreaterThan(P[r][c - 1]);
            if (r > 0) expect(P[r][c]).toBeGreaterThan(P[r - 1][c]);
            const cell = Q[r][c];
            if (c > 0) expect(Math.min(...cell)).toBeGreaterThan(Math.max(...Q[r][c - 1]));
            if (r > 0) expect(Math.min(...cell)).toBeGreaterThan(Math.max(...Q[r - 1][c]));
          }
        expect(Q.map((row) => row.length)).toEqual(P.map((row) => row.length));
        expect(Q.flat(2).sort((x, y) => x - y)).toEqual(a.map((_, i) => i + 1));
        expect(demazure(readingWordOf(P), 4)).toBe(demazure(a, 4));
        seen.add(JSON.stringify([P, Q]));
      }
      expect(seen.size).toBe(3 ** len);
    }
  });

  it('on reduced words it is Edelman–Greene insertion (BKSTY 2008, §2), S_4 and S_5', () => {
    for (const n of [4, 5])
      for (const w of allPerms(n))
        reducedWords.enumerate(reducedWords.prepare([Permutation.from(w)] as never), (r: Word) => {
          const h = heckeInsert(r.letters),
            e = edelmanGreeneInsert(r.letters);
          expect(h.P).toEqual(e.P);
          expect(h.Q.map((row) => row.map((cell) => cell[0]))).toEqual(e.Q);
          expect(h.Q.every((row) => row.every((cell) => cell.length === 1))).toBe(true);
        });
  });

  it('the worked example 1211 (by hand): P = [[1, 2], [2]], Q = [[{1}, {2}], [{3, 4}]]', () => {
    const [P, Q] = getFunction('hecke')!.impl([1, 2, 1, 1]) as [Tableau, number[][][]];
    expect(P.rows).toEqual([[1, 2], [2]]);
    expect(Q).toEqual([[[1], [2]], [[3, 4]]]);
  });
});
