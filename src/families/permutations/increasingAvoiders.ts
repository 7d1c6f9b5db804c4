// Avoiders of the increasing pattern 12...k through Robinson–Schensted: w corresponds to a pair
// (P, Q) of standard tableaux of one shape lambda, and the longest increasing subsequence of w is
// lambda_1 (Schensted, "Longest increasing and decreasing subsequences", Canad. J. Math. 13 (1961)).
// So w avoids 12...k exactly when lambda_1 <= k-1, the class has sum (f^lambda)^2 over those shapes
// elements, and a uniform avoider is: a shape drawn with weight (f^lambda)^2 (exact bigint weights,
// f^lambda by the hook length formula), two independent uniform tableaux by the hook walk, and the
// inverse of row insertion. Avoiders of k...21 are the reverses of avoiders of 12...k.

import type * as fc from 'fast-check';
import { uniformBelow } from '../common/arbitrary.js';
import { hookWalk } from '../tableaux/standardTableaux.js';
import { hookLengths } from '../tableaux/shapes.js';
import { factorialBig } from './permutations.js';

/** Above this many shapes the table of weights is not built (the exact sampler is then not offered). */
export const MAX_SHAPES = 50_000;

interface ShapeTable {
  shapes: number[][];
  /** cumulative[i] = sum of (f^lambda)^2 over shapes[0..i]. */
  cumulative: bigint[];
  total: bigint;
}

const tables = new Map<string, ShapeTable | null>();

/** The partitions of n with every part at most `maxPart`, or null when there are more than MAX_SHAPES. */
export function partitionsWithPartsAtMost(n: number, maxPart: number): number[][] | null {
  const out: number[][] = [];
  const cur: number[] = [];
  const go = (left: number, cap: number): boolean => {
    if (left === 0) {
      out.push(cur.slice());
      return out.length > MAX_SHAPES;
    }
    for (let part = Math.min(left, cap); part >= 1; part--) {
      cur.push(part);
      const stop = go(left - part, part);
      cur.pop();
      if (stop) return true;
    }
    return false;
  };
  return go(n, maxPart) ? null : out;
}

function shapeTable(n: number, maxPart: number): ShapeTable | null {
  const key = `${n}|${maxPart}`;
  const hit = tables.get(key);
  if (hit !== undefined) return hit;
  const shapes = partitionsWithPartsAtMost(n, maxPart);
  let table: ShapeTable | null = null;
  if (shapes) {
    const cumulative: bigint[] = [];
    let total = 0n;
    const nFactorial = factorialBig(n);
    for (const s of shapes) {
      // f^lambda = n! / product of hook lengths (Frame, Robinson and Thrall 1954), n! computed once;
      // the hooks are multiplied as numbers while the product stays exact in a double
      let den = 1n,
        run = 1;
      for (const row of hookLengths(s)) {
        for (const h of row) {
          if (run * h > Number.MAX_SAFE_INTEGER) {
            den *= BigInt(run);
            run = 1;
          }
          run *= h;
        }
      }
      const f = nFactorial / (den * BigInt(run));
      total += f * f;
      cumulative.push(total);
    }
    table = { shapes, cumulative, total };
  }
  tables.set(key, table);
  return table;
}

/** Whether p is 12...k (1) or k...21 (-1), else 0. */
export function monotonePattern(p: readonly number[]): 1 | -1 | 0 {
  if (p.every((x, i) => x === i + 1)) return 1;
  if (p.every((x, i) => x === p.length - i)) return -1;
  return 0;
}

/** The number of permutations of 1..n avoiding 12...k: sum of (f^lambda)^2 over lambda_1 < k; undefined if too many shapes. */
export function increasingAvoiderCount(n: number, k: number): bigint | undefined {
  if (k < 1) return undefined;
  return shapeTable(n, k - 1)?.total;
}

/**
 * Inverse row insertion: from a pair of standard tableaux of one shape, the permutation whose
 * insertion tableau is P and recording tableau is Q. The entry t of Q is a corner once the larger
 * ones are gone; removing that cell of P and bumping its entry back up (each row gives up its
 * largest entry smaller than the one arriving) recovers the t-th letter.
 */
export function inverseRsk(P: readonly (readonly number[])[], Q: readonly (readonly number[])[]): number[] {
  const rows = P.map((r) => r.slice());
  let n = 0;
  for (const r of Q) n += r.length;
  const rowOf = new Int32Array(n + 1);
  Q.forEach((r, i) => {
    for (const t of r) rowOf[t] = i;
  });
  const w = new Array<number>(n);
  for (let t = n; t >= 1; t--) {
    let r = rowOf[t];
    let x = rows[r].pop()!;
    while (--r >= 0) {
      const row = rows[r];
      // the rightmost entry smaller than x (rows increase)
      let lo = 0,
        hi = row.length;
      while (lo < hi) {
        const mid = (lo + hi) >> 1;
        if (row[mid] < x) lo = mid + 1;
        else hi = mid;
      }
      const y = row[lo - 1];
      row[lo - 1] = x;
      x = y;
    }
    w[t - 1] = x;
  }
  return w;
}

/** An exactly uniform avoider of 12...k (dir 1) or k...21 (dir -1) of size n, or undefined when the shape table is too large. */
export function increasingAvoiderDraw(n: number, k: number, dir: 1 | -1): ((rng: fc.Random) => number[]) | undefined {
  const table = k >= 2 ? shapeTable(n, k - 1) : null;
  if (!table || table.total === 0n) return undefined;
  return (rng) => {
    const r = uniformBelow(rng, table.total);
    // the first shape whose cumulative weight exceeds r
    let lo = 0,
      hi = table.cumulative.length - 1;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (table.cumulative[mid] > r) hi = mid;
      else lo = mid + 1;
    }
    const shape = table.shapes[lo];
    const w = inverseRsk(hookWalk(shape, rng).rows, hookWalk(shape, rng).rows);
    return dir === 1 ? w : w.reverse();
  };
}
