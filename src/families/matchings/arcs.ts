// Operations on partner lists shared by the matching families.

/** The partner list with the arc at point a (1-based) deleted and the points relabelled 1..2n-2. */
export function deleteArc(p: readonly number[], a: number): number[] {
  const b = p[a - 1];
  const lo = Math.min(a, b),
    hi = Math.max(a, b);
  const shift = (x: number) => x - (x > lo ? 1 : 0) - (x > hi ? 1 : 0);
  const out: number[] = [];
  for (let i = 1; i <= p.length; i++) {
    if (i === lo || i === hi) continue;
    out.push(shift(p[i - 1]));
  }
  return out;
}

/** Whether p is a fixed-point-free involution of 1..p.length. */
export function isPerfectMatching(p: readonly number[]): boolean {
  const m = p.length;
  if (m % 2) return false;
  for (let i = 1; i <= m; i++) {
    const j = p[i - 1];
    if (!Number.isInteger(j) || j < 1 || j > m || j === i || p[j - 1] !== i) return false;
  }
  return true;
}

export function isNoncrossing(p: readonly number[]): boolean {
  // Scan left to right: an arc must close the most recently opened unclosed arc.
  const stack: number[] = [];
  for (let i = 1; i <= p.length; i++) {
    const j = p[i - 1];
    if (j > i) stack.push(i);
    else if (stack.pop() !== j) return false;
  }
  return true;
}

/** Every distinct matching obtained by deleting one arc of p and standardising (n-1 arcs). */
export function* arcDeletions(p: readonly number[]): Generator<number[]> {
  const seen = new Set<string>();
  for (let a = 1; a <= p.length; a++) {
    if (p[a - 1] < a) continue;
    const q = deleteArc(p, a);
    const k = q.join(',');
    if (seen.has(k)) continue;
    seen.add(k);
    yield q;
  }
}
