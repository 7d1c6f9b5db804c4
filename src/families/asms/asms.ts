// asms(n): every n x n alternating sign matrix (LIBRARY.md §1), enumerated through monotone
// triangles; counted by prod_{k=0}^{n-1} (3k+1)!/(n+k)! (Zeilberger 1996; Kuperberg 1996;
// OEIS A005130); sampled exactly by coupling from the past.

import { defineFamily } from '../registry.js';
import type { Family, Shrunk } from '../family.js';
import { clampRange, enumerateBySkipping } from '../common/ranges.js';
import { factorialBig, sizeArg, type SizeParam } from '../permutations/permutations.js';
import type * as fc from 'fast-check';
import { FamilyArbitrary } from '../common/arbitrary.js';
import { Asm } from './asm.js';
import { asmToTriangle, at, bottomTriangle, entryRange, move, topTriangle, triangleToAsm } from './monotoneTriangles.js';

export function asmCount(n: number): bigint {
  let num = 1n,
    den = 1n;
  for (let k = 0; k < n; k++) {
    num *= factorialBig(3 * k + 1);
    den *= factorialBig(n + k);
  }
  return num / den;
}

/** Simplicity: size, then fewer -1 entries, then lexicographic on the rows read in order. */
export function compareAsms(a: Asm, b: Asm): number {
  const d = a.n - b.n || a.negatives() - b.negatives();
  if (d) return d;
  for (let i = 0; i < a.n; i++) for (let j = 0; j < a.n; j++) if (a.rows[i][j] !== b.rows[i][j]) return a.rows[i][j] - b.rows[i][j];
  return 0;
}

function emptyRows(n: number): number[][] {
  return Array.from({ length: n }, () => new Array<number>(n).fill(0));
}

/**
 * Exactly uniform by coupling from the past (Propp and Wilson, Exact sampling with coupled Markov
 * chains, Random Structures Algorithms 9 (1996); ASMs are their §5 example). The chain picks one
 * of the free entries and a direction uniformly and moves the entry by one when it can; it is
 * symmetric, so uniform is stationary, and monotone on the distributive lattice of monotone
 * triangles, so it suffices to couple the top and bottom triangles. Moves are drawn once per time
 * step and reused as the starting time goes back (doubling).
 */
export function randomTriangle(n: number, rng: fc.Random): number[] {
  const sites: [number, number][] = [];
  for (let k = 1; k < n; k++) for (let i = 1; i <= k; i++) sites.push([k, i]);
  if (sites.length === 0) return bottomTriangle(n);
  const moves: number[] = []; // moves[s] is the move at time -(s+1): site * 2 + direction
  let T = 1;
  for (;;) {
    while (moves.length < T) moves.push(rng.nextInt(0, 2 * sites.length - 1));
    const lo = bottomTriangle(n),
      hi = topTriangle(n);
    for (let s = T - 1; s >= 0; s--) {
      const m = moves[s];
      const [k, i] = sites[m >> 1];
      move(lo, k, i, (m & 1) === 1);
      move(hi, k, i, (m & 1) === 1);
    }
    let same = true;
    for (let e = 0; e < lo.length; e++)
      if (lo[e] !== hi[e]) {
        same = false;
        break;
      }
    if (same) return lo;
    T *= 2;
  }
}

/** The largest n for which asms(n).enumerateRange counts subtrees (at most 2^n rows are memoised). */
const MAX_COUNTED_N = 14;

const aboveMemo = new Map<string, bigint>();

/**
 * The number of monotone triangles whose last row is `row` (strictly increasing): one for a row of
 * length at most 1, else the sum over the rows r interlacing it (row[j] <= r[j] <= row[j+1], r
 * strictly increasing) of the triangles on r. It depends on the row only, so it is kept for every n.
 */
export function trianglesAbove(row: readonly number[]): bigint {
  const k = row.length;
  if (k <= 1) return 1n;
  const key = row.join(',');
  const hit = aboveMemo.get(key);
  if (hit !== undefined) return hit;
  let total = 0n;
  const r = new Array<number>(k - 1);
  const go = (j: number): void => {
    if (j === k - 1) {
      total += trianglesAbove(r);
      return;
    }
    for (let v = Math.max(row[j], j > 0 ? r[j - 1] + 1 : 0); v <= row[j + 1]; v++) {
      r[j] = v;
      go(j + 1);
    }
  };
  go(0);
  aboveMemo.set(key, total);
  return total;
}

/**
 * With rows k+1..n of triangle t set and entries 1..i of row k: the number of ways to finish, the
 * sum over the ways to finish row k (between the entries of row k+1, increasing) of trianglesAbove.
 */
function restOfRow(t: readonly number[], k: number, i: number): bigint {
  const row = new Array<number>(k);
  for (let j = 1; j <= i; j++) row[j - 1] = t[at(k, j)];
  let total = 0n;
  const go = (j: number): void => {
    if (j > k) {
      total += trianglesAbove(row);
      return;
    }
    for (let v = Math.max(t[at(k + 1, j)], row[j - 2] + 1); v <= t[at(k + 1, j + 1)]; v++) {
      row[j - 1] = v;
      go(j + 1);
    }
  };
  go(i + 1);
  return total;
}

/** Same n, strictly simpler: one step of the triangle chain that lowers the simplicity order. */
function* simplify(a: Asm): Generator<Asm> {
  const n = a.n;
  const t = asmToTriangle(a.rows);
  for (let k = 1; k < n; k++) {
    for (let i = 1; i <= k; i++) {
      const [lo, hi] = entryRange(t, k, i);
      for (const d of [-1, 1]) {
        const e = at(k, i),
          v = t[e] + d;
        if (v < lo || v > hi) continue;
        const u = t.slice();
        u[e] = v;
        const rows = emptyRows(n);
        triangleToAsm(u, n, rows);
        const b = new Asm(rows);
        if (compareAsms(b, a) < 0) yield b;
      }
    }
  }
}

/** Delete the row and column of a 1 that is alone in both: an ASM of size n-1. */
function* deleteLoneOnes(a: Asm): Generator<Asm> {
  const n = a.n,
    r = a.rows;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      if (r[i][j] !== 1) continue;
      let alone = true;
      for (let k = 0; k < n && alone; k++) if ((k !== j && r[i][k] !== 0) || (k !== i && r[k][j] !== 0)) alone = false;
      if (!alone) continue;
      yield new Asm(r.filter((_, k) => k !== i).map((row) => row.filter((_, l) => l !== j)));
    }
  }
}

export const asms: Family<SizeParam, Asm> = defineFamily<SizeParam, Asm>({
  name: 'asms',
  params: [{ name: 'n', type: 'integer' }],
  objectKind: 'asm',
  signature: 'asms(n: integer)',
  description: 'every n x n alternating sign matrix, through monotone triangles',
  example: 'count(a in asms(4))',
  source: 'OEIS A005130 (Zeilberger 1996); sampler: coupling from the past, Propp and Wilson, Random Structures Algorithms 9 (1996)',
  prepare(args) {
    return { n: sizeArg(args[0], 'n', 200) };
  },
  count({ n }) {
    return asmCount(n);
  },
  enumerate({ n }, visit) {
    const a = new Asm(emptyRows(n));
    a.transient = true;
    if (n === 0) return visit(a) === true;
    const t = bottomTriangle(n); // row n is fixed at 1..n
    // Fill rows n-1, ..., 1, each left to right, between the entries of the row below.
    const fill = (k: number, i: number): boolean => {
      if (k === 0) {
        triangleToAsm(t, n, a.rows);
        return visit(a) === true;
      }
      if (i > k) return fill(k - 1, 1);
      const lo = Math.max(t[at(k + 1, i)], i > 1 ? t[at(k, i - 1)] + 1 : 0);
      const hi = t[at(k + 1, i + 1)];
      for (let v = lo; v <= hi; v++) {
        t[at(k, i)] = v;
        if (fill(k, i + 1)) return true;
      }
      return false;
    };
    return fill(n - 1, 1);
  },
  enumerateRange(p, lo, hi, visit) {
    const { n } = p;
    // Counting subtrees goes through every increasing row over 1..n; past MAX_COUNTED_N (far beyond
    // exhaustive checks) walk from the start instead.
    if (n > MAX_COUNTED_N) return enumerateBySkipping((v) => asms.enumerate(p, v), lo, hi, visit);
    const range = clampRange(lo, hi, asmCount(n));
    if (!range) return false;
    let skip = range.first,
      skipping = skip > 0n,
      left = range.length,
      stopped = false;
    const a = new Asm(emptyRows(n));
    a.transient = true;
    if (n === 0) return visit(a) === true;
    const t = bottomTriangle(n);
    // The recursion of `enumerate`, passing over whole subtrees while objects remain to be skipped:
    // once entry (k, i) is set, the rest is counted by restOfRow.
    const fill = (k: number, i: number): boolean => {
      if (k === 0) {
        triangleToAsm(t, n, a.rows);
        if (visit(a) === true) return (stopped = true);
        return --left === 0;
      }
      if (i > k) return fill(k - 1, 1);
      const lo = Math.max(t[at(k + 1, i)], i > 1 ? t[at(k, i - 1)] + 1 : 0);
      const hi = t[at(k + 1, i + 1)];
      for (let v = lo; v <= hi; v++) {
        t[at(k, i)] = v;
        if (skipping) {
          const below = restOfRow(t, k, i);
          if (below <= skip) {
            skip -= below;
            skipping = skip > 0n;
            continue;
          }
        }
        if (fill(k, i + 1)) return true;
      }
      return false;
    };
    fill(n - 1, 1);
    return stopped;
  },
  isMember({ n }, obj) {
    return obj instanceof Asm && obj.n === n;
  },
  compare: compareAsms,
  arbitrary(p): fc.Arbitrary<Asm> {
    const { n } = p;
    return new FamilyArbitrary(asms, p, (rng) => {
      const rows = emptyRows(n);
      triangleToAsm(randomTriangle(n, rng), n, rows);
      return new Asm(rows);
    });
  },
  *shrink({ n }, obj): Generator<Shrunk<SizeParam, Asm>> {
    const seen = new Set<string>();
    for (const b of deleteLoneOnes(obj)) {
      if (seen.has(b.key())) continue;
      seen.add(b.key());
      yield { params: { n: n - 1 }, size: n - 1, obj: b };
    }
    for (const b of simplify(obj)) yield { params: { n }, obj: b };
  },
});
