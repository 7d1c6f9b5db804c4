// Rational functions in the declared indeterminates: num / den with num and den ordinary
// polynomials (exact rational coefficients), kept in a normal form:
//   - den is not constant (otherwise the value is a Laurent polynomial or a number);
//   - no monomial divides both num and den, and neither has a negative exponent;
//   - den has integer coefficients with gcd 1 and its first term in print order positive;
//   - when num and den are in one variable together, they are coprime (Euclid's algorithm).
// In several variables only monomial factors and exact divisions (den | num, num | den) are
// cancelled, so the form is not guaranteed lowest there; equality is still exact, by
// cross-multiplication (a/b == c/d iff a*d == b*c).

import { EvalError, fail } from '../base/errors.js';
import { bigGcd, toBig } from '../numbers/integer.js';
import { makeRat, Rat, type Scalar } from '../numbers/rational.js';
import { sdiv, sisZero, smul, sneg, ssub } from '../numbers/scalar.js';
import { registerDecoder } from '../protocol/decode.js';
import type { Structured } from '../protocol/structured.js';
import {
  isPolynomial,
  minExps,
  padd,
  pdivExact,
  pequals,
  pmul,
  pneg,
  polyText,
  ppow,
  psub,
  shiftPolynomial,
  unionVars,
  Polynomial,
  type PolyLike,
} from './polynomial.js';
import { univariateCoefficients } from './polynomialOps.js';
import { parsePolynomialText } from './polynomialText.js';
import { fromTerms } from './polynomial.js';

export class RationalFunction implements Structured {
  readonly kind = 'rationalFunction';
  /** Trusts its arguments (use makeRational otherwise): the normal form above. */
  constructor(
    readonly num: PolyLike,
    readonly den: Polynomial,
  ) {}

  equals(other: Structured): boolean {
    const o = other as RationalFunction;
    if (!(o instanceof RationalFunction)) return false;
    return pequals(pmul(this.num, o.den), pmul(this.den, o.num));
  }

  /** The text (canonical in one variable; see the note at the top for several). */
  key(): string {
    return this.toText();
  }

  /** `(1 + q)/(q^2 - 1)` style: the numerator in brackets when it has several terms. */
  toText(): string {
    const n = polyText(this.num);
    const numText = isPolynomial(this.num) && this.num.length > 1 ? `(${n})` : n;
    return `${numText}/(${this.den.toText()})`;
  }

  encode(): unknown {
    return { rationalFunction: this.toText() };
  }
}

export type RationalLike = PolyLike | RationalFunction;

export function isRationalFunction(v: unknown): v is RationalFunction {
  return v instanceof RationalFunction;
}

/** num / den as a number, Laurent polynomial or rational function in normal form. */
export function makeRational(num: PolyLike, den: PolyLike): RationalLike {
  if (!isPolynomial(den)) {
    if (sisZero(den)) fail(`division by zero: ${polyText(num)} / 0`);
    return pdivExact(num, den);
  }
  if (!isPolynomial(num) && sisZero(num)) return 0;
  const exact = tryDivide(num, den);
  if (exact !== undefined) return exact;
  // Clear negative exponents and common monomial factors together.
  const vars = isPolynomial(num) ? unionVars(num.vars, den.vars) : den.vars;
  const m = minExps(den, vars);
  if (isPolynomial(num)) {
    const mn = minExps(num, vars);
    for (let v = 0; v < m.length; v++) if (mn[v] < m[v]) m[v] = mn[v];
  } else for (let v = 0; v < m.length; v++) if (m[v] > 0) m[v] = 0;
  const negM = m.map((x) => -x);
  let n = shiftPolynomial(num, vars, negM),
    d = shiftPolynomial(den, vars, negM);
  if (vars.length === 1 && isPolynomial(d)) {
    const g = univariateGcd(n, d, vars[0]);
    if (isPolynomial(g)) {
      n = pdivExact(n, g);
      d = pdivExact(d, g);
    }
  } else if (isPolynomial(n) && isPolynomial(d)) {
    const inv = tryDivide(d, n);
    if (inv !== undefined) {
      d = inv;
      n = 1;
    }
  }
  if (!isPolynomial(d)) return pdivExact(n, d);
  // The denominator primitive over the integers with a positive first term.
  const c = content(d);
  const s = isNegative(d.coefs[0]) ? sneg(c) : c;
  const dn = pdivExact(d, s) as Polynomial,
    nn = pdivExact(n, s);
  return new RationalFunction(nn, dn);
}

function isNegative(c: Scalar): boolean {
  return c instanceof Rat ? c.num < 0n : c < 0;
}

/** gcd of the numerators over lcm of the denominators of p's coefficients (positive). */
function content(p: Polynomial): Scalar {
  let g = 0n,
    l = 1n;
  for (const c of p.coefs) {
    const [a, b] = c instanceof Rat ? [c.num, c.den] : [toBig(c), 1n];
    g = bigGcd(g, a < 0n ? -a : a);
    l = (l / bigGcd(l, b)) * b;
  }
  return makeRat(g, l);
}

/** a / b if b divides a exactly among Laurent polynomials, else undefined. */
function tryDivide(a: PolyLike, b: PolyLike): PolyLike | undefined {
  try {
    return pdivExact(a, b);
  } catch (e) {
    if (e instanceof EvalError) return undefined;
    throw e;
  }
}

/** The monic gcd of two ordinary polynomials in the one variable `id`, by Euclid's algorithm over Q. */
export function univariateGcd(a: PolyLike, b: PolyLike, id: number): PolyLike {
  let x = univariateCoefficients(a, id),
    y = univariateCoefficients(b, id);
  while (y.length > 0) {
    const r = remainder(x, y);
    x = y;
    y = r;
  }
  if (x.length === 0) return 0;
  const lead = x[x.length - 1];
  return fromTerms(
    [id],
    x.map((c, i) => [[i], sdiv(c, lead)] as [number[], Scalar]),
  );
}

/** The remainder of x by y (coefficient lists, lowest degree first, no trailing zeros). */
function remainder(x: Scalar[], y: Scalar[]): Scalar[] {
  const r = x.slice();
  const dy = y.length - 1,
    ly = y[dy];
  for (let k = r.length - 1; k >= dy; k--) {
    if (sisZero(r[k])) continue;
    const f = sdiv(r[k], ly);
    for (let i = 0; i <= dy; i++) r[k - dy + i] = ssub(r[k - dy + i], smul(f, y[i]));
  }
  r.length = Math.min(r.length, dy);
  while (r.length > 0 && sisZero(r[r.length - 1])) r.length--;
  return r;
}

/** [numerator, denominator] of any rational-like value. */
export function partsOf(a: RationalLike): [PolyLike, PolyLike] {
  return a instanceof RationalFunction ? [a.num, a.den] : [a, 1];
}

export function rfAdd(a: RationalLike, b: RationalLike): RationalLike {
  const [an, ad] = partsOf(a),
    [bn, bd] = partsOf(b);
  return makeRational(padd(pmul(an, bd), pmul(bn, ad)), pmul(ad, bd));
}

export function rfNeg(a: RationalLike): RationalLike {
  return a instanceof RationalFunction ? new RationalFunction(pneg(a.num), a.den) : pneg(a);
}

export function rfSub(a: RationalLike, b: RationalLike): RationalLike {
  const [an, ad] = partsOf(a),
    [bn, bd] = partsOf(b);
  return makeRational(psub(pmul(an, bd), pmul(bn, ad)), pmul(ad, bd));
}

export function rfMul(a: RationalLike, b: RationalLike): RationalLike {
  const [an, ad] = partsOf(a),
    [bn, bd] = partsOf(b);
  return makeRational(pmul(an, bn), pmul(ad, bd));
}

export function rfDiv(a: RationalLike, b: RationalLike): RationalLike {
  const [an, ad] = partsOf(a),
    [bn, bd] = partsOf(b);
  if (!isPolynomial(bn) && sisZero(bn)) fail(`division by zero: ${rfText(a)} / 0`);
  return makeRational(pmul(an, bd), pmul(ad, bn));
}

/** a^e for any integer e (a negative power of 0 is a division by zero). */
export function rfPow(a: RationalLike, e: number): RationalLike {
  const [an, ad] = partsOf(a);
  if (e >= 0) return makeRational(ppow(an, e), ppow(ad, e));
  if (!isPolynomial(an) && sisZero(an)) fail(`division by zero: 0 to the power ${e}`);
  return makeRational(ppow(ad, -e), ppow(an, -e));
}

export function rfText(a: RationalLike): string {
  return a instanceof RationalFunction ? a.toText() : polyText(a);
}

/** Read the text a rational function prints, `N/(D)` or `(N)/(D)`. */
export function parseRationalText(text: string): RationalLike {
  const t = text.trim();
  const cut = t.lastIndexOf('/(');
  if (cut < 0 || !t.endsWith(')')) fail(`cannot read ${JSON.stringify(text)} as a rational function: expected N/(D)`);
  let n = t.slice(0, cut).trim();
  if (n.startsWith('(') && n.endsWith(')')) n = n.slice(1, -1);
  return makeRational(parsePolynomialText(n), parsePolynomialText(t.slice(cut + 2, -1)));
}

registerDecoder('rationalFunction', (x) => {
  if (typeof x !== 'string') fail('a rational function is recorded as its text, such as "1/(q - 1)"');
  return parseRationalText(x);
});
