// Kostka–Foulkes polynomials, Hall–Littlewood functions and modified Macdonald polynomials.
// Sources: I. G. Macdonald, Symmetric Functions and Hall Polynomials, 2nd ed. (1995), III.2, III.6
// (table of K_{lambda mu}(t) for n <= 4 and Ex. 2), VI.8 (tables of q,t-Kostka polynomials for n <= 4);
// J. Haglund, M. Haiman, N. Loehr, A combinatorial formula for Macdonald polynomials, J. Amer. Math.
// Soc. 18 (2005). Second algorithms: the symmetrisation formula III (2.2) for P in three variables.

import { describe, expect, it } from 'vitest';
import { padd, pdivExact, pequals, pmul, ppow, psub, variable, type PolyLike } from '../../../src/algebra/polynomial.js';
import { renameVariables, substitute } from '../../../src/algebra/polynomialOps.js';
import { bOf, charge, hallLittlewoodPTable, kostkaFoulkes } from '../../../src/algebra/symmetric/hallLittlewood.js';
import { macdonaldHTable } from '../../../src/algebra/symmetric/macdonald.js';
import { conjugate, multiplicities, nOf, partitionsOf } from '../../../src/algebra/symmetric/partitions.js';
import { hallProduct, symMul } from '../../../src/algebra/symmetric/products.js';
import { evalBi, evalUni } from '../../../src/algebra/symmetric/qtTables.js';
import { toPolynomialIn } from '../../../src/algebra/symmetric/specialize.js';
import { symAdd, symScale, TermMap, type SymLike } from '../../../src/algebra/symmetric/symmetricFunction.js';
import { kostka } from '../../../src/algebra/symmetric/tables.js';
import { indexedVarId } from '../../../src/algebra/variables.js';
import { hookLengths } from '../../../src/families/tableaux/shapes.js';
import { valueToText } from '../../../src/values/operations.js';
import { evaluate } from '../../../src/language/expr/index.js';
import { kostkaFoulkesCoefficients } from '../../../src/library/words/charge.js';

const trimZeros = (c: readonly unknown[]) => {
  const a = c.map(Number);
  while (a.length && a[a.length - 1] === 0) a.pop();
  return a;
};
import { e, h, m, s } from './helpers.js';

const t = variable('t'),
  q = variable('q');
const text = (f: SymLike | PolyLike) => valueToText(f);
const sameSym = (a: SymLike, b: SymLike) => expect(text(a)).toBe(text(b));
const P = (lam: number[], tv: PolyLike = t): SymLike => {
  const out = new TermMap();
  for (const [nu, c] of hallLittlewoodPTable(lam)) out.add(nu, evalUni(c, tv));
  return out.result();
};
const H = (mu: number[], qv: PolyLike = q, tv: PolyLike = t): SymLike => {
  const out = new TermMap();
  for (const [nu, c] of macdonaldHTable(mu)) out.add(nu, evalBi(c, qv, tv));
  return out.result();
};
const KF = (l: number[], mu: number[]) => text(evalUni(kostkaFoulkes(l, mu), t));

describe('Kostka–Foulkes polynomials (Macdonald III.6)', () => {
  it('charge of small words', () => {
    expect(charge([1, 2, 3])).toBe(3);
    expect(charge([3, 2, 1])).toBe(0);
    expect(charge([1, 1, 2])).toBe(1);
  });
  it('the table of III.6 for n = 3, 4 (entered by hand)', () => {
    expect(KF([3], [2, 1])).toBe('t');
    expect(KF([3], [1, 1, 1])).toBe('t^3');
    expect(KF([2, 1], [1, 1, 1])).toBe('t^2 + t');
    expect(KF([4], [3, 1])).toBe('t');
    expect(KF([4], [2, 2])).toBe('t^2');
    expect(KF([4], [2, 1, 1])).toBe('t^3');
    expect(KF([4], [1, 1, 1, 1])).toBe('t^6');
    expect(KF([3, 1], [2, 2])).toBe('t');
    expect(KF([3, 1], [2, 1, 1])).toBe('t^2 + t');
    expect(KF([3, 1], [1, 1, 1, 1])).toBe('t^5 + t^4 + t^3');
    expect(KF([2, 2], [2, 1, 1])).toBe('t');
    expect(KF([2, 2], [1, 1, 1, 1])).toBe('t^4 + t^2');
    expect(KF([2, 1, 1], [1, 1, 1, 1])).toBe('t^3 + t^2 + t');
  });
  it("K_{lambda,1^n}(t) = t^n(lambda') prod (1 - t^i) / prod (1 - t^h) (III.6 Ex. 2), n <= 6", () => {
    for (let n = 1; n <= 6; n++)
      for (const lam of partitionsOf(n)) {
        let num: PolyLike = ppow(t, nOf(conjugate(lam)));
        for (let i = 1; i <= n; i++) num = pmul(num, psub(1, ppow(t, i)));
        let den: PolyLike = 1;
        for (const row of hookLengths(lam)) for (const hk of row) den = pmul(den, psub(1, ppow(t, hk)));
        expect(KF(lam as number[], new Array(n).fill(1))).toBe(text(pdivExact(num, den)));
      }
  });
  it('agrees with the word-level implementation of the library (src/library/words/charge.ts), n <= 6', () => {
    for (let n = 1; n <= 6; n++)
      for (const lam of partitionsOf(n))
        for (const mu of partitionsOf(n))
          expect(trimZeros(kostkaFoulkes(lam, mu))).toEqual(trimZeros(kostkaFoulkesCoefficients(lam as number[], mu as number[])));
  });
  it('K_{lambda mu}(1) is the Kostka number and K_{lambda lambda}(t) = 1 (n <= 6)', () => {
    for (let n = 1; n <= 6; n++)
      for (const lam of partitionsOf(n))
        for (const mu of partitionsOf(n)) {
          expect(evalUni(kostkaFoulkes(lam, mu), 1)).toBe(Number(kostka(lam, mu)));
          if (lam.join() === mu.join()) expect(KF(lam as number[], mu as number[])).toBe('1');
        }
  });
});

describe('Hall–Littlewood functions (Macdonald III)', () => {
  it('P(x; 0) = s, P(x; 1) = m, P_(1^n) = e_n (III (2.8)), n <= 6', () => {
    for (let n = 1; n <= 6; n++) {
      for (const lam of partitionsOf(n)) {
        sameSym(P(lam as number[], 0), s(...lam));
        sameSym(P(lam as number[], 1), m(...lam));
      }
      sameSym(P(new Array(n).fill(1)), e(n));
    }
  });
  it('Q_(n) = sum_r (-t)^r e_r h_(n-r) (III (2.9)–(2.10)), n <= 6', () => {
    for (let n = 1; n <= 6; n++) {
      let rhs: SymLike = 0;
      for (let r = 0; r <= n; r++) rhs = symAdd(rhs, symScale(ppow(pmul(-1, t), r), symMul(r ? e(r) : 1, n - r ? h(n - r) : 1)));
      sameSym(symScale(evalUni(bOf([n]), t), P([n])), rhs);
    }
  });
  it('P_lambda(x1, x2, x3; t) by symmetrisation, III (2.2), for |lambda| <= 4', { timeout: 60_000 }, () => {
    const x = [1, 2, 3].map((i) => indexedVarId('x', i));
    const X = x.map((id) => variable(`x[${id === x[0] ? 1 : id === x[1] ? 2 : 3}]`));
    const perms = [
      [0, 1, 2],
      [0, 2, 1],
      [1, 0, 2],
      [1, 2, 0],
      [2, 0, 1],
      [2, 1, 0],
    ];
    const sign = [1, -1, -1, 1, 1, -1];
    let vandermonde: PolyLike = 1,
      kernel: PolyLike = 1;
    for (let i = 0; i < 3; i++)
      for (let j = i + 1; j < 3; j++) {
        vandermonde = pmul(vandermonde, psub(X[i], X[j]));
        kernel = pmul(kernel, psub(X[i], pmul(t, X[j])));
      }
    const vm = (k: number): PolyLike => {
      let v: PolyLike = 1;
      for (let i = 1; i <= k; i++) v = pmul(v, pdivExact(psub(1, ppow(t, i)), psub(1, t)));
      return v;
    };
    for (let n = 1; n <= 4; n++)
      for (const lam of partitionsOf(n)) {
        if (lam.length > 3) continue;
        let mono: PolyLike = 1;
        lam.forEach((k, i) => (mono = pmul(mono, ppow(X[i], k))));
        const f = pmul(mono, kernel);
        let num: PolyLike = 0;
        perms.forEach((w, k) => {
          const ren = new Map(x.map((id, i) => [id, x[w[i]]]));
          num = padd(num, pmul(sign[k], renameVariables(f, ren)));
        });
        let v = vm(3 - lam.length);
        for (const c of multiplicities(lam).values()) v = pmul(v, vm(c));
        const expected = pdivExact(pdivExact(num, vandermonde), v);
        expect(pequals(toPolynomialIn(P(lam as number[]), 'x', 3), expected), `lambda = ${lam}`).toBe(true);
      }
  });
});

/** K~ for n <= 4 (Macdonald VI.8 tables, modified: K~_{lambda mu}(q,t) = t^n(mu) K_{lambda mu}(q, 1/t)). */
const MODIFIED_TABLE: Record<string, Record<string, string>> = {
  '2': { '2': '1', '1,1': 'q' },
  '1,1': { '2': '1', '1,1': 't' },
  '3': { '3': '1', '2,1': 'q^2 + q', '1,1,1': 'q^3' },
  '2,1': { '3': '1', '2,1': 'q + t', '1,1,1': 'q*t' },
  '1,1,1': { '3': '1', '2,1': 't^2 + t', '1,1,1': 't^3' },
  '4': { '4': '1', '3,1': 'q^3 + q^2 + q', '2,2': 'q^4 + q^2', '2,1,1': 'q^5 + q^4 + q^3', '1,1,1,1': 'q^6' },
  '3,1': { '4': '1', '3,1': 'q^2 + q + t', '2,2': 'q^2 + q*t', '2,1,1': 'q^3 + q^2*t + q*t', '1,1,1,1': 'q^3*t' },
  '2,2': { '4': '1', '3,1': 'q*t + q + t', '2,2': 'q^2 + t^2', '2,1,1': 'q^2*t + q*t^2 + q*t', '1,1,1,1': 'q^2*t^2' },
  '2,1,1': { '4': '1', '3,1': 'q + t^2 + t', '2,2': 'q*t + t^2', '2,1,1': 'q*t^2 + q*t + t^3', '1,1,1,1': 'q*t^3' },
  '1,1,1,1': { '4': '1', '3,1': 't^3 + t^2 + t', '2,2': 't^4 + t^2', '2,1,1': 't^5 + t^4 + t^3', '1,1,1,1': 't^6' },
};

describe('modified Macdonald polynomials by the formula of Haglund, Haiman and Loehr', () => {
  it('the q,t-Kostka tables of Macdonald VI.8 for n <= 4 (entered in modified form)', () => {
    for (const [mu, row] of Object.entries(MODIFIED_TABLE)) {
      const f = H(mu.split(',').map(Number));
      for (const [lam, c] of Object.entries(row)) {
        const got = macdonaldHTable(mu.split(',').map(Number)).find(([nu]) => nu.join(',') === lam);
        expect(got ? text(evalBi(got[1], q, t)) : '0', `mu = ${mu}, lambda = ${lam}`).toBe(text(evaluate(c, [], ['q', 't']) as PolyLike));
      }
      expect(f).toBeTruthy();
    }
  });
  it("H~_mu(x; 1, 1) = h_1^n, coefficient of s_(n) is 1 and of s_(1^n) is q^n(mu') t^n(mu) (n <= 6)", { timeout: 60_000 }, () => {
    for (let n = 1; n <= 6; n++) {
      const h1n = symMulPow(s(1), n);
      for (const mu of partitionsOf(n)) {
        sameSym(H(mu as number[], 1, 1), h1n);
        const tab = macdonaldHTable(mu);
        expect(tab[0][0].join(',')).toBe(String(n));
        expect(text(evalBi(tab[0][1], q, t))).toBe('1');
        const last = tab[tab.length - 1];
        expect(last[0].length).toBe(n);
        expect(text(evalBi(last[1], q, t))).toBe(text(pmul(ppow(q, nOf(conjugate(mu))), ppow(t, nOf(mu)))));
      }
    }
  });
  it("H~_mu(x; q, t) = H~_mu'(x; t, q) (n <= 6)", { timeout: 60_000 }, () => {
    for (let n = 1; n <= 6; n++) for (const mu of partitionsOf(n)) sameSym(H(mu as number[]), H(conjugate(mu), t, q));
  });
  it('H~_mu(x; 0, t) = sum_lambda t^n(mu) K_{lambda mu}(1/t) s_lambda, dual to P_nu(x; t) (n <= 6)', { timeout: 60_000 }, () => {
    // Macdonald III (7.?) transformed Hall–Littlewood functions Q'_mu(x; t) = sum K_{lambda mu}(t) s_lambda;
    // H~_mu(x; 0, t) = t^n(mu) Q'_mu(x; 1/t) (VI (8.11) at q = 0, K_{lambda mu}(0, t) = K_{lambda mu}(t)).
    for (let n = 1; n <= 6; n++)
      for (const mu of partitionsOf(n)) {
        const H0 = H(mu as number[], 0, t);
        const expected = new TermMap();
        for (const lam of partitionsOf(n)) {
          const c = kostkaFoulkes(lam, mu);
          const rev: number[] = new Array(nOf(mu) + 1).fill(0);
          c.forEach((x, i) => (rev[nOf(mu) - i] = x as number));
          expected.add(lam, evalUni(rev, t));
        }
        sameSym(H0, expected.result());
        // Q'_mu(x; t) = t^n(mu) H~_mu(x; 0, 1/t) is dual to P_nu(x; t) under the Hall inner product.
        for (const nu of partitionsOf(n)) {
          const Qp = new TermMap();
          for (const lam of partitionsOf(n)) Qp.add(lam, evalUni(kostkaFoulkes(lam, mu), t));
          expect(text(hallProduct(Qp.result(), P(nu as number[])))).toBe(mu.join() === nu.join() ? '1' : '0');
        }
      }
  });
  it('all of n = 7 in reasonable time', { timeout: 120_000 }, () => {
    for (const mu of partitionsOf(7)) expect(macdonaldHTable(mu).length).toBeGreaterThan(0);
    expect(substitute(toPolynomialIn(H([3, 2, 2]), 'x', 1), new Map([[indexedVarId('x', 1), 1]]))).toBe(1);
  });
});

function symMulPow(f: SymLike, n: number): SymLike {
  let r: SymLike = 1;
  for (let i = 0; i < n; i++) r = symMul(r, f);
  return r;
}
