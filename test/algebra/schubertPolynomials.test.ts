// Schubert, double Schubert and Grothendieck polynomials (src/algebra/schubertPolynomials.ts)
// against the pipe dream expansions (test/algebra/pipeDreamExpansion.ts) and published tables.

import { describe, expect, it } from 'vitest';
import {
  clearSchubertMemo,
  doubleSchubertPolynomial,
  grothendieckPolynomial,
  schubertPolynomial,
} from '../../src/algebra/schubertPolynomials.js';
import { dividedDifference } from '../../src/algebra/divided.js';
import { fromTerms, pequals, polyText, type PolyLike, Polynomial } from '../../src/algebra/polynomial.js';
import { substitute } from '../../src/algebra/polynomialOps.js';
import { indexedVarId } from '../../src/algebra/variables.js';
import {
  doubleSchubertByPipeDreams,
  grothendieckByPipeDreams,
  inversions,
  pipeDreamsIn,
  sameArray,
  schubertByPipeDreams,
  type Expansion,
} from './pipeDreamExpansion.js';

function permutationsOf(n: number): number[][] {
  if (n === 0) return [[]];
  const out: number[][] = [];
  for (const p of permutationsOf(n - 1)) for (let k = 0; k <= p.length; k++) out.push([...p.slice(0, k), n, ...p.slice(k)]);
  return out;
}

/** A library polynomial as an expansion keyed like pipeDreamExpansion (x[1..n-1] exponents). */
function asExpansion(p: PolyLike, nx: number, ny = 0): Expansion {
  const ids = Array.from({ length: nx }, (_, i) => indexedVarId('x', i + 1));
  const yids = Array.from({ length: ny }, (_, i) => indexedVarId('y', i + 1));
  const m: Expansion = new Map();
  if (!(p instanceof Polynomial)) {
    if (p !== 0)
      m.set(
        ny ? `${new Array(nx).fill(0).join(',')}|${new Array(ny).fill(0).join(',')}` : new Array(nx).fill(0).join(','),
        BigInt(p as number),
      );
    return m;
  }
  for (let t = 0; t < p.length; t++) {
    const ex = ids.map((id) => {
      const v = p.vars.indexOf(id);
      return v < 0 ? 0 : p.exps[t * p.nv + v];
    });
    const ey = yids.map((id) => {
      const v = p.vars.indexOf(id);
      return v < 0 ? 0 : p.exps[t * p.nv + v];
    });
    m.set(ny ? `${ex.join(',')}|${ey.join(',')}` : ex.join(','), BigInt(p.coefs[t] as number));
  }
  return m;
}

const sortedEntries = (m: Expansion | undefined) => [...(m ?? new Map()).entries()].sort();

describe('Schubert polynomials', () => {
  it('match the table of S_3 and S_4 (I. G. Macdonald, Notes on Schubert Polynomials, 1991, table after ch. IV; values also re-derived by pipe dreams below)', () => {
    const table: [number[], string][] = [
      [[1, 2, 3], '1'],
      [[2, 1, 3], 'x[1]'],
      [[1, 3, 2], 'x[1] + x[2]'],
      [[2, 3, 1], 'x[1]*x[2]'],
      [[3, 1, 2], 'x[1]^2'],
      [[3, 2, 1], 'x[1]^2*x[2]'],
      [[1, 2, 4, 3], 'x[1] + x[2] + x[3]'],
      [[1, 4, 2, 3], 'x[1]^2 + x[1]*x[2] + x[2]^2'],
      [[2, 1, 4, 3], 'x[1]^2 + x[1]*x[2] + x[1]*x[3]'],
      [[1, 3, 4, 2], 'x[1]*x[2] + x[1]*x[3] + x[2]*x[3]'],
      [[1, 4, 3, 2], 'x[1]^2*x[2] + x[1]^2*x[3] + x[1]*x[2]^2 + x[1]*x[2]*x[3] + x[2]^2*x[3]'],
      [[3, 1, 4, 2], 'x[1]^2*x[2] + x[1]^2*x[3]'],
      [[2, 4, 1, 3], 'x[1]^2*x[2] + x[1]*x[2]^2'],
      [[4, 3, 2, 1], 'x[1]^3*x[2]^2*x[3]'],
    ];
    for (const [w, s] of table) expect(polyText(schubertPolynomial(w, 'x'))).toBe(s);
  });

  it('agree with the pipe dream expansion for every w in S_1 .. S_5 (Billey–Jockusch–Stanley; Bergeron–Billey)', () => {
    for (let n = 1; n <= 5; n++) {
      const byPipes = schubertByPipeDreams(n);
      for (const w of permutationsOf(n)) {
        expect(sortedEntries(asExpansion(schubertPolynomial(w, 'x'), n - 1))).toEqual(sortedEntries(byPipes.get(w.join(','))));
      }
    }
  });

  it('the traced pipes and the reading word give the same permutation for reduced pipe dreams (consistency of the second algorithm)', () => {
    for (const { cells, traced, demazure } of pipeDreamsIn(5))
      if (cells.length === inversions(traced)) expect(sameArray(traced, demazure)).toBe(true);
  });

  it('S_w(1, ..., 1) counts reduced pipe dreams; S_{w0}(1) = 1 and S_{1432}(1) = 5', () => {
    const byPipes = schubertByPipeDreams(5);
    const ones = new Map(Array.from({ length: 4 }, (_, i) => [indexedVarId('x', i + 1), 1 as PolyLike]));
    for (const w of permutationsOf(5)) {
      let count = 0n;
      for (const c of byPipes.get(w.join(','))!.values()) count += c;
      expect(BigInt(substitute(schubertPolynomial(w, 'x'), ones) as number)).toBe(count);
    }
    expect(substitute(schubertPolynomial([5, 4, 3, 2, 1], 'x'), ones)).toBe(1);
    expect(substitute(schubertPolynomial([1, 4, 3, 2], 'x'), ones)).toBe(5);
  });

  it('exactly five w in S_5 have a coefficient > 1: 12543, 13254, 13524, 13542, 21543 (A. Fink, K. Mészáros, A. St. Dizier, Zero-one Schubert polynomials, Math. Z. 297 (2021); and by brute force over pipe dreams)', () => {
    const byPipes = schubertByPipeDreams(5);
    const viaLibrary = permutationsOf(5)
      .filter((w) => {
        const p = schubertPolynomial(w, 'x');
        return p instanceof Polynomial && p.coefs.some((c) => (c as number) > 1);
      })
      .map((w) => w.join(''))
      .sort();
    const viaPipes = [...byPipes.entries()]
      .filter(([, m]) => [...m.values()].some((c) => c > 1n))
      .map(([k]) => k.replace(/,/g, ''))
      .sort();
    expect(viaLibrary).toEqual(viaPipes);
    expect(viaLibrary).toEqual(['12543', '13254', '13524', '13542', '21543']);
    // S_3 and S_4 have only 0/1 coefficients.
    for (const n of [3, 4])
      for (const w of permutationsOf(n)) {
        const p = schubertPolynomial(w, 'x');
        if (p instanceof Polynomial) expect(p.coefs.every((c) => c === 1)).toBe(true);
      }
  });

  it('are stable: computed from w0 of S_5 without trimming, S_{w×1} equals S_w for w in S_4', () => {
    // Climb down from x1^4 x2^3 x3^2 x4 along reduced words by hand, independent of the memo.
    const x = (i: number) => indexedVarId('x', i);
    const top = fromTerms([x(1), x(2), x(3), x(4)], [[[4, 3, 2, 1], 1]]);
    const seen = new Map<string, PolyLike>([['5,4,3,2,1', top]]);
    const queue: number[][] = [[5, 4, 3, 2, 1]];
    while (queue.length) {
      const w = queue.shift()!;
      for (let i = 1; i < 5; i++)
        if (w[i - 1] > w[i]) {
          const v = w.slice();
          [v[i - 1], v[i]] = [v[i], v[i - 1]];
          if (!seen.has(v.join(','))) {
            seen.set(v.join(','), dividedDifference(seen.get(w.join(','))!, x(i), x(i + 1)));
            queue.push(v);
          }
        }
    }
    for (const w of permutationsOf(4)) expect(pequals(seen.get([...w, 5].join(','))!, schubertPolynomial(w, 'x'))).toBe(true);
  });

  it('survive clearing the memo (cold and warm results agree)', () => {
    const warm = schubertPolynomial([2, 5, 1, 4, 3], 'x');
    clearSchubertMemo();
    expect(pequals(schubertPolynomial([2, 5, 1, 4, 3], 'x'), warm)).toBe(true);
    expect(polyText(schubertPolynomial([2, 1], 'z'))).toBe('z[1]');
  });
});

describe('Grothendieck polynomials', () => {
  it('agree with the K-theoretic pipe dream formula for every w in S_1 .. S_5', () => {
    for (let n = 1; n <= 5; n++) {
      const byPipes = grothendieckByPipeDreams(n);
      for (const w of permutationsOf(n))
        expect(sortedEntries(asExpansion(grothendieckPolynomial(w, 'x'), n - 1))).toEqual(sortedEntries(byPipes.get(w.join(','))));
    }
  });
  it('have the Schubert polynomial as lowest-degree part', () => {
    for (const w of permutationsOf(5)) {
      const g = grothendieckPolynomial(w, 'x'),
        s = schubertPolynomial(w, 'x');
      if (!(g instanceof Polynomial)) {
        expect(g).toBe(s);
        continue;
      }
      const low = g.termDegree(g.length - 1);
      const lowTerms = [...asExpansion(g, 4).entries()].filter(([k]) => k.split(',').reduce((a, b) => a + +b, 0) === low);
      expect(lowTerms.sort()).toEqual(sortedEntries(asExpansion(s, 4)));
    }
  });
  it('example: G_{132} = x[1] + x[2] - x[1]*x[2]', () => {
    expect(polyText(grothendieckPolynomial([1, 3, 2], 'x'))).toBe('-x[1]*x[2] + x[1] + x[2]');
  });
});

describe('double Schubert polynomials', () => {
  it('agree with the pipe dream formula prod (x_i - y_j) for every w in S_1 .. S_4', () => {
    for (let n = 1; n <= 4; n++) {
      const byPipes = doubleSchubertByPipeDreams(n);
      for (const w of permutationsOf(n))
        expect(sortedEntries(asExpansion(doubleSchubertPolynomial(w, 'x', 'y'), n, n))).toEqual(sortedEntries(byPipes.get(w.join(','))));
    }
  });
  it('S_w(x; 0) = S_w(x), and S_w(x; x) = 0 unless w = id (Macdonald, Notes, (6.5))', () => {
    for (const w of permutationsOf(4)) {
      const d = doubleSchubertPolynomial(w, 'x', 'y');
      const zero = new Map(Array.from({ length: 4 }, (_, j) => [indexedVarId('y', j + 1), 0 as PolyLike]));
      expect(pequals(substitute(d, zero), schubertPolynomial(w, 'x'))).toBe(true);
      const diag = new Map(
        Array.from({ length: 4 }, (_, j) => [indexedVarId('y', j + 1), fromTerms([indexedVarId('x', j + 1)], [[[1], 1]])]),
      );
      expect(substitute(d, diag)).toBe(w.every((v, i) => v === i + 1) ? 1 : 0);
    }
  });
});
