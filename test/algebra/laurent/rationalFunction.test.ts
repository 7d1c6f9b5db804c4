// Rational functions: normal form, arithmetic through the language, text and record round trips.

import { describe, expect, it } from 'vitest';
import { evaluate } from '../../../src/language/expr/index.js';
import { valueToText, valueEquals, encodeValue } from '../../../src/values/operations.js';
import { decodeValue } from '../../../src/values/decode.js';
import '../../../src/library/index.js';

const IND = ['q', 't', 'x'];
const run = (s: string) => evaluate(s, [], IND);
const ev = (s: string) => valueToText(run(s));

describe('rational functions', () => {
  it('are simplified to lowest terms in one variable', () => {
    expect(ev('1/(1 - q)')).toBe('-1/(q - 1)');
    expect(ev('(1 - q^3)/(1 - q)')).toBe('q^2 + q + 1');
    expect(ev('(1 - q^4)/(1 - q^6)')).toBe('(q^2 + 1)/(q^4 + q^2 + 1)');
    expect(ev('(q^2 - 1)/(2*q^3 + 2*q^2)')).toBe('1/2*q^-1 - 1/2*q^-2');
    expect(ev('(q^2 - 1)/(2*q^3 + 3*q^2)')).toBe('(q^2 - 1)/(2*q^3 + 3*q^2)');
    expect(ev('1/(1 - q) - 1/(1 - q)')).toBe('0');
    expect(ev('1/(1 - q) * (1 - q)')).toBe('1');
    expect(ev('(1/(1 - q))^-2')).toBe('q^2 - 2*q + 1');
    expect(ev('(q + 1)^-1')).toBe('1/(q + 1)');
    expect(ev('q^-1/(1 + q)')).toBe('1/(q^2 + q)');
    expect(ev('1/(1 - q) + 1/(1 + q)')).toBe('-2/(q^2 - 1)');
    expect(ev('1/(1 - q*t)')).toBe('-1/(q*t - 1)');
    expect(ev('(q*t - t)/(q - 1)')).toBe('t');
  });
  it('compare exactly, also with polynomials and numbers', () => {
    expect(run('1/(1 - q) == -1/(q - 1)')).toBe(true);
    expect(run('1/(1 - q) == 1/(1 + q)')).toBe(false);
    expect(run('1/(1 - q) == 1')).toBe(false);
    expect(run('1/(1 - q) != q')).toBe(true);
  });
  it('text and record encoding read back to equal values', () => {
    for (const s of ['1/(1 - q)', '(1 - q^4)/(1 - q^6)', '(t + q^-1)/(1 - q*t)', '1/(2 - 3*q)^2']) {
      const v = run(s);
      expect(valueEquals(run(valueToText(v)), v)).toBe(true);
      expect(valueEquals(decodeValue(encodeValue(v)), v)).toBe(true);
    }
  });
});

describe('coefficient(f, q, k)', () => {
  it('reads Laurent polynomials and power series of rational functions', () => {
    expect(ev('coefficient(q^-2*t + 3*q^-2 + q, q, -2)')).toBe('t + 3');
    expect(ev('coefficient(q^-2*t, q, 5)')).toBe('0');
    expect(ev('coefficient(1/(1 - q), q, 7)')).toBe('1');
    expect(ev('coefficient(1/(1 - q), q, -1)')).toBe('0');
    expect(ev('coefficient(1/(q - q^2), q, -1)')).toBe('1');
    expect(ev('coefficient(1/(1 - q*t), q, 4)')).toBe('t^4');
    expect(ev('coefficient(1/(2 - q), q, 3)')).toBe('1/16');
    expect(() => run('coefficient(1/(t - q), q, 1)')).toThrow(/lowest coefficient in q is a number/);
  });
});
