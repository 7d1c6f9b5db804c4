// The value helpers the language owns: the total order (values/order.ts), distributions
// (values/distribution.ts), lambdas (values/lambda.ts) and the operator dispatch (library/operators.ts).
import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { makeRat } from '../../src/numbers/rational.js';
import { compareValues, sortValues } from '../../src/values/order.js';
import { Distribution } from '../../src/values/distribution.js';
import { decodeValue } from '../../src/values/decode.js';
import { valueEquals } from '../../src/values/operations.js';
import { Permutation } from '../../src/families/permutations/permutation.js';
import { Partition } from '../../src/families/partitions/partition.js';
import '../../src/families/partitions/partitions.js';
import { Matrix } from '../../src/algebra/matrix.js';
import * as ops from '../../src/library/operators.js';
import type { Value } from '../../src/values/value.js';
import { ev, show } from './expr/helpers.js';

const scalar = fc.oneof(
  fc.integer({ min: -50, max: 50 }),
  fc.bigInt({ min: -(10n ** 20n), max: 10n ** 20n }).map((b) => makeRat(b, 1n)),
  fc.tuple(fc.bigInt({ min: -100n, max: 100n }), fc.bigInt({ min: 1n, max: 12n })).map(([a, b]) => makeRat(a, b)),
);
const value: fc.Arbitrary<Value> = fc.letrec<{ v: Value }>((tie) => ({
  v: fc.oneof(
    { depthSize: 'small' },
    scalar,
    fc.boolean(),
    fc.string({ maxLength: 3 }),
    fc.array(tie('v'), { maxLength: 3 }),
    fc
      .array(fc.integer({ min: 1, max: 4 }), { maxLength: 4 })
      .map((a) => new Permutation([...new Set(a)].length === a.length && a.every((x) => x <= a.length) ? a : a.map((_, i) => i + 1))),
  ),
})).v;

describe('compareValues is a total order', () => {
  test('antisymmetric, consistent with equality, transitive', () => {
    fc.assert(
      fc.property(value, value, value, (a, b, c) => {
        expect(Math.sign(compareValues(a, b)) + Math.sign(compareValues(b, a))).toBe(0);
        const same = compareValues(a, b) === 0;
        let eq: boolean;
        try {
          eq = valueEquals(a, b);
        } catch {
          eq = false;
        }
        expect(same).toBe(eq);
        if (compareValues(a, b) <= 0 && compareValues(b, c) <= 0) expect(compareValues(a, c)).toBeLessThanOrEqual(0);
      }),
      { numRuns: 500 },
    );
  });
  test('numbers by value, lists and objects lexicographically', () => {
    expect(sortValues([3, makeRat(1n, 2n), -1, (2n ** 60n) as never, 0])).toEqual([-1, 0, makeRat(1n, 2n), 3, 2n ** 60n]);
    expect(compareValues([1, 2], [1, 2, 0])).toBeLessThan(0);
    expect(compareValues(new Permutation([2, 1, 3]), new Permutation([1, 3, 2]))).toBeGreaterThan(0);
  });
});

describe('Distribution', () => {
  test('equal when counts agree; records round-trip', () => {
    const a = Distribution.of([1, 2, 2, new Permutation([2, 1])]);
    const b = Distribution.of([2, new Permutation([2, 1]), 1, 2]);
    expect(a.equals(b)).toBe(true);
    expect(a.key()).toBe(b.key());
    expect(a.equals(Distribution.of([1, 2, new Permutation([2, 1])]))).toBe(false);
    expect(a.countOf(2)).toBe(2);
    expect(a.size).toBe(4);
    const back = decodeValue(a.encode()) as Distribution;
    expect(back.equals(a)).toBe(true);
  });
  test('keeps copies of transient objects', () => {
    const w = new Permutation([1, 2]);
    w.transient = true;
    const d = new Distribution();
    d.add(w);
    w.a.reverse();
    expect(d.toText()).toBe('distributionOf([[perm([1, 2]), 1]])');
  });
});

describe('operators', () => {
  test('matrices: product, sum, scaling, powers', () => {
    const A = Matrix.from([
      [1, 1],
      [1, 0],
    ]);
    // Fibonacci matrix: A^10 = [[F11, F10], [F10, F9]] = [[89, 55], [55, 34]] (OEIS A000045).
    expect((ops.pow(A, 10) as Matrix).toText()).toBe('matrix([[89, 55], [55, 34]])');
    expect((ops.mul(2, A) as Matrix).toText()).toBe('matrix([[2, 2], [2, 0]])');
    expect((ops.sub(A, A) as Matrix).toText()).toBe('matrix([[0, 0], [0, 0]])');
    expect((ops.mul(A, A) as Matrix).equals(ops.add(A, Matrix.identity(2)) as Matrix)).toBe(true); // A^2 = A + I
  });
  test('comparisons are for numbers only', () => {
    expect(ops.lt(makeRat(1n, 3n), makeRat(1n, 2n))).toBe(true);
    expect(ops.ge((2n ** 70n) as never, 5)).toBe(true);
    expect(() => ops.lt(new Permutation([1]), 1)).toThrow(/compares integers and rationals only/);
    expect(() => ops.mul(new Permutation([1]), new Permutation([2, 1]))).toThrow(/different sizes/);
    expect(() => ops.pow(2, makeRat(1n, 2n))).toThrow(/exponent must be an integer/);
  });
  test('w^k follows the cycles', () => {
    // (1 2 3)(4 5): order 6.
    const w = new Permutation([2, 3, 1, 5, 4]);
    expect((ops.pow(w, 6) as Permutation).a).toEqual([1, 2, 3, 4, 5]);
    expect((ops.pow(w, -1) as Permutation).a).toEqual([3, 1, 2, 5, 4]);
    expect((ops.pow(w, 7) as Permutation).equals(w)).toBe(true);
  });
  test('partitions index to 0 past their length, from 1', () => {
    const lets: Array<[string, string]> = [['lam', 'list(p for p in partitions(4) where p[1] == 3)[1]']];
    expect(ev('[lam[1], lam[2], lam[3]]', lets)).toEqual([3, 1, 0]);
    expect(() => ev('lam[0]', lets)).toThrow(/indices start at 1/);
    expect(show('count(p in partitions(5))')).toBe('7'); // p(5) = 7, OEIS A000041
    expect(Partition).toBeDefined();
  });
});
