// setPartitions(n): every set partition of 1..n, as restricted growth strings in lexicographic
// order (LIBRARY.md §1). Counted by the Bell numbers (OEIS A000110).

import { defineFamily } from '../registry.js';
import type { Shrunk } from '../family.js';
import { sizeArg, type SizeParam } from '../permutations/permutations.js';
import { lexCompare } from '../permutations/permutation.js';
import type * as fc from 'fast-check';
import { FamilyArbitrary, uniformBelow } from '../common/arbitrary.js';
import { SetPartition } from './setPartition.js';
import { clampRange } from '../common/ranges.js';

// completions[r][m]: the number of ways to extend a restricted growth string whose largest entry
// is m by r more entries: T(0, m) = 1, T(r, m) = m T(r-1, m) + T(r-1, m+1). Bell(n) = T(n-1, 1).
const completions: bigint[][] = [];

export function completionCount(r: number, m: number): bigint {
  while (completions.length <= r) completions.push([]);
  const row = completions[r];
  if (row[m] !== undefined) return row[m];
  const v = r === 0 ? 1n : BigInt(m) * completionCount(r - 1, m) + completionCount(r - 1, m + 1);
  row[m] = v;
  return v;
}

export function bellNumber(n: number): bigint {
  // Fill bottom-up so the recursion above stays shallow for large n.
  for (let r = 0; r < n; r++) for (let m = n - r; m >= 1; m--) completionCount(r, m);
  return n === 0 ? 1n : completionCount(n - 1, 1);
}

/** Simplicity: size, then fewer blocks, then lexicographic restricted growth string. */
export function compareSetPartitions(a: SetPartition, b: SetPartition): number {
  return a.n - b.n || a.blockCount - b.blockCount || lexCompare(a.rgs, b.rgs);
}

/** Advance a restricted growth string in lexicographic order; false after 1, 2, ..., n. */
export function nextRgs(a: number[], prefixMax: number[]): boolean {
  // prefixMax[i] = max(a[0..i-1]) (prefixMax[0] = 0).
  for (let i = a.length - 1; i >= 1; i--) {
    if (a[i] <= prefixMax[i]) {
      a[i]++;
      for (let j = i + 1; j < a.length; j++) {
        prefixMax[j] = Math.max(prefixMax[j - 1], a[j - 1]);
        a[j] = 1;
      }
      return true;
    }
  }
  return false;
}

/**
 * Set a (length n, a[0] = 1) to the restricted growth string of rank r (0-based) in lexicographic
 * order, and prefixMax to its prefix maxima as nextRgs keeps them. After a[0..i] with largest
 * entry m there are completionCount(n - i - 1, m) strings, so the entry at i is the first value v
 * (1 <= v <= max + 1) whose completions reach past r. Call bellNumber(n) first.
 */
export function unrankRgs(r: bigint, a: number[], prefixMax: number[]): void {
  const n = a.length;
  let m = 1;
  for (let i = 1; i < n; i++) {
    prefixMax[i] = m;
    for (let v = 1; ; v++) {
      const c = completionCount(n - i - 1, Math.max(m, v));
      if (r < c || v === m + 1) {
        a[i] = v;
        break;
      }
      r -= c;
    }
    if (a[i] > m) m = a[i];
  }
}

/** Exactly uniform: each next entry is drawn with probability proportional to its completions. */
export function randomSetPartition(n: number, rng: fc.Random): SetPartition {
  bellNumber(n);
  const rgs: number[] = [];
  let m = 0;
  for (let i = 0; i < n; i++) {
    const r = n - i - 1;
    const stay = completionCount(r, Math.max(m, 1));
    const total = BigInt(m) * (m === 0 ? 0n : stay) + completionCount(r, m + 1);
    let z = uniformBelow(rng, total);
    let v = 1;
    for (; v <= m; v++) {
      z -= stay;
      if (z < 0n) break;
    }
    rgs.push(v);
    if (v > m) m = v;
  }
  return new SetPartition(rgs);
}

/** Same n, strictly simpler: put n into the first block. */
function simplify(s: SetPartition): SetPartition[] {
  const n = s.n;
  if (n === 0 || s.rgs[n - 1] === 1) return [];
  const r = s.rgs.slice();
  r[n - 1] = 1;
  return [new SetPartition(r)];
}

export const setPartitions = defineFamily<SizeParam, SetPartition>({
  name: 'setPartitions',
  params: [{ name: 'n', type: 'integer' }],
  objectKind: 'setPartition',
  signature: 'setPartitions(n: integer)',
  description: 'every set partition of 1..n, in lexicographic order of restricted growth strings',
  example: 'count(s in setPartitions(4))',
  source: 'Bell numbers, OEIS A000110',
  prepare(args) {
    return { n: sizeArg(args[0]) };
  },
  count({ n }) {
    return bellNumber(n);
  },
  enumerate({ n }, visit) {
    const s = new SetPartition(new Array<number>(n).fill(1));
    s.transient = true;
    const prefixMax = new Array<number>(n).fill(1);
    if (n > 0) prefixMax[0] = 0;
    do {
      if (visit(s)) return true;
    } while (nextRgs(s.rgs, prefixMax));
    return false;
  },
  enumerateRange({ n }, lo, hi, visit) {
    const range = clampRange(lo, hi, bellNumber(n));
    if (!range) return false;
    const s = new SetPartition(new Array<number>(n).fill(1));
    s.transient = true;
    const prefixMax = new Array<number>(n).fill(1);
    if (n > 0) prefixMax[0] = 0;
    unrankRgs(range.first, s.rgs, prefixMax);
    for (let left = range.length; ; ) {
      if (visit(s)) return true;
      if (--left === 0) return false;
      nextRgs(s.rgs, prefixMax);
    }
  },
  isMember({ n }, obj) {
    return obj instanceof SetPartition && obj.n === n;
  },
  compare: compareSetPartitions,
  arbitrary(p): fc.Arbitrary<SetPartition> {
    const { n } = p;
    return new FamilyArbitrary(setPartitions, p, (rng) => randomSetPartition(n, rng));
  },
  *shrink({ n }, obj): Generator<Shrunk<SizeParam, SetPartition>> {
    if (n > 0) {
      // Deleting n leaves a restricted growth string of length n-1 (n was last, so no renumbering).
      yield { params: { n: n - 1 }, size: n - 1, obj: new SetPartition(obj.rgs.slice(0, n - 1)) };
    }
    for (const s of simplify(obj)) yield { params: { n }, obj: s };
  },
});
