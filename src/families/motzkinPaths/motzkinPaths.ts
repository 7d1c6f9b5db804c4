// motzkinPaths(n): every Motzkin path of length n, in lexicographic order with U before F before D.
// Counted by the Motzkin numbers (OEIS A001006). The sampler and the slices use the counts
// T(r, h) of the ways to finish r steps from height h: T(0, h) = [h = 0] and
// T(r, h) = T(r-1, h+1) + T(r-1, h) + T(r-1, h-1) for h >= 0 (first-step decomposition).

import { defineFamily } from '../registry.js';
import type { Family, Shrunk, Visit } from '../family.js';
import { sizeArg, type SizeParam } from '../permutations/permutations.js';
import { FamilyArbitrary, uniformBelow } from '../common/arbitrary.js';
import { clampRange } from '../common/ranges.js';
import { MotzkinPath } from './motzkinPath.js';

const table: bigint[][] = [[1n]];

/** T(r, h): paths of r steps from height h to 0 that never go below 0. */
export function completions(r: number, h: number): bigint {
  if (h < 0 || h > r) return 0n;
  while (table.length <= r) {
    const m = table.length,
      prev = table[m - 1];
    const row: bigint[] = [];
    for (let k = 0; k <= m; k++) row.push((prev[k + 1] ?? 0n) + (prev[k] ?? 0n) + (k > 0 ? (prev[k - 1] ?? 0n) : 0n));
    table.push(row);
  }
  return table[r][h];
}

export function motzkinCount(n: number): bigint {
  return completions(n, 0);
}

const ORDER = [1, 0, -1]; // U, F, D

/** Simplicity: length, then the number of up steps, then lexicographic with U before F before D. */
export function compareMotzkin(a: MotzkinPath, b: MotzkinPath): number {
  const ups = (p: MotzkinPath) => p.steps.reduce((c, s) => c + (s > 0 ? 1 : 0), 0);
  const d = a.steps.length - b.steps.length || ups(a) - ups(b);
  if (d) return d;
  for (let i = 0; i < a.steps.length; i++) if (a.steps[i] !== b.steps[i]) return b.steps[i] - a.steps[i];
  return 0;
}

function visitRange(n: number, lo: bigint, hi: bigint, visit: Visit<MotzkinPath>): boolean {
  const range = clampRange(lo, hi, motzkinCount(n));
  if (!range) return false;
  let skip = range.first,
    left = range.length,
    stopped = false;
  const p = new MotzkinPath(new Array<number>(n).fill(0));
  p.transient = true;
  const s = p.steps;
  const go = (i: number, h: number): boolean => {
    if (i === n) {
      if (visit(p) === true) return (stopped = true);
      return --left === 0;
    }
    for (const step of ORDER) {
      const c = completions(n - i - 1, h + step);
      if (c === 0n) continue;
      if (skip >= c) {
        skip -= c;
        continue;
      }
      s[i] = step;
      if (go(i + 1, h + step)) return true;
    }
    return false;
  };
  go(0, 0);
  return stopped;
}

export const motzkinPaths: Family<SizeParam, MotzkinPath> = defineFamily<SizeParam, MotzkinPath>({
  name: 'motzkinPaths',
  params: [{ name: 'n', type: 'integer' }],
  objectKind: 'motzkin',
  signature: 'motzkinPaths(n: integer)',
  description: 'every Motzkin path of length n (steps U, F, D from 0 to 0, never below the axis), U before F before D',
  example: 'count(p in motzkinPaths(5))',
  source: 'Motzkin numbers, OEIS A001006; by up steps: C(n, 2k) C_k (Donaghey and Shapiro, J. Combin. Theory A 23 (1977))',
  prepare(args) {
    return { n: sizeArg(args[0], 'n', 20_000) };
  },
  count({ n }) {
    return motzkinCount(n);
  },
  enumerate({ n }, visit) {
    return visitRange(n, 0n, motzkinCount(n), visit);
  },
  enumerateRange({ n }, lo, hi, visit) {
    return visitRange(n, lo, hi, visit);
  },
  isMember({ n }, obj) {
    if (!(obj instanceof MotzkinPath) || obj.steps.length !== n) return false;
    let h = 0;
    for (const s of obj.steps) if ((h += s) < 0) return false;
    return h === 0;
  },
  compare: compareMotzkin,
  arbitrary(p) {
    const { n } = p;
    // Exactly uniform: each step with probability (its completions) / (all completions here).
    return new FamilyArbitrary(motzkinPaths, p, (rng) => {
      const steps: number[] = [];
      let h = 0;
      for (let i = 0; i < n; i++) {
        let z = uniformBelow(rng, completions(n - i, h));
        for (const step of ORDER) {
          const c = completions(n - i - 1, h + step);
          if (z < c) {
            steps.push(step);
            h += step;
            break;
          }
          z -= c;
        }
      }
      return new MotzkinPath(steps);
    });
  },
  *shrink({ n }, obj): Generator<Shrunk<SizeParam, MotzkinPath>> {
    const s = obj.steps;
    const seen = new Set<string>();
    // Delete a flat step (length n - 1), then a peak UD (length n - 2).
    for (let i = 0; i < n; i++) {
      if (s[i] !== 0) continue;
      const t = [...s.slice(0, i), ...s.slice(i + 1)];
      if (seen.has(t.join())) continue;
      seen.add(t.join());
      yield { params: { n: n - 1 }, size: n - 1, obj: new MotzkinPath(t) };
    }
    for (let i = 0; i + 1 < n; i++) {
      if (!(s[i] > 0 && s[i + 1] < 0)) continue;
      const t = [...s.slice(0, i), ...s.slice(i + 2)];
      if (seen.has(t.join())) continue;
      seen.add(t.join());
      yield { params: { n: n - 2 }, size: n - 2, obj: new MotzkinPath(t) };
    }
    // Same length: flatten a peak UD into FF (one up step fewer).
    for (let i = 0; i + 1 < n; i++) {
      if (!(s[i] > 0 && s[i + 1] < 0)) continue;
      const t = s.slice();
      t[i] = 0;
      t[i + 1] = 0;
      yield { params: { n }, obj: new MotzkinPath(t) };
    }
  },
});
