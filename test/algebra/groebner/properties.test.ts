// Properties of random small ideals (fast-check), checked by the independent plain code: the
// result is a reduced Gröbner basis, every generator reduces to 0 by it, normal forms do not
// depend on the representative, the ideal does not depend on the term order, and over Q the
// basis agrees with the plain exact Buchberger algorithm (a second algorithm) and modulo a prime
// with the modular engine.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { fromTerms, padd, pmul, pequals, type PolyLike } from '../../../src/algebra/polynomial.js';
import { varId } from '../../../src/algebra/variables.js';
import type { Scalar } from '../../../src/numbers/rational.js';
import { groebnerBasis, isGroebnerBasis, normalForm, termOrder, type OrderSpec } from '../../../src/algebra/groebner/index.js';
import { buchberger } from '../../../src/algebra/groebner/buchberger.js';
import { Limits } from '../../../src/algebra/groebner/bounds.js';
import { rationals } from '../../../src/algebra/groebner/field.js';
import { fromSparse, toSparse } from '../../../src/algebra/groebner/convert.js';
import { Fp, plainIsGroebner, plainIsReduced, plainOrders, plainRemainder, Q, toPlain, type PlainField } from './independent.js';

const ids = ['r', 's', 'w'].map((n) => varId(n));

/** A polynomial in r, s, w with up to 4 terms of degree <= 3 and small integer coefficients. */
const polyArb: fc.Arbitrary<PolyLike> = fc
  .array(fc.tuple(fc.array(fc.integer({ min: 0, max: 2 }), { minLength: 3, maxLength: 3 }), fc.integer({ min: -3, max: 3 })), {
    minLength: 1,
    maxLength: 4,
  })
  .map((terms) => fromTerms(ids, terms as [number[], Scalar][]));
const idealArb = fc.array(polyArb, { minLength: 1, maxLength: 3 });
const orderArb = fc.constantFrom<'lex' | 'deglex' | 'grevlex'>('lex', 'deglex', 'grevlex');

function isBasisOf(K: PlainField, G: PolyLike[], gens: PolyLike[], spec: 'lex' | 'deglex' | 'grevlex'): void {
  const cmp = plainOrders[spec];
  const plain = G.map((g) => toPlain(K, g, ids, cmp));
  expect(plainIsReduced(K, plain)).toBe(true);
  expect(plainIsGroebner(K, plain, cmp)).toBe(true);
  for (const f of gens) expect(plainRemainder(K, toPlain(K, f, ids, cmp), plain, cmp)).toEqual([]);
}

const RUNS = { numRuns: 40, seed: 20261203 };

describe('random ideals in three variables', () => {
  it('over Q: a reduced Gröbner basis containing every generator, equal to the plain exact algorithm', () => {
    fc.assert(
      fc.property(idealArb, orderArb, (gens, spec) => {
        const o = termOrder(spec as OrderSpec, ids);
        const G = groebnerBasis(gens, o, { maxDegree: 40 });
        isBasisOf(Q, G, gens, spec);
        const direct = buchberger(
          rationals,
          o,
          gens.map((g) => toSparse(rationals, o, g)),
          new Limits({}),
        ).map((g) => fromSparse(rationals, o, g));
        expect(direct.length).toBe(G.length);
        direct.forEach((g, i) => expect(pequals(g, G[i])).toBe(true));
      }),
      RUNS,
    );
  }, 300000);

  it('over GF(101): a reduced Gröbner basis containing every generator', () => {
    fc.assert(
      fc.property(idealArb, orderArb, (gens, spec) => {
        const G = groebnerBasis(gens, termOrder(spec as OrderSpec, ids), { prime: 101 });
        isBasisOf(Fp(101), G, gens, spec);
      }),
      RUNS,
    );
  }, 300000);

  it('normal forms are unique: f and f + sum h_i g_i have the same normal form', () => {
    fc.assert(
      fc.property(idealArb, polyArb, fc.array(polyArb, { minLength: 3, maxLength: 3 }), orderArb, (gens, f, hs, spec) => {
        const o = termOrder(spec as OrderSpec, ids);
        let g: PolyLike = f;
        gens.forEach((gi, i) => (g = padd(g, pmul(hs[i], gi))));
        expect(pequals(normalForm(f, gens, o), normalForm(g, gens, o))).toBe(true);
        expect(pequals(normalForm(f, gens, o, { prime: 101 }), normalForm(g, gens, o, { prime: 101 }))).toBe(true);
      }),
      { ...RUNS, numRuns: 25 },
    );
  }, 300000);

  it('the ideal does not depend on the order: each basis reduces to 0 by the other', () => {
    fc.assert(
      fc.property(idealArb, orderArb, orderArb, (gens, s1, s2) => {
        const G1 = groebnerBasis(gens, termOrder(s1 as OrderSpec, ids));
        const G2 = groebnerBasis(gens, termOrder(s2 as OrderSpec, ids));
        const c2 = plainOrders[s2];
        const p2 = G2.map((g) => toPlain(Q, g, ids, c2));
        for (const g of G1) expect(plainRemainder(Q, toPlain(Q, g, ids, c2), p2, c2)).toEqual([]);
      }),
      { ...RUNS, numRuns: 25 },
    );
  }, 300000);

  it('isGroebnerBasis (with the product and chain criteria) agrees with the plain all-pairs check', () => {
    fc.assert(
      fc.property(idealArb, orderArb, fc.boolean(), (gens, spec, complete) => {
        const o = termOrder(spec as OrderSpec, ids),
          cmp = plainOrders[spec];
        // a computed basis plus a random member, or just the random generators
        const G = complete ? [...groebnerBasis(gens, o), ...gens] : gens;
        const nonzero = G.filter((g) => g !== 0);
        for (const [K, prime] of [
          [Q, undefined],
          [Fp(101), 101],
        ] as const) {
          const plain = nonzero.map((g) => toPlain(K, g, ids, cmp)).filter((g) => g.length > 0);
          expect(isGroebnerBasis(nonzero, o, { prime })).toBe(plainIsGroebner(K, plain, cmp));
        }
      }),
      { ...RUNS, numRuns: 60 },
    );
  }, 300000);

  it('weight and block orders: the result is a reduced Gröbner basis for that order', () => {
    const [r, s, w] = ids;
    const spec: fc.Arbitrary<OrderSpec> = fc.oneof(
      fc
        .tuple(fc.array(fc.integer({ min: 0, max: 3 }), { minLength: 3, maxLength: 3 }), orderArb)
        .map(([weights, then]) => ({ weights, then })),
      fc.tuple(orderArb, orderArb, fc.integer({ min: 0, max: 2 })).map(([a, b, k]) => {
        const perm = [
          [r, s, w],
          [s, w, r],
          [w, r, s],
        ][k];
        return {
          blocks: [
            { vars: [perm[0], perm[1]], order: a },
            { vars: [perm[2]], order: b },
          ],
        };
      }),
    );
    fc.assert(
      fc.property(idealArb, spec, fc.constantFrom(undefined, 101), (gens, sp, prime) => {
        const o = termOrder(sp, ids);
        const cmp = (a: number[], b: number[]) => o.compare(a, b);
        const K = prime ? Fp(prime) : Q;
        const G = groebnerBasis(gens, o, { prime, maxDegree: 400 }).map((g) => toPlain(K, g, ids, cmp));
        expect(plainIsReduced(K, G)).toBe(true);
        expect(plainIsGroebner(K, G, cmp)).toBe(true);
        for (const f of gens) expect(plainRemainder(K, toPlain(K, f, ids, cmp), G, cmp)).toEqual([]);
      }),
      { ...RUNS, numRuns: 40 },
    );
  }, 300000);

  it('the basis over Q reduces modulo 2^31 - 1 to the modular basis (a prime this large is lucky here)', () => {
    const p = 2 ** 31 - 1,
      K = Fp(p);
    fc.assert(
      fc.property(idealArb, orderArb, (gens, spec) => {
        const o = termOrder(spec as OrderSpec, ids),
          cmp = plainOrders[spec];
        const G = groebnerBasis(gens, o).map((g) => toPlain(K, g, ids, cmp));
        const Gp = groebnerBasis(gens, o, { prime: p }).map((g) => toPlain(K, g, ids, cmp));
        expect(JSON.stringify(G)).toBe(JSON.stringify(Gp));
      }),
      { ...RUNS, numRuns: 25 },
    );
  }, 300000);
});
