// Structural operations on polynomials beyond the ring operations: reading coefficients and
// terms, degrees, simultaneous substitution, renaming variables, univariate coefficient lists.

import { fail } from '../base/errors.js';
import type { Scalar } from '../numbers/rational.js';
import { sisZero } from '../numbers/scalar.js';
import {
  expandExps,
  fromCollector,
  fromTerms,
  isPolynomial,
  makePolynomial,
  maxOver,
  padd,
  pmul,
  polyText,
  ppow,
  unionVars,
  type Polynomial,
  type PolyLike,
} from './polynomial.js';
import { mulScalars, TermCollector } from './terms.js';
import { varName } from './variables.js';

/** The single variable id of p when p is exactly one indeterminate (coefficient 1, power 1). */
export function asVariable(p: PolyLike): number | undefined {
  if (!isPolynomial(p) || p.nv !== 1 || p.length !== 1 || p.coefs[0] !== 1 || p.exps[0] !== 1) return undefined;
  return p.vars[0];
}

/** Exponents of the single term of a monomial (coefficient 1), by variable id. */
export function asMonomial(m: PolyLike): Map<number, number> | undefined {
  if (!isPolynomial(m)) return m === 1 ? new Map() : undefined;
  if (m.length !== 1 || m.coefs[0] !== 1) return undefined;
  const out = new Map<number, number>();
  for (let v = 0; v < m.nv; v++) out.set(m.vars[v], m.exps[v]);
  return out;
}

/** The coefficient of a monomial (exponents by variable id) in p: exact, a number. */
export function coefficientOf(p: PolyLike, mono: Map<number, number>): Scalar {
  if (!isPolynomial(p)) return mono.size === 0 ? p : 0;
  for (const id of mono.keys()) if (!p.vars.includes(id)) return 0;
  const nv = p.nv;
  const want = Array.from(p.vars, (id) => mono.get(id) ?? 0);
  for (let t = 0; t < p.length; t++) {
    let ok = true;
    for (let v = 0; v < nv; v++)
      if (p.exps[t * nv + v] !== want[v]) {
        ok = false;
        break;
      }
    if (ok) return p.coefs[t];
  }
  return 0;
}

/** The terms of p in print order, each as coefficient times monomial (a constant as a number). */
export function termsOf(p: PolyLike): PolyLike[] {
  if (!isPolynomial(p)) return sisZero(p) ? [] : [p];
  const out: PolyLike[] = [];
  for (let t = 0; t < p.length; t++) out.push(makePolynomial(p.vars, p.exps.slice(t * p.nv, (t + 1) * p.nv), [p.coefs[t]]));
  return out;
}

/** The nonzero coefficients of p in print order (descending degree, then lexicographic). */
export function coefficientsOf(p: PolyLike): Scalar[] {
  if (!isPolynomial(p)) return sisZero(p) ? [] : [p];
  return p.coefs.slice();
}

/** Total degree (of a Laurent polynomial: the highest total degree of a term); fails for 0. */
export function totalDegree(p: PolyLike): number {
  if (!isPolynomial(p)) {
    if (sisZero(p)) fail('the zero polynomial has no degree');
    return 0;
  }
  return p.termDegree(0); // terms are sorted by total degree, highest first
}

/** Degree in one variable (the highest exponent; negative for q^-1); fails for the zero polynomial. */
export function degreeIn(p: PolyLike, id: number): number {
  if (!isPolynomial(p)) {
    if (sisZero(p)) fail('the zero polynomial has no degree');
    return 0;
  }
  const v = p.vars.indexOf(id);
  if (v < 0) return 0;
  let d = -Infinity; // the highest exponent, negative for q^-1 + q^-2
  for (let t = 0; t < p.length; t++) d = Math.max(d, p.exps[t * p.nv + v]);
  return d;
}

/**
 * Substitute values for variables simultaneously: every variable id in `values` is replaced by
 * its value (a number or a polynomial); the others stay.
 */
export function substitute(p: PolyLike, values: Map<number, PolyLike>): PolyLike {
  if (!isPolynomial(p)) return p;
  const nv = p.nv;
  const target = Array.from(p.vars, (id) => values.get(id));
  if (target.every((t) => t === undefined)) return p;
  if (target.every((t) => t === undefined || !isPolynomial(t))) {
    // All substituted values are numbers: the remaining monomials keep their exponent rows.
    const c = new TermCollector(nv, p.maxExps(), p.length);
    const row = new Int32Array(nv);
    const powCache = target.map(() => new Map<number, Scalar>());
    for (let t = 0; t < p.length; t++) {
      let coef: Scalar = p.coefs[t];
      for (let v = 0; v < nv; v++) {
        const e = p.exps[t * nv + v];
        const val = target[v] as Scalar | undefined;
        if (val === undefined) row[v] = e;
        else {
          row[v] = 0;
          if (e !== 0) {
            let pw = powCache[v].get(e);
            if (pw === undefined) powCache[v].set(e, (pw = ppow(val, e) as Scalar));
            coef = mulScalars(coef, pw);
          }
        }
      }
      c.add(row, 0, coef);
    }
    return fromCollector(p.vars, c);
  }
  return substitutePolynomials(p, target);
}

/**
 * The general case of substitute: some values are polynomials. Every term of p expands into the
 * products of the powers of its substituted values (cached per variable and exponent), laid out
 * over the union of all variables, and every product term goes into one collector that is sorted
 * once: linear in the number of terms produced (x[1] -> -x[1] on a polynomial of N terms is N
 * single-term products), never a running sum that is re-merged term after term.
 */
function substitutePolynomials(p: Polynomial, target: (PolyLike | undefined)[]): PolyLike {
  const nv = p.nv;
  let vars = p.vars;
  for (const t of target) if (isPolynomial(t)) vars = unionVars(vars, t.vars);
  const NV = vars.length;
  const where = Array.from(p.vars, (id) => vars.indexOf(id));
  // Upper bounds of the exponents of the result, to choose the collector's packing.
  const pMax = p.maxExps();
  const bound = new Int32Array(NV);
  for (let v = 0; v < nv; v++) {
    const t = target[v];
    if (t === undefined) bound[where[v]] += pMax[v];
    else if (isPolynomial(t)) {
      const tm = maxOver(expandExps(t, vars), NV);
      for (let u = 0; u < NV; u++) bound[u] += pMax[v] * tm[u];
    }
  }
  // Powers of the substituted values, laid out over vars: [flat exponent rows, coefficients].
  const powers = target.map(() => new Map<number, { exps: Int32Array; coefs: readonly Scalar[] }>());
  const powerOf = (v: number, e: number) => {
    let pw = powers[v].get(e);
    if (pw === undefined) {
      const x = ppow(target[v]!, e);
      pw = isPolynomial(x) ? { exps: expandExps(x, vars), coefs: x.coefs } : { exps: new Int32Array(NV), coefs: sisZero(x) ? [] : [x] };
      powers[v].set(e, pw);
    }
    return pw;
  };
  const c = new TermCollector(NV, bound, p.length);
  // The partial products of one term: rows over vars with their coefficients.
  const single = new Int32Array(NV);
  let rows = single,
    coefs: Scalar[] = [];
  for (let t = 0; t < p.length; t++) {
    rows = single;
    rows.fill(0);
    coefs = [p.coefs[t]];
    // The kept variables first, while there is a single partial product.
    for (let v = 0; v < nv; v++) if (target[v] === undefined) rows[where[v]] += p.exps[t * nv + v];
    for (let v = 0; v < nv; v++) {
      const e = p.exps[t * nv + v];
      if (e === 0 || target[v] === undefined) continue;
      const pw = powerOf(v, e);
      const k = coefs.length,
        m = pw.coefs.length;
      if (m === 1) {
        // A monomial value: every partial product stays one product.
        for (let a = 0; a < k; a++) {
          for (let u = 0; u < NV; u++) rows[a * NV + u] += pw.exps[u];
          coefs[a] = mulScalars(coefs[a], pw.coefs[0]);
        }
        continue;
      }
      const nextRows = new Int32Array(k * m * NV);
      const nextCoefs: Scalar[] = new Array(k * m);
      for (let a = 0; a < k; a++)
        for (let b = 0; b < m; b++) {
          const o = (a * m + b) * NV;
          for (let u = 0; u < NV; u++) nextRows[o + u] = rows[a * NV + u] + pw.exps[b * NV + u];
          nextCoefs[a * m + b] = mulScalars(coefs[a], pw.coefs[b]);
        }
      rows = nextRows;
      coefs = nextCoefs;
    }
    for (let a = 0; a < coefs.length; a++) if (!sisZero(coefs[a])) c.add(rows, a * NV, coefs[a]);
  }
  return fromCollector(vars, c);
}

/** Rename variables (a bijection on the ids it mentions, e.g. a swap), exactly. */
export function renameVariables(p: PolyLike, rename: Map<number, number>): PolyLike {
  if (!isPolynomial(p)) return p;
  const newIds = Array.from(p.vars, (id) => rename.get(id) ?? id);
  if (new Set(newIds).size !== newIds.length) fail('renaming variables must not merge two of them');
  const nv = p.nv;
  const terms: [Int32Array, Scalar][] = [];
  for (let t = 0; t < p.length; t++) terms.push([p.exps.subarray(t * nv, (t + 1) * nv), p.coefs[t]]);
  return fromTerms(newIds, terms);
}

/** Coefficients c_0, c_1, ..., c_d of a polynomial in the single variable `id` ([] for 0). */
export function univariateCoefficients(p: PolyLike, id: number): Scalar[] {
  if (!isPolynomial(p)) return sisZero(p) ? [] : [p];
  const others = Array.from(p.vars).filter((v) => v !== id);
  if (others.length > 0)
    fail(`${polyText(p)} is not a polynomial in ${varName(id)} alone: it also contains ${others.map(varName).join(', ')}`);
  for (let t = 0; t < p.length; t++)
    if (p.exps[t] < 0)
      fail(
        `${polyText(p)} has a negative power of ${varName(id)}: a coefficient list starts at degree 0 (use coefficient(p, ${varName(id)}, k))`,
      );
  const d = p.exps[0];
  const out: Scalar[] = new Array(d + 1).fill(0);
  for (let t = 0; t < p.length; t++) out[p.exps[t]] = p.coefs[t];
  return out;
}

/** sum c_i v^i for a coefficient list (lowest degree first) and any value v, by Horner's rule. */
export function evaluateCoefficients(c: readonly Scalar[], v: PolyLike): PolyLike {
  const id = asVariable(v);
  if (id !== undefined) {
    // Directly as a univariate polynomial: no intermediate products.
    const terms: [number[], Scalar][] = [];
    for (let i = c.length - 1; i >= 0; i--) if (!sisZero(c[i])) terms.push([[i], c[i]]);
    return fromTerms([id], terms);
  }
  let r: PolyLike = 0;
  for (let i = c.length - 1; i >= 0; i--) r = padd(pmul(r, v), c[i]);
  return r;
}
