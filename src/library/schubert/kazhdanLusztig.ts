// Kazhdan–Lusztig polynomials P_{u,w}(q) of the symmetric group, by the recursion of Björner and
// Brenti, Combinatorics of Coxeter Groups, Thm 5.1.7 (Kazhdan and Lusztig, Invent. Math. 53
// (1979), (2.2.c)): for a right descent s of w (ws < w), v = ws, c = 1 if us < u and 0 otherwise,
//   P_{u,w} = q^(1-c) P_{us,v} + q^c P_{u,v} - sum over z in [u, v] with zs < z of
//             mu(z, v) q^((l(w) - l(z))/2) P_{u,z},
// where P_{x,y} = 0 unless x <= y, P_{w,w} = 1, and mu(z, v) is the coefficient of
// q^((l(v) - l(z) - 1)/2) in P_{z,v}. Coefficient lists from q^0.

import { bruhatLeq } from '../permutations/orders.js';
import { inv } from '../permutations/statistics.js';

type Poly = number[];

const memo = new Map<string, Poly>();

function addInto(acc: Poly, p: Poly, shift: number, scale: number): void {
  for (let i = 0; i < p.length; i++) {
    if (!p[i]) continue;
    while (acc.length <= i + shift) acc.push(0);
    acc[i + shift] += scale * p[i];
  }
}

/** All permutations of 1..n (for the intervals of the sum). */
function allPermutations(n: number): number[][] {
  if (n === 0) return [[]];
  const out: number[][] = [];
  for (const p of allPermutations(n - 1)) for (let k = 0; k <= p.length; k++) out.push([...p.slice(0, k), n, ...p.slice(k)]);
  return out;
}
const groups = new Map<number, number[][]>();
function group(n: number): number[][] {
  let g = groups.get(n);
  if (!g) groups.set(n, (g = allPermutations(n)));
  return g;
}

const swapped = (a: readonly number[], i: number): number[] => {
  const b = a.slice();
  [b[i], b[i + 1]] = [b[i + 1], b[i]];
  return b;
};

export function klPolynomial(u: readonly number[], w: readonly number[]): Poly {
  if (!bruhatLeq(u, w)) return [];
  const key = u.join(',') + '|' + w.join(',');
  const hit = memo.get(key);
  if (hit) return hit;
  let out: Poly;
  if (u.join() === w.join()) out = [1];
  else {
    let i = 0;
    while (!(w[i] > w[i + 1])) i++; // a right descent of w (w != e since u < w)
    const v = swapped(w, i),
      us = swapped(u, i);
    const c = u[i] > u[i + 1] ? 1 : 0;
    out = [];
    addInto(out, klPolynomial(us, v), 1 - c, 1);
    addInto(out, klPolynomial(u, v), c, 1);
    const lw = inv(w),
      lv = inv(v);
    for (const z of group(w.length)) {
      if (!(z[i] > z[i + 1]) || !bruhatLeq(u, z) || !bruhatLeq(z, v) || z.join() === v.join()) continue;
      const lz = inv(z);
      if ((lv - lz) % 2 === 0) continue; // mu vanishes unless l(v) - l(z) is odd
      const mu = klPolynomial(z, v)[(lv - lz - 1) / 2] ?? 0;
      if (mu) addInto(out, klPolynomial(u, z), (lw - lz) / 2, -mu);
    }
    while (out.length && out[out.length - 1] === 0) out.pop();
  }
  memo.set(key, out);
  return out;
}
