// Stanley symmetric functions F_w = lim S_{1^m × w} (R. Stanley, "On the number of reduced
// decompositions of elements of Coxeter groups", European J. Combin. 5 (1984)), in the Schur basis
// by the rule of P. Edelman and C. Greene ("Balanced tableaux", Adv. Math. 63 (1987)): the
// coefficient of s_lambda is the number of tableaux of shape lambda, strictly increasing along rows
// and down columns, whose reading word (rows from the bottom row up, each left to right), read
// backwards, is a reduced word of w; that is, the reading word is a reduced word of w^-1 (with
// F_w defined below, F_{1342} = e_2 = s_11 and F_{1423} = h_2 = s_2). Tableaux are filled in reading
// order while the word read so far is a left factor of w^-1, which prunes all but a few branches.
//
// monomialCoefficientsOfStanley is the second algorithm the tests use: the coefficient of m_lambda
// is the number of reduced words cut into consecutive strictly decreasing blocks of lengths
// lambda_1, lambda_2, ... (from the definition F_w = sum over reduced words a and weakly increasing
// i, strictly increasing where a ascends, of x_i1 ... x_il).

import { partitionsOf } from './partitions.js';
import { leftFactorTest, lengthOf } from './permutationWords.js';

const memo = new Map<string, [number[], number][]>();

/** F_w as [lambda, coefficient] pairs in the Schur basis (w one-line, any size). */
export function stanleySchurCoefficients(w: readonly number[]): [number[], number][] {
  const key = w.join(',');
  const hit = memo.get(key);
  if (hit) return hit;
  const n = w.length,
    l = lengthOf(w);
  const inverse = new Array<number>(n);
  w.forEach((v, i) => (inverse[v - 1] = i + 1));
  const ext = leftFactorTest(inverse);
  const out: [number[], number][] = [];
  for (const lam of partitionsOf(l)) {
    if (lam.length > n || lam[0] > n - 1) continue;
    // Cells in reading order: bottom row first.
    const cells: [number, number][] = [];
    for (let r = lam.length - 1; r >= 0; r--) for (let c = 0; c < lam[r]; c++) cells.push([r, c]);
    const T = lam.map((len) => new Array<number>(len).fill(0));
    const u = Array.from({ length: n }, (_, i) => i + 1);
    let count = 0;
    const go = (k: number) => {
      if (k === cells.length) {
        count++;
        return;
      }
      const [r, c] = cells[k];
      const lo = c > 0 ? T[r][c - 1] + 1 : 1;
      const hi = r + 1 < lam.length && c < lam[r + 1] ? T[r + 1][c] - 1 : n - 1;
      for (let i = lo; i <= hi; i++) {
        if (!ext(u, i)) continue;
        [u[i - 1], u[i]] = [u[i], u[i - 1]];
        T[r][c] = i;
        go(k + 1);
        [u[i - 1], u[i]] = [u[i], u[i - 1]];
      }
      T[r][c] = 0;
    };
    go(0);
    if (count) out.push([lam.slice(), count]);
  }
  memo.set(key, out);
  return out;
}

/** The coefficient of m_lambda in F_w, by decreasing blocks of reduced words. */
export function monomialCoefficientOfStanley(w: readonly number[], lam: readonly number[]): number {
  const n = w.length;
  const ext = leftFactorTest(w);
  let states = new Map<string, { u: number[]; count: number }>([
    [Array.from({ length: n }, (_, i) => i + 1).join(','), { u: Array.from({ length: n }, (_, i) => i + 1), count: 1 }],
  ]);
  for (const len of lam) {
    // Within a block: strictly decreasing letters; the state carries the last letter.
    let inner = new Map<string, { u: number[]; count: number; last: number }>();
    for (const [k, s] of states) inner.set(`${k}|${n}`, { ...s, last: n });
    for (let step = 0; step < len; step++) {
      const next = new Map<string, { u: number[]; count: number; last: number }>();
      for (const s of inner.values())
        for (let i = 1; i < s.last; i++) {
          if (!ext(s.u, i)) continue;
          const v = s.u.slice();
          [v[i - 1], v[i]] = [v[i], v[i - 1]];
          const key = `${v.join(',')}|${i}`;
          const e = next.get(key);
          if (e) e.count += s.count;
          else next.set(key, { u: v, count: s.count, last: i });
        }
      inner = next;
    }
    states = new Map();
    for (const s of inner.values()) {
      const k = s.u.join(',');
      const e = states.get(k);
      if (e) e.count += s.count;
      else states.set(k, { u: s.u, count: s.count });
    }
  }
  return states.get(w.join(','))?.count ?? 0;
}
