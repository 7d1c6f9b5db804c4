// Shrink steps of a permutation that act on its cycles, each to a smaller symmetric group: shorten
// a cycle by any number of points (or drop it), split a cycle into two shorter ones, merge two
// cycles into one, and a split together with shortening another cycle. Points that remain keep
// their cyclic order and are renumbered 1..m in their order (standardised). One-point deletions
// change a cycle type by one box; claims about cycle types (an order bound, a count of cycles)
// often fail only after several boxes move at once, which these steps reach in one step.

/** The cycles of a (one-line, values 1..n), each from its least point. */
function cyclesOf(a: readonly number[]): number[][] {
  const n = a.length;
  const seen = new Uint8Array(n + 1);
  const out: number[][] = [];
  for (let i = 1; i <= n; i++) {
    if (seen[i]) continue;
    const c: number[] = [];
    for (let j = i; !seen[j]; j = a[j - 1]) {
      seen[j] = 1;
      c.push(j);
    }
    out.push(c);
  }
  return out;
}

/** The permutation whose cycles are `cs` (on any points), standardised to 1..m. */
function fromCycles(cs: readonly (readonly number[])[]): number[] {
  const points = cs.flat().sort((x, y) => x - y);
  const rank = new Map<number, number>();
  points.forEach((p, i) => rank.set(p, i + 1));
  const out = new Array<number>(points.length);
  for (const c of cs) for (let i = 0; i < c.length; i++) out[rank.get(c[i])! - 1] = rank.get(c[(i + 1) % c.length])!;
  return out;
}

/** Every way to keep a cycle at a shorter length, dropping it included (its first k points). */
function shortenings(c: readonly number[]): number[][][] {
  const out: number[][][] = [];
  for (let k = c.length - 1; k >= 0; k--) out.push(k === 0 ? [] : [c.slice(0, k)]);
  return out;
}

/** Splits of a cycle into two cycles of lengths p >= q >= 1 with p + q < length (a smaller group). */
function splits(c: readonly number[]): number[][][] {
  const out: number[][][] = [];
  for (let p = 1; p < c.length; p++) for (let q = 1; q <= p && p + q < c.length; q++) out.push([c.slice(0, p), c.slice(p, p + q)]);
  return out;
}

/**
 * The cycle shrink steps of a, as one-line arrays of smaller size, largest reductions last; `seen`
 * holds keys of arrays already produced (shared with the other steps, so each result comes once).
 */
export function* cycleShrinks(a: readonly number[], seen: Set<string>, limit = 4000): Generator<number[]> {
  const cs = cyclesOf(a);
  let made = 0;
  const emit = function* (parts: number[][]): Generator<number[]> {
    const b = fromCycles(parts);
    const key = b.join(',');
    if (seen.has(key) || b.length >= a.length) return;
    seen.add(key);
    made++;
    yield b;
  };
  const others = (skip: number[]) => cs.filter((_, i) => !skip.includes(i));
  // Shorten one cycle by any amount.
  for (let i = 0; i < cs.length && made < limit; i++) for (const s of shortenings(cs[i])) yield* emit([...others([i]), ...s]);
  // Merge two cycles into one, at any shorter length.
  for (let i = 0; i < cs.length && made < limit; i++)
    for (let j = i + 1; j < cs.length && made < limit; j++) {
      const joined = [...cs[i], ...cs[j]];
      for (let k = joined.length - 1; k >= 1; k--) yield* emit([...others([i, j]), joined.slice(0, k)]);
    }
  // Split one cycle, alone or with another cycle shortened (or dropped) at the same time.
  for (let i = 0; i < cs.length && made < limit; i++)
    for (const sp of splits(cs[i])) {
      yield* emit([...others([i]), ...sp]);
      for (let j = 0; j < cs.length && made < limit; j++) {
        if (j === i) continue;
        for (const s of shortenings(cs[j])) yield* emit([...others([i, j]), ...sp, ...s]);
      }
    }
}
