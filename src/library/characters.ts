// Irreducible characters of the symmetric group by the Murnaghan–Nakayama rule:
// chi^lambda(mu) = sum over rim hooks R of size mu_1 of (-1)^(ht R) chi^(lambda - R)(mu_2, mu_3, ...)
// (James and Kerber, The Representation Theory of the Symmetric Group, 2.4.7; Macdonald, Symmetric
// Functions and Hall Polynomials, I.7 Ex. 5). Rim hooks are removed on beta-sets: removing a rim
// hook of length r moves one bead b to b - r (an empty place), with height = the beads in between.

import { fail } from '../base/errors.js';
import { defineFunction } from './registry.js';
import { partitionArg, sizeOf } from '../families/tableaux/shapes.js';
import { weightArg } from './kostka.js';
import { normBig } from '../numbers/integer.js';

const memo = new Map<string, bigint>();

function betaToParts(beta: readonly number[]): number[] {
  // beta decreasing; part i = beta_i - (len - 1 - i)
  const len = beta.length,
    out: number[] = [];
  for (let i = 0; i < len; i++) {
    const p = beta[i] - (len - 1 - i);
    if (p > 0) out.push(p);
  }
  return out;
}

export function characterValue(lam: readonly number[], mu: readonly number[]): bigint {
  const parts = mu.filter((x) => x > 0);
  if (sizeOf(lam) !== sizeOf(parts)) fail(`character(lambda, mu) needs |lambda| = |mu|, got ${sizeOf(lam)} and ${sizeOf(parts)}`);
  return chi(lam, parts, 0);
}

function chi(lam: readonly number[], mu: readonly number[], k: number): bigint {
  if (k === mu.length) return 1n;
  const key = lam.join(',') + '|' + mu.slice(k).join(',');
  const hit = memo.get(key);
  if (hit !== undefined) return hit;
  const r = mu[k];
  const len = lam.length;
  const beta = lam.map((p, i) => p + (len - 1 - i)); // strictly decreasing
  const has = new Set(beta);
  let s = 0n;
  for (let i = 0; i < len; i++) {
    const b = beta[i] - r;
    if (b < 0 || has.has(b)) continue;
    let between = 0;
    for (const c of beta) if (c > b && c < beta[i]) between++;
    const next = beta.slice();
    next[i] = b;
    next.sort((x, y) => y - x);
    const v = chi(betaToParts(next), mu, k + 1);
    s += between % 2 === 0 ? v : -v;
  }
  memo.set(key, s);
  return s;
}

defineFunction({
  name: 'character',
  topic: 'tableaux',
  params: [
    { name: 'lambda', type: ['partition', 'list'] },
    { name: 'mu', type: ['partition', 'list'] },
  ],
  returns: 'integer',
  description: 'chi^lambda(mu), the irreducible character of S_n indexed by lambda on the class of cycle type mu (Murnaghan–Nakayama)',
  example: 'character(partition([3, 1]), partition([2, 1, 1]))',
  exampleValue: '1',
  source:
    'Murnaghan–Nakayama rule; character tables of S_n, James and Kerber, The Representation Theory of the Symmetric Group, Appendix I.A',
  impl: (l, m) => normBig(characterValue(partitionArg(l, 'lambda'), weightArg(m, 'mu'))),
});
