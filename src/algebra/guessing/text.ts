// Printing the pieces of a guess as expressions of the language: univariate polynomials with
// exact coefficients, products and comprehensions. Pure text, so this layer imports nothing above it.

import { denOf, makeRat, numOf, type Scalar } from '../../numbers/rational.js';
import { bigGcd } from '../../numbers/integer.js';

/** A comprehension in the canonical body-first form: `product(E for k in A..B)`. */
export function comprehension(op: string, body: string, binder: string, source: string): string {
  return `${op}(${body} for ${binder} in ${source})`;
}

function monomial(v: string, e: number): string {
  return e === 0 ? '' : e === 1 ? v : `${v}^${e}`;
}

/** c_0 + c_1 v + ... with integer coefficients (bigint), highest power first: "2*n^2 - 3*n + 1". */
export function intPolyText(coeffs: readonly bigint[], v: string, ascending = false): string {
  let out = '';
  const order = coeffs.map((_, e) => e);
  if (!ascending) order.reverse();
  for (const e of order) {
    const c = coeffs[e];
    if (c === 0n) continue;
    const neg = c < 0n;
    const a = neg ? -c : c;
    const m = monomial(v, e);
    const body = m === '' ? `${a}` : a === 1n ? m : `${a}*${m}`;
    out += out === '' ? (neg ? `-${body}` : body) : neg ? ` - ${body}` : ` + ${body}`;
  }
  return out === '' ? '0' : out;
}

/** A polynomial with rational coefficients, over its common denominator: "(n^2 + n)/2". */
export function ratPolyText(coeffs: readonly Scalar[], v: string, ascending = false): string {
  let den = 1n;
  for (const c of coeffs) {
    const d = denOf(c);
    den = (den / bigGcd(den, d)) * d;
  }
  const ints = coeffs.map((c) => (numOf(c) * den) / denOf(c));
  const t = intPolyText(ints, v, ascending);
  if (den === 1n) return t;
  return `${isAtom(t) ? t : `(${t})`}/${den}`;
}

/** Whether the text needs no parentheses as a factor: no sum or difference at its top level. */
export function isAtom(t: string): boolean {
  let depth = 0;
  for (let i = 0; i < t.length; i++) {
    const ch = t[i];
    if (ch === '(') depth++;
    else if (ch === ')') depth--;
    else if (depth === 0 && (ch === '+' || (ch === '-' && i > 0) || ch === ' ')) return false;
  }
  return true;
}

/** The text as a factor of a product. */
export function factor(t: string): string {
  return isAtom(t) && !t.startsWith('-') ? t : `(${t})`;
}

/** p * q printed, leaving out a factor 1. */
export function times(a: string, b: string): string {
  if (a === '1') return b;
  if (b === '1') return a;
  return `${factor(a)}*${factor(b)}`;
}

/** Integer-coefficient polynomial evaluated at an integer. */
export function evalIntPoly(coeffs: readonly bigint[], n: bigint): bigint {
  let s = 0n;
  for (let e = coeffs.length - 1; e >= 0; e--) s = s * n + coeffs[e];
  return s;
}

/** "a(n + 2)", "a(n)", "a(n - 1)". */
export function shifted(f: string, v: string, i: number): string {
  return i === 0 ? `${f}(${v})` : i > 0 ? `${f}(${v} + ${i})` : `${f}(${v} - ${-i})`;
}

/** A scalar as a factor: "3", "(2/3)", "(-2)". */
export function scalarFactor(s: Scalar): string {
  const t = s.toString();
  return /^[0-9]+$/.test(t) ? t : `(${t})`;
}

export function ratio(num: bigint, den: bigint): Scalar {
  return makeRat(num, den);
}
