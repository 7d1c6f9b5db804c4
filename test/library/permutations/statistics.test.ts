// Permutation statistics (src/library/permutations/statistics.ts) against OEIS tables and second
// algorithms.

import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import '../../../src/library/permutations.js';
import '../../../src/library/numbers.js';
import { Partition } from '../../../src/families/partitions/partition.js';
import { inv as invFast, lehmerCode } from '../../../src/library/permutations/statistics.js';
import { allPerms, call, compose, distribution, perm, permArb } from './helpers.js';

const stat = (name: string) => (a: number[]) => call(name, perm(a)) as number;

/** inversions by the definition, as a second algorithm */
const invBrute = (a: number[]) => {
  let c = 0;
  for (let i = 0; i < a.length; i++) for (let j = i + 1; j < a.length; j++) if (a[i] > a[j]) c++;
  return c;
};

describe('inv and maj', () => {
  // OEIS A008302, Mahonian numbers: rows n = 1..6.
  const a008302 = [
    [1],
    [1, 1],
    [1, 2, 2, 1],
    [1, 3, 5, 6, 5, 3, 1],
    [1, 4, 9, 15, 20, 22, 20, 15, 9, 4, 1],
    [1, 5, 14, 29, 49, 71, 90, 101, 101, 90, 71, 49, 29, 14, 5, 1],
  ];
  it('inv and maj are both distributed by the Mahonian numbers (OEIS A008302) on S_1..S_6', () => {
    a008302.forEach((row, i) => {
      const S = allPerms(i + 1);
      expect(distribution(S, stat('inv'))).toEqual(row);
      expect(distribution(S, stat('maj'))).toEqual(row);
    });
  });
  it('the Mahonian rows are the coefficients of [1]_q [2]_q ... [n]_q (second algorithm), n = 7, 8', () => {
    for (const n of [7, 8]) {
      let poly = [1];
      for (let k = 1; k <= n; k++) {
        const next = new Array(poly.length + k - 1).fill(0);
        poly.forEach((c, d) => {
          for (let j = 0; j < k; j++) next[d + j] += c;
        });
        poly = next;
      }
      const S = allPerms(n);
      expect(distribution(S, stat('inv'))).toEqual(poly);
      expect(distribution(S, stat('maj'))).toEqual(poly);
    }
  });
  it('inv agrees with the definition, also on long permutations (Fenwick tree path)', () => {
    for (const a of allPerms(6)) expect(call('inv', perm(a))).toBe(invBrute(a));
    fc.assert(
      fc.property(permArb(0, 400), (a) => invFast(a) === invBrute(a)),
      { numRuns: 200 },
    );
  });
  it('maj is the sum of the descent positions', () => {
    fc.assert(
      fc.property(permArb(0, 30), (a) => {
        const d = call('descents', perm(a)) as number[];
        expect(call('maj', perm(a))).toBe(d.reduce((s, x) => s + x, 0));
        expect(call('des', perm(a))).toBe(d.length);
        for (const i of d) expect(a[i - 1] > a[i]).toBe(true);
      }),
    );
  });
});

describe('des and exc', () => {
  // OEIS A008292, Eulerian numbers: row n gives the number of permutations with 0, 1, ..., n-1 descents.
  const a008292 = [
    [1],
    [1, 1],
    [1, 4, 1],
    [1, 11, 11, 1],
    [1, 26, 66, 26, 1],
    [1, 57, 302, 302, 57, 1],
    [1, 120, 1191, 2416, 1191, 120, 1],
  ];
  it('des and exc are distributed by the Eulerian numbers (OEIS A008292) on S_1..S_7', () => {
    a008292.forEach((row, i) => {
      const S = allPerms(i + 1);
      expect(distribution(S, stat('des'))).toEqual(row);
      expect(distribution(S, stat('exc'))).toEqual(row);
    });
  });
  it('the Eulerian numbers equal sum_j (-1)^j C(n+1, j) (k+1-j)^n (second algorithm), n = 8', () => {
    const n = 8;
    const explicit = (k: number) => {
      let s = 0;
      for (let j = 0; j <= k; j++) s += (j % 2 ? -1 : 1) * (call('binomial', n + 1, j) as number) * (k + 1 - j) ** n;
      return s;
    };
    const S = allPerms(n);
    const row = Array.from({ length: n }, (_, k) => explicit(k));
    expect(distribution(S, stat('des'))).toEqual(row);
    expect(distribution(S, stat('exc'))).toEqual(row);
  });
  it('descents of the examples', () => {
    expect(call('descents', perm([1, 2, 3]))).toEqual([]);
    expect(call('descents', perm([3, 2, 1]))).toEqual([1, 2]);
    expect(call('descents', perm([]))).toEqual([]);
    expect(call('exc', perm([2, 3, 1]))).toBe(2);
  });
});

describe('fixed points, cycles, cycle type, sign', () => {
  it('derangements: permutations without fixed points number OEIS A000166', () => {
    const a000166 = [1, 0, 1, 2, 9, 44, 265, 1854, 14833];
    a000166.forEach((d, n) => expect(allPerms(n).filter((a) => call('fixedPoints', perm(a)) === 0).length).toBe(d));
  });
  it('involutions number OEIS A000085 (w = inverse(w), fixed points of the right parity)', () => {
    const a000085 = [1, 1, 2, 4, 10, 26, 76, 232, 764];
    a000085.forEach((c, n) => {
      const invols = allPerms(n).filter((a) => compose(a, a).every((x, i) => x === i + 1));
      expect(invols.length).toBe(c);
      for (const a of invols) expect((call('fixedPoints', perm(a)) as number) % 2).toBe(n % 2);
      expect(allPerms(n).filter((a) => (call('inverse', perm(a)) as unknown as { a: number[] }).a.join() === a.join()).length).toBe(c);
    });
  });
  it('cycles is distributed by the unsigned Stirling numbers of the first kind (OEIS A132393)', () => {
    const a132393 = [
      [1],
      [0, 1],
      [0, 1, 1],
      [0, 2, 3, 1],
      [0, 6, 11, 6, 1],
      [0, 24, 50, 35, 10, 1],
      [0, 120, 274, 225, 85, 15, 1],
      [0, 720, 1764, 1624, 735, 175, 21, 1],
    ];
    a132393.forEach((row, n) => expect(distribution(allPerms(n), stat('cycles'))).toEqual(row));
  });
  it('cycle type lambda occurs n!/z_lambda times (Stanley, EC1, Prop. 1.3.2), on S_1..S_7', () => {
    for (let n = 1; n <= 7; n++) {
      const counts = new Map<string, number>();
      for (const a of allPerms(n)) {
        const t = call('cycleType', perm(a)) as Partition;
        expect(t).toBeInstanceOf(Partition);
        expect(t.size).toBe(n);
        expect(t.length).toBe(call('cycles', perm(a)));
        counts.set(t.key(), (counts.get(t.key()) ?? 0) + 1);
      }
      let fact = 1;
      for (let i = 2; i <= n; i++) fact *= i;
      for (const [key, c] of counts) {
        const parts = key.split(',').map(Number);
        let z = 1;
        for (const i of new Set(parts)) {
          const m = parts.filter((x) => x === i).length;
          z *= i ** m * (call('factorial', m) as number);
        }
        expect(c).toBe(fact / z);
      }
      // every partition of n occurs: p(n) = 1, 2, 3, 5, 7, 11, 15 (OEIS A000041)
      expect(counts.size).toBe([1, 2, 3, 5, 7, 11, 15][n - 1]);
    }
    expect((call('cycleType', perm([2, 1, 4, 5, 3])) as Partition).parts).toEqual([3, 2]);
    expect((call('cycleType', perm([])) as Partition).parts).toEqual([]);
  });
  it('sign is a homomorphism to {1, -1} and equals (-1)^inv (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 40 }).chain((n) => fc.tuple(permArb(n, n), permArb(n, n))),
        ([u, v]) => {
          const s = (a: number[]) => call('sign', perm(a)) as number;
          expect(s(compose(u, v))).toBe(s(u) * s(v));
          expect(s(u)).toBe(invBrute(u) % 2 === 0 ? 1 : -1);
        },
      ),
    );
  });
});

/** Schensted row insertion: the shape of the insertion tableau (second algorithm for lis/lds). */
function rsShape(a: number[]): number[] {
  const rows: number[][] = [];
  for (let x of a) {
    for (let r = 0; ; r++) {
      if (r === rows.length) {
        rows.push([x]);
        break;
      }
      const row = rows[r];
      const j = row.findIndex((y) => y > x);
      if (j < 0) {
        row.push(x);
        break;
      }
      [row[j], x] = [x, row[j]];
    }
  }
  return rows.map((r) => r.length);
}

/** Longest increasing subsequence by the quadratic dynamic programme (a second algorithm). */
function lisQuadratic(a: number[]): number {
  const best = a.map(() => 1);
  for (let i = 0; i < a.length; i++) for (let j = 0; j < i; j++) if (a[j] < a[i]) best[i] = Math.max(best[i], best[j] + 1);
  return Math.max(0, ...best);
}

describe('lis and lds', () => {
  it('agree with the quadratic algorithm and with the RSK shape (Schensted 1961) on S_1..S_7', () => {
    for (let n = 1; n <= 7; n++)
      for (const a of allPerms(n)) {
        const shape = rsShape(a);
        const l = call('lis', perm(a)),
          d = call('lds', perm(a));
        expect(l).toBe(lisQuadratic(a));
        expect(l).toBe(shape[0]);
        expect(d).toBe(shape.length);
      }
  });
  it('agree with both on random long permutations, and satisfy lis*lds >= n (Erdős–Szekeres)', () => {
    fc.assert(
      fc.property(permArb(0, 300), (a) => {
        const l = call('lis', perm(a)) as number,
          d = call('lds', perm(a)) as number;
        const shape = rsShape(a);
        expect(l).toBe(lisQuadratic(a));
        expect(l).toBe(shape[0] ?? 0);
        expect(d).toBe(shape.length);
        expect(d).toBe(lisQuadratic(a.map((x) => -x)));
        expect(l * d >= a.length).toBe(true);
      }),
      { numRuns: 150 },
    );
  });
  it('lis <= 2 on exactly Catalan many permutations (OEIS A000108), lis <= 3 on OEIS A005802 many', () => {
    const a000108 = [1, 2, 5, 14, 42, 132, 429, 1430];
    const a005802 = [1, 2, 6, 23, 103, 513, 2761, 15767];
    for (let n = 1; n <= 8; n++) {
      const S = allPerms(n);
      expect(S.filter((a) => (call('lis', perm(a)) as number) <= 2).length).toBe(a000108[n - 1]);
      expect(S.filter((a) => (call('lds', perm(a)) as number) <= 2).length).toBe(a000108[n - 1]);
      expect(S.filter((a) => (call('lis', perm(a)) as number) <= 3).length).toBe(a005802[n - 1]);
    }
  });
});

describe('lehmerCode', () => {
  it('is a bijection from S_n onto the codes with 0 <= c_i <= n - i, with sum inv(w), on S_1..S_6', () => {
    for (let n = 1; n <= 6; n++) {
      const seen = new Set<string>();
      for (const a of allPerms(n)) {
        const c = call('lehmerCode', perm(a)) as number[];
        expect(c.length).toBe(n);
        c.forEach((x, i) => expect(x >= 0 && x <= n - 1 - i).toBe(true));
        expect(c.reduce((s, x) => s + x, 0)).toBe(invBrute(a));
        // Macdonald, Notes on Schubert Polynomials (1.1)-(1.2): w(i) > w(i+1) iff c_i > c_{i+1}
        for (let i = 0; i + 1 < n; i++) expect(a[i] > a[i + 1]).toBe(c[i] > c[i + 1]);
        seen.add(c.join());
      }
      expect(seen.size).toBe(allPerms(n).length);
    }
  });
  it('the long-permutation path agrees with the definition', () => {
    fc.assert(
      fc.property(permArb(60, 300), (a) => {
        const c = lehmerCode(a);
        a.forEach((x, i) => expect(c[i]).toBe(a.slice(i + 1).filter((y) => y < x).length));
      }),
      { numRuns: 40 },
    );
  });
});
