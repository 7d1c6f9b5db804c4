// The generator contract, run on every registered family that has an arbitrary:
// reproducibility (same seed, same values, same shrink tree), membership of every value and every
// shrink, strict simplicity of every shrink (size first, then the family's compare), termination
// of greedy shrinking, and exact uniformity by a chi-square test at a size where every object can
// be tallied. Families registered by other modules join automatically once they are imported
// below and have an entry in PARAMS; a family without an entry is reported as skipped.

import * as fc from 'fast-check';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { describe, expect, it } from 'vitest';
import type { Family } from '../../src/families/family.js';
import { allFamilies, getFamily } from '../../src/families/registry.js';
import { drawAvoiderByRejection, type AvoidersParam } from '../../src/families/permutations/avoiders.js';
import type { Structured } from '../../src/values/structured.js';
import { FamilyArbitrary } from '../../src/families/common/arbitrary.js';
import { Permutation } from '../../src/families/permutations/permutation.js';

import '../../src/families/permutations/permutations.js';
import '../../src/families/permutations/avoiders.js';
import '../../src/families/permutations/involutions.js';
import '../../src/families/permutations/derangements.js';
import '../../src/families/matchings/matchings.js';
import '../../src/families/matchings/noncrossingMatchings.js';
import '../../src/families/compositions/compositions.js';
import '../../src/families/subsets/subsets.js';
import '../../src/families/words/words.js';
// Other groups' families, when present, register through the families index.
await import('../../src/families/index.js').catch(() => undefined);

interface Entry {
  /** Argument lists for the reproducibility / membership / shrink checks. */
  small: unknown[][];
  /** Argument lists for the chi-square test (count small enough to tally every object). */
  uniform: unknown[][];
}

const PARAMS: Record<string, Entry> = {
  permutations: { small: [[0], [1], [5], [9]], uniform: [[4], [5]] },
  // one pattern of length 3 is sampled through a Dyck path bijection at every size (dyckBijections.ts),
  // 12...k and k...21 through Robinson–Schensted (increasingAvoiders.ts)
  avoiders: {
    small: [
      [6, '1342'],
      [12, '4321'],
      [7, '321', '2143'],
      [30, '132'],
      [25, '321'],
    ],
    uniform: [
      [5, '1342'],
      [6, '231'],
      [5, '123'],
      [5, '132'],
      [5, '213'],
      [5, '312'],
      [5, '321'],
      [6, '1234'],
      [5, '4321'],
    ],
  },
  involutions: { small: [[0], [7], [30]], uniform: [[6]] },
  derangements: { small: [[2], [8], [40]], uniform: [[5], [6]] },
  matchings: { small: [[0], [4], [15]], uniform: [[4]] },
  noncrossingMatchings: { small: [[0], [5], [15]], uniform: [[5]] },
  compositions: { small: [[0], [6], [25]], uniform: [[6]] },
  subsets: { small: [[0], [8], [8, 3], [30, 10]], uniform: [[5], [7, 3]] },
  words: {
    small: [
      [0, 2],
      [5, 3],
      [20, 4],
    ],
    uniform: [
      [3, 3],
      [4, 2],
    ],
  },
  partitions: { small: [[0], [8], [40]], uniform: [[8]] },
  setPartitions: { small: [[0], [6], [20]], uniform: [[5]] },
  signedPermutations: { small: [[0], [1], [4], [9]], uniform: [[3]] },
  motzkinPaths: { small: [[0], [1], [6], [30]], uniform: [[6], [8]] },
  parkingFunctions: { small: [[0], [1], [4], [12]], uniform: [[4]] },
  noncrossingPartitions: { small: [[0], [1], [6], [25]], uniform: [[5], [6]] },
  dyckPaths: { small: [[0], [5], [15]], uniform: [[5]] },
  standardTableaux: { small: [[[3, 2]], [[4, 3, 1]], [[6, 4, 4, 1]]], uniform: [[[3, 2, 1]]] },
  semistandardTableaux: {
    small: [
      [[2, 1], 3],
      [[3, 2], 4],
    ],
    uniform: [
      [[2, 1], 3],
      [[2, 2], 3],
    ],
  },
  asms: { small: [[1], [4], [8]], uniform: [[4]] },
  reducedWords: { small: [[Permutation.from([3, 2, 1])], [Permutation.from([4, 3, 2, 1])]], uniform: [[Permutation.from([4, 3, 2, 1])]] },
  pipeDreams: {
    small: [[Permutation.from([1, 4, 3, 2])], [Permutation.from([4, 3, 2, 1])], [Permutation.from([2, 5, 1, 4, 3])]],
    uniform: [[Permutation.from([1, 4, 3, 2])], [Permutation.from([1, 5, 4, 3, 2])]],
  },
  partialPermutations: {
    small: [
      [0, 0],
      [2, 3],
      [6, 5],
    ],
    uniform: [
      [2, 3],
      [3, 3],
    ],
  },
};

const SEEDS = [1, 2, 3];
const VALUES_PER_SEED = 15;

function rngOf(seed: number): fc.Random {
  return new fc.Random(xoroshiro128plus(seed));
}

/** The size argument: the first argument when it is an integer (LIBRARY.md: permutations(n), ...). */
function sizeOf(args: unknown[]): number {
  return typeof args[0] === 'number' ? args[0] : Number.POSITIVE_INFINITY;
}

/** The shrink tree below a value, to a bounded depth and breadth, as nested keys. */
function shrinkTree(arb: fc.Arbitrary<Structured>, v: fc.Value<Structured>, depth: number): unknown {
  if (depth === 0) return v.value.key();
  const kids = arb.shrink(v.value, v.context).take(4);
  return [v.value.key(), [...kids].map((k) => shrinkTree(arb, k, depth - 1))];
}

/**
 * Every shrink of obj (at params p, size `size`) is a member at its own parameters and strictly
 * simpler; recurse a little along the first few shrinks.
 */
function checkShrinks(f: Family, p: unknown, size: number, obj: Structured, depth: number): void {
  if (depth === 0 || !f.shrink) return;
  let k = 0;
  for (const s of f.shrink(p, obj)) {
    expect(f.isMember(s.params, s.obj), `${s.obj.toText()} is a member`).toBe(true);
    if (s.size !== undefined) expect(s.size, `shrink ${s.obj.toText()} of ${obj.toText()} lowers the size`).toBeLessThan(size);
    else expect(f.compare(s.obj, obj), `shrink ${s.obj.toText()} of ${obj.toText()} is simpler`).toBeLessThan(0);
    if (k++ < 2) checkShrinks(f, s.params, s.size ?? size, s.obj, depth - 1);
  }
}

function memberAtSmallerSize(f: Family, args: unknown[], v: Structured): boolean {
  if (typeof args[0] !== 'number') return false;
  for (let n = args[0] - 1; n >= 0; n--) if (f.isMember(f.prepare([n, ...args.slice(1)] as never), v)) return true;
  return false;
}

/** Greedy shrinking (always take the first step) terminates. */
function greedyTerminates(f: Family, p: unknown, obj: Structured): number {
  let steps = 0;
  for (;;) {
    const first = f.shrink ? f.shrink(p, obj)[Symbol.iterator]().next() : { done: true as const, value: undefined };
    if (first.done) return steps;
    p = first.value.params;
    obj = first.value.obj;
    if (++steps > 100_000) throw new Error(`greedy shrinking of ${f.name} does not terminate`);
  }
}

/**
 * Upper and lower 1e-6 tail points of chi-square with df degrees of freedom, by the Wilson–Hilferty
 * cube-root normal approximation (Wilson and Hilferty, "The distribution of chi-square", Proc.
 * Nat. Acad. Sci. 17 (1931) 684-688). Floating point is acceptable here: this is a threshold of
 * the test, not a quantity the library computes, and with the fixed seeds below the test is
 * deterministic. z = 4.753 is the standard normal 1 - 1e-6 quantile (from standard tables).
 */
function chiSquareBounds(df: number): [number, number] {
  const z = 4.753;
  const c = 2 / (9 * df);
  const at = (zz: number) => df * Math.pow(Math.max(0, 1 - c + zz * Math.sqrt(c)), 3);
  return [at(-z), at(z)];
}

/** The chi-square statistic of `draws` draws against the uniform distribution on `cells` objects. */
function chiSquare(draw: () => string, cells: number, perCell: number): number {
  const tally = new Map<string, number>();
  for (let i = 0; i < cells * perCell; i++) {
    const k = draw();
    tally.set(k, (tally.get(k) ?? 0) + 1);
  }
  expect(tally.size).toBeLessThanOrEqual(cells);
  // Exact integer sum S = sum over all objects of (observed - perCell)^2; X^2 = S / perCell.
  let s = (cells - tally.size) * perCell * perCell;
  for (const o of tally.values()) s += (o - perCell) * (o - perCell);
  return s / perCell;
}

const withArbitrary = allFamilies().filter((f) => typeof f.arbitrary === 'function');

describe('generator contract', () => {
  for (const f of allFamilies()) {
    const entry = PARAMS[f.name];
    if (!f.arbitrary) {
      it.skip(`${f.name}: no arbitrary yet`, () => {});
      continue;
    }
    if (!entry) {
      it.skip(`${f.name}: no parameters in the contract table of test/families/contract.test.ts`, () => {});
      continue;
    }

    describe(f.name, () => {
      it('same seed: same values and same shrink tree', () => {
        for (const args of entry.small) {
          const p = f.prepare(args as never);
          for (const seed of SEEDS) {
            const run = () => {
              const arb = f.arbitrary!(p) as fc.Arbitrary<Structured>;
              const rng = rngOf(seed);
              const out: unknown[] = [];
              for (let i = 0; i < VALUES_PER_SEED; i++) out.push(shrinkTree(arb, arb.generate(rng, undefined), 2));
              return out;
            };
            expect(run()).toEqual(run());
          }
        }
      });

      it('every value is a member; every shrink is a member and strictly simpler; shrinking terminates', () => {
        for (const args of entry.small) {
          const p = f.prepare(args as never);
          const arb = f.arbitrary!(p) as fc.Arbitrary<Structured>;
          const rng = rngOf(7);
          for (let i = 0; i < VALUES_PER_SEED; i++) {
            const v = arb.generate(rng, undefined);
            expect(f.isMember(p, v.value)).toBe(true);
            expect(arb.canShrinkWithoutContext(v.value)).toBe(true);
            checkShrinks(f, p, sizeOf(args), v.value, 3);
            if (arb instanceof FamilyArbitrary) {
              // the arbitrary's shrink stream takes the family's own steps
              const fromArb = [...arb.shrink(v.value, v.context)].map((s) => s.value.key());
              const fromFamily = f.shrink ? [...f.shrink(p, v.value)].map((s) => s.obj.key()) : [];
              expect(fromArb).toEqual(fromFamily);
            } else {
              // another arbitrary: each shrink is a simpler member at these parameters, or a member at a smaller size
              for (const s of arb.shrink(v.value, v.context).take(50)) {
                if (f.isMember(p, s.value)) expect(f.compare(s.value, v.value)).toBeLessThan(0);
                else expect(memberAtSmallerSize(f, args, s.value), `${s.value.toText()} is a member at a smaller size`).toBe(true);
              }
            }
            greedyTerminates(f, p, v.value);
          }
          expect(arb.canShrinkWithoutContext(5)).toBe(false);
        }
      });

      it('is exactly uniform: chi-square against the exact count', () => {
        for (const args of entry.uniform) {
          const p = f.prepare(args as never);
          const cells = Number(f.count(p));
          expect(cells).toBeLessThanOrEqual(2000);
          const arb = f.arbitrary!(p) as fc.Arbitrary<Structured>;
          const rng = rngOf(20240601);
          const x2 = chiSquare(
            () => {
              const v = arb.generate(rng, undefined).value;
              expect(f.isMember(p, v)).toBe(true);
              return v.key();
            },
            cells,
            100,
          );
          if (cells === 1) {
            expect(x2).toBe(0);
            continue;
          }
          const [lo, hi] = chiSquareBounds(cells - 1);
          expect(x2, `${f.name}(${args.join(', ')}): chi-square ${x2} on ${cells - 1} degrees of freedom`).toBeLessThan(hi);
          expect(x2).toBeGreaterThan(lo);
        }
      });
    });
  }

  it('the chi-square test has power: it rejects the classic biased shuffle (j drawn from all n positions)', () => {
    const rng = rngOf(99);
    const biased = () => {
      const a = [1, 2, 3, 4];
      for (let i = 3; i >= 0; i--) {
        const j = rng.nextInt(0, 3);
        [a[i], a[j]] = [a[j], a[i]];
      }
      return a.join(',');
    };
    const x2 = chiSquare(biased, 24, 200);
    expect(x2).toBeGreaterThan(chiSquareBounds(23)[1]);
  });

  it('avoiders: the rejection sampler used past the tabulated sizes is uniform too', () => {
    const f = getFamily('avoiders')!;
    for (const args of [
      [5, '1342'],
      [6, '4231'],
    ]) {
      const p = f.prepare(args as never) as AvoidersParam;
      const cells = Number(f.count(p));
      const rng = rngOf(5);
      const x2 = chiSquare(() => drawAvoiderByRejection(rng, p).key(), cells, 40);
      const [lo, hi] = chiSquareBounds(cells - 1);
      expect(x2).toBeLessThan(hi);
      expect(x2).toBeGreaterThan(lo);
    }
    // a class too thin for rejection fails with a clear message
    const empty = f.prepare([12, '123', '321'] as never);
    expect(() => f.arbitrary!(empty).generate(rngOf(1), undefined)).toThrow(/could not sample avoiders\(12, "123", "321"\)/);
  });

  it('covers at least the families of this group', () => {
    const names = withArbitrary.map((f) => f.name);
    for (const n of [
      'permutations',
      'avoiders',
      'involutions',
      'derangements',
      'matchings',
      'noncrossingMatchings',
      'compositions',
      'subsets',
      'words',
    ])
      expect(names).toContain(n);
  });
});
