// Quasisymmetric polynomials (src/library/quasisymmetric.ts): F_alpha as the sum of M_beta over the
// refinements beta of alpha (Gessel 1984), Gessel's expansion of Schur polynomials over standard
// tableaux (Stanley, EC2, Thm 7.19.7) against schur(lambda, x, m), and h_n, e_n.

import { describe, expect, it } from 'vitest';
import '../../src/library/index.js';
import { getFunction } from '../../src/library/registry.js';
import { padd, pequals, polyText, variable, type PolyLike } from '../../src/algebra/polynomial.js';
import { schurPolynomial } from '../../src/algebra/schur.js';
import { Composition } from '../../src/families/compositions/composition.js';
import { Partition } from '../../src/families/partitions/partition.js';
import { partitions } from '../../src/families/partitions/partitions.js';
import { standardTableaux } from '../../src/families/tableaux/standardTableaux.js';
import { Tableau } from '../../src/families/tableaux/tableau.js';
import type { Value } from '../../src/values/value.js';

const call = (name: string, ...args: Value[]): Value => getFunction(name)!.impl(...args);
const x = variable('x');
const M = (a: number[], m: number) => call('quasiMonomial', new Composition(a), x, m) as PolyLike;
const F = (a: number[], m: number) => call('quasiFundamental', new Composition(a), x, m) as PolyLike;

function compositions(n: number): number[][] {
  if (n === 0) return [[]];
  const out: number[][] = [];
  for (let k = 1; k <= n; k++) for (const c of compositions(n - k)) out.push([k, ...c]);
  return out;
}
const partialSums = (a: number[]) => {
  const s = new Set<number>();
  let t = 0;
  for (let i = 0; i + 1 < a.length; i++) s.add((t += a[i]));
  return s;
};

describe('quasisymmetric polynomials', () => {
  it('F_alpha = sum of M_beta over the refinements beta of alpha (Gessel 1984), n <= 5, m <= 4', () => {
    for (let n = 1; n <= 5; n++)
      for (const a of compositions(n))
        for (const m of [1, 3, 4]) {
          const sa = partialSums(a);
          let sum: PolyLike = 0;
          for (const b of compositions(n)) {
            const sb = partialSums(b);
            if ([...sa].every((s) => sb.has(s))) sum = padd(sum, M(b, m));
          }
          expect(pequals(F(a, m), sum), `F_${a} in ${m} variables`).toBe(true);
        }
  });

  it('s_lambda(x[1..m]) = sum over standard tableaux T of F_(descent composition of T) (Stanley, EC2, Thm 7.19.7), n <= 5, m = 3, 4', () => {
    for (let n = 1; n <= 5; n++)
      partitions.enumerate({ n }, (l) => {
        const shape = l.parts.slice();
        for (const m of [3, 4]) {
          let sum: PolyLike = 0;
          standardTableaux.enumerate(standardTableaux.prepare([new Partition(shape)] as never), (t: Tableau) => {
            const d = call('descents', t) as number[];
            const comp: number[] = [];
            let prev = 0;
            for (const k of [...d, n]) {
              comp.push(k - prev);
              prev = k;
            }
            sum = padd(sum, F(comp, m));
          });
          expect(pequals(sum, schurPolynomial(shape, 'x', m)), `s_${shape}`).toBe(true);
        }
      });
  });

  it('F_(n) = h_n, F_(1^n) = e_n, and the sum of M_alpha over compositions of n is h_n (definitions), n <= 4, m = 3', () => {
    for (let n = 1; n <= 4; n++) {
      let sumM: PolyLike = 0;
      for (const a of compositions(n)) sumM = padd(sumM, M(a, 3));
      expect(pequals(sumM, F([n], 3))).toBe(true);
      expect(pequals(F(new Array(n).fill(1), 3), schurPolynomial(new Array(n).fill(1), 'x', 3))).toBe(true);
      expect(pequals(F([n], 3), schurPolynomial([n], 'x', 3))).toBe(true);
    }
  });

  it('worked examples, and edge cases', () => {
    expect(polyText(M([2, 1], 3))).toBe('x[1]^2*x[2] + x[1]^2*x[3] + x[2]^2*x[3]');
    expect(M([1, 1, 1], 2)).toBe(0);
    expect(M([], 3)).toBe(1);
    expect(() => call('quasiMonomial', [0, 1], x, 3)).toThrow(/composition/);
  });
});
