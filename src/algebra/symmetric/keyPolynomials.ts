// Key polynomials (Demazure characters) and Demazure atoms of a weak composition alpha, in
// x[1..len(alpha)] (A. Lascoux, M.-P. Schützenberger, "Keys & standard bases", Invariant Theory and
// Tableaux, IMA Vol. 19 (1990); V. Reiner, M. Shimozono, "Key polynomials and a flagged
// Littlewood–Richardson rule", J. Combin. Theory Ser. A 70 (1995)):
//   kappa_alpha = x^alpha when alpha is weakly decreasing, else kappa_alpha = pi_i kappa_{s_i alpha}
//   for an i with alpha_i < alpha_{i+1}, where pi_i f = d_i(x_i f) (d_i the divided difference);
//   the atoms use pi_i - 1 in place of pi_i.
// Memoised on (x, alpha).

import { dividedDifference } from '../divided.js';
import { fromTerms, pmul, psub, variable, type PolyLike } from '../polynomial.js';
import { indexedVarId } from '../variables.js';

const memo = new Map<string, PolyLike>();

function monomial(alpha: readonly number[], x: string): PolyLike {
  const ids = alpha.map((_, i) => indexedVarId(x, i + 1));
  return fromTerms(ids, [[alpha, 1]]);
}

function demazure(p: PolyLike, x: string, i: number): PolyLike {
  return dividedDifference(pmul(variable(`${x}[${i}]`), p), indexedVarId(x, i), indexedVarId(x, i + 1));
}

export function keyFamily(alpha: readonly number[], x: string, atom: boolean): PolyLike {
  const key = `${atom ? 'atom' : 'key'}:${x}:${alpha.join(',')}`;
  const hit = memo.get(key);
  if (hit !== undefined) return hit;
  let i = 0;
  while (i + 1 < alpha.length && alpha[i] >= alpha[i + 1]) i++;
  let out: PolyLike;
  if (i + 1 >= alpha.length) out = monomial(alpha, x);
  else {
    const b = alpha.slice();
    [b[i], b[i + 1]] = [b[i + 1], b[i]];
    const prev = keyFamily(b, x, atom);
    const up = demazure(prev, x, i + 1);
    out = atom ? psub(up, prev) : up;
  }
  memo.set(key, out);
  return out;
}
