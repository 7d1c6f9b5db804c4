// chain, stationary, prob, support, values (src/library/markov.ts) and the loop chain on perfect matchings
// stated the way a user states it: chain(matchings, m -> [[joinAt(m, i), 2], [crossAt(m, i), 1], ...]).
// Source for the numbers: OEIS A029729 (1, 3, 31, 1145, 154881), with its ground-state comment (2004); see test/algebra/linear/stationary.test.ts for the full citation.

import { describe, expect, it } from 'vitest';
import '../../src/library/markov.js';
import '../../src/library/moves.js';
import { getFunction } from '../../src/library/registry.js';
import { Matching } from '../../src/families/matchings/matching.js';
import { Permutation } from '../../src/families/permutations/permutation.js';
import { EvalError } from '../../src/base/errors.js';
import { makeRat, type Scalar } from '../../src/numbers/rational.js';
import { sdiv } from '../../src/numbers/scalar.js';
import { Lambda } from '../../src/values/lambda.js';
import { MarkovChain, Measure } from '../../src/values/markov.js';
import { decodeValue } from '../../src/values/decode.js';
import { encodeValue, valueToText } from '../../src/values/operations.js';
import type { Value } from '../../src/values/value.js';
import { allMatchings } from '../algebra/linear/loopChainFixture.js';

const call = (name: string, ...args: Value[]): Value => getFunction(name)!.impl(...args);
const fn = (text: string, f: (v: Value) => Value) => new Lambda(1, (a) => f(a[0]), text);
const matchings = (n: number) => allMatchings(n).map((p) => new Matching(p.map((j) => j + 1)));

function loop(n: number, join: Value, cross: Value): MarkovChain {
  const moves = fn('m -> concat([[joinAt(m, i), join], [crossAt(m, i), cross]] for i in 1..2*n)', (m) => {
    const out: Value[] = [];
    for (let i = 1; i <= 2 * n; i++) out.push([call('joinAt', m, i), join], [call('crossAt', m, i), cross]);
    return out;
  });
  return call('chain', matchings(n), moves) as MarkovChain;
}

describe('the loop chain through the language functions (OEIS A029729)', () => {
  it('n = 1..4: scaled by the smallest mass, integers; smallest at i <-> i+n; i <-> 2n+1-i gives 1, 3, 31, 1145', () => {
    const expected = [1, 3, 31, 1145];
    for (let n = 1; n <= 4; n++) {
      const mu = call('stationary', loop(n, 2, 1)) as Measure;
      const support = call('support', mu) as Value[];
      const masses = call('values', mu) as Scalar[];
      expect(support.length).toBe(matchings(n).length);
      const crossing = Matching.fromArcs(Array.from({ length: n }, (_, i) => [i + 1, i + 1 + n]));
      const nested = Matching.fromArcs(Array.from({ length: n }, (_, i) => [i + 1, 2 * n - i]));
      const min = call('prob', mu, crossing) as Scalar;
      for (const m of masses) {
        const r = sdiv(m, min);
        expect(typeof r).toBe('number'); // an integer (a rational would be a Rat)
        expect(r as number).toBeGreaterThanOrEqual(1);
      }
      expect(sdiv(call('prob', mu, nested) as Scalar, min)).toBe(expected[n - 1]);
    }
  });
  it('weights may be rationals: 2/3 and 1/3 give the same measure as 2 and 1', () => {
    const a = call('stationary', loop(3, makeRat(2n, 3n), makeRat(1n, 3n))) as Measure;
    const b = call('stationary', loop(3, 2, 1)) as Measure;
    expect(a.equals(b)).toBe(true);
  });
});

describe('chain and its measure', () => {
  const two = () =>
    call(
      'chain',
      [1, 2],
      fn('s -> [[1, 1], [2, s]]', (s) => [
        [1, 1],
        [2, s],
      ]),
    ) as MarkovChain;
  it('a two-state chain: P = [[1/2, 1/2], [1/3, 2/3]] has pi = (2/5, 3/5) (balance: pi1/2 = pi2/3)', () => {
    const mu = call('stationary', two()) as Measure;
    expect(call('values', mu)).toEqual([makeRat(2n, 5n), makeRat(3n, 5n)]);
    expect(call('support', mu)).toEqual([1, 2]);
    expect(call('prob', mu, 2)).toEqual(makeRat(3n, 5n));
    expect(call('prob', mu, 7)).toBe(0);
    expect(valueToText(mu)).toBe('measure([[1, 2/5], [2, 3/5]])');
    expect(valueToText(two())).toBe('<chain on 2 states>');
    expect(mu.elements()).toEqual([1, 2]);
  });
  it('repeated targets add up, and the support skips transient states (in the order of the states)', () => {
    const c = call(
      'chain',
      [3, 1, 2],
      fn('s -> ...', (s) =>
        s === 3
          ? [
              [1, 1],
              [1, 1],
            ]
          : [
              [3 - (s as number), 1],
              [s, 1],
              [s, 1],
            ],
      ),
    ) as MarkovChain;
    expect(c.movesOut(0)).toEqual([[1, 2]]);
    const mu = call('stationary', c) as Measure;
    expect(call('support', mu)).toEqual([1, 2]);
    expect(call('values', mu)).toEqual([makeRat(1n, 2n), makeRat(1n, 2n)]);
    expect(call('prob', mu, 3)).toBe(0);
  });
  it('the examples of the registry', () => {
    for (const name of ['chain', 'stationary', 'prob', 'support', 'values', 'joinAt', 'crossAt', 'swapAt', 'rotate']) {
      const spec = getFunction(name)!;
      expect(spec.example.length).toBeGreaterThan(0);
    }
    const mu = call(
      'stationary',
      call(
        'chain',
        [1, 2, 3],
        fn('s -> [[2, 1], [3, 1]]', () => [
          [2, 1],
          [3, 1],
        ]),
      ),
    );
    expect(valueToText(call('support', mu))).toBe('[2, 3]');
  });
  it('measures and chains survive their record encoding', () => {
    const c = two();
    const mu = call('stationary', c) as Measure;
    expect((decodeValue(encodeValue(mu)) as Measure).equals(mu)).toBe(true);
    expect((decodeValue(JSON.parse(JSON.stringify(encodeValue(c)))) as MarkovChain).equals(c)).toBe(true);
    const perms = call(
      'chain',
      [new Permutation([1, 2]), new Permutation([2, 1])],
      fn('w -> [[swapAt(w, 1), 1]]', (w) => [[call('swapAt', w, 1), 1]]),
    );
    const pm = call('stationary', perms) as Measure;
    expect(encodeValue(pm)).toEqual({
      measure: [
        [{ permutation: [1, 2] }, '1/2'],
        [{ permutation: [2, 1] }, '1/2'],
      ],
    });
    expect((decodeValue(encodeValue(pm)) as Measure).equals(pm)).toBe(true);
  });
});

describe('clear errors naming the state', () => {
  const expectEval = (f: () => unknown, text: string | RegExp) => {
    expect(f).toThrow(EvalError);
    expect(f).toThrow(text);
  };
  it('a chain with two closed classes', () => {
    const c = call(
      'chain',
      matchings(2),
      fn('m -> [[m, 1]]', (m) => [[m, 1]]),
    );
    expectEval(() => call('stationary', c), /3 closed classes.*\{matching\(\[\[1, 2\], \[3, 4\]\]\) \(1 state\)\}/);
  });
  it('a negative weight, a non-numeric weight, a target outside the chain, a malformed move list', () => {
    const ms = matchings(2);
    expectEval(
      () =>
        call(
          'chain',
          ms,
          fn('m -> [[crossAt(m, 1), -1]]', (m) => [[call('crossAt', m, 1), -1]]),
        ),
      'the move from matching([[1, 2], [3, 4]]) to matching([[1, 2], [3, 4]]) has the negative weight -1',
    );
    expectEval(
      () =>
        call(
          'chain',
          ms,
          fn('m -> [[m, "a"]]', (m) => [[m, 'a']]),
        ),
      'the move from matching([[1, 2], [3, 4]]) to matching([[1, 2], [3, 4]]) has weight "a", which is not a number',
    );
    expectEval(
      () =>
        call(
          'chain',
          ms.slice(0, 1),
          fn('m -> [[crossAt(m, 2), 1]]', (m) => [[call('crossAt', m, 2), 1]]),
        ),
      'which is not a state of the chain',
    );
    expectEval(
      () =>
        call(
          'chain',
          [1],
          fn('s -> s', (s) => s),
        ),
      'must return a list of [state, weight] pairs, but for 1 it returned 1',
    );
    expectEval(
      () =>
        call(
          'chain',
          [1, 1],
          fn('s -> [[s, 1]]', (s) => [[s, 1]]),
        ),
      'the state 1 is listed twice',
    );
  });
  it('prob of a value of the wrong kind', () => {
    const mu = call(
      'stationary',
      call(
        'chain',
        [1, 2],
        fn('s -> [[3 - s, 1]]', (s) => [[3 - (s as number), 1]]),
      ),
    );
    expectEval(() => call('prob', mu, new Permutation([1])), 'the measure lives on values of type integer');
  });
});
