// The Bruhat order and the right weak order on S_n.
//
// Bruhat order by the rank-matrix criterion (Björner and Brenti, Combinatorics of Coxeter Groups,
// ch. 2): u <= v iff u[i, j] <= v[i, j] for all i, j, where w[i, j] = #{a <= i : w(a) >= j}.
// Right weak order (LIBRARY.md): v = u * s_{a_1} * ... * s_{a_k} with inv(v) = inv(u) + k. Each
// such step swaps two adjacent entries into an inversion, so the set of inverted pairs of values
// only grows; conversely u <= v whenever every pair of values inverted in u is inverted in v
// (Björner and Brenti, ch. 3, inversion sets of the weak order).

import { fail } from '../../base/errors.js';
import { Permutation } from '../../families/permutations/permutation.js';
import { defineFunction, type ParamDecl } from '../registry.js';
import type { Value } from '../../values/value.js';
import { Scratch } from './scratch.js';

const bufU = new Scratch(),
  bufV = new Scratch();

export function bruhatLeq(u: readonly number[], v: readonly number[]): boolean {
  const n = u.length;
  // cu[j] = #{a <= i : u(a) >= j} for the rows i seen so far; the same for cv.
  const cu = bufU.get(n + 2),
    cv = bufV.get(n + 2);
  for (let i = 0; i < n; i++) {
    for (let j = u[i]; j >= 1; j--) cu[j]++;
    for (let j = v[i]; j >= 1; j--) cv[j]++;
    for (let j = 1; j <= n; j++) if (cu[j] > cv[j]) return false;
  }
  return true;
}

export function weakLeq(u: readonly number[], v: readonly number[]): boolean {
  const n = u.length;
  const pu = bufU.get(n + 1),
    pv = bufV.get(n + 1); // positions of the values
  for (let i = 0; i < n; i++) {
    pu[u[i]] = i;
    pv[v[i]] = i;
  }
  for (let x = 1; x <= n; x++) for (let y = x + 1; y <= n; y++) if (pu[x] > pu[y] && pv[x] < pv[y]) return false;
  return true;
}

function sameSize(call: string, u: Value, v: Value): [number[], number[]] {
  const a = (u as Permutation).a,
    b = (v as Permutation).a;
  if (a.length !== b.length) fail(`${call} compares permutations of the same size, got sizes ${a.length} and ${b.length}`);
  return [a, b];
}

const topic = 'permutations';
const params: ParamDecl[] = [
  { name: 'u', type: 'permutation' },
  { name: 'v', type: 'permutation' },
];

defineFunction({
  name: 'bruhatLeq',
  topic,
  params,
  returns: 'boolean',
  description: 'whether u <= v in the Bruhat order of S_n (u and v of the same size)',
  example: 'bruhatLeq(perm([1, 3, 2]), perm([3, 1, 2]))',
  exampleValue: 'true',
  source:
    'Björner and Brenti, Combinatorics of Coxeter Groups, ch. 2: rank-matrix criterion, tested against the tableau criterion and the definition',
  impl: (u, v) => bruhatLeq(...sameSize('bruhatLeq(u, v)', u, v)),
});

defineFunction({
  name: 'weakLeq',
  topic,
  params,
  returns: 'boolean',
  description: 'whether u <= v in the right weak order: v = u * s_{a_1} * ... * s_{a_k} with inv(v) = inv(u) + k',
  example: 'weakLeq(perm([2, 1, 3]), perm([3, 1, 2]))',
  exampleValue: 'false',
  source: 'Björner and Brenti, Combinatorics of Coxeter Groups, ch. 3: inversion-set criterion, tested against the definition',
  impl: (u, v) => weakLeq(...sameSize('weakLeq(u, v)', u, v)),
});
