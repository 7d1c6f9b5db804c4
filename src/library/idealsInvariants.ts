// Ideals and varieties, invariants (LIBRARY.md "Ideals and varieties"), all through an initial
// ideal (src/algebra/ideals/invariants.ts says what is computed for non-homogeneous ideals):
// Krull dimension, codimension, Hilbert numerator and function, multidegree, K-polynomial, and the
// Stanley–Reisner tests of monomial ideals. `degree` (of a polynomial or an ideal) is in
// polynomials.ts.

import { Ideal } from '../algebra/ideals/ideal.js';
import {
  idealDimensionData,
  idealHilbertFunction,
  idealHilbertNumerator,
  idealKPolynomial,
  idealMultidegree,
} from '../algebra/ideals/invariants.js';
import { facetsOf } from '../algebra/monomialIdeals/stanleyReisner.js';
import { idealShouldStop } from '../algebra/ideals/stop.js';
import type { MonomialIdeal } from '../algebra/monomialIdeals/monomialIdeal.js';
import { fromTerms, variable } from '../algebra/polynomial.js';
import { varName } from '../algebra/variables.js';
import { fail } from '../base/errors.js';
import type { Int } from '../numbers/integer.js';
import type { Value } from '../values/value.js';
import { smallIntArg } from './integerArgs.js';
import { indexedBaseArg, variableArg } from './polyArgs.js';
import { defineFunction } from './registry.js';

const topic = 'ideals';
const HILBERT =
  "Hilbert series through the initial ideal (Cox, Little, O'Shea, Ideals, Varieties, and Algorithms, ch. 9 §3), numerator by the pivot algorithm of A. M. Bigatti, J. Pure Appl. Algebra 119 (1997); tested against a count of standard monomials, the determinantal formulas of W. Bruns, U. Vetter, Determinantal Rings, LNM 1327, and the commuting variety (OEIS A029729)";
const MULTI =
  'Gröbner geometry of Schubert polynomials, Ann. of Math. 161 (2005), §1; E. Miller, B. Sturmfels, Combinatorial Commutative Algebra, GTM 227, ch. 8; tested: matrix Schubert ideals of S_4, S_5 give Schubert and Grothendieck polynomials';

defineFunction({
  name: 'dim',
  topic,
  params: [{ name: 'I', type: 'ideal' }],
  returns: 'integer',
  description: 'the Krull dimension of S/I (of the affine variety V(I) for a non-homogeneous I; -1 for the whole ring), S the ring of I',
  example: 'dim(ideal(entries(genericMatrix(x, 2, 2) * genericMatrix(y, 2, 2) - genericMatrix(y, 2, 2) * genericMatrix(x, 2, 2))))',
  exampleValue: '6',
  source: `${HILBERT}; commuting variety of 2×2 pairs: dimension n^2 + n (T. S. Motzkin, O. Taussky, Trans. Amer. Math. Soc. 80 (1955))`,
  impl: (I) => idealDimensionData(I as Ideal).dim,
});

defineFunction({
  name: 'codim',
  topic,
  params: [{ name: 'I', type: 'ideal' }],
  returns: 'integer',
  description: 'the codimension (height) of I: the number of variables of its ring minus dim(I)',
  example: 'codim(matrixSchubertIdeal(perm([3, 1, 4, 2]), x))',
  exampleValue: '3',
  source: `${HILBERT}; codim of a matrix Schubert ideal is inv(w) (W. Fulton, Duke Math. J. 65 (1992))`,
  impl: (I) => idealDimensionData(I as Ideal).codim,
});

defineFunction({
  name: 'hilbertNumerator',
  topic,
  params: [
    { name: 'I', type: 'ideal' },
    { name: 't', type: 'polynomial' },
  ],
  returns: 'scalarOrPolynomial',
  description:
    'the numerator N(t) of the Hilbert series of S/I = N(t) / (1 - t)^n, n the number of variables of the ring (the Z-graded K-polynomial); I homogeneous',
  example: 'hilbertNumerator(ideal(minors(genericMatrix(x, 2, 3), 2)), t)',
  exampleValue: '2*t^3 - 3*t^2 + 1',
  source: HILBERT,
  impl: (I, t) => {
    const id = variableArg('hilbertNumerator(I, t)', 't', t);
    const c = idealHilbertNumerator(I as Ideal);
    const terms: [number[], Int][] = [];
    c.forEach((x, d) => {
      if (x !== 0) terms.push([[d], x]);
    });
    return fromTerms([id], terms);
  },
});

defineFunction({
  name: 'hilbertFunction',
  topic,
  params: [
    { name: 'I', type: 'ideal' },
    { name: 'd', type: 'integer' },
  ],
  returns: 'integer',
  description: 'the dimension of the degree-d part of S/I (I homogeneous)',
  example: 'hilbertFunction(ideal(minors(genericMatrix(x, 2, 3), 2)), 2)',
  exampleValue: '18',
  source: HILBERT,
  impl: (I, d) => idealHilbertFunction(I as Ideal, smallIntArg('hilbertFunction(I, d)', 'd', d, -1_000_000, 1_000_000)),
});

defineFunction({
  name: 'multidegree',
  topic,
  params: [
    { name: 'I', type: 'ideal' },
    { name: 'x', type: 'polynomial' },
    { name: 'y', type: 'polynomial', optional: true },
  ],
  returns: 'scalarOrPolynomial',
  description: 'the multidegree of S/I for the grading deg z[i, j] = x[i] (with y: x[i] - y[j]); I must be homogeneous for it',
  example: 'multidegree(matrixSchubertIdeal(perm([1, 4, 3, 2]), y), x)',
  exampleValue: 'x[1]^2*x[2] + x[1]^2*x[3] + x[1]*x[2]^2 + x[1]*x[2]*x[3] + x[2]^2*x[3]',
  source: MULTI,
  impl: (I, x, y) => {
    const call = 'multidegree(I, x, y)';
    return idealMultidegree(I as Ideal, indexedBaseArg(call, 'x', x), y === undefined ? undefined : indexedBaseArg(call, 'y', y));
  },
});

defineFunction({
  name: 'kPolynomial',
  topic,
  params: [
    { name: 'I', type: 'ideal' },
    { name: 'x', type: 'polynomial' },
    { name: 'y', type: 'polynomial', optional: true },
  ],
  returns: 'scalarOrPolynomial',
  description:
    'the K-polynomial of S/I for deg z[i, j] = x[i], written in x[i] = 1 - t_i (t_i the class of degree x[i]), so that its lowest-degree part is the multidegree; with y (deg z[i, j] = x[i] - y[j], torus weight t_i/u_j) also 1/u_j = 1 - y[j], which gives the β = -1 double Grothendieck polynomial with top class prod (x[i] + y[j] - x[i]*y[j])',
  example: 'kPolynomial(matrixSchubertIdeal(perm([1, 3, 2]), y), x)',
  exampleValue: '-x[1]*x[2] + x[1] + x[2]',
  source: MULTI,
  impl: (I, x, y) => {
    const call = 'kPolynomial(I, x, y)';
    return idealKPolynomial(I as Ideal, indexedBaseArg(call, 'x', x), y === undefined ? undefined : indexedBaseArg(call, 'y', y));
  },
});

function monomialArg(call: string, I: Ideal): MonomialIdeal {
  const M = I.asMonomialIdeal();
  if (!M) fail(`${call} needs an ideal generated by monomials, such as initialIdeal(I, order); ${I.toText().slice(0, 80)} is not one`);
  return M;
}

defineFunction({
  name: 'isSquarefree',
  topic,
  params: [{ name: 'I', type: 'ideal' }],
  returns: 'boolean',
  description: 'whether a monomial ideal is generated by squarefree monomials (is a Stanley–Reisner ideal)',
  example: 'isSquarefree(initialIdeal(ideal(minors(genericMatrix(x, 2, 3), 2)), "antidiagonal"))',
  exampleValue: 'true',
  source: 'R. Stanley, Combinatorics and Commutative Algebra, 2nd ed., ch. II (definition)',
  impl: (I) => monomialArg('isSquarefree(I)', I as Ideal).isSquarefree(),
});

defineFunction({
  name: 'facets',
  topic,
  params: [{ name: 'I', type: 'ideal' }],
  returns: 'list',
  description:
    'the facets of the Stanley–Reisner complex of a squarefree monomial ideal, each a list of variables (largest facets first); their complements generate the minimal primes',
  example: 'facets(ideal([x[1]*x[2], x[2]*x[3]]))',
  exampleValue: '[[x[1], x[3]], [x[2]]]',
  source:
    'R. Stanley, Combinatorics and Commutative Algebra, 2nd ed., ch. II; tested: for matrix Schubert ideals the facets are the complements of the reduced pipe dreams ("Gröbner geometry of Schubert polynomials", Ann. of Math. 161 (2005), Thm B)',
  impl: (I) => {
    const M = monomialArg('facets(I)', I as Ideal);
    return facetsOf(M, { shouldStop: idealShouldStop }).map((f) => f.map((v) => variable(varName(M.vars[v])))) as Value[];
  },
});
