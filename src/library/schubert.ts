// Schubert calculus and symmetric polynomials (LIBRARY.md §2): Schubert, double Schubert
// and Grothendieck polynomials, Schur polynomials, divided differences, symmetry and
// real-rootedness tests. The indexed indeterminates are passed by their bare name (x for x[1],
// x[2], ...; see polyArgs.ts).

import { fail } from '../base/errors.js';
import { dividedDifference } from '../algebra/divided.js';
import { isPolynomial, pequals, polyText, type PolyLike } from '../algebra/polynomial.js';
import { renameVariables, univariateCoefficients } from '../algebra/polynomialOps.js';
import { doubleSchubertPolynomial, grothendieckPolynomial, schubertPolynomial, trimFixedTail } from '../algebra/schubertPolynomials.js';
import { schurPolynomial } from '../algebra/schur.js';
import { isRealRootedCoefficients } from '../algebra/sturm.js';
import { indexedVarId, varBase, varIndex } from '../algebra/variables.js';
import type { Permutation } from '../families/permutations/permutation.js';
import { hookContentCount } from '../families/tableaux/shapes.js';
import type { Structured } from '../values/structured.js';
import type { Value } from '../values/value.js';
import { smallIntArg } from './integerArgs.js';
import { indexedBaseArg, variableArg } from './polyArgs.js';
import { defineFunction } from './registry.js';

const topic = 'polynomials';
/** Beyond this the climb from w0 of S_m is too expensive to be a per-case computation. */
const SCHUBERT_MAX = 12;

function permArg(call: string, w: Value): number[] {
  const a = trimFixedTail((w as Permutation).a);
  if (a.length > SCHUBERT_MAX)
    fail(`${call} is limited to permutations that fix every point after ${SCHUBERT_MAX}; ${(w as Permutation).toText()} does not`);
  return a;
}

const SCHUBERT_SOURCE =
  'A. Lascoux, M.-P. Schützenberger, Polynômes de Schubert, C. R. Acad. Sci. Paris 294 (1982); tested against the pipe dream formula of S. Billey, W. Jockusch, R. Stanley, J. Algebraic Combin. 2 (1993) and N. Bergeron, S. Billey, Experiment. Math. 2 (1993), and the tables of I. G. Macdonald, Notes on Schubert Polynomials (1991)';

defineFunction({
  name: 'schubert',
  topic,
  params: [
    { name: 'w', type: 'permutation' },
    { name: 'x', type: 'polynomial' },
  ],
  returns: 'scalarOrPolynomial',
  description:
    'the Schubert polynomial S_w in x[1], x[2], ...: S_{w0} = x[1]^(n-1) x[2]^(n-2) ... x[n-1], S_{w s_i} = d_i S_w when inv(w s_i) < inv(w); memoised, and stable (S_w = S_{w×1})',
  example: 'schubert(perm([1, 4, 2, 3]), x)',
  exampleValue: 'x[1]^2 + x[1]*x[2] + x[2]^2',
  source: SCHUBERT_SOURCE,
  impl: (w, x) => schubertPolynomial(permArg('schubert(w, x)', w), indexedBaseArg('schubert(w, x)', 'x', x)),
});

defineFunction({
  name: 'doubleSchubert',
  topic,
  params: [
    { name: 'w', type: 'permutation' },
    { name: 'x', type: 'polynomial' },
    { name: 'y', type: 'polynomial' },
  ],
  returns: 'scalarOrPolynomial',
  description: 'the double Schubert polynomial S_w(x; y): top class prod_{i+j<=n} (x[i] - y[j]), divided differences in the x variables',
  example: 'doubleSchubert(perm([1, 3, 2]), x, y)',
  exampleValue: 'x[1] + x[2] - y[1] - y[2]',
  source:
    'A. Lascoux, M.-P. Schützenberger (1982); I. G. Macdonald, Notes on Schubert Polynomials (1991), ch. VI; tested: S_w(x; 0) = S_w(x) and S_w(x; x) = 0 for w != id',
  impl: (w, x, y) => {
    const call = 'doubleSchubert(w, x, y)';
    const bx = indexedBaseArg(call, 'x', x),
      by = indexedBaseArg(call, 'y', y);
    if (bx === by) fail(`${call} needs two different indeterminates, got ${bx} twice`);
    return doubleSchubertPolynomial(permArg(call, w), bx, by);
  },
});

defineFunction({
  name: 'grothendieck',
  topic,
  params: [
    { name: 'w', type: 'permutation' },
    { name: 'x', type: 'polynomial' },
  ],
  returns: 'scalarOrPolynomial',
  description:
    'the Grothendieck polynomial G_w in x[1], x[2], ...: G_{w0} = x[1]^(n-1) ... x[n-1], G_{w s_i} = pi_i G_w with pi_i f = d_i((1 - x[i+1]) f); its lowest-degree part is S_w (the β = −1 convention: the β-Grothendieck polynomial at β = −1)',
  example: 'grothendieck(perm([1, 3, 2]), x)',
  exampleValue: '-x[1]*x[2] + x[1] + x[2]',
  source:
    'A. Lascoux, M.-P. Schützenberger, C. R. Acad. Sci. Paris 295 (1982); tested against the K-theoretic pipe dream formula (S. Fomin, A. N. Kirillov, Grothendieck polynomials and the Yang–Baxter equation, 1994; "Gröbner geometry of Schubert polynomials", Ann. of Math. 161 (2005))',
  impl: (w, x) => grothendieckPolynomial(permArg('grothendieck(w, x)', w), indexedBaseArg('grothendieck(w, x)', 'x', x)),
});

/** More terms than this would take many seconds (fuzzing found schur(partition([3, 1]), x, 64): 766,416 terms, 25 s). */
const SCHUR_TERMS_MAX = 100_000;

/**
 * Refuse an s_lambda(x_1..x_m) with more than SCHUR_TERMS_MAX terms. Its monomials number at most
 * C(m + d - 1, d) for d = |lambda| (all monomials of degree d) and at most s_lambda(1^m), the
 * number of semistandard tableaux (each monomial has a positive coefficient).
 */
function refuseHugeSchur(parts: readonly number[], m: number): void {
  if (parts.length > m) return; // the polynomial is 0
  const d = parts.reduce((a, b) => a + b, 0);
  let binom = 1n; // C(m + d - 1, m - 1), built up exactly
  for (let i = 1; i < m && binom <= BigInt(SCHUR_TERMS_MAX); i++) binom = (binom * BigInt(d + i)) / BigInt(i);
  if (binom <= BigInt(SCHUR_TERMS_MAX)) return;
  if (d <= 5000 && hookContentCount(parts, m) <= BigInt(SCHUR_TERMS_MAX)) return;
  fail(
    `schur(lambda, x, m) would have more than ${SCHUR_TERMS_MAX.toLocaleString('en-US')} terms for lambda = [${parts.join(', ')}] and m = ${m}`,
  );
}

defineFunction({
  name: 'schur',
  topic: 'symmetric functions',
  params: [
    { name: 'lambda', type: 'partition' },
    { name: 'x', type: 'polynomial' },
    { name: 'm', type: 'integer' },
  ],
  returns: 'scalarOrPolynomial',
  description: 'the Schur polynomial s_lambda(x[1], ..., x[m]) (0 when lambda has more than m parts)',
  example: 'schur(partition([2, 1]), x, 2)',
  exampleValue: 'x[1]^2*x[2] + x[1]*x[2]^2',
  source:
    'I. G. Macdonald, Symmetric Functions and Hall Polynomials, 2nd ed., I (5.11) (branching); tested against the bialternant formula I (3.1) and the hook-content formula (Stanley, EC2, Cor. 7.21.4)',
  impl: (lambda, x, m) => {
    const call = 'schur(lambda, x, m)';
    const mm = smallIntArg(call, 'm', m, 0, 64);
    refuseHugeSchur((lambda as Structured & { parts: number[] }).parts, mm);
    return schurPolynomial((lambda as Structured & { parts: number[] }).parts, indexedBaseArg(call, 'x', x), mm);
  },
});

defineFunction({
  name: 'divDiff',
  topic,
  params: [
    { name: 'p', type: 'scalarOrPolynomial' },
    { name: 'x', type: 'polynomial' },
    { name: 'i', type: 'integer' },
  ],
  returns: 'scalarOrPolynomial',
  description: 'the divided difference d_i p = (p - s_i p) / (x[i] - x[i+1]), s_i exchanging x[i] and x[i+1]',
  example: 'divDiff(x[1]^2, x, 1)',
  exampleValue: 'x[1] + x[2]',
  source: 'I. G. Macdonald, Notes on Schubert Polynomials (1991), ch. II; tested against (p - s_i p) / (x[i] - x[i+1]) by exact division',
  impl: (p, x, i) => {
    const call = 'divDiff(p, x, i)';
    const base = indexedBaseArg(call, 'x', x);
    const ii = smallIntArg(call, 'i', i, 1, 1_000_000);
    return dividedDifference(p as PolyLike, indexedVarId(base, ii), indexedVarId(base, ii + 1));
  },
});

/** The variables of an isSymmetric call: a list of variables, or x with x[1..m]. */
function symmetricVars(call: string, p: PolyLike, vars: Value, m: Value | undefined): number[] {
  if (Array.isArray(vars)) {
    const ids = (vars as Value[]).map((v, k) => variableArg(call, `entry ${k + 1} of vars`, v));
    if (new Set(ids).size !== ids.length) fail(`${call}: the list of variables repeats a variable`);
    return ids;
  }
  const base = indexedBaseArg(call, 'vars', vars);
  let count: number;
  if (m !== undefined) count = smallIntArg(call, 'm', m, 0, 1_000_000);
  else {
    count = 0;
    if (isPolynomial(p))
      for (const id of p.vars) {
        const i = varIndex(id);
        if (varBase(id) === base && i !== null) {
          if (i < 1) fail(`${call}: ${polyText(p)} contains ${base}[${i}]; the family ${base} starts at ${base}[1]`);
          count = Math.max(count, i);
        }
      }
  }
  return Array.from({ length: count }, (_, k) => indexedVarId(base, k + 1));
}

defineFunction({
  name: 'isSymmetric',
  topic: 'symmetric functions',
  params: [
    { name: 'p', type: 'scalarOrPolynomial' },
    { name: 'vars', type: ['list', 'polynomial'] },
    { name: 'm', type: 'integer', optional: true },
  ],
  returns: 'boolean',
  description:
    'whether p is unchanged by every permutation of the variables: a list [x[1], x[2], q], or a bare name x meaning x[1..m] (m defaults to the largest index of x in p)',
  example: 'isSymmetric(x[1]^2*x[2] + x[1]*x[2]^2, x)',
  exampleValue: 'true',
  source: 'definition (checked on adjacent transpositions, which generate the symmetric group)',
  impl: (p, vars, m) => {
    const poly = p as PolyLike;
    const ids = symmetricVars('isSymmetric(p, vars)', poly, vars, m);
    for (let k = 0; k + 1 < ids.length; k++) {
      const swap = new Map([
        [ids[k], ids[k + 1]],
        [ids[k + 1], ids[k]],
      ]);
      if (!pequals(renameVariables(poly, swap), poly)) return false;
    }
    return true;
  },
});

defineFunction({
  name: 'isRealRooted',
  topic,
  params: [
    { name: 'p', type: 'scalarOrPolynomial' },
    { name: 'q', type: 'polynomial' },
  ],
  returns: 'boolean',
  description:
    'whether every complex root of the nonzero polynomial p in q alone is real (multiple roots allowed; constants are real-rooted); exact, by Sturm sequences',
  example: 'isRealRooted(q^3 + 4*q^2 + q, q)',
  exampleValue: 'true',
  source:
    "Sturm's theorem (e.g. S. Basu, R. Pollack, M.-F. Roy, Algorithms in Real Algebraic Geometry, Thm 2.50); tested on Eulerian polynomials (OEIS A008292, real-rooted by Frobenius) and products of linear factors",
  impl: (p, q) => {
    const call = 'isRealRooted(p, q)';
    const id = variableArg(call, 'q', q);
    const c = univariateCoefficients(p as PolyLike, id);
    if (c.length === 0) fail(`${call}: the zero polynomial has no well-defined roots`);
    return isRealRootedCoefficients(c);
  },
});
