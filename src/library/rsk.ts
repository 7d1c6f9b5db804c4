// Robinson–Schensted–Knuth row insertion (LIBRARY.md §2): rsk(w) = [P, Q], rskShape(w).
// Knuth, Pacific J. Math. 34 (1970); Schensted, Canad. J. Math. 13 (1961).

import { fail } from '../base/errors.js';
import { defineFunction } from './registry.js';
import { Permutation } from '../families/permutations/permutation.js';
import { Word } from '../families/words/word.js';
import { Partition } from '../families/partitions/partition.js';
import { Tableau } from '../families/tableaux/tableau.js';
import { valueToText } from '../values/operations.js';
import type { Value } from '../values/value.js';

const topic = 'tableaux';

/** Row-insert the letters in order: x bumps the leftmost entry of the row strictly greater than it. */
export function rskRows(word: readonly number[]): { P: number[][]; Q: number[][] } {
  const P: number[][] = [],
    Q: number[][] = [];
  word.forEach((letter, step) => {
    let x = letter,
      r = 0;
    for (;;) {
      if (r === P.length) {
        P.push([x]);
        Q.push([step + 1]);
        return;
      }
      const row = P[r];
      // Binary search for the first entry > x.
      let lo = 0,
        hi = row.length;
      while (lo < hi) {
        const mid = (lo + hi) >> 1;
        if (row[mid] > x) hi = mid;
        else lo = mid + 1;
      }
      if (lo === row.length) {
        row.push(x);
        Q[r].push(step + 1);
        return;
      }
      const bumped = row[lo];
      row[lo] = x;
      x = bumped;
      r++;
    }
  });
  return { P, Q };
}

function lettersArg(v: Value, call: string): number[] {
  if (v instanceof Permutation) return v.a;
  if (v instanceof Word) return v.letters;
  if (Array.isArray(v) && v.every((x) => typeof x === 'number' && Number.isSafeInteger(x) && x >= 1)) return v as number[];
  fail(`${call} takes a permutation, a word or a list of positive integers, got ${valueToText(v)}`);
}

defineFunction({
  name: 'rsk',
  topic,
  params: [{ name: 'w', type: ['permutation', 'word', 'list'] }],
  returns: 'list',
  description: 'the pair [P, Q] of Robinson–Schensted–Knuth row insertion (P the insertion tableau, Q the recording tableau)',
  example: 'rsk(perm([2, 3, 1]))',
  exampleValue: '[tableau([[1, 3], [2]]), tableau([[1, 2], [3]])]',
  source: 'Knuth, Pacific J. Math. 34 (1970); Stanley, Enumerative Combinatorics 2, §7.11',
  impl: (w) => {
    const { P, Q } = rskRows(lettersArg(w, 'rsk(w)'));
    return [new Tableau(P), new Tableau(Q)];
  },
});

defineFunction({
  name: 'rskShape',
  topic,
  params: [{ name: 'w', type: ['permutation', 'word', 'list'] }],
  returns: 'partition',
  description: 'the common shape of the RSK tableaux of w (its first row is the longest increasing subsequence, Schensted)',
  example: 'rskShape(perm([2, 3, 1]))',
  exampleValue: 'partition([2, 1])',
  source: 'Schensted, Canad. J. Math. 13 (1961)',
  impl: (w) => new Partition(rskRows(lettersArg(w, 'rskShape(w)')).P.map((r) => r.length)),
});
