// noncrossingMatchings(n): the perfect matchings of 1..2n with no two crossing arcs. Each is the
// matching of a Dyck word (an opener at i pairs with the closer that returns to its level).

import type { Structured } from '../../values/structured.js';
import { FamilyArbitrary, lexCompareArrays } from '../common/arbitrary.js';
import type { Family, Shrunk } from '../family.js';
import { defineFamily } from '../registry.js';
import { sizeArg, type SizeParam } from '../permutations/permutations.js';
import { Matching, matchingNestings } from './matching.js';
import { arcDeletions, isNoncrossing, isPerfectMatching } from './arcs.js';
import { clampRange } from '../common/ranges.js';
import { ballotPaths } from '../dyckPaths/dyckPaths.js';

export function catalanBig(n: number): bigint {
  let c = 1n;
  for (let i = 0; i < n; i++) c = (c * 2n * BigInt(2 * i + 1)) / BigInt(i + 2);
  return c;
}

/** Simplicity order: arcs, nestings, then the partner list lexicographically. */
export function compareNoncrossing(u: Matching, v: Matching): number {
  return u.n - v.n || matchingNestings(u.p) - matchingNestings(v.p) || lexCompareArrays(u.p, v.p);
}

/** The noncrossing matching of a Dyck word given as steps (+1 up, -1 down). */
function matchingOfSteps(steps: readonly number[], n: number): Matching {
  const p = new Array<number>(2 * n);
  const stack: number[] = [];
  for (let i = 0; i < 2 * n; i++) {
    if (steps[i] > 0) stack.push(i + 1);
    else {
      const a = stack.pop()!;
      p[a - 1] = i + 1;
      p[i] = a;
    }
  }
  return new Matching(p);
}

export const noncrossingMatchings: Family<SizeParam, Matching> = defineFamily<SizeParam, Matching>({
  name: 'noncrossingMatchings',
  params: [{ name: 'n', type: 'integer' }],
  objectKind: 'matching',
  signature: 'noncrossingMatchings(n: integer)',
  description: 'the perfect matchings of 1..2n without two crossing arcs, in the order of their Dyck words (up before down)',
  example: 'count(m in noncrossingMatchings(3))',
  source: 'Catalan numbers, OEIS A000108',
  prepare(args) {
    return { n: sizeArg(args[0]) };
  },
  count({ n }) {
    return catalanBig(n);
  },
  enumerate({ n }, visit) {
    // Depth first over Dyck words, opening before closing; closing pairs with the top of the stack.
    const m = new Matching(new Array<number>(2 * n).fill(0));
    m.transient = true;
    const p = m.p;
    const stack = new Array<number>(n);
    let depth = 0;
    const go = (i: number, opened: number): boolean => {
      if (i === 2 * n) return visit(m) === true;
      if (opened < n) {
        stack[depth++] = i + 1;
        const stop = go(i + 1, opened + 1);
        depth--;
        if (stop) return true;
      }
      if (depth > 0) {
        const a = stack[--depth];
        p[a - 1] = i + 1;
        p[i] = a;
        const stop = go(i + 1, opened);
        stack[depth++] = a;
        if (stop) return true;
      }
      return false;
    };
    return go(0, 0);
  },
  enumerateRange({ n }, lo, hi, visit) {
    // The recursion of `enumerate`, passing over whole subtrees while objects remain to be skipped:
    // after i points with `depth` arcs open, the rest is one of ballotPaths(2n - i, depth) Dyck words.
    const range = clampRange(lo, hi, catalanBig(n));
    if (!range) return false;
    let skip = range.first,
      skipping = skip > 0n,
      left = range.length,
      stopped = false;
    const m = new Matching(new Array<number>(2 * n).fill(0));
    m.transient = true;
    const p = m.p;
    const stack = new Array<number>(n);
    let depth = 0;
    // Whether the subtree after point i (with h arcs open) is passed over whole.
    const pass = (i: number, h: number): boolean => {
      const c = ballotPaths(2 * n - i - 1, h);
      if (c > skip) return false;
      skip -= c;
      skipping = skip > 0n;
      return true;
    };
    const go = (i: number, opened: number): boolean => {
      if (i === 2 * n) {
        if (visit(m) === true) return (stopped = true);
        return --left === 0;
      }
      if (opened < n && !(skipping && pass(i, depth + 1))) {
        stack[depth++] = i + 1;
        const stop = go(i + 1, opened + 1);
        depth--;
        if (stop) return true;
      }
      if (depth > 0 && !(skipping && pass(i, depth - 1))) {
        const a = stack[--depth];
        p[a - 1] = i + 1;
        p[i] = a;
        const stop = go(i + 1, opened);
        stack[depth++] = a;
        if (stop) return true;
      }
      return false;
    };
    go(0, 0);
    return stopped;
  },
  isMember({ n }, obj: Structured) {
    return obj instanceof Matching && obj.p.length === 2 * n && isPerfectMatching(obj.p) && isNoncrossing(obj.p);
  },
  compare: compareNoncrossing,
  arbitrary(params) {
    const n = params.n;
    return new FamilyArbitrary(noncrossingMatchings, params, (rng) => {
      // Via Dyck paths, by the cycle lemma: a uniform arrangement of n up steps and n+1 down steps
      // has exactly one of its 2n+1 rotations whose proper prefixes all stay >= 0 (the rotation
      // starting just after the first minimum of the partial sums); dropping its final down step
      // gives a Dyck path, and each Dyck path comes from exactly 2n+1 arrangements.
      const len = 2 * n + 1;
      const x = new Array<number>(len).fill(-1);
      // a uniform n-subset of the positions for the up steps (partial Fisher–Yates)
      const idx = Array.from({ length: len }, (_, i) => i);
      for (let i = 0; i < n; i++) {
        const j = rng.nextInt(i, len - 1);
        const t = idx[i];
        idx[i] = idx[j];
        idx[j] = t;
        x[idx[i]] = 1;
      }
      let s = 0,
        min = 0,
        at = 0; // at = number of steps before the first minimum's end
      for (let i = 0; i < len; i++) {
        s += x[i];
        if (s < min) {
          min = s;
          at = i + 1;
        }
      }
      const steps = new Array<number>(2 * n);
      for (let i = 0; i < 2 * n; i++) steps[i] = x[(at + i) % len];
      return matchingOfSteps(steps, n);
    });
  },
  shrink(params, m) {
    return shrinkNoncrossing(params.n, m);
  },
});

/** Delete an arc and standardise (still noncrossing, n-1 arcs). */
function* shrinkNoncrossing(n: number, m: Matching): Generator<Shrunk<SizeParam, Matching>> {
  const p = m.p;
  for (const q of arcDeletions(p)) yield { params: { n: n - 1 }, size: n - 1, obj: new Matching(q) };
}
