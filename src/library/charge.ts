// Charge and cocharge of words, permutations and tableaux, and the Kostka–Foulkes polynomials
// K_{lambda mu}(t), their generating function over semistandard tableaux.

import { fail } from '../base/errors.js';
import type { PolyLike } from '../algebra/polynomial.js';
import { evaluateCoefficients } from '../algebra/polynomialOps.js';
import { Permutation } from '../families/permutations/permutation.js';
import { Tableau } from '../families/tableaux/tableau.js';
import { Word } from '../families/words/word.js';
import { readingWordOf } from '../families/tableaux/tableauOrder.js';
import { partitionArg, sizeOf } from '../families/tableaux/shapes.js';
import { valueToText } from '../values/operations.js';
import type { Value } from '../values/value.js';
import { defineFunction, type ParamDecl } from './registry.js';
import { charge, kostkaFoulkesCoefficients, nOf, partitionContent } from './words/charge.js';

const X: ParamDecl[] = [{ name: 'w', type: ['word', 'permutation', 'tableau', 'list'] }];
const KF_MAX = 14;

function letters(v: Value, call: string): number[] {
  if (v instanceof Word) return v.letters;
  if (v instanceof Permutation) return v.a;
  if (v instanceof Tableau) return readingWordOf(v.rows);
  if (Array.isArray(v) && v.every((x) => typeof x === 'number' && Number.isSafeInteger(x) && x >= 1)) return v as number[];
  fail(`${call} takes a word, a permutation, a tableau or a list of positive integers, got ${valueToText(v)}`);
}

defineFunction({
  name: 'charge',
  topic: 'words',
  params: X,
  returns: 'integer',
  description:
    'the Lascoux–Schützenberger charge of a word whose content is a partition (of a tableau: of its reading word), by standard subwords',
  example: 'charge(word([2, 1, 1, 2]))',
  exampleValue: '1',
  source:
    'Macdonald, Symmetric Functions and Hall Polynomials, III.6 (Lascoux and Schützenberger 1978); sums to K_{lambda mu}(t), Macdonald III.6 tables',
  impl: (w) => charge(letters(w, 'charge(w)'), 'charge(w)'),
});

defineFunction({
  name: 'cocharge',
  topic: 'words',
  params: X,
  returns: 'integer',
  description: 'n(mu) - charge(w) for a word of partition content mu, n(mu) = sum (i-1) mu_i (of a tableau: of its reading word)',
  example: 'cocharge(word([2, 1, 1, 2]))',
  exampleValue: '1',
  source: 'Macdonald, Symmetric Functions and Hall Polynomials, III.6 (t^n(mu) K_{lambda mu}(1/t), the cocharge Kostka–Foulkes polynomial)',
  impl: (w) => {
    const a = letters(w, 'cocharge(w)');
    const k = charge(a, 'cocharge(w)');
    return nOf(partitionContent(a)!) - k;
  },
});

defineFunction({
  name: 'kostkaFoulkes',
  topic: 'symmetric functions',
  params: [
    { name: 'lambda', type: ['partition', 'list'] },
    { name: 'mu', type: ['partition', 'list'] },
    { name: 't', type: 'scalarOrPolynomial' },
  ],
  returns: 'scalarOrPolynomial',
  description:
    'the Kostka–Foulkes polynomial K_{lambda mu}(t): the sum of t^charge(T) over the semistandard tableaux T of shape lambda and content mu',
  example: 'kostkaFoulkes(partition([2, 1]), partition([1, 1, 1]), t)',
  exampleValue: 't^2 + t',
  source:
    'Lascoux and Schützenberger, C. R. Acad. Sci. Paris 286 (1978); Macdonald, Symmetric Functions and Hall Polynomials, III.6 (tables for n <= 6)',
  impl: (l, m, t) => {
    const lambda = partitionArg(l, 'lambda'),
      mu = partitionArg(m, 'mu');
    if (sizeOf(lambda) !== sizeOf(mu)) fail(`kostkaFoulkes(lambda, mu, t) needs |lambda| = |mu|, got ${sizeOf(lambda)} and ${sizeOf(mu)}`);
    if (sizeOf(mu) > KF_MAX) fail(`kostkaFoulkes(lambda, mu, t) is limited to partitions of n <= ${KF_MAX}`);
    return evaluateCoefficients(kostkaFoulkesCoefficients(lambda, mu), t as PolyLike);
  },
});
