// compositions(n): the compositions of n (ordered positive parts summing to n), in lexicographic order.

import type { Structured } from '../../values/structured.js';
import { FamilyArbitrary, lexCompareArrays } from '../common/arbitrary.js';
import type { Family, Shrunk } from '../family.js';
import { defineFamily } from '../registry.js';
import { sizeArg, type SizeParam } from '../permutations/permutations.js';
import { Composition } from './composition.js';
import { clampRange } from '../common/ranges.js';

/** Simplicity order: the sum, the number of parts, then the parts lexicographically. */
export function compareCompositions(u: Composition, v: Composition): number {
  return u.size - v.size || u.length - v.length || lexCompareArrays(u.parts, v.parts);
}

/** The number of compositions of n: 2^(n-1), and 1 for n = 0. */
export function compositionCount(n: number): bigint {
  return n === 0 ? 1n : 1n << BigInt(n - 1);
}

export const compositions: Family<SizeParam, Composition> = defineFamily<SizeParam, Composition>({
  name: 'compositions',
  params: [{ name: 'n', type: 'integer' }],
  objectKind: 'composition',
  signature: 'compositions(n: integer)',
  description: 'the compositions of n (ordered positive parts with sum n), in lexicographic order',
  example: 'count(c in compositions(4))',
  source: 'OEIS A011782 (1, 1, 2, 4, 8, ...)',
  prepare(args) {
    return { n: sizeArg(args[0]) };
  },
  count({ n }) {
    return compositionCount(n);
  },
  enumerate({ n }, visit) {
    const c = new Composition([]);
    c.transient = true;
    const parts = c.parts;
    const go = (rest: number): boolean => {
      if (rest === 0) return visit(c) === true;
      for (let first = 1; first <= rest; first++) {
        parts.push(first);
        const stop = go(rest - first);
        parts.pop();
        if (stop) return true;
      }
      return false;
    };
    return go(n);
  },
  enumerateRange({ n }, lo, hi, visit) {
    // The recursion of `enumerate`, passing over whole subtrees while objects remain to be skipped:
    // after a first part f, the rest is one of the compositionCount(rest - f) compositions of rest - f.
    const range = clampRange(lo, hi, compositionCount(n));
    if (!range) return false;
    let skip = range.first,
      skipping = skip > 0n,
      left = range.length,
      stopped = false;
    const c = new Composition([]);
    c.transient = true;
    const parts = c.parts;
    const go = (rest: number): boolean => {
      if (rest === 0) {
        if (visit(c) === true) return (stopped = true);
        return --left === 0;
      }
      for (let first = 1; first <= rest; first++) {
        if (skipping) {
          const below = compositionCount(rest - first);
          if (below <= skip) {
            skip -= below;
            skipping = skip > 0n;
            continue;
          }
        }
        parts.push(first);
        const stop = go(rest - first);
        parts.pop();
        if (stop) return true;
      }
      return false;
    };
    go(n);
    return stopped;
  },
  isMember({ n }, obj: Structured) {
    if (!(obj instanceof Composition)) return false;
    let s = 0;
    for (const x of obj.parts) {
      if (!Number.isInteger(x) || x < 1) return false;
      s += x;
    }
    return s === n;
  },
  compare: compareCompositions,
  arbitrary(p) {
    return new FamilyArbitrary(compositions, p, (rng) => {
      // Via subsets of 1..n-1: each of the n-1 gaps is a cut with probability 1/2, independently.
      const parts: number[] = [];
      let run = 1;
      for (let gap = 1; gap < p.n; gap++) {
        if (rng.nextInt(0, 1) === 1) {
          parts.push(run);
          run = 1;
        } else run++;
      }
      if (p.n > 0) parts.push(run);
      return new Composition(parts);
    });
  },
  shrink(p, c) {
    return shrinkComposition(p.n, c);
  },
});

/** Lower a part by one (a part 1 disappears): a composition of n-1. Then merge two neighbours (one part fewer). */
function* shrinkComposition(n: number, c: Composition): Generator<Shrunk<SizeParam, Composition>> {
  const a = c.parts;
  const seen = new Set<string>();
  for (let i = 0; i < a.length; i++) {
    const b = a.slice();
    if (b[i] === 1) b.splice(i, 1);
    else b[i]--;
    const k = b.join(',');
    if (seen.has(k)) continue;
    seen.add(k);
    yield { params: { n: n - 1 }, size: n - 1, obj: new Composition(b) };
  }
  for (let i = 0; i + 1 < a.length; i++) {
    const b = a.slice();
    b.splice(i, 2, a[i] + a[i + 1]);
    yield { params: { n }, obj: new Composition(b) };
  }
}
