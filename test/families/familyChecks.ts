// Shared checks of a family's enumeration against its count, membership and simplicity order.

import { expect } from 'vitest';
import type { Family } from '../../src/families/family.js';
import type { Structured } from '../../src/values/structured.js';

/** Every object of the family, as owned copies, in enumeration order. */
export function collect<P, T extends Structured>(f: Family<P, T>, p: P): T[] {
  const out: T[] = [];
  f.enumerate(p, (o) => {
    out.push((o.transient && o.copy ? o.copy() : o) as T);
  });
  return out;
}

/**
 * Enumeration yields exactly count() distinct members; with `order`, consecutive objects are
 * strictly increasing under it (the order the family states).
 */
export function checkEnumeration<P, T extends Structured>(f: Family<P, T>, args: unknown[], order?: (a: T, b: T) => number): T[] {
  const p = f.prepare(args as never);
  const all = collect(f, p);
  expect(BigInt(all.length)).toBe(f.count(p));
  expect(new Set(all.map((o) => o.key())).size).toBe(all.length);
  for (const o of all) expect(f.isMember(p, o)).toBe(true);
  if (order) for (let i = 1; i < all.length; i++) expect(order(all[i - 1], all[i])).toBeLessThan(0);
  // compare is a total order consistent with equality on these objects
  const sorted = all.slice().sort((a, b) => f.compare(a, b));
  for (let i = 1; i < sorted.length; i++) expect(f.compare(sorted[i - 1], sorted[i])).toBeLessThan(0);
  return all;
}

/** Stop early: enumerate returns true when the visitor stops it, after exactly that many visits. */
export function checkEarlyStop<P, T extends Structured>(f: Family<P, T>, args: unknown[], after: number): void {
  const p = f.prepare(args as never);
  let seen = 0;
  const stopped = f.enumerate(p, () => ++seen === after);
  expect(stopped).toBe(true);
  expect(seen).toBe(after);
}
