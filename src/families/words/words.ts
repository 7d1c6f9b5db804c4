// words(n, k): the words of length n over the letters 1..k, in lexicographic order.

import { fail } from '../../base/errors.js';
import type { Structured } from '../../values/structured.js';
import { FamilyArbitrary, lexCompareArrays } from '../common/arbitrary.js';
import type { Family, Shrunk } from '../family.js';
import { defineFamily } from '../registry.js';
import { sizeArg } from '../permutations/permutations.js';
import { Word } from './word.js';
import { clampRange } from '../common/ranges.js';

export interface WordsParam {
  n: number;
  k: number;
}

/** Simplicity order: length, then lexicographic. */
export function compareWords(u: Word, v: Word): number {
  return u.length - v.length || lexCompareArrays(u.letters, v.letters);
}

/** Step a word over 1..k to the next one in lexicographic order; false after k k ... k. */
function nextWord(a: number[], k: number): boolean {
  let i = a.length - 1;
  while (i >= 0 && a[i] === k) a[i--] = 1;
  if (i < 0) return false;
  a[i]++;
  return true;
}

export const words: Family<WordsParam, Word> = defineFamily<WordsParam, Word>({
  name: 'words',
  params: [
    { name: 'n', type: 'integer' },
    { name: 'k', type: 'integer' },
  ],
  objectKind: 'word',
  signature: 'words(n: integer, k: integer)',
  description: 'the words of length n over the letters 1..k, in lexicographic order',
  example: 'count(u in words(3, 2))',
  source: 'k^n (e.g. OEIS A000079 for k = 2, A000244 for k = 3)',
  prepare(args) {
    return { n: sizeArg(args[0]), k: sizeArg(args[1], 'k') };
  },
  count({ n, k }) {
    return BigInt(k) ** BigInt(n);
  },
  enumerate({ n, k }, visit) {
    if (n > 0 && k === 0) return false;
    const w = new Word(new Array<number>(n).fill(1));
    w.transient = true;
    const a = w.letters;
    for (;;) {
      if (visit(w) === true) return true;
      if (!nextWord(a, k)) return false;
    }
  },
  enumerateRange({ n, k }, lo, hi, visit) {
    const range = clampRange(lo, hi, BigInt(k) ** BigInt(n));
    if (!range) return false;
    // The word of rank r: its letters less one are the n base-k digits of r, the first the most significant.
    const w = new Word(new Array<number>(n).fill(1));
    w.transient = true;
    const a = w.letters;
    const base = BigInt(k);
    let r = range.first;
    for (let i = n - 1; i >= 0 && r > 0n; i--) {
      a[i] = Number(r % base) + 1;
      r /= base;
    }
    for (let left = range.length; ; ) {
      if (visit(w) === true) return true;
      if (--left === 0) return false;
      nextWord(a, k);
    }
  },
  isMember({ n, k }, obj: Structured) {
    return obj instanceof Word && obj.length === n && obj.letters.every((x) => Number.isInteger(x) && x >= 1 && x <= k);
  },
  compare: compareWords,
  arbitrary(p) {
    if (p.n > 0 && p.k === 0) fail(`words(${p.n}, 0) is empty: there are no letters`);
    return new FamilyArbitrary(words, p, (rng) => new Word(Array.from({ length: p.n }, () => rng.nextInt(1, p.k))));
  },
  shrink(p, w) {
    return shrinkWord(p, w);
  },
});

/**
 * Delete a letter (length n-1); then exchange two letter values throughout the word when that makes
 * it lexicographically smaller (222 becomes 111: claims about patterns of equal letters keep
 * failing); then lower a letter by one.
 */
function* shrinkWord(p: WordsParam, w: Word): Generator<Shrunk<WordsParam, Word>> {
  const a = w.letters;
  const seen = new Set<string>();
  for (let i = 0; i < a.length; i++) {
    const b = a.filter((_, j) => j !== i);
    const key = b.join(',');
    if (seen.has(key)) continue;
    seen.add(key);
    yield { params: { n: p.n - 1, k: p.k }, size: p.n - 1, obj: new Word(b) };
  }
  const present = [...new Set(a)].sort((x, y) => x - y);
  for (const hi of present) {
    for (let lo = 1; lo < hi; lo++) {
      const b = a.map((x) => (x === hi ? lo : x === lo ? hi : x));
      if (compareWords(new Word(b), w) < 0) yield { params: p, obj: new Word(b) };
    }
  }
  for (let i = 0; i < a.length; i++) {
    if (a[i] > 1) {
      const b = a.slice();
      b[i]--;
      yield { params: p, obj: new Word(b) };
    }
  }
}
