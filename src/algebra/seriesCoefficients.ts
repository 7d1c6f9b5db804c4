// Coefficients of q^k: of a Laurent polynomial directly, of a rational function through its power
// series in q (Laurent series when the denominator has a factor q^m), the other indeterminates
// staying as coefficients. For f = a / (q^m d) with d(0) a nonzero number, the series of a / d has
// c_j = (a_j - sum_{i>=1} d_i c_{j-i}) / d_0, exact; the coefficient of q^k in f is c_{k+m}.

import { fail } from '../base/errors.js';
import type { Scalar } from '../numbers/rational.js';
import { isScalar } from '../numbers/rational.js';
import { sdiv, sisZero } from '../numbers/scalar.js';
import { fromTerms, isPolynomial, pmul, polyText, psub, type PolyLike } from './polynomial.js';
import { isRationalFunction, type RationalLike } from './rationalFunction.js';
import { varName } from './variables.js';

/** The coefficients of p as a polynomial in `id`, by exponent (each free of `id`). */
export function coefficientsByPower(p: PolyLike, id: number): Map<number, PolyLike> {
  const out = new Map<number, PolyLike>();
  if (!isPolynomial(p)) {
    if (!sisZero(p)) out.set(0, p);
    return out;
  }
  const v = p.vars.indexOf(id);
  if (v < 0) {
    out.set(0, p);
    return out;
  }
  const nv = p.nv,
    groups = new Map<number, [number[], Scalar][]>();
  for (let t = 0; t < p.length; t++) {
    const row = Array.from(p.exps.subarray(t * nv, (t + 1) * nv));
    const e = row[v];
    row[v] = 0;
    let g = groups.get(e);
    if (g === undefined) groups.set(e, (g = []));
    g.push([row, p.coefs[t]]);
  }
  for (const [e, terms] of groups) out.set(e, fromTerms(Array.from(p.vars), terms));
  return out;
}

/** The coefficient of id^k in f (a number, Laurent polynomial or rational function). */
export function seriesCoefficient(f: RationalLike, id: number, k: number): PolyLike {
  if (!isRationalFunction(f)) return coefficientsByPower(f, id).get(k) ?? 0;
  const a = coefficientsByPower(f.num, id),
    dm = coefficientsByPower(f.den, id);
  const m = Math.min(...dm.keys());
  const d0 = dm.get(m)!;
  const q = varName(id);
  if (!isScalar(d0))
    fail(`coefficient(f, ${q}, k) needs a denominator whose lowest coefficient in ${q} is a number; ${f.den.toText()} has ${polyText(d0)}`);
  const K = k + m;
  if (K < 0) return 0; // the numerator has no negative powers of q
  const d: PolyLike[] = [];
  for (const [e, c] of dm) d[e - m] = c;
  const c: PolyLike[] = [];
  for (let j = 0; j <= K; j++) {
    let s: PolyLike = a.get(j) ?? 0;
    for (let i = 1; i <= j && i < d.length; i++) if (d[i] !== undefined) s = psub(s, pmul(d[i], c[j - i]));
    c.push(pmul(s, sdiv(1, d0)));
  }
  return c[K];
}
