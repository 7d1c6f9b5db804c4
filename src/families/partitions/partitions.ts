// partitions(n): every partition of n, generated in place in reverse lexicographic order
// (n), (n-1, 1), (n-2, 2), (n-2, 1, 1), ..., (1^n). LIBRARY.md §1.

import { defineFamily } from '../registry.js';
import { sizeArg, type SizeParam } from '../permutations/permutations.js';
import { lexCompare } from '../permutations/permutation.js';
import type { Shrunk } from '../family.js';
import { Partition } from './partition.js';
import { partitionCount } from './partitionCounts.js';
import { clampRange } from '../common/ranges.js';
import type * as fc from 'fast-check';
import { FamilyArbitrary, uniformBelow } from '../common/arbitrary.js';

/** Simplicity: size, then fewer parts, then reverse lexicographic (the lexicographically larger is simpler). */
export function comparePartitions(a: Partition, b: Partition): number {
  return a.size - b.size || a.parts.length - b.parts.length || lexCompare(b.parts, a.parts);
}

/** Step `parts` (a partition) to the next one in reverse lexicographic order; false after 1^n. */
export function nextPartition(parts: number[]): boolean {
  let i = parts.length - 1;
  let ones = 0;
  while (i >= 0 && parts[i] === 1) {
    i--;
    ones++;
  }
  if (i < 0) return false;
  const k = parts[i] - 1;
  parts[i] = k;
  let rem = ones + 1;
  parts.length = i + 1;
  while (rem >= k) {
    parts.push(k);
    rem -= k;
  }
  if (rem > 0) parts.push(rem);
  return true;
}

/**
 * The partition of n of rank r (0-based) in reverse lexicographic order. Those with first part v
 * come after the ones with larger first parts, and their rest is a partition of n - v into parts at
 * most v, of which there are boundedPartitionCount(n - v, v).
 */
export function unrankPartition(n: number, r: bigint): number[] {
  const count = boundedPartitionCounter();
  const parts: number[] = [];
  let m = n,
    k = n;
  while (m > 0) {
    for (let v = Math.min(m, k); v >= 1; v--) {
      const c = count(m - v, v);
      if (r < c) {
        parts.push(v);
        m -= v;
        k = v;
        break;
      }
      r -= c;
    }
  }
  return parts;
}

/**
 * The number of partitions of m into parts at most k, memoised for one use:
 * P(0, k) = 1, P(m, k) = P(m, k - 1) + P(m - k, k) (the parts are all below k, or one equals k),
 * P(m, k) = P(m, m) for k > m (Andrews, The Theory of Partitions, ch. 1).
 */
function boundedPartitionCounter(): (m: number, k: number) => bigint {
  const memo = new Map<number, bigint>();
  const count = (m: number, k: number): bigint => {
    if (k > m) k = m;
    if (m === 0) return 1n;
    if (k === 0) return 0n;
    if (k === 1) return 1n;
    const key = m * 1_048_576 + k;
    let v = memo.get(key);
    if (v === undefined) {
      v = count(m, k - 1) + count(m - k, k);
      memo.set(key, v);
    }
    return v;
  };
  return count;
}

/**
 * A uniform random partition of n (Nijenhuis and Wilf, Combinatorial Algorithms, 2nd ed. 1978,
 * ch. 10 "RANPAR"): since m p(m) = sum_{d >= 1, j >= 1, jd <= m} d p(m - jd), choose the pair (d, j)
 * with probability d p(m - jd) / (m p(m)), add j parts equal to d, and continue with m - jd.
 */
export function randomPartition(n: number, rng: fc.Random): Partition {
  const parts: number[] = [];
  let m = n;
  while (m > 0) {
    let z = uniformBelow(rng, BigInt(m) * partitionCount(m));
    let d = 1,
      j = 1;
    search: for (d = 1; d <= m; d++) {
      const bd = BigInt(d);
      for (j = 1; j * d <= m; j++) {
        z -= bd * partitionCount(m - j * d);
        if (z < 0n) break search;
      }
    }
    for (let t = 0; t < j; t++) parts.push(d);
    m -= j * d;
  }
  parts.sort((x, y) => y - x);
  return new Partition(parts);
}

/** Remove one corner cell, for each corner (the last row's first): partitions of n-1. */
export function* removeCorners(parts: readonly number[]): Generator<number[]> {
  for (let i = parts.length - 1; i >= 0; i--) {
    if (i + 1 < parts.length && parts[i + 1] === parts[i]) continue;
    const q = parts.slice();
    q[i]--;
    if (q[i] === 0) q.pop();
    yield q;
  }
}

/** Same size, strictly simpler: move one cell from the last row to the first row. */
export function* simplifyPartition(parts: readonly number[]): Generator<number[]> {
  if (parts.length < 2) return;
  const q = parts.slice();
  q[0]++;
  q[q.length - 1]--;
  if (q[q.length - 1] === 0) q.pop();
  yield q;
}

export const partitions = defineFamily<SizeParam, Partition>({
  name: 'partitions',
  params: [{ name: 'n', type: 'integer' }],
  objectKind: 'partition',
  signature: 'partitions(n: integer)',
  description: 'every partition of n (weakly decreasing positive parts), in reverse lexicographic order',
  example: 'count(lambda in partitions(5))',
  source: 'p(n), OEIS A000041; uniform sampler: Nijenhuis and Wilf, Combinatorial Algorithms (1978), ch. 10',
  prepare(args) {
    return { n: sizeArg(args[0]) };
  },
  count({ n }) {
    return partitionCount(n);
  },
  enumerate({ n }, visit) {
    const lambda = new Partition(n === 0 ? [] : [n]);
    lambda.transient = true;
    do {
      if (visit(lambda)) return true;
    } while (nextPartition(lambda.parts));
    return false;
  },
  enumerateRange({ n }, lo, hi, visit) {
    const range = clampRange(lo, hi, partitionCount(n));
    if (!range) return false;
    const lambda = new Partition(unrankPartition(n, range.first));
    lambda.transient = true;
    for (let left = range.length; ; ) {
      if (visit(lambda)) return true;
      if (--left === 0) return false;
      nextPartition(lambda.parts);
    }
  },
  isMember({ n }, obj) {
    return obj instanceof Partition && obj.size === n;
  },
  compare: comparePartitions,
  arbitrary(p): fc.Arbitrary<Partition> {
    const { n } = p;
    return new FamilyArbitrary(partitions, p, (rng) => randomPartition(n, rng));
  },
  *shrink({ n }, obj): Generator<Shrunk<SizeParam, Partition>> {
    for (const q of removeCorners(obj.parts)) yield { params: { n: n - 1 }, size: n - 1, obj: new Partition(q) };
    for (const q of simplifyPartition(obj.parts)) yield { params: { n }, obj: new Partition(q) };
  },
});
