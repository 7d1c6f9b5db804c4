// permutations(n): all of S_n in lexicographic order (LIBRARY.md §1).

import { fail } from '../../base/errors.js';
import { valueToText } from '../../values/operations.js';
import { isInt } from '../../numbers/integer.js';
import { defineFamily } from '../registry.js';
import type { Value } from '../../values/value.js';
import { Permutation, inversions, lexCompare, nextPermutation } from './permutation.js';
import { FamilyArbitrary, fisherYates } from '../common/arbitrary.js';
import type { Family, Shrunk } from '../family.js';
import { descentSwaps, entryDeletions, removeFromCycle } from './standardise.js';
import { cycleShrinks } from './cycleMoves.js';

export interface SizeParam {
  n: number;
}

/** Reads a size argument: a nonnegative integer small enough to enumerate or sample. */
export function sizeArg(v: Value, what = 'n', max = 1_000_000): number {
  if (!isInt(v) || typeof v === 'bigint' || v < 0) fail(`${what} must be a nonnegative integer, got ${valueToText(v)}`);
  if (v > max) fail(`${what} = ${v} is larger than this family supports (${max})`);
  return v;
}

export function factorialBig(n: number): bigint {
  let r = 1n;
  for (let i = 2; i <= n; i++) r *= BigInt(i);
  return r;
}

/** Simplicity order of permutations: inversions, then lexicographic (LIBRARY.md §1). */
export function comparePermutations(u: Permutation, v: Permutation): number {
  return u.n - v.n || inversions(u.a) - inversions(v.a) || lexCompare(u.a, v.a);
}

export const permutations: Family<SizeParam, Permutation> = defineFamily<SizeParam, Permutation>({
  name: 'permutations',
  params: [{ name: 'n', type: 'integer' }],
  objectKind: 'permutation',
  signature: 'permutations(n: integer)',
  description: 'every permutation of 1..n in one-line notation, in lexicographic order',
  example: 'count(w in permutations(4))',
  source: 'n! (OEIS A000142); Mahonian numbers by inversions (OEIS A008302)',
  prepare(args) {
    return { n: sizeArg(args[0]) };
  },
  count({ n }) {
    return factorialBig(n);
  },
  enumerate({ n }, visit) {
    const w = Permutation.identity(n);
    w.transient = true;
    do {
      if (visit(w)) return true;
    } while (nextPermutation(w.a));
    return false;
  },
  enumerateRange({ n }, lo, hi, visit) {
    const total = factorialBig(n);
    if (hi > total) hi = total;
    if (lo >= hi) return false;
    const w = new Permutation(unrankLex(n, lo));
    w.transient = true;
    for (let left = Number(hi - lo); left > 0; left--) {
      if (visit(w)) return true;
      if (left > 1) nextPermutation(w.a);
    }
    return false;
  },
  isMember({ n }, obj) {
    return obj instanceof Permutation && obj.n === n;
  },
  compare: comparePermutations,
  arbitrary(p) {
    return new FamilyArbitrary(permutations, p, (rng) => new Permutation(fisherYates(rng, p.n)));
  },
  shrink(p, w) {
    return shrinkPermutation(p.n, w);
  },
});

/** The permutation of rank r (0-based) among the permutations of 1..n in lexicographic order (factorial number system). */
export function unrankLex(n: number, r: bigint): number[] {
  const left = Array.from({ length: n }, (_, i) => i + 1);
  const out: number[] = [];
  let f = factorialBig(n);
  for (let i = n; i >= 1; i--) {
    f /= BigInt(i);
    const d = Number(r / f);
    r %= f;
    out.push(left.splice(d, 1)[0]);
  }
  return out;
}

/**
 * Shrink steps of permutations(n) (LIBRARY.md §1): delete an entry and standardise (to S_{n-1}),
 * remove a point from its cycle and standardise (to S_{n-1}), then swap an adjacent descent (one inversion fewer). Distinct results only.
 */
export function* shrinkPermutation(n: number, w: Permutation): Generator<Shrunk<SizeParam, Permutation>> {
  const a = w.a;
  if (n > 0) {
    const seen = new Set<string>();
    const smaller = { n: n - 1 };
    for (const b of entryDeletions(a, seen)) yield { params: smaller, size: n - 1, obj: new Permutation(b) };
    // Also remove a point from its cycle (its preimage now maps to its image) and standardise:
    // this keeps the cycle type but for one shorter cycle, which one-line deletions do not, so
    // claims about cycles shrink well too.
    for (let i = 0; i < n; i++) {
      const b = removeFromCycle(a, i + 1);
      const k = b.join(',');
      if (seen.has(k)) continue;
      seen.add(k);
      yield { params: smaller, size: n - 1, obj: new Permutation(b) };
    }
    // Steps on whole cycles, to any smaller size (several boxes of the cycle type at once).
    for (const b of cycleShrinks(a, seen)) yield { params: { n: b.length }, size: b.length, obj: new Permutation(b) };
  }
  for (const b of descentSwaps(a)) yield { params: { n }, obj: new Permutation(b) };
}
