// Minimal-example tests: a false claim sampled only at sizes far above
// its smallest counterexample must shrink to that counterexample. The true minimum is found by brute
// force here (test/runner/brute.ts, independent of src/families); over 50 seeds the shrunk case must
// reach the true minimal size in at least 95% of them.
//
// Measured on 2 cores, printed by each test as "shrink quality: ..."; "size" is the share of 50
// seeds reaching the true minimal size, "exact" the share giving exactly the simplest failing case.
// Two runs before the search of small sizes was added to src/runner/shrink.ts (greedy steps
// only), and the current one (greedy steps, then an exhaustive search of sizes below the shrunk
// case whose case count is small):
//   cycles(w) <= 5, n = 12..24               -> identity of S_6      size 100%/100%, exact 100%/100%
//   maj(w) <= inv(w), n = 15..25             -> 132                  size 100%/100%, exact 100%/100%
//   crossings(m) <= 2, n = 8..12             -> [[1,4],[2,5],[3,6]]  size  22%/12% -> 100%, exact 100%
//   lambda[1] <= 4 or length <= 3, 15..25    -> [5,1,1,1]            size 100%/100%, exact 100%/100%
//   no 3 consecutive elements, 15..25        -> {1,2,3} in 1..3      size 100%/100%, exact 100%/100%
//   no 3 equal adjacent letters (k=3), 15..25 -> 111                 size 100%, exact 86%/74% -> 100% (with the letter exchange)
//   des(w) <= 1, n = 10..12                  -> 321                  size  16%/20% -> 100%, exact 100%
//   inv(w) <= 2, n = 10..12                  -> 321                  size  18%/20% -> 100%, exact 100%
// Shrinking from n = 25 (test/quality/shrink-time.test.ts): at most 16 ms per case.

import { describe, expect, it } from 'vitest';
import { doc } from '../runner/helpers.js';
import * as B from '../runner/brute.js';
import { measure, report } from './quality.js';

/** The smallest size at which some object fails, and the simplest failing object there. */
function bruteMinimum<T>(objects: (n: number) => T[], fails: (x: T, n: number) => boolean, cmp: (a: T, b: T) => number, maxN: number) {
  for (let n = 0; n <= maxN; n++) {
    const bad = objects(n).filter((x) => fails(x, n));
    if (bad.length > 0) return { n, simplest: B.minBy(bad, cmp), count: bad.length };
  }
  throw new Error('no failure up to ' + maxN);
}

const SLOW = 60_000;

describe('shrink quality over 50 seeds', () => {
  it(
    'cycles(w) <= 5 sampled at n = 12..24 shrinks to the identity of S_6',
    () => {
      const m = bruteMinimum(B.permutationsOf, (w) => B.cycles(w) > 5, B.comparePerms, 7);
      expect(m.n).toBe(6);
      expect(m.simplest).toEqual([1, 2, 3, 4, 5, 6]);
      const q = measure(
        doc({ id: 'cycles-bounded', for: ['n: 1..5', 'w: permutations(n)'], claim: 'cycles(w) <= 5', sample: ['n: 12..24'] }),
        'n',
        6,
        { n: 6, w: { permutation: m.simplest } },
      );
      report('cycles(w) <= 5 at n = 12..24', q);
      expect(q.minimalSize, q.misses.slice(0, 5).join('\n')).toBeGreaterThanOrEqual(0.95);
    },
    SLOW,
  );

  it(
    'maj(w) <= inv(w) sampled at n = 15..25 shrinks to 132',
    () => {
      const m = bruteMinimum(B.permutationsOf, (w) => B.maj(w) > B.inv(w), B.comparePerms, 5);
      expect(m).toEqual({ n: 3, simplest: [1, 3, 2], count: 1 });
      const q = measure(
        doc({ id: 'maj-inv', for: ['n: 1..2', 'w: permutations(n)'], claim: 'maj(w) <= inv(w)', sample: ['n: 15..25'] }),
        'n',
        3,
        { n: 3, w: { permutation: [1, 3, 2] } },
      );
      report('maj(w) <= inv(w) at n = 15..25', q);
      expect(q.minimalSize, q.misses.slice(0, 5).join('\n')).toBeGreaterThanOrEqual(0.95);
    },
    SLOW,
  );

  // Greedy steps alone reached n = 3 in only 22% of seeds (a chain of three crossings is a dead
  // end for arc deletion); the search of small sizes after them finds the minimum.
  it(
    'crossings(m) <= 2 sampled at n = 8..12 shrinks to [[1,4],[2,5],[3,6]]',
    () => {
      const m = bruteMinimum(B.matchingsOf, (x) => B.crossings(x) > 2, B.compareMatchings, 4);
      expect(m).toEqual({
        n: 3,
        simplest: [
          [1, 4],
          [2, 5],
          [3, 6],
        ],
        count: 1,
      });
      const q = measure(
        doc({ id: 'few-crossings', for: ['n: 1..2', 'm: matchings(n)'], claim: 'crossings(m) <= 2', sample: ['n: 8..12'] }),
        'n',
        3,
        { n: 3, m: { matching: m.simplest } },
      );
      report('crossings(m) <= 2 at n = 8..12', q);
      expect(q.minimalSize, q.misses.slice(0, 5).join('\n')).toBeGreaterThanOrEqual(0.95);
    },
    SLOW,
  );

  it(
    '"lambda[1] <= 4 or length(lambda) <= 3" sampled at n = 15..25 shrinks to [5,1,1,1]',
    () => {
      const m = bruteMinimum(
        (n) => B.partitionsOf(n),
        (l) => !(l[0] <= 4 || l.length <= 3),
        B.comparePartitions,
        10,
      );
      expect(m).toEqual({ n: 8, simplest: [5, 1, 1, 1], count: 1 });
      const q = measure(
        doc({
          id: 'hook-ish',
          for: ['n: 1..2', 'lambda: partitions(n)'],
          claim: 'lambda[1] <= 4 or length(lambda) <= 3',
          sample: ['n: 15..25'],
        }),
        'n',
        8,
        { n: 8, lambda: { partition: [5, 1, 1, 1] } },
      );
      report('lambda[1] <= 4 or length(lambda) <= 3 at n = 15..25', q);
      expect(q.minimalSize, q.misses.slice(0, 5).join('\n')).toBeGreaterThanOrEqual(0.95);
    },
    SLOW,
  );

  it(
    '"no three consecutive elements" on subsets sampled at n = 15..25 shrinks to {1,2,3} in 1..3',
    () => {
      const three = (s: number[]) => s.some((x) => s.includes(x + 1) && s.includes(x + 2));
      const m = bruteMinimum(B.subsetsOf, three, B.compareSubsets, 6);
      expect(m).toEqual({ n: 3, simplest: [1, 2, 3], count: 1 });
      const q = measure(
        doc({
          id: 'no-runs',
          for: ['n: 1..2', 's: subsets(n)'],
          claim: 'count(i in s, j in s, k in s where j == i + 1 and k == j + 1) == 0',
          sample: ['n: 15..25'],
        }),
        'n',
        3,
        { n: 3, s: { subset: [1, 2, 3] } },
      );
      report('no three consecutive elements of a subset at n = 15..25', q);
      expect(q.minimalSize, q.misses.slice(0, 5).join('\n')).toBeGreaterThanOrEqual(0.95);
    },
    SLOW,
  );

  it(
    '"no three equal adjacent letters" on words(n, 3) sampled at n = 15..25 shrinks to 111',
    () => {
      const run = (w: number[]) => w.some((x, i) => i + 2 < w.length && w[i + 1] === x && w[i + 2] === x);
      const m = bruteMinimum(
        (n) => B.wordsOf(n, 3),
        run,
        (a, b) => a.length - b.length || B.lex(a, b),
        5,
      );
      expect(m).toEqual({ n: 3, simplest: [1, 1, 1], count: 3 });
      const q = measure(
        doc({
          id: 'no-triples',
          for: ['n: 1..2', 'u: words(n, 3)'],
          claim: 'all(not (u[i] == u[i+1] and u[i+1] == u[i+2]) for i in 1..n-2)',
          sample: ['n: 15..25'],
        }),
        'n',
        3,
        { n: 3, u: { word: [1, 1, 1] } },
      );
      report('no three equal adjacent letters in words(n, 3) at n = 15..25', q);
      expect(q.minimalSize, q.misses.slice(0, 5).join('\n')).toBeGreaterThanOrEqual(0.95);
    },
    SLOW,
  );

  // Greedy steps alone stopped at n = 4 or 5 (deleting an entry of 2143 loses a descent); the
  // search of small sizes after them finds 321.
  it(
    'des(w) <= 1 sampled at n = 10..12 shrinks to 321',
    () => {
      const m = bruteMinimum(B.permutationsOf, (w) => w.filter((x, i) => i + 1 < w.length && x > w[i + 1]).length > 1, B.comparePerms, 5);
      expect(m).toEqual({ n: 3, simplest: [3, 2, 1], count: 1 });
      const q = measure(
        doc({ id: 'few-descents', for: ['n: 1..2', 'w: permutations(n)'], claim: 'des(w) <= 1', sample: ['n: 10..12'] }),
        'n',
        3,
        { n: 3, w: { permutation: [3, 2, 1] } },
      );
      report('des(w) <= 1 at n = 10..12', q);
      expect(q.minimalSize, q.misses.slice(0, 5).join('\n')).toBeGreaterThanOrEqual(0.95);
    },
    SLOW,
  );

  it(
    'inv(w) <= 2 sampled at n = 10..12 shrinks to 321',
    () => {
      const m = bruteMinimum(B.permutationsOf, (w) => B.inv(w) > 2, B.comparePerms, 5);
      expect(m).toEqual({ n: 3, simplest: [3, 2, 1], count: 1 });
      const q = measure(
        doc({ id: 'few-inversions', for: ['n: 1..2', 'w: permutations(n)'], claim: 'inv(w) <= 2', sample: ['n: 10..12'] }),
        'n',
        3,
        { n: 3, w: { permutation: [3, 2, 1] } },
      );
      report('inv(w) <= 2 at n = 10..12', q);
      expect(q.minimalSize, q.misses.slice(0, 5).join('\n')).toBeGreaterThanOrEqual(0.95);
    },
    SLOW,
  );
});
