// Matchings (src/library/matchings.ts): arcs, partner on the circle, crossings and nestings against
// brute force, the Touchard–Riordan formula and their equidistribution.

import { describe, expect, it } from 'vitest';
import '../../src/library/matchings.js';
import { Matching } from '../../src/families/matchings/matching.js';
import { call } from './permutations/helpers.js';

/** All perfect matchings of 1..2n as partner lists: match the least free point with each other one. */
function allMatchings(n: number): number[][] {
  const out: number[][] = [];
  const p = new Array<number>(2 * n).fill(0);
  const rec = () => {
    const a = p.indexOf(0);
    if (a < 0) return void out.push(p.slice());
    for (let b = a + 1; b < 2 * n; b++)
      if (p[b] === 0) {
        p[a] = b + 1;
        p[b] = a + 1;
        rec();
        p[a] = p[b] = 0;
      }
  };
  rec();
  return out;
}

/** Crossings and nestings over all pairs of arcs (a second algorithm). */
function pairsOfArcs(p: number[]): [number, number] {
  const arcs = p.map((b, i) => [i + 1, b]).filter(([a, b]) => a < b);
  let cr = 0,
    ne = 0;
  for (const [a, b] of arcs)
    for (const [c, d] of arcs) {
      if (a < c && c < b && b < d) cr++;
      if (a < c && d < b) ne++;
    }
  return [cr, ne];
}

const m = (p: number[]) => new Matching(p);

describe('arcs and partner', () => {
  it('arcs lists [a, b] with a < b sorted by a, and rebuilds the matching', () => {
    for (const p of allMatchings(4)) {
      const arcs = call('arcs', m(p)) as number[][];
      expect(arcs.length).toBe(4);
      for (let i = 0; i < arcs.length; i++) {
        expect(arcs[i][0] < arcs[i][1]).toBe(true);
        if (i) expect(arcs[i - 1][0] < arcs[i][0]).toBe(true);
      }
      expect(Matching.fromArcs(arcs).p).toEqual(p);
    }
    expect(call('arcs', m([]))).toEqual([]);
  });
  it('partner takes points mod 2n: 2n+1 means 1, 0 means 2n, and so on for any integer', () => {
    const x = m([4, 3, 2, 1]); // arcs (1,4), (2,3)
    expect([1, 2, 3, 4].map((i) => call('partner', x, i))).toEqual([4, 3, 2, 1]);
    expect(call('partner', x, 5)).toBe(4);
    expect(call('partner', x, 0)).toBe(1);
    expect(call('partner', x, -1)).toBe(2);
    expect(call('partner', x, 10n ** 20n + 1n)).toBe(4); // 10^20 + 1 = 1 mod 4
    expect(() => call('partner', m([]), 1)).toThrow(/the empty matching has no points/);
  });
});

describe('crossings and nestings', () => {
  it('agree with the count over pairs of arcs on every matching with n <= 6', () => {
    for (let n = 0; n <= 6; n++)
      for (const p of allMatchings(n)) expect([call('crossings', m(p)), call('nestings', m(p))]).toEqual(pairsOfArcs(p));
  });
  it('are equidistributed, jointly symmetric (de Sainte-Catherine 1983), n <= 6; the number of matchings is (2n-1)!! (OEIS A001147)', () => {
    const a001147 = [1, 1, 3, 15, 105, 945, 10395];
    for (let n = 0; n <= 6; n++) {
      const joint = new Map<string, number>();
      const all = allMatchings(n);
      expect(all.length).toBe(a001147[n]);
      for (const p of all) {
        const key = `${call('crossings', m(p))},${call('nestings', m(p))}`;
        joint.set(key, (joint.get(key) ?? 0) + 1);
      }
      for (const [key, c] of joint) expect(joint.get(key.split(',').reverse().join(','))).toBe(c);
    }
  });
  it('noncrossing and nonnesting matchings both number Catalan (OEIS A000108)', () => {
    const a000108 = [1, 1, 2, 5, 14, 42, 132, 429];
    for (let n = 0; n <= 7; n++) {
      const all = allMatchings(n);
      expect(all.filter((p) => call('crossings', m(p)) === 0).length).toBe(a000108[n]);
      expect(all.filter((p) => call('nestings', m(p)) === 0).length).toBe(a000108[n]);
    }
  });
  it('the crossing distribution is the Touchard–Riordan formula (Riordan, Math. Comp. 29 (1975)), n <= 7', () => {
    // sum_M q^cr(M) = (1-q)^(-n) sum_k (-1)^k (C(2n, n-k) - C(2n, n-k-1)) q^(k(k+1)/2)
    const C = (a: number, b: number): number => {
      if (b < 0 || b > a) return 0;
      let r = 1;
      for (let i = 1; i <= b; i++) r = (r * (a - b + i)) / i;
      return r;
    };
    for (let n = 1; n <= 7; n++) {
      const top = (n * (n - 1)) / 2;
      let series = new Array<number>(top + 1).fill(0);
      for (let k = 0; k <= n; k++) {
        const d = (k * (k + 1)) / 2;
        if (d <= top) series[d] += (k % 2 ? -1 : 1) * (C(2 * n, n - k) - C(2 * n, n - k - 1));
      }
      for (let t = 0; t < n; t++) {
        // divide by (1 - q): prefix sums
        const next = series.slice();
        for (let i = 1; i <= top; i++) next[i] = next[i - 1] + series[i];
        series = next;
      }
      const dist = new Array<number>(top + 1).fill(0);
      for (const p of allMatchings(n)) dist[call('crossings', m(p)) as number]++;
      expect(dist).toEqual(series);
    }
  });
});
