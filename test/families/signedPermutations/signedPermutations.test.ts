// signedPermutations(n) and the type B statistics: counts (OEIS A000165), the length by a
// breadth-first search in the Coxeter generators, its generating function prod [2i]_q and that of
// fmaj (Björner and Brenti, Combinatorics of Coxeter Groups, ch. 8; Adin and Roichman 2001), and
// the type B Eulerian numbers (OEIS A060187).

import { describe, expect, it } from 'vitest';
import { signedPermutations } from '../../../src/families/signedPermutations/signedPermutations.js';
import { SignedPermutation } from '../../../src/families/signedPermutations/signedPermutation.js';
import { desB, fmaj, lengthB, negatives } from '../../../src/families/signedPermutations/statistics.js';
import { decodeValue } from '../../../src/values/decode.js';
import { checkEnumeration } from '../partitions/uniformity.js';

const A000165 = [1, 2, 8, 48, 384, 3840, 46080];

const all = (n: number) => checkEnumeration(signedPermutations, { n }).map((w) => w.a.slice());
const distribution = (ws: number[][], f: (a: number[]) => number) => {
  const d: number[] = [];
  for (const a of ws) {
    const k = f(a);
    while (d.length <= k) d.push(0);
    d[k]++;
  }
  return d;
};
/** prod_{i=1..n} [2i]_q */
function productFormula(n: number): number[] {
  let c = [1];
  for (let i = 1; i <= n; i++) {
    const out = new Array(c.length + 2 * i - 1).fill(0);
    c.forEach((x, d) => {
      for (let e = 0; e < 2 * i; e++) out[d + e] += x;
    });
    c = out;
  }
  return c;
}

describe('signedPermutations(n)', () => {
  it('counts 2^n n! (OEIS A000165) and enumerates each once', () => {
    for (let n = 0; n < A000165.length; n++) expect(signedPermutations.count({ n })).toBe(BigInt(A000165[n]));
    for (let n = 0; n <= 5; n++) expect(all(n).length).toBe(A000165[n]);
  });

  it('lengthB is the distance from the identity in the generators s_0 (negate w(1)) and s_i (breadth-first search), n <= 4', () => {
    for (let n = 1; n <= 4; n++) {
      const id = Array.from({ length: n }, (_, i) => i + 1);
      const dist = new Map<string, number>([[id.join(), 0]]);
      let frontier = [id];
      while (frontier.length) {
        const next: number[][] = [];
        for (const a of frontier) {
          const moves = [a.map((x, j) => (j === 0 ? -x : x))];
          for (let i = 0; i + 1 < n; i++) moves.push(a.map((x, j) => (j === i ? a[i + 1] : j === i + 1 ? a[i] : x)));
          for (const b of moves)
            if (!dist.has(b.join())) {
              dist.set(b.join(), dist.get(a.join())! + 1);
              next.push(b);
            }
        }
        frontier = next;
      }
      for (const a of all(n)) expect(lengthB(a), a.join()).toBe(dist.get(a.join()));
    }
  });

  it('lengthB = inv(w) - sum of the negative entries (Björner and Brenti, (8.2)), n <= 5', () => {
    for (const a of all(5)) {
      let inv = 0;
      for (let i = 0; i < 5; i++) for (let j = i + 1; j < 5; j++) if (a[i] > a[j]) inv++;
      expect(lengthB(a)).toBe(inv - a.filter((x) => x < 0).reduce((s, x) => s + x, 0));
    }
  });

  it('lengthB and fmaj both have generating function prod [2i]_q (Björner and Brenti, ch. 8; Adin and Roichman 2001), n <= 6', () => {
    for (let n = 0; n <= 6; n++) {
      const ws = all(n);
      expect(distribution(ws, lengthB)).toEqual(productFormula(n));
      expect(distribution(ws, fmaj)).toEqual(productFormula(n));
    }
  });

  it('desB: the type B Eulerian numbers, OEIS A060187 rows 1..5', () => {
    const rows = [
      [1, 1],
      [1, 6, 1],
      [1, 23, 23, 1],
      [1, 76, 230, 76, 1],
      [1, 237, 1682, 1682, 237, 1],
    ];
    rows.forEach((row, i) => expect(distribution(all(i + 1), desB)).toEqual(row));
  });

  it('negatives: binomial(n, k) n! with k negative entries', () => {
    expect(distribution(all(4), negatives)).toEqual([24, 96, 144, 96, 24]);
  });

  it('text form, encoding and decoding round-trip; bad windows are refused', () => {
    const w = SignedPermutation.from([-2, 3, 1]);
    expect(w.toText()).toBe('signedPermutation([-2, 3, 1])');
    expect(decodeValue(w.encode())).toEqual(w);
    expect(() => SignedPermutation.from([1, -1])).toThrow(/absolute values must be 1..2/);
  });
});
