// Cycles of permutations: the cycle list, the order (the lcm of the cycle lengths) and the
// transpositions t_ij.

import { Permutation } from '../../families/permutations/permutation.js';
import { fail } from '../../base/errors.js';
import { ilcm, type Int } from '../../numbers/integer.js';
import { defineFunction } from '../registry.js';
import { smallIntArg } from '../integerArgs.js';
import { cycleLengths } from './statistics.js';

const topic = 'permutations';
const MAX_N = 10_000_000;

/** The cycles, each starting at its least element, ordered by least element (fixed points included). */
export function cycleList(a: readonly number[]): number[][] {
  const n = a.length;
  const seen = new Uint8Array(n);
  const out: number[][] = [];
  for (let i = 0; i < n; i++) {
    if (seen[i]) continue;
    const c: number[] = [];
    for (let j = i; !seen[j]; j = a[j] - 1) {
      seen[j] = 1;
      c.push(j + 1);
    }
    out.push(c);
  }
  return out;
}

/** The order of w in S_n: the least k >= 1 with w^k = id, the lcm of the cycle lengths. */
export function order(a: readonly number[]): Int {
  let r: Int = 1;
  for (const len of new Set(cycleLengths(a))) r = ilcm(r, len);
  return r;
}

defineFunction({
  name: 'cycleList',
  topic,
  params: [{ name: 'w', type: 'permutation' }],
  returns: 'list',
  description:
    'the cycles of w as lists [i, w[i], w[w[i]], ...], each starting at its least element, ordered by least element (fixed points included)',
  example: 'cycleList(perm([3, 1, 2, 5, 4, 6]))',
  exampleValue: '[[1, 3, 2], [4, 5], [6]]',
  source: 'definition (Stanley, Enumerative Combinatorics 1, 2nd ed., §1.3); their number: OEIS A132393',
  impl: (w) => cycleList((w as Permutation).a),
});

defineFunction({
  name: 'order',
  topic,
  params: [{ name: 'w', type: 'permutation' }],
  returns: 'integer',
  description: 'the order of w in the symmetric group: the least k >= 1 with w^k = id, the lcm of its cycle lengths',
  example: 'order(perm([2, 3, 1, 5, 4]))',
  exampleValue: '6',
  source: 'OEIS A000085 (order dividing 2: involutions), A000793 (Landau: the largest order in S_n)',
  impl: (w) => order((w as Permutation).a),
});

defineFunction({
  name: 'transposition',
  topic,
  params: [
    { name: 'i', type: 'integer' },
    { name: 'j', type: 'integer' },
    { name: 'n', type: 'integer' },
  ],
  returns: 'permutation',
  description: 't_ij in S_n: the permutation exchanging i and j (i != j, both in 1..n) and fixing the rest',
  example: 'transposition(1, 3, 4)',
  exampleValue: 'perm([3, 2, 1, 4])',
  source: 'definition; w * t_ij exchanges the entries in positions i and j (Björner and Brenti, Combinatorics of Coxeter Groups, §2.1)',
  impl: (i, j, n) => {
    const m = smallIntArg('transposition(i, j, n)', 'n', n, 2, MAX_N);
    const a = smallIntArg('transposition(i, j, n)', 'i', i, 1, m),
      b = smallIntArg('transposition(i, j, n)', 'j', j, 1, m);
    if (a === b) fail(`transposition(i, j, n) needs i != j, got i = j = ${a}`);
    const w = Array.from({ length: m }, (_, k) => k + 1);
    w[a - 1] = b;
    w[b - 1] = a;
    return new Permutation(w);
  },
});
