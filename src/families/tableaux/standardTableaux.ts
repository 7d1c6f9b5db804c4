// standardTableaux(lambda): every standard Young tableau of shape lambda (LIBRARY.md §1), counted
// by the hook length formula and sampled by the hook walk.

import { defineFamily } from '../registry.js';
import type { Family, Shrunk } from '../family.js';
import { clampRange, enumerateBySkipping } from '../common/ranges.js';
import type * as fc from 'fast-check';
import { FamilyArbitrary } from '../common/arbitrary.js';
import { Tableau } from './tableau.js';
import { hookLengthCount, partitionArg, sizeOf } from './shapes.js';
import { compareStandard } from './tableauOrder.js';

export interface ShapeParam {
  parts: number[];
  n: number;
}

export function sameShape(t: Tableau, parts: readonly number[]): boolean {
  if (t.rows.length !== parts.length) return false;
  for (let i = 0; i < parts.length; i++) if (t.rows[i].length !== parts[i]) return false;
  return true;
}

/**
 * The hook walk of Greene, Nijenhuis and Wilf (A probabilistic proof of a formula for the number of
 * Young tableaux of a given shape, Adv. Math. 31 (1979)): start at a uniform cell, jump to a uniform
 * other cell of its hook until reaching a corner, put the largest remaining entry there. Each
 * corner is reached with probability f^{lambda - corner} / f^lambda, so the tableau is uniform.
 */
export function hookWalk(parts: readonly number[], rng: fc.Random): Tableau {
  const lam = parts.slice();
  const rows = parts.map((l) => new Array<number>(l).fill(0));
  for (let m = sizeOf(parts); m >= 1; m--) {
    let c = rng.nextInt(0, m - 1),
      i = 0;
    while (c >= lam[i]) c -= lam[i++];
    let j = c;
    for (;;) {
      const arm = lam[i] - j - 1;
      let leg = 0;
      while (i + leg + 1 < lam.length && lam[i + leg + 1] > j) leg++;
      if (arm + leg === 0) break;
      const t = rng.nextInt(0, arm + leg - 1);
      if (t < arm) j += t + 1;
      else i += t - arm + 1;
    }
    rows[i][j] = m;
    lam[i]--;
  }
  return new Tableau(rows);
}

/** Where each entry 1..n sits. */
function positions(t: Tableau): [number, number][] {
  const pos: [number, number][] = [];
  t.rows.forEach((r, i) => r.forEach((v, j) => (pos[v] = [i, j])));
  return pos;
}

/** Same shape, strictly simpler: exchange k and k+1 where that stays standard and lowers the reading word. */
function* simplify(t: Tableau): Generator<Tableau> {
  const pos = positions(t);
  for (let k = 1; k < t.size; k++) {
    const [a, b] = pos[k],
      [c, d] = pos[k + 1];
    if (a === c || b === d) continue; // same row or column: the exchange breaks standardness
    const u = t.copy();
    u.rows[a][b] = k + 1;
    u.rows[c][d] = k;
    if (compareStandard(u, t) < 0) yield u;
  }
}

/** Shapes inside lambda beyond which enumerateRange walks from the start instead of counting. */
const MAX_SUBSHAPES = 200_000;

/** The number of partitions mu inside lambda (mu_i <= lambda_i), or cap + 1 when it exceeds cap. */
export function shapesInside(parts: readonly number[], cap: number): number {
  // ways[b] = choices of mu_i, mu_{i+1}, ... with mu_i <= b, built from the last row up
  let ways = new Array<number>((parts[0] ?? 0) + 1).fill(1);
  for (let i = parts.length - 1; i >= 0; i--) {
    const next = new Array<number>(ways.length).fill(0);
    let run = 0;
    for (let b = 0; b < ways.length; b++) {
      if (b <= parts[i]) run = Math.min(run + ways[b], cap + 1);
      next[b] = run;
    }
    ways = next;
  }
  return ways[ways.length - 1];
}

/**
 * The number of standard fillings of lambda/mu (the entries m+1..n placed in the cells outside mu,
 * rows and columns increasing), where mu = fill holds m cells: sum over the corners mu may grow by
 * of the fillings after it; memoised by mu for one use.
 */
function skewFillings(parts: readonly number[], n: number): (fill: number[], m: number) => bigint {
  const memo = new Map<string, bigint>();
  const count = (fill: number[], m: number): bigint => {
    if (m === n) return 1n;
    const key = fill.join(',');
    let v = memo.get(key);
    if (v !== undefined) return v;
    v = 0n;
    for (let i = 0; i < parts.length; i++) {
      if (fill[i] < parts[i] && (i === 0 || fill[i - 1] > fill[i])) {
        fill[i]++;
        v += count(fill, m + 1);
        fill[i]--;
      }
    }
    memo.set(key, v);
    return v;
  };
  return count;
}

export const standardTableaux: Family<ShapeParam, Tableau> = defineFamily<ShapeParam, Tableau>({
  name: 'standardTableaux',
  params: [{ name: 'lambda', type: 'any' }],
  objectKind: 'tableau',
  signature: 'standardTableaux(lambda: partition)',
  description: 'every standard Young tableau of shape lambda (English notation, rows and columns increase)',
  example: 'count(T in standardTableaux(partition([3, 2])))',
  source:
    'hook length formula (Frame, Robinson and Thrall 1954); total over shapes OEIS A000085; hook walk of Greene, Nijenhuis and Wilf, Adv. Math. 31 (1979)',
  prepare(args) {
    const parts = partitionArg(args[0]).slice();
    return { parts, n: sizeOf(parts) };
  },
  count({ parts }) {
    return hookLengthCount(parts);
  },
  enumerate({ parts, n }, visit) {
    const t = new Tableau(parts.map((l) => new Array<number>(l).fill(0)));
    t.transient = true;
    const fill = new Array<number>(parts.length).fill(0);
    const place = (k: number): boolean => {
      if (k > n) return visit(t) === true;
      for (let i = 0; i < parts.length; i++) {
        if (fill[i] < parts[i] && (i === 0 || fill[i - 1] > fill[i])) {
          t.rows[i][fill[i]++] = k;
          const stop = place(k + 1);
          fill[i]--;
          if (stop) return true;
        }
      }
      return false;
    };
    return place(1);
  },
  enumerateRange(p, lo, hi, visit) {
    const { parts, n } = p;
    // Subtrees are counted over the shapes inside lambda; where there are too many of them, walk
    // from the start instead (such shapes have far too many tableaux for an exhaustive check).
    if (shapesInside(parts, MAX_SUBSHAPES) > MAX_SUBSHAPES)
      return enumerateBySkipping((v) => standardTableaux.enumerate(p, v), lo, hi, visit);
    const range = clampRange(lo, hi, hookLengthCount(parts));
    if (!range) return false;
    // The recursion of `enumerate`, passing over whole subtrees while objects remain to be skipped:
    // with the entries so far filling the shape `fill`, the rest is a standard filling of lambda/fill.
    let skip = range.first,
      skipping = skip > 0n,
      left = range.length,
      stopped = false;
    const t = new Tableau(parts.map((l) => new Array<number>(l).fill(0)));
    t.transient = true;
    const fill = new Array<number>(parts.length).fill(0);
    const completions = skewFillings(parts, n);
    const place = (k: number): boolean => {
      if (k > n) {
        if (visit(t) === true) return (stopped = true);
        return --left === 0;
      }
      for (let i = 0; i < parts.length; i++) {
        if (fill[i] < parts[i] && (i === 0 || fill[i - 1] > fill[i])) {
          if (skipping) {
            fill[i]++;
            const below = completions(fill, k);
            fill[i]--;
            if (below <= skip) {
              skip -= below;
              skipping = skip > 0n;
              continue;
            }
          }
          t.rows[i][fill[i]++] = k;
          const stop = place(k + 1);
          fill[i]--;
          if (stop) return true;
        }
      }
      return false;
    };
    place(1);
    return stopped;
  },
  isMember({ parts }, obj) {
    return obj instanceof Tableau && sameShape(obj, parts) && obj.isStandard();
  },
  compare: compareStandard,
  arbitrary(p): fc.Arbitrary<Tableau> {
    const { parts } = p;
    return new FamilyArbitrary(standardTableaux, p, (rng) => hookWalk(parts, rng));
  },
  *shrink({ parts, n }, obj): Generator<Shrunk<ShapeParam, Tableau>> {
    if (n > 0) {
      // The largest entry sits in a corner; removing it leaves a standard tableau of a smaller shape.
      const rows = obj.rows.map((r) => r.slice());
      const i = rows.findIndex((r) => r[r.length - 1] === n);
      rows[i].pop();
      if (rows[i].length === 0) rows.pop();
      const smaller = rows.map((r) => r.length);
      yield { params: { parts: smaller, n: n - 1 }, obj: new Tableau(rows) };
    }
    for (const u of simplify(obj)) yield { params: { parts, n }, obj: u };
  },
});
