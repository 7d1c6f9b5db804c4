// The bases m, e, h, p, s of the ring of symmetric functions and the transitions among them.
// Sources: I. G. Macdonald, Symmetric Functions and Hall Polynomials, 2nd ed. (1995), ch. I and the
// tables of its appendix to ch. I; the hook-content formula (Stanley, Enumerative Combinatorics 2,
// Cor. 7.21.4). Second algorithms: every basis element built directly in x[1..n] from its
// definition, Schur polynomials by the branching rule (src/algebra/schur.ts).

import { describe, expect, it } from 'vitest';
import { pequals, type PolyLike } from '../../../src/algebra/polynomial.js';
import { substitute } from '../../../src/algebra/polynomialOps.js';
import { schurPolynomial } from '../../../src/algebra/schur.js';
import { BASIS_NAMES, expandIn, fromBasis } from '../../../src/algebra/symmetric/bases.js';
import { conjugate, partitionsOf, zee } from '../../../src/algebra/symmetric/partitions.js';
import { hallProduct, omegaOf, symMul } from '../../../src/algebra/symmetric/products.js';
import { fromPolynomialIn, toPolynomialIn } from '../../../src/algebra/symmetric/specialize.js';
import { symAdd, type SymLike } from '../../../src/algebra/symmetric/symmetricFunction.js';
import { indexedVarId } from '../../../src/algebra/variables.js';
import { hookContentCount } from '../../../src/families/tableaux/shapes.js';
import { normBig } from '../../../src/numbers/integer.js';
import { valueToText } from '../../../src/values/operations.js';
import { basisElement, e, h, m, monomialDirect, p, productDirect, s } from './helpers.js';

const text = (f: SymLike) => valueToText(f);
const sameSym = (a: SymLike, b: SymLike) => expect(text(a)).toBe(text(b));

/** sum c_lambda b_lambda from a list of [lambda, c] in the basis b. */
function combo(b: 'monomial' | 'elementary' | 'complete' | 'power' | 'schur', pairs: [number[], number][]): SymLike {
  return fromBasis(b, pairs);
}

describe('transition matrices: entries of the tables of Macdonald, ch. I appendix (n = 3, 4)', () => {
  // Entries entered by hand from the tables (e, h, p in terms of m), recomputed by hand from
  // products of monomial symmetric functions.
  it('n = 3: e, h, p in the monomial basis', () => {
    sameSym(
      e(2, 1),
      combo('monomial', [
        [[2, 1], 1],
        [[1, 1, 1], 3],
      ]),
    );
    sameSym(
      e(1, 1, 1),
      combo('monomial', [
        [[3], 1],
        [[2, 1], 3],
        [[1, 1, 1], 6],
      ]),
    );
    sameSym(
      h(2, 1),
      combo('monomial', [
        [[3], 1],
        [[2, 1], 2],
        [[1, 1, 1], 3],
      ]),
    );
    sameSym(
      h(3),
      combo('monomial', [
        [[3], 1],
        [[2, 1], 1],
        [[1, 1, 1], 1],
      ]),
    );
    sameSym(
      p(2, 1),
      combo('monomial', [
        [[3], 1],
        [[2, 1], 1],
      ]),
    );
    sameSym(
      p(1, 1, 1),
      combo('monomial', [
        [[3], 1],
        [[2, 1], 3],
        [[1, 1, 1], 6],
      ]),
    );
  });
  it('n = 4: selected entries', () => {
    sameSym(
      p(1, 1, 1, 1),
      combo('monomial', [
        [[4], 1],
        [[3, 1], 4],
        [[2, 2], 6],
        [[2, 1, 1], 12],
        [[1, 1, 1, 1], 24],
      ]),
    );
    sameSym(
      e(2, 2),
      combo('monomial', [
        [[2, 2], 1],
        [[2, 1, 1], 2],
        [[1, 1, 1, 1], 6],
      ]),
    );
    sameSym(
      p(2, 2),
      combo('monomial', [
        [[4], 1],
        [[2, 2], 2],
      ]),
    );
    sameSym(
      p(3, 1),
      combo('monomial', [
        [[4], 1],
        [[3, 1], 1],
      ]),
    );
    // Kostka matrix row of s_{22}: K_{22,22} = 1, K_{22,211} = 1, K_{22,1111} = 2 (Macdonald I.6 table).
    sameSym(
      s(2, 2),
      combo('monomial', [
        [[2, 2], 1],
        [[2, 1, 1], 1],
        [[1, 1, 1, 1], 2],
      ]),
    );
    // Characters of S_4 (p in the Schur basis): p_4 = s_4 - s_31 + s_211 - s_1111.
    sameSym(
      p(4),
      combo('schur', [
        [[4], 1],
        [[3, 1], -1],
        [[2, 1, 1], 1],
        [[1, 1, 1, 1], -1],
      ]),
    );
  });
});

describe('every basis, n <= 6, against its definition in x[1..n]', () => {
  for (let n = 1; n <= 6; n++) {
    it(`degree ${n}`, { timeout: 60_000 }, () => {
      const ids = Array.from({ length: n }, (_, i) => indexedVarId('x', i + 1));
      for (const lam of partitionsOf(n)) {
        expect(pequals(toPolynomialIn(m(...lam), 'x', n), monomialDirect(lam, n))).toBe(true);
        for (const b of ['elementary', 'complete', 'power'] as const) {
          expect(pequals(toPolynomialIn(basisElement(b, lam), 'x', n), productDirect(b, lam, n)), `${b} ${lam}`).toBe(true);
        }
        // s_lambda(1^n) by the hook-content formula.
        const ones = new Map<number, PolyLike>(ids.map((id) => [id, 1]));
        expect(substitute(toPolynomialIn(s(...lam), 'x', n), ones)).toBe(normBig(hookContentCount(lam, n)));
        expect(pequals(toPolynomialIn(s(...lam), 'x', n), schurPolynomial(lam, 'x', n))).toBe(true);
      }
    });
  }
});

describe('conversions in every direction are inverse to each other (n <= 6)', () => {
  it('expand(b_mu, b) = b_mu and round trips through every other basis', { timeout: 60_000 }, () => {
    for (let n = 0; n <= 6; n++)
      for (const lam of partitionsOf(n))
        for (const b of BASIS_NAMES) {
          const f = basisElement(b, lam);
          const back = expandIn(f, b);
          expect(back.map((t) => [t.parts.join(','), t.coef])).toEqual([[lam.join(','), 1]]);
          for (const c of BASIS_NAMES)
            sameSym(
              fromBasis(
                c,
                expandIn(f, c).map((t) => [t.parts, t.coef]),
              ),
              f,
            );
        }
  });
});

describe('omega and the Hall inner product (Macdonald I (2.7), (4.5)–(4.8))', () => {
  it("omega(e_mu) = h_mu, omega(p_mu) = (-1)^(|mu| - l(mu)) p_mu, omega(s_lambda) = s_lambda'", () => {
    for (let n = 1; n <= 6; n++)
      for (const mu of partitionsOf(n)) {
        sameSym(omegaOf(e(...mu)), h(...mu));
        const sign = (n - mu.length) % 2 === 0 ? 1 : -1;
        sameSym(omegaOf(p(...mu)), fromBasis('power', [[mu, sign]]));
        sameSym(omegaOf(s(...mu)), s(...conjugate(mu)));
      }
  });
  it('<s_l, s_m> = delta, <h_l, m_m> = delta, <p_l, p_m> = z_l delta', () => {
    for (let n = 1; n <= 5; n++) {
      const P = partitionsOf(n);
      for (const a of P)
        for (const b of P) {
          const same = a.join(',') === b.join(',');
          expect(hallProduct(s(...a), s(...b))).toBe(same ? 1 : 0);
          expect(hallProduct(h(...a), m(...b))).toBe(same ? 1 : 0);
          expect(hallProduct(p(...a), p(...b))).toBe(same ? normBig(zee(a)) : 0);
        }
    }
  });
});

describe('fromPolynomial', () => {
  it('inverts toPolynomial on Schur terms with at most m parts', () => {
    const f = symAdd(s(3, 1), symAdd(e(2, 2), p(2)));
    const back = fromPolynomialIn(toPolynomialIn(f, 'x', 4), 'x', 4, 'test');
    sameSym(back, f);
    // With fewer variables, the terms with more parts vanish.
    sameSym(fromPolynomialIn(toPolynomialIn(s(2, 1, 1), 'x', 2), 'x', 2, 'test'), 0);
  });
  it('refuses a polynomial that is not symmetric', () => {
    const x1 = toPolynomialIn(m(1), 'x', 1);
    expect(() => fromPolynomialIn(x1, 'x', 2, 'fromPolynomial(P, x, m)')).toThrow(/not symmetric/);
  });
});

describe("Jacobi–Trudi: s_lambda = det(h_{lambda_i - i + j}) and det(e_{lambda'_i - i + j}) (Macdonald I (3.4), (3.5))", () => {
  /** The determinant by expansion over permutations, products taken in the ring. */
  function det(entry: (i: number, j: number) => SymLike, k: number): SymLike {
    let total: SymLike = 0;
    const perm = Array.from({ length: k }, (_, i) => i);
    const go = (pos: number, sign: number) => {
      if (pos === k) {
        let prod: SymLike = sign;
        for (let i = 0; i < k; i++) prod = symMul(prod, entry(i, perm[i]));
        total = symAdd(total, prod);
        return;
      }
      for (let i = pos; i < k; i++) {
        [perm[pos], perm[i]] = [perm[i], perm[pos]];
        go(pos + 1, i === pos ? sign : -sign);
        [perm[pos], perm[i]] = [perm[i], perm[pos]];
      }
    };
    go(0, 1);
    return total;
  }
  const hk = (k: number): SymLike => (k < 0 ? 0 : k === 0 ? 1 : h(k));
  const ek = (k: number): SymLike => (k < 0 ? 0 : k === 0 ? 1 : e(k));
  it('for every lambda of size <= 6', () => {
    for (let n = 1; n <= 6; n++)
      for (const lam of partitionsOf(n)) {
        sameSym(
          det((i, j) => hk(lam[i] - i + j), lam.length),
          s(...lam),
        );
        const c = conjugate(lam);
        sameSym(
          det((i, j) => ek(c[i] - i + j), c.length),
          s(...lam),
        );
      }
  });
});
