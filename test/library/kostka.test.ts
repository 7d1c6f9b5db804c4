import { describe, expect, it } from 'vitest';
import { kostkaNumber } from '../../src/library/kostka.js';
import { partitions } from '../../src/families/partitions/partitions.js';
import { semistandardTableaux } from '../../src/families/tableaux/semistandardTableaux.js';
import { hookLengthCount } from '../../src/families/tableaux/shapes.js';
import { listAll } from '../families/partitions/uniformity.js';

const parts = (n: number) => listAll(partitions, { n }).map((l) => l.parts);

/** Second algorithm: enumerate all SSYT of shape lambda with entries <= len(mu) and count those of content mu. */
function bruteKostka(lam: number[], mu: number[]): number {
  let c = 0;
  const m = mu.length;
  semistandardTableaux.enumerate({ parts: lam, m, n: 0 }, (t) => {
    const w = new Array<number>(m).fill(0);
    for (const r of t.rows) for (const v of r) w[v - 1]++;
    if (w.every((x, i) => x === mu[i])) c++;
  });
  return c;
}

describe('kostka(lambda, mu)', () => {
  it('the Kostka matrices for n = 3, 4, 5 (Macdonald, Symmetric Functions and Hall Polynomials, I.6 table; reverse lexicographic order; transcribed from memory, and checked by brute force below)', () => {
    const K3 = [
      [1, 1, 1],
      [0, 1, 2],
      [0, 0, 1],
    ];
    const K4 = [
      [1, 1, 1, 1, 1],
      [0, 1, 1, 2, 3],
      [0, 0, 1, 1, 2],
      [0, 0, 0, 1, 3],
      [0, 0, 0, 0, 1],
    ];
    const K5 = [
      [1, 1, 1, 1, 1, 1, 1],
      [0, 1, 1, 2, 2, 3, 4],
      [0, 0, 1, 1, 2, 3, 5],
      [0, 0, 0, 1, 1, 3, 6],
      [0, 0, 0, 0, 1, 2, 5],
      [0, 0, 0, 0, 0, 1, 4],
      [0, 0, 0, 0, 0, 0, 1],
    ];
    for (const [n, K] of [
      [3, K3],
      [4, K4],
      [5, K5],
    ] as const) {
      const ps = parts(n);
      ps.forEach((l, i) => ps.forEach((m, j) => expect(kostkaNumber(l, m)).toBe(BigInt(K[i][j]))));
    }
  });
  it('agrees with a brute-force count of semistandard tableaux by content (n <= 6, and weak compositions)', () => {
    for (let n = 0; n <= 6; n++)
      for (const l of parts(n)) for (const m of parts(n)) expect(Number(kostkaNumber(l, m))).toBe(bruteKostka(l, m));
    // Any reordering of mu gives the same number (Bender–Knuth symmetry), zeros allowed.
    for (const l of parts(5)) {
      expect(kostkaNumber(l, [1, 0, 2, 2])).toBe(kostkaNumber(l, [2, 2, 1]));
      expect(Number(kostkaNumber(l, [1, 0, 2, 2]))).toBe(bruteKostka(l, [1, 0, 2, 2]));
    }
  });
  it('with the column weight 1^n it counts standard tableaux (hook length formula)', () => {
    for (let n = 0; n <= 9; n++) for (const l of parts(n)) expect(kostkaNumber(l, new Array<number>(n).fill(1))).toBe(hookLengthCount(l));
  });
  it('is unitriangular: K = 1 on the diagonal, 0 unless lambda dominates mu (Macdonald I.6 (6.5))', () => {
    const dom = (a: number[], b: number[]) => {
      let x = 0,
        y = 0;
      for (let i = 0; i < Math.max(a.length, b.length); i++) if ((x += a[i] ?? 0) < (y += b[i] ?? 0)) return false;
      return true;
    };
    for (const l of parts(7))
      for (const m of parts(7)) {
        const k = kostkaNumber(l, m);
        if (l === m) expect(k).toBe(1n);
        expect(k > 0n).toBe(dom(l, m));
      }
  });
});
