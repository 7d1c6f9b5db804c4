// The combinatorics around Schubert polynomials: Rothe diagrams and essential sets, vexillary and
// dominant permutations, the Demazure product, Kazhdan–Lusztig polynomials, the weight of a pipe
// dream and beta-Grothendieck polynomials.

import { fail } from '../base/errors.js';
import { pmul, variable, type PolyLike } from '../algebra/polynomial.js';
import { evaluateCoefficients } from '../algebra/polynomialOps.js';
import { trimFixedTail } from '../algebra/schubertPolynomials.js';
import { Permutation } from '../families/permutations/permutation.js';
import { PipeDream } from '../families/pipeDreams/pipeDream.js';
import type { Value } from '../values/value.js';
import { defineFunction, type ParamDecl } from './registry.js';
import { indexedBaseArg } from './polyArgs.js';
import { demazureProduct, essentialSet, isDominant, isVexillary, rotheDiagram } from './schubert/diagrams.js';
import { klPolynomial } from './schubert/kazhdanLusztig.js';
import { betaGrothendieck } from './schubert/betaGrothendieck.js';

const topic = 'schubert';
const W: ParamDecl[] = [{ name: 'w', type: 'permutation' }];
const a = (w: Value): number[] => (w as Permutation).a;
const KL_MAX = 6;
const BETA_MAX = 9;

defineFunction({
  name: 'rotheDiagram',
  topic,
  params: W,
  returns: 'list',
  description: 'the Rothe diagram D(w): the cells [i, j] with w[i] > j and w^-1[j] > i, by rows (inv(w) cells)',
  example: 'rotheDiagram(perm([3, 1, 4, 2]))',
  exampleValue: '[[1, 1], [1, 2], [3, 2]]',
  source: 'Macdonald, Notes on Schubert Polynomials (1991), (1.8); Fulton, Duke Math. J. 65 (1992), §1',
  impl: (w) => rotheDiagram(a(w)),
});

defineFunction({
  name: 'essentialSet',
  topic,
  params: W,
  returns: 'list',
  description: "Fulton's essential set: the cells [i, j] of D(w) with neither [i+1, j] nor [i, j+1] in D(w)",
  example: 'essentialSet(perm([2, 1, 4, 3]))',
  exampleValue: '[[1, 1], [3, 3]]',
  source: 'Fulton, "Flags, Schubert polynomials, degeneracy loci, and determinantal formulas", Duke Math. J. 65 (1992), §3',
  impl: (w) => essentialSet(a(w)),
});

defineFunction({
  name: 'isVexillary',
  topic,
  params: W,
  returns: 'boolean',
  description: 'whether w is vexillary: it avoids the pattern 2143',
  example: 'isVexillary(perm([2, 1, 4, 3]))',
  exampleValue: 'false',
  source: 'Macdonald, Notes on Schubert Polynomials (1991), ch. I; counted by OEIS A005802 (Gessel; West)',
  impl: (w) => isVexillary(a(w)),
});

defineFunction({
  name: 'isDominant',
  topic,
  params: W,
  returns: 'boolean',
  description:
    'whether w is dominant: it avoids 132, equivalently D(w) is the diagram of a partition at the corner [1, 1] (then S_w is a monomial)',
  example: 'isDominant(perm([3, 1, 2]))',
  exampleValue: 'true',
  source: 'Macdonald, Notes on Schubert Polynomials (1991), (1.30); counted by the Catalan numbers, OEIS A000108',
  impl: (w) => isDominant(a(w)),
});

defineFunction({
  name: 'demazureProduct',
  topic,
  params: [
    { name: 'u', type: 'permutation' },
    { name: 'v', type: 'permutation' },
  ],
  returns: 'permutation',
  description: 'the Demazure (0-Hecke) product u ⋆ v: u times the letters s_i of a reduced word of v, each only when it lengthens',
  example: 'demazureProduct(perm([2, 1, 3]), perm([2, 1, 3]))',
  exampleValue: 'perm([2, 1, 3])',
  source: '"Subword complexes in Coxeter groups", Adv. Math. 184 (2004), §3; the Bruhat-largest of the products x y with x <= u, y <= v',
  impl: (u, v) => {
    if (a(u).length !== a(v).length) fail(`demazureProduct(u, v) needs permutations of the same n, got ${a(u).length} and ${a(v).length}`);
    return new Permutation(demazureProduct(a(u), a(v)));
  },
});

defineFunction({
  name: 'kazhdanLusztig',
  topic,
  params: [
    { name: 'u', type: 'permutation' },
    { name: 'w', type: 'permutation' },
    { name: 'q', type: 'scalarOrPolynomial' },
  ],
  returns: 'scalarOrPolynomial',
  description: 'the Kazhdan–Lusztig polynomial P_{u,w}(q) of the symmetric group (0 unless u <= w in Bruhat order), for n <= 6',
  example: 'kazhdanLusztig(perm([1, 2, 3, 4]), perm([3, 4, 1, 2]), q)',
  exampleValue: 'q + 1',
  source: 'Kazhdan and Lusztig, Invent. Math. 53 (1979); the recursion of Björner and Brenti, Combinatorics of Coxeter Groups, Thm 5.1.7',
  impl: (u, w, q) => {
    if (a(u).length !== a(w).length)
      fail(`kazhdanLusztig(u, w, q) needs permutations of the same n, got ${a(u).length} and ${a(w).length}`);
    const n = Math.max(trimFixedTail(a(u)).length, trimFixedTail(a(w)).length);
    if (n > KL_MAX) fail(`kazhdanLusztig(u, w, q) is limited to permutations that fix every point after ${KL_MAX}`);
    return evaluateCoefficients(klPolynomial(a(u).slice(0, n), a(w).slice(0, n)), q as PolyLike);
  },
});

defineFunction({
  name: 'pipeWeight',
  topic,
  params: [
    { name: 'P', type: 'pipeDream' },
    { name: 'x', type: 'polynomial' },
  ],
  returns: 'scalarOrPolynomial',
  description:
    'the weight x^P of a pipe dream: the product of x[i] over its crosses [i, j]; summed over pipeDreams(w) it gives schubert(w, x)',
  example: 'pipeWeight(pipeDream([[1, 1], [1, 2], [2, 1]]), x)',
  exampleValue: 'x[1]^2*x[2]',
  source: 'Billey, Jockusch and Stanley, J. Algebraic Combin. 2 (1993); Bergeron and Billey, Experiment. Math. 2 (1993)',
  impl: (p, x) => {
    const base = indexedBaseArg('pipeWeight(P, x)', 'x', x);
    let r: PolyLike = 1;
    for (const [i] of (p as PipeDream).crosses) r = pmul(r, variable(`${base}[${i}]`));
    return r;
  },
});

defineFunction({
  name: 'betaGrothendieck',
  topic,
  params: [
    { name: 'w', type: 'permutation' },
    { name: 'x', type: 'polynomial' },
    { name: 'beta', type: 'scalarOrPolynomial' },
  ],
  returns: 'scalarOrPolynomial',
  description:
    'the beta-Grothendieck polynomial: G_{w0} = x[1]^(n-1) ... x[n-1], G_{w s_i} = pi_i G_w with pi_i f = d_i((1 + beta x[i+1]) f); beta = -1 gives grothendieck(w, x), beta = 0 schubert(w, x)',
  example: 'betaGrothendieck(perm([1, 3, 2]), x, t)',
  exampleValue: 't*x[1]*x[2] + x[1] + x[2]',
  source:
    'Fomin and Kirillov, "Grothendieck polynomials and the Yang–Baxter equation" (1994); tested against grothendieck and schubert at beta = -1, 0',
  impl: (w, x, beta) => {
    const m = trimFixedTail(a(w)).length;
    if (m > BETA_MAX) fail(`betaGrothendieck(w, x, beta) is limited to permutations that fix every point after ${BETA_MAX}`);
    return betaGrothendieck(a(w), indexedBaseArg('betaGrothendieck(w, x, beta)', 'x', x), beta as PolyLike);
  },
});
