// Permutations built from others or from scratch: the inverse, the longest element, the simple
// transpositions, and the lexicographically least reduced word. Composition is FORMAT.md's:
// (u*v)[i] = u[v[i]], so u * s_i swaps the entries in positions i and i+1 of u, and s_i * u swaps
// the values i and i+1.

import { Permutation } from '../../families/permutations/permutation.js';
import { Matrix } from '../../algebra/matrix.js';
import type { Scalar } from '../../numbers/rational.js';
import { defineFunction } from '../registry.js';
import { smallIntArg } from '../integerArgs.js';
import { Scratch } from './scratch.js';

const topic = 'permutations';
/** Largest n for which longest(n) and simple(i, n) build a permutation. */
const MAX_N = 10_000_000;

/** The inverse in one-line notation: b[a[i]-1] = i+1. */
export function inverse(a: readonly number[]): number[] {
  // a.slice() gives a packed array of small integers of the right length, which we overwrite.
  const b = a.slice();
  for (let i = 0; i < a.length; i++) b[a[i] - 1] = i + 1;
  return b;
}

const posBuf = new Scratch();

/**
 * The lexicographically least reduced word [a_1, ..., a_l] of w = s_{a_1} * ... * s_{a_l}.
 * All reduced words have length inv(w), so the least is found greedily: a_1 is the least left
 * descent of w (a value i with i+1 left of i), and the rest is the least word of s_{a_1} * w, which
 * swaps the values i and i+1. Only the positions of values change, and after a step at i the next
 * least left descent is at i-1 or later, so the scan never restarts: O(n + inv(w)).
 */
export function reducedWord(a: readonly number[]): number[] {
  const n = a.length;
  const pos = posBuf.get(n + 2); // pos[v] = position of value v
  for (let i = 0; i < n; i++) pos[a[i]] = i;
  const word: number[] = [];
  let i = 1;
  while (i < n) {
    if (pos[i] > pos[i + 1]) {
      word.push(i);
      const t = pos[i];
      pos[i] = pos[i + 1];
      pos[i + 1] = t;
      if (i > 1) i--;
    } else i++;
  }
  return word;
}

defineFunction({
  name: 'inverse',
  topic,
  params: [{ name: 'w', type: 'permutation' }],
  returns: 'permutation',
  description: 'the inverse permutation, with inverse(w)[w[i]] = i (the same as w^-1)',
  example: 'inverse(perm([2, 3, 1]))',
  exampleValue: 'perm([3, 1, 2])',
  source: 'definition; inv(inverse(w)) = inv(w)',
  impl: (w) => new Permutation(inverse((w as Permutation).a)),
});

defineFunction({
  name: 'longest',
  topic,
  params: [{ name: 'n', type: 'integer' }],
  returns: 'permutation',
  description: 'the longest element w0 = n n-1 ... 1 of S_n, with inv(w0) = n(n-1)/2',
  example: 'longest(4)',
  exampleValue: 'perm([4, 3, 2, 1])',
  source: 'definition; inv(w0) = binomial(n, 2)',
  impl: (n) => {
    const m = smallIntArg('longest(n)', 'n', n, 0, MAX_N);
    const a: number[] = [];
    for (let i = 0; i < m; i++) a.push(m - i);
    return new Permutation(a);
  },
});

defineFunction({
  name: 'simple',
  topic,
  params: [
    { name: 'i', type: 'integer' },
    { name: 'n', type: 'integer' },
  ],
  returns: 'permutation',
  description: 'the simple transposition s_i = (i, i+1) in S_n, for 1 <= i < n',
  example: 'simple(2, 4)',
  exampleValue: 'perm([1, 3, 2, 4])',
  source: 'definition',
  impl: (iv, nv) => {
    const n = smallIntArg('simple(i, n)', 'n', nv, 2, MAX_N);
    const i = smallIntArg('simple(i, n)', 'i', iv, 1, n - 1);
    const a: number[] = [];
    for (let j = 0; j < n; j++) a.push(j + 1);
    a[i - 1] = i + 1;
    a[i] = i;
    return new Permutation(a);
  },
});

defineFunction({
  name: 'reducedWord',
  topic,
  params: [{ name: 'w', type: 'permutation' }],
  returns: 'list',
  description:
    'the lexicographically least reduced word [a_1, ..., a_l] with w = s_{a_1} * ... * s_{a_l} and l = inv(w) ([] for the identity)',
  example: 'reducedWord(perm([3, 1, 2]))',
  exampleValue: '[2, 1]',
  source: 'definition; reduced words of w0 in S_4 number 16 (Stanley 1984, the staircase tableaux)',
  impl: (w) => reducedWord((w as Permutation).a),
});

defineFunction({
  name: 'permMatrix',
  topic,
  params: [{ name: 'w', type: 'permutation' }],
  returns: 'matrix',
  description: 'the permutation matrix of w: 1 at row i, column w[i], 0 elsewhere (so permMatrix(u*v) = permMatrix(v)*permMatrix(u))',
  example: 'permMatrix(perm([2, 3, 1]))',
  exampleValue: 'matrix([[0, 1, 0], [0, 0, 1], [1, 0, 0]])',
  source: 'definition; det(permMatrix(w)) = sign(w)',
  impl: (w) => {
    const a = (w as Permutation).a,
      n = a.length;
    const entries: Scalar[] = new Array<Scalar>(n * n).fill(0);
    for (let i = 0; i < n; i++) entries[i * n + a[i] - 1] = 1;
    return new Matrix(n, n, entries);
  },
});
