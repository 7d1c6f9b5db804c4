// Polynomial basics (src/library/polynomials.ts): definitions, laws, and evaluation as a homomorphism.

import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import '../../src/library/polynomials.js';
import { getFunction } from '../../src/library/registry.js';
import { padd, pequals, pmul, polyText, ppow, psub, variable, type PolyLike } from '../../src/algebra/polynomial.js';
import { makeRat, type Scalar } from '../../src/numbers/rational.js';
import { EvalError } from '../../src/base/errors.js';
import type { Value } from '../../src/values/value.js';
import { polyArb, scalarArb, VARS } from '../algebra/arbitraries.js';

const call = (name: string, ...args: Value[]): Value => getFunction(name)!.impl(...args);
const text = (v: Value) => polyText(v as PolyLike);
const q = variable('q'),
  x = variable('x'),
  y = variable('y');
const x1 = variable('x[1]'),
  x2 = variable('x[2]'),
  x3 = variable('x[3]');

describe('coeff, coefficients, terms, degree', () => {
  const p = padd(pmul(2, pmul(q, q)), padd(pmul(-1, pmul(q, x1)), 5)); // 2q^2 - q x[1] + 5
  it('reads coefficients of monomials, and of constants', () => {
    expect(call('coeff', p, pmul(q, q))).toBe(2);
    expect(call('coeff', p, pmul(q, x1))).toBe(-1);
    expect(call('coeff', p, 1)).toBe(5);
    expect(call('coeff', p, x2)).toBe(0);
    expect(call('coeff', 7, 1)).toBe(7);
    expect(() => call('coeff', p, pmul(3, q))).toThrow(EvalError);
  });
  it('lists coefficients and terms in print order', () => {
    expect(call('coefficients', p)).toEqual([2, -1, 5]);
    expect((call('terms', p) as Value[]).map(text)).toEqual(['2*q^2', '-q*x[1]', '5']);
    expect(call('coefficients', 0)).toEqual([]);
    expect(call('terms', 0)).toEqual([]);
  });
  it('degrees: total and in one variable; 0 has none', () => {
    expect(call('degree', padd(ppow(q, 3), pmul(q, ppow(x1, 3))))).toBe(4);
    expect(call('degree', padd(ppow(q, 3), pmul(q, ppow(x1, 3))), x1)).toBe(3);
    expect(call('degree', 3)).toBe(0);
    expect(() => call('degree', 0)).toThrow(/no degree/);
  });
  it('a polynomial is the sum of its terms, and sum of coeff(p, m) * m (fast-check)', () => {
    fc.assert(
      fc.property(polyArb, (a) => {
        const ts = call('terms', a) as PolyLike[];
        expect(
          pequals(
            ts.reduce((s: PolyLike, t) => padd(s, t), 0),
            a,
          ),
        ).toBe(true);
        const cs = call('coefficients', a) as Scalar[];
        expect(cs.length).toBe(ts.length);
      }),
    );
  });
});

describe('subs', () => {
  const p = padd(pmul(x1, x1), pmul(x1, x2)); // the registered example
  it('evaluates the registered example and indexed families', () => {
    expect(call('subs', p, x, [2, 3])).toBe(10);
    expect(call('subs', p, x, 1)).toBe(2);
    expect(text(call('subs', p, x2, q))).toBe('q*x[1] + x[1]^2');
    expect(() => call('subs', padd(p, x3), x, [1, 1])).toThrow(/x\[3\]/);
    expect(() => call('subs', p, x1, [1])).toThrow(EvalError);
  });
  it('substitutes simultaneously', () => {
    const r = call('subs', padd(x1, pmul(2, x2)), x, [x2, x1]);
    expect(text(r)).toBe('2*x[1] + x[2]');
  });
  it('substitution is a ring homomorphism (fast-check)', () => {
    const valueArb = fc.oneof(
      scalarArb.map((s) => s as PolyLike),
      polyArb,
    );
    fc.assert(
      fc.property(polyArb, polyArb, fc.constantFrom(...VARS), valueArb, (a, b, v, val) => {
        const s = (z: PolyLike) => call('subs', z, variable(v), val) as PolyLike;
        expect(pequals(s(padd(a, b)), padd(s(a), s(b)))).toBe(true);
        expect(pequals(s(pmul(a, b)), pmul(s(a), s(b)))).toBe(true);
      }),
      { numRuns: 80 },
    );
  });
  it('plain variables and rational values', () => {
    expect(call('subs', padd(pmul(q, q), 1), q, makeRat(1n, 2n))).toEqual(makeRat(5n, 4n));
    expect(call('subs', padd(pmul(x, x), 1), x, 2)).toBe(5);
  });
});

describe('swapVars', () => {
  it('exchanges two variables, and whole indexed families', () => {
    expect(text(call('swapVars', padd(pmul(x1, x1), x2), x1, x2))).toBe('x[2]^2 + x[1]');
    const yv = variable('y[1]');
    expect(text(call('swapVars', padd(x1, pmul(2, yv)), x, y))).toBe('2*x[1] + y[1]');
  });
  it('is an involution (fast-check)', () => {
    fc.assert(
      fc.property(polyArb, fc.constantFrom(...VARS), fc.constantFrom(...VARS), (a, u, v) => {
        const sw = (z: Value) => call('swapVars', z, variable(u), variable(v));
        expect(pequals(sw(sw(a)) as PolyLike, a)).toBe(true);
      }),
    );
  });
});

describe('coefficientList', () => {
  it('lists univariate coefficients from degree 0', () => {
    expect(call('coefficientList', ppow(padd(q, 1), 3), q)).toEqual([1, 3, 3, 1]);
    expect(call('coefficientList', psub(ppow(q, 3), q), q)).toEqual([0, -1, 0, 1]);
    expect(call('coefficientList', 4, q)).toEqual([4]);
    expect(() => call('coefficientList', padd(q, x1), q)).toThrow(/alone/);
  });
});
