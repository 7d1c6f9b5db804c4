// involutions(n): the permutations w of 1..n with w·w = id, in lexicographic order.

import type { Structured } from '../../values/structured.js';
import { FamilyArbitrary, uniformBelow } from '../common/arbitrary.js';
import type { Family, Shrunk } from '../family.js';
import { defineFamily } from '../registry.js';
import { clampRange } from '../common/ranges.js';
import { Permutation } from './permutation.js';
import { comparePermutations, sizeArg, type SizeParam } from './permutations.js';
import { deleteEntry, deleteTwoEntries } from './standardise.js';

/** a(0..n) with a(m) = a(m-1) + (m-1) a(m-2): the number of involutions of 1..m (OEIS A000085). */
export function involutionCounts(n: number): bigint[] {
  const a: bigint[] = [1n, 1n];
  for (let m = 2; m <= n; m++) a.push(a[m - 1] + BigInt(m - 1) * a[m - 2]);
  return a.slice(0, n + 1);
}

export function isInvolution(a: readonly number[]): boolean {
  for (let i = 0; i < a.length; i++) if (a[a[i] - 1] !== i + 1) return false;
  return true;
}

export const involutions: Family<SizeParam, Permutation> = defineFamily<SizeParam, Permutation>({
  name: 'involutions',
  params: [{ name: 'n', type: 'integer' }],
  objectKind: 'permutation',
  signature: 'involutions(n: integer)',
  description: 'the permutations w of 1..n with w·w = id, in lexicographic order',
  example: 'count(w in involutions(4))',
  source: 'OEIS A000085',
  prepare(args) {
    // The sampler keeps the exact counts a(0..n) as bigints; keep n where that table is small.
    return { n: sizeArg(args[0], 'n', 2000) };
  },
  count({ n }) {
    return involutionCounts(n)[n];
  },
  enumerate({ n }, visit) {
    // The smallest unassigned point is either fixed or paired with a larger unassigned point;
    // trying w(i) in increasing order gives lexicographic order. 0 marks an unassigned point.
    const w = new Permutation(new Array<number>(n).fill(0));
    w.transient = true;
    const a = w.a;
    const go = (i: number): boolean => {
      while (i < n && a[i] !== 0) i++;
      if (i === n) return visit(w) === true;
      a[i] = i + 1;
      if (go(i + 1)) return true;
      for (let j = i + 1; j < n; j++) {
        if (a[j] !== 0) continue;
        a[i] = j + 1;
        a[j] = i + 1;
        const stop = go(i + 1);
        a[j] = 0;
        if (stop) return true;
      }
      a[i] = 0;
      return false;
    };
    return go(0);
  },
  enumerateRange({ n }, lo, hi, visit) {
    // The recursion of `enumerate`, passing over whole subtrees while objects remain to be
    // skipped: with f free points, fixing the smallest leaves a(f-1) involutions, pairing it a(f-2).
    const counts = involutionCounts(n);
    const range = clampRange(lo, hi, counts[n]);
    if (!range) return false;
    let skip = range.first,
      skipping = skip > 0n,
      left = range.length,
      stopped = false;
    const w = new Permutation(new Array<number>(n).fill(0));
    w.transient = true;
    const a = w.a;
    const go = (i: number, free: number): boolean => {
      while (i < n && a[i] !== 0) i++;
      if (i === n) {
        if (visit(w) === true) return (stopped = true);
        return --left === 0;
      }
      if (skipping && counts[free - 1] <= skip) {
        skip -= counts[free - 1];
        skipping = skip > 0n;
      } else {
        a[i] = i + 1;
        if (go(i + 1, free - 1)) return true;
      }
      for (let j = i + 1; j < n; j++) {
        if (a[j] !== 0) continue;
        if (skipping && counts[free - 2] <= skip) {
          skip -= counts[free - 2];
          skipping = skip > 0n;
          continue;
        }
        a[i] = j + 1;
        a[j] = i + 1;
        const stop = go(i + 1, free - 2);
        a[j] = 0;
        if (stop) return true;
      }
      a[i] = 0;
      return false;
    };
    go(0, n);
    return stopped;
  },
  isMember({ n }, obj: Structured) {
    return obj instanceof Permutation && obj.n === n && isInvolution(obj.a);
  },
  compare: comparePermutations,
  arbitrary(p) {
    const counts = involutionCounts(p.n);
    return new FamilyArbitrary(involutions, p, (rng) => {
      // By the recurrence: among the a(m) involutions of the first m points of a still-free set,
      // a(m-1) fix the largest point and (m-1)·a(m-2) pair it with one of the m-1 others.
      // free holds the still-free points in increasing order.
      const a = new Array<number>(p.n).fill(0);
      const free = Array.from({ length: p.n }, (_, i) => i + 1);
      let m = p.n;
      while (m > 0) {
        const top = free[m - 1];
        const r = uniformBelow(rng, counts[m]);
        if (r < counts[m - 1]) {
          a[top - 1] = top;
          free.length = m - 1;
          m -= 1;
        } else {
          const j = Number((r - counts[m - 1]) / counts[m - 2]); // 0..m-2, uniform given the branch
          const other = free[j];
          a[top - 1] = other;
          a[other - 1] = top;
          free.splice(j, 1);
          free.length = m - 2;
          m -= 2;
        }
      }
      return new Permutation(a);
    });
  },
  shrink(p, w) {
    return shrinkInvolution(p.n, w);
  },
});

/** Delete a fixed point (to n-1) or a 2-cycle (to n-2), and standardise. */
function* shrinkInvolution(n: number, w: Permutation): Generator<Shrunk<SizeParam, Permutation>> {
  const a = w.a;
  // Deleting a 2-cycle lowers the size more, so those come first.
  for (let i = 0; i < n; i++) {
    const j = a[i] - 1;
    if (j > i) yield { params: { n: n - 2 }, size: n - 2, obj: new Permutation(deleteTwoEntries(a, i, j)) };
  }
  for (let i = 0; i < n; i++) {
    if (a[i] === i + 1) yield { params: { n: n - 1 }, size: n - 1, obj: new Permutation(deleteEntry(a, i)) };
  }
}
