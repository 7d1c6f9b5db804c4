// Kronecker coefficients (src/library/kronecker.ts) against published products and identities.

import { describe, expect, it } from 'vitest';
import '../../src/library/kronecker.js';
import { kroneckerCoefficient } from '../../src/library/kronecker.js';
import { partitions } from '../../src/families/partitions/partitions.js';
import { conjugateParts } from '../../src/families/partitions/partition.js';
import { hookLengthCount } from '../../src/families/tableaux/shapes.js';

const parts = (n: number) => {
  const out: number[][] = [];
  partitions.enumerate({ n }, (l) => void out.push(l.parts.slice()));
  return out;
};
const g = (a: number[], b: number[], c: number[]) => Number(kroneckerCoefficient(a, b, c));

describe('Kronecker coefficients', () => {
  it('the products s_21 * s_21 = s_3 + s_21 + s_111 (Stanley, EC2, Ex. 7.78), s_22 * s_22 = s_4 + s_22 + s_1111, s_31 * s_31 = s_4 + s_31 + s_22 + s_211 (from memory; checked by the identities below)', () => {
    expect(parts(3).map((v) => g([2, 1], [2, 1], v))).toEqual([1, 1, 1]);
    expect(parts(4).map((v) => g([2, 2], [2, 2], v))).toEqual([1, 0, 1, 0, 1]);
    expect(parts(4).map((v) => g([3, 1], [3, 1], v))).toEqual([1, 1, 1, 1, 0]);
    expect(g([3, 2, 1], [3, 2, 1], [3, 2, 1])).toBe(5);
  });
  it("g(lambda, mu, (n)) = [lambda = mu], g(lambda, mu, (1^n)) = [mu = lambda']; symmetric; sum over nu of g f^nu = f^lambda f^mu (n <= 6)", () => {
    for (let n = 1; n <= 6; n++) {
      const ps = parts(n);
      for (const l of ps)
        for (const m of ps) {
          expect(g(l, m, [n])).toBe(l.join() === m.join() ? 1 : 0);
          expect(g(l, m, new Array(n).fill(1))).toBe(conjugateParts(l).join() === m.join() ? 1 : 0);
          let dim = 0n;
          for (const v of ps) {
            const x = g(l, m, v);
            expect(x).toBeGreaterThanOrEqual(0);
            expect(g(m, v, l)).toBe(x);
            expect(g(v, m, l)).toBe(x);
            dim += BigInt(x) * hookLengthCount(v);
          }
          expect(dim).toBe(hookLengthCount(l) * hookLengthCount(m));
        }
    }
  });
});
