// semistandardTableaux(lambda, m): every semistandard tableau of shape lambda with entries in 1..m
// (LIBRARY.md §1), counted by the hook-content formula and sampled exactly by counts of
// horizontal strips.

import { defineFamily } from '../registry.js';
import type { Shrunk } from '../family.js';
import { sizeArg } from '../permutations/permutations.js';
import type * as fc from 'fast-check';
import { FamilyArbitrary, uniformBelow } from '../common/arbitrary.js';
import { conjugateParts } from '../partitions/partition.js';
import { Tableau } from './tableau.js';
import { hookContentCount, partitionArg, sizeOf } from './shapes.js';
import { compareSemistandard } from './tableauOrder.js';
import { sameShape } from './standardTableaux.js';

export interface SsytParam {
  parts: number[];
  m: number;
  n: number;
}

export function isSemistandard(t: Tableau, parts: readonly number[], m: number): boolean {
  if (!sameShape(t, parts)) return false;
  const r = t.rows;
  for (let i = 0; i < r.length; i++) {
    for (let j = 0; j < r[i].length; j++) {
      const v = r[i][j];
      if (!(v >= 1 && v <= m)) return false;
      if (j > 0 && v < r[i][j - 1]) return false;
      if (i > 0 && v <= r[i - 1][j]) return false;
    }
  }
  return true;
}

/** Every mu with lambda/mu a horizontal strip (lambda_{i+1} <= mu_i <= lambda_i). */
function* horizontalStripsBelow(lam: readonly number[]): Generator<number[]> {
  const mu = lam.slice();
  const go = function* (i: number): Generator<number[]> {
    if (i === lam.length) {
      const out = mu.slice();
      while (out.length && out[out.length - 1] === 0) out.pop();
      yield out;
      return;
    }
    const low = i + 1 < lam.length ? lam[i + 1] : 0;
    for (let v = lam[i]; v >= low; v--) {
      mu[i] = v;
      yield* go(i + 1);
    }
  };
  yield* go(0);
}

/**
 * Exactly uniform: the cells holding m form a horizontal strip lambda/mu, and mu is chosen with
 * probability s_mu(1^(m-1)) / s_lambda(1^m) (both by the hook-content formula); then recurse.
 */
export function randomSsyt(parts: readonly number[], m: number, rng: fc.Random): Tableau {
  const rows = parts.map((l) => new Array<number>(l).fill(0));
  let lam = parts.slice();
  for (let k = m; k >= 1 && lam.length > 0; k--) {
    let z = uniformBelow(rng, hookContentCount(lam, k));
    let chosen: number[] | undefined;
    for (const mu of horizontalStripsBelow(lam)) {
      z -= hookContentCount(mu, k - 1);
      if (z < 0n) {
        chosen = mu;
        break;
      }
    }
    const mu = chosen!;
    for (let i = 0; i < lam.length; i++) for (let j = mu[i] ?? 0; j < lam[i]; j++) rows[i][j] = k;
    lam = mu;
  }
  return new Tableau(rows);
}

/** Same shape and m, strictly simpler: lower one entry by one where the result stays semistandard. */
function* simplify(t: Tableau): Generator<Tableau> {
  const r = t.rows;
  for (let i = 0; i < r.length; i++) {
    for (let j = 0; j < r[i].length; j++) {
      const v = r[i][j] - 1;
      if (v < 1 || (j > 0 && v < r[i][j - 1]) || (i > 0 && v <= r[i - 1][j])) continue;
      const u = t.copy();
      u.rows[i][j] = v;
      yield u;
    }
  }
}

export const semistandardTableaux = defineFamily<SsytParam, Tableau>({
  name: 'semistandardTableaux',
  params: [
    { name: 'lambda', type: 'any' },
    { name: 'm', type: 'integer' },
  ],
  objectKind: 'tableau',
  signature: 'semistandardTableaux(lambda: partition, m: integer)',
  description: 'every semistandard tableau of shape lambda with entries in 1..m (rows weakly, columns strictly increase)',
  example: 'count(T in semistandardTableaux(partition([2, 1]), 3))',
  source: 'hook-content formula, Stanley, Enumerative Combinatorics 2, Cor. 7.21.4',
  prepare(args) {
    const parts = partitionArg(args[0]).slice();
    return { parts, m: sizeArg(args[1], 'm', 10_000), n: sizeOf(parts) };
  },
  count({ parts, m }) {
    return hookContentCount(parts, m);
  },
  enumerate({ parts, m }, visit) {
    const t = new Tableau(parts.map((l) => new Array<number>(l).fill(0)));
    t.transient = true;
    const cols = conjugateParts(parts);
    const r = t.rows;
    const go = (i: number, j: number): boolean => {
      if (i === parts.length) return visit(t) === true;
      if (j === parts[i]) return go(i + 1, 0);
      const lo = Math.max(j > 0 ? r[i][j - 1] : 1, i > 0 ? r[i - 1][j] + 1 : 1);
      const hi = m - (cols[j] - 1 - i); // room for the strictly increasing rest of column j
      for (let v = lo; v <= hi; v++) {
        r[i][j] = v;
        if (go(i, j + 1)) return true;
      }
      return false;
    };
    return go(0, 0);
  },
  isMember({ parts, m }, obj) {
    return obj instanceof Tableau && isSemistandard(obj, parts, m);
  },
  compare: compareSemistandard,
  arbitrary(p): fc.Arbitrary<Tableau> {
    const { parts, m } = p;
    return new FamilyArbitrary(semistandardTableaux, p, (rng) => randomSsyt(parts, m, rng));
  },
  *shrink({ parts, m, n }, obj): Generator<Shrunk<SsytParam, Tableau>> {
    // Size-reducing: remove a corner cell (the result is semistandard of the smaller shape, same m).
    // Lowering m with the same object is not offered: it is not simpler as an object.
    for (let i = obj.rows.length - 1; i >= 0; i--) {
      const row = obj.rows[i];
      const j = row.length - 1;
      if (i + 1 < obj.rows.length && obj.rows[i + 1].length > j) continue; // not a corner
      const rows = obj.rows.map((x) => x.slice());
      rows[i].pop();
      if (rows[i].length === 0) rows.pop();
      yield { params: { parts: rows.map((x) => x.length), m, n: n - 1 }, obj: new Tableau(rows) };
    }
    for (const u of simplify(obj)) yield { params: { parts, m, n }, obj: u };
  },
});
