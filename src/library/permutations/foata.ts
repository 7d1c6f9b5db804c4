// Foata's bijection phi on permutations (and words), with inv(phi(w)) = maj(w), and the inverse
// major index imaj(w) = maj(w^-1). D. Foata, "On the Netto inversion number of a sequence", Proc.
// Amer. Math. Soc. 19 (1968); Foata and Schützenberger, Math. Nachr. 83 (1978).

import { Permutation } from '../../families/permutations/permutation.js';
import { defineFunction } from '../registry.js';
import { maj } from './statistics.js';
import { inverse } from './constructions.js';

const topic = 'permutations';

/**
 * phi(w): g = w_1; for each next letter x, cut g after every letter > x if the last letter of g is
 * > x (else after every letter < x), move the last letter of each piece to its front, and append x.
 */
export function foata(a: readonly number[]): number[] {
  let g: number[] = [];
  for (const x of a) {
    if (g.length > 0) {
      const big = g[g.length - 1] > x;
      const out: number[] = [];
      let start = 0;
      for (let i = 0; i < g.length; i++) {
        if ((big && g[i] > x) || (!big && g[i] < x)) {
          out.push(g[i], ...g.slice(start, i));
          start = i + 1;
        }
      }
      g = out;
    }
    g.push(x);
  }
  return g;
}

defineFunction({
  name: 'foata',
  topic,
  params: [{ name: 'w', type: 'permutation' }],
  returns: 'permutation',
  description: "Foata's bijection phi of S_n, with inv(foata(w)) = maj(w) and the same last entry",
  example: 'foata(perm([3, 1, 4, 2]))',
  exampleValue: 'perm([3, 4, 1, 2])',
  source: 'Foata, Proc. Amer. Math. Soc. 19 (1968); it keeps the inverse descent set (Foata and Schützenberger, Math. Nachr. 83 (1978))',
  impl: (w) => new Permutation(foata((w as Permutation).a)),
});

defineFunction({
  name: 'imaj',
  topic,
  params: [{ name: 'w', type: 'permutation' }],
  returns: 'integer',
  description: 'the inverse major index maj(w^-1): the sum of the i such that i + 1 stands left of i in w',
  example: 'imaj(perm([3, 1, 4, 2]))',
  exampleValue: '2',
  source: 'OEIS A008302 (Mahonian); (maj, imaj) is symmetric, Foata and Schützenberger, Math. Nachr. 83 (1978)',
  impl: (w) => maj(inverse((w as Permutation).a)),
});
