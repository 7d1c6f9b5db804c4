// Partitions as plain arrays for the ring of symmetric functions: the list of partitions of n in
// reverse lexicographic order ([n] first, [1, ..., 1] last; a linear extension of dominance, so
// every triangular transition matrix is upper triangular in this order), conjugates, z_lambda and
// n(lambda).

export type Parts = readonly number[];

const byDegree: number[][][] = [];

/** The partitions of n, [n] first, in decreasing lexicographic order (cached; do not mutate). */
export function partitionsOf(n: number): readonly (readonly number[])[] {
  const known = byDegree[n];
  if (known) return known;
  const out: number[][] = [];
  const cur: number[] = [];
  const go = (left: number, max: number) => {
    if (left === 0) {
      out.push(cur.slice());
      return;
    }
    for (let p = Math.min(left, max); p >= 1; p--) {
      cur.push(p);
      go(left - p, p);
      cur.pop();
    }
  };
  go(n, n);
  byDegree[n] = out;
  return out;
}

const indexByDegree: Map<string, number>[] = [];

/** The position of a partition of n in partitionsOf(n). */
export function partitionIndex(p: Parts): number {
  const n = sizeOfParts(p);
  let idx = indexByDegree[n];
  if (!idx) {
    idx = new Map(partitionsOf(n).map((q, i) => [q.join(','), i]));
    indexByDegree[n] = idx;
  }
  return idx.get(p.join(','))!;
}

export function sizeOfParts(p: Parts): number {
  let s = 0;
  for (const x of p) s += x;
  return s;
}

export function partsKey(p: Parts): string {
  return p.join(',');
}

/** Decreasing lexicographic comparison: negative when a comes first (larger degree first). */
export function compareParts(a: Parts, b: Parts): number {
  const da = sizeOfParts(a),
    db = sizeOfParts(b);
  if (da !== db) return db - da;
  const n = Math.min(a.length, b.length);
  for (let i = 0; i < n; i++) if (a[i] !== b[i]) return b[i] - a[i];
  return a.length - b.length;
}

export function conjugate(p: Parts): number[] {
  const out: number[] = [];
  const m = p.length ? p[0] : 0;
  for (let j = 1; j <= m; j++) {
    let c = 0;
    while (c < p.length && p[c] >= j) c++;
    out.push(c);
  }
  return out;
}

/** z_lambda = prod_i i^{m_i} m_i!, the order of the centraliser of a permutation of cycle type lambda. */
export function zee(p: Parts): bigint {
  let z = 1n;
  const mult = new Map<number, number>();
  for (const x of p) mult.set(x, (mult.get(x) ?? 0) + 1);
  for (const [i, m] of mult) for (let k = 1; k <= m; k++) z *= BigInt(i) * BigInt(k);
  return z;
}

/** n(lambda) = sum (i - 1) lambda_i. */
export function nOf(p: Parts): number {
  let s = 0;
  for (let i = 0; i < p.length; i++) s += i * p[i];
  return s;
}

/** The multiplicities m_1, m_2, ... as a map part -> count. */
export function multiplicities(p: Parts): Map<number, number> {
  const mult = new Map<number, number>();
  for (const x of p) mult.set(x, (mult.get(x) ?? 0) + 1);
  return mult;
}

/** Whether mu fits inside lambda. */
export function containsParts(lam: Parts, mu: Parts): boolean {
  if (mu.length > lam.length) return false;
  for (let i = 0; i < mu.length; i++) if (mu[i] > lam[i]) return false;
  return true;
}

/** The union of two partitions (parts merged, decreasing). */
export function unionParts(a: Parts, b: Parts): number[] {
  const out: number[] = [];
  let i = 0,
    j = 0;
  while (i < a.length || j < b.length) {
    if (j >= b.length || (i < a.length && a[i] >= b[j])) out.push(a[i++]);
    else out.push(b[j++]);
  }
  return out;
}
