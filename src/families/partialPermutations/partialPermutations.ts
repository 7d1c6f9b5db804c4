// partialPermutations(k, n): every k x n 0/1 matrix with at most one 1 in each row and column
// (LIBRARY.md §1), as values of kind 'matrix' so that det, rank, transpose and products apply.
// Counted by f(k, n) = sum_r C(k, r) C(n, r) r!, via the recurrence
// f(k, n) = f(k-1, n) + n f(k-1, n-1) on the first row.

import { defineFamily } from '../registry.js';
import type { Shrunk } from '../family.js';
import { sizeArg } from '../permutations/permutations.js';
import type * as fc from 'fast-check';
import { FamilyArbitrary, uniformBelow } from '../common/arbitrary.js';
import { Matrix } from '../../algebra/matrix.js';
import type { Structured } from '../../values/structured.js';
import { clampRange } from '../common/ranges.js';

export interface RectParam {
  k: number;
  n: number;
}

const memo = new Map<number, bigint>();

export function partialPermutationCount(k: number, n: number): bigint {
  if (k === 0 || n === 0) return 1n;
  const key = k * 100_003 + n;
  const hit = memo.get(key);
  if (hit !== undefined) return hit;
  const v = partialPermutationCount(k - 1, n) + BigInt(n) * partialPermutationCount(k - 1, n - 1);
  memo.set(key, v);
  return v;
}

/** The column of the 1 in each row (0 for none), or undefined when m is not a partial permutation matrix. */
export function rowImages(m: Structured): number[] | undefined {
  if (!(m instanceof Matrix)) return undefined;
  const out: number[] = [];
  const used = new Set<number>();
  for (let i = 0; i < m.rows; i++) {
    let c = 0;
    for (let j = 0; j < m.cols; j++) {
      const x = m.entries[i * m.cols + j];
      if (x === 0) continue;
      if (x !== 1 || c !== 0 || used.has(j)) return undefined;
      c = j + 1;
      used.add(j);
    }
    out.push(c);
  }
  return out;
}

export function matrixOfImages(img: readonly number[], n: number): Matrix {
  const e = new Array<number>(img.length * n).fill(0);
  img.forEach((c, i) => {
    if (c) e[i * n + c - 1] = 1;
  });
  return new Matrix(img.length, n, e);
}

function ones(m: Matrix): number {
  let c = 0;
  for (const x of m.entries) if (x === 1) c++;
  return c;
}

/** Simplicity: fewer rows, then fewer columns, then fewer 1s, then lexicographic on the entries. */
export function comparePartialPermutations(a: Matrix, b: Matrix): number {
  const d = a.rows - b.rows || a.cols - b.cols || ones(a) - ones(b);
  if (d) return d;
  for (let i = 0; i < a.entries.length; i++) if (a.entries[i] !== b.entries[i]) return (a.entries[i] as number) - (b.entries[i] as number);
  return 0;
}

/** Exactly uniform: row by row, empty with weight f(rows left, free columns), each free column with weight f(rows left, free - 1). */
export function randomPartialPermutation(k: number, n: number, rng: fc.Random): Matrix {
  const free = Array.from({ length: n }, (_, j) => j + 1);
  const img: number[] = [];
  for (let i = 0; i < k; i++) {
    const rest = k - i - 1,
      f = free.length;
    const empty = partialPermutationCount(rest, f);
    const z = uniformBelow(rng, empty + BigInt(f) * (f > 0 ? partialPermutationCount(rest, f - 1) : 0n));
    if (z < empty) img.push(0);
    else {
      const t = Number((z - empty) / partialPermutationCount(rest, f - 1));
      img.push(free[t]);
      free.splice(t, 1);
    }
  }
  return matrixOfImages(img, n);
}

export const partialPermutations = defineFamily<RectParam, Matrix>({
  name: 'partialPermutations',
  params: [
    { name: 'k', type: 'integer' },
    { name: 'n', type: 'integer' },
  ],
  objectKind: 'matrix',
  signature: 'partialPermutations(k: integer, n: integer)',
  description: 'every k x n 0/1 matrix with at most one 1 in each row and each column',
  example: 'count(M in partialPermutations(2, 2))',
  source: 'sum_r C(k,r) C(n,r) r!; OEIS A002720 for k = n (1, 2, 7, 34, 209, 1546)',
  prepare(args) {
    return { k: sizeArg(args[0], 'k', 10_000), n: sizeArg(args[1], 'n', 10_000) };
  },
  count({ k, n }) {
    return partialPermutationCount(k, n);
  },
  enumerate({ k, n }, visit) {
    // Rows in order; each row empty (0) first, then the free columns increasing.
    const img = new Array<number>(k).fill(0);
    const used = new Uint8Array(n + 1);
    const go = (i: number): boolean => {
      if (i === k) return visit(matrixOfImages(img, n)) === true;
      for (let c = 0; c <= n; c++) {
        if (c && used[c]) continue;
        img[i] = c;
        used[c] = c ? 1 : 0;
        const stop = go(i + 1);
        if (c) used[c] = 0;
        if (stop) return true;
      }
      img[i] = 0;
      return false;
    };
    return go(0);
  },
  enumerateRange({ k, n }, lo, hi, visit) {
    // The recursion of `enumerate`, passing over whole subtrees while objects remain to be skipped:
    // with rows i+1.. and f columns free after row i, there are partialPermutationCount(k - i - 1, f) ways on.
    const range = clampRange(lo, hi, partialPermutationCount(k, n));
    if (!range) return false;
    let skip = range.first,
      skipping = skip > 0n,
      left = range.length,
      stopped = false;
    const img = new Array<number>(k).fill(0);
    const used = new Uint8Array(n + 1);
    const go = (i: number, free: number): boolean => {
      if (i === k) {
        if (visit(matrixOfImages(img, n)) === true) return (stopped = true);
        return --left === 0;
      }
      for (let c = 0; c <= n; c++) {
        if (c && used[c]) continue;
        if (skipping) {
          const below = partialPermutationCount(k - i - 1, c ? free - 1 : free);
          if (below <= skip) {
            skip -= below;
            skipping = skip > 0n;
            continue;
          }
        }
        img[i] = c;
        used[c] = c ? 1 : 0;
        const stop = go(i + 1, c ? free - 1 : free);
        if (c) used[c] = 0;
        if (stop) return true;
      }
      img[i] = 0;
      return false;
    };
    go(0, n);
    return stopped;
  },
  isMember({ k, n }, obj) {
    return obj instanceof Matrix && obj.rows === k && obj.cols === n && rowImages(obj) !== undefined;
  },
  compare: comparePartialPermutations,
  arbitrary(p): fc.Arbitrary<Matrix> {
    const { k, n } = p;
    return new FamilyArbitrary(partialPermutations, p, (rng) => randomPartialPermutation(k, n, rng));
  },
  *shrink({ k, n }, obj): Generator<Shrunk<RectParam, Matrix>> {
    const img = rowImages(obj)!;
    for (let i = 0; i < k; i++)
      yield {
        params: { k: k - 1, n },
        obj: matrixOfImages(
          img.filter((_, t) => t !== i),
          n,
        ),
      };
    for (let j = 1; j <= n; j++) {
      const rest = img.map((c) => (c === j ? 0 : c > j ? c - 1 : c));
      yield { params: { k, n: n - 1 }, obj: matrixOfImages(rest, n - 1) };
    }
    for (let i = 0; i < k; i++)
      if (img[i])
        yield {
          params: { k, n },
          obj: matrixOfImages(
            img.map((x, t) => (t === i ? 0 : x)),
            n,
          ),
        };
  },
});
