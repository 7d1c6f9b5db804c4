// Functions on lists and sequences (LIBRARY.md §2): length, reversal, sorting, map, the ends of a
// list, and the shape properties of a sequence of numbers (unimodal, log-concave, palindromic).
// Reductions (sum, count, min, max, ...) are forms of the language, not functions here.

import { fail } from '../base/errors.js';
import { Permutation } from '../families/permutations/permutation.js';
import { isScalar, type Scalar } from '../numbers/rational.js';
import { scmp, smul } from '../numbers/scalar.js';
import type { Lambda } from '../values/lambda.js';
import { valueKey, valueToText } from '../values/operations.js';
import { sortValues } from '../values/order.js';
import type { Structured } from '../values/structured.js';
import { article, typeOf } from '../values/types.js';
import type { Value } from '../values/value.js';
import { smallIntArg } from './integerArgs.js';
import { defineFunction } from './registry.js';

const topic = 'lists';
type List = readonly Value[];

// ---- len: every value with one obvious length, the same one its indexing x[i] runs over ----

/** Kinds with an obvious length, and how to read it (fields of the classes in src/families). */
const LENGTHS: Record<string, (v: Structured) => number> = {
  permutation: (v) => (v as Permutation).a.length,
  word: (v) => (v as unknown as { letters: number[] }).letters.length,
  composition: (v) => (v as unknown as { parts: number[] }).parts.length,
  partition: (v) => (v as unknown as { parts: number[] }).parts.length,
  dyck: (v) => (v as unknown as { steps: number[] }).steps.length,
  subset: (v) => (v as unknown as { elems: number[] }).elems.length,
  setPartition: (v) => (v as unknown as { length: number }).length,
  tableau: (v) => (v as unknown as { rows: number[][] }).rows.length,
  asm: (v) => (v as unknown as { rows: number[][] }).rows.length,
  pipeDream: (v) => (v as unknown as { crosses: unknown[] }).crosses.length,
  matrix: (v) => (v as unknown as { rows: number }).rows,
};

/** What x[i] is and what len(x) counts, by kind (for `hunch list` and index errors). */
export const INDEX_UNITS: Record<string, string> = {
  permutation: 'entries',
  word: 'letters',
  composition: 'parts',
  partition: 'parts',
  dyck: 'steps',
  subset: 'elements',
  setPartition: 'blocks',
  tableau: 'rows',
  asm: 'rows',
  pipeDream: 'crosses',
  matrix: 'rows',
};

/** What to use instead, for kinds whose "length" could mean two things. */
const AMBIGUOUS: Record<string, string> = {
  matching: 'use len(arcs(m)) for the number of arcs',
};

export function lengthOf(v: Value): number {
  if (Array.isArray(v)) return v.length;
  if (typeof v === 'string') {
    let n = 0;
    for (const _ of v) n++; // code points, not UTF-16 units
    return n;
  }
  const t = typeOf(v);
  const get = LENGTHS[t];
  if (get) return get(v as Structured);
  const hint = AMBIGUOUS[t];
  fail(
    `len(x) is not defined for ${article(t)}` +
      (hint ? `: ${hint}` : `; it takes a list, a string, a ${Object.keys(LENGTHS).join(', a ')}`),
  );
}

defineFunction({
  name: 'len',
  topic,
  params: [{ name: 'x', type: 'any' }],
  returns: 'integer',
  description:
    'the length of a list or a string, the n of a permutation of 1..n, the number of letters of a word, of steps of a Dyck path, of parts of a composition or a partition, of elements of a subset, of blocks of a set partition, of rows of a tableau, an ASM or a matrix, of crosses of a pipe dream: always the number of indices x[i] runs over',
  example: 'len(perm([3, 1, 2]))',
  exampleValue: '3',
  source: 'definition',
  impl: (x) => lengthOf(x),
});

// ---- reordering ----

defineFunction({
  name: 'reverse',
  topic,
  params: [{ name: 'x', type: ['list', 'string', 'permutation'] }],
  returns: 'any',
  description: 'a list or string read backwards; for a permutation w of 1..n, the permutation w[n], ..., w[1]',
  example: 'reverse([1, 2, 3])',
  exampleValue: '[3, 2, 1]',
  source: 'definition',
  impl: (x) => {
    if (x instanceof Permutation) return new Permutation(x.a.slice().reverse());
    if (typeof x === 'string') return [...x].reverse().join('');
    return (x as List).slice().reverse();
  },
});

defineFunction({
  name: 'sort',
  topic,
  params: [{ name: 'L', type: 'list' }],
  returns: 'list',
  description:
    'the list in increasing order: numbers by value; lists, strings and objects of one kind lexicographically (a fixed total order across kinds)',
  example: 'sort([3, 1/2, -2, 1])',
  exampleValue: '[-2, 1/2, 1, 3]',
  source: 'definition',
  impl: (L) => sortValues(L as List),
});

defineFunction({
  name: 'map',
  topic,
  params: [
    { name: 'L', type: 'list' },
    { name: 'f', type: 'function' },
  ],
  returns: 'list',
  description: 'the list [f(L[1]), ..., f(L[len(L)])] for a function of one argument such as x -> x^2',
  example: 'map([1, 2, 3], x -> x^2)',
  exampleValue: '[1, 4, 9]',
  source: 'definition',
  impl: (L, f) => {
    const fn = f as Lambda;
    const list = L as List;
    const out: Value[] = [];
    for (const x of list) out.push(fn.call([x]));
    return out;
  },
});

// ---- ends of a list ----

defineFunction({
  name: 'first',
  topic,
  params: [{ name: 'L', type: 'list' }],
  returns: 'any',
  description: 'the first entry L[1] of a nonempty list',
  example: 'first([5, 6, 7])',
  exampleValue: '5',
  source: 'definition',
  impl: (L) => {
    const list = L as List;
    if (list.length === 0) fail('first(L) of the empty list');
    return list[0];
  },
});

defineFunction({
  name: 'last',
  topic,
  params: [{ name: 'L', type: 'list' }],
  returns: 'any',
  description: 'the last entry L[len(L)] of a nonempty list',
  example: 'last([5, 6, 7])',
  exampleValue: '7',
  source: 'definition',
  impl: (L) => {
    const list = L as List;
    if (list.length === 0) fail('last(L) of the empty list');
    return list[list.length - 1];
  },
});

defineFunction({
  name: 'take',
  topic,
  params: [
    { name: 'L', type: 'list' },
    { name: 'k', type: 'integer' },
  ],
  returns: 'list',
  description: 'the first k entries of L (all of L when k >= len(L)), for k >= 0',
  example: 'take([5, 6, 7], 2)',
  exampleValue: '[5, 6]',
  source: 'definition',
  impl: (L, k) => (L as List).slice(0, smallIntArg('take(L, k)', 'k', k, 0, Number.MAX_SAFE_INTEGER)),
});

defineFunction({
  name: 'drop',
  topic,
  params: [
    { name: 'L', type: 'list' },
    { name: 'k', type: 'integer' },
  ],
  returns: 'list',
  description: 'L without its first k entries ([] when k >= len(L)), for k >= 0',
  example: 'drop([5, 6, 7], 2)',
  exampleValue: '[7]',
  source: 'definition',
  impl: (L, k) => (L as List).slice(smallIntArg('drop(L, k)', 'k', k, 0, Number.MAX_SAFE_INTEGER)),
});

// ---- shape of a sequence of numbers ----

function numbersArg(call: string, L: Value): readonly Scalar[] {
  const list = L as List;
  for (let i = 0; i < list.length; i++) {
    if (!isScalar(list[i])) fail(`${call} needs a list of numbers, but entry ${i + 1} is ${valueToText(list[i])}`);
  }
  return list as readonly Scalar[];
}

/** a_1 <= ... <= a_j >= ... >= a_m for some j (plateaus allowed). */
export function isUnimodal(a: readonly Scalar[]): boolean {
  let i = 1;
  while (i < a.length && scmp(a[i - 1], a[i]) <= 0) i++;
  while (i < a.length && scmp(a[i - 1], a[i]) >= 0) i++;
  return i >= a.length;
}

/** a_i^2 >= a_{i-1} a_{i+1} for every interior i. */
export function isLogConcave(a: readonly Scalar[]): boolean {
  for (let i = 1; i + 1 < a.length; i++) if (scmp(smul(a[i], a[i]), smul(a[i - 1], a[i + 1])) < 0) return false;
  return true;
}

defineFunction({
  name: 'isUnimodal',
  topic,
  params: [{ name: 'L', type: 'list' }],
  returns: 'boolean',
  description: 'whether the numbers weakly increase and then weakly decrease: L[1] <= ... <= L[j] >= ... >= L[len(L)] for some j',
  example: 'isUnimodal([1, 3, 3, 2])',
  exampleValue: 'true',
  source: 'Stanley, Log-concave and unimodal sequences in algebra, combinatorics, and geometry (1989), §1',
  impl: (L) => isUnimodal(numbersArg('isUnimodal(L)', L)),
});

defineFunction({
  name: 'isLogConcave',
  topic,
  params: [{ name: 'L', type: 'list' }],
  returns: 'boolean',
  description:
    'whether L[i]^2 >= L[i-1]*L[i+1] for every 1 < i < len(L) (internal zeros are not excluded: test them separately if you need that)',
  example: 'isLogConcave([1, 4, 6, 4, 1])',
  exampleValue: 'true',
  source: 'Stanley, Log-concave and unimodal sequences in algebra, combinatorics, and geometry (1989), §1',
  impl: (L) => isLogConcave(numbersArg('isLogConcave(L)', L)),
});

defineFunction({
  name: 'isPalindromic',
  topic,
  params: [{ name: 'L', type: ['list', 'string'] }],
  returns: 'boolean',
  description: 'whether L reads the same backwards: L[i] == L[len(L)+1-i] for every i',
  example: 'isPalindromic([1, 3, 3, 1])',
  exampleValue: 'true',
  source: 'definition',
  impl: (L) => {
    const list = typeof L === 'string' ? [...L] : (L as List);
    // Keys, not ==: entries of unrelated kinds are simply unequal here, not a type error.
    for (let i = 0, j = list.length - 1; i < j; i++, j--) if (list[i] !== list[j] && valueKey(list[i]) !== valueKey(list[j])) return false;
    return true;
  },
});
