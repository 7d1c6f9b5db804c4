// matchings(n): the perfect matchings of 1..2n, as partner lists in lexicographic order.

import type { Structured } from '../../values/structured.js';
import { FamilyArbitrary, lexCompareArrays } from '../common/arbitrary.js';
import type { Family, Shrunk } from '../family.js';
import { defineFamily } from '../registry.js';
import { sizeArg, type SizeParam } from '../permutations/permutations.js';
import { Matching, matchingCrossings, matchingNestings } from './matching.js';
import { arcDeletions, isPerfectMatching } from './arcs.js';
import { clampRange } from '../common/ranges.js';

/** (2n-1)!! = 1·3·5···(2n-1) (OEIS A001147). */
export function doubleFactorialOdd(n: number): bigint {
  let r = 1n;
  for (let i = 1; i <= n; i++) r *= BigInt(2 * i - 1);
  return r;
}

/** Simplicity order of matchings: arcs, crossings, nestings, then the partner list lexicographically. */
export function compareMatchings(u: Matching, v: Matching): number {
  return (
    u.n - v.n ||
    matchingCrossings(u.p) - matchingCrossings(v.p) ||
    matchingNestings(u.p) - matchingNestings(v.p) ||
    lexCompareArrays(u.p, v.p)
  );
}

export const matchings: Family<SizeParam, Matching> = defineFamily<SizeParam, Matching>({
  name: 'matchings',
  params: [{ name: 'n', type: 'integer' }],
  objectKind: 'matching',
  signature: 'matchings(n: integer)',
  description: 'the perfect matchings of 1..2n (n arcs), in lexicographic order of the partner lists',
  example: 'count(m in matchings(3))',
  source: 'OEIS A001147; crossings and nestings equidistributed (Chen, Deng, Du, Stanley, Yan 2007)',
  prepare(args) {
    return { n: sizeArg(args[0]) };
  },
  count({ n }) {
    return doubleFactorialOdd(n);
  },
  enumerate({ n }, visit) {
    // Match the smallest unmatched point to each larger unmatched point in increasing order:
    // every position before it is already fixed, so this is lexicographic order. 0 = unmatched.
    const m = new Matching(new Array<number>(2 * n).fill(0));
    m.transient = true;
    const p = m.p;
    const go = (i: number): boolean => {
      while (i < 2 * n && p[i] !== 0) i++;
      if (i === 2 * n) return visit(m) === true;
      for (let j = i + 1; j < 2 * n; j++) {
        if (p[j] !== 0) continue;
        p[i] = j + 1;
        p[j] = i + 1;
        const stop = go(i + 1);
        p[j] = 0;
        if (stop) {
          p[i] = 0;
          return true;
        }
      }
      p[i] = 0;
      return false;
    };
    return go(0);
  },
  enumerateRange({ n }, lo, hi, visit) {
    // The recursion of `enumerate`, passing over whole subtrees while objects remain to be skipped:
    // with `arcs` arcs still to draw, each choice of partner leaves (2 arcs - 3)!! matchings.
    const range = clampRange(lo, hi, doubleFactorialOdd(n));
    if (!range) return false;
    const below: bigint[] = [1n];
    for (let k = 1; k <= n; k++) below.push(below[k - 1] * BigInt(2 * k - 1));
    let skip = range.first,
      skipping = skip > 0n,
      left = range.length,
      stopped = false;
    const m = new Matching(new Array<number>(2 * n).fill(0));
    m.transient = true;
    const p = m.p;
    const go = (i: number, arcs: number): boolean => {
      while (i < 2 * n && p[i] !== 0) i++;
      if (i === 2 * n) {
        if (visit(m) === true) return (stopped = true);
        return --left === 0;
      }
      for (let j = i + 1; j < 2 * n; j++) {
        if (p[j] !== 0) continue;
        if (skipping && below[arcs - 1] <= skip) {
          skip -= below[arcs - 1];
          skipping = skip > 0n;
          continue;
        }
        p[i] = j + 1;
        p[j] = i + 1;
        const stop = go(i + 1, arcs - 1);
        p[j] = 0;
        if (stop) {
          p[i] = 0;
          return true;
        }
      }
      p[i] = 0;
      return false;
    };
    go(0, n);
    return stopped;
  },
  isMember({ n }, obj: Structured) {
    return obj instanceof Matching && obj.n === n && obj.p.length === 2 * n && isPerfectMatching(obj.p);
  },
  compare: compareMatchings,
  arbitrary(params) {
    return new FamilyArbitrary(matchings, params, (rng) => {
      // Sequential matching: the smallest free point takes a uniform partner among the other free
      // points; each matching arises from exactly one sequence of choices, of probability 1/(2n-1)!!.
      // The free points are kept unordered in `pool` (with their places in `where`) so that both
      // removals are O(1); the smallest free point is found by scanning left to right.
      const size = 2 * params.n;
      const p = new Array<number>(size).fill(0);
      const pool = Array.from({ length: size }, (_, i) => i + 1);
      const where = Array.from({ length: size + 1 }, (_, i) => i - 1);
      const remove = (x: number) => {
        const at = where[x],
          last = pool[pool.length - 1];
        pool[at] = last;
        where[last] = at;
        pool.pop();
      };
      for (let a = 1; a <= size; a++) {
        if (p[a - 1] !== 0) continue;
        remove(a);
        const b = pool[rng.nextInt(0, pool.length - 1)];
        remove(b);
        p[a - 1] = b;
        p[b - 1] = a;
      }
      return new Matching(p);
    });
  },
  shrink(params, m) {
    return shrinkMatching(params.n, m);
  },
});

/** Delete an arc and standardise (to n-1 arcs); then exchange the partners of two neighbouring points when that is simpler. */
function* shrinkMatching(n: number, m: Matching): Generator<Shrunk<SizeParam, Matching>> {
  const p = m.p;
  for (const q of arcDeletions(p)) yield { params: { n: n - 1 }, size: n - 1, obj: new Matching(q) };
  for (let i = 1; i < 2 * n; i++) {
    if (p[i - 1] === i + 1) continue;
    const q = p.slice();
    const x = p[i - 1],
      y = p[i];
    q[i - 1] = y;
    q[i] = x;
    q[x - 1] = i + 1;
    q[y - 1] = i;
    const cand = new Matching(q);
    if (compareMatchings(cand, m) < 0) yield { params: { n }, obj: cand };
  }
}
