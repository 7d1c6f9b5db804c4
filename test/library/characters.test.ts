import { describe, expect, it } from 'vitest';
import { characterValue } from '../../src/library/characters.js';
import { kostkaNumber } from '../../src/library/kostka.js';
import { partitions } from '../../src/families/partitions/partitions.js';
import { hookLengthCount } from '../../src/families/tableaux/shapes.js';
import { conjugateParts } from '../../src/families/partitions/partition.js';
import { listAll } from '../families/partitions/uniformity.js';

const parts = (n: number) => listAll(partitions, { n }).map((l) => l.parts);
const chi = (l: number[], m: number[]) => Number(characterValue(l, m));

/** z_mu = prod_i i^{m_i} m_i!, the centraliser order of the class mu. */
function z(mu: number[]): number {
  const mult = new Map<number, number>();
  for (const p of mu) mult.set(p, (mult.get(p) ?? 0) + 1);
  let r = 1;
  for (const [i, m] of mult) for (let k = 1; k <= m; k++) r *= i * k;
  return r;
}

/**
 * Second algorithm: p_mu = sum_lambda chi^lambda(mu) s_lambda, so the coefficient of m_kappa in p_mu,
 * the number of ways to put the parts of mu into boxes 1..l(kappa) with box sums kappa, equals
 * sum_lambda chi^lambda(mu) K_{lambda, kappa} (Macdonald I.7 (7.8) with I.6).
 */
function boxings(mu: number[], kappa: number[]): number {
  const left = kappa.slice();
  const go = (k: number): number => {
    if (k === mu.length) return left.every((x) => x === 0) ? 1 : 0;
    let c = 0;
    for (let b = 0; b < left.length; b++) {
      if (left[b] < mu[k]) continue;
      left[b] -= mu[k];
      c += go(k + 1);
      left[b] += mu[k];
    }
    return c;
  };
  return go(0);
}

describe('character(lambda, mu)', () => {
  it('the character table of S_4 (James and Kerber, Appendix I.A — transcribed from memory, checked by orthogonality below)', () => {
    // Rows lambda and columns mu in reverse lexicographic order: (4), (3,1), (2,2), (2,1,1), (1^4).
    const T = [
      [1, 1, 1, 1, 1],
      [3, 1, -1, 0, -1],
      [2, 0, 2, -1, 0],
      [3, -1, -1, 0, 1],
      [1, -1, 1, 1, -1],
    ];
    const ps = parts(4);
    // Our column order is also reverse lexicographic: (4), (3,1), (2,2), (2,1,1), (1^4); the table
    // above is written with columns (1^4), (2,1,1), (2,2), (3,1), (4).
    const cols = [[1, 1, 1, 1], [2, 1, 1], [2, 2], [3, 1], [4]];
    ps.forEach((l, i) => cols.forEach((m, j) => expect(chi(l, m)).toBe(T[i][j])));
  });
  it('the character table of S_5 (James and Kerber, Appendix I.A; from memory, checked by orthogonality below)', () => {
    const cols = [[1, 1, 1, 1, 1], [2, 1, 1, 1], [2, 2, 1], [3, 1, 1], [3, 2], [4, 1], [5]];
    const T = [
      [1, 1, 1, 1, 1, 1, 1],
      [4, 2, 0, 1, -1, 0, -1],
      [5, 1, 1, -1, 1, -1, 0],
      [6, 0, -2, 0, 0, 0, 1],
      [5, -1, 1, -1, -1, 1, 0],
      [4, -2, 0, 1, 1, 0, -1],
      [1, -1, 1, 1, -1, -1, 1],
    ];
    parts(5).forEach((l, i) => cols.forEach((m, j) => expect(chi(l, m)).toBe(T[i][j])));
  });
  it('row and column orthogonality for n <= 7 (James and Kerber 2.3; sum_lambda chi(mu) chi(nu) = z_mu delta)', () => {
    for (let n = 1; n <= 7; n++) {
      const ps = parts(n);
      for (const m of ps)
        for (const k of ps) {
          let s = 0;
          for (const l of ps) s += chi(l, m) * chi(l, k);
          expect(s).toBe(m === k ? z(m) : 0);
        }
      let fact = 1;
      for (let i = 2; i <= n; i++) fact *= i;
      for (const a of ps)
        for (const b of ps) {
          let s = 0;
          for (const m of ps) s += (fact / z(m)) * chi(a, m) * chi(b, m);
          expect(s).toBe(a === b ? fact : 0);
        }
    }
  });
  it("degree = f^lambda, and chi^{lambda'} = sign(mu) chi^lambda", () => {
    for (let n = 1; n <= 8; n++)
      for (const l of parts(n)) {
        expect(BigInt(chi(l, new Array<number>(n).fill(1)))).toBe(hookLengthCount(l));
        for (const m of parts(n)) {
          const sign = m.reduce((s, p) => s * (p % 2 === 0 ? -1 : 1), 1);
          expect(chi(conjugateParts(l), m) === sign * chi(l, m)).toBe(true);
        }
      }
  });
  it('agrees with the power-sum expansion through Kostka numbers (second algorithm, n <= 6)', () => {
    for (let n = 1; n <= 6; n++) {
      const ps = parts(n);
      for (const m of ps)
        for (const k of ps) {
          let s = 0;
          for (const l of ps) s += chi(l, m) * Number(kostkaNumber(l, k));
          expect(s).toBe(boxings(m, k));
        }
    }
  });
  it('the order of the parts of mu does not matter; sizes must agree', () => {
    expect(chi([3, 2], [1, 3, 1])).toBe(chi([3, 2], [3, 1, 1]));
    expect(() => characterValue([2, 1], [2])).toThrow(/\|lambda\| = \|mu\|/);
  });
});
