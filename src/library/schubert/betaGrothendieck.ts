// beta-Grothendieck polynomials (S. Fomin and A. N. Kirillov, "Grothendieck polynomials and the
// Yang–Baxter equation", Proc. 6th Conf. Formal Power Series and Algebraic Combinatorics (1994)):
// G_{w0} = x[1]^(n-1) x[2]^(n-2) ... x[n-1] and G_{w s_i} = pi_i G_w when w(i) > w(i+1), with
// pi_i f = d_i((1 + beta x[i+1]) f). beta = -1 gives the Grothendieck polynomials, beta = 0 the
// Schubert polynomials.

import { fromTerms, padd, pmul, variable, type PolyLike } from '../../algebra/polynomial.js';
import { dividedDifference } from '../../algebra/divided.js';
import { indexedVarId } from '../../algebra/variables.js';
import { trimFixedTail } from '../../algebra/schubertPolynomials.js';

export function betaGrothendieck(a: readonly number[], x: string, beta: PolyLike): PolyLike {
  const w = trimFixedTail(a);
  const m = w.length;
  if (m <= 1) return 1;
  // climb from w to w0 along first ascents, remembering the positions
  const path: number[] = [];
  const cur = w.slice();
  for (;;) {
    let i = 0;
    while (i < m - 1 && cur[i] > cur[i + 1]) i++;
    if (i === m - 1) break;
    path.push(i + 1);
    [cur[i], cur[i + 1]] = [cur[i + 1], cur[i]];
  }
  const ids: number[] = [],
    exps: number[] = [];
  for (let i = 1; i < m; i++) {
    ids.push(indexedVarId(x, i));
    exps.push(m - i);
  }
  let p: PolyLike = fromTerms(ids, [[exps, 1]]);
  for (let s = path.length - 1; s >= 0; s--) {
    const i = path[s];
    const next = variable(`${x}[${i + 1}]`);
    p = dividedDifference(padd(p, pmul(pmul(beta, next), p)), indexedVarId(x, i), indexedVarId(x, i + 1));
  }
  return p;
}
