// inverse, longest, simple, reducedWord, permMatrix (src/library/permutations/constructions.ts).

import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import '../../../src/library/permutations.js';
import { Permutation } from '../../../src/families/permutations/permutation.js';
import { determinant, Matrix, matrixProduct } from '../../../src/algebra/matrix.js';
import { EvalError } from '../../../src/base/errors.js';
import { allPerms, call, compose, perm, permArb } from './helpers.js';

const arr = (v: unknown) => (v as Permutation).a;
const id = (n: number) => Array.from({ length: n }, (_, i) => i + 1);
const s = (i: number, n: number) => arr(call('simple', i, n));

describe('inverse', () => {
  it('w * inverse(w) = inverse(w) * w = id, inverse is an involution, and inv(inverse(w)) = inv(w)', () => {
    fc.assert(
      fc.property(permArb(0, 60), (a) => {
        const b = arr(call('inverse', perm(a)));
        expect(compose(a, b)).toEqual(id(a.length));
        expect(compose(b, a)).toEqual(id(a.length));
        expect(arr(call('inverse', perm(b)))).toEqual(a);
        expect(call('inv', perm(b))).toBe(call('inv', perm(a)));
      }),
    );
  });
  it('does not alias or change its argument', () => {
    const w = perm([2, 3, 1]);
    const v = call('inverse', w) as Permutation;
    expect(v.a).toEqual([3, 1, 2]);
    expect(w.a).toEqual([2, 3, 1]);
    expect(v.a).not.toBe(w.a);
  });
});

describe('longest and simple', () => {
  it('longest(n) is n ... 1 with inv = C(n, 2), and the maximum of the Bruhat order', () => {
    for (let n = 0; n <= 6; n++) {
      const w0 = arr(call('longest', n));
      expect(w0).toEqual(id(n).reverse());
      expect(call('inv', perm(w0))).toBe(n < 2 ? 0 : (n * (n - 1)) / 2);
      for (const a of allPerms(n)) expect(call('bruhatLeq', perm(a), perm(w0))).toBe(true);
    }
    expect(() => call('longest', -1)).toThrow(/longest\(n\) needs n >= 0/);
  });
  it('simple(i, n) is the transposition (i, i+1): an involution with one inversion; s_i s_{i+1} s_i = s_{i+1} s_i s_{i+1}', () => {
    for (let n = 2; n <= 6; n++)
      for (let i = 1; i < n; i++) {
        const si = s(i, n);
        expect(call('inv', perm(si))).toBe(1);
        expect(si[i - 1]).toBe(i + 1);
        expect(si[i]).toBe(i);
        expect(compose(si, si)).toEqual(id(n));
        if (i + 1 < n) {
          const t = s(i + 1, n);
          expect(compose(compose(si, t), si)).toEqual(compose(compose(t, si), t));
        }
      }
  });
  it('u * s_i swaps the entries in positions i and i+1 (the convention of FORMAT.md)', () => {
    expect(compose([3, 1, 4, 2], s(2, 4))).toEqual([3, 4, 1, 2]);
  });
  it('simple rejects i outside 1..n-1', () => {
    expect(() => call('simple', 0, 4)).toThrow(/simple\(i, n\) needs i >= 1, got i = 0/);
    expect(() => call('simple', 4, 4)).toThrow(/simple\(i, n\) is limited to i <= 3, got i = 4/);
    expect(() => call('simple', 1, 1)).toThrow(EvalError);
  });
});

/** Every reduced word of a, by recursion on right descents (a second algorithm). */
function allReducedWords(a: number[]): number[][] {
  const out: number[][] = [];
  let any = false;
  for (let i = 1; i < a.length; i++)
    if (a[i - 1] > a[i]) {
      any = true;
      const b = a.slice();
      [b[i - 1], b[i]] = [b[i], b[i - 1]]; // a * s_i has one inversion less
      for (const w of allReducedWords(b)) out.push([...w, i]);
    }
  return any ? out : [[]];
}

const lexLess = (x: number[], y: number[]) => {
  for (let i = 0; i < Math.min(x.length, y.length); i++) if (x[i] !== y[i]) return x[i] < y[i];
  return x.length < y.length;
};

describe('reducedWord', () => {
  it('is a reduced word of w: length inv(w) and s_{a_1} * ... * s_{a_l} = w (random permutations up to n = 40)', () => {
    fc.assert(
      fc.property(permArb(0, 40), (a) => {
        const n = a.length;
        const word = call('reducedWord', perm(a)) as number[];
        expect(word.length).toBe(call('inv', perm(a)));
        let p = id(n);
        for (const i of word) p = compose(p, s(i, n));
        expect(p).toEqual(a);
      }),
    );
  });
  it('is the lexicographically least of all reduced words, on S_1..S_5', () => {
    for (let n = 1; n <= 5; n++)
      for (const a of allPerms(n)) {
        const all = allReducedWords(a);
        const least = all.reduce((m, w) => (lexLess(w, m) ? w : m));
        expect(call('reducedWord', perm(a))).toEqual(least);
      }
  });
  it('the brute force is sound: w0 has 16 reduced words in S_4 and 768 in S_5 (Stanley 1984: SYT of the staircase)', () => {
    expect(allReducedWords([4, 3, 2, 1]).length).toBe(16);
    expect(allReducedWords([5, 4, 3, 2, 1]).length).toBe(768);
  });
  it('examples', () => {
    expect(call('reducedWord', perm([1, 2, 3]))).toEqual([]);
    expect(call('reducedWord', perm([3, 2, 1]))).toEqual([1, 2, 1]);
    expect(call('reducedWord', perm([2, 3, 1]))).toEqual([1, 2]);
  });
});

describe('permMatrix', () => {
  it('has a 1 at row i, column w[i]; its determinant is sign(w); permMatrix(u*v) = permMatrix(v)*permMatrix(u)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 7 }).chain((n) => fc.tuple(permArb(n, n), permArb(n, n))),
        ([u, v]) => {
          const M = (a: number[]) => call('permMatrix', perm(a)) as Matrix;
          const m = M(u),
            n = u.length;
          for (let i = 1; i <= n; i++) for (let j = 1; j <= n; j++) expect(m.at(i, j)).toBe(j === u[i - 1] ? 1 : 0);
          expect(determinant(m)).toBe(call('sign', perm(u)));
          expect(M(compose(u, v)).equals(matrixProduct(M(v), M(u)))).toBe(true);
        },
      ),
      { numRuns: 60 },
    );
  });
});
