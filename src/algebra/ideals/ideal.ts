// Ideals of a polynomial ring over Q or F_p (kind 'ideal'): the generators as given (zeros
// dropped), the ring's variables (those of the generators and any listed besides, in print
// order) and the field (prime undefined for Q). Two ideals are equal when they have the same
// field, the same ring and the same reduced Gröbner basis for grevlex (computed once, on demand);
// an ideal of monomials is compared by its minimal generators, with no basis computation.
//
// Text: ideal([g1, g2]) over Q, ideal([g1, g2], p) over F_p, with the ring's list between them
// when it has variables the generators lack: ideal([z[1,1]], [z[1,1], z[1,2]], 7).
// Record: {"ideal": {"generators": ["...", ...], "ring": ["z[1,1]", ...], "prime": 7}} (ring and
// prime only when needed).

import { fail } from '../../base/errors.js';
import { isScalar, type Scalar } from '../../numbers/rational.js';
import { sisZero } from '../../numbers/scalar.js';
import { registerDecoder } from '../../protocol/decode.js';
import type { Structured } from '../../protocol/structured.js';
import { groebnerBasis, termOrder, type GroebnerOptions, type TermOrder } from '../groebner/index.js';
import { leadingTerm } from '../groebner/ideals.js';
import { checkPrime } from '../groebner/primeField.js';
import { MonomialIdeal } from '../monomialIdeals/monomialIdeal.js';
import { fromTerms, isPolynomial, polyText, psub, type PolyLike } from '../polynomial.js';
import { parsePolynomialText } from '../polynomialText.js';
import { rankOf, varId, varName } from '../variables.js';
import { idealShouldStop } from './stop.js';

/** Bounds on every basis computation behind an ideal's invariants, unless a caller sets its own. */
export const DEFAULT_IDEAL_LIMITS: GroebnerOptions = { maxBasisSize: 20_000 };

function isZeroPoly(p: PolyLike): boolean {
  return !isPolynomial(p) && sisZero(p);
}

export class Ideal implements Structured {
  readonly kind = 'ideal';
  private canonical?: PolyLike[];
  private monomial?: MonomialIdeal | null;

  private constructor(
    /** The generators as given, zeros dropped. */
    readonly gens: readonly PolyLike[],
    /** The ring's variables, by id, in print order. */
    readonly ring: Int32Array,
    /** The characteristic: a prime, or undefined for Q. */
    readonly prime: number | undefined,
  ) {}

  /** The ideal of `gens` in the ring of their variables and of `extraRing`, over Q or F_p. */
  static of(gens: readonly PolyLike[], extraRing: readonly number[] = [], prime?: number): Ideal {
    if (prime !== undefined) checkPrime(prime);
    for (const g of gens) if (!isScalar(g) && !isPolynomial(g)) fail('the generators of an ideal must be numbers or polynomials');
    const kept = gens.filter((g) => !isZeroPoly(g));
    const ids = new Set<number>(extraRing);
    for (const g of kept) if (isPolynomial(g)) for (const id of g.vars) ids.add(id);
    const ring = Int32Array.from([...ids].sort((a, b) => rankOf(a) - rankOf(b)));
    return new Ideal(kept, ring, prime);
  }

  /** The ideal a monomial ideal generates (its minimal generators), on the same ring. */
  static fromMonomialIdeal(M: MonomialIdeal, prime?: number): Ideal {
    const gens = M.gens.map((g) => {
      const terms: [Int32Array, Scalar][] = [[g, 1]];
      return fromTerms(Array.from(M.vars), terms);
    });
    const I = new Ideal(gens, M.vars, prime);
    I.monomial = M;
    return I;
  }

  get nv(): number {
    return this.ring.length;
  }

  /** The field's name for messages: Q or F_7. */
  fieldName(): string {
    return this.prime === undefined ? 'Q' : `F_${this.prime}`;
  }

  groebnerOptions(extra: GroebnerOptions = {}): GroebnerOptions {
    return { ...DEFAULT_IDEAL_LIMITS, shouldStop: idealShouldStop, ...extra, prime: this.prime };
  }

  /** grevlex on the ring's variables in print order. */
  grevlex(): TermOrder {
    return termOrder('grevlex', Array.from(this.ring));
  }

  /** The reduced Gröbner basis for grevlex (cached): the canonical form behind equality. */
  canonicalBasis(): PolyLike[] {
    if (!this.canonical) this.canonical = groebnerBasis(this.gens, this.grevlex(), this.groebnerOptions());
    return this.canonical;
  }

  /**
   * The monomial ideal the generators span when each generator is a single term (its coefficient
   * a unit of the field), else null.
   */
  asMonomialIdeal(): MonomialIdeal | null {
    if (this.monomial !== undefined) return this.monomial;
    const rows: Int32Array[] = [];
    for (const g of this.gens) {
      if (!isPolynomial(g)) {
        rows.push(new Int32Array(this.nv)); // a nonzero constant: the unit ideal
        continue;
      }
      if (g.length !== 1 || (this.prime !== undefined && isZeroModP(g.coefs[0], this.prime))) return (this.monomial = null);
      const row = new Int32Array(this.nv);
      for (let k = 0; k < g.nv; k++) row[this.ring.indexOf(g.vars[k])] = g.exps[k];
      rows.push(row);
    }
    return (this.monomial = MonomialIdeal.of(this.ring, rows));
  }

  /** Whether every generator is homogeneous for the standard grading. */
  isHomogeneous(): boolean {
    return this.gens.every((g) => {
      if (!isPolynomial(g)) return true;
      const d = g.termDegree(0);
      for (let t = 1; t < g.length; t++) if (g.termDegree(t) !== d) return false;
      return true;
    });
  }

  equals(other: Structured): boolean {
    const o = other as Ideal;
    if (o === this) return true;
    if (o.prime !== this.prime || o.nv !== this.nv) return false;
    for (let v = 0; v < this.nv; v++) if (o.ring[v] !== this.ring[v]) return false;
    const ma = this.asMonomialIdeal(),
      mb = o.asMonomialIdeal();
    if (ma && mb) return ma.equals(mb);
    const a = this.canonicalBasis(),
      b = o.canonicalBasis();
    return a.length === b.length && a.every((g, i) => polyText(g) === polyText(b[i]));
  }

  key(): string {
    const m = this.asMonomialIdeal();
    const body = m ? m.gens.map((g) => m.monomialText(g)).join(',') : this.canonicalBasis().map(polyText).join(',');
    return `${this.fieldName()}|${Array.from(this.ring, varName).join(',')}|${body}`;
  }

  /** Whether the ring has variables that no generator contains. */
  private hasExtraRing(): boolean {
    const used = new Set<number>();
    for (const g of this.gens) if (isPolynomial(g)) for (const id of g.vars) used.add(id);
    return used.size !== this.nv;
  }

  toText(): string {
    const parts = [`[${this.gens.map(polyText).join(', ')}]`];
    if (this.hasExtraRing()) parts.push(`[${Array.from(this.ring, varName).join(', ')}]`);
    if (this.prime !== undefined) parts.push(String(this.prime));
    return `ideal(${parts.join(', ')})`;
  }

  encode(): unknown {
    const body: Record<string, unknown> = { generators: this.gens.map(polyText) };
    if (this.hasExtraRing()) body.ring = Array.from(this.ring, varName);
    if (this.prime !== undefined) body.prime = this.prime;
    return { ideal: body };
  }

  /**
   * Each generator split into its leading term for `order` (grevlex by default) and the rest, as
   * texts: { leading: '-2*z[1,1]', rest: '+ z[1,2] - 3' } (rest '' for a monomial). For pictures.
   */
  leadingTerms(order: TermOrder = this.grevlex()): { leading: string; rest: string }[] {
    return this.gens.map((g) => {
      const lt = leadingTerm(g, order);
      if (!lt || !isPolynomial(g)) return { leading: polyText(g), rest: '' };
      const row = Array.from(order.varIds, (_, v) => lt.exps[v]);
      const ltPoly = fromTerms(Array.from(order.varIds), [[row, lt.coef]]);
      const rest = psub(g, ltPoly);
      const restText = polyText(rest);
      const tail = isZeroPoly(rest) ? '' : restText.startsWith('-') ? `- ${restText.slice(1)}` : `+ ${restText}`;
      return { leading: polyText(ltPoly), rest: tail };
    });
  }
}

function isZeroModP(c: Scalar, p: number): boolean {
  if (typeof c === 'number') return c % p === 0;
  if (typeof c === 'bigint') return c % BigInt(p) === 0n;
  return c.num % BigInt(p) === 0n;
}

export function isIdeal(v: unknown): v is Ideal {
  return v instanceof Ideal;
}

registerDecoder('ideal', (x) => {
  const o = x as { generators?: unknown; ring?: unknown; prime?: unknown };
  if (
    !o ||
    typeof o !== 'object' ||
    !Array.isArray(o.generators) ||
    !o.generators.every((g) => typeof g === 'string' || typeof g === 'number')
  )
    fail('an ideal record has "generators": a list of polynomials written as text');
  const gens = (o.generators as (string | number)[]).map((g) => (typeof g === 'number' ? g : parsePolynomialText(g)));
  let ring: number[] = [];
  if (o.ring !== undefined) {
    if (!Array.isArray(o.ring) || !o.ring.every((v) => typeof v === 'string'))
      fail('the "ring" of an ideal record is a list of variable names');
    ring = (o.ring as string[]).map(varId);
  }
  if (o.prime !== undefined && (typeof o.prime !== 'number' || !Number.isSafeInteger(o.prime)))
    fail('the "prime" of an ideal record is an integer');
  return Ideal.of(gens, ring, o.prime as number | undefined);
});
