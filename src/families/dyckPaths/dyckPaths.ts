// dyckPaths(n): every Dyck path of semilength n, in lexicographic order with U before D
// (LIBRARY.md §1). Counted by the Catalan numbers (OEIS A000108).

import { defineFamily } from '../registry.js';
import type { Shrunk } from '../family.js';
import { sizeArg, type SizeParam } from '../permutations/permutations.js';
import type * as fc from 'fast-check';
import { FamilyArbitrary } from '../common/arbitrary.js';
import { DyckPath } from './dyckPath.js';
import { clampRange } from '../common/ranges.js';
import { binomialBig } from '../subsets/subsets.js';

export function catalanBig(n: number): bigint {
  // C(2n, n) / (n + 1), built up exactly: C_{k+1} = C_k * 2(2k+1) / (k+2).
  let c = 1n;
  for (let k = 0; k < n; k++) c = (c * BigInt(2 * (2 * k + 1))) / BigInt(k + 2);
  return c;
}

/**
 * The number of paths of r steps U = +1, D = -1 from height h down to height 0 that never go below
 * 0: C(r, u) - C(r, u - 1) with u = (r - h)/2 up steps, by the reflection principle (Feller, An
 * Introduction to Probability Theory and Its Applications I, §III.1); 0 when r - h is odd or negative.
 */
export function ballotPaths(r: number, h: number): bigint {
  if (h < 0 || h > r || (r - h) % 2 !== 0) return 0n;
  const u = (r - h) / 2;
  return binomialBig(r, u) - binomialBig(r, u - 1);
}

/** Simplicity: size, then area, then lexicographic with U before D. */
export function compareDyckPaths(a: DyckPath, b: DyckPath): number {
  const d = a.steps.length - b.steps.length || a.area() - b.area();
  if (d) return d;
  for (let i = 0; i < a.steps.length; i++) if (a.steps[i] !== b.steps[i]) return b.steps[i] - a.steps[i];
  return 0;
}

/**
 * Uniform by the cycle lemma (Dvoretzky and Motzkin, 1947): a uniform arrangement of n U's and
 * n+1 D's has exactly one cyclic rotation whose proper prefixes all stay at height >= 0, the one
 * starting just after the first lowest point; dropping its final D gives a Dyck path, and each
 * path arises from exactly 2n+1 arrangements.
 */
export function randomDyckPath(n: number, rng: fc.Random): DyckPath {
  const m = 2 * n + 1;
  const s = new Array<number>(m);
  for (let i = 0; i < m; i++) s[i] = i < n ? 1 : -1;
  for (let i = m - 1; i > 0; i--) {
    const j = rng.nextInt(0, i);
    const t = s[i];
    s[i] = s[j];
    s[j] = t;
  }
  let h = 0,
    low = 0,
    at = -1;
  for (let i = 0; i < m; i++) {
    h += s[i];
    if (h < low) {
      low = h;
      at = i;
    }
  }
  const steps: number[] = [];
  for (let k = 1; k < m; k++) steps.push(s[(at + k) % m]);
  return new DyckPath(steps);
}

/** Remove a peak UD (each distinct peak once): Dyck paths of semilength n-1. */
function* removePeaks(d: DyckPath): Generator<DyckPath> {
  const s = d.steps;
  for (let i = 0; i + 1 < s.length; i++) {
    if (s[i] > 0 && s[i + 1] < 0) yield new DyckPath([...s.slice(0, i), ...s.slice(i + 2)]);
  }
}

/** Same n, strictly simpler: lower a peak at height >= 2 into a valley (UD -> DU), area - 1. */
function* lowerPeaks(d: DyckPath): Generator<DyckPath> {
  const s = d.steps;
  let h = 0;
  for (let i = 0; i + 1 < s.length; i++) {
    h += s[i];
    if (s[i] > 0 && s[i + 1] < 0 && h >= 2) {
      const t = s.slice();
      t[i] = -1;
      t[i + 1] = 1;
      yield new DyckPath(t);
    }
  }
}

export const dyckPaths = defineFamily<SizeParam, DyckPath>({
  name: 'dyckPaths',
  params: [{ name: 'n', type: 'integer' }],
  objectKind: 'dyck',
  signature: 'dyckPaths(n: integer)',
  description: 'every Dyck path of semilength n (U and D steps, never below the axis), U before D',
  example: 'count(d in dyckPaths(4))',
  source: 'Catalan numbers, OEIS A000108; sampler: the cycle lemma (Dvoretzky and Motzkin 1947)',
  prepare(args) {
    return { n: sizeArg(args[0], 'n', 100_000) };
  },
  count({ n }) {
    return catalanBig(n);
  },
  enumerate({ n }, visit) {
    const d = new DyckPath(new Array<number>(2 * n).fill(1));
    d.transient = true;
    const s = d.steps;
    // Depth-first with U tried before D; `ups` U's so far, height h.
    const go = (i: number, ups: number, h: number): boolean => {
      if (i === 2 * n) return visit(d) === true;
      if (ups < n) {
        s[i] = 1;
        if (go(i + 1, ups + 1, h + 1)) return true;
      }
      if (h > 0) {
        s[i] = -1;
        if (go(i + 1, ups, h - 1)) return true;
      }
      return false;
    };
    return go(0, 0, 0);
  },
  enumerateRange({ n }, lo, hi, visit) {
    // The recursion of `enumerate`, passing over whole subtrees while objects remain to be skipped:
    // after i steps at height h, the rest is one of ballotPaths(2n - i, h) paths.
    const range = clampRange(lo, hi, catalanBig(n));
    if (!range) return false;
    let skip = range.first,
      skipping = skip > 0n,
      left = range.length,
      stopped = false;
    const d = new DyckPath(new Array<number>(2 * n).fill(1));
    d.transient = true;
    const s = d.steps;
    // Whether the subtree after step i (to height h) is passed over whole.
    const pass = (i: number, h: number): boolean => {
      const c = ballotPaths(2 * n - i - 1, h);
      if (c > skip) return false;
      skip -= c;
      skipping = skip > 0n;
      return true;
    };
    const go = (i: number, ups: number, h: number): boolean => {
      if (i === 2 * n) {
        if (visit(d) === true) return (stopped = true);
        return --left === 0;
      }
      if (ups < n && !(skipping && pass(i, h + 1))) {
        s[i] = 1;
        if (go(i + 1, ups + 1, h + 1)) return true;
      }
      if (h > 0 && !(skipping && pass(i, h - 1))) {
        s[i] = -1;
        if (go(i + 1, ups, h - 1)) return true;
      }
      return false;
    };
    go(0, 0, 0);
    return stopped;
  },
  isMember({ n }, obj) {
    return obj instanceof DyckPath && obj.steps.length === 2 * n;
  },
  compare: compareDyckPaths,
  arbitrary(p): fc.Arbitrary<DyckPath> {
    const { n } = p;
    return new FamilyArbitrary(dyckPaths, p, (rng) => randomDyckPath(n, rng));
  },
  *shrink({ n }, obj): Generator<Shrunk<SizeParam, DyckPath>> {
    const seen = new Set<string>();
    for (const d of removePeaks(obj)) {
      if (seen.has(d.key())) continue;
      seen.add(d.key());
      yield { params: { n: n - 1 }, size: n - 1, obj: d };
    }
    for (const d of lowerPeaks(obj)) yield { params: { n }, obj: d };
  },
});
