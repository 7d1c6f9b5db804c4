// parkingFunctions(n): the (n+1)^(n-1) parking functions of length n (OEIS A000272), in
// lexicographic order. Exactly uniform sampler by Pollak's circle argument (Foata and Riordan,
// "Mappings of acyclic and parking functions", Aequationes Math. 10 (1974)): with n+1 spots on a
// circle every preference sequence in {1..n+1}^n parks all cars and leaves one spot empty;
// shifting all preferences by k (mod n+1) moves the empty spot by k, and the sequence is a parking
// function exactly when spot n+1 stays empty — so each parking function comes from n+1 sequences.

import { defineFamily } from '../registry.js';
import type { Family, Shrunk, Visit } from '../family.js';
import { sizeArg, type SizeParam } from '../permutations/permutations.js';
import { FamilyArbitrary, lexCompareArrays } from '../common/arbitrary.js';
import { clampRange } from '../common/ranges.js';
import { binomialBig } from '../subsets/subsets.js';
import { isParkingFunction, ParkingFunction } from './parkingFunction.js';

export function parkingCount(n: number): bigint {
  return n === 0 ? 1n : BigInt(n + 1) ** BigInt(n - 1);
}

/**
 * The number of ways to fill the m free positions so that the whole is a parking function, given
 * how many entries of each value the fixed positions hold (counts[v], v = 1..n): a dynamic
 * programme over the values v = 1..n choosing how many free positions take the value v, while the
 * running total stays >= v.
 */
export function completionCount(n: number, counts: readonly number[], m: number): bigint {
  // f[u] = ways with u free positions used so far (positions labelled: binomial choices)
  let f: bigint[] = new Array(m + 1).fill(0n);
  f[0] = 1n;
  let fixed = 0;
  for (let v = 1; v <= n; v++) {
    fixed += counts[v] ?? 0;
    const g: bigint[] = new Array(m + 1).fill(0n);
    for (let u = 0; u <= m; u++) {
      if (f[u] === 0n) continue;
      for (let k = 0; u + k <= m; k++) {
        if (fixed + u + k < v) continue;
        g[u + k] += f[u] * binomialBig(m - u, k);
      }
    }
    f = g;
  }
  return f[m];
}

/** Whether m free positions can complete the counts: setting them all to 1 must satisfy every bound. */
function completable(n: number, counts: readonly number[], m: number): boolean {
  let c = m;
  for (let j = 1; j <= n; j++) if ((c += counts[j]) < j) return false;
  return true;
}

/** Simplicity: length, then the sum of the entries, then lexicographic. */
export function compareParking(a: ParkingFunction, b: ParkingFunction): number {
  const sum = (p: ParkingFunction) => p.values.reduce((s, x) => s + x, 0);
  return a.n - b.n || sum(a) - sum(b) || lexCompareArrays(a.values, b.values);
}

function visitRange(n: number, lo: bigint, hi: bigint, visit: Visit<ParkingFunction>): boolean {
  const range = clampRange(lo, hi, parkingCount(n));
  if (!range) return false;
  let skip = range.first,
    left = range.length,
    stopped = false;
  const p = new ParkingFunction(new Array<number>(n).fill(1));
  p.transient = true;
  const a = p.values;
  const counts = new Array<number>(n + 2).fill(0);
  const go = (i: number): boolean => {
    if (i === n) {
      if (visit(p) === true) return (stopped = true);
      return --left === 0;
    }
    for (let v = 1; v <= n; v++) {
      counts[v]++;
      const c = skip > 0n ? completionCount(n, counts, n - i - 1) : completable(n, counts, n - i - 1) ? 1n : 0n;
      if (c === 0n) {
        counts[v]--;
        continue;
      }
      if (skip >= c) {
        skip -= c;
        counts[v]--;
        continue;
      }
      a[i] = v;
      if (go(i + 1)) return true;
      counts[v]--;
    }
    return false;
  };
  go(0);
  return stopped;
}

/** Delete the entry at position i and lower the later-spot preferences so the rest still parks. */
function deleteCar(a: readonly number[], i: number): number[] | undefined {
  const rest = [...a.slice(0, i), ...a.slice(i + 1)];
  // the preferences above the removed car's value shift down by one; keep it only if it parks
  const v = a[i];
  const b = rest.map((x) => (x > v ? x - 1 : x));
  return isParkingFunction(b) ? b : undefined;
}

export const parkingFunctions: Family<SizeParam, ParkingFunction> = defineFamily<SizeParam, ParkingFunction>({
  name: 'parkingFunctions',
  params: [{ name: 'n', type: 'integer' }],
  objectKind: 'parkingFunction',
  signature: 'parkingFunctions(n: integer)',
  description: 'the parking functions of length n (sequences whose increasing rearrangement b has b_i <= i), in lexicographic order',
  example: 'count(p in parkingFunctions(3))',
  source:
    '(n+1)^(n-1), OEIS A000272 (Konheim and Weiss, SIAM J. Appl. Math. 14 (1966)); sampler: Pollak, see Foata and Riordan, Aequationes Math. 10 (1974)',
  prepare(args) {
    return { n: sizeArg(args[0], 'n', 10_000) };
  },
  count({ n }) {
    return parkingCount(n);
  },
  enumerate({ n }, visit) {
    return visitRange(n, 0n, parkingCount(n), visit);
  },
  enumerateRange({ n }, lo, hi, visit) {
    return visitRange(n, lo, hi, visit);
  },
  isMember({ n }, obj) {
    return obj instanceof ParkingFunction && obj.n === n && isParkingFunction(obj.values);
  },
  compare: compareParking,
  arbitrary(p) {
    const { n } = p;
    return new FamilyArbitrary(parkingFunctions, p, (rng) => {
      const pref = Array.from({ length: n }, () => rng.nextInt(1, n + 1));
      // park on the circle of n+1 spots and find the empty one
      const taken = new Uint8Array(n + 2);
      for (const x of pref) {
        let s = x;
        while (taken[s]) s = s === n + 1 ? 1 : s + 1;
        taken[s] = 1;
      }
      let empty = 1;
      while (taken[empty]) empty++;
      const shift = n + 1 - empty;
      return new ParkingFunction(pref.map((x) => ((x - 1 + shift) % (n + 1)) + 1));
    });
  },
  *shrink({ n }, obj): Generator<Shrunk<SizeParam, ParkingFunction>> {
    const a = obj.values;
    const seen = new Set<string>();
    for (let i = n - 1; i >= 0; i--) {
      const b = deleteCar(a, i);
      if (!b || seen.has(b.join())) continue;
      seen.add(b.join());
      yield { params: { n: n - 1 }, size: n - 1, obj: new ParkingFunction(b) };
    }
    // Same length: lower one preference (still a parking function, smaller sum).
    for (let i = 0; i < n; i++) if (a[i] > 1) yield { params: { n }, obj: new ParkingFunction(a.map((x, j) => (j === i ? x - 1 : x))) };
  },
});
