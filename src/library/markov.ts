// Markov chains (LIBRARY.md §2 "Markov chains"): chain, stationary, prob, support, values.
// The stationary measure is exact (src/algebra/linear/stationary.ts): solved modulo primes,
// reconstructed as rationals and verified against the chain before it is returned.

import { fail } from '../base/errors.js';
import { isScalar } from '../numbers/rational.js';
import { isLambda, type Lambda } from '../values/lambda.js';
import { MarkovChain, Measure } from '../values/markov.js';
import { valueToText } from '../values/operations.js';
import type { Value } from '../values/value.js';
import { defineFunction } from './registry.js';

let progressHook: ((fraction: number) => void) | null = null;

/** The runner's progress bar for long stationary solves (null to stop reporting). */
export function setStationaryProgress(hook: ((fraction: number) => void) | null): void {
  progressHook = hook;
}

/** Reads what the move function returned for state s: a list of [target, weight] pairs. */
function movesFrom(s: Value, result: Value, f: Lambda): [Value, unknown][] {
  const bad = (why: string): never =>
    fail(`the move function ${f.text} must return a list of [state, weight] pairs, but for ${valueToText(s)} ${why}`);
  if (!Array.isArray(result)) bad(`it returned ${valueToText(result)}`);
  return (result as Value[]).map((m) => {
    if (!Array.isArray(m) || m.length !== 2) return bad(`one of the moves is ${valueToText(m)}`);
    const [t, w] = m as Value[];
    if (!isScalar(w)) {
      fail(
        `the move from ${valueToText(s)} to ${valueToText(t)} has weight ${valueToText(w)}, which is not a number; weights must be nonnegative integers or rationals`,
      );
    }
    return [t, w];
  });
}

defineFunction({
  name: 'chain',
  topic: 'markov',
  params: [
    { name: 'states', type: 'list' },
    { name: 'moves', type: 'function' },
  ],
  returns: 'chain',
  description:
    'the Markov chain on the given states (a list or a family) moving from s to t with probability weight/total weight of s, where moves(s) = [[t1, w1], [t2, w2], ...] (repeated targets add up)',
  example: 'chain([1, 2], s -> [[3 - s, 1]])',
  exampleValue: '<chain on 2 states>',
  source: 'definition (Kemeny and Snell, Finite Markov Chains, 1960, ch. II)',
  impl: (states, moves) => {
    if (!isLambda(moves)) fail('the second argument of chain must be a function s -> [[t1, w1], ...]');
    const f = moves;
    return MarkovChain.build(states as readonly Value[], (s) => movesFrom(s, f.call([s]), f));
  },
});

defineFunction({
  name: 'stationary',
  topic: 'markov',
  params: [{ name: 'c', type: 'chain' }],
  returns: 'measure',
  description:
    'the exact stationary measure of the chain (rational masses summing to 1, transient states have mass 0); an error naming the closed classes when it is not unique',
  example: 'stationary(chain([1, 2], s -> [[1, 1], [2, s]]))',
  exampleValue: 'measure([[1, 2/5], [2, 3/5]])',
  source: 'OEIS A029729 (the loop chain on matchings); Grassmann, Taksar and Heyman, Operations Research 33 (1985)',
  impl: (c) => (c as MarkovChain).stationary(progressHook ? { onProgress: progressHook } : {}),
});

defineFunction({
  name: 'prob',
  topic: 'markov',
  params: [
    { name: 'mu', type: 'measure' },
    { name: 's', type: 'any' },
  ],
  returns: 'number',
  description: 'the mass of s under the measure (0 off its support)',
  example: 'prob(stationary(chain([1, 2], s -> [[1, 1], [2, s]])), 2)',
  exampleValue: '3/5',
  source: 'definition',
  impl: (mu, s) => (mu as Measure).prob(s),
});

defineFunction({
  name: 'support',
  topic: 'markov',
  params: [{ name: 'mu', type: 'measure' }],
  returns: 'list',
  description: "the values of positive mass, in the order of the chain's states",
  example: 'support(stationary(chain([1, 2, 3], s -> [[2, 1], [3, 1]])))',
  exampleValue: '[2, 3]',
  source: 'definition',
  impl: (mu) => (mu as Measure).elements().slice(),
});

defineFunction({
  name: 'values',
  topic: 'markov',
  params: [{ name: 'mu', type: 'measure' }],
  returns: 'list',
  description: 'the masses of the support, in the same order as support(mu)',
  example: 'values(stationary(chain([1, 2], s -> [[1, 1], [2, s]])))',
  exampleValue: '[2/5, 3/5]',
  source: 'definition',
  impl: (mu) => (mu as Measure).probabilities().slice(),
});
