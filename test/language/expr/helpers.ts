// Test-only library functions (prefixed t_ so they never clash with the real library), and
// helpers to evaluate and to catch errors.

import { fail } from '../../../src/base/errors.js';
import { defineFunction, getFunction } from '../../../src/library/registry.js';
import { Permutation, inversions } from '../../../src/families/permutations/permutation.js';
import '../../../src/families/permutations/permutations.js';
import { Lambda } from '../../../src/values/lambda.js';
import { evaluate } from '../../../src/language/expr/index.js';
import { valueToText } from '../../../src/values/operations.js';
import type { TypeName } from '../../../src/values/types.js';
import type { Value } from '../../../src/values/value.js';

function def(name: string, params: Array<[string, TypeName]>, returns: TypeName, impl: (...a: Value[]) => Value) {
  if (getFunction(name)) return;
  defineFunction({
    name,
    topic: 'test',
    params: params.map(([n, type]) => ({ name: n, type })),
    returns,
    description: 'test helper',
    example: '',
    exampleValue: '',
    source: 'definition',
    impl,
  });
}

def('t_inv', [['w', 'permutation']], 'integer', (w) => inversions((w as Permutation).a));
def('t_inverse', [['w', 'permutation']], 'permutation', (w) => {
  const a = (w as Permutation).a,
    b = new Array<number>(a.length);
  a.forEach((v, i) => (b[v - 1] = i + 1));
  return new Permutation(b);
});
def('t_perm', [['L', 'list']], 'permutation', (L) => Permutation.from(L as number[]));
def('t_len', [['L', 'list']], 'integer', (L) => (L as Value[]).length);
def(
  't_mod',
  [
    ['a', 'integer'],
    ['b', 'integer'],
  ],
  'integer',
  (a, b) => {
    if (b === 0) fail('mod by zero');
    return (((a as number) % (b as number)) + (b as number)) % (b as number);
  },
);
def(
  't_map',
  [
    ['L', 'list'],
    ['f', 'function'],
  ],
  'list',
  (L, f) => (L as Value[]).map((x) => (f as Lambda).call([x])),
);
def('t_any', [['x', 'any']], 'any', (x) => x);

export function ev(text: string, lets: Array<[string, string]> = [], inds: string[] = ['q', 'x']): Value {
  return evaluate(text, lets, inds);
}

export function show(text: string, lets: Array<[string, string]> = []): string {
  return valueToText(ev(text, lets));
}

/** The error thrown by fn (fails the test when nothing is thrown). */
export function errorOf(
  fn: () => unknown,
): Error & { pos?: { line: number; column: number; file: string }; snippet?: string; suggestion?: string } {
  try {
    fn();
  } catch (e) {
    return e as never;
  }
  throw new Error('expected an error');
}
