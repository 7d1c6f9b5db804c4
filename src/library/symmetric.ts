// The ring of symmetric functions (LIBRARY.md, "Symmetric functions"): constructors for the five
// classical bases, expansion in any of them, positivity, omega, the Hall inner product, skew Schur
// functions, plethysm, and specialisation to finitely many variables and back. Values are stored
// in the Schur basis (src/algebra/symmetric/); a symmetric function of degree 0 is its coefficient.

import { fail } from '../base/errors.js';
import { isPolynomial, type PolyLike } from '../algebra/polynomial.js';
import { basisArg, expandIn, fromBasis, type BasisName } from '../algebra/symmetric/bases.js';
import { plethysmOf } from '../algebra/symmetric/plethysm.js';
import { hallProduct, omegaOf, skewSchur } from '../algebra/symmetric/products.js';
import { fromPolynomialIn, toPolynomialIn } from '../algebra/symmetric/specialize.js';
import { isSymmetricFunction, schurTerms, type SymLike } from '../algebra/symmetric/symmetricFunction.js';
import { isPartitionList, Partition } from '../families/partitions/partition.js';
import { partitionArg } from '../families/tableaux/shapes.js';
import { isScalar, Rat } from '../numbers/rational.js';
import { valueToText } from '../values/operations.js';
import type { Value } from '../values/value.js';
import { smallIntArg } from './integerArgs.js';
import { indexedBaseArg } from './polyArgs.js';
import { defineFunction } from './registry.js';

const topic = 'symmetric functions';
const SYM = 'symmetric';
const MACDONALD_I = 'I. G. Macdonald, Symmetric Functions and Hall Polynomials, 2nd ed. (1995)';

/** A partition argument of a basis constructor: a partition, a list of parts, or k for [k]. */
export function basisIndexArg(call: string, v: Value): number[] {
  if (typeof v === 'number' && Number.isSafeInteger(v)) {
    if (v < 0) fail(`${call} needs a partition or a nonnegative integer k (for [k]), got ${v}`);
    return v === 0 ? [] : [v];
  }
  if (v instanceof Partition) return v.parts;
  if (Array.isArray(v) && isPartitionList(v)) return v as number[];
  fail(`${call} needs a partition (weakly decreasing positive integers) or an integer k for [k], got ${valueToText(v)}`);
}

const constructors: [string, BasisName, string, string, string][] = [
  [
    'schurSym',
    'schur',
    'the Schur function s_lambda',
    'schurSym([2, 1]) * schurSym(1)',
    'schurSym([3, 1]) + schurSym([2, 2]) + schurSym([2, 1, 1])',
  ],
  ['monomialSym', 'monomial', 'the monomial symmetric function m_lambda', 'monomialSym([1, 1])', 'schurSym([1, 1])'],
  [
    'elementarySym',
    'elementary',
    'the elementary symmetric function e_lambda = e_lambda1 e_lambda2 ...',
    'elementarySym([2, 1])',
    'schurSym([2, 1]) + schurSym([1, 1, 1])',
  ],
  [
    'completeSym',
    'complete',
    'the complete homogeneous symmetric function h_lambda = h_lambda1 h_lambda2 ...',
    'completeSym([2, 1])',
    'schurSym([3]) + schurSym([2, 1])',
  ],
  [
    'powerSym',
    'power',
    'the power sum p_lambda = p_lambda1 p_lambda2 ...',
    'powerSym(3)',
    'schurSym([3]) - schurSym([2, 1]) + schurSym([1, 1, 1])',
  ],
];

for (const [name, basis, what, example, exampleValue] of constructors) {
  defineFunction({
    name,
    topic,
    params: [{ name: 'lambda', type: ['partition', 'list', 'integer'] }],
    returns: SYM,
    description: `${what} in the ring of symmetric functions (an integer k means the one-part partition [k]; [] or 0 gives 1)`,
    example,
    exampleValue,
    source: `${MACDONALD_I}, I.2–I.3 and the transition matrices of I.6 (tested against the tables of the appendix to ch. I)`,
    impl: (l) => fromBasis(basis, [[basisIndexArg(`${name}(lambda)`, l), 1]]),
  });
}

function symArg(v: Value): SymLike {
  return v as SymLike;
}

function basisNameArg(call: string, v: Value): BasisName {
  return basisArg(v as string, call);
}

defineFunction({
  name: 'expand',
  topic,
  params: [
    { name: 'f', type: SYM },
    { name: 'basis', type: 'string' },
  ],
  returns: 'list',
  description:
    'the coefficients of f in the basis "schur", "monomial", "elementary", "complete" or "power": a list of [partition, coefficient] pairs, highest degree first, then partitions in decreasing lexicographic order',
  example: 'expand(powerSym([1, 1]), "monomial")',
  exampleValue: '[[partition([2]), 1], [partition([1, 1]), 2]]',
  source: `${MACDONALD_I}, I.6 (transition matrices) and the tables of the appendix to ch. I`,
  impl: (f, b) => expandIn(symArg(f), basisNameArg('expand(f, basis)', b)).map((t) => [new Partition(t.parts.slice()), t.coef] as Value),
});

/** A coefficient is positive when it is a nonnegative number or a polynomial with nonnegative coefficients. */
function nonnegative(c: PolyLike): boolean {
  if (isPolynomial(c)) return c.coefs.every((x) => (x instanceof Rat ? x.num >= 0n : x >= 0));
  return c instanceof Rat ? c.num >= 0n : c >= 0;
}

defineFunction({
  name: 'isPositive',
  topic,
  params: [
    { name: 'f', type: [SYM, 'list'] },
    { name: 'basis', type: 'string', optional: true },
  ],
  returns: 'boolean',
  description:
    'whether every coefficient of f in the basis (default "schur") is a nonnegative number or a polynomial (in q, t, ...) with nonnegative coefficients; for a list of [key, coefficient] pairs (the value of expand or schubertExpand), whether every coefficient is',
  example: 'isPositive(schurSym([2, 1]) * schurSym([2, 1]), "schur")',
  exampleValue: 'true',
  source: 'definition (Schur positivity, e.g. Macdonald, Symmetric Functions and Hall Polynomials, VI (8.18))',
  impl: (f, b) => {
    const call = 'isPositive(f, basis)';
    if (Array.isArray(f)) {
      if (b !== undefined) fail(`${call}: a list of [key, coefficient] pairs takes no basis`);
      return (f as Value[]).every((pair) => {
        const c = Array.isArray(pair) && pair.length === 2 ? pair[1] : pair;
        if (!(isScalar(c) || isPolynomial(c)))
          fail(`${call}: ${valueToText(pair as Value)} is not a [key, coefficient] pair with a numeric coefficient`);
        return nonnegative(c as PolyLike);
      });
    }
    const basis = b === undefined ? 'schur' : basisNameArg(call, b);
    return expandIn(symArg(f), basis).every((t) => nonnegative(t.coef));
  },
});

defineFunction({
  name: 'omega',
  topic,
  params: [{ name: 'f', type: SYM }],
  returns: SYM,
  description: "the involution omega of the ring of symmetric functions: omega(s_lambda) = s_lambda', omega(h_n) = e_n",
  example: 'omega(completeSym([2, 1]))',
  exampleValue: 'schurSym([2, 1]) + schurSym([1, 1, 1])',
  source: `${MACDONALD_I}, I (2.7) and (3.8)`,
  impl: (f) => omegaOf(symArg(f)),
});

defineFunction({
  name: 'hall',
  topic,
  params: [
    { name: 'f', type: SYM },
    { name: 'g', type: SYM },
  ],
  returns: 'scalarOrPolynomial',
  description:
    'the Hall inner product <f, g>, for which the Schur functions are orthonormal (<h_lambda, m_mu> = delta, <p_lambda, p_mu> = z_lambda delta)',
  example: 'hall(powerSym([2, 1]), powerSym([2, 1]))',
  exampleValue: '2',
  source: `${MACDONALD_I}, I (4.5)–(4.8)`,
  impl: (f, g) => hallProduct(symArg(f), symArg(g)),
});

defineFunction({
  name: 'skewSchurSym',
  topic,
  params: [
    { name: 'lambda', type: ['partition', 'list'] },
    { name: 'mu', type: ['partition', 'list'] },
  ],
  returns: SYM,
  description: 'the skew Schur function s_{lambda/mu} = sum_nu c^lambda_{mu nu} s_nu (0 when mu is not inside lambda)',
  example: 'skewSchurSym([2, 1], [1])',
  exampleValue: 'schurSym([2]) + schurSym([1, 1])',
  source: `${MACDONALD_I}, I (5.3) and I.9 (Littlewood–Richardson rule)`,
  impl: (l, m) => skewSchur(partitionArg(l, 'lambda'), partitionArg(m, 'mu')),
});

defineFunction({
  name: 'plethysm',
  topic,
  params: [
    { name: 'f', type: SYM },
    { name: 'g', type: SYM },
  ],
  returns: SYM,
  description:
    'the plethysm f[g] through power sums: p_k[g] replaces each p_j in g by p_{jk} and each indeterminate q of the coefficients by q^k (degree of f times degree of g at most 12)',
  example: 'plethysm(completeSym(2), completeSym(2))',
  exampleValue: 'schurSym([4]) + schurSym([2, 2])',
  source: `${MACDONALD_I}, I.8 (and I.8 Ex. 6 for h_2[h_n])`,
  impl: (f, g) => plethysmOf(symArg(f), symArg(g)),
});

/** Refuse a specialisation whose polynomial would have too many terms. */
function refuseHuge(f: SymLike, m: number, call: string): void {
  for (const t of schurTerms(f)) {
    const d = t.parts.reduce((a, b) => a + b, 0);
    let binom = 1n;
    for (let i = 1; i < m && binom <= 200_000n; i++) binom = (binom * BigInt(d + i)) / BigInt(i);
    if (binom > 200_000n) fail(`${call} would have too many terms (degree ${d} in ${m} variables)`);
  }
}

defineFunction({
  name: 'toPolynomial',
  topic,
  params: [
    { name: 'f', type: SYM },
    { name: 'x', type: 'polynomial' },
    { name: 'm', type: 'integer' },
  ],
  returns: 'scalarOrPolynomial',
  description: 'the symmetric polynomial f(x[1], ..., x[m]) (s_lambda gives the Schur polynomial, 0 when lambda has more than m parts)',
  example: 'toPolynomial(elementarySym(2), x, 3)',
  exampleValue: 'x[1]*x[2] + x[1]*x[3] + x[2]*x[3]',
  source: `${MACDONALD_I}, I.2–I.3; tested against s_lambda(1^m) by the hook-content formula (Stanley, EC2, Cor. 7.21.4)`,
  impl: (f, x, m) => {
    const call = 'toPolynomial(f, x, m)';
    const mm = smallIntArg(call, 'm', m, 0, 64);
    const base = indexedBaseArg(call, 'x', x);
    refuseHuge(symArg(f), mm, call);
    return toPolynomialIn(symArg(f), base, mm);
  },
});

defineFunction({
  name: 'fromPolynomial',
  topic,
  params: [
    { name: 'P', type: 'scalarOrPolynomial' },
    { name: 'x', type: 'polynomial' },
    { name: 'm', type: 'integer' },
  ],
  returns: SYM,
  description:
    'the symmetric function with Schur terms of at most m parts whose specialisation to x[1..m] is P (an error if P is not symmetric in x[1..m]; other indeterminates are coefficients)',
  example: 'fromPolynomial(x[1]^2 + x[2]^2 + q*x[1]*x[2], x, 2)',
  exampleValue: 'schurSym([2]) + (q - 1)*schurSym([1, 1])',
  source: `${MACDONALD_I}, I.2–I.3 (the restricted Kostka matrix is unitriangular)`,
  impl: (P, x, m) => {
    const call = 'fromPolynomial(P, x, m)';
    return fromPolynomialIn(P as PolyLike, indexedBaseArg(call, 'x', x), smallIntArg(call, 'm', m, 0, 64), call);
  },
});

export { isSymmetricFunction };
