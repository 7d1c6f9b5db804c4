// Charge and the Kostka–Foulkes polynomials (src/library/charge.ts): the tables of Macdonald,
// Symmetric Functions and Hall Polynomials, III.6, for n = 3, 4 (transcribed from memory, and
// checked by the independent algorithm below), and for every pair of partitions of n <= 6 against
// Lusztig's t-analogue of Kostant's weight multiplicity formula (Macdonald III.6, Example 4):
//   K_{lambda mu}(t) = sum over w in S_l of sign(w) P_t(w(lambda + rho) - (mu + rho)),
// where P_t(g) = sum over the ways of writing g as a sum of positive roots e_i - e_j of t^(number
// of roots), computed here by a plain recursion over the roots.

import { describe, expect, it } from 'vitest';
import '../../src/library/charge.js';
import { charge, kostkaFoulkesCoefficients, nOf } from '../../src/library/words/charge.js';
import { kostkaNumber } from '../../src/library/kostka.js';
import { partitions } from '../../src/families/partitions/partitions.js';
import { hookLengths } from '../../src/families/tableaux/shapes.js';
import { conjugateParts } from '../../src/families/partitions/partition.js';
import { qfactorialCoefficients } from '../../src/library/qanalogs.js';
import { listAll } from '../families/partitions/uniformity.js';
import { getFunction } from '../../src/library/registry.js';
import { Word } from '../../src/families/words/word.js';
import { Tableau } from '../../src/families/tableaux/tableau.js';

const parts = (n: number) => listAll(partitions, { n }).map((l) => l.parts);
const trim = (c: number[]) => {
  const out = c.slice();
  while (out.length && out[out.length - 1] === 0) out.pop();
  return out;
};
const add = (a: number[], b: number[], s = 1) => {
  const out = a.slice();
  b.forEach((v, i) => (out[i] = (out[i] ?? 0) + s * v));
  return out;
};
const times = (a: number[], b: number[]) => {
  const out = new Array(Math.max(0, a.length + b.length - 1)).fill(0);
  a.forEach((x, i) => b.forEach((y, j) => (out[i + j] += x * y)));
  return out;
};

/** P_t(g): coefficients in t. Roots (i, j), i < j, in lexicographic order; coordinate i must be used up by its roots. */
function kostantT(g: number[]): number[] {
  const l = g.length;
  const roots: [number, number][] = [];
  for (let i = 0; i < l; i++) for (let j = i + 1; j < l; j++) roots.push([i, j]);
  const memo = new Map<string, number[]>();
  const go = (r: number, v: number[]): number[] => {
    if (r === roots.length) return v.every((x) => x === 0) ? [1] : [];
    const key = r + ':' + v.join(',');
    const hit = memo.get(key);
    if (hit) return hit;
    const [i, j] = roots[r];
    const last = j === l - 1; // the last root starting at i
    let out: number[] = [];
    if (v[i] >= 0) {
      for (let k = last ? v[i] : 0; k <= v[i]; k++) {
        const w = v.slice();
        w[i] -= k;
        w[j] += k;
        const sub = go(r + 1, w);
        if (sub.length) out = add(out, [...new Array(k).fill(0), ...sub]);
      }
    }
    memo.set(key, out);
    return out;
  };
  if (l === 1) return g[0] === 0 ? [1] : [];
  return go(0, g);
}

function permutationsOf(l: number): number[][] {
  if (l === 0) return [[]];
  const out: number[][] = [];
  for (const p of permutationsOf(l - 1)) for (let k = 0; k <= p.length; k++) out.push([...p.slice(0, k), l - 1, ...p.slice(k)]);
  return out;
}
const signOf = (p: number[]) => {
  let s = 1;
  for (let i = 0; i < p.length; i++) for (let j = i + 1; j < p.length; j++) if (p[i] > p[j]) s = -s;
  return s;
};

function lusztig(lambda: number[], mu: number[]): number[] {
  const l = mu.length;
  if (lambda.length > l) return [];
  const lam = [...lambda, ...new Array(l - lambda.length).fill(0)];
  const lr = lam.map((x, i) => x + l - 1 - i),
    mr = mu.map((x, i) => x + l - 1 - i);
  let total: number[] = [];
  for (const w of permutationsOf(l)) {
    const g = w.map((wi, i) => lr[wi] - mr[i]);
    const p = kostantT(g);
    if (p.length) total = add(total, p, signOf(w));
  }
  return trim(total);
}

describe('Kostka–Foulkes polynomials', () => {
  it('Macdonald III.6 tables, n = 3 and 4 (from memory; checked against the formula of Lusztig below)', () => {
    const K = (l: number[], m: number[]) => kostkaFoulkesCoefficients(l, m);
    expect(K([3], [1, 1, 1])).toEqual([0, 0, 0, 1]);
    expect(K([2, 1], [1, 1, 1])).toEqual([0, 1, 1]);
    expect(K([1, 1, 1], [1, 1, 1])).toEqual([1]);
    expect(K([3], [2, 1])).toEqual([0, 1]);
    expect(K([4], [1, 1, 1, 1])).toEqual([0, 0, 0, 0, 0, 0, 1]);
    expect(K([3, 1], [1, 1, 1, 1])).toEqual([0, 0, 0, 1, 1, 1]);
    expect(K([2, 2], [1, 1, 1, 1])).toEqual([0, 0, 1, 0, 1]);
    expect(K([2, 1, 1], [1, 1, 1, 1])).toEqual([0, 1, 1, 1]);
    expect(K([4], [2, 1, 1])).toEqual([0, 0, 0, 1]);
    expect(K([3, 1], [2, 1, 1])).toEqual([0, 1, 1]);
    expect(K([2, 2], [2, 1, 1])).toEqual([0, 1]);
    expect(K([4], [2, 2])).toEqual([0, 0, 1]);
    expect(K([3, 1], [2, 2])).toEqual([0, 1]);
    expect(K([4], [3, 1])).toEqual([0, 1]);
  });

  it("equal the t-analogue of Kostant's formula (Lusztig) for all lambda, mu of n <= 6", () => {
    for (let n = 1; n <= 6; n++)
      for (const l of parts(n))
        for (const m of parts(n)) expect(trim(kostkaFoulkesCoefficients(l, m)), `K_${l},${m}`).toEqual(lusztig(l, m));
  });

  it('at t = 1 are the Kostka numbers; K_{lambda lambda} = 1; degree n(mu) - n(lambda) when lambda >= mu (Macdonald III.6 (6.5))', () => {
    for (let n = 1; n <= 7; n++)
      for (const l of parts(n))
        for (const m of parts(n)) {
          const c = kostkaFoulkesCoefficients(l, m);
          expect(BigInt(c.reduce((a, b) => a + b, 0))).toBe(kostkaNumber(l, m));
          if (c.length) {
            expect(c.length - 1).toBe(nOf(m) - nOf(l));
            expect(c[c.length - 1]).toBe(1);
          }
        }
  });

  it("K_{lambda, 1^n}(t) = t^n(lambda') [n]_t! / prod of [h]_t over the hooks (Macdonald III.6 Example 2), n <= 7", () => {
    for (let n = 1; n <= 7; n++)
      for (const l of parts(n)) {
        let rhs = [...new Array(nOf(conjugateParts(l))).fill(0), ...qfactorialCoefficients(n).map(Number)];
        const lhs = kostkaFoulkesCoefficients(l, new Array(n).fill(1));
        // lhs * prod [h]_t == rhs
        let prod = lhs;
        for (const h of hookLengths(l).flat()) prod = times(prod, new Array(h).fill(1));
        expect(trim(prod)).toEqual(trim(rhs));
        rhs = [];
      }
  });
});

describe('charge and cocharge', () => {
  const call = (name: string, ...a: unknown[]) => getFunction(name)!.impl(...(a as never[]));
  it('on standard words: 1 has index 0, r+1 one more when it stands right of r', () => {
    expect(charge([1, 2, 3])).toBe(3);
    expect(charge([3, 2, 1])).toBe(0);
    expect(charge([3, 1, 2])).toBe(2);
    expect(charge([2, 1, 3])).toBe(1);
  });
  it('a word with repeated letters splits into standard subwords (worked by hand: 2112 -> 2.1 and 1..2)', () => {
    expect(charge([2, 1, 1, 2])).toBe(1);
    expect(call('cocharge', new Word([2, 1, 1, 2]))).toBe(1); // n((2, 2)) = 2
  });
  it('of a tableau is that of its reading word; cocharge = n(mu) - charge', () => {
    expect(call('charge', Tableau.from([[1, 2], [3]]))).toBe(2);
    expect(call('cocharge', Tableau.from([[1, 2], [3]]))).toBe(1);
  });
  it('refuses a word whose content is not a partition', () => {
    expect(() => call('charge', new Word([1, 2, 2]))).toThrow(/content is a partition/);
  });
});
