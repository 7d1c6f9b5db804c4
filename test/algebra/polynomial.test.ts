import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  isPolynomial,
  padd,
  pdivExact,
  pequals,
  pmul,
  pneg,
  ppow,
  psub,
  variable,
  type PolyLike,
  polyText,
} from '../../src/algebra/polynomial.js';
import { makeRat } from '../../src/numbers/rational.js';
import { EvalError } from '../../src/base/errors.js';
import { polyArb } from './arbitraries.js';

const q = variable('q'),
  x1 = variable('x[1]'),
  x2 = variable('x[2]'),
  x10 = variable('x[10]');
const eq = (a: PolyLike, b: PolyLike) => pequals(a, b);

describe('polynomial printing (FORMAT.md §2 syntax)', () => {
  it('prints the example of the spec', () => {
    expect(polyText(padd(pmul(q, q), pmul(3, pmul(q, x1))))).toBe('q^2 + 3*q*x[1]');
  });
  it('orders variables by base name, then index numerically, and terms by degree then lex', () => {
    const p = padd(padd(x10, x2), padd(pmul(x1, x10), 1));
    expect(polyText(p)).toBe('x[1]*x[10] + x[2] + x[10] + 1');
  });
  it('prints signs and rational coefficients', () => {
    const p = padd(pmul(makeRat(-3n, 7n), pmul(q, q)), padd(pneg(q), makeRat(1n, 2n)));
    expect(polyText(p)).toBe('-3/7*q^2 - q + 1/2');
  });
  it('normalises x[03] to x[3] and rejects bad names', () => {
    expect(polyText(variable('x[03]'))).toBe('x[3]');
    expect(() => variable('3x')).toThrow(EvalError);
  });
});

describe('constants are scalars', () => {
  it('p - p is the number 0 and (q+1) - q is 1', () => {
    const p = padd(q, 1);
    expect(psub(p, p)).toBe(0);
    expect(psub(p, q)).toBe(1);
    expect(isPolynomial(ppow(q, 0))).toBe(false);
  });
});

describe('ring laws (fast-check)', () => {
  it('addition and multiplication are commutative and associative, and distribute', () => {
    fc.assert(
      fc.property(polyArb, polyArb, polyArb, (a, b, c) => {
        expect(eq(padd(a, b), padd(b, a))).toBe(true);
        expect(eq(pmul(a, b), pmul(b, a))).toBe(true);
        expect(eq(padd(padd(a, b), c), padd(a, padd(b, c)))).toBe(true);
        expect(eq(pmul(pmul(a, b), c), pmul(a, pmul(b, c)))).toBe(true);
        expect(eq(pmul(a, padd(b, c)), padd(pmul(a, b), pmul(a, c)))).toBe(true);
        expect(eq(psub(a, a), 0)).toBe(true);
        expect(eq(pmul(a, 1), a)).toBe(true);
      }),
      { numRuns: 150 },
    );
  });
  it('exact division undoes multiplication: (a*b)/b == a', () => {
    fc.assert(
      fc.property(polyArb, polyArb, (a, b) => {
        fc.pre(!eq(b, 0));
        expect(eq(pdivExact(pmul(a, b), b), a)).toBe(true);
      }),
      { numRuns: 150 },
    );
  });
  it('powers agree with repeated products', () => {
    fc.assert(
      fc.property(polyArb, fc.integer({ min: 0, max: 4 }), (a, e) => {
        let r: PolyLike = 1;
        for (let i = 0; i < e; i++) r = pmul(r, a);
        expect(eq(ppow(a, e), r)).toBe(true);
      }),
      { numRuns: 60 },
    );
  });
  it('equal polynomials print the same (canonical form)', () => {
    fc.assert(
      fc.property(polyArb, polyArb, (a, b) => {
        expect(polyText(padd(a, b))).toBe(polyText(padd(b, a)));
      }),
    );
  });
});

describe('exact division', () => {
  it('fails naming both when the divisor does not divide', () => {
    expect(() => pdivExact(padd(pmul(q, q), 1), padd(q, 1))).toThrow('q^2 + 1 is not divisible by q + 1');
    expect(() => pdivExact(q, 0)).toThrow(/division by zero/);
    expect(() => pdivExact(3, padd(q, 1))).toThrow(/not divisible/);
    // Division by a monomial is exact among Laurent polynomials.
    expect(polyText(pdivExact(3, q))).toBe('3*q^-1');
  });
  it('divides q^n - 1 by q - 1 (geometric series)', () => {
    const r = pdivExact(psub(ppow(q, 5), 1), psub(q, 1));
    expect(polyText(r)).toBe('q^4 + q^3 + q^2 + q + 1');
  });
  it('handles large exponents beyond the packed keys', () => {
    const big = ppow(padd(q, x1), 3);
    const huge = pmul(ppow(q, 200000), big);
    expect(eq(pdivExact(huge, ppow(q, 200000)), big)).toBe(true);
    const h2 = pmul(ppow(pmul(q, x1), 1 << 20), padd(q, x2));
    expect(eq(pdivExact(h2, padd(q, x2)), ppow(pmul(q, x1), 1 << 20))).toBe(true);
  });
});
