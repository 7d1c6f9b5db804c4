// Brute-force enumerations and the simplicity orders of LIBRARY.md §1, written independently of
// src/families so that the runner's choice of "the simplest failing case" is checked against a
// second implementation.

export function permutationsOf(n: number): number[][] {
  if (n === 0) return [[]];
  const out: number[][] = [];
  for (const p of permutationsOf(n - 1)) {
    for (let i = 0; i <= p.length; i++) out.push([...p.slice(0, i), n, ...p.slice(i)]);
  }
  return out.sort(lex);
}

export function lex(a: readonly number[], b: readonly number[]): number {
  for (let i = 0; i < Math.min(a.length, b.length); i++) if (a[i] !== b[i]) return a[i] - b[i];
  return a.length - b.length;
}

export function inv(w: readonly number[]): number {
  let c = 0;
  for (let i = 0; i < w.length; i++) for (let j = i + 1; j < w.length; j++) if (w[i] > w[j]) c++;
  return c;
}

export function maj(w: readonly number[]): number {
  let s = 0;
  for (let i = 0; i + 1 < w.length; i++) if (w[i] > w[i + 1]) s += i + 1;
  return s;
}

export function cycles(w: readonly number[]): number {
  const seen = new Array(w.length).fill(false);
  let c = 0;
  for (let i = 0; i < w.length; i++) {
    if (seen[i]) continue;
    c++;
    for (let j = i; !seen[j]; j = w[j] - 1) seen[j] = true;
  }
  return c;
}

/** LIBRARY.md §1, permutations: size, inversions, then lexicographic. */
export function comparePerms(a: readonly number[], b: readonly number[]): number {
  return a.length - b.length || inv(a) - inv(b) || lex(a, b);
}

/** Perfect matchings of 1..2n as sorted arc lists [[a,b],...] with a<b. */
export function matchingsOf(n: number): number[][][] {
  const go = (free: number[]): number[][][] => {
    if (free.length === 0) return [[]];
    const [a, ...rest] = free;
    const out: number[][][] = [];
    for (let i = 0; i < rest.length; i++) {
      const b = rest[i];
      for (const m of go(rest.filter((_, j) => j !== i))) out.push([[a, b], ...m]);
    }
    return out;
  };
  return go(Array.from({ length: 2 * n }, (_, i) => i + 1));
}

export function crossings(arcs: number[][]): number {
  let c = 0;
  for (const [a, b] of arcs) for (const [c1, d] of arcs) if (a < c1 && c1 < b && b < d) c++;
  return c;
}

export function nestings(arcs: number[][]): number {
  let c = 0;
  for (const [a, b] of arcs) for (const [c1, d] of arcs) if (a < c1 && d < b) c++;
  return c;
}

/** The partner list p[i-1] = partner of i. */
export function partners(arcs: number[][]): number[] {
  const p: number[] = new Array(arcs.length * 2);
  for (const [a, b] of arcs) {
    p[a - 1] = b;
    p[b - 1] = a;
  }
  return p;
}

/** LIBRARY.md §1, matchings: size, crossings, nestings, then lexicographic (partner lists). */
export function compareMatchings(a: number[][], b: number[][]): number {
  return a.length - b.length || crossings(a) - crossings(b) || nestings(a) - nestings(b) || lex(partners(a), partners(b));
}

/** Partitions of n, weakly decreasing parts. */
export function partitionsOf(n: number, max = n): number[][] {
  if (n === 0) return [[]];
  const out: number[][] = [];
  for (let k = Math.min(n, max); k >= 1; k--) for (const p of partitionsOf(n - k, k)) out.push([k, ...p]);
  return out;
}

/** LIBRARY.md §1, partitions: size, length, then reverse lexicographic (lex larger is simpler). */
export function comparePartitions(a: number[], b: number[]): number {
  const sa = a.reduce((s, x) => s + x, 0),
    sb = b.reduce((s, x) => s + x, 0);
  return sa - sb || a.length - b.length || lex(b, a);
}

/** Subsets of 1..n as increasing arrays. */
export function subsetsOf(n: number): number[][] {
  const out: number[][] = [];
  for (let mask = 0; mask < 1 << n; mask++) {
    const s: number[] = [];
    for (let i = 0; i < n; i++) if (mask & (1 << i)) s.push(i + 1);
    out.push(s);
  }
  return out;
}

/** LIBRARY.md §1, subsets: number of elements, then lexicographic. */
export function compareSubsets(a: number[], b: number[]): number {
  return a.length - b.length || lex(a, b);
}

/** Words of length n over 1..k, lexicographically. */
export function wordsOf(n: number, k: number): number[][] {
  if (n === 0) return [[]];
  const out: number[][] = [];
  for (const w of wordsOf(n - 1, k)) for (let a = 1; a <= k; a++) out.push([...w, a]);
  return out.sort(lex);
}

/** The minimum under an order. */
export function minBy<T>(xs: T[], cmp: (a: T, b: T) => number): T {
  return xs.reduce((m, x) => (cmp(x, m) < 0 ? x : m));
}
