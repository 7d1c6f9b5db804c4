// Ideals and varieties, Gröbner bases (LIBRARY.md "Ideals and varieties"): reduced bases, the
// basis test, initial ideals, normal forms and membership. Term orders: termOrderArgs.ts.

import { groebnerBasis, inIdeal, isGroebnerBasis, normalForm, variablesOf } from '../algebra/groebner/index.js';
import { Ideal } from '../algebra/ideals/ideal.js';
import { basisFor, initialIdealOf } from '../algebra/ideals/invariants.js';
import { isPolynomial, type PolyLike } from '../algebra/polynomial.js';
import { polynomialListArg, primeArg } from './ideals.js';
import { defineFunction } from './registry.js';
import type { TypeName } from '../values/types.js';
import { termOrderArg } from './termOrderArgs.js';
import { DEFAULT_IDEAL_LIMITS } from '../algebra/ideals/ideal.js';

const topic = 'ideals';
const ORDER_TYPES: TypeName[] = ['string', 'list'];
const ORDERS_DOC =
  'orders: "lex", "deglex", "grevlex" (variables in print order), "antidiagonal", a weight list, or blocks [[vars, order], ...]';
const BUCHBERGER =
  "B. Buchberger's algorithm with the sugar strategy and the Gebauer–Möller criteria; D. Cox, J. Little, D. O'Shea, Ideals, Varieties, and Algorithms, ch. 2 (twisted cubic and elimination examples tested)";

/** The ring of an ideal together with the variables of further polynomials. */
function ringWith(I: Ideal, extra: readonly PolyLike[]): number[] {
  const ids = new Set<number>(I.ring);
  for (const f of extra) if (isPolynomial(f)) for (const id of f.vars) ids.add(id);
  return [...ids];
}

defineFunction({
  name: 'groebnerBasis',
  topic,
  params: [
    { name: 'I', type: 'ideal' },
    { name: 'order', type: ORDER_TYPES },
  ],
  returns: 'list',
  description: `the reduced Gröbner basis of I (monic, by ascending leading term; [1] for the whole ring); ${ORDERS_DOC}`,
  example: 'groebnerBasis(ideal([x^2 - y, x*y - 1]), "lex")',
  exampleValue: '[y^3 - 1, -y^2 + x]',
  source: BUCHBERGER,
  impl: (I, order) => {
    const J = I as Ideal;
    return groebnerBasis(J.gens, termOrderArg('groebnerBasis(I, order)', order, Array.from(J.ring)), J.groebnerOptions());
  },
});

defineFunction({
  name: 'isGroebnerBasis',
  topic,
  params: [
    { name: 'G', type: 'list' },
    { name: 'order', type: ORDER_TYPES },
    { name: 'p', type: 'integer', optional: true },
  ],
  returns: 'boolean',
  description: `whether the polynomials G are a Gröbner basis of the ideal they generate (every S-pair reduces to 0), over Q or F_p; ${ORDERS_DOC}`,
  example: 'isGroebnerBasis(minors(genericMatrix(x, 2, 3), 2), "antidiagonal")',
  exampleValue: 'true',
  source: "Buchberger's criterion (D. Cox, J. Little, D. O'Shea, Ideals, Varieties, and Algorithms, ch. 2 §6, Thm 6)",
  impl: (G, order, p) => {
    const call = 'isGroebnerBasis(G, order)';
    const gs = polynomialListArg(call, 'G', G);
    return isGroebnerBasis(gs, termOrderArg(call, order, variablesOf(gs)), { ...DEFAULT_IDEAL_LIMITS, prime: primeArg(call, p) });
  },
});

defineFunction({
  name: 'initialIdeal',
  topic,
  params: [
    { name: 'I', type: 'ideal' },
    { name: 'order', type: ORDER_TYPES },
  ],
  returns: 'ideal',
  description: `the initial ideal in(I): the ideal of the leading terms of the reduced Gröbner basis, on I's ring; ${ORDERS_DOC}`,
  example: 'initialIdeal(matrixSchubertIdeal(perm([1, 4, 3, 2]), x), "antidiagonal")',
  exampleValue:
    'ideal([x[1,2]*x[2,1], x[1,2]*x[3,1], x[1,3]*x[2,1], x[1,3]*x[2,2], x[2,2]*x[3,1]], [x[1,1], x[1,2], x[1,3], x[1,4], x[2,1], x[2,2], x[2,3], x[2,4], x[3,1], x[3,2], x[3,3], x[3,4], x[4,1], x[4,2], x[4,3], x[4,4]])',
  source: BUCHBERGER,
  impl: (I, order) => {
    const J = I as Ideal;
    const M = initialIdealOf(J, termOrderArg('initialIdeal(I, order)', order, Array.from(J.ring)));
    return Ideal.fromMonomialIdeal(M, J.prime);
  },
});

defineFunction({
  name: 'normalForm',
  topic,
  params: [
    { name: 'f', type: 'scalarOrPolynomial' },
    { name: 'I', type: 'ideal' },
    { name: 'order', type: ORDER_TYPES },
  ],
  returns: 'scalarOrPolynomial',
  description: `the remainder of f on division by the reduced Gröbner basis of I (unique; 0 exactly when f is in I); ${ORDERS_DOC}`,
  example: 'normalForm(x^3, ideal([x^2 - y]), "lex")',
  exampleValue: 'x*y',
  source: "D. Cox, J. Little, D. O'Shea, Ideals, Varieties, and Algorithms, ch. 2 §6, Prop. 1",
  impl: (f, I, order) => {
    const J = I as Ideal,
      g = f as PolyLike;
    const ord = termOrderArg('normalForm(f, I, order)', order, ringWith(J, [g]));
    return normalForm(g, basisFor(J, ord), ord, { ...J.groebnerOptions(), assumeBasis: true });
  },
});

defineFunction({
  name: 'inIdeal',
  topic,
  params: [
    { name: 'f', type: 'scalarOrPolynomial' },
    { name: 'I', type: 'ideal' },
  ],
  returns: 'boolean',
  description: 'whether f lies in I (its normal form for grevlex is 0)',
  example: 'inIdeal(x^3 - y^3, ideal([x - y]))',
  exampleValue: 'true',
  source: "D. Cox, J. Little, D. O'Shea, Ideals, Varieties, and Algorithms, ch. 2 §6, Cor. 2",
  impl: (f, I) => {
    const J = I as Ideal;
    return inIdeal(f as PolyLike, J.gens, J.groebnerOptions());
  },
});
