// reducedWords(w): every reduced word of w, in lexicographic order (LIBRARY.md §1). The objects are
// words (kind 'word'). Counted by recursion on left descents; for the longest element of S_n the
// count is Stanley's binom(n,2)! / prod (2i-1)^(n-i) (OEIS A005118).

import { defineFamily } from '../registry.js';
import type { Family, Shrunk } from '../family.js';
import { clampRange, enumerateBySkipping } from '../common/ranges.js';
import { lexCompare } from '../permutations/permutation.js';
import { Word } from '../words/word.js';
import type * as fc from 'fast-check';
import { FamilyArbitrary, uniformBelow } from '../common/arbitrary.js';
import { inversions } from '../permutations/permutation.js';
import { edelmanGreeneWord, isLongest } from './edelmanGreene.js';
import { hookWalk } from '../tableaux/standardTableaux.js';
import { hookLengthCount } from '../tableaux/shapes.js';
import { isReducedWordOf, leftDescents, leftMultiply, permutationArg, reducedWordCount } from './reducedWordCounts.js';

export interface PermParam {
  w: number[];
  length: number;
}

/** The staircase (n-1, ..., 1). */
function staircase(n: number): number[] {
  return Array.from({ length: n - 1 }, (_, i) => n - 1 - i);
}

export function compareReducedWords(a: Word, b: Word): number {
  return a.letters.length - b.letters.length || lexCompare(a.letters, b.letters);
}

/** Exactly uniform: the first letter i is drawn with probability R(s_i w) / R(w). */
export function randomReducedWord(w: readonly number[], rng: fc.Random): Word {
  const letters: number[] = [];
  let v = w.slice();
  while (inversions(v) > 0) {
    let z = uniformBelow(rng, reducedWordCount(v));
    for (const i of leftDescents(v)) {
      const u = leftMultiply(v, i);
      z -= reducedWordCount(u);
      if (z < 0n) {
        letters.push(i);
        v = u;
        break;
      }
    }
  }
  return new Word(letters);
}

/** Lexicographically smaller reduced words of the same w: commutations b a -> a b, braids (a+1) a (a+1) -> a (a+1) a. */
function* simplify(word: Word): Generator<Word> {
  const s = word.letters;
  for (let k = 0; k + 1 < s.length; k++) {
    if (s[k] > s[k + 1] + 1) {
      const t = s.slice();
      t[k] = s[k + 1];
      t[k + 1] = s[k];
      yield new Word(t);
    }
  }
  for (let k = 0; k + 2 < s.length; k++) {
    if (s[k] === s[k + 2] && s[k + 1] === s[k] - 1) {
      const t = s.slice();
      t[k] = t[k + 2] = s[k + 1];
      t[k + 1] = s[k];
      yield new Word(t);
    }
  }
}

export const reducedWords: Family<PermParam, Word> = defineFamily<PermParam, Word>({
  name: 'reducedWords',
  params: [{ name: 'w', type: 'any' }],
  objectKind: 'word',
  signature: 'reducedWords(w: permutation)',
  description: 'every reduced word a_1 ... a_l of w (w = s_{a_1} * ... * s_{a_l}, l = inv(w)), lexicographically',
  example: 'count(r in reducedWords(perm([3, 2, 1])))',
  source: 'OEIS A005118 for the longest element (Stanley, European J. Combin. 5 (1984))',
  prepare(args) {
    const w = permutationArg(args[0]).slice();
    return { w, length: inversions(w) };
  },
  count({ w }) {
    // For w0 the memo would hold all of S_n; Stanley's theorem gives the count directly.
    return isLongest(w) && w.length > 1 ? hookLengthCount(staircase(w.length)) : reducedWordCount(w);
  },
  enumerate({ w, length }, visit) {
    const word = new Word(new Array<number>(length).fill(0));
    word.transient = true;
    const go = (v: number[], k: number): boolean => {
      if (k === length) return visit(word) === true;
      for (const i of leftDescents(v)) {
        word.letters[k] = i;
        if (go(leftMultiply(v, i), k + 1)) return true;
      }
      return false;
    };
    return go(w.slice(), 0);
  },
  enumerateRange(p, lo, hi, visit) {
    const { w, length } = p;
    // Below the longest element of S_n, n >= 10, counting the subtrees would need more of S_n than
    // the memo of reducedWordCount holds; such sizes are far beyond exhaustive checks, so walking
    // from the start costs nothing that matters there.
    if (isLongest(w) && w.length >= 10) return enumerateBySkipping((v) => reducedWords.enumerate(p, v), lo, hi, visit);
    // The recursion of `enumerate`, passing over whole subtrees while objects remain to be skipped:
    // the words beginning with the left descent i are the reducedWordCount(s_i v) ones of s_i v.
    const range = clampRange(lo, hi, reducedWords.count(p));
    if (!range) return false;
    let skip = range.first,
      skipping = skip > 0n,
      left = range.length,
      stopped = false;
    const word = new Word(new Array<number>(length).fill(0));
    word.transient = true;
    const go = (v: number[], k: number): boolean => {
      if (k === length) {
        if (visit(word) === true) return (stopped = true);
        return --left === 0;
      }
      for (const i of leftDescents(v)) {
        const u = leftMultiply(v, i);
        if (skipping) {
          const below = reducedWordCount(u);
          if (below <= skip) {
            skip -= below;
            skipping = skip > 0n;
            continue;
          }
        }
        word.letters[k] = i;
        if (go(u, k + 1)) return true;
      }
      return false;
    };
    go(w.slice(), 0);
    return stopped;
  },
  isMember({ w }, obj) {
    return obj instanceof Word && isReducedWordOf(obj.letters, w);
  },
  compare: compareReducedWords,
  arbitrary(p): fc.Arbitrary<Word> {
    const { w } = p;
    if (isLongest(w) && w.length > 1) {
      // Uniform staircase tableau (hook walk), then the Edelman–Greene bijection: no memo needed.
      const stair = staircase(w.length);
      return new FamilyArbitrary(reducedWords, p, (rng) => new Word(edelmanGreeneWord(hookWalk(stair, rng).rows)));
    }
    return new FamilyArbitrary(reducedWords, p, (rng) => randomReducedWord(w, rng));
  },
  *shrink(p, obj): Generator<Shrunk<PermParam, Word>> {
    for (const u of simplify(obj)) yield { params: p, obj: u };
  },
});
