// Consecutive sizes written as ranges: "n = 1..8, 10" in reports, "n = 1..8 exhaustive (46,233
// cases)" in status tables — the one compressor both use.

/**
 * Split items (in order) into runs whose values go up by one; an item whose value is null stands
 * alone, and `canJoin` may keep two neighbours apart (say, sizes of different bindings).
 */
export function consecutiveRuns<T>(
  items: readonly T[],
  valueOf: (t: T) => number | null,
  canJoin: (a: T, b: T) => boolean = () => true,
): T[][] {
  const runs: T[][] = [];
  for (const t of items) {
    const run = runs[runs.length - 1];
    const last = run?.[run.length - 1];
    const v = valueOf(t);
    const lv = last === undefined ? null : valueOf(last);
    if (run && v !== null && lv !== null && v === lv + 1 && canJoin(last as T, t)) run.push(t);
    else runs.push([t]);
  }
  return runs;
}

/** "5" or "1..8". */
export function rangeText(lo: number, hi: number): string {
  return lo === hi ? `${lo}` : `${lo}..${hi}`;
}

/** Distinct integers as ranges: [1, 2, 3, 5] is "1..3, 5". */
export function compressedRanges(values: readonly number[]): string {
  const sorted = [...new Set(values)].sort((a, b) => a - b);
  return consecutiveRuns(sorted, (v) => v)
    .map((r) => rangeText(r[0], r[r.length - 1]))
    .join(', ');
}
