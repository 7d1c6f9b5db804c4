// Laurent polynomials in the Polynomial representation: negative exponents of indeterminates.

import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { evaluate } from '../../../src/language/expr/index.js';
import { valueToText, valueEquals } from '../../../src/values/operations.js';
import { fromTerms, pdivExact, pmul, pequals, polyText, type PolyLike } from '../../../src/algebra/polynomial.js';
import { parsePolynomialText } from '../../../src/algebra/polynomialText.js';
import { varId } from '../../../src/algebra/variables.js';
import { makeRat, type Scalar } from '../../../src/numbers/rational.js';
import '../../../src/library/index.js';

const IND = ['q', 't', 'x'];
const run = (s: string) => evaluate(s, [], IND);
const ev = (s: string) => valueToText(run(s));

describe('Laurent polynomials', () => {
  it('negative powers of indeterminates are exact values', () => {
    expect(ev('q^-1')).toBe('q^-1');
    expect(ev('q^-1 * q')).toBe('1');
    expect(ev('q^-2*t + 1')).toBe('1 + q^-2*t');
    expect(ev('(q + q^-1)^2')).toBe('q^2 + 2 + q^-2');
    expect(ev('(2*q)^-2')).toBe('1/4*q^-2');
    expect(ev('q / q^3')).toBe('q^-2');
    expect(ev('(q^2 + q) / (2*q^3)')).toBe('1/2*q^-1 + 1/2*q^-2');
    expect(ev('(q^2 - 1) / (q^-1 - q)')).toBe('-q');
    expect(ev('1 / q')).toBe('q^-1');
    expect(ev('q^-1 + 1 - q^-1')).toBe('1');
    expect(ev('(q + q^-1) - q')).toBe('q^-1');
    expect(ev('q^-1 + 3')).toBe('3 + q^-1');
    expect(ev('q*t^-1 + 3 - 3')).toBe('q*t^-1');
  });
  it('equality, coeff, degree, subs, coefficientList', () => {
    expect(run('q^-1 * q^2 == q')).toBe(true);
    expect(run('q^-1 + q == q + q^-1')).toBe(true);
    expect(ev('coeff(3*q^-2 + q, q^-2)')).toBe('3');
    // degree is the highest exponent (negative when every exponent is)
    expect(ev('degree(q^-1 + q^-3, q)')).toBe('-1');
    expect(ev('degree(q^-1*t^3 + q^-3)')).toBe('2');
    expect(ev('subs(q^-1 + q, q, 2)')).toBe('5/2');
    expect(ev('subs(q^-2*t, q, 2*t)')).toBe('1/4*t^-1');
    expect(() => run('subs(q^-1, q, 0)')).toThrow();
    expect(() => run('coefficientList(q^-1 + 1, q)')).toThrow(/negative power of q/);
  });
  it('text parses back to an equal value (expression and record readers)', () => {
    const VARS = ['q', 't', 'x[1]'];
    const termArb = fc.tuple(
      fc.array(fc.integer({ min: -3, max: 3 }), { minLength: 3, maxLength: 3 }),
      fc.tuple(fc.integer({ min: -5, max: 5 }), fc.integer({ min: 1, max: 3 })).map(([n, d]) => makeRat(BigInt(n), BigInt(d))),
    );
    fc.assert(
      fc.property(fc.array(termArb, { maxLength: 6 }), (terms) => {
        const p = fromTerms(VARS.map(varId), terms as [number[], Scalar][]);
        const text = polyText(p);
        expect(valueEquals(run(text), p)).toBe(true);
        expect(pequals(parsePolynomialText(text), p)).toBe(true);
        // multiplying by a monomial and dividing by it again is exact
        const m = fromTerms(VARS.map(varId), [[[-1, 2, 0], 3]]);
        expect(pequals(pdivExact(pmul(p, m), m) as PolyLike, p)).toBe(true);
      }),
      { numRuns: 200 },
    );
  });
});
