// Narayana, Eulerian and Motzkin numbers, z_lambda and class sizes (src/library/sequences.ts)
// against OEIS rows and against brute-force counts.

import { describe, expect, it } from 'vitest';
import '../../src/library/sequences.js';
import { getFunction } from '../../src/library/registry.js';
import { Partition } from '../../src/families/partitions/partition.js';
import { partitions } from '../../src/families/partitions/partitions.js';
import { permutations } from '../../src/families/permutations/permutations.js';
import { dyckPaths } from '../../src/families/dyckPaths/dyckPaths.js';
import { cycleLengths, des } from '../../src/library/permutations/statistics.js';
import { peaks } from '../../src/library/dyckPaths/statistics.js';
import type { Value } from '../../src/values/value.js';

const call = (name: string, ...args: Value[]): Value => getFunction(name)!.impl(...args);

describe('Narayana numbers', () => {
  it('OEIS A001263 rows 1..6, and N(0, 0) = 1', () => {
    const rows = [[1], [1, 1], [1, 3, 1], [1, 6, 6, 1], [1, 10, 20, 10, 1], [1, 15, 50, 50, 15, 1]];
    rows.forEach((row, i) => row.forEach((v, k) => expect(call('narayana', i + 1, k + 1)).toBe(v)));
    expect(call('narayana', 0, 0)).toBe(1);
    expect(call('narayana', 4, 0)).toBe(0);
    expect(call('narayana', 4, 5)).toBe(0);
  });
  it('count Dyck paths by peaks (n <= 9)', () => {
    for (let n = 1; n <= 9; n++) {
      const by = new Array(n + 1).fill(0);
      dyckPaths.enumerate({ n }, (d) => void by[peaks(d.steps)]++);
      for (let k = 1; k <= n; k++) expect(call('narayana', n, k)).toBe(by[k]);
    }
  });
});

describe('Eulerian numbers', () => {
  it('OEIS A008292 rows 1..7 (A008292 T(n, k) = eulerian(n, k - 1))', () => {
    const rows = [[1], [1, 1], [1, 4, 1], [1, 11, 11, 1], [1, 26, 66, 26, 1], [1, 57, 302, 302, 57, 1], [1, 120, 1191, 2416, 1191, 120, 1]];
    rows.forEach((row, i) => row.forEach((v, k) => expect(call('eulerian', i + 1, k)).toBe(v)));
    expect(call('eulerian', 0, 0)).toBe(1);
    expect(call('eulerian', 3, 3)).toBe(0);
    expect(call('eulerian', 3, -1)).toBe(0);
  });
  it('count permutations by descents (n <= 8), and each row sums to n!', () => {
    for (let n = 1; n <= 8; n++) {
      const by = new Array(n).fill(0);
      permutations.enumerate({ n }, (w) => void by[des(w.a)]++);
      expect(by.map((_, k) => call('eulerian', n, k))).toEqual(by);
    }
    let s = 0n;
    for (let k = 0; k < 25; k++) s += BigInt(call('eulerian', 25, k) as number | bigint);
    expect(s).toBe(15511210043330985984000000n); // 25!
  });
});

describe('Motzkin numbers', () => {
  it('OEIS A001006, M(0..14)', () => {
    const A001006 = [1, 1, 2, 4, 9, 21, 51, 127, 323, 835, 2188, 5798, 15511, 41835, 113634];
    A001006.forEach((v, n) => expect(call('motzkin', n)).toBe(v));
  });
  it('equal sum over k of C(n, 2k) C_k (choose the flat steps, then a Dyck path), n <= 60', () => {
    const binom = (n: number, k: number): bigint => {
      let r = 1n;
      for (let i = 1; i <= k; i++) r = (r * BigInt(n - k + i)) / BigInt(i);
      return r;
    };
    for (let n = 0; n <= 60; n++) {
      let s = 0n;
      for (let k = 0; 2 * k <= n; k++) s += binom(n, 2 * k) * (binom(2 * k, k) / BigInt(k + 1));
      expect(BigInt(call('motzkin', n) as number | bigint)).toBe(s);
    }
  });
});

describe('z_lambda and class sizes', () => {
  it('worked values: z_(2,2,1) = 2^2 2! 1 = 8, z_(1^n) = n!, z_(n) = n', () => {
    expect(call('centralizerSize', new Partition([2, 2, 1]))).toBe(8);
    expect(call('centralizerSize', new Partition([1, 1, 1, 1]))).toBe(24);
    expect(call('centralizerSize', new Partition([5]))).toBe(5);
  });
  it('classSize counts permutations by cycle type (n <= 7), and sums to n! (Stanley, EC1, Prop. 1.3.2)', () => {
    for (let n = 1; n <= 7; n++) {
      const by = new Map<string, number>();
      permutations.enumerate({ n }, (w) => {
        const k = cycleLengths(w.a).join(',');
        by.set(k, (by.get(k) ?? 0) + 1);
      });
      partitions.enumerate({ n }, (l) => expect(call('classSize', new Partition(l.parts.slice()))).toBe(by.get(l.parts.join(','))));
    }
  });
});
