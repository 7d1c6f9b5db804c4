// The two spellings of a comprehension (FORMAT.md §3 "Comprehensions"): the binder-first form
// `sum(v in S: body)` and the body-first form `sum(body for v in S)` parse to the same tree and
// evaluate to the same value. Each value below is also checked against its source.

import { describe, expect, test } from 'vitest';
import { evaluate, parseExpression, stripPositions, textOrigin } from '../../../src/language/expr/index.js';
import { valueToText } from '../../../src/values/operations.js';
import '../../../src/families/index.js';
import '../../../src/library/index.js';

const parse = (t: string) => stripPositions(parseExpression(t, textOrigin('f.yaml', t)));
const show = (t: string) => valueToText(evaluate(t, [], ['q', 'x', 't']));

// [binder first, body first, expected value, source of the value]
const PAIRS: Array<[string, string, string, string]> = [
  ['sum(i in 1..10: i^2)', 'sum(i^2 for i in 1..10)', '385', '10·11·21/6, the sum of squares formula'],
  ['product(i in 1..6: i)', 'product(i for i in 1..6)', '720', '6! (OEIS A000142)'],
  [
    'sum(w in permutations(4): q^inv(w))',
    'sum(q^inv(w) for w in permutations(4))',
    'q^6 + 3*q^5 + 5*q^4 + 6*q^3 + 5*q^2 + 3*q + 1',
    'Mahonian numbers, row 4 (OEIS A008302)',
  ],
  [
    'distribution(w in permutations(3): inv(w)) == distribution(w in permutations(3): maj(w))',
    'distribution(inv(w) for w in permutations(3)) == distribution(maj(w) for w in permutations(3))',
    'true',
    'MacMahon, Combinatory Analysis (1915), vol. I',
  ],
  [
    'all(c in coefficients(schubert(perm([1, 3, 2, 4]), x)): c <= 1)',
    'all(c <= 1 for c in coefficients(schubert(perm([1, 3, 2, 4]), x)))',
    'true',
    'S_{1324} = x[1] + x[2] (Fomin–Kirillov, Schubert polynomials with 0/1 coefficients; computed by hand)',
  ],
  [
    'sum(i in 1..6, j in i..6 where gcd(i, j) == 1: 1)',
    'sum(1 for i in 1..6, j in i..6 where gcd(i, j) == 1)',
    '12',
    'coprime pairs 1 <= i <= j <= 6: sum of Euler phi(1..6) = 1+1+2+2+4+2 (OEIS A002088)',
  ],
  ['sum(i in 1..4, j in 1..4: i*j)', 'sum(i*j for i in 1..4 for j in 1..4)', '100', '(1+2+3+4)^2'],
  [
    'count(w in permutations(4): des(w) == 1)',
    'count(des(w) == 1 for w in permutations(4))',
    '11',
    'Eulerian number A(4,1) (OEIS A008292)',
  ],
  [
    'any(w in permutations(3): inv(w) == 3)',
    'any(inv(w) == 3 for w in permutations(3))',
    'true',
    'the longest element of S_3 has 3 inversions',
  ],
  ['min(l in partitions(5): len(l))', 'min(len(l) for l in partitions(5))', '1', 'the partition [5]'],
  ['max(l in partitions(5): len(l))', 'max(len(l) for l in partitions(5))', '5', 'the partition [1,1,1,1,1]'],
  ['list(i in 1..5: i*(i+1)/2)', 'list(i*(i+1)/2 for i in 1..5)', '[1, 3, 6, 10, 15]', 'triangular numbers (OEIS A000217)'],
  [
    'set(w in permutations(3): w^2)',
    'set(w^2 for w in permutations(3))',
    '[perm([1, 2, 3]), perm([2, 3, 1]), perm([3, 1, 2])]',
    'squares in S_3: the identity and the two 3-cycles (computed by hand)',
  ],
  ['concat(i in 1..3: 1..i)', 'concat(1..i for i in 1..3)', '[1, 1, 2, 1, 2, 3]', 'by hand'],
  ['sum(n in 0..6: catalan(n))', 'sum(catalan(n) for n in 0..6)', '197', 'partial sums of Catalan numbers (OEIS A014137)'],
  ['sum(l in partitions(6): syt(l)^2)', 'sum(syt(l)^2 for l in partitions(6))', '720', 'sum of f_lambda^2 = n! (RSK)'],
  [
    'list(k in 0..4: count(w in permutations(4) where inv(w) == k))',
    'list(count(w in permutations(4) where inv(w) == k) for k in 0..4)',
    '[1, 3, 5, 6, 5]',
    'Mahonian numbers, row 4 (OEIS A008302)',
  ],
  [
    'sum(k in 0..5: if mod(k, 2) == 0 then binomial(5, k) else 0)',
    'sum(if mod(k, 2) == 0 then binomial(5, k) else 0 for k in 0..5)',
    '16',
    'even-sized subsets of a 5-set: 2^4',
  ],
  ['sum(i in 1..4: sum(j in 1..i: j))', 'sum(sum(j for j in 1..i) for i in 1..4)', '20', 'tetrahedral number T(4) (OEIS A000292)'],
  [
    'all(w in involutions(4): w^2 == perm([1, 2, 3, 4]))',
    'all(w^2 == perm([1, 2, 3, 4]) for w in involutions(4))',
    'true',
    'the definition of an involution',
  ],
];

describe('binder first and body first mean the same', () => {
  test('there are twenty pairs', () => {
    expect(PAIRS.length).toBe(20);
  });
  test.each(PAIRS)('%s  ≡  %s', (old, neu, value, _source) => {
    expect(parse(neu)).toEqual(parse(old));
    expect(show(old)).toBe(value);
    expect(show(neu)).toBe(value);
  });
});
