// Lists and sequences (src/library/lists.ts).

import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import '../../src/library/lists.js';
import '../../src/library/numbers.js';
import '../../src/library/permutations.js';
import { Permutation } from '../../src/families/permutations/permutation.js';
import { Word } from '../../src/families/words/word.js';
import { Composition } from '../../src/families/compositions/composition.js';
import { Partition } from '../../src/families/partitions/partition.js';
import { DyckPath } from '../../src/families/dyckPaths/dyckPath.js';
import { Subset } from '../../src/families/subsets/subset.js';
import { Matching } from '../../src/families/matchings/matching.js';
import { Tableau } from '../../src/families/tableaux/tableau.js';
import { Lambda } from '../../src/values/lambda.js';
import { makeRat, type Scalar } from '../../src/numbers/rational.js';
import { scmp } from '../../src/numbers/scalar.js';
import { normBig } from '../../src/numbers/integer.js';
import { valueEquals } from '../../src/values/operations.js';
import { allPerms, call, distribution, perm } from './permutations/helpers.js';

const scalarArb: fc.Arbitrary<Scalar> = fc.oneof(
  fc.integer({ min: -20, max: 20 }),
  fc.tuple(fc.bigInt({ min: -(10n ** 20n), max: 10n ** 20n }), fc.bigInt({ min: 1n, max: 50n })).map(([p, q]) => makeRat(p, q)),
);
const scalarList = fc.array(scalarArb, { maxLength: 12 });

describe('len', () => {
  it('measures every kind with an obvious length, the range of its indexing', () => {
    expect(call('len', [1, 2, 3])).toBe(3);
    expect(call('len', [])).toBe(0);
    expect(call('len', '1342')).toBe(4);
    expect(call('len', 'é€𝔄')).toBe(3); // code points, not UTF-16 units
    expect(call('len', perm([3, 1, 2]))).toBe(3);
    expect(call('len', Word.from([1, 1, 2, 3]))).toBe(4);
    expect(call('len', Composition.from([2, 1, 3]))).toBe(3);
    expect(call('len', Partition.from([3, 1]))).toBe(2);
    expect(call('len', DyckPath.from('UUDD'))).toBe(4);
    expect(call('len', Subset.from([1, 4, 5]))).toBe(3);
  });
  it('fails clearly where the length is ambiguous or meaningless', () => {
    expect(() => call('len', Matching.fromArcs([[1, 2]]))).toThrow(/len\(x\) is not defined for a matching: use len\(arcs\(m\)\)/);
    expect(call('len', Tableau.from([[1, 2], [3]]))).toBe(2); // its rows, what T[i] runs over
    expect(() => call('len', 5)).toThrow(/not defined for an integer; it takes a list, a string, a permutation/);
    expect(() => call('len', true)).toThrow(/not defined for a boolean/);
  });
});

describe('reverse, sort, map', () => {
  it('reverse of lists and strings is an involution; of a permutation it is w * w0, with inv = C(n,2) - inv(w)', () => {
    fc.assert(fc.property(fc.array(fc.integer()), (L) => valueEquals(call('reverse', call('reverse', L)), L)));
    expect(call('reverse', 'abc')).toBe('cba');
    expect(call('reverse', [])).toEqual([]);
    for (const a of allPerms(5)) {
      const r = call('reverse', perm(a)) as Permutation;
      expect(r.a).toEqual([...a].reverse());
      expect(call('inv', r)).toBe(10 - (call('inv', perm(a)) as number));
    }
    const L = [1, 2];
    call('reverse', L);
    expect(L).toEqual([1, 2]); // the argument is not changed
  });
  it('sort orders numbers by exact value and keeps every entry (fast-check)', () => {
    fc.assert(
      fc.property(scalarList, (L) => {
        const s = call('sort', L) as Scalar[];
        expect(s.length).toBe(L.length);
        for (let i = 1; i < s.length; i++) expect(scmp(s[i - 1], s[i]) <= 0).toBe(true);
        const key = (xs: Scalar[]) => xs.map(String).sort().join();
        expect(key(s)).toBe(key(L));
      }),
    );
    expect(call('sort', [normBig(10n ** 20n), -3, makeRat(1n, 2n), 0])).toEqual([-3, 0, makeRat(1n, 2n), 10n ** 20n]);
  });
  it('sort orders lists and permutations lexicographically', () => {
    expect(
      call('sort', [
        [2, 1],
        [1, 3],
        [1, 2, 0],
      ]),
    ).toEqual([
      [1, 2, 0],
      [1, 3],
      [2, 1],
    ]);
    const sorted = call('sort', allPerms(3).reverse().map(perm)) as Permutation[];
    expect(sorted.map((w) => w.a.join(''))).toEqual(['123', '132', '213', '231', '312', '321']);
  });
  it('map applies a one-argument function to every entry', () => {
    const square = new Lambda(1, ([x]) => (x as number) * (x as number), 'x -> x^2');
    expect(call('map', [1, 2, 3], square)).toEqual([1, 4, 9]);
    expect(call('map', [], square)).toEqual([]);
    const two = new Lambda(2, () => 0, '(a, b) -> 0');
    expect(() => call('map', [1], two)).toThrow(/takes 2 arguments, got 1/);
  });
});

describe('first, last, take, drop', () => {
  it('take(L, k) followed by drop(L, k) is L, and they clamp at the length (fast-check)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer()), fc.nat(20), (L, k) => {
        const t = call('take', L, k) as number[],
          d = call('drop', L, k) as number[];
        expect([...t, ...d]).toEqual(L);
        expect(t.length).toBe(Math.min(k, L.length));
        if (L.length) {
          expect(call('first', L)).toBe(L[0]);
          expect(call('last', L)).toBe(L[L.length - 1]);
        }
      }),
    );
  });
  it('fail clearly on the empty list and on negative k', () => {
    expect(() => call('first', [])).toThrow(/first\(L\) of the empty list/);
    expect(() => call('last', [])).toThrow(/last\(L\) of the empty list/);
    expect(() => call('take', [1], -1)).toThrow(/take\(L, k\) needs k >= 0, got k = -1/);
    expect(() => call('drop', [1], -1)).toThrow(/drop\(L, k\) needs k >= 0/);
  });
});

/** Unimodality by the signs of the differences: no rise after a fall (a second algorithm). */
function unimodalBySigns(L: Scalar[]): boolean {
  let fell = false;
  for (let i = 1; i < L.length; i++) {
    const c = scmp(L[i - 1], L[i]);
    if (c > 0) fell = true;
    if (c < 0 && fell) return false;
  }
  return true;
}

describe('isUnimodal, isLogConcave, isPalindromic', () => {
  it('unimodality agrees with the sign-change criterion (fast-check), plateaus allowed', () => {
    fc.assert(fc.property(scalarList, (L) => call('isUnimodal', L) === unimodalBySigns(L)));
    expect(call('isUnimodal', [1, 3, 3, 2])).toBe(true);
    expect(call('isUnimodal', [2, 1, 1, 2])).toBe(false);
    expect(call('isUnimodal', [])).toBe(true);
    expect(call('isUnimodal', [5])).toBe(true);
  });
  it('log-concavity is the inequality a_i^2 >= a_(i-1) a_(i+1), exactly, also for rationals', () => {
    expect(call('isLogConcave', [1, 2, 3])).toBe(true); // 4 >= 3
    expect(call('isLogConcave', [1, 1, 2])).toBe(false); // 1 < 2
    expect(call('isLogConcave', [1, 0, 0, 1])).toBe(true); // internal zeros are not excluded (documented)
    expect(call('isLogConcave', [makeRat(1n, 3n), makeRat(1n, 2n), makeRat(3n, 4n)])).toBe(true); // 1/4 >= 1/4
    expect(call('isLogConcave', [makeRat(1n, 3n), makeRat(1n, 2n), makeRat(4n, 5n)])).toBe(false); // 1/4 < 4/15
  });
  it("rows of Pascal's triangle (OEIS A007318) and the Eulerian and Mahonian distributions are log-concave and unimodal", () => {
    // Stanley, Log-concave and unimodal sequences (1989): binomial rows (Newton's inequalities), the
    // Eulerian rows (their polynomials are real-rooted, Frobenius), and the Mahonian rows (a product
    // of the polynomials [k]_q, whose coefficient sequences are log-concave without internal zeros).
    for (let n = 0; n <= 30; n++) {
      const row = Array.from({ length: n + 1 }, (_, k) => call('binomial', n, k) as Scalar);
      expect(call('isLogConcave', row) && call('isUnimodal', row) && call('isPalindromic', row)).toBe(true);
    }
    for (let n = 1; n <= 7; n++) {
      const S = allPerms(n).map(perm);
      for (const s of ['des', 'inv']) {
        const d = distribution(S, (w) => call(s, w) as number);
        expect([s, call('isLogConcave', d), call('isUnimodal', d), call('isPalindromic', d)]).toEqual([s, true, true, true]);
      }
    }
  });
  it('reject lists with entries that are not numbers, naming the entry', () => {
    expect(() => call('isUnimodal', [1, 'a'])).toThrow(/isUnimodal\(L\) needs a list of numbers, but entry 2 is "a"/);
    expect(() => call('isLogConcave', [[1]])).toThrow(/entry 1 is \[1\]/);
  });
  it('palindromic means equal to its reverse, for any entries and for strings', () => {
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: 0, max: 2 }), { maxLength: 6 }),
        (L) => call('isPalindromic', L) === (L.join() === [...L].reverse().join()),
      ),
    );
    expect(call('isPalindromic', [1, makeRat(2n, 3n), 1])).toBe(true);
    expect(call('isPalindromic', [1, 'a', 1])).toBe(true);
    expect(call('isPalindromic', [1, 'a', 'b'])).toBe(false);
    expect(call('isPalindromic', 'abba')).toBe(true);
    expect(call('isPalindromic', [perm([1, 2]), 3, perm([1, 2])])).toBe(true);
  });
});
