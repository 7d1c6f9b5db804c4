// Sparse multivariate Laurent polynomials with exact rational coefficients, always expanded.
// Exponents may be negative (q^-1 is a value; q^-1 * q == 1); an ordinary polynomial is the case
// with every exponent >= 0, and most of the library expects that case.
//
// Representation: the sorted list of variable ids that occur (print order, see variables.ts), a
// flat Int32Array of exponent vectors (one row of `nv` entries per term) and a coefficient array.
// Terms are kept in descending graded lexicographic order (total degree first, then the
// exponent of the first variable, ...), which is also the print order, so equal polynomials are
// structurally equal. A polynomial is never constant: every operation returns a Scalar when its
// result is constant (FORMAT.md §2; `p - p == 0`).

import { fail } from '../base/errors.js';
import { isScalar, Rat, type Scalar } from '../numbers/rational.js';
import { sdiv, seq, sisZero, sneg, spow } from '../numbers/scalar.js';
import type { Structured } from '../protocol/structured.js';
import { addScalars, compareMonomials, mulScalars, TermCollector } from './terms.js';
import { rankOf, varId, varName } from './variables.js';

export class Polynomial implements Structured {
  readonly kind = 'polynomial';
  private text?: string;

  /**
   * Trusts its arguments (use makePolynomial otherwise): vars sorted by print rank and each
   * occurring in some term, terms in descending graded lex order, no zero coefficient, and at
   * least one term of positive degree.
   */
  constructor(
    readonly vars: Int32Array,
    readonly exps: Int32Array,
    readonly coefs: readonly Scalar[],
  ) {}

  get nv(): number {
    return this.vars.length;
  }

  /** Number of terms. */
  get length(): number {
    return this.coefs.length;
  }

  /** The variable names occurring, in print order. */
  variableNames(): string[] {
    return Array.from(this.vars, varName);
  }

  /** Largest exponent of each variable (by position in vars). */
  maxExps(): Int32Array {
    const nv = this.nv,
      out = new Int32Array(nv);
    for (let t = 0; t < this.coefs.length; t++)
      for (let v = 0; v < nv; v++) if (this.exps[t * nv + v] > out[v]) out[v] = this.exps[t * nv + v];
    return out;
  }

  /** Whether some exponent is negative (a Laurent polynomial that is no ordinary polynomial). */
  isLaurent(): boolean {
    for (let i = 0; i < this.exps.length; i++) if (this.exps[i] < 0) return true;
    return false;
  }

  /** Total degree of term t. */
  termDegree(t: number): number {
    let d = 0;
    for (let v = 0; v < this.nv; v++) d += this.exps[t * this.nv + v];
    return d;
  }

  equals(other: Structured): boolean {
    const o = other as Polynomial;
    if (o === this) return true;
    if (!(o instanceof Polynomial) || o.coefs.length !== this.coefs.length || o.nv !== this.nv) return false;
    for (let v = 0; v < this.nv; v++) if (o.vars[v] !== this.vars[v]) return false;
    for (let i = 0; i < this.exps.length; i++) if (o.exps[i] !== this.exps[i]) return false;
    for (let i = 0; i < this.coefs.length; i++) if (!seq(o.coefs[i], this.coefs[i])) return false;
    return true;
  }

  key(): string {
    return this.toText();
  }

  /** The expression syntax: `q^2 + 3*q*x[1] - 1/2`. */
  toText(): string {
    if (this.text !== undefined) return this.text;
    const nv = this.nv;
    let out = '';
    for (let t = 0; t < this.coefs.length; t++) {
      const factors: string[] = [];
      for (let v = 0; v < nv; v++) {
        const e = this.exps[t * nv + v];
        if (e === 1) factors.push(varName(this.vars[v]));
        else if (e !== 0) factors.push(`${varName(this.vars[v])}^${e}`);
      }
      const c = this.coefs[t];
      const neg = c instanceof Rat ? c.num < 0n : c < 0;
      const abs = neg ? sneg(c) : c;
      let body: string;
      if (factors.length === 0) body = abs.toString();
      else if (abs === 1) body = factors.join('*');
      else body = `${abs.toString()}*${factors.join('*')}`;
      if (t === 0) out = neg ? `-${body}` : body;
      else out += neg ? ` - ${body}` : ` + ${body}`;
    }
    this.text = out;
    return out;
  }

  encode(): unknown {
    return this.toText();
  }
}

export type PolyLike = Scalar | Polynomial;

export function isPolynomial(v: unknown): v is Polynomial {
  return v instanceof Polynomial;
}

export function isPolyLike(v: unknown): v is PolyLike {
  return v instanceof Polynomial || isScalar(v);
}

/** The indeterminate with this name: 'q', 'x[3]'. */
export function variable(name: string): Polynomial {
  return new Polynomial(Int32Array.of(varId(name)), Int32Array.of(1), [1]);
}

/** x[i] */
export function indexedVariable(base: string, index: number): Polynomial {
  return variable(`${base}[${index}]`);
}

/**
 * Normalise sorted terms (descending graded lex, nonzero coefficients) over `vars` into a
 * PolyLike: drops variables that no longer occur and returns constants as Scalars.
 */
export function makePolynomial(vars: Int32Array, exps: Int32Array, coefs: Scalar[]): PolyLike {
  const nv = vars.length,
    n = coefs.length;
  if (n === 0) return 0;
  const used = new Uint8Array(nv);
  let nUsed = 0;
  for (let t = 0; t < n; t++)
    for (let v = 0; v < nv; v++)
      if (exps[t * nv + v] !== 0 && !used[v]) {
        used[v] = 1;
        nUsed++;
      }
  if (nUsed === 0) return coefs[0];
  if (nUsed === nv) return new Polynomial(vars, exps, coefs);
  const keep: number[] = [];
  for (let v = 0; v < nv; v++) if (used[v]) keep.push(v);
  const nvars = Int32Array.from(keep, (v) => vars[v]);
  const nexps = new Int32Array(n * nUsed);
  for (let t = 0; t < n; t++) for (let k = 0; k < nUsed; k++) nexps[t * nUsed + k] = exps[t * nv + keep[k]];
  return new Polynomial(nvars, nexps, coefs);
}

/** Finish a collector over `vars`. */
export function fromCollector(vars: Int32Array, c: TermCollector): PolyLike {
  const { exps, coefs } = c.sorted();
  return makePolynomial(vars, exps, coefs);
}

/** Build a polynomial from unsorted terms over `vars` (repeated monomials add up). */
export function fromTerms(vars: readonly number[], terms: Iterable<[ArrayLike<number>, Scalar]>): PolyLike {
  const order = Array.from(vars).sort((a, b) => rankOf(a) - rankOf(b));
  const pos = order.map((id) => vars.indexOf(id));
  const list = [...terms];
  const nv = order.length;
  const maxExp = new Array(nv).fill(0);
  for (const [e] of list) for (let k = 0; k < nv; k++) if (e[pos[k]] > maxExp[k]) maxExp[k] = e[pos[k]];
  const c = new TermCollector(nv, maxExp, list.length);
  const row = new Int32Array(nv);
  for (const [e, coef] of list) {
    for (let k = 0; k < nv; k++) row[k] = e[pos[k]];
    c.add(row, 0, coef);
  }
  return fromCollector(Int32Array.from(order), c);
}

/** The sorted union of two variable lists. */
export function unionVars(a: Int32Array, b: Int32Array): Int32Array {
  if (a.length === b.length) {
    let same = true;
    for (let i = 0; i < a.length; i++)
      if (a[i] !== b[i]) {
        same = false;
        break;
      }
    if (same) return a;
  }
  const out: number[] = [];
  let i = 0,
    j = 0;
  while (i < a.length || j < b.length) {
    if (j >= b.length || (i < a.length && rankOf(a[i]) < rankOf(b[j]))) out.push(a[i++]);
    else if (i >= a.length || rankOf(b[j]) < rankOf(a[i])) out.push(b[j++]);
    else {
      out.push(a[i++]);
      j++;
    }
  }
  return Int32Array.from(out);
}

/** The exponent rows of p laid out over `vars` (a superset of p.vars, in rank order). */
export function expandExps(p: Polynomial, vars: Int32Array): Int32Array {
  if (vars === p.vars || vars.length === p.nv) return p.exps;
  const nv = vars.length,
    pn = p.nv,
    n = p.coefs.length;
  const where = new Int32Array(pn);
  for (let k = 0, v = 0; k < pn; k++) {
    while (vars[v] !== p.vars[k]) v++;
    where[k] = v;
  }
  const out = new Int32Array(n * nv);
  for (let t = 0; t < n; t++) for (let k = 0; k < pn; k++) out[t * nv + where[k]] = p.exps[t * pn + k];
  return out;
}

/** The constant coefficient times a polynomial's terms, as a polynomial. */
function scale(p: Polynomial, c: Scalar): PolyLike {
  if (sisZero(c)) return 0;
  if (c === 1) return p;
  return new Polynomial(
    p.vars,
    p.exps,
    p.coefs.map((x) => mulScalars(x, c)),
  );
}

function addConstant(p: Polynomial, c: Scalar): PolyLike {
  if (sisZero(c)) return p;
  const n = p.coefs.length,
    nv = p.nv;
  // The constant term's place: last for an ordinary polynomial, before the terms of negative
  // degree (or of degree 0 below 1 in the lex order) for a Laurent polynomial.
  const zero = new Int32Array(nv);
  let at = n;
  while (at > 0 && compareMonomials(p.exps, (at - 1) * nv, zero, 0, nv) <= 0) at--;
  if (at < n && compareMonomials(p.exps, at * nv, zero, 0, nv) === 0) {
    const s = addScalars(p.coefs[at], c);
    const coefs = p.coefs.slice();
    if (sisZero(s)) {
      coefs.splice(at, 1);
      const exps = new Int32Array((n - 1) * nv);
      exps.set(p.exps.subarray(0, at * nv));
      exps.set(p.exps.subarray((at + 1) * nv), at * nv);
      return makePolynomial(p.vars, exps, coefs);
    }
    coefs[at] = s;
    return new Polynomial(p.vars, p.exps, coefs);
  }
  const exps = new Int32Array((n + 1) * nv);
  exps.set(p.exps.subarray(0, at * nv));
  exps.set(p.exps.subarray(at * nv), (at + 1) * nv);
  const coefs = p.coefs.slice();
  coefs.splice(at, 0, c);
  return new Polynomial(p.vars, exps, coefs);
}

export function padd(a: PolyLike, b: PolyLike): PolyLike {
  if (!(a instanceof Polynomial)) {
    if (!(b instanceof Polynomial)) return addScalars(a, b);
    return addConstant(b, a);
  }
  if (!(b instanceof Polynomial)) return addConstant(a, b);
  const vars = unionVars(a.vars, b.vars),
    nv = vars.length;
  const ea = expandExps(a, vars),
    eb = expandExps(b, vars);
  const na = a.coefs.length,
    nb = b.coefs.length;
  const exps = new Int32Array((na + nb) * nv);
  const coefs: Scalar[] = [];
  let i = 0,
    j = 0;
  const put = (src: Int32Array, t: number, c: Scalar) => {
    exps.set(src.subarray(t * nv, t * nv + nv), coefs.length * nv);
    coefs.push(c);
  };
  while (i < na || j < nb) {
    const cmp = i >= na ? -1 : j >= nb ? 1 : compareMonomials(ea, i * nv, eb, j * nv, nv);
    if (cmp > 0) put(ea, i, a.coefs[i++]);
    else if (cmp < 0) put(eb, j, b.coefs[j++]);
    else {
      const s = addScalars(a.coefs[i], b.coefs[j]);
      if (!sisZero(s)) put(ea, i, s);
      i++;
      j++;
    }
  }
  return makePolynomial(vars, exps.subarray(0, coefs.length * nv), coefs);
}

export function pneg(a: PolyLike): PolyLike {
  if (!(a instanceof Polynomial)) return sneg(a);
  return new Polynomial(a.vars, a.exps, a.coefs.map(sneg));
}

export function psub(a: PolyLike, b: PolyLike): PolyLike {
  return padd(a, pneg(b));
}

export function pmul(a: PolyLike, b: PolyLike): PolyLike {
  if (!(a instanceof Polynomial)) {
    if (!(b instanceof Polynomial)) return mulScalars(a, b);
    return scale(b, a);
  }
  if (!(b instanceof Polynomial)) return scale(a, b);
  const vars = unionVars(a.vars, b.vars),
    nv = vars.length;
  const ea = expandExps(a, vars),
    eb = expandExps(b, vars);
  const ma = maxOver(ea, nv),
    mb = maxOver(eb, nv);
  for (let v = 0; v < nv; v++) ma[v] += mb[v];
  const na = a.coefs.length,
    nb = b.coefs.length;
  const c = new TermCollector(nv, ma, na + nb);
  const row = new Int32Array(nv);
  for (let i = 0; i < na; i++) {
    const ci = a.coefs[i];
    for (let j = 0; j < nb; j++) {
      for (let v = 0; v < nv; v++) row[v] = ea[i * nv + v] + eb[j * nv + v];
      c.add(row, 0, mulScalars(ci, b.coefs[j]));
    }
  }
  return fromCollector(vars, c);
}

/** Largest entry of each column of a flat exponent table. */
export function maxOver(exps: Int32Array, nv: number): Int32Array {
  const out = new Int32Array(nv);
  for (let i = 0; i < exps.length; i += nv) for (let v = 0; v < nv; v++) if (exps[i + v] > out[v]) out[v] = exps[i + v];
  return out;
}

export function ppow(a: PolyLike, e: number): PolyLike {
  if (!Number.isInteger(e)) fail(`the exponent ${e} is not an integer`);
  if (!(a instanceof Polynomial)) return spow(a, e);
  if (e < 0) {
    if (a.length !== 1) fail(`only a monomial has a Laurent polynomial as a negative power, not ${a.toText()} (to the power ${e})`);
    return new Polynomial(
      a.vars,
      a.exps.map((x) => x * e),
      [spow(a.coefs[0], e)],
    );
  }
  let result: PolyLike = 1,
    base: PolyLike = a;
  while (e > 0) {
    if (e & 1) result = pmul(result, base);
    e = Math.floor(e / 2);
    if (e > 0) base = pmul(base, base);
  }
  return result;
}

export function pequals(a: PolyLike, b: PolyLike): boolean {
  if (a instanceof Polynomial) return b instanceof Polynomial && a.equals(b);
  if (b instanceof Polynomial) return false;
  return seq(a, b);
}

export function polyText(a: PolyLike): string {
  return a instanceof Polynomial ? a.toText() : a.toString();
}

/** The smallest exponent of each of `vars` (a superset of p's variables) over p's terms. */
export function minExps(p: Polynomial, vars: Int32Array): Int32Array {
  const e = expandExps(p, vars),
    nv = vars.length;
  const out = e.slice(0, nv);
  for (let i = nv; i < e.length; i += nv) for (let v = 0; v < nv; v++) if (e[i + v] < out[v]) out[v] = e[i + v];
  return out;
}

/** p times the monomial with exponents `delta` over `vars` (a superset of p's variables, in rank order). */
export function shiftPolynomial(p: PolyLike, vars: Int32Array, delta: Int32Array): PolyLike {
  if (!(p instanceof Polynomial)) {
    if (sisZero(p)) return 0;
    return makePolynomial(vars, delta.slice(), [p]);
  }
  // Multiplying by a monomial keeps the graded lex order of the terms.
  const e = expandExps(p, vars).slice(),
    nv = vars.length;
  for (let i = 0; i < e.length; i += nv) for (let v = 0; v < nv; v++) e[i + v] += delta[v];
  return makePolynomial(vars, e, p.coefs.slice());
}

/**
 * The quotient a / b when b divides a exactly in the ring of Laurent polynomials (so division by
 * a monomial always succeeds: q / q^3 == q^-2); otherwise an error naming both.
 */
export function pdivExact(a: PolyLike, b: PolyLike): PolyLike {
  if (b instanceof Polynomial && !(!(a instanceof Polynomial) && sisZero(a))) {
    // Divide out the largest monomial factors: a = m_a a', b = m_b b' with a', b' ordinary
    // polynomials divisible by no variable. Then b | a iff b' | a' (no variable divides b').
    const vars = a instanceof Polynomial ? unionVars(a.vars, b.vars) : b.vars;
    const ma = a instanceof Polynomial ? minExps(a, vars) : new Int32Array(vars.length),
      mb = minExps(b, vars);
    const neg = (m: Int32Array) => m.map((x) => -x);
    const a1 = shiftPolynomial(a, vars, neg(ma)),
      b1 = shiftPolynomial(b, vars, neg(mb));
    const q = pdivOrdinary(a1, b1, () => fail(`${polyText(a)} is not divisible by ${b.toText()}`));
    return shiftPolynomial(
      q,
      vars,
      ma.map((x, v) => x - mb[v]),
    );
  }
  return pdivOrdinary(a, b, () => fail(`${polyText(a)} is not divisible by ${polyText(b)}`));
}

/** Exact division of ordinary polynomials, calling notDivisible when b does not divide a. */
function pdivOrdinary(a: PolyLike, b: PolyLike, notDivisible: () => never): PolyLike {
  if (!(b instanceof Polynomial)) {
    if (sisZero(b)) fail(`division by zero: ${polyText(a)} / 0`);
    return a instanceof Polynomial ? scale(a, sdiv(1, b)) : sdiv(a, b);
  }
  if (!(a instanceof Polynomial)) {
    if (sisZero(a)) return 0;
    notDivisible();
  }
  // Leading-term division in the graded lex order: if b | a then lt(a) = lt(b) * lt(a/b), and the
  // leading monomial of the remainder strictly decreases, so this ends after finitely many steps.
  const bDeg = b.termDegree(0);
  let r: PolyLike = a;
  let q: PolyLike = 0;
  while (r instanceof Polynomial) {
    if (r.termDegree(0) < bDeg) notDivisible();
    const vars = unionVars(r.vars, b.vars),
      nv = vars.length;
    const er = expandExps(r, vars),
      eb = expandExps(b, vars);
    const mono = new Int32Array(nv);
    for (let v = 0; v < nv; v++) {
      mono[v] = er[v] - eb[v];
      if (mono[v] < 0) notDivisible();
    }
    const term = makePolynomial(vars, mono, [sdiv(r.coefs[0], b.coefs[0])]);
    q = padd(q, term);
    r = psub(r, pmul(term, b));
  }
  if (!sisZero(r)) notDivisible();
  return q;
}
