// pipeDreams(w): every reduced pipe dream of w (LIBRARY.md §1), through compatible sequences
// (Billey, Jockusch and Stanley, Some combinatorial properties of Schubert polynomials, J. Algebraic
// Combin. 2 (1993); Bergeron and Billey, RC-graphs and Schubert polynomials, Experiment. Math. 2
// (1993)): pairs of a reduced word a_1 ... a_l of w (w = s_{a_1} * ... * s_{a_l}) and rows
// i_1 <= ... <= i_l with i_k <= a_k and i_k < i_{k+1} whenever a_k < a_{k+1}; the crosses are
// (i_k, a_k - i_k + 1), read top row first and right to left in each row. Their number is
// S_w(1, ..., 1).

import { fail } from '../../base/errors.js';
import { defineFamily } from '../registry.js';
import type { Shrunk } from '../family.js';
import { inversions } from '../permutations/permutation.js';
import type * as fc from 'fast-check';
import { FamilyArbitrary, uniformBelow } from '../common/arbitrary.js';
import { leftDescents, leftMultiply, permutationArg } from '../reducedWords/reducedWordCounts.js';
import { PipeDream, tracePipes } from './pipeDream.js';
import { clampRange } from '../common/ranges.js';

export interface PipeParam {
  w: number[];
  n: number;
  length: number;
}

const memo = new Map<string, bigint>();
const MEMO_LIMIT = 2_000_000;

/** The next (a, i) pairs allowed after (lastA, lastI) with v still to be written. */
function* steps(v: readonly number[], lastA: number, lastI: number): Generator<[number, number]> {
  for (const a of leftDescents(v)) {
    const from = a > lastA ? lastI + 1 : lastI;
    for (let i = Math.max(from, 1); i <= a; i++) yield [a, i];
  }
}

/** The number of compatible continuations: S_v-like counts with the constraint from the last step. */
function continuations(v: number[], lastA: number, lastI: number): bigint {
  if (inversions(v) === 0) return 1n;
  const key = `${v.join(',')}|${lastA}|${lastI}`;
  const hit = memo.get(key);
  if (hit !== undefined) return hit;
  if (memo.size >= MEMO_LIMIT)
    fail(`counting the pipe dreams of a permutation this large needs more than ${MEMO_LIMIT} intermediate counts`);
  let s = 0n;
  for (const [a, i] of steps(v, lastA, lastI)) s += continuations(leftMultiply(v, a), a, i);
  memo.set(key, s);
  return s;
}

/** S_w(1, ..., 1): the number of reduced pipe dreams of w. */
export function pipeDreamCount(w: readonly number[]): bigint {
  return continuations(w.slice(), Number.MAX_SAFE_INTEGER, 1);
}

/** Crosses in reading order (row up, right to left) to the sorted list of a PipeDream. */
function sortCrosses(stack: readonly [number, number][], out: [number, number][]): void {
  let k = 0;
  for (let s = 0; s < stack.length; ) {
    let e = s;
    while (e < stack.length && stack[e][0] === stack[s][0]) e++;
    for (let t = e - 1; t >= s; t--) {
      out[k][0] = stack[t][0];
      out[k][1] = stack[t][1];
      k++;
    }
    s = e;
  }
}

export function comparePipeDreams(a: PipeDream, b: PipeDream): number {
  const d = a.crosses.length - b.crosses.length;
  if (d) return d;
  for (let k = 0; k < a.crosses.length; k++) {
    const x = a.crosses[k],
      y = b.crosses[k];
    if (x[0] !== y[0]) return x[0] - y[0];
    if (x[1] !== y[1]) return x[1] - y[1];
  }
  return 0;
}

export function isPipeDreamOf(p: PipeDream, w: readonly number[]): boolean {
  const n = w.length;
  if (p.crosses.length !== inversions(w)) return false;
  for (const [i, j] of p.crosses) if (i + j > n) return false;
  const { exits, reduced } = tracePipes(p.crosses, n);
  return reduced && exits.every((c, i) => c === w[i]);
}

/** Exactly uniform: each next (a, i) is drawn with probability proportional to its continuations. */
export function randomPipeDream(w: readonly number[], rng: fc.Random): PipeDream {
  let v = w.slice(),
    lastA = Number.MAX_SAFE_INTEGER,
    lastI = 1;
  const stack: [number, number][] = [];
  while (inversions(v) > 0) {
    let z = uniformBelow(rng, continuations(v, lastA, lastI));
    for (const [a, i] of steps(v, lastA, lastI)) {
      const u = leftMultiply(v, a);
      z -= continuations(u, a, i);
      if (z < 0n) {
        stack.push([i, a - i + 1]);
        v = u;
        lastA = a;
        lastI = i;
        break;
      }
    }
  }
  const out = stack.map(() => [0, 0] as [number, number]);
  sortCrosses(stack, out);
  return new PipeDream(out, w.length);
}

/** Lexicographically smaller pipe dreams of w: move one cross up into the next column (ladder-like moves), checked by tracing. */
function* simplify(p: PipeDream, w: readonly number[]): Generator<PipeDream> {
  for (let k = 0; k < p.crosses.length; k++) {
    const [i, j] = p.crosses[k];
    for (let r = i - 1; r >= 1; r--) {
      if (p.has(r, j + 1)) continue;
      const moved = p.crosses.filter((_, t) => t !== k);
      moved.push([r, j + 1]);
      moved.sort((x, y) => x[0] - y[0] || x[1] - y[1]);
      const q = new PipeDream(moved, w.length);
      if (isPipeDreamOf(q, w) && comparePipeDreams(q, p) < 0) yield q;
    }
  }
}

export const pipeDreams = defineFamily<PipeParam, PipeDream>({
  name: 'pipeDreams',
  params: [{ name: 'w', type: 'any' }],
  objectKind: 'pipeDream',
  signature: 'pipeDreams(w: permutation)',
  description:
    'every reduced pipe dream of w: crosses (i, j) with i + j <= n whose pipes read w, no two crossing twice; the pipe entering at the left of row i exits at the top of column w(i)',
  example: 'count(P in pipeDreams(perm([1, 4, 3, 2])))',
  source: 'S_w(1,...,1); Billey, Jockusch and Stanley, J. Algebraic Combin. 2 (1993); Bergeron and Billey, Experiment. Math. 2 (1993)',
  prepare(args) {
    const w = permutationArg(args[0]).slice();
    return { w, n: w.length, length: inversions(w) };
  },
  count({ w }) {
    return pipeDreamCount(w);
  },
  enumerate({ w, length }, visit) {
    const p = new PipeDream(
      Array.from({ length }, () => [0, 0] as [number, number]),
      w.length,
    );
    p.transient = true;
    const stack: [number, number][] = [];
    const go = (v: number[], lastA: number, lastI: number): boolean => {
      if (stack.length === length) {
        sortCrosses(stack, p.crosses);
        return visit(p) === true;
      }
      for (const [a, i] of steps(v, lastA, lastI)) {
        stack.push([i, a - i + 1]);
        const stop = go(leftMultiply(v, a), a, i);
        stack.pop();
        if (stop) return true;
      }
      return false;
    };
    return go(w.slice(), Number.MAX_SAFE_INTEGER, 1);
  },
  enumerateRange({ w, length }, lo, hi, visit) {
    // The recursion of `enumerate`, passing over whole subtrees while objects remain to be skipped:
    // after the step (a, i) there are continuations(s_a v, a, i) compatible sequences on.
    const range = clampRange(lo, hi, pipeDreamCount(w));
    if (!range) return false;
    let skip = range.first,
      skipping = skip > 0n,
      left = range.length,
      stopped = false;
    const p = new PipeDream(
      Array.from({ length }, () => [0, 0] as [number, number]),
      w.length,
    );
    p.transient = true;
    const stack: [number, number][] = [];
    const go = (v: number[], lastA: number, lastI: number): boolean => {
      if (stack.length === length) {
        sortCrosses(stack, p.crosses);
        if (visit(p) === true) return (stopped = true);
        return --left === 0;
      }
      for (const [a, i] of steps(v, lastA, lastI)) {
        const u = leftMultiply(v, a);
        if (skipping) {
          const below = continuations(u, a, i);
          if (below <= skip) {
            skip -= below;
            skipping = skip > 0n;
            continue;
          }
        }
        stack.push([i, a - i + 1]);
        const stop = go(u, a, i);
        stack.pop();
        if (stop) return true;
      }
      return false;
    };
    go(w.slice(), Number.MAX_SAFE_INTEGER, 1);
    return stopped;
  },
  isMember({ w }, obj) {
    return obj instanceof PipeDream && isPipeDreamOf(obj, w);
  },
  compare: comparePipeDreams,
  arbitrary(p): fc.Arbitrary<PipeDream> {
    const { w } = p;
    return new FamilyArbitrary(pipeDreams, p, (rng) => randomPipeDream(w, rng));
  },
  *shrink(p, obj): Generator<Shrunk<PipeParam, PipeDream>> {
    for (const q of simplify(obj, p.w)) yield { params: p, obj: q };
  },
});
