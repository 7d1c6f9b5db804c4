// Suite-wide check of the family registry: for every registered family, at a few small parameters
// (written as expressions of the language, from the family's signature), enumeration yields exactly
// count() distinct objects, each a member, and compare is a total order consistent with equality
// (reflexive zero, antisymmetric, zero only on equal objects, transitive on a sample). A family
// registered without an entry in PARAMS is reported as a visible skip, so it is noticed.

import { describe, expect, it } from 'vitest';
import '../../src/families/index.js';
import '../../src/library/index.js';
import type { Family } from '../../src/families/family.js';
import { allFamilies } from '../../src/families/registry.js';
import { evaluate } from '../../src/language/expr/index.js';
import type { Structured } from '../../src/values/structured.js';

/** Argument lists per family, as expressions; sizes kept small enough to enumerate instantly. */
const PARAMS: Record<string, string[][]> = {
  permutations: [['0'], ['1'], ['4'], ['6']],
  avoiders: [
    ['5', '"132"'],
    ['6', '"1342"'],
    ['5', '"321"', '"2143"'],
    ['4', 'perm([2,1])'],
  ],
  involutions: [['0'], ['5'], ['7']],
  derangements: [['0'], ['1'], ['5'], ['6']],
  partitions: [['0'], ['1'], ['7'], ['12']],
  compositions: [['0'], ['1'], ['6']],
  subsets: [['0'], ['5'], ['6', '0'], ['6', '3'], ['3', '5']],
  words: [
    ['0', '2'],
    ['3', '3'],
    ['4', '2'],
    ['2', '0'],
  ],
  matchings: [['0'], ['1'], ['4']],
  noncrossingMatchings: [['0'], ['1'], ['5']],
  setPartitions: [['0'], ['1'], ['5']],
  dyckPaths: [['0'], ['1'], ['5']],
  standardTableaux: [['partition([1])'], ['partition([3,2])'], ['partition([3,2,1])']],
  semistandardTableaux: [
    ['partition([2,1])', '3'],
    ['partition([2,2])', '3'],
    ['partition([3])', '1'],
  ],
  asms: [['1'], ['3'], ['4']],
  reducedWords: [['perm([1,2,3])'], ['perm([3,2,1])'], ['perm([2,4,1,3])'], ['perm([4,3,2,1])']],
  pipeDreams: [['perm([1,2,3])'], ['perm([1,4,3,2])'], ['perm([2,1,4,3])'], ['perm([4,3,2,1])']],
  partialPermutations: [
    ['0', '0'],
    ['2', '3'],
    ['3', '3'],
  ],
};

function collect(f: Family<any, Structured>, p: unknown): Structured[] {
  const out: Structured[] = [];
  f.enumerate(p, (o) => {
    out.push(o.transient && o.copy ? o.copy() : o);
  });
  return out;
}

/** At most `k` objects spread evenly over the list. */
function spread<T>(xs: T[], k: number): T[] {
  if (xs.length <= k) return xs;
  return Array.from({ length: k }, (_, i) => xs[Math.floor((i * xs.length) / k)]);
}

const sign = (x: number) => (x > 0 ? 1 : x < 0 ? -1 : 0);
const neg = (x: number) => (x === 0 ? 0 : -x);

describe('every registered family', () => {
  for (const fam of allFamilies()) {
    const table = PARAMS[fam.name];
    if (!table) {
      it.skip(`${fam.name}: no parameters in the table of this test (signature ${fam.signature}); add an entry`, () => {});
      continue;
    }
    for (const args of table) {
      const call = `${fam.name}(${args.join(', ')})`;
      it(`${call}: count() distinct members; compare is a total order`, () => {
        const p = fam.prepare(args.map((a) => evaluate(a)));
        const all = collect(fam, p);
        expect(BigInt(all.length), `${call}: enumerated vs count()`).toBe(fam.count(p));
        const keys = all.map((o) => o.key());
        expect(new Set(keys).size, `${call}: repeated objects`).toBe(all.length);
        for (const o of all) {
          expect(o.kind, `${call}: kind of ${o.toText()}`).toBe(fam.objectKind);
          expect(fam.isMember(p, o), `${call}: ${o.toText()} is not a member`).toBe(true);
        }
        // Consistency with equality and antisymmetry on (a sample of) all pairs.
        const s = spread(all, 80);
        for (const a of s) {
          expect(fam.compare(a, a), `${call}: compare(${a.toText()}, itself)`).toBe(0);
          for (const b of s) {
            const ab = fam.compare(a, b),
              ba = fam.compare(b, a);
            expect(sign(ab), `${call}: compare(${a.toText()}, ${b.toText()}) vs the reverse`).toBe(neg(sign(ba)));
            expect(ab === 0, `${call}: compare is 0 exactly on equal objects (${a.toText()}, ${b.toText()})`).toBe(a.equals(b));
          }
        }
        // Transitivity on triples of a smaller sample.
        const t = spread(all, 24);
        for (const a of t)
          for (const b of t)
            for (const c of t) {
              if (fam.compare(a, b) < 0 && fam.compare(b, c) < 0)
                expect(fam.compare(a, c), `${call}: ${a.toText()} < ${b.toText()} < ${c.toText()}`).toBeLessThan(0);
            }
        // Sorting by compare gives a strictly increasing sequence (a total order on all objects).
        const sorted = all.slice().sort((a, b) => fam.compare(a, b));
        for (let i = 1; i < sorted.length; i++) expect(fam.compare(sorted[i - 1], sorted[i])).toBeLessThan(0);
      });
    }
  }
});
