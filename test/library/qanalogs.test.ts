// q-analogues (src/library/qanalogs.ts) against OEIS tables and brute-force counts.

import { describe, expect, it } from 'vitest';
import '../../src/library/qanalogs.js';
import '../../src/library/polynomials.js';
import { getFunction } from '../../src/library/registry.js';
import { polyText, variable, type PolyLike } from '../../src/algebra/polynomial.js';
import { binomialInt, factorialInt } from '../../src/numbers/integer.js';
import type { Value } from '../../src/values/value.js';

const call = (name: string, ...args: Value[]): Value => getFunction(name)!.impl(...args);
const q = variable('q');
const coeffs = (p: Value) => call('coefficientList', p, q);

function inversionDistribution(n: number): number[] {
  // Brute force over all permutations of 1..n (second algorithm for the Mahonian numbers).
  const out = new Array(Math.max(1, (n * (n - 1)) / 2 + 1)).fill(0);
  const a = Array.from({ length: n }, (_, i) => i);
  const rec = (k: number) => {
    if (k === n) {
      let inv = 0;
      for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) if (a[i] > a[j]) inv++;
      out[inv]++;
      return;
    }
    for (let i = k; i < n; i++) {
      [a[k], a[i]] = [a[i], a[k]];
      rec(k + 1);
      [a[k], a[i]] = [a[i], a[k]];
    }
  };
  rec(0);
  return out;
}

describe('qint', () => {
  it('[n]_q = 1 + q + ... + q^(n-1), [0]_q = 0, and at q = 2 gives 2^n - 1', () => {
    expect(polyText(call('qint', 4, q) as PolyLike)).toBe('q^3 + q^2 + q + 1');
    expect(call('qint', 0, q)).toBe(0);
    expect(call('qint', 1, q)).toBe(1);
    for (let n = 0; n < 20; n++) expect(call('qint', n, 2)).toBe(2 ** n - 1);
  });
});

describe('qfactorial', () => {
  it('has the Mahonian numbers as coefficients (OEIS A008302, rows n = 1..5)', () => {
    const a008302 = [[1], [1, 1], [1, 2, 2, 1], [1, 3, 5, 6, 5, 3, 1], [1, 4, 9, 15, 20, 22, 20, 15, 9, 4, 1]];
    a008302.forEach((row, i) => expect(coeffs(call('qfactorial', i + 1, q))).toEqual(row));
  });
  it('agrees with the inversion distribution of S_n by brute force, and gives n! at q = 1', () => {
    for (let n = 0; n <= 7; n++) {
      expect(coeffs(call('qfactorial', n, q))).toEqual(inversionDistribution(n));
      expect(call('qfactorial', n, 1)).toBe(factorialInt(n));
    }
  });
  it('example value', () => {
    expect(polyText(call('qfactorial', 3, q) as PolyLike)).toBe('q^3 + 2*q^2 + 2*q + 1');
  });
});

describe('qbinomial', () => {
  it('at q = 3 and q = 4 matches OEIS A022167 and A022168 (rows n = 0..6)', () => {
    const a022167 = [
      [1],
      [1, 1],
      [1, 4, 1],
      [1, 13, 13, 1],
      [1, 40, 130, 40, 1],
      [1, 121, 1210, 1210, 121, 1],
      [1, 364, 11011, 33880, 11011, 364, 1],
    ];
    const a022168 = [[1], [1, 1], [1, 5, 1], [1, 21, 21, 1], [1, 85, 357, 85, 1], [1, 341, 5797, 5797, 341, 1]];
    a022167.forEach((row, n) => expect(row.map((_, k) => call('qbinomial', n, k, 3))).toEqual(row));
    a022168.forEach((row, n) => expect(row.map((_, k) => call('qbinomial', n, k, 4))).toEqual(row));
  });
  it('coefficient of q^j counts partitions of j in a k × (n-k) box (Andrews, The Theory of Partitions, Thm 3.1)', () => {
    const boxCounts = (k: number, m: number): number[] => {
      const out = new Array(k * m + 1).fill(0);
      const rec = (i: number, max: number, sum: number) => {
        if (i === k) return void out[sum]++;
        for (let p = 0; p <= max; p++) rec(i + 1, p, sum + p);
      };
      rec(0, m, 0);
      return out;
    };
    for (let n = 0; n <= 8; n++)
      for (let k = 0; k <= n; k++) {
        expect(coeffs(call('qbinomial', n, k, q))).toEqual(boxCounts(k, n - k));
        expect(call('qbinomial', n, k, 1)).toBe(binomialInt(n, k));
      }
  });
  it('is 0 outside 0 <= k <= n, and the example prints as registered', () => {
    expect(call('qbinomial', 4, 5, q)).toBe(0);
    expect(call('qbinomial', 4, -1, q)).toBe(0);
    expect(polyText(call('qbinomial', 4, 2, q) as PolyLike)).toBe('q^4 + q^3 + 2*q^2 + q + 1');
  });
});
