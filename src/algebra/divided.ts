// Divided difference operators, monomial by monomial (no polynomial division):
//   d(f) = (f - s f) / (a - b), s exchanging the variables a and b, and on one monomial
//   d(a^i b^j) = sum_{k=0}^{i-j-1} a^{i-1-k} b^{j+k}  (i > j),  0 (i = j),  -d(a^j b^i) (i < j).
// The isobaric version pi(f) = d((1 - b) f) gives Grothendieck polynomials.

import { fail } from '../base/errors.js';
import type { Scalar } from '../numbers/rational.js';
import { sneg } from '../numbers/scalar.js';
import { expandExps, fromCollector, isPolynomial, pmul, psub, unionVars, type PolyLike } from './polynomial.js';
import { TermCollector } from './terms.js';
import { rankOf } from './variables.js';

/** The divided difference of p with respect to the variables a and b (ids). */
export function dividedDifference(p: PolyLike, a: number, b: number): PolyLike {
  if (a === b) fail('a divided difference needs two different variables');
  if (!isPolynomial(p)) return 0;
  // Lay p out over its variables together with a and b.
  const vars =
    p.vars.includes(a) && p.vars.includes(b) ? p.vars : unionVars(p.vars, Int32Array.from([a, b].sort((u, v) => rankOf(u) - rankOf(v))));
  const nv = vars.length;
  const exps = expandExps(p, vars);
  const pa = vars.indexOf(a),
    pb = vars.indexOf(b);
  const maxExp = new Int32Array(nv);
  for (let i = 0; i < exps.length; i += nv) for (let v = 0; v < nv; v++) if (exps[i + v] > maxExp[v]) maxExp[v] = exps[i + v];
  const top = Math.max(maxExp[pa], maxExp[pb]);
  maxExp[pa] = top;
  maxExp[pb] = top;
  const c = new TermCollector(nv, maxExp, p.length * 2);
  const row = new Int32Array(nv);
  const n = p.length;
  for (let t = 0; t < n; t++) {
    const off = t * nv;
    const i = exps[off + pa],
      j = exps[off + pb];
    if (i === j) continue;
    for (let v = 0; v < nv; v++) row[v] = exps[off + v];
    let coef: Scalar = p.coefs[t];
    let hi = i,
      lo = j;
    if (i < j) {
      coef = sneg(coef);
      hi = j;
      lo = i;
    }
    for (let k = 0; k < hi - lo; k++) {
      row[pa] = hi - 1 - k;
      row[pb] = lo + k;
      c.add(row, 0, coef);
    }
  }
  return fromCollector(vars, c);
}

/** The isobaric divided difference pi(f) = d((1 - b) f) with respect to a and b. */
export function isobaricDividedDifference(p: PolyLike, a: number, b: number, bVar: PolyLike): PolyLike {
  return dividedDifference(psub(p, pmul(bVar, p)), a, b);
}
