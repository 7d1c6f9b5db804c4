// Classical pattern containment: w contains p (of length k) when some k entries of w, read left to
// right, are in the same relative order as p. A pattern is given as a permutation, a list that is a
// permutation of 1..k, or a digit string such as "1342".

import { fail } from '../../base/errors.js';
import { Permutation } from '../../families/permutations/permutation.js';
import type { Value } from '../../values/value.js';
import { valueToText } from '../../values/operations.js';
import { defineFunction, type ParamDecl } from '../registry.js';
import { Scratch } from './scratch.js';

/**
 * A pattern prepared for matching left to right. When the entries for p[0..j-1] are chosen, the
 * entry for p[j] must exceed the one chosen for position below[j] (the position among 0..j-1 whose
 * pattern value is the largest one less than p[j]) and be less than the one for above[j] (the
 * smallest larger one); -1 means no bound. These two comparisons fix its order against all the
 * earlier entries.
 */
export interface Pattern {
  readonly p: readonly number[];
  readonly below: Int32Array;
  readonly above: Int32Array;
}

export function preparePattern(p: readonly number[]): Pattern {
  const k = p.length;
  const below = new Int32Array(k).fill(-1),
    above = new Int32Array(k).fill(-1);
  for (let j = 0; j < k; j++) {
    for (let i = 0; i < j; i++) {
      if (p[i] < p[j] && (below[j] < 0 || p[i] > p[below[j]])) below[j] = i;
      if (p[i] > p[j] && (above[j] < 0 || p[i] < p[above[j]])) above[j] = i;
    }
  }
  return { p, below, above };
}

const fromStrings = new Map<string, Pattern>();

/** Reads a pattern argument; strings are parsed once and remembered. */
export function patternArg(call: string, v: Value): Pattern {
  if (v instanceof Permutation) return preparePattern(v.a);
  if (typeof v === 'string') {
    let pat = fromStrings.get(v);
    if (pat === undefined) {
      if (!/^[1-9]*$/.test(v))
        fail(`${call}: the pattern ${JSON.stringify(v)} must be a string of digits 1-9 such as "1342"; for longer patterns use a list`);
      pat = preparePattern(checkPermutation(call, [...v].map(Number), JSON.stringify(v)));
      if (fromStrings.size < 1000) fromStrings.set(v, pat);
    }
    return pat;
  }
  if (Array.isArray(v)) {
    for (const x of v)
      if (typeof x !== 'number' && typeof x !== 'bigint') fail(`${call}: the pattern ${valueToText(v)} must be a list of integers`);
    return preparePattern(checkPermutation(call, v as number[], valueToText(v)));
  }
  fail(`${call}: a pattern is a permutation, a list such as [1, 3, 4, 2] or a string such as "1342", got ${valueToText(v)}`);
}

function checkPermutation(call: string, p: number[], text: string): number[] {
  const k = p.length;
  const seen = new Uint8Array(k + 1);
  for (const x of p) {
    if (!Number.isInteger(x) || x < 1 || x > k || seen[x]) fail(`${call}: the pattern ${text} is not a permutation of 1..${k}`);
    seen[x] = 1;
  }
  return p;
}

const chosenBuf = new Scratch(),
  atBuf = new Scratch();

/**
 * Visit occurrences of the pattern in a: choose positions left to right, each entry checked
 * against its two bounds. `stopAtFirst` ends at the first occurrence. Returns how many were found.
 */
function occurrences(a: readonly number[], pat: Pattern, stopAtFirst: boolean): number {
  const n = a.length,
    k = pat.p.length;
  if (k === 0) return 1;
  if (k > n) return 0;
  const { below, above } = pat;
  const chosen = chosenBuf.get(k); // values chosen for pattern positions 0..j-1
  const at = atBuf.get(k); // the position in a tried for pattern position j
  let count = 0;
  let j = 0;
  at[0] = -1;
  for (;;) {
    // advance pattern position j to its next admissible position in a
    let i = at[j] + 1;
    const last = n - k + j; // leave room for the remaining pattern entries
    const lo = below[j] >= 0 ? chosen[below[j]] : 0;
    const hi = above[j] >= 0 ? chosen[above[j]] : n + 1;
    while (i <= last && (a[i] <= lo || a[i] >= hi)) i++;
    if (i > last) {
      if (j === 0) return count;
      j--;
      continue;
    }
    at[j] = i;
    chosen[j] = a[i];
    if (j === k - 1) {
      count++;
      if (stopAtFirst) return count;
    } else {
      j++;
      at[j] = i;
    }
  }
}

export function contains(a: readonly number[], pat: Pattern): boolean {
  return occurrences(a, pat, true) > 0;
}

export function patternCount(a: readonly number[], pat: Pattern): number {
  return occurrences(a, pat, false);
}

const topic = 'permutations';
const params: ParamDecl[] = [
  { name: 'w', type: 'permutation' },
  { name: 'p', type: ['permutation', 'list', 'string'] },
];
const patternSource = 'definition; avoiders counted in OEIS A000108 (length 3), A022558 (1342), A005802 (1234)';

defineFunction({
  name: 'contains',
  topic,
  params,
  returns: 'boolean',
  description:
    'whether w contains the pattern p (a permutation, a list, or a digit string such as "132"): some entries of w, left to right, in the relative order of p',
  example: 'contains(perm([2, 4, 1, 3]), "231")',
  exampleValue: 'true',
  source: patternSource,
  impl: (w, p) => contains((w as Permutation).a, patternArg('contains(w, p)', p)),
});

defineFunction({
  name: 'avoids',
  topic,
  params,
  returns: 'boolean',
  description: 'whether w avoids the pattern p, i.e. does not contain it',
  example: 'avoids(perm([2, 4, 1, 3]), "321")',
  exampleValue: 'true',
  source: patternSource,
  impl: (w, p) => !contains((w as Permutation).a, patternArg('avoids(w, p)', p)),
});

defineFunction({
  name: 'patternCount',
  topic,
  params,
  returns: 'integer',
  description: 'the number of occurrences of the pattern p in w (sets of positions whose entries are in the relative order of p)',
  example: 'patternCount(perm([1, 3, 2, 4]), [1, 2])',
  exampleValue: '5',
  source: 'definition; patternCount(w, [2, 1]) = inv(w)',
  impl: (w, p) => patternCount((w as Permutation).a, patternArg('patternCount(w, p)', p)),
});
