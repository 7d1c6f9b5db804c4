// Kostka numbers K_{lambda, mu}: semistandard tableaux of shape lambda and content mu, counted by
// peeling horizontal strips (the cells holding the largest letter form one), memoised.

import { fail } from '../base/errors.js';
import { defineFunction } from './registry.js';
import { Partition } from '../families/partitions/partition.js';
import { partitionArg, sizeOf } from '../families/tableaux/shapes.js';
import { normBig } from '../numbers/integer.js';
import { valueToText } from '../values/operations.js';
import type { Value } from '../values/value.js';

const memo = new Map<string, bigint>();

/** Every nu with lambda/nu a horizontal strip of exactly `size` cells. */
export function* stripsOfSize(lam: readonly number[], size: number): Generator<number[]> {
  const nu = lam.slice();
  const go = function* (i: number, left: number): Generator<number[]> {
    if (i === lam.length) {
      if (left === 0) {
        const out = nu.slice();
        while (out.length && out[out.length - 1] === 0) out.pop();
        yield out;
      }
      return;
    }
    const low = i + 1 < lam.length ? lam[i + 1] : 0;
    for (let v = lam[i]; v >= low && lam[i] - v <= left; v--) {
      nu[i] = v;
      yield* go(i + 1, left - (lam[i] - v));
    }
    nu[i] = lam[i];
  };
  yield* go(0, size);
}

/** K_{lambda, mu} for a partition lambda and a weak composition mu (nonnegative parts, any order). */
export function kostkaNumber(lam: readonly number[], mu: readonly number[]): bigint {
  if (sizeOf(lam) !== sizeOf(mu)) return 0n;
  return peel(lam, mu, mu.length);
}

function peel(lam: readonly number[], mu: readonly number[], k: number): bigint {
  if (k === 0) return lam.length === 0 ? 1n : 0n;
  if (lam.length > k) return 0n; // columns strictly increase: at most k rows with k letters
  const key = lam.join(',') + '|' + mu.slice(0, k).join(',');
  const hit = memo.get(key);
  if (hit !== undefined) return hit;
  let s = 0n;
  for (const nu of stripsOfSize(lam, mu[k - 1])) s += peel(nu, mu, k - 1);
  memo.set(key, s);
  return s;
}

/** A content argument: a partition or a list of nonnegative integers. */
export function weightArg(v: Value, what: string): number[] {
  if (v instanceof Partition) return v.parts;
  if (Array.isArray(v) && v.every((x) => typeof x === 'number' && Number.isSafeInteger(x) && x >= 0)) return v as number[];
  fail(`${what} must be a partition or a list of nonnegative integers, got ${valueToText(v)}`);
}

defineFunction({
  name: 'kostka',
  topic: 'symmetric functions',
  params: [
    { name: 'lambda', type: ['partition', 'list'] },
    { name: 'mu', type: ['partition', 'list'] },
  ],
  returns: 'integer',
  description: 'the Kostka number K_{lambda,mu}: semistandard tableaux of shape lambda and content mu (mu may be any weak composition)',
  example: 'kostka(partition([3, 1]), partition([2, 1, 1]))',
  exampleValue: '2',
  source: 'Macdonald, Symmetric Functions and Hall Polynomials, I.6 (table of K for n <= 8)',
  impl: (l, m) => normBig(kostkaNumber(partitionArg(l), weightArg(m, 'mu'))),
});
