// Test helpers shared by this group's family tests: a chi-square check of a sampler against the
// exact count, and a check that enumeration visits `count` distinct members.

import * as fc from 'fast-check';
import type { Family } from '../../../src/families/family.js';
import type { Structured } from '../../../src/values/structured.js';

/** Every object of the family at p, as owned copies. */
export function listAll<P, T extends Structured>(f: Family<P, T>, p: P): T[] {
  const out: T[] = [];
  f.enumerate(p, (o) => {
    out.push((o.transient && o.copy ? o.copy() : o) as T);
  });
  return out;
}

/**
 * Pearson's chi-square statistic of `draws` samples over all `k` objects, against the uniform law.
 * The threshold df + 5 sqrt(2 df) is about five standard deviations of the chi-square law: with a
 * fixed seed the test is deterministic, and a wrong sampler (even slightly non-uniform) fails it
 * at these sample sizes.
 */
export function chiSquareUniform<T extends Structured>(arb: fc.Arbitrary<T>, all: T[], draws: number, seed = 42) {
  const index = new Map(all.map((o, i) => [o.key(), i]));
  const tally = new Array<number>(all.length).fill(0);
  for (const v of fc.sample(arb, { numRuns: draws, seed })) {
    const i = index.get(v.key());
    if (i === undefined) throw new Error(`sampler produced a non-member ${v.toText()}`);
    tally[i]++;
  }
  const e = draws / all.length;
  let chi = 0;
  for (const t of tally) chi += ((t - e) * (t - e)) / e;
  const df = all.length - 1;
  return { chi, threshold: df + 5 * Math.sqrt(2 * df), tally };
}

/** Enumeration gives `count` distinct members, each a member, in the family's simplicity order total. */
export function checkEnumeration<P, T extends Structured>(f: Family<P, T>, p: P): T[] {
  const all = listAll(f, p);
  if (BigInt(all.length) !== f.count(p)) throw new Error(`${f.name}: enumerated ${all.length}, count ${f.count(p)}`);
  const keys = new Set(all.map((o) => o.key()));
  if (keys.size !== all.length) throw new Error(`${f.name}: enumeration repeats an object`);
  for (const o of all) if (!f.isMember(p, o)) throw new Error(`${f.name}: ${o.toText()} is not a member`);
  // The simplicity order is total: distinct objects never compare equal.
  const sorted = all.slice().sort((a, b) => f.compare(a, b));
  for (let i = 1; i < sorted.length; i++)
    if (f.compare(sorted[i - 1], sorted[i]) >= 0) throw new Error(`${f.name}: compare is not a strict total order`);
  return all;
}

/** Every shrink of every object is a member of its family at its parameters and strictly simpler. */
export function checkShrinks<P, T extends Structured>(f: Family<P, T>, p: P, all: T[]): number {
  let n = 0;
  for (const o of all) {
    for (const s of f.shrink ? f.shrink(p, o) : []) {
      n++;
      if (!f.isMember(s.params, s.obj)) throw new Error(`${f.name}: shrink ${s.obj.toText()} of ${o.toText()} is not a member`);
      if (f.compare(s.obj, o) >= 0) throw new Error(`${f.name}: shrink ${s.obj.toText()} of ${o.toText()} is not simpler`);
    }
  }
  return n;
}
