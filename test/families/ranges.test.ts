// enumerateRange: for every family that has it, visiting [lo, hi) gives exactly the slice
// lo..hi-1 of `enumerate`'s sequence, with the same transient objects, stops when the visitor asks,
// and works with bigint indices beyond 2^53. The reference is the family's own `enumerate` (a brute
// force walk from the start); the known first and last objects at large parameters are stated
// beside each case.

import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import '../../src/families/index.js';
import { allFamilies, getFamily } from '../../src/families/registry.js';
import type { Family } from '../../src/families/family.js';
import type { Structured } from '../../src/values/structured.js';
import { enumerateBySkipping } from '../../src/families/common/ranges.js';

/** a, a+1, ..., b */
const range = (a: number, b: number) => Array.from({ length: b - a + 1 }, (_, i) => a + i);

interface Seen {
  keys: string[];
  transient: boolean[];
}

function viaEnumerate(f: Family<any, any>, p: unknown, limit = Infinity): Seen {
  const keys: string[] = [],
    transient: boolean[] = [];
  f.enumerate(p, (o: Structured) => {
    keys.push(o.key());
    transient.push(o.transient === true);
    return keys.length >= limit;
  });
  return { keys, transient };
}

function viaRange(f: Family<any, any>, p: unknown, lo: bigint, hi: bigint): Seen & { stopped: boolean } {
  const keys: string[] = [],
    transient: boolean[] = [];
  const stopped = f.enumerateRange!(p, lo, hi, (o: Structured) => {
    keys.push(o.key());
    transient.push(o.transient === true);
  });
  return { keys, transient, stopped };
}

/** Small parameters of every family that has enumerateRange (language argument values). */
const small: Record<string, unknown[][]> = {
  permutations: [[0], [1], [3], [4], [5]],
  involutions: [[0], [1], [2], [4], [5], [7]],
  derangements: [[0], [1], [2], [3], [4], [5], [6]],
  subsets: [[0], [1], [4], [6], [0, 0], [3, 0], [5, 2], [6, 3], [6, 6], [3, 5]],
  words: [
    [0, 0],
    [0, 3],
    [2, 0],
    [3, 2],
    [2, 4],
    [4, 3],
  ],
  compositions: [[0], [1], [4], [6], [8]],
  matchings: [[0], [1], [2], [3], [4]],
  noncrossingMatchings: [[0], [1], [3], [4], [6]],
  partitions: [[0], [1], [5], [8], [12]],
  setPartitions: [[0], [1], [2], [4], [6]],
  noncrossingPartitions: [[0], [1], [3], [4], [6]],
  signedPermutations: [[0], [1], [2], [3]],
  motzkinPaths: [[0], [1], [2], [5], [8]],
  parkingFunctions: [[0], [1], [2], [3], [4]],
  dyckPaths: [[0], [1], [3], [4], [6]],
  partialPermutations: [
    [0, 0],
    [0, 3],
    [2, 0],
    [2, 3],
    [3, 3],
    [4, 2],
  ],
  standardTableaux: [[[]], [[1]], [[3]], [[2, 2]], [[3, 2]], [[3, 2, 1]], [[4, 2, 1]], [[1, 1, 1, 1]]],
  pipeDreams: [[[1]], [[2, 1]], [[1, 4, 3, 2]], [[3, 1, 4, 2]], [[4, 3, 2, 1]], [[1, 5, 4, 3, 2]]],
  reducedWords: [[[1]], [[2, 1]], [[3, 1, 2]], [[3, 2, 1]], [[4, 3, 2, 1]], [[2, 4, 1, 5, 3]]],
  asms: [[0], [1], [2], [3], [4], [5]],
};

/** Larger parameters: enough objects that only sampled pairs are compared. */
const medium: Record<string, unknown[][]> = {
  permutations: [[8]],
  involutions: [[10]],
  derangements: [[8]],
  subsets: [[14], [16, 7]],
  words: [[7, 4]],
  compositions: [[15]],
  matchings: [[6]],
  noncrossingMatchings: [[10]],
  partitions: [[30]],
  setPartitions: [[9]],
  noncrossingPartitions: [[10]],
  signedPermutations: [[6]],
  motzkinPaths: [[14]],
  parkingFunctions: [[6]],
  dyckPaths: [[10]],
  partialPermutations: [[5, 5]],
  standardTableaux: [[[4, 3, 2, 1]], [[5, 4, 2]]],
  pipeDreams: [[[1, 6, 5, 4, 3, 2]]],
  reducedWords: [[[5, 4, 3, 2, 1]]],
  asms: [[6]],
};

const ranged = allFamilies().filter((f) => typeof f.enumerateRange === 'function');

describe('enumerateRange', () => {
  it('is provided by the families it is meant for', () => {
    const names = ranged.map((f) => f.name);
    for (const name of Object.keys(small)) expect(names).toContain(name);
    // every family with enumerateRange is tested here
    for (const name of names) expect(Object.keys(small)).toContain(name);
  });

  for (const [name, argsList] of Object.entries(small)) {
    it(`${name}: every range of small sizes is the slice of the enumeration`, () => {
      const f = getFamily(name)!;
      for (const args of argsList) {
        const p = f.prepare(args as never);
        const all = viaEnumerate(f, p);
        const total = all.keys.length;
        expect(BigInt(total)).toBe(f.count(p));
        // every pair when there are few objects; else every lo with a spread of hi
        const his = (lo: number) =>
          total <= 60
            ? range(lo, total + 1)
            : [...new Set([lo, lo + 1, lo + 2, lo + 17, total - 1, total, total + 1])].filter((h) => h >= lo && h <= total + 1);
        for (let lo = 0; lo <= total; lo++) {
          for (const hi of his(lo)) {
            const got = viaRange(f, p, BigInt(lo), BigInt(hi));
            const end = Math.min(hi, total);
            expect(got.keys, `${name}(${JSON.stringify(args)}) [${lo}, ${hi})`).toEqual(all.keys.slice(lo, end));
            expect(got.transient).toEqual(all.transient.slice(lo, end));
            expect(got.stopped).toBe(false);
          }
        }
      }
    });
  }

  for (const [name, argsList] of Object.entries(medium)) {
    it(`${name}: sampled ranges of a larger size are slices of the enumeration`, () => {
      const f = getFamily(name)!;
      for (const args of argsList) {
        const p = f.prepare(args as never);
        const all = viaEnumerate(f, p);
        const total = all.keys.length;
        expect(BigInt(total)).toBe(f.count(p));
        const pairs = fc.sample(fc.tuple(fc.integer({ min: 0, max: total }), fc.integer({ min: 0, max: 300 })), { numRuns: 60, seed: 7 });
        pairs.push([0, 5], [total - 1, 1], [total - 3, 10], [0, total]);
        for (const [lo, width] of pairs) {
          const hi = Math.min(lo + width, total);
          const got = viaRange(f, p, BigInt(lo), BigInt(hi));
          expect(got.keys, `${name}(${JSON.stringify(args)}) [${lo}, ${hi})`).toEqual(all.keys.slice(lo, hi));
        }
      }
    });
  }

  for (const name of Object.keys(small)) {
    it(`${name}: stops when the visitor asks, after exactly that many objects`, () => {
      const f = getFamily(name)!;
      const args = (medium[name] ?? small[name])[0];
      const p = f.prepare(args as never);
      const all = viaEnumerate(f, p).keys;
      const lo = Math.floor(all.length / 3);
      for (const after of [1, 2, 7]) {
        const seen: string[] = [];
        const stopped = f.enumerateRange!(p, BigInt(lo), BigInt(all.length), (o: Structured) => {
          seen.push(o.key());
          return seen.length === after;
        });
        expect(stopped).toBe(true);
        expect(seen).toEqual(all.slice(lo, lo + after));
      }
      // stopping at the very last object of the range still reports the stop
      let k = 0;
      expect(f.enumerateRange!(p, BigInt(lo), BigInt(lo + 3), () => ++k === 3)).toBe(true);
      expect(k).toBe(3);
    });
  }

  it('visits nothing for an empty or reversed range and clamps to the count', () => {
    for (const f of ranged) {
      const p = f.prepare(small[f.name][1] as never);
      const total = f.count(p);
      expect(viaRange(f, p, 2n, 2n).keys).toEqual([]);
      expect(viaRange(f, p, 3n, 1n).keys).toEqual([]);
      expect(viaRange(f, p, total, total + 5n).keys).toEqual([]);
      expect(viaRange(f, p, 0n, total + 100n).keys).toEqual(viaEnumerate(f, p).keys);
    }
  });
});

// --- Counts beyond 2^53: bigint indices. ---

/** Parameters with more than 2^53 objects, the known last object's key, and a check of the order. */
interface Big {
  args: unknown[];
  /** The key of the last object in enumeration order (derived by hand from the stated order). */
  last: string;
}

/** The enumeration orders the families state, on their objects' number lists (negative: a first). */
const nums = (o: Structured): number[] => {
  const x = o as any;
  return x.a ?? x.p ?? x.letters ?? x.parts ?? x.rgs ?? x.elems ?? x.steps;
};
function lex(a: readonly number[], b: readonly number[]): number {
  for (let i = 0; i < Math.min(a.length, b.length); i++) if (a[i] !== b[i]) return a[i] - b[i];
  return a.length - b.length;
}
const orders: Record<string, (a: Structured, b: Structured) => number> = {
  permutations: (a, b) => lex(nums(a), nums(b)),
  involutions: (a, b) => lex(nums(a), nums(b)),
  derangements: (a, b) => lex(nums(a), nums(b)),
  matchings: (a, b) => lex(nums(a), nums(b)),
  words: (a, b) => lex(nums(a), nums(b)),
  compositions: (a, b) => lex(nums(a), nums(b)),
  setPartitions: (a, b) => lex(nums(a), nums(b)),
  partitions: (a, b) => lex(nums(b), nums(a)),
  subsets: (a, b) => nums(a).length - nums(b).length || lex(nums(a), nums(b)),
  // U (+1) before D (-1)
  dyckPaths: (a, b) => lex(nums(b), nums(a)),
  // a point that opens an arc (partner after it) comes before one that closes
  noncrossingMatchings: (a, b) => {
    const open = (o: Structured) => nums(o).map((q, i) => (q > i + 1 ? 0 : 1));
    return lex(open(a), open(b));
  },
};

const reverse = (n: number) => range(1, n).reverse().join(',');

/** Entries 1, 2, ... down each column in turn (the last standard tableau when rows are tried top first). */
function columnFilling(shape: number[]): string {
  const rows = shape.map((l) => new Array<number>(l).fill(0));
  let k = 1;
  for (let j = 0; j < shape[0]; j++) for (let i = 0; i < shape.length && shape[i] > j; i++) rows[i][j] = k++;
  return rows.map((r) => r.join(',')).join('/');
}

/** The rows of the n x n permutation matrix of n, n-1, ..., 1 (ones on the anti-diagonal). */
function antiDiagonal(n: number): number[][] {
  return range(0, n - 1).map((i) => range(0, n - 1).map((j) => (i + j === n - 1 ? 1 : 0)));
}

const big: Record<string, Big[]> = {
  // lexicographically last: the decreasing permutation
  permutations: [{ args: [25], last: reverse(25) }],
  // the decreasing permutation is an involution, and the lexicographically largest one
  involutions: [{ args: [44], last: reverse(44) }],
  // for even n the decreasing permutation has no fixed point, so it is the last derangement
  derangements: [{ args: [24], last: reverse(24) }],
  // by size, then lexicographic: the last is the whole set; of the k-subsets the last is n-k+1..n
  subsets: [
    { args: [70], last: range(1, 70).join(',') },
    { args: [80, 40], last: range(41, 80).join(',') },
  ],
  words: [{ args: [30, 4], last: new Array(30).fill(4).join(',') }],
  // lexicographically last composition: the single part n
  compositions: [{ args: [70], last: '70' }],
  // lexicographically last partner list: i <-> 2n+1-i
  matchings: [{ args: [20], last: reverse(40) }],
  // U before D: the last Dyck word is (UD)^n, arcs (1 2)(3 4)...
  noncrossingMatchings: [
    {
      args: [40],
      last: range(1, 80)
        .map((i) => (i % 2 ? i + 1 : i - 1))
        .join(','),
    },
  ],
  // reverse lexicographic: the last partition is 1^n
  partitions: [{ args: [420], last: new Array(420).fill(1).join(',') }],
  // the lexicographically last restricted growth string is 1, 2, ..., n
  setPartitions: [{ args: [30], last: range(1, 30).join(',') }],
  // U before D: the last Dyck path is (UD)^n
  dyckPaths: [{ args: [40], last: 'UD'.repeat(40) }],
  // each row empty first, then the free columns increasing: the last puts row i in column n+1-i
  partialPermutations: [{ args: [20, 20], last: `20x20:${antiDiagonal(20).flat().join(',')}` }],
  // entries placed in the lowest possible row last: the column filling
  standardTableaux: [{ args: [[8, 7, 6, 5, 4, 3, 2, 1]], last: columnFilling([8, 7, 6, 5, 4, 3, 2, 1]) }],
  // every entry of the monotone triangle as large as it can be: row k is n-k+1..n, the
  // permutation matrix of n, n-1, ..., 1
  asms: [
    {
      args: [13],
      last: antiDiagonal(13)
        .map((r) => r.join(','))
        .join('/'),
    },
  ],
};

describe('enumerateRange with counts beyond 2^53', () => {
  for (const [name, cases] of Object.entries(big)) {
    it(`${name}: ranges at bigint indices fit together, hold members in order, and end at the last object`, () => {
      const f = getFamily(name)!;
      for (const { args, last } of cases) {
        const p = f.prepare(args as never);
        const total = f.count(p);
        expect(total > 2n ** 53n).toBe(true);
        // the start agrees with the plain enumeration
        expect(viaRange(f, p, 0n, 40n).keys).toEqual(viaEnumerate(f, p, 40).keys);
        // at random bigint indices: [lo, lo+12) is [lo, lo+5) followed by [lo+5, lo+12), of distinct members
        const los = fc.sample(fc.bigInt({ min: 0n, max: total - 12n }), { numRuns: 12, seed: 11 });
        los.push(total - 12n, 2n ** 53n - 6n, 2n ** 53n + 1n);
        for (const lo of los) {
          const whole: Structured[] = [];
          f.enumerateRange!(p, lo, lo + 12n, (o: Structured) => void whole.push(o.transient && o.copy ? o.copy() : o));
          expect(whole.length).toBe(12);
          const keys = whole.map((o) => o.key());
          expect([...viaRange(f, p, lo, lo + 5n).keys, ...viaRange(f, p, lo + 5n, lo + 12n).keys]).toEqual(keys);
          expect(new Set(keys).size).toBe(12);
          for (const o of whole) expect(f.isMember(p, o)).toBe(true);
          const order = orders[name];
          if (order) for (let i = 1; i < whole.length; i++) expect(order(whole[i - 1], whole[i])).toBeLessThan(0);
        }
        // the end of the enumeration
        const tail = viaRange(f, p, total - 3n, total + 3n).keys;
        expect(tail.length).toBe(3);
        if (last !== '') expect(tail[2]).toBe(last);
      }
    });
  }
});

describe('enumerateRange where counting subtrees would cost too much', () => {
  // These parameters fall back to walking from the start (enumerateBySkipping); the first objects
  // still agree with the plain enumeration.
  const cases: [string, unknown[]][] = [
    ['asms', [15]],
    ['reducedWords', [range(1, 10).reverse()]],
    ['standardTableaux', [new Array(12).fill(12)]],
  ];
  for (const [name, args] of cases) {
    it(`${name}(${JSON.stringify(args)}) visits the first objects like enumerate`, () => {
      const f = getFamily(name)!;
      const p = f.prepare(args as never);
      const first = viaEnumerate(f, p, 30);
      expect(viaRange(f, p, 0n, 30n).keys).toEqual(first.keys);
      expect(viaRange(f, p, 7n, 19n).keys).toEqual(first.keys.slice(7, 19));
      expect(viaRange(f, p, 7n, 19n).transient).toEqual(first.transient.slice(7, 19));
      let k = 0;
      expect(f.enumerateRange!(p, 3n, 30n, () => ++k === 4)).toBe(true);
      expect(k).toBe(4);
    });
  }

  it('enumerateBySkipping visits exactly [lo, hi) and reports a stop', () => {
    const each = (visit: (x: number) => boolean | void) => {
      for (let i = 0; i < 10; i++) if (visit(i) === true) return true;
      return false;
    };
    for (let lo = -1; lo <= 11; lo++) {
      for (let hi = lo; hi <= 12; hi++) {
        const seen: number[] = [];
        expect(enumerateBySkipping(each, BigInt(lo), BigInt(hi), (x) => void seen.push(x))).toBe(false);
        expect(seen).toEqual(range(Math.max(lo, 0), Math.min(hi, 10) - 1));
      }
    }
    const seen: number[] = [];
    expect(enumerateBySkipping(each, 2n, 9n, (x) => seen.push(x) === 3)).toBe(true);
    expect(seen).toEqual([2, 3, 4]);
  });
});
