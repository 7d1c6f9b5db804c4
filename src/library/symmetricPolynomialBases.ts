// Polynomial bases beyond Schur (LIBRARY.md, "Symmetric functions"): the expansion of a polynomial
// in Schubert polynomials, key polynomials (Demazure characters) and Demazure atoms, and Stanley
// symmetric functions with their Schur expansion by Edelman–Greene tableaux.

import { fail } from '../base/errors.js';
import type { PolyLike } from '../algebra/polynomial.js';
import { keyFamily } from '../algebra/symmetric/keyPolynomials.js';
import { padTo } from '../algebra/symmetric/permutationWords.js';
import { schubertExpansion } from '../algebra/symmetric/schubertExpansion.js';
import { stanleySchurCoefficients } from '../algebra/symmetric/stanley.js';
import { TermMap } from '../algebra/symmetric/symmetricFunction.js';
import { trimFixedTail } from '../algebra/schubertPolynomials.js';
import { Composition } from '../families/compositions/composition.js';
import { Permutation } from '../families/permutations/permutation.js';
import { valueToText } from '../values/operations.js';
import type { Value } from '../values/value.js';
import { indexedBaseArg } from './polyArgs.js';
import { defineFunction } from './registry.js';

const topic = 'symmetric functions';
const KEY_MAX_LENGTH = 10,
  KEY_MAX_SIZE = 24,
  STANLEY_MAX = 8;

function weakCompositionArg(call: string, v: Value): number[] {
  let a: readonly unknown[] | undefined;
  if (v instanceof Composition) a = v.parts;
  else if (Array.isArray(v)) a = v;
  if (!a || !a.every((x) => typeof x === 'number' && Number.isSafeInteger(x) && x >= 0)) {
    fail(`${call} needs a list of nonnegative integers (a weak composition), got ${valueToText(v)}`);
  }
  const alpha = a as number[];
  if (alpha.length > KEY_MAX_LENGTH) fail(`${call} is limited to ${KEY_MAX_LENGTH} entries, got ${alpha.length}`);
  if (alpha.reduce((s, x) => s + x, 0) > KEY_MAX_SIZE) fail(`${call} is limited to entries adding up to at most ${KEY_MAX_SIZE}`);
  return alpha;
}

const KEY_SOURCE =
  'A. Lascoux, M.-P. Schützenberger, Keys & standard bases, in Invariant Theory and Tableaux, IMA Vol. Math. Appl. 19 (1990); V. Reiner, M. Shimozono, Key polynomials and a flagged Littlewood–Richardson rule, J. Combin. Theory Ser. A 70 (1995)';

defineFunction({
  name: 'key',
  topic,
  params: [
    { name: 'alpha', type: ['list', 'composition'] },
    { name: 'x', type: 'polynomial' },
  ],
  returns: 'scalarOrPolynomial',
  description:
    'the key polynomial (Demazure character) kappa_alpha in x[1..len(alpha)]: x^alpha for weakly decreasing alpha, else pi_i kappa_{s_i alpha} for alpha_i < alpha_{i+1}, pi_i f = d_i(x[i] f); a weakly increasing alpha gives a Schur polynomial',
  example: 'key([0, 2, 1], x)',
  exampleValue: 'x[1]^2*x[2] + x[1]^2*x[3] + x[1]*x[2]^2 + x[1]*x[2]*x[3] + x[2]^2*x[3]',
  source: `${KEY_SOURCE}; tested: dominant alpha gives x^alpha, antidominant alpha the Schur polynomial, and the atoms of the rearrangements of lambda add up to s_lambda`,
  impl: (a, x) => keyFamily(weakCompositionArg('key(alpha, x)', a), indexedBaseArg('key(alpha, x)', 'x', x), false),
});

defineFunction({
  name: 'keyAtom',
  topic,
  params: [
    { name: 'alpha', type: ['list', 'composition'] },
    { name: 'x', type: 'polynomial' },
  ],
  returns: 'scalarOrPolynomial',
  description:
    'the Demazure atom A_alpha in x[1..len(alpha)]: x^alpha for weakly decreasing alpha, else (pi_i - 1) A_{s_i alpha} for alpha_i < alpha_{i+1}; kappa_alpha is a sum of atoms',
  example: 'keyAtom([0, 1], x)',
  exampleValue: 'x[2]',
  source: `${KEY_SOURCE}; S. Mason, An explicit construction of type A Demazure atoms, J. Algebraic Combin. 29 (2009)`,
  impl: (a, x) => keyFamily(weakCompositionArg('keyAtom(alpha, x)', a), indexedBaseArg('keyAtom(alpha, x)', 'x', x), true),
});

defineFunction({
  name: 'schubertExpand',
  topic,
  params: [
    { name: 'P', type: 'scalarOrPolynomial' },
    { name: 'x', type: 'polynomial' },
  ],
  returns: 'list',
  description:
    'the coefficients of P in the Schubert basis: a list of [permutation, coefficient] pairs with P = sum c_w S_w(x), permutations of one common size in lexicographic order; indeterminates other than x[i] (q, y[j], ...) stay in the coefficients',
  example: 'schubertExpand(schubert(perm([1, 3, 2]), x) * schubert(perm([2, 1, 3]), x), x)',
  exampleValue: '[[perm([2, 3, 1]), 1], [perm([3, 1, 2]), 1]]',
  source:
    "I. G. Macdonald, Notes on Schubert Polynomials (1991), (4.11) (leading term x^code(w)); tested against Monk's rule (D. Monk, The geometry of flag manifolds, Proc. London Math. Soc. 9 (1959))",
  impl: (P, x) => {
    const call = 'schubertExpand(P, x)';
    const pairs = schubertExpansion(P as PolyLike, indexedBaseArg(call, 'x', x), call);
    const n = Math.max(1, ...pairs.map(([w]) => w.length));
    const rows = pairs.map(([w, c]) => [padTo(w, n), c] as [number[], PolyLike]);
    rows.sort((a, b) => {
      for (let i = 0; i < n; i++) if (a[0][i] !== b[0][i]) return a[0][i] - b[0][i];
      return 0;
    });
    return rows.map(([w, c]) => [new Permutation(w), c] as Value);
  },
});

defineFunction({
  name: 'stanleySym',
  topic,
  params: [{ name: 'w', type: 'permutation' }],
  returns: 'symmetric',
  description:
    'the Stanley symmetric function F_w = lim S_{1^m × w}, in the Schur basis: the coefficient of s_lambda counts the increasing tableaux of shape lambda whose reading word (bottom row first, each row left to right) is a reduced word of w^-1 (Edelman–Greene)',
  example: 'stanleySym(perm([3, 2, 1]))',
  exampleValue: 'schurSym([2, 1])',
  source:
    'R. Stanley, On the number of reduced decompositions of elements of Coxeter groups, European J. Combin. 5 (1984); P. Edelman, C. Greene, Balanced tableaux, Adv. Math. 63 (1987); tested against F_{w0} = s_staircase and S_{1^m × w}(x_1..x_m)',
  impl: (w) => {
    const a = trimFixedTail((w as Permutation).a);
    if (a.length > STANLEY_MAX)
      fail(`stanleySym(w) is limited to permutations that fix every point after ${STANLEY_MAX}; ${(w as Permutation).toText()} does not`);
    const m = new TermMap();
    for (const [lam, c] of stanleySchurCoefficients(a)) m.add(lam, c);
    return m.result();
  },
});
