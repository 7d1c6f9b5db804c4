// The Schubert-calculus functions as registered (src/library/schubert.ts): argument conventions,
// examples and errors. The mathematics is tested in test/algebra/schubertPolynomials.test.ts and
// test/algebra/schurSturmDivided.test.ts.

import { describe, expect, it } from 'vitest';
import '../../src/library/schubert.js';
import { getFunction } from '../../src/library/registry.js';
import { padd, pmul, polyText, ppow, variable, type PolyLike } from '../../src/algebra/polynomial.js';
import { Permutation } from '../../src/families/permutations/permutation.js';
import { Partition } from '../../src/families/partitions/partition.js';
import type { Value } from '../../src/values/value.js';

const call = (name: string, ...args: Value[]): Value => getFunction(name)!.impl(...args);
const text = (v: Value) => polyText(v as PolyLike);
const x = variable('x'),
  y = variable('y'),
  q = variable('q');
const xi = (i: number) => variable(`x[${i}]`);
const perm = (a: number[]) => Permutation.from(a);

describe('registered examples', () => {
  it('evaluate to their stated values', () => {
    expect(text(call('schubert', perm([1, 4, 2, 3]), x))).toBe('x[1]^2 + x[1]*x[2] + x[2]^2');
    expect(text(call('doubleSchubert', perm([1, 3, 2]), x, y))).toBe('x[1] + x[2] - y[1] - y[2]');
    expect(text(call('grothendieck', perm([1, 3, 2]), x))).toBe('-x[1]*x[2] + x[1] + x[2]');
    expect(text(call('schur', new Partition([2, 1]), x, 2))).toBe('x[1]^2*x[2] + x[1]*x[2]^2');
    expect(text(call('divDiff', ppow(xi(1), 2), x, 1))).toBe('x[1] + x[2]');
    expect(call('isSymmetric', padd(pmul(ppow(xi(1), 2), xi(2)), pmul(xi(1), ppow(xi(2), 2))), x)).toBe(true);
    expect(call('isRealRooted', padd(padd(ppow(q, 3), pmul(4, ppow(q, 2))), q), q)).toBe(true);
  });
});

describe('conventions and errors', () => {
  it('the identity and trailing fixed points', () => {
    expect(call('schubert', perm([1, 2, 3]), x)).toBe(1);
    expect(text(call('schubert', perm([2, 1, 3, 4, 5]), x))).toBe('x[1]');
  });
  it('an indexed argument must be a bare name', () => {
    expect(() => call('schubert', perm([2, 1]), xi(1))).toThrow(/bare name/);
    expect(() => call('schubert', perm([2, 1]), padd(x, 1))).toThrow(/single indeterminate/);
    expect(() => call('doubleSchubert', perm([2, 1]), x, x)).toThrow(/two different/);
  });
  it('isSymmetric with a list, with x and m, and when it fails', () => {
    const p = padd(xi(1), xi(2));
    expect(call('isSymmetric', p, [xi(1), xi(2)])).toBe(true);
    expect(call('isSymmetric', p, x, 3)).toBe(false);
    expect(call('isSymmetric', p, x)).toBe(true);
    expect(call('isSymmetric', call('schubert', perm([1, 3, 2]), x), x)).toBe(true); // Grassmannian: s_1(x1, x2)
    expect(call('isSymmetric', call('schubert', perm([3, 1, 2]), x), x, 2)).toBe(false);
  });
  it('isRealRooted refuses 0 and polynomials in other variables', () => {
    expect(() => call('isRealRooted', 0, q)).toThrow(/zero polynomial/);
    expect(() => call('isRealRooted', padd(q, xi(1)), q)).toThrow(/alone/);
    expect(call('isRealRooted', padd(ppow(q, 2), 1), q)).toBe(false);
  });
  it('schur with more parts than variables is 0', () => {
    expect(call('schur', new Partition([1, 1, 1]), x, 2)).toBe(0);
  });
});
