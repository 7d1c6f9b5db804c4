// The exhaustive phase of FORMAT.md §4.2: sizes in increasing order, stop after the first size with
// a failure but finish it, count every failure there, and report the SIMPLEST failing case by the
// simplicity order of LIBRARY.md §1 (not the first one met in enumeration order). The expected
// cases are computed by brute force in ./brute.ts, independently of src/families.

import { describe, expect, it } from 'vitest';
import { check, doc } from './helpers.js';
import * as B from './brute.js';

const perm = (a: number[]) => ({ permutation: a });

describe('sizes and stopping', () => {
  it('checks sizes in increasing order and stops after the first failing size, which it finishes', () => {
    // inv(w) <= 4 first fails in S_4, for the permutations with 5 or 6 inversions: 3 + 1 = 4 of them
    // (Mahonian numbers, OEIS A008302, row n = 4: 1, 3, 5, 6, 5, 3, 1).
    const r = check(doc({ for: ['n: 1..7', 'w: permutations(n)'], claim: 'inv(w) <= 4' }));
    expect(r.outcome).toBe('fails');
    expect(r.checked.map((p) => [p.phase, p.size.n, p.cases, p.failures])).toEqual([
      ['exhaustive', 1, 1, 0],
      ['exhaustive', 2, 2, 0],
      ['exhaustive', 3, 6, 0],
      ['exhaustive', 4, 24, 4], // finished: all 24 cases, not stopped at the first failure
    ]);
    expect(r.counterexample!.failuresAtSize).toBe(4);
    expect(r.counterexample!.size).toEqual({ n: 4 });
    // the simplest of the four: 5 inversions, lexicographically least of 3421, 4231, 4312
    expect(r.counterexample!.bindings).toEqual({ n: 4, w: perm([3, 4, 2, 1]) });
    expect(r.counterexample!.phase).toBe('exhaustive');
    expect(r.counterexample!.sides).toEqual([5, 4]);
  });

  it('a true claim reports every size with its exact number of cases', () => {
    const r = check(doc({ for: ['n: 0..6', 'w: permutations(n)'], claim: 'inv(w) == inv(inverse(w))' }));
    expect(r.outcome).toBe('holds');
    expect(r.counterexample).toBeNull();
    // n! (OEIS A000142)
    expect(r.checked.map((p) => [p.size.n, p.cases, p.failures, p.skipped])).toEqual(
      [1, 1, 2, 6, 24, 120, 720].map((c, n) => [n, c, 0, 0]),
    );
  });

  it('the let values and the two sides of the claim are reported for the counterexample', () => {
    const r = check(doc({ for: ['n: 1..5', 'w: permutations(n)'], let: ['a: maj(w)', 'b: inv(w)'], claim: 'a <= b' }));
    expect(r.counterexample!.bindings).toEqual({ n: 3, w: perm([1, 3, 2]) });
    expect(r.counterexample!.values).toEqual({ a: 2, b: 1 });
    expect(r.counterexample!.sides).toEqual([2, 1]);
  });
});

describe('the simplest failing case, not the first one enumerated', () => {
  it('permutations: fewest inversions, then lexicographic', () => {
    // Fails for w[1] == 2 with 3 inversions (first in lexicographic enumeration: 2341) and for
    // w[1] == 3 with 2 inversions (3124): the simplest is 3124.
    const pred = (w: number[]) => (w[0] === 2 && B.inv(w) === 3) || (w[0] === 3 && B.inv(w) === 2);
    const failing = B.permutationsOf(4).filter(pred);
    const expected = B.minBy(failing, B.comparePerms);
    expect(failing[0]).not.toEqual(expected); // the test is meaningful: enumeration order differs
    const r = check(
      doc({ for: ['n: 4..4', 'w: permutations(n)'], claim: 'not ((w[1] == 2 and inv(w) == 3) or (w[1] == 3 and inv(w) == 2))' }),
    );
    expect(r.counterexample!.bindings).toEqual({ n: 4, w: perm(expected) });
    expect(expected).toEqual([3, 1, 2, 4]);
    expect(r.counterexample!.failuresAtSize).toBe(failing.length);
  });

  it('permutations: among several with the fewest inversions, the lexicographically least', () => {
    // Fails for 1432 (3 inversions, enumerated first), 3124 and 2314 (2 inversions each): the
    // simplest is 2314, the lexicographically least of the two with the fewest inversions.
    const bad = ['1432', '3124', '2314'];
    const failing = B.permutationsOf(4).filter((w) => bad.includes(w.join('')));
    const expected = B.minBy(failing, B.comparePerms);
    expect(failing[0]).toEqual([1, 4, 3, 2]);
    expect(expected).toEqual([2, 3, 1, 4]);
    const claim = 'not (' + bad.map((b) => `w == perm([${b.split('').join(',')}])`).join(' or ') + ')';
    const r = check(doc({ for: ['n: 4..4', 'w: permutations(n)'], claim }));
    expect(r.counterexample!.bindings).toEqual({ n: 4, w: perm(expected) });
    expect(r.counterexample!.failuresAtSize).toBe(3);
  });

  it('matchings: fewest crossings, then fewest nestings, then lexicographic partner list', () => {
    const pred = (m: number[][]) => (B.partners(m)[0] === 2 && B.crossings(m) === 1) || (B.crossings(m) === 0 && B.nestings(m) === 1);
    const all = B.matchingsOf(3).sort((a, b) => B.lex(B.partners(a), B.partners(b)));
    const failing = all.filter(pred);
    const expected = B.minBy(failing, B.compareMatchings);
    expect(failing[0]).not.toEqual(expected);
    expect(expected).toEqual([
      [1, 2],
      [3, 6],
      [4, 5],
    ]);
    const r = check(
      doc({
        for: ['n: 3..3', 'm: matchings(n)'],
        claim: 'not ((partner(m, 1) == 2 and crossings(m) == 1) or (crossings(m) == 0 and nestings(m) == 1))',
      }),
    );
    expect(r.counterexample!.bindings).toEqual({ n: 3, m: { matching: expected } });
    expect(r.counterexample!.failuresAtSize).toBe(failing.length);
  });

  it('partitions: fewest parts first (not the first enumerated)', () => {
    // Fails for [4,1,1] (enumerated first) and [3,3] (fewer parts: the simplest).
    const pred = (l: number[]) => (l[0] === 4 && l.length === 3) || (l[0] <= 3 && l.length === 2);
    const failing = B.partitionsOf(6).filter(pred);
    const expected = B.minBy(failing, B.comparePartitions);
    expect(failing[0]).toEqual([4, 1, 1]);
    expect(expected).toEqual([3, 3]);
    const r = check(
      doc({
        for: ['n: 6..6', 'lambda: partitions(n)'],
        claim: 'not ((lambda[1] == 4 and length(lambda) == 3) or (lambda[1] <= 3 and length(lambda) == 2))',
      }),
    );
    expect(r.counterexample!.bindings).toEqual({ n: 6, lambda: { partition: expected } });
    expect(r.counterexample!.failuresAtSize).toBe(2);
  });

  it('partitions: among equal lengths, the reverse-lexicographically first (the larger first part)', () => {
    // Every partition of 6 with 3 parts fails: [4,1,1], [3,2,1], [2,2,2]; the simplest is [4,1,1].
    const r = check(doc({ for: ['n: 6..6', 'lambda: partitions(n)'], claim: 'length(lambda) != 3' }));
    const expected = B.minBy(
      B.partitionsOf(6).filter((l) => l.length === 3),
      B.comparePartitions,
    );
    expect(expected).toEqual([4, 1, 1]);
    expect(r.counterexample!.bindings).toEqual({ n: 6, lambda: { partition: expected } });
    expect(r.counterexample!.failuresAtSize).toBe(3);
  });

  it('subsets: fewest elements, then lexicographic', () => {
    // Fails for {1,2,3} (lexicographically first) and for {4} (fewer elements: the simplest).
    const failing = B.subsetsOf(4).filter((s) => s.join() === '1,2,3' || s.join() === '4');
    const expected = B.minBy(failing, B.compareSubsets);
    expect(expected).toEqual([4]);
    const r = check(doc({ for: ['n: 4..4', 's: subsets(n)'], claim: 'not (s == subset([1,2,3]) or s == subset([4]))' }));
    expect(r.counterexample!.bindings).toEqual({ n: 4, s: { subset: [4] } });
    expect(r.counterexample!.failuresAtSize).toBe(2);
  });

  it('several bindings are compared in `for` order: the simplest first binding wins', () => {
    // (1432, {}) is enumerated first; (2134, {1,2,3,4}) is simpler because w comes first in `for`
    // and 2134 has 1 inversion against 3.
    const r = check(
      doc({
        for: ['n: 4..4', 'w: permutations(n)', 's: subsets(n)'],
        claim: 'not ((w == perm([1,4,3,2]) and len(s) == 0) or (w == perm([2,1,3,4]) and len(s) == 4))',
      }),
    );
    expect(r.counterexample!.bindings).toEqual({ n: 4, w: perm([2, 1, 3, 4]), s: { subset: [1, 2, 3, 4] } });
    expect(r.counterexample!.failuresAtSize).toBe(2);
  });

  it('a range binding after the size is compared by value', () => {
    const r = check(doc({ for: ['n: 1..5', 'k: 0..n', 'w: permutations(n)'], claim: 'not (k >= 2 and inv(w) == k)' }));
    // First fails at n = 2: k = 2 is not reachable with inv <= 1; n = 3: k = 2 (two perms), k = 3 (one).
    expect(r.counterexample!.bindings).toEqual({ n: 3, k: 2, w: perm([2, 3, 1]) });
    expect(r.counterexample!.failuresAtSize).toBe(3);
  });
});

describe('where, errors, aggregates, dependent ranges', () => {
  it('cases excluded by `where` are counted apart as skipped, never as cases', () => {
    const r = check(doc({ for: ['n: 1..5', 'w: permutations(n)'], where: 'sign(w) == 1', claim: 'inv(w) >= 0' }));
    expect(r.outcome).toBe('holds');
    // even permutations: n!/2 for n >= 2
    expect(r.checked.map((p) => [p.size.n, p.cases, p.skipped])).toEqual([
      [1, 1, 0],
      [2, 1, 1],
      [3, 3, 3],
      [4, 12, 12],
      [5, 60, 60],
    ]);
  });

  it('a where that excludes everything leaves zero cases, still holds', () => {
    const r = check(doc({ for: ['n: 1..3', 'w: permutations(n)'], where: 'inv(w) < 0', claim: 'false' }));
    expect(r.outcome).toBe('holds');
    expect(r.checked.every((p) => p.cases === 0 && p.skipped > 0)).toBe(true);
  });

  it('an evaluation error in the claim gives outcome error with the bindings named, never a pass', () => {
    // 1/(inv(w) - 2) divides by zero first at n = 3, w = 231 (the first permutation with 2 inversions)
    const r = check(doc({ for: ['n: 1..5', 'w: permutations(n)'], claim: '1 / (inv(w) - 2) != 7' }));
    expect(r.outcome).toBe('error');
    expect(r.counterexample).toBeNull();
    expect(r.error!.bindings).toEqual({ n: 3, w: perm([2, 3, 1]) });
    expect(r.error!.message).toMatch(/zero/i);
    expect(r.error!.file).toBe('test.yaml');
    expect(r.error!.line).toBeGreaterThan(0);
  });

  it('an evaluation error in a let or in where is reported the same way', () => {
    const r1 = check(doc({ for: ['n: 1..4', 'w: permutations(n)'], let: ['a: w[n + 1]'], claim: 'a > 0' }));
    expect(r1.outcome).toBe('error');
    expect(r1.error!.bindings).toEqual({ n: 1, w: perm([1]) });
    const r2 = check(doc({ for: ['n: 1..4', 'w: permutations(n)'], where: 'quo(5, inv(w)) > 1', claim: 'true' }));
    expect(r2.outcome).toBe('error');
    expect(r2.error!.bindings).toEqual({ n: 1, w: perm([1]) });
  });

  it('an error after a failure at the same size is still an error, not a pass', () => {
    const r = check(doc({ for: ['n: 3..3', 'w: permutations(n)'], claim: 'inv(w) != 1 and 1 / (inv(w) - 3) != 5' }));
    expect(r.outcome).toBe('error');
    expect(r.error!.bindings).toEqual({ n: 3, w: perm([3, 2, 1]) });
  });

  it('an aggregate claim (no family binding) is evaluated once per size', () => {
    // n! (OEIS A000142) = the number of permutations
    const r = check(doc({ for: ['n: 1..6'], claim: 'count(w in permutations(n)) == factorial(n)' }));
    expect(r.outcome).toBe('holds');
    expect(r.checked.map((p) => [p.size.n, p.cases])).toEqual([1, 2, 3, 4, 5, 6].map((n) => [n, 1]));
    // Catalan numbers (OEIS A000108): 1, 2, 5, 14, 42; the claim "< 14" first fails at n = 4
    const f = check(doc({ for: ['n: 1..6'], claim: 'count(m in noncrossingMatchings(n)) < 14' }));
    expect(f.counterexample!.bindings).toEqual({ n: 4 });
    expect(f.counterexample!.failuresAtSize).toBe(1);
    expect(f.checked).toHaveLength(4);
  });

  it('range bindings may depend on earlier ones (n: 1..5, k: 0..n)', () => {
    // binomial coefficients (OEIS A007318) count the k-subsets
    const r = check(doc({ for: ['n: 1..5', 'k: 0..n'], claim: 'count(s in subsets(n, k)) == binomial(n, k)' }));
    expect(r.outcome).toBe('holds');
    expect(r.checked.map((p) => [p.size.n, p.cases])).toEqual([1, 2, 3, 4, 5].map((n) => [n, n + 1]));
    const f = check(doc({ for: ['n: 1..5', 'k: 0..n'], claim: 'k < n - 1 or k == n or n < 3' }));
    expect(f.counterexample!.bindings).toEqual({ n: 3, k: 2 });
  });

  it('a family binding may use a range binding that depends on the size', () => {
    // C(n, k) k-subsets of 1..n, summed over k = 2^n (OEIS A000079)
    const r = check(doc({ for: ['n: 1..5', 'k: 0..n', 's: subsets(n, k)'], claim: 'len(s) == k' }));
    expect(r.checked.map((p) => p.cases)).toEqual([2, 4, 8, 16, 32]);
  });
});

describe('bindings without a size', () => {
  it('a family with constant arguments and no range binding is one piece with an empty size', () => {
    // S_4 has 3 + 1 permutations with at least 5 inversions (OEIS A008302)
    const r = check(doc({ for: ['w: permutations(4)'], claim: 'inv(w) < 5' }));
    expect(r.checked.map((p) => [p.size, p.cases, p.failures])).toEqual([[{}, 24, 4]]);
    expect(r.counterexample!.bindings).toEqual({ w: perm([3, 4, 2, 1]) });
    expect(r.counterexample!.size).toEqual({});
  });

  it('a constant binding (n: 3) is a one-value range and the size', () => {
    const r = check(doc({ for: ['n: 3', 'w: permutations(n)'], claim: 'inv(w) < 3' }));
    expect(r.checked.map((p) => [p.size, p.cases])).toEqual([[{ n: 3 }, 6]]);
    expect(r.counterexample!.bindings).toEqual({ n: 3, w: perm([3, 2, 1]) });
  });

  it('a list binding is enumerated in list order and compared by value', () => {
    const r = check(doc({ for: ['n: 1..4', `p: '["21", "12"]'`, 'w: permutations(n)'], claim: 'avoids(w, p) or n < 3' }));
    // n = 3: with p = "21" the 5 permutations other than 123 fail, with p = "12" the 5 other than
    // 321; "12" < "21", so the simplest failure has p = "12" and then w = 123.
    expect(r.counterexample!.failuresAtSize).toBe(10);
    expect(r.counterexample!.bindings).toEqual({ n: 3, p: '12', w: perm([1, 2, 3]) });
  });
});

describe('options', () => {
  const maj = doc({ for: ['n: 1..8', 'w: permutations(n)'], claim: 'maj(w) <= inv(w)' });

  it('sizes replaces the exhaustive range of the size', () => {
    const r = check(doc({ for: ['n: 1..8', 'w: permutations(n)'], claim: 'inv(w) >= 0' }), { sizes: new Map([['n', [3, 4]]]) });
    expect(r.checked.map((p) => [p.size.n, p.cases])).toEqual([
      [3, 6],
      [4, 24],
    ]);
  });

  it('sizes replaces the range of another range binding', () => {
    const r = check(doc({ for: ['n: 1..3', 'k: 0..n'], claim: 'k >= 0' }), { sizes: new Map([['k', [1, 2]]]) });
    expect(r.checked.map((p) => [p.size.n, p.cases])).toEqual([
      [1, 2],
      [2, 2],
      [3, 2],
    ]);
  });

  it('exhaustive: false skips the phase', () => {
    const r = check(maj, { exhaustive: false });
    expect(r.checked).toEqual([]);
    expect(r.outcome).toBe('holds');
  });

  it('a regression case is tried first, reported as such, and shrunk when a simpler case still fails', async () => {
    const { decodeValue } = await import('../../src/values/decode.js');
    const r = check(maj, { regression: [4, decodeValue({ permutation: [2, 1, 4, 3] })] });
    expect(r.outcome).toBe('fails');
    expect(r.counterexample!.phase).toBe('regression');
    // 2143 (maj 4 > inv 2) shrinks to 132, the smallest case with maj > inv.
    expect(r.counterexample!.bindings).toEqual({ n: 3, w: perm([1, 3, 2]) });
    expect(r.counterexample!.shrinkSteps).toBeGreaterThan(0);
    expect(r.checked).toEqual([]); // nothing else had to run
  });

  it('a regression case that no longer fails (or no longer evaluates) lets the check run as usual', async () => {
    const { decodeValue } = await import('../../src/values/decode.js');
    const r = check(maj, { regression: [3, decodeValue({ permutation: [1, 2, 3] })] });
    expect(r.counterexample!.phase).toBe('exhaustive');
    expect(r.counterexample!.bindings).toEqual({ n: 3, w: perm([1, 3, 2]) });
    const r2 = check(doc({ for: ['n: 1..4', 'w: permutations(n)'], claim: 'w[3] > 0' }), {
      regression: [2, decodeValue({ permutation: [2, 1] })],
    });
    expect(r2.outcome).toBe('error'); // the normal run then meets the error at n = 1
  });

  // A hand-edited or mailed counterexample file whose case is not a case of the conjecture (here
  // w = 321 with n = 2) is not a counterexample: tryRegression checks membership and ranges first.
  it('a regression case whose object is not a member of its family is not a counterexample', async () => {
    const { decodeValue } = await import('../../src/values/decode.js');
    const r = check(doc({ for: ['n: 1..4', 'w: permutations(n)'], claim: 'len(w) == n' }), {
      regression: [2, decodeValue({ permutation: [3, 2, 1] })],
    });
    expect(r.counterexample).toBeNull();
    expect(r.outcome).toBe('holds');
  });
});

describe('budgets', () => {
  // The budget runs out once size 8 has begun (after size 7 was announced through onPiece): the
  // stop must then come in the middle of size 8 (40,320 cases: a budget has to be able to stop a
  // size part way). A budget that runs out between two sizes stops before the next one begins.
  function budgeted(maxN = 9) {
    const finished: number[] = [];
    let out = false;
    const r = check(
      doc({ for: [`n: 1..${maxN}`, 'w: permutations(n)'], claim: 'inv(w) >= 0' }),
      {},
      {
        shouldStop: () => (out ? 'budget' : null),
        onProgress: (done, _total, label) => {
          if (label.endsWith('n = 8') && done > 0 && finished.includes(7)) out = true;
        },
        onPiece: (p) => {
          finished.push(p.size.n);
        },
      },
    );
    return { r, finished };
  }

  it('a budget stop gives outcome incomplete with the finished pieces and a partial one', () => {
    const { r } = budgeted();
    expect(r.outcome).toBe('incomplete');
    expect(r.stoppedBy).toBe('budget');
    expect(r.counterexample).toBeNull();
    const done = r.checked.filter((p) => !p.partial);
    expect(done.map((p) => [p.size.n, p.cases])).toEqual([1, 2, 6, 24, 120, 720, 5040].map((c, i) => [i + 1, c]));
    const partial = r.checked.filter((p) => p.partial);
    expect(partial.map((p) => p.size.n)).toEqual([8]);
    expect(partial[0].cases).toBeGreaterThan(0);
    expect(partial[0].cases).toBeLessThan(40320);
    expect(r.checked.some((p) => p.size.n === 9)).toBe(false);
  });

  it('finished pieces are announced through onPiece, the partial one is not', () => {
    expect(budgeted().finished).toEqual([1, 2, 3, 4, 5, 6, 7]);
  });

  it('an interrupt during the sample phase is incomplete too', () => {
    // Stop a few polls into the sample phase (polls are frequent at first, so count them only
    // once the three exhaustive sizes are finished).
    let polls = 0;
    let exhaustiveDone = 0;
    const r = check(
      doc({ for: ['n: 1..3', 'w: permutations(n)'], claim: 'inv(w) >= 0', sample: ['n: 10..12', 'count: 1000'] }),
      {},
      {
        shouldStop: () => (exhaustiveDone >= 3 && ++polls >= 4 ? 'interrupt' : null),
        onPiece: (p) => {
          if (p.phase === 'exhaustive') exhaustiveDone++;
        },
      },
    );
    expect(r.outcome).toBe('incomplete');
    expect(r.stoppedBy).toBe('interrupt');
    const last = r.checked[r.checked.length - 1];
    expect(last.phase).toBe('sample');
    expect(last.partial).toBe(true);
  });
});
