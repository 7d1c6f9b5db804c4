// Littlewood–Richardson coefficients c^lambda_{mu,nu}: the number of semistandard skew tableaux of
// shape lambda/mu and content nu whose reverse reading word (rows top to bottom, each right to
// left) is a lattice word (Littlewood and Richardson 1934; Macdonald, Symmetric Functions and Hall
// Polynomials, I.9; Fulton, Young Tableaux, §5.2). Counted by filling the cells in that order.

import { defineFunction } from './registry.js';
import { partitionArg, sizeOf, contains } from '../families/tableaux/shapes.js';
import { normBig } from '../numbers/integer.js';

const memo = new Map<string, bigint>();

export function lrCoefficient(lam: readonly number[], mu: readonly number[], nu: readonly number[]): bigint {
  if (sizeOf(lam) !== sizeOf(mu) + sizeOf(nu) || !contains(lam, mu) || !contains(lam, nu)) return 0n;
  const key = `${lam.join(',')}|${mu.join(',')}|${nu.join(',')}`;
  const hit = memo.get(key);
  if (hit !== undefined) return hit;
  // Cells of lambda/mu in reverse reading order: row i from right (lam_i - 1) down to mu_i.
  const cells: [number, number][] = [];
  for (let i = 0; i < lam.length; i++) for (let j = lam[i] - 1; j >= (mu[i] ?? 0); j--) cells.push([i, j]);
  const T = lam.map((l) => new Array<number>(l).fill(0));
  const used = new Array<number>(nu.length + 1).fill(0); // used[v] letters v placed so far
  let count = 0n;
  const go = (k: number) => {
    if (k === cells.length) {
      count++;
      return;
    }
    const [i, j] = cells[k];
    // Row weakly increases: at most the entry to the right (already placed, if in the skew shape).
    const right = j + 1 < lam[i] ? T[i][j + 1] : Infinity;
    // Column strictly increases: more than the entry above, if that cell is in the skew shape.
    const above = i > 0 && j >= (mu[i - 1] ?? 0) ? T[i - 1][j] : 0;
    // In a lattice reading, a letter v in row i has v <= i + 1.
    const top = Math.min(right, nu.length, i + 1);
    for (let v = above + 1; v <= top; v++) {
      if (used[v] >= nu[v - 1]) continue;
      if (v > 1 && used[v] + 1 > used[v - 1]) continue; // lattice condition
      used[v]++;
      T[i][j] = v;
      go(k + 1);
      used[v]--;
    }
    T[i][j] = 0;
  };
  go(0);
  memo.set(key, count);
  return count;
}

defineFunction({
  name: 'lr',
  topic: 'symmetric functions',
  params: [
    { name: 'lambda', type: ['partition', 'list'] },
    { name: 'mu', type: ['partition', 'list'] },
    { name: 'nu', type: ['partition', 'list'] },
  ],
  returns: 'integer',
  description:
    'the Littlewood–Richardson coefficient c^lambda_{mu,nu}, the coefficient of s_lambda in s_mu s_nu (argument order: the outer shape lambda first, then mu and nu, which commute)',
  example: 'lr(partition([3, 2, 1]), partition([2, 1]), partition([2, 1]))',
  exampleValue: '2',
  source: 'Littlewood–Richardson rule, Macdonald, Symmetric Functions and Hall Polynomials, I.9; Fulton, Young Tableaux, §5.2',
  impl: (l, m, n) => normBig(lrCoefficient(partitionArg(l, 'lambda'), partitionArg(m, 'mu'), partitionArg(n, 'nu'))),
});
