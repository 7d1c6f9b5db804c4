// Shared helpers of the permutation tests: calling a registered function, all of S_n, composition.

import { Permutation } from '../../../src/families/permutations/permutation.js';
import { getFunction } from '../../../src/library/registry.js';
import type { Value } from '../../../src/values/value.js';
import fc from 'fast-check';

export const call = (name: string, ...args: Value[]): Value => {
  const f = getFunction(name);
  if (!f) throw new Error(`no function ${name}`);
  return f.impl(...args);
};

export const perm = (a: number[]): Permutation => Permutation.from(a);

/** All permutations of 1..n as arrays, by insertion of n into those of n-1 (independent of the library). */
export function allPerms(n: number): number[][] {
  if (n === 0) return [[]];
  const out: number[][] = [];
  for (const p of allPerms(n - 1)) for (let i = 0; i <= p.length; i++) out.push([...p.slice(0, i), n, ...p.slice(i)]);
  return out;
}

/** (u*v)[i] = u[v[i]] (FORMAT.md). */
export const compose = (u: readonly number[], v: readonly number[]): number[] => v.map((x) => u[x - 1]);

/** Distribution of a statistic over a list of objects, as counts indexed by value. */
export function distribution<T>(objs: T[], stat: (o: T) => number): number[] {
  const d: number[] = [];
  for (const o of objs) {
    const s = stat(o);
    while (d.length <= s) d.push(0);
    d[s]++;
  }
  return d;
}

/** A uniform permutation of 1..n for fast-check (a shuffle driven by fast-check's integers). */
export const permArb = (minN: number, maxN: number): fc.Arbitrary<number[]> =>
  fc.integer({ min: minN, max: maxN }).chain((n) =>
    fc.array(fc.nat(), { minLength: n, maxLength: n }).map((r) => {
      const a = Array.from({ length: n }, (_, i) => i + 1);
      for (let i = n - 1; i > 0; i--) {
        const j = r[i] % (i + 1);
        [a[i], a[j]] = [a[j], a[i]];
      }
      return a;
    }),
  );

/** Standardise a list of distinct numbers to a permutation of 1..k. */
export function standardise(xs: readonly number[]): number[] {
  const sorted = [...xs].sort((a, b) => a - b);
  return xs.map((x) => sorted.indexOf(x) + 1);
}
