// noncrossingPartitions(n): the set partitions of 1..n without two crossing blocks, counted by the
// Catalan numbers (Kreweras, Discrete Math. 1 (1972); OEIS A000108). They are listed in the order
// of their Dyck paths (U before D) under the bijection below, which also makes the sampler exact:
// a uniform Dyck path (the cycle lemma) gives a uniform noncrossing partition.
//
// The bijection: read i = 1..n; when i is the least element of its block B write U^|B|, then write
// D. Back: the run of U's before the i-th D has length k_i; k_i > 0 opens a new block needing
// k_i - 1 more elements, and an i with k_i = 0 joins the innermost open block (the top of a stack)
// — in a noncrossing partition it cannot join any other without a crossing.

import { defineFamily } from '../registry.js';
import type { Shrunk } from '../family.js';
import { sizeArg, type SizeParam } from '../permutations/permutations.js';
import type * as fc from 'fast-check';
import { FamilyArbitrary } from '../common/arbitrary.js';
import { SetPartition } from './setPartition.js';
import { compareSetPartitions } from './setPartitions.js';
import { catalanBig, dyckPaths, randomDyckPath } from '../dyckPaths/dyckPaths.js';
import { isNoncrossing } from './arcs.js';

/** Fill rgs (length n) with the noncrossing partition of a Dyck path of semilength n. */
export function partitionOfDyckSteps(steps: readonly number[], rgs: number[]): void {
  const blockOf: number[] = []; // stack of open blocks
  const need: number[] = []; // elements each still needs
  let i = 0,
    run = 0,
    blocks = 0;
  for (const s of steps) {
    if (s > 0) {
      run++;
      continue;
    }
    if (run > 0) {
      rgs[i] = ++blocks;
      if (run > 1) {
        blockOf.push(blocks);
        need.push(run - 1);
      }
    } else {
      const top = blockOf.length - 1;
      rgs[i] = blockOf[top];
      if (--need[top] === 0) {
        blockOf.pop();
        need.pop();
      }
    }
    run = 0;
    i++;
  }
}

/** The Dyck path of a noncrossing partition: U^|B| at the least element of each block B, then D. */
export function dyckStepsOfPartition(rgs: readonly number[]): number[] {
  const size = new Map<number, number>();
  for (const b of rgs) size.set(b, (size.get(b) ?? 0) + 1);
  const seen = new Set<number>();
  const steps: number[] = [];
  for (const b of rgs) {
    if (!seen.has(b)) {
      seen.add(b);
      for (let k = 0; k < size.get(b)!; k++) steps.push(1);
    }
    steps.push(-1);
  }
  return steps;
}

/** Delete the element i (1-based) and renumber the blocks by least element. */
export function deleteElement(rgs: readonly number[], i: number): number[] {
  const rest = [...rgs.slice(0, i - 1), ...rgs.slice(i)];
  const rename = new Map<number, number>();
  return rest.map((b) => {
    if (!rename.has(b)) rename.set(b, rename.size + 1);
    return rename.get(b)!;
  });
}

/** Merge the blocks of i and i+1 (when they differ), renumbered; undefined when that makes a crossing. */
function mergeNeighbours(rgs: readonly number[], i: number): number[] | undefined {
  const a = rgs[i - 1],
    b = rgs[i];
  if (a === b) return undefined;
  const merged = rgs.map((x) => (x === b ? a : x));
  const rename = new Map<number, number>();
  const out = merged.map((x) => {
    if (!rename.has(x)) rename.set(x, rename.size + 1);
    return rename.get(x)!;
  });
  return isNoncrossing(out) ? out : undefined;
}

export const noncrossingPartitions = defineFamily<SizeParam, SetPartition>({
  name: 'noncrossingPartitions',
  params: [{ name: 'n', type: 'integer' }],
  objectKind: 'setPartition',
  signature: 'noncrossingPartitions(n: integer)',
  description:
    'the set partitions of 1..n with no two crossing blocks, in the order of their Dyck paths (U^|B| at the least element of each block B, then D; U before D)',
  example: 'count(s in noncrossingPartitions(5))',
  source: 'Catalan numbers, OEIS A000108 (Kreweras, Discrete Math. 1 (1972)); by number of blocks: Narayana numbers, OEIS A001263',
  prepare(args) {
    return { n: sizeArg(args[0], 'n', 100_000) };
  },
  count({ n }) {
    return catalanBig(n);
  },
  enumerate({ n }, visit) {
    const s = new SetPartition(new Array<number>(n).fill(1));
    s.transient = true;
    return dyckPaths.enumerate({ n }, (d) => {
      partitionOfDyckSteps(d.steps, s.rgs);
      return visit(s);
    });
  },
  enumerateRange({ n }, lo, hi, visit) {
    const s = new SetPartition(new Array<number>(n).fill(1));
    s.transient = true;
    return dyckPaths.enumerateRange!({ n }, lo, hi, (d) => {
      partitionOfDyckSteps(d.steps, s.rgs);
      return visit(s);
    });
  },
  isMember({ n }, obj) {
    return obj instanceof SetPartition && obj.n === n && isNoncrossing(obj.rgs);
  },
  compare: compareSetPartitions,
  arbitrary(p): fc.Arbitrary<SetPartition> {
    const { n } = p;
    return new FamilyArbitrary(noncrossingPartitions, p, (rng) => {
      const rgs = new Array<number>(n);
      partitionOfDyckSteps(randomDyckPath(n, rng).steps, rgs);
      return new SetPartition(rgs);
    });
  },
  *shrink({ n }, obj): Generator<Shrunk<SizeParam, SetPartition>> {
    // Delete an element (a restriction of a noncrossing partition is noncrossing), n first.
    const seen = new Set<string>();
    for (let i = n; i >= 1; i--) {
      const r = deleteElement(obj.rgs, i);
      const k = r.join(',');
      if (seen.has(k)) continue;
      seen.add(k);
      yield { params: { n: n - 1 }, size: n - 1, obj: new SetPartition(r) };
    }
    // Same size, one block fewer: merge the blocks of two neighbours when no crossing appears.
    const merged = new Set<string>();
    for (let i = 1; i < n; i++) {
      const r = mergeNeighbours(obj.rgs, i);
      if (!r || merged.has(r.join(','))) continue;
      merged.add(r.join(','));
      yield { params: { n }, obj: new SetPartition(r) };
    }
  },
});
