// Kronecker coefficients g_{lambda mu nu}: the multiplicity of chi^nu in chi^lambda chi^mu, from
// the characters (Murnaghan–Nakayama, ./characters.ts) by orthogonality:
//   g = sum over rho of chi^lambda(rho) chi^mu(rho) chi^nu(rho) / z_rho
// (Macdonald, Symmetric Functions and Hall Polynomials, I.7 (7.9) and Example 23; Stanley,
// Enumerative Combinatorics 2, Ex. 7.78).

import { fail } from '../base/errors.js';
import { normBig } from '../numbers/integer.js';
import { partitionArg, sizeOf } from '../families/tableaux/shapes.js';
import { partitions } from '../families/partitions/partitions.js';
import { characterValue } from './characters.js';
import { zOf } from './sequences.js';
import { defineFunction } from './registry.js';

const MAX_N = 30;

export function kroneckerCoefficient(l: readonly number[], m: readonly number[], v: readonly number[]): bigint {
  const n = sizeOf(l);
  // sum chi chi chi * (n!/z_rho), divided by n! at the end, keeps everything integral
  let fact = 1n;
  for (let i = 2; i <= n; i++) fact *= BigInt(i);
  let s = 0n;
  partitions.enumerate({ n }, (rho) => {
    const parts = rho.parts;
    const c = characterValue(l, parts) * characterValue(m, parts);
    if (c !== 0n) s += c * characterValue(v, parts) * (fact / zOf(parts));
  });
  return s / fact;
}

defineFunction({
  name: 'kronecker',
  topic: 'tableaux',
  params: [
    { name: 'lambda', type: ['partition', 'list'] },
    { name: 'mu', type: ['partition', 'list'] },
    { name: 'nu', type: ['partition', 'list'] },
  ],
  returns: 'integer',
  description:
    'the Kronecker coefficient g_{lambda mu nu}: the multiplicity of chi^nu in the product chi^lambda chi^mu (symmetric in all three)',
  example: 'kronecker(partition([2, 1]), partition([2, 1]), partition([2, 1]))',
  exampleValue: '1',
  source:
    'Macdonald, Symmetric Functions and Hall Polynomials, I.7 (7.9); Stanley, Enumerative Combinatorics 2, Ex. 7.78 (s_21 * s_21 = s_3 + s_21 + s_111)',
  impl: (a, b, c) => {
    const l = partitionArg(a, 'lambda'),
      m = partitionArg(b, 'mu'),
      v = partitionArg(c, 'nu');
    const n = sizeOf(l);
    if (sizeOf(m) !== n || sizeOf(v) !== n)
      fail(`kronecker(lambda, mu, nu) needs partitions of one size, got ${n}, ${sizeOf(m)} and ${sizeOf(v)}`);
    if (n > MAX_N) fail(`kronecker(lambda, mu, nu) is limited to partitions of n <= ${MAX_N}`);
    return normBig(kroneckerCoefficient(l, m, v));
  },
});
