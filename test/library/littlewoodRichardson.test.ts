import { describe, expect, it } from 'vitest';
import { lrCoefficient } from '../../src/library/littlewoodRichardson.js';
import { kostkaNumber } from '../../src/library/kostka.js';
import { partitions } from '../../src/families/partitions/partitions.js';
import { conjugateParts } from '../../src/families/partitions/partition.js';
import { contains, hookLengthCount } from '../../src/families/tableaux/shapes.js';
import { listAll } from '../families/partitions/uniformity.js';

const parts = (n: number) => listAll(partitions, { n }).map((l) => l.parts);

/** Second algorithm: semistandard skew tableaux of shape lambda/mu with content kappa, by brute force. */
function skewKostka(lam: number[], mu: number[], kappa: number[]): number {
  const cells: [number, number][] = [];
  for (let i = 0; i < lam.length; i++) for (let j = mu[i] ?? 0; j < lam[i]; j++) cells.push([i, j]);
  const T = lam.map((l) => new Array<number>(l).fill(0));
  const left = kappa.slice();
  let c = 0;
  const go = (k: number) => {
    if (k === cells.length) {
      if (left.every((x) => x === 0)) c++;
      return;
    }
    const [i, j] = cells[k];
    for (let v = 1; v <= kappa.length; v++) {
      if (!left[v - 1]) continue;
      if (j > (mu[i] ?? 0) && T[i][j - 1] > v) continue;
      if (i > 0 && j >= (mu[i - 1] ?? 0) && T[i - 1][j] >= v) continue;
      T[i][j] = v;
      left[v - 1]--;
      go(k + 1);
      left[v - 1]++;
    }
  };
  go(0);
  return c;
}

describe('lr(lambda, mu, nu)', () => {
  it('c^{(3,2,1)}_{(2,1),(2,1)} = 2 (Fulton, Young Tableaux, §5.2) and small cases', () => {
    expect(lrCoefficient([3, 2, 1], [2, 1], [2, 1])).toBe(2n);
    // Pieri: s_(2,1) s_(1) = s_(3,1) + s_(2,2) + s_(2,1,1).
    expect(
      [
        [3, 1],
        [2, 2],
        [2, 1, 1],
      ].map((l) => lrCoefficient(l, [2, 1], [1])),
    ).toEqual([1n, 1n, 1n]);
    expect(lrCoefficient([3], [2, 1], [1])).toBe(0n);
    expect(lrCoefficient([3, 1], [2], [2])).toBe(1n); // s_2 s_2 = s_4 + s_31 + s_22
    expect(lrCoefficient([4, 2], [2], [2])).toBe(0n); // sizes differ
  });
  it('skew Kostka numbers: K_{lambda/mu, kappa} = sum_nu c^lambda_{mu,nu} K_{nu, kappa} (Macdonald I.5 (5.3), I.9), brute force, |lambda| <= 7', () => {
    for (let n = 1; n <= 7; n++)
      for (const lam of parts(n))
        for (let k = 0; k <= n; k++)
          for (const mu of parts(k)) {
            if (!contains(lam, mu)) continue;
            for (const kappa of parts(n - k)) {
              let s = 0n;
              for (const nu of parts(n - k)) s += lrCoefficient(lam, mu, nu) * kostkaNumber(nu, kappa);
              expect(Number(s)).toBe(skewKostka(lam, mu, kappa));
            }
          }
  });
  it("symmetries: c^lambda_{mu,nu} = c^lambda_{nu,mu} = c^{lambda'}_{mu',nu'}, and sum_nu c f^nu = f^{lambda/mu}", () => {
    for (let n = 1; n <= 7; n++)
      for (const lam of parts(n))
        for (let k = 0; k <= n; k++)
          for (const mu of parts(k))
            for (const nu of parts(n - k)) {
              const c = lrCoefficient(lam, mu, nu);
              expect(lrCoefficient(lam, nu, mu)).toBe(c);
              expect(lrCoefficient(conjugateParts(lam), conjugateParts(mu), conjugateParts(nu))).toBe(c);
            }
    // Sum over lambda |- n of c^lambda_{mu,nu} f^lambda = C(n, |mu|) f^mu f^nu (induction from S_k x S_{n-k}).
    for (const mu of parts(3))
      for (const nu of parts(3)) {
        let s = 0n;
        for (const lam of parts(6)) s += lrCoefficient(lam, mu, nu) * hookLengthCount(lam);
        expect(s).toBe(20n * hookLengthCount(mu) * hookLengthCount(nu));
      }
  });
});
