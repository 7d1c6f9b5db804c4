// The ring Λ of symmetric functions with coefficients in the exact polynomials (numbers, or
// polynomials in declared indeterminates such as q and t). A value is stored in the Schur basis:
// a list of terms (partition, nonzero coefficient), sorted by degree (highest first) and then by
// decreasing lexicographic order of the partition, so equal functions are structurally equal.
// Like polynomials, a symmetric function is never constant: a combination of s_() alone is its
// coefficient (a number or a polynomial), so `f - f == 0`.

import { fail } from '../../base/errors.js';
import { isScalar, parseScalar } from '../../numbers/rational.js';
import { sisZero } from '../../numbers/scalar.js';
import { registerDecoder } from '../../protocol/decode.js';
import type { Structured } from '../../protocol/structured.js';
import { isPolyLike, isPolynomial, padd, pequals, pmul, pneg, polyText, type PolyLike } from '../polynomial.js';
import { parsePolynomialText } from './coefficientText.js';
import { compareParts, partsKey, sizeOfParts, type Parts } from './partitions.js';

export interface SymTerm {
  readonly parts: readonly number[];
  readonly coef: PolyLike;
}

export class SymmetricFunction implements Structured {
  readonly kind = 'symmetric';
  private text?: string;

  /** Trusts its terms: sorted (compareParts), distinct, nonzero, at least one of positive degree. */
  constructor(readonly terms: readonly SymTerm[]) {}

  /** The highest degree of a term. */
  get degree(): number {
    return sizeOfParts(this.terms[0].parts);
  }

  /** The coefficient of s_lambda. */
  coefficient(parts: Parts): PolyLike {
    const k = partsKey(parts);
    for (const t of this.terms) if (partsKey(t.parts) === k) return t.coef;
    return 0;
  }

  equals(other: Structured): boolean {
    const o = other as SymmetricFunction;
    if (o === this) return true;
    if (!(o instanceof SymmetricFunction) || o.terms.length !== this.terms.length) return false;
    for (let i = 0; i < this.terms.length; i++) {
      const a = this.terms[i],
        b = o.terms[i];
      if (partsKey(a.parts) !== partsKey(b.parts) || !pequals(a.coef, b.coef)) return false;
    }
    return true;
  }

  key(): string {
    return this.toText();
  }

  /** `2*schurSym([2, 1]) + (q + t)*schurSym([3]) - 1`: an expression that evaluates back to it. */
  toText(): string {
    if (this.text !== undefined) return this.text;
    this.text = linearText(this.terms.map((t) => ({ coef: t.coef, atom: t.parts.length ? `schurSym([${t.parts.join(', ')}])` : '' })));
    return this.text;
  }

  /** {"symmetric": [[[2, 1], 2], [[3], "q + t"]]}: Schur coefficients, polynomials as text. */
  encode(): unknown {
    return {
      symmetric: this.terms.map((t) => [t.parts.slice(), isPolynomial(t.coef) ? t.coef.toText() : encodeScalar(t.coef)]),
    };
  }
}

function encodeScalar(c: PolyLike): unknown {
  return typeof c === 'number' ? c : c.toString();
}

/** Sum of coefficient*atom in the language's syntax; an empty atom is the constant term. */
export function linearText(items: readonly { coef: PolyLike; atom: string }[]): string {
  let out = '';
  items.forEach(({ coef, atom }, i) => {
    let neg = false;
    let body: string;
    if (isPolynomial(coef)) {
      if (coef.length === 1) {
        const c0 = coef.coefs[0];
        neg = isScalar(c0) && (typeof c0 === 'number' ? c0 < 0 : typeof c0 === 'bigint' ? c0 < 0n : c0.num < 0n);
        const t = (neg ? pneg(coef) : coef) as PolyLike;
        body = atom ? `${polyText(t)}*${atom}` : polyText(t);
      } else body = atom ? `(${coef.toText()})*${atom}` : coef.toText();
    } else {
      const s = coef.toString();
      neg = s.startsWith('-');
      const abs = neg ? s.slice(1) : s;
      body = atom ? (abs === '1' ? atom : `${abs}*${atom}`) : abs;
    }
    if (i === 0) out = neg ? `-${body}` : body;
    else out += neg ? ` - ${body}` : ` + ${body}`;
  });
  return out === '' ? '0' : out;
}

export type SymLike = PolyLike | SymmetricFunction;

export function isSymmetricFunction(v: unknown): v is SymmetricFunction {
  return v instanceof SymmetricFunction;
}

export function isSymLike(v: unknown): v is SymLike {
  return v instanceof SymmetricFunction || isPolyLike(v);
}

/** Terms of a SymLike in the Schur basis (a constant c is c*s_()). */
export function schurTerms(f: SymLike): readonly SymTerm[] {
  if (f instanceof SymmetricFunction) return f.terms;
  if (isScalar(f) && sisZero(f)) return [];
  return [{ parts: [], coef: f }];
}

/** Accumulates coefficients by partition; `result()` normalises to a SymLike. */
export class TermMap {
  private readonly map = new Map<string, { parts: readonly number[]; coef: PolyLike }>();

  add(parts: readonly number[], coef: PolyLike): void {
    if (isScalar(coef) && sisZero(coef)) return;
    const k = partsKey(parts);
    const e = this.map.get(k);
    if (e) e.coef = padd(e.coef, coef);
    else this.map.set(k, { parts, coef });
  }

  /** The nonzero terms, sorted. */
  terms(): SymTerm[] {
    const out: SymTerm[] = [];
    for (const e of this.map.values()) if (!(isScalar(e.coef) && sisZero(e.coef))) out.push({ parts: e.parts, coef: e.coef });
    out.sort((a, b) => compareParts(a.parts, b.parts));
    return out;
  }

  /** The terms read as a combination of Schur functions. */
  result(): SymLike {
    return fromSchurTerms(this.terms());
  }
}

/** A SymLike from sorted, distinct, nonzero Schur terms. */
export function fromSchurTerms(terms: SymTerm[]): SymLike {
  if (terms.length === 0) return 0;
  if (terms.length === 1 && terms[0].parts.length === 0) return terms[0].coef;
  return new SymmetricFunction(terms);
}

export function schurBasisElement(parts: readonly number[]): SymLike {
  return fromSchurTerms([{ parts: parts.slice(), coef: 1 }]);
}

export function symAdd(a: SymLike, b: SymLike): SymLike {
  if (!(a instanceof SymmetricFunction) && !(b instanceof SymmetricFunction)) return padd(a, b);
  const m = new TermMap();
  for (const t of schurTerms(a)) m.add(t.parts, t.coef);
  for (const t of schurTerms(b)) m.add(t.parts, t.coef);
  return m.result();
}

export function symScale(c: PolyLike, f: SymLike): SymLike {
  if (!(f instanceof SymmetricFunction)) return pmul(c, f);
  if (isScalar(c) && sisZero(c)) return 0;
  const m = new TermMap();
  for (const t of f.terms) m.add(t.parts, pmul(c, t.coef));
  return m.result();
}

export function symNeg(f: SymLike): SymLike {
  return symScale(-1, f);
}

export function symSub(a: SymLike, b: SymLike): SymLike {
  return symAdd(a, symNeg(b));
}

/** Apply a map to every coefficient (zero results dropped). */
export function mapCoefficients(f: SymLike, g: (c: PolyLike) => PolyLike): SymLike {
  const m = new TermMap();
  for (const t of schurTerms(f)) m.add(t.parts, g(t.coef));
  return m.result();
}

registerDecoder('symmetric', (x) => {
  if (!Array.isArray(x)) fail('a symmetric function is recorded as a list of [partition, coefficient] pairs');
  const m = new TermMap();
  for (const pair of x) {
    if (!Array.isArray(pair) || pair.length !== 2 || !Array.isArray(pair[0])) {
      fail('a symmetric function is recorded as a list of [partition, coefficient] pairs');
    }
    const parts = pair[0] as unknown[];
    for (let i = 0; i < parts.length; i++) {
      const v = parts[i];
      if (typeof v !== 'number' || !Number.isSafeInteger(v) || v < 1 || (i > 0 && v > (parts[i - 1] as number))) {
        fail(`[${parts.join(', ')}] is not a partition in a symmetric function record`);
      }
    }
    const c = pair[1];
    let coef: PolyLike;
    if (typeof c === 'number' && Number.isSafeInteger(c)) coef = c;
    else if (typeof c === 'string') coef = /^-?\d+(\/\d+)?$/.test(c) ? parseScalar(c) : parsePolynomialText(c);
    else fail(`cannot read the coefficient ${JSON.stringify(c)} of a symmetric function record`);
    m.add(parts as number[], coef!);
  }
  return m.result();
});
