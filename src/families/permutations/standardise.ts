// Deleting entries of a one-line notation and standardising (relabelling the remaining values
// 1..m in the same relative order): the size-reducing shrink steps of permutation families.

/** w with the entry at 0-based position i deleted and the rest standardised. */
export function deleteEntry(a: readonly number[], i: number): number[] {
  const v = a[i];
  const out = new Array<number>(a.length - 1);
  for (let j = 0, k = 0; j < a.length; j++) {
    if (j === i) continue;
    const x = a[j];
    out[k++] = x > v ? x - 1 : x;
  }
  return out;
}

/** w with the entries at the 0-based positions i < j deleted and the rest standardised. */
export function deleteTwoEntries(a: readonly number[], i: number, j: number): number[] {
  const u = Math.min(a[i], a[j]),
    v = Math.max(a[i], a[j]);
  const out: number[] = [];
  for (let k = 0; k < a.length; k++) {
    if (k === i || k === j) continue;
    const x = a[k];
    out.push(x - (x > u ? 1 : 0) - (x > v ? 1 : 0));
  }
  return out;
}

/**
 * w with the point x (1-based) taken out of its cycle — its preimage now maps to w(x) — and the
 * rest standardised; a fixed point x simply disappears.
 */
export function removeFromCycle(a: readonly number[], x: number): number[] {
  const y = a[x - 1];
  const out: number[] = [];
  for (let k = 0; k < a.length; k++) {
    if (k === x - 1) continue;
    const v = a[k] === x ? y : a[k];
    out.push(v > x ? v - 1 : v);
  }
  return out;
}

/**
 * Every distinct one-line deletion of a (an entry removed, the rest standardised); `seen` lets a
 * caller share deduplication with other steps of the same size.
 */
export function* entryDeletions(a: readonly number[], seen = new Set<string>()): Generator<number[]> {
  for (let i = 0; i < a.length; i++) {
    const b = deleteEntry(a, i);
    const k = b.join(',');
    if (seen.has(k)) continue;
    seen.add(k);
    yield b;
  }
}

/** a with one adjacent descent a[i] > a[i+1] swapped: one inversion fewer, same size. */
export function* descentSwaps(a: readonly number[]): Generator<number[]> {
  for (let i = 0; i + 1 < a.length; i++) {
    if (a[i] > a[i + 1]) {
      const b = a.slice();
      b[i] = a[i + 1];
      b[i + 1] = a[i];
      yield b;
    }
  }
}
