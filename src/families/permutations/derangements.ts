// derangements(n): the permutations of 1..n without a fixed point, in lexicographic order.

import { fail } from '../../base/errors.js';
import type { Structured } from '../../values/structured.js';
import { FamilyArbitrary, uniformBelow } from '../common/arbitrary.js';
import type { Family, Shrunk } from '../family.js';
import { defineFamily } from '../registry.js';
import { Permutation } from './permutation.js';
import { comparePermutations, factorialBig, sizeArg, type SizeParam } from './permutations.js';
import { clampRange } from '../common/ranges.js';
import { deleteTwoEntries, removeFromCycle } from './standardise.js';

/** D(0..n) with D(m) = (m-1)(D(m-1) + D(m-2)), D(0) = 1, D(1) = 0 (OEIS A000166). */
export function derangementCounts(n: number): bigint[] {
  const d: bigint[] = [1n, 0n];
  for (let m = 2; m <= n; m++) d.push(BigInt(m - 1) * (d[m - 1] + d[m - 2]));
  return d.slice(0, n + 1);
}

export function isDerangement(a: readonly number[]): boolean {
  for (let i = 0; i < a.length; i++) if (a[i] === i + 1) return false;
  return true;
}

/**
 * A uniform derangement of 1..m, exactly, by the bijection behind D(m) = (m-1)D(m-1) + (m-1)D(m-2):
 * either m sits in a cycle of length >= 3 (remove it: a derangement of 1..m-1 and the point j with
 * w(j) = m, m-1 choices), or in a 2-cycle (m j) (a derangement of the other m-2 points).
 */
function drawDerangement(rng: import('fast-check').Random, m: number, d: bigint[]): number[] {
  if (m === 0) return [];
  const r = uniformBelow(rng, d[m]);
  const big = BigInt(m - 1) * d[m - 1];
  if (r < big) {
    const j = Number(r % BigInt(m - 1)) + 1; // the point mapped to m
    const a = drawDerangement(rng, m - 1, d);
    a.push(a[j - 1]);
    a[j - 1] = m;
    return a;
  }
  const j = Number((r - big) % BigInt(m - 1)) + 1; // m's partner
  const b = drawDerangement(rng, m - 2, d);
  // relabel 1..m-2 onto {1..m-1} \ {j}
  const a = new Array<number>(m);
  for (let i = 0, k = 0; i < m - 1; i++) {
    if (i + 1 === j) continue;
    const v = b[k++];
    a[i] = v >= j ? v + 1 : v;
  }
  a[j - 1] = m;
  a[m - 1] = j;
  return a;
}

/**
 * R(m, k), for m <= n: the bijections between two m-sets that avoid k given cells, no two in a
 * row or column: sum_j (-1)^j C(k, j) (m-j)! (inclusion–exclusion; Stanley, Enumerative
 * Combinatorics 1, §2.2), computed by R(m, 0) = m!, R(m, k) = R(m, k-1) - R(m-1, k-1)
 * (the k-th cell either is used or not). R(m, m) is the number of derangements of m points.
 */
function completionsAvoiding(n: number): (m: number, k: number) => bigint {
  const memo = new Map<number, bigint>();
  const r = (m: number, k: number): bigint => {
    const key = m * (n + 1) + k;
    let v = memo.get(key);
    if (v === undefined) {
      v = k === 0 ? factorialBig(m) : r(m, k - 1) - r(m - 1, k - 1);
      memo.set(key, v);
    }
    return v;
  };
  return r;
}

export const derangements: Family<SizeParam, Permutation> = defineFamily<SizeParam, Permutation>({
  name: 'derangements',
  params: [{ name: 'n', type: 'integer' }],
  objectKind: 'permutation',
  signature: 'derangements(n: integer)',
  description: 'the permutations of 1..n without a fixed point, in lexicographic order',
  example: 'count(w in derangements(4))',
  source: 'OEIS A000166',
  prepare(args) {
    // The sampler recurses once per point; keep n where that is safe.
    return { n: sizeArg(args[0], 'n', 2000) };
  },
  count({ n }) {
    return derangementCounts(n)[n];
  },
  enumerate({ n }, visit) {
    // Values in increasing order at each position give lexicographic order. A partial assignment
    // without fixed points always extends to a derangement except when the last free value is n
    // at the last position, so the only dead ends are one step deep.
    const w = new Permutation(new Array<number>(n).fill(0));
    w.transient = true;
    const a = w.a;
    const used = new Uint8Array(n + 1);
    const go = (i: number): boolean => {
      if (i === n) return visit(w) === true;
      for (let v = 1; v <= n; v++) {
        if (used[v] || v === i + 1) continue;
        a[i] = v;
        used[v] = 1;
        const stop = go(i + 1);
        used[v] = 0;
        if (stop) return true;
      }
      return false;
    };
    return go(0);
  },
  enumerateRange({ n }, lo, hi, visit) {
    // The recursion of `enumerate`, passing over whole subtrees while objects remain to be skipped.
    // A subtree is the set of bijections from the free positions to the free values avoiding the
    // k cells (p, p) with both p free: counted by inclusion–exclusion (completionsAvoiding).
    const range = clampRange(lo, hi, derangementCounts(n)[n]);
    if (!range) return false;
    let skip = range.first,
      skipping = skip > 0n,
      left = range.length,
      stopped = false;
    const completions = completionsAvoiding(n);
    const w = new Permutation(new Array<number>(n).fill(0));
    w.transient = true;
    const a = w.a;
    const used = new Uint8Array(n + 1);
    const go = (i: number): boolean => {
      if (i === n) {
        if (visit(w) === true) return (stopped = true);
        return --left === 0;
      }
      let k = 0; // the free positions after i whose own value is still free
      if (skipping) for (let q = i + 2; q <= n; q++) if (!used[q]) k++;
      for (let v = 1; v <= n; v++) {
        if (used[v] || v === i + 1) continue;
        if (skipping) {
          const c = completions(n - i - 1, v >= i + 2 ? k - 1 : k);
          if (c <= skip) {
            skip -= c;
            skipping = skip > 0n;
            continue;
          }
        }
        a[i] = v;
        used[v] = 1;
        const stop = go(i + 1);
        used[v] = 0;
        if (stop) return true;
      }
      return false;
    };
    go(0);
    return stopped;
  },
  isMember({ n }, obj: Structured) {
    return obj instanceof Permutation && obj.n === n && isDerangement(obj.a);
  },
  compare: comparePermutations,
  arbitrary(p) {
    const d = derangementCounts(p.n);
    if (d[p.n] === 0n) fail(`derangements(${p.n}) is empty: every permutation of 1..1 fixes 1`);
    return new FamilyArbitrary(derangements, p, (rng) => new Permutation(drawDerangement(rng, p.n, d)));
  },
  shrink(p, w) {
    return shrinkDerangement(p.n, w);
  },
});

/** Delete a 2-cycle (to n-2), or shorten a cycle of length >= 3 by removing one point (to n-1). */
function* shrinkDerangement(n: number, w: Permutation): Generator<Shrunk<SizeParam, Permutation>> {
  const a = w.a;
  for (let i = 0; i < n; i++) {
    const j = a[i] - 1;
    if (j > i && a[j] === i + 1) yield { params: { n: n - 2 }, size: n - 2, obj: new Permutation(deleteTwoEntries(a, i, j)) };
  }
  for (let i = 0; i < n; i++) {
    const x = i + 1;
    if (a[a[i] - 1] === x) continue; // a 2-cycle
    const b = removeFromCycle(a, x);
    yield { params: { n: n - 1 }, size: n - 1, obj: new Permutation(b) };
  }
}
