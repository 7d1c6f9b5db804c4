// Invariants of an ideal I of S = k[ring], through an initial ideal. For a term order >, S/I and
// S/in_>(I) have the same Hilbert function when I is homogeneous (the classical theorem on
// initial ideals; Ideals, Varieties, and Algorithms, ch. 9 §3, Prop. 9), and the same
// multigraded Hilbert series when I is homogeneous for a multigrading; for any I and a
// degree-compatible order (grevlex here) the affine Hilbert functions agree (same chapter,
// Prop. 4). So:
//   - dim, codim and degree of a homogeneous I are those of the projective scheme's cone;
//     for a non-homogeneous I they are those of the affine Hilbert polynomial, i.e. the dimension
//     of the affine variety V(I) and its degree counted with multiplicity (the degree of the
//     projective closure of the affine scheme S/I);
//   - the Hilbert numerator, Hilbert function values, multidegree and K-polynomial need an ideal
//     homogeneous for the grading in question and are refused otherwise.

import { fail } from '../../base/errors.js';
import type { Int } from '../../numbers/integer.js';
import { groebnerBasis, leadingTerm, type GroebnerOptions, type TermOrder } from '../groebner/index.js';
import type { HilbertOptions } from '../monomialIdeals/hilbertSeries.js';
import { hilbertNumeratorCoefficients } from '../monomialIdeals/hilbertSeries.js';
import { dimensionFromNumerator, hilbertFunctionValue, type DimensionData } from '../monomialIdeals/invariants.js';
import { MonomialIdeal } from '../monomialIdeals/monomialIdeal.js';
import { monomialKPolynomial, monomialMultidegree, rowColumnGrading, type RowColumnGrading } from '../monomialIdeals/multidegree.js';
import { isPolynomial, type PolyLike } from '../polynomial.js';
import { varName } from '../variables.js';
import type { Ideal } from './ideal.js';
import { idealShouldStop } from './stop.js';

export type InvariantOptions = GroebnerOptions & HilbertOptions;

/** The options with the installed stop check unless the caller gave one. */
function withStop(opts: InvariantOptions): InvariantOptions {
  return opts.shouldStop ? opts : { ...opts, shouldStop: idealShouldStop };
}

/** The reduced Gröbner basis of I for the order (whose variables must include I's ring). */
export function basisFor(I: Ideal, order: TermOrder, opts: InvariantOptions = {}): PolyLike[] {
  for (const id of I.ring) if (order.indexOf(id) < 0) fail(`the term order does not order the variable ${varName(id)} of the ideal's ring`);
  return groebnerBasis(I.gens, order, I.groebnerOptions(opts));
}

/** in_>(I) as a monomial ideal of I's ring (the leading monomials of the reduced basis). */
export function initialIdealOf(I: Ideal, order: TermOrder, opts: InvariantOptions = {}): MonomialIdeal {
  const m = I.asMonomialIdeal();
  if (m) return m;
  const G = basisFor(I, order, opts);
  const where = Array.from(order.varIds, (id) => I.ring.indexOf(id));
  const rows = G.map((g) => {
    const row = new Int32Array(I.nv);
    const lt = leadingTerm(g, order);
    if (lt)
      lt.exps.forEach((e, v) => {
        if (e > 0) row[where[v]] = e;
      });
    return row;
  });
  return MonomialIdeal.of(I.ring, rows);
}

/** The grevlex initial ideal (a degree-compatible order), cached per options-free call. */
const grevlexCache = new WeakMap<Ideal, MonomialIdeal>();
export function grevlexInitial(I: Ideal, opts: InvariantOptions = {}): MonomialIdeal {
  let m = grevlexCache.get(I);
  if (!m) {
    m = initialIdealOf(I, I.grevlex(), opts);
    grevlexCache.set(I, m);
  }
  return m;
}

export function idealDimensionData(I: Ideal, opts: InvariantOptions = {}): DimensionData {
  const M = grevlexInitial(I, opts);
  return dimensionFromNumerator(hilbertNumeratorCoefficients(M, withStop(opts)), I.nv);
}

function requireHomogeneous(I: Ideal, what: string): void {
  if (!I.isHomogeneous()) fail(`${what} needs a homogeneous ideal (every generator's terms of one degree)`);
}

/** The numerator N(t) of the Hilbert series of S/I, coefficients from degree 0. */
export function idealHilbertNumerator(I: Ideal, opts: InvariantOptions = {}): Int[] {
  requireHomogeneous(I, 'the Hilbert series');
  return hilbertNumeratorCoefficients(grevlexInitial(I, opts), withStop(opts));
}

export function idealHilbertFunction(I: Ideal, d: number, opts: InvariantOptions = {}): Int {
  return hilbertFunctionValue(idealHilbertNumerator(I, opts), I.nv, d);
}

/** Whether every generator is homogeneous for the grading (all its terms of one degree vector). */
function checkHomogeneousFor(I: Ideal, g: RowColumnGrading, what: string): void {
  for (const f of I.gens) {
    if (!isPolynomial(f)) continue;
    const pos = Array.from(f.vars, (id) => I.ring.indexOf(id));
    let first: string | undefined;
    for (let t = 0; t < f.length; t++) {
      const k = g.coordinates.length;
      const d = new Int32Array(k);
      for (let v = 0; v < f.nv; v++) {
        const e = f.exps[t * f.nv + v];
        if (e) for (let c = 0; c < k; c++) d[c] += e * g.weights[pos[v]][c];
      }
      const key = d.join(',');
      if (first === undefined) first = key;
      else if (key !== first) fail(`${what} needs an ideal homogeneous for this grading; ${f.toText()} is not`);
    }
  }
}

export function idealMultidegree(I: Ideal, x: string, y?: string, opts: InvariantOptions = {}): PolyLike {
  const g = rowColumnGrading(I.ring, x, y);
  checkHomogeneousFor(I, g, 'the multidegree');
  return monomialMultidegree(grevlexInitial(I, opts), g, withStop(opts));
}

export function idealKPolynomial(I: Ideal, x: string, y?: string, opts: InvariantOptions = {}): PolyLike {
  const g = rowColumnGrading(I.ring, x, y);
  checkHomogeneousFor(I, g, 'the K-polynomial');
  return monomialKPolynomial(grevlexInitial(I, opts), g, withStop(opts));
}
