// Moves for Markov chains on combinatorial objects (LIBRARY.md §2): on matchings around a circle,
// joinAt (the Temperley–Lieb generator e_i acting on link patterns) and crossAt (i and i+1 exchange
// partners, the crossing generator of the Brauer algebra); on permutations, swapAt (the adjacent
// transposition of positions i, i+1, i.e. w * s_i) and rotate (a cyclic shift of the one-line
// notation; on a matching, a rotation of the circle). Positions on a circle are taken mod 2n.

import { fail } from '../base/errors.js';
import { Matching } from '../families/matchings/matching.js';
import { Permutation } from '../families/permutations/permutation.js';
import type { Int } from '../numbers/integer.js';
import type { Value } from '../values/value.js';
import { defineFunction } from './registry.js';

/** A position i on the circle of 2n points, as 0-based index i-1 mod 2n. */
function circlePosition(call: string, m: Matching, i: Value): number {
  const size = m.p.length;
  if (size === 0) fail(`${call}: the empty matching has no points`);
  const x = i as Int;
  const r = typeof x === 'bigint' ? Number((((x - 1n) % BigInt(size)) + BigInt(size)) % BigInt(size)) : (((x - 1) % size) + size) % size;
  return r;
}

/** e_i: i and i+1 become an arc, their former partners are joined; unchanged if already an arc. */
export function joinAt(m: Matching, i0: number): Matching {
  const p = m.p,
    size = p.length;
  const i = i0 + 1,
    j = i0 === size - 1 ? 1 : i0 + 2; // 1-based points i and i+1 (mod 2n)
  const a = p[i - 1],
    b = p[j - 1];
  if (a === j) return m;
  const q = p.slice();
  q[i - 1] = j;
  q[j - 1] = i;
  q[a - 1] = b;
  q[b - 1] = a;
  return new Matching(q);
}

/** i and i+1 exchange partners; unchanged if they form an arc. */
export function crossAt(m: Matching, i0: number): Matching {
  const p = m.p,
    size = p.length;
  const i = i0 + 1,
    j = i0 === size - 1 ? 1 : i0 + 2;
  const a = p[i - 1],
    b = p[j - 1];
  if (a === j) return m;
  const q = p.slice();
  q[i - 1] = b;
  q[b - 1] = i;
  q[j - 1] = a;
  q[a - 1] = j;
  return new Matching(q);
}

/** The rotation of the circle sending point i to i + k (mod 2n). */
export function rotateMatching(m: Matching, k: number): Matching {
  const size = m.p.length;
  if (size === 0) return m;
  const s = ((k % size) + size) % size;
  const q = new Array<number>(size);
  for (let i = 0; i < size; i++) q[(i + s) % size] = ((m.p[i] - 1 + s) % size) + 1;
  return new Matching(q);
}

/** [w(k+1), ..., w(n), w(1), ..., w(k)]: the one-line notation shifted left by k (mod n). */
export function rotatePermutation(w: Permutation, k: number): Permutation {
  const n = w.a.length;
  if (n === 0) return w;
  const s = ((k % n) + n) % n;
  return new Permutation(Array.from({ length: n }, (_, i) => w.a[(i + s) % n]));
}

defineFunction({
  name: 'joinAt',
  topic: 'matchings',
  params: [
    { name: 'm', type: 'matching' },
    { name: 'i', type: 'integer' },
  ],
  returns: 'matching',
  description:
    'the Temperley–Lieb action on a matching around a circle: i and i+1 (mod 2n) become an arc and their former partners are joined; unchanged if i, i+1 already form an arc',
  example: 'joinAt(matching([[1, 3], [2, 4]]), 1)',
  exampleValue: 'matching([[1, 2], [3, 4]])',
  source:
    'Temperley and Lieb, Proc. R. Soc. Lond. A 322 (1971); link patterns as in "Loops, matchings and alternating-sign matrices", arXiv:math/0211285',
  impl: (m, i) => joinAt(m as Matching, circlePosition('joinAt(m, i)', m as Matching, i)),
});

defineFunction({
  name: 'crossAt',
  topic: 'matchings',
  params: [
    { name: 'm', type: 'matching' },
    { name: 'i', type: 'integer' },
  ],
  returns: 'matching',
  description: 'the points i and i+1 (mod 2n) exchange partners; unchanged if they form an arc',
  example: 'crossAt(matching([[1, 4], [2, 3]]), 1)',
  exampleValue: 'matching([[1, 3], [2, 4]])',
  source:
    'the crossing generators of the Brauer algebra; "Inhomogeneous model of crossing loops and multidegrees of some algebraic varieties", Comm. Math. Phys. 262 (2006)',
  impl: (m, i) => crossAt(m as Matching, circlePosition('crossAt(m, i)', m as Matching, i)),
});

defineFunction({
  name: 'swapAt',
  topic: 'permutations',
  params: [
    { name: 'w', type: 'permutation' },
    { name: 'i', type: 'integer' },
  ],
  returns: 'permutation',
  description: 'w with the entries in positions i and i+1 exchanged, i.e. w * s_i (1 <= i < n)',
  example: 'swapAt(perm([3, 1, 2]), 2)',
  exampleValue: 'perm([3, 2, 1])',
  source: 'definition (right multiplication by the simple transposition s_i)',
  impl: (w, i) => {
    const p = w as Permutation,
      n = p.a.length;
    const k = i as Int;
    if (typeof k === 'bigint' || k < 1 || k >= n) {
      fail(`swapAt(w, i) needs 1 <= i <= ${n - 1} for a permutation of ${n}, got i = ${k}`);
    }
    const a = p.a.slice();
    [a[k - 1], a[k]] = [a[k], a[k - 1]];
    return new Permutation(a);
  },
});

defineFunction({
  name: 'rotate',
  topic: 'permutations',
  params: [
    { name: 'x', type: ['permutation', 'matching'] },
    { name: 'k', type: 'integer', optional: true },
  ],
  returns: 'any',
  description:
    'a cyclic shift by k (default 1): for a permutation, its one-line notation shifted left, [w(k+1), ..., w(n), w(1), ..., w(k)]; for a matching, the rotation of the circle taking point i to i + k (mod 2n)',
  example: 'rotate(perm([2, 3, 1, 4]))',
  exampleValue: 'perm([3, 1, 4, 2])',
  source: 'definition',
  impl: (x, k) => {
    const kk = k === undefined ? 1 : (k as Int);
    if (typeof kk === 'bigint') fail(`rotate(x, k): the shift k = ${kk} is too large`);
    if (x instanceof Matching) return rotateMatching(x, kk);
    return rotatePermutation(x as Permutation, kk);
  },
});
