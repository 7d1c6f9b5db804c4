// Narayana, Eulerian and Motzkin numbers, the centraliser orders z_lambda and class sizes of the
// symmetric group.

import { fail } from '../base/errors.js';
import { normBig, type Int } from '../numbers/integer.js';
import { partitionArg, sizeOf } from '../families/tableaux/shapes.js';
import type { Value } from '../values/value.js';
import { defineFunction } from './registry.js';
import { smallIntArg } from './integerArgs.js';
import { eulerianRow, motzkin, narayana } from './numbers/triangles.js';
import { factorialBig } from '../families/permutations/permutations.js';

const topic = 'numbers';
const N_MAX = 2000;

/** A triangle's column index: outside 0..n everything is 0, so huge values are clamped. */
function column(k: Value): number {
  const x = k as Int;
  if (typeof x === 'bigint') return x < 0n ? -1 : N_MAX + 1;
  return x;
}

/** z_lambda = prod over i of i^{m_i} m_i!, m_i the multiplicity of the part i. */
export function zOf(parts: readonly number[]): bigint {
  const mult = new Map<number, number>();
  for (const p of parts) mult.set(p, (mult.get(p) ?? 0) + 1);
  let z = 1n;
  for (const [i, m] of mult) z *= BigInt(i) ** BigInt(m) * factorialBig(m);
  return z;
}

defineFunction({
  name: 'narayana',
  topic,
  params: [
    { name: 'n', type: 'integer' },
    { name: 'k', type: 'integer' },
  ],
  returns: 'integer',
  description: 'the Narayana number N(n, k) = C(n, k) C(n, k-1) / n: Dyck paths of semilength n with k peaks (N(0, 0) = 1)',
  example: 'narayana(5, 3)',
  exampleValue: '20',
  source: 'OEIS A001263',
  impl: (n, k) => normBig(narayana(smallIntArg('narayana(n, k)', 'n', n, 0, N_MAX), column(k))),
});

defineFunction({
  name: 'eulerian',
  topic,
  params: [
    { name: 'n', type: 'integer' },
    { name: 'k', type: 'integer' },
  ],
  returns: 'integer',
  description: 'the Eulerian number A(n, k): permutations of 1..n with exactly k descents, 0 <= k <= n - 1 (A(0, 0) = 1)',
  example: 'eulerian(4, 1)',
  exampleValue: '11',
  source: 'OEIS A008292 (whose T(n, k) is eulerian(n, k - 1)); Stanley, Enumerative Combinatorics 1, 2nd ed., §1.4',
  impl: (n, k) => {
    const row = eulerianRow(smallIntArg('eulerian(n, k)', 'n', n, 0, N_MAX));
    const c = column(k);
    return c >= 0 && c < row.length ? normBig(row[c]) : 0;
  },
});

defineFunction({
  name: 'motzkin',
  topic,
  params: [{ name: 'n', type: 'integer' }],
  returns: 'integer',
  description: 'the Motzkin number M(n): paths of n steps U, F, D from 0 to 0 never below the axis',
  example: 'motzkin(6)',
  exampleValue: '51',
  source: 'OEIS A001006',
  impl: (n) => normBig(motzkin(smallIntArg('motzkin(n)', 'n', n, 0, 100_000))),
});

defineFunction({
  name: 'centralizerSize',
  topic,
  params: [{ name: 'lambda', type: ['partition', 'list'] }],
  returns: 'integer',
  description: 'z_lambda = prod i^(m_i) m_i!: the order of the centraliser of a permutation of cycle type lambda',
  example: 'centralizerSize(partition([2, 2, 1]))',
  exampleValue: '8',
  source: 'Macdonald, Symmetric Functions and Hall Polynomials, I (2.14); Stanley, Enumerative Combinatorics 1, Prop. 1.3.2',
  impl: (l) => normBig(zOf(partitionArg(l))),
});

defineFunction({
  name: 'classSize',
  topic,
  params: [{ name: 'lambda', type: ['partition', 'list'] }],
  returns: 'integer',
  description: 'n!/z_lambda: the number of permutations of 1..n of cycle type lambda',
  example: 'classSize(partition([2, 2, 1]))',
  exampleValue: '15',
  source: 'Stanley, Enumerative Combinatorics 1, 2nd ed., Prop. 1.3.2; summed over lambda: n! (OEIS A000142)',
  impl: (l) => {
    const parts = partitionArg(l);
    const n = sizeOf(parts);
    if (n > 100_000) fail(`classSize(lambda) is limited to |lambda| <= 100000`);
    return normBig(factorialBig(n) / zOf(parts));
  },
});
