// Matrix functions (src/library/matrices.ts); the algebra is tested in test/algebra/matrix.test.ts.

import { describe, expect, it } from 'vitest';
import '../../src/library/matrices.js';
import { getFunction } from '../../src/library/registry.js';
import { polyText, variable, type PolyLike } from '../../src/algebra/polynomial.js';
import type { Matrix } from '../../src/algebra/matrix.js';
import type { Value } from '../../src/values/value.js';

const call = (name: string, ...args: Value[]): Value => getFunction(name)!.impl(...args);

describe('matrix functions', () => {
  it('evaluate their registered examples', () => {
    const m = call('matrix', [
      [1, 2],
      [3, 4],
    ]) as Matrix;
    expect(m.toText()).toBe('matrix([[1, 2], [3, 4]])');
    // tridiagonal 2,1: det = n + 1 for the n×n matrix with 2 on the diagonal and 1 beside it (classical)
    expect(
      call(
        'det',
        call('matrix', [
          [2, 1, 0],
          [1, 2, 1],
          [0, 1, 2],
        ]),
      ),
    ).toBe(4);
    expect(
      call(
        'rank',
        call('matrix', [
          [1, 2, 3],
          [2, 4, 6],
        ]),
      ),
    ).toBe(1);
    expect(
      (
        call(
          'transpose',
          call('matrix', [
            [1, 2, 3],
            [4, 5, 6],
          ]),
        ) as Matrix
      ).toText(),
    ).toBe('matrix([[1, 4], [2, 5], [3, 6]])');
    expect(
      polyText(
        call(
          'charpoly',
          call('matrix', [
            [2, 1],
            [1, 2],
          ]),
          variable('t'),
        ) as PolyLike,
      ),
    ).toBe('t^2 - 4*t + 3');
  });
  it('rejects ragged rows with a clear message', () => {
    expect(() => call('matrix', [[1, 2], [3]])).toThrow(/equal lengths/);
  });
});
