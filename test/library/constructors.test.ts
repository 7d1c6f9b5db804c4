import { describe, expect, it } from 'vitest';
import '../../src/library/constructors.js';
import { getFunction } from '../../src/library/registry.js';
import { valueToText } from '../../src/values/operations.js';
import type { Value } from '../../src/values/value.js';

const call = (name: string, ...args: Value[]) => getFunction(name)!.impl(...args);

describe('object constructors', () => {
  it('build and print the objects of FORMAT.md §2', () => {
    expect(valueToText(call('perm', [2, 4, 1, 3]))).toBe('perm([2, 4, 1, 3])');
    expect(
      valueToText(
        call('matching', [
          [2, 4],
          [3, 1],
        ]),
      ),
    ).toBe('matching([[1, 3], [2, 4]])');
    expect(valueToText(call('composition', [1, 3, 1]))).toBe('composition([1, 3, 1])');
    expect(valueToText(call('word', [1, 1, 2]))).toBe('word([1, 1, 2])');
    expect(valueToText(call('word', '1123'))).toBe('word([1, 1, 2, 3])');
    expect(valueToText(call('subset', [3, 1]))).toBe('subset([1, 3])');
    expect(valueToText(call('subset', []))).toBe('subset([])');
  });
  it('reject malformed arguments with the offending value', () => {
    expect(() => call('perm', [1, 1])).toThrow(/\[1, 1\] is not a permutation of 1..2/);
    expect(() =>
      call('matching', [
        [1, 2],
        [2, 3],
      ]),
    ).toThrow(/two arcs/);
    expect(() => call('matching', [[1, 2, 3]])).toThrow(/pair/);
    expect(() => call('composition', [2, 0])).toThrow(/not a positive integer/);
    expect(() => call('word', 'ab')).toThrow(/digits/);
    expect(() => call('subset', [2, 2])).toThrow(/twice/);
    expect(() => call('perm', 5)).toThrow(/list of integers/);
  });
  it('each example evaluates to its stated value', () => {
    // The examples are single constructor calls; evaluate them by hand here (the suite-wide test
    // evaluates them through the language as well).
    for (const name of ['perm', 'matching', 'composition', 'word', 'subset']) {
      const f = getFunction(name)!;
      const m = /^\w+\((.*)\)$/.exec(f.example)!;
      const arg = JSON.parse(m[1]) as Value;
      expect(valueToText(f.impl(arg))).toBe(f.exampleValue);
    }
  });
});
