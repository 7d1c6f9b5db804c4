// RSK on matrices and two-line arrays, dual RSK, rectification and Edelman–Greene insertion
// (src/library/insertion.ts), against the Cauchy and dual Cauchy counts, Knuth's symmetry, the
// reading-word characterisation of rectification, and the counts of reduced words.

import { describe, expect, it } from 'vitest';
import '../../src/library/index.js';
import { getFunction } from '../../src/library/registry.js';
import { Matrix } from '../../src/algebra/matrix.js';
import { Tableau } from '../../src/families/tableaux/tableau.js';
import { Partition } from '../../src/families/partitions/partition.js';
import { partitions } from '../../src/families/partitions/partitions.js';
import { reducedWords } from '../../src/families/reducedWords/reducedWords.js';
import { Permutation } from '../../src/families/permutations/permutation.js';
import { kostkaNumber } from '../../src/library/kostka.js';
import { conjugateParts } from '../../src/families/partitions/partition.js';
import { hookLengthCount } from '../../src/families/tableaux/shapes.js';
import { rskRows } from '../../src/library/rsk.js';
import { readingWordOf } from '../../src/families/tableaux/tableauOrder.js';
import { edelmanGreeneInsert, insertTwoLine, rectifyRows, twoLineArrayOf } from '../../src/library/tableaux/insertion.js';
import { allPerms } from './permutations/helpers.js';
import { Word } from '../../src/families/words/word.js';
import type { Value } from '../../src/values/value.js';

const call = (name: string, ...args: Value[]): Value => getFunction(name)!.impl(...args);
const key = (x: unknown) => JSON.stringify(x);

/** All r x c matrices with entries in 0..max. */
function matrices(r: number, c: number, max: number): number[][][] {
  let out: number[][] = [[]];
  for (let k = 0; k < r * c; k++) out = out.flatMap((e) => Array.from({ length: max + 1 }, (_, v) => [...e, v]));
  return out.map((e) => Array.from({ length: r }, (_, i) => e.slice(i * c, (i + 1) * c)));
}
const sums = (M: number[][]) => [M.map((r) => r.reduce((a, b) => a + b, 0)), M[0].map((_, j) => M.reduce((s, r) => s + r[j], 0))];
const contentOf = (rows: number[][], m: number) => {
  const c = new Array(m).fill(0);
  for (const r of rows) for (const v of r) c[v - 1]++;
  return c;
};

describe('RSK on matrices', () => {
  it('is a bijection onto pairs of semistandard tableaux of one shape with the column and row sums as contents (Cauchy identity; Stanley, EC2, Thm 7.11.5), 2x3 and 3x2 with entries <= 2', () => {
    for (const [r, c] of [
      [2, 3],
      [3, 2],
    ]) {
      const seen = new Set<string>();
      for (const M of matrices(r, c, 2)) {
        const { P, Q } = insertTwoLine(twoLineArrayOf(M), false);
        const [rs, cs] = sums(M);
        expect(P.map((x) => x.length)).toEqual(Q.map((x) => x.length));
        expect(contentOf(P, c)).toEqual(cs);
        expect(contentOf(Q, r)).toEqual(rs);
        Tableau.from(P);
        Tableau.from(Q); // both semistandard
        seen.add(key([P, Q]));
      }
      expect(seen.size).toBe(3 ** (r * c));
    }
  });
  it('the number of matrices with row sums alpha and column sums beta is sum over lambda of K(lambda, alpha) K(lambda, beta) (n = 4)', () => {
    const by = new Map<string, number>();
    for (const M of matrices(2, 2, 4)) {
      const [rs, cs] = sums(M);
      if (rs[0] + rs[1] !== 4) continue;
      by.set(key([rs, cs]), (by.get(key([rs, cs])) ?? 0) + 1);
    }
    const lambdas: number[][] = [];
    partitions.enumerate({ n: 4 }, (l) => void lambdas.push(l.parts.slice()));
    for (const [k, count] of by) {
      const [rs, cs] = JSON.parse(k) as number[][];
      const sorted = (a: number[]) => a.filter((x) => x > 0).sort((x, y) => y - x);
      let want = 0n;
      for (const l of lambdas) want += kostkaNumber(l, sorted(rs)) * kostkaNumber(l, sorted(cs));
      expect(BigInt(count), k).toBe(want);
    }
  });
  it('transposing the matrix exchanges P and Q (Knuth; Stanley, EC2, Thm 7.13.1)', () => {
    for (const M of matrices(2, 3, 2)) {
      const MT = M[0].map((_, j) => M.map((r) => r[j]));
      const a = insertTwoLine(twoLineArrayOf(M), false),
        b = insertTwoLine(twoLineArrayOf(MT), false);
      expect(key(b.P)).toBe(key(a.Q));
      expect(key(b.Q)).toBe(key(a.P));
    }
  });
  it('on a permutation matrix agrees with rsk of the permutation; two-line arrays in any order', () => {
    for (const w of allPerms(5)) {
      const M = w.map((v) => Array.from({ length: 5 }, (_, j) => (j + 1 === v ? 1 : 0)));
      const [P, Q] = call('rskArray', Matrix.from(M)) as Tableau[];
      const r = rskRows(w);
      expect(P.rows).toEqual(r.P);
      expect(Q.rows).toEqual(r.Q);
      const shuffled = w.map((v, i) => [i + 1, v]).reverse();
      expect(key(call('rskArray', shuffled))).toBe(key([P, Q]));
    }
  });
});

describe('dual RSK', () => {
  it("is injective on 0/1 matrices and counts sum over lambda of K(lambda, alpha) K(lambda', beta) (dual Cauchy; Stanley, EC2, §7.14), 3x3", () => {
    const seen = new Set<string>();
    const by = new Map<string, number>();
    for (const M of matrices(3, 3, 1)) {
      const [Pt, Q] = call('dualRsk', Matrix.from(M)) as Tableau[];
      expect(conjugateParts(Pt.rows.map((r) => r.length))).toEqual(Q.rows.map((r) => r.length));
      seen.add(key([Pt.rows, Q.rows]));
      const [rs, cs] = sums(M);
      by.set(key([rs, cs]), (by.get(key([rs, cs])) ?? 0) + 1);
    }
    expect(seen.size).toBe(512);
    const sorted = (a: number[]) => a.filter((x) => x > 0).sort((x, y) => y - x);
    for (const [k, count] of by) {
      const [rs, cs] = JSON.parse(k) as number[][];
      const n = rs.reduce((a, b) => a + b, 0);
      if (cs.reduce((a, b) => a + b, 0) !== n) continue;
      let want = 0n;
      partitions.enumerate({ n }, (l) => {
        if (n === 0) return;
        want += kostkaNumber(l.parts, sorted(rs)) * kostkaNumber(conjugateParts(l.parts), sorted(cs));
      });
      if (n === 0) want = 1n;
      expect(BigInt(count), k).toBe(want);
    }
  });
  it('refuses a matrix with an entry 2', () => {
    expect(() => call('dualRsk', Matrix.from([[2]]))).toThrow(/0\/1 matrix/);
  });
});

describe('rectification', () => {
  it('equals the insertion tableau of the reading word (Fulton, Young Tableaux, ch. 2-3), for all fillings of (3,2,1)/(1) and (3,3)/(2,1) with entries <= 3', () => {
    for (const [lambda, mu] of [
      [[3, 2, 1], [1]],
      [
        [3, 3],
        [2, 1],
      ],
      [[2, 2], [1]],
    ] as [number[], number[]][]) {
      const sizes = lambda.map((l, i) => l - (mu[i] ?? 0));
      const cells = sizes.reduce((a, b) => a + b, 0);
      let fillings: number[][] = [[]];
      for (let k = 0; k < cells; k++) fillings = fillings.flatMap((f) => [1, 2, 3].map((v) => [...f, v]));
      let checked = 0;
      for (const f of fillings) {
        const rows: number[][] = [];
        let at = 0;
        for (const s of sizes) {
          rows.push(f.slice(at, at + s));
          at += s;
        }
        let t: Tableau;
        try {
          t = call('rectify', rows, new Partition(mu)) as Tableau;
        } catch {
          continue; // not semistandard
        }
        checked++;
        expect(t.rows).toEqual(rskRows(readingWordOf(rows)).P);
      }
      expect(checked).toBeGreaterThan(5);
    }
  });
  it('the worked example and a refusal', () => {
    expect((call('rectify', [[1], [2]], new Partition([1])) as Tableau).rows).toEqual([[1], [2]]);
    expect(rectifyRows([[2, 3], [1]], [1])).toEqual([[1, 2, 3]]);
    expect(() => call('rectify', [[2, 1]], new Partition([1]))).toThrow(/not a skew semistandard/);
    expect(() => call('rectify', [[2], [1, 1]], new Partition([1]))).toThrow(/not a skew semistandard/); // column 2: 2 above 1
  });
});

describe('Edelman–Greene insertion', () => {
  it('for every reduced word of w in S_5: P has strictly increasing rows and columns, its reading word is a reduced word of w, Q is standard of the same shape, and a -> (P, Q) is injective', () => {
    for (const w of allPerms(5)) {
      const p = Permutation.from(w);
      const seen = new Set<string>();
      reducedWords.enumerate(reducedWords.prepare([p] as never), (r: Word) => {
        const word = r.letters.slice();
        const { P, Q } = edelmanGreeneInsert(word);
        for (const row of P) for (let j = 1; j < row.length; j++) expect(row[j]).toBeGreaterThan(row[j - 1]);
        // the reading word of P applied to the identity gives w
        const u = [1, 2, 3, 4, 5];
        const rw = readingWordOf(P);
        expect(rw.length).toBe(word.length);
        for (const a of rw) [u[a - 1], u[a]] = [u[a], u[a - 1]];
        const v = [1, 2, 3, 4, 5];
        for (const a of word) [v[a - 1], v[a]] = [v[a], v[a - 1]];
        expect(u).toEqual(v);
        expect(Tableau.from(Q).isStandard()).toBe(true);
        expect(Q.map((x) => x.length)).toEqual(P.map((x) => x.length));
        seen.add(key([P, Q]));
      });
      expect(seen.size).toBe(Number(reducedWords.count(reducedWords.prepare([p] as never))));
    }
  });
  it('for w0 of S_n every reduced word inserts to one P, so there are f^(n-1, ..., 1) of them (Edelman and Greene 1987; OEIS A005118), n <= 5', () => {
    for (let n = 2; n <= 5; n++) {
      const w0 = Permutation.from(Array.from({ length: n }, (_, i) => n - i));
      const ps = new Set<string>();
      let count = 0;
      reducedWords.enumerate(reducedWords.prepare([w0] as never), (r: Word) => {
        const word = r.letters.slice();
        ps.add(key(edelmanGreeneInsert(word).P));
        count++;
      });
      expect(ps.size).toBe(1);
      expect(BigInt(count)).toBe(hookLengthCount(Array.from({ length: n - 1 }, (_, i) => n - 1 - i)));
    }
  });
});
