// subsets(n) and subsets(n, k): the subsets of 1..n (of size k), by size and then lexicographically.

import { fail } from '../../base/errors.js';
import type { Structured } from '../../values/structured.js';
import { FamilyArbitrary, lexCompareArrays } from '../common/arbitrary.js';
import type { Family, Shrunk } from '../family.js';
import { defineFamily } from '../registry.js';
import { sizeArg } from '../permutations/permutations.js';
import { Subset } from './subset.js';
import { clampRange } from '../common/ranges.js';

export interface SubsetsParam {
  n: number;
  /** The number of elements, or undefined for every subset. */
  k?: number;
}

export function binomialBig(n: number, k: number): bigint {
  if (k < 0 || k > n) return 0n;
  let r = 1n;
  for (let i = 1; i <= k; i++) r = (r * BigInt(n - k + i)) / BigInt(i);
  return r;
}

/** Simplicity order: the number of elements, then the elements lexicographically. */
export function compareSubsets(u: Subset, v: Subset): number {
  return u.size - v.size || lexCompareArrays(u.elems, v.elems);
}

/** Step e, a subset of 1..n in increasing order, to the next one of its size in lexicographic order; false after the last. */
function nextCombination(e: number[], n: number): boolean {
  const k = e.length;
  let i = k - 1;
  while (i >= 0 && e[i] === n - k + i + 1) i--;
  if (i < 0) return false;
  e[i]++;
  for (let j = i + 1; j < k; j++) e[j] = e[j - 1] + 1;
  return true;
}

/** Visit the k-subsets of 1..n in lexicographic order, in place in s.elems. */
function combinations(n: number, k: number, s: Subset, visit: (s: Subset) => boolean | void): boolean {
  const e = s.elems;
  e.length = k;
  for (let i = 0; i < k; i++) e[i] = i + 1;
  for (;;) {
    if (visit(s) === true) return true;
    if (!nextCombination(e, n)) return false;
  }
}

/**
 * Set e to the k-subset of 1..n of rank r (0-based) in lexicographic order. Those whose element at
 * position pos is below x (the earlier ones fixed, the element at least x0) number
 * C(n-x0+1, j+1) - C(n-x+1, j+1) with j = k-pos-1 elements still to come; the element is the
 * largest x with at most r of them (binary search).
 */
function unrankCombination(n: number, k: number, r: bigint, e: number[]): void {
  e.length = k;
  let x0 = 1;
  for (let pos = 0; pos < k; pos++) {
    const j = k - pos - 1;
    const all = binomialBig(n - x0 + 1, j + 1);
    let lo = x0,
      hi = n - j;
    while (lo < hi) {
      const mid = lo + Math.ceil((hi - lo) / 2);
      if (all - binomialBig(n - mid + 1, j + 1) <= r) lo = mid;
      else hi = mid - 1;
    }
    r -= all - binomialBig(n - lo + 1, j + 1);
    e[pos] = lo;
    x0 = lo + 1;
  }
}

export const subsets: Family<SubsetsParam, Subset> = defineFamily<SubsetsParam, Subset>({
  name: 'subsets',
  params: [
    { name: 'n', type: 'integer' },
    { name: 'k', type: 'integer', optional: true },
  ],
  objectKind: 'subset',
  signature: 'subsets(n: integer, k?: integer)',
  description: 'the subsets of 1..n (with k elements, when k is given), by size and then lexicographically',
  example: 'count(s in subsets(5, 2))',
  source: '2^n (OEIS A000079) and binomial coefficients (OEIS A007318)',
  prepare(args) {
    const n = sizeArg(args[0]);
    if (args.length < 2 || args[1] === undefined) return { n };
    return { n, k: sizeArg(args[1], 'k') };
  },
  count({ n, k }) {
    return k === undefined ? 1n << BigInt(n) : binomialBig(n, k);
  },
  enumerate({ n, k }, visit) {
    const s = new Subset([]);
    s.transient = true;
    if (k !== undefined) return k <= n ? combinations(n, k, s, visit) : false;
    for (let j = 0; j <= n; j++) if (combinations(n, j, s, visit)) return true;
    return false;
  },
  enumerateRange({ n, k }, lo, hi, visit) {
    const range = clampRange(lo, hi, k === undefined ? 1n << BigInt(n) : binomialBig(n, k));
    if (!range) return false;
    // The size of the first subset: subsets(n) lists C(n, 0), C(n, 1), ... subsets of each size.
    let size = k ?? 0;
    let r = range.first;
    if (k === undefined) {
      for (let c = 1n; r >= c; size++) {
        r -= c;
        c = (c * BigInt(n - size)) / BigInt(size + 1);
      }
    }
    const s = new Subset([]);
    s.transient = true;
    const e = s.elems;
    unrankCombination(n, size, r, e);
    for (let left = range.length; ; ) {
      if (visit(s) === true) return true;
      if (--left === 0) return false;
      if (!nextCombination(e, n)) {
        // only subsets(n) gets here: on to the first subset of the next size
        size++;
        e.length = size;
        for (let i = 0; i < size; i++) e[i] = i + 1;
      }
    }
  },
  isMember({ n, k }, obj: Structured) {
    if (!(obj instanceof Subset)) return false;
    const e = obj.elems;
    if (k !== undefined && e.length !== k) return false;
    for (let i = 0; i < e.length; i++) {
      if (!Number.isInteger(e[i]) || e[i] < 1 || e[i] > n || (i > 0 && e[i] <= e[i - 1])) return false;
    }
    return true;
  },
  compare: compareSubsets,
  arbitrary(p) {
    const { n, k } = p;
    if (k !== undefined && k > n) fail(`subsets(${n}, ${k}) is empty: 1..${n} has no subset with ${k} elements`);
    return new FamilyArbitrary(subsets, p, (rng) => {
      if (k === undefined) {
        // each element independently with probability 1/2
        const e: number[] = [];
        for (let x = 1; x <= n; x++) if (rng.nextInt(0, 1) === 1) e.push(x);
        return new Subset(e);
      }
      // the first k entries of a partial Fisher–Yates shuffle of 1..n, sorted
      const a = Array.from({ length: n }, (_, i) => i + 1);
      for (let i = 0; i < k; i++) {
        const j = rng.nextInt(i, n - 1);
        const t = a[i];
        a[i] = a[j];
        a[j] = t;
      }
      return new Subset(a.slice(0, k).sort((x, y) => x - y));
    });
  },
  shrink(p, s) {
    return shrinkSubset(p, s);
  },
});

/**
 * Size-reducing first: remove a point outside the set from the ground set and standardise
 * (subsets of 1..n-1, same number of elements); for subsets(n) also delete an element and
 * standardise. Then at the same n: delete an element (subsets(n)), or move an element down by one
 * (subsets(n, k), whose k stays fixed so that the shrunk case keeps its parameters but n).
 */
function* shrinkSubset(p: SubsetsParam, s: Subset): Generator<Shrunk<SubsetsParam, Subset>> {
  const { n, k } = p;
  const e = s.elems;
  if (n > 0) {
    const smaller: SubsetsParam = k === undefined ? { n: n - 1 } : { n: n - 1, k };
    const seen = new Set<string>();
    const dropPoint = (x: number, keep: boolean) => e.filter((y) => keep || y !== x).map((y) => (y > x ? y - 1 : y));
    // Removing any point x outside the set gives the same result for every x in a gap, so try
    // one point per gap (the last one of each gap) — the results are all distinct.
    for (let x = n; x >= 1; x--) {
      if (s.has(x) || (x < n && !s.has(x + 1))) continue;
      const b = dropPoint(x, true);
      const key = b.join(',');
      if (!seen.has(key)) {
        seen.add(key);
        yield { params: smaller, size: n - 1, obj: new Subset(b) };
      }
    }
    if (k === undefined) {
      for (const x of e) {
        const b = dropPoint(x, false);
        const key = b.join(',');
        if (!seen.has(key)) {
          seen.add(key);
          yield { params: smaller, size: n - 1, obj: new Subset(b) };
        }
      }
    }
  }
  if (k === undefined) {
    for (let i = 0; i < e.length; i++) yield { params: p, obj: new Subset(e.filter((_, j) => j !== i)) };
  } else {
    for (let i = 0; i < e.length; i++) {
      if (e[i] > 1 && (i === 0 || e[i - 1] < e[i] - 1)) {
        const b = e.slice();
        b[i]--;
        yield { params: p, obj: new Subset(b) };
      }
    }
  }
}
