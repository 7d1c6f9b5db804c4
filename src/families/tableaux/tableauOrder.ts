// Reading words and the simplicity order of tableaux.

import { lexCompare } from '../permutations/permutation.js';
import { comparePartitions } from '../partitions/partitions.js';
import { Partition } from '../partitions/partition.js';
import type { Tableau } from './tableau.js';

/** The row reading word: rows from the bottom one up, each left to right (English notation). */
export function readingWordOf(rows: readonly (readonly number[])[]): number[] {
  const w: number[] = [];
  for (let i = rows.length - 1; i >= 0; i--) for (const v of rows[i]) w.push(v);
  return w;
}

export function entrySum(t: Tableau): number {
  let s = 0;
  for (const r of t.rows) for (const v of r) s += v;
  return s;
}

/** Standard tableaux: size, then shape (as partitions), then lexicographic reading word. */
export function compareStandard(a: Tableau, b: Tableau): number {
  return (
    comparePartitions(new Partition(a.shapeParts()), new Partition(b.shapeParts())) ||
    lexCompare(readingWordOf(a.rows), readingWordOf(b.rows))
  );
}

/** Semistandard tableaux: size, then shape, then content (smaller entries first: their sum), then reading word. */
export function compareSemistandard(a: Tableau, b: Tableau): number {
  return (
    comparePartitions(new Partition(a.shapeParts()), new Partition(b.shapeParts())) ||
    entrySum(a) - entrySum(b) ||
    lexCompare(readingWordOf(a.rows), readingWordOf(b.rows))
  );
}
