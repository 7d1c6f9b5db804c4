// Signed permutations (type B): the constructor, the Coxeter length, type B descents, the flag
// major index and the number of negative entries (Björner and Brenti, Combinatorics of Coxeter
// Groups, ch. 8).

import { fail } from '../base/errors.js';
import { SignedPermutation } from '../families/signedPermutations/signedPermutation.js';
import { desB, fmaj, lengthB, negatives } from '../families/signedPermutations/statistics.js';
import type { Value } from '../values/value.js';
import { valueToText } from '../values/operations.js';
import { defineFunction, type ParamDecl } from './registry.js';

const topic = 'signed permutations';
const W: ParamDecl[] = [{ name: 'w', type: 'signedPermutation' }];
const a = (w: Value): number[] => (w as SignedPermutation).a;

defineFunction({
  name: 'signedPermutation',
  topic,
  params: [{ name: 'values', type: 'list' }],
  returns: 'signedPermutation',
  description: 'the signed permutation with window [w(1), ..., w(n)]: the absolute values are 1..n, each once',
  example: 'signedPermutation([-2, 1, 3])',
  exampleValue: 'signedPermutation([-2, 1, 3])',
  source: 'definition (Björner and Brenti, Combinatorics of Coxeter Groups, §8.1)',
  impl: (v) => {
    if (!Array.isArray(v) || !v.every((x) => typeof x === 'number'))
      fail(`a signed permutation is a list of nonzero integers, got ${valueToText(v)}`);
    return SignedPermutation.from(v as number[]);
  },
});

defineFunction({
  name: 'lengthB',
  topic,
  params: W,
  returns: 'integer',
  description: 'the Coxeter length in B_n (generators: negate w(1); exchange w(i), w(i+1)): inv(w) + neg(w) + #{i < j : w(i) + w(j) < 0}',
  example: 'lengthB(signedPermutation([-2, 1, 3]))',
  exampleValue: '2',
  source: 'Björner and Brenti, Combinatorics of Coxeter Groups, Prop. 8.1.1; generating function prod [2i]_q, ibid. ch. 8 (OEIS A128084)',
  impl: (w) => lengthB(a(w)),
});

defineFunction({
  name: 'desB',
  topic,
  params: W,
  returns: 'integer',
  description: 'the type B descents: #{i in 0..n-1 : w(i) > w(i+1)} with w(0) = 0',
  example: 'desB(signedPermutation([-2, 1, 3]))',
  exampleValue: '1',
  source: 'Björner and Brenti, Combinatorics of Coxeter Groups, Prop. 8.1.2; type B Eulerian numbers, OEIS A060187',
  impl: (w) => desB(a(w)),
});

defineFunction({
  name: 'fmaj',
  topic,
  params: W,
  returns: 'integer',
  description: 'the flag major index 2 maj(w) + neg(w), maj over i in 1..n-1 with w(i) > w(i+1); equidistributed with lengthB',
  example: 'fmaj(signedPermutation([2, -1, 3]))',
  exampleValue: '3',
  source: 'Adin and Roichman, European J. Combin. 22 (2001); Björner and Brenti, Combinatorics of Coxeter Groups, ch. 8 notes',
  impl: (w) => fmaj(a(w)),
});

defineFunction({
  name: 'negatives',
  topic,
  params: W,
  returns: 'integer',
  description: 'neg(w): the number of negative entries of the window',
  example: 'negatives(signedPermutation([-2, 1, -3]))',
  exampleValue: '2',
  source:
    'definition (Björner and Brenti, Combinatorics of Coxeter Groups, §8.1); binomial(n, k) n! signed permutations have k negative entries',
  impl: (w) => negatives(a(w)),
});
