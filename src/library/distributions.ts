// Constructors that rebuild a distribution or a measure from its [value, count] or [value, mass]
// pairs: the text form of those values is a call to them, so every printed value parses back.

import { fail } from '../base/errors.js';
import { Distribution } from '../values/distribution.js';
import { Measure } from '../values/markov.js';
import { own } from '../values/operations.js';
import type { Value } from '../values/value.js';
import { defineFunction } from './registry.js';

function pairsOf(call: string, x: Value, what: string): Array<[Value, Value]> {
  if (!Array.isArray(x) || !x.every((p) => Array.isArray(p) && p.length === 2)) {
    fail(`${call} takes a list of [value, ${what}] pairs, e.g. [[0, 1], [1, 2]]`);
  }
  return (x as Value[][]).map((p) => [own(p[0]), p[1]]);
}

defineFunction({
  name: 'distributionOf',
  topic: 'distributions',
  params: [{ name: 'pairs', type: 'list' }],
  returns: 'distribution',
  description:
    'the distribution in which each value occurs the given (positive integer) number of times: how a distribution prints; distribution(L) instead counts the entries of a list L',
  example: 'distributionOf([[0, 1], [1, 2], [2, 2], [3, 1]]) == distribution(inv(w) for w in permutations(3))',
  exampleValue: 'true',
  source: 'definition; the example is the Mahonian row 1, 2, 2, 1 of S_3 (OEIS A008302)',
  impl: (x) => {
    const d = new Distribution();
    for (const [v, c] of pairsOf('distributionOf', x, 'count')) {
      if (typeof c !== 'number' || !Number.isSafeInteger(c) || c < 1)
        fail(`a count in distributionOf must be a positive integer, not ${String(c)}`);
      d.add(v, c);
    }
    return d;
  },
});

defineFunction({
  name: 'measure',
  topic: 'markov',
  params: [{ name: 'pairs', type: 'list' }],
  returns: 'measure',
  description:
    'the probability measure with these [value, mass] pairs (distinct values, positive exact masses summing to 1): how a measure prints',
  example: 'measure([[1, 2/5], [2, 3/5]]) == stationary(chain([1, 2], s -> [[1, 1], [2, s]]))',
  exampleValue: 'true',
  source:
    'definition (Kemeny and Snell, Finite Markov Chains, 1960, ch. II); the example is the stationary measure of that chain, solved by hand',
  impl: (x) => Measure.from(pairsOf('measure', x, 'mass')),
});
