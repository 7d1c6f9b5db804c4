// The symmetries of the square acting on permutations: complement and reverse-complement (reverse
// itself is the list function reverse, which also takes permutations), and the left-to-right
// records.

import { Permutation } from '../../families/permutations/permutation.js';
import { defineFunction, type ParamDecl } from '../registry.js';

const topic = 'permutations';
const P: ParamDecl[] = [{ name: 'w', type: 'permutation' }];

export function complement(a: readonly number[]): number[] {
  const n = a.length;
  return a.map((v) => n + 1 - v);
}

export function reverseComplement(a: readonly number[]): number[] {
  const n = a.length;
  const out = new Array<number>(n);
  for (let i = 0; i < n; i++) out[i] = n + 1 - a[n - 1 - i];
  return out;
}

/** The number of i with w[i] larger (dir = 1) or smaller (dir = -1) than every entry before it. */
export function leftToRightRecords(a: readonly number[], dir: 1 | -1): number {
  let best = -Infinity,
    c = 0;
  for (const v of a)
    if (dir * v > best) {
      best = dir * v;
      c++;
    }
  return c;
}

defineFunction({
  name: 'complement',
  topic,
  params: P,
  returns: 'permutation',
  description: 'the complement: the permutation with entries n + 1 - w[i]',
  example: 'complement(perm([3, 1, 4, 2]))',
  exampleValue: 'perm([2, 4, 1, 3])',
  source: 'definition; inv(complement(w)) = C(n, 2) - inv(w) (Bóna, Combinatorics of Permutations, ch. 4)',
  impl: (w) => new Permutation(complement((w as Permutation).a)),
});

defineFunction({
  name: 'reverseComplement',
  topic,
  params: P,
  returns: 'permutation',
  description: 'the reverse of the complement: the entries n + 1 - w[n + 1 - i] (the rotation of the diagram by a half turn)',
  example: 'reverseComplement(perm([3, 1, 4, 2]))',
  exampleValue: 'perm([3, 1, 4, 2])',
  source: 'definition; it keeps inv and the descent number (Bóna, Combinatorics of Permutations, ch. 4)',
  impl: (w) => new Permutation(reverseComplement((w as Permutation).a)),
});

defineFunction({
  name: 'leftToRightMaxima',
  topic,
  params: P,
  returns: 'integer',
  description: 'the number of left-to-right maxima: positions i with w[i] larger than every entry before it',
  example: 'leftToRightMaxima(perm([3, 1, 4, 2, 5]))',
  exampleValue: '3',
  source: 'OEIS A132393 (equidistributed with cycles: Stirling numbers of the first kind; Stanley, EC1, Prop. 1.3.1)',
  impl: (w) => leftToRightRecords((w as Permutation).a, 1),
});

defineFunction({
  name: 'leftToRightMinima',
  topic,
  params: P,
  returns: 'integer',
  description: 'the number of left-to-right minima: positions i with w[i] smaller than every entry before it',
  example: 'leftToRightMinima(perm([3, 1, 4, 2, 5]))',
  exampleValue: '2',
  source: 'OEIS A132393 (Stirling numbers of the first kind, as for left-to-right maxima)',
  impl: (w) => leftToRightRecords((w as Permutation).a, -1),
});
