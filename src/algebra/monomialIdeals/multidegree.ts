// Multigraded invariants of S/M for a monomial ideal M, for gradings of the kind that matrix
// Schubert varieties carry: the ring's variable z[i,j] (or z[i]) has degree x[i], or, with a
// second family y, degree x[i] - y[j]. Coordinates of the grading group Z^k are the x[i] and y[j]
// that occur.
//
// From the K-polynomial K(t, u) (z[i,j] has torus weight t_i, or t_i / u_j):
//   - the multidegree is the lowest-degree part of K after t_i = 1 - x[i], u_j = 1 - y[j]
//     (expanding (1 - y)^(-b) as a power series); it has degree codim(M) ("Gröbner geometry of
//     Schubert polynomials", Ann. of Math. 161 (2005), §1.2; E. Miller, B. Sturmfels,
//     Combinatorial Commutative Algebra, GTM 227, ch. 8);
//   - the K-polynomial in Grothendieck variables is K with t_i = 1 - x[i] and 1/u_j = 1 - y[j],
//     a polynomial (the exponents of u are never positive).

import { fail } from '../../base/errors.js';
import { binomialInt, iadd, imul, ineg, type Int } from '../../numbers/integer.js';
import { fromTerms, padd, pmul, psub, variable, type PolyLike } from '../polynomial.js';
import { indexedVarId, isBareVar, varIndices, varName } from '../variables.js';
import { kPolynomialTerms, type HilbertOptions, type LaurentTerms } from './hilbertSeries.js';
import { dimensionFromNumerator } from './invariants.js';
import type { MonomialIdeal } from './monomialIdeal.js';

export interface RowColumnGrading {
  /** Degree vector of each ring variable (same order as the ring). */
  weights: Int32Array[];
  /** The variable id standing for each coordinate (x[i] or y[j]). */
  coordinates: number[];
  /** Whether coordinate c is a column coordinate y[j] (weights there are -1 or 0). */
  isColumn: boolean[];
}

/** The grading deg z[i,j] = x[i] (y undefined) or x[i] - y[j] on the ring's variables. */
export function rowColumnGrading(ring: Int32Array, x: string, y?: string): RowColumnGrading {
  const rows = new Map<number, number>(),
    cols = new Map<number, number>();
  const coordinates: number[] = [],
    isColumn: boolean[] = [];
  const idx = Array.from(ring, (id) => {
    const ind = varIndices(id);
    if (isBareVar(id) || (y !== undefined && ind.length !== 2))
      fail(
        `this grading gives z[i,j] the degree x[i]${y ? ' - y[j]' : ''}; the variable ${varName(id)} has no ${y ? 'two indices' : 'index'}`,
      );
    return ind;
  });
  const rowList = [...new Set(idx.map((ind) => ind[0]))].sort((a, b) => a - b);
  const colList = y === undefined ? [] : [...new Set(idx.map((ind) => ind[1]))].sort((a, b) => a - b);
  for (const i of rowList) {
    rows.set(i, coordinates.length);
    coordinates.push(indexedVarId(x, i));
    isColumn.push(false);
  }
  for (const j of colList) {
    cols.set(j, coordinates.length);
    coordinates.push(indexedVarId(y!, j));
    isColumn.push(true);
  }
  const k = coordinates.length;
  const weights = idx.map((ind) => {
    const w = new Int32Array(k);
    w[rows.get(ind[0])!] = 1;
    if (y !== undefined) w[cols.get(ind[1])!] = -1;
    return w;
  });
  return { weights, coordinates, isColumn };
}

/** Codimension from a K-polynomial whose row coordinates add up to the standard degree. */
function codimOf(K: LaurentTerms, g: RowColumnGrading, nv: number): number {
  const numerator: Int[] = [];
  for (const [d, c] of K.values()) {
    let s = 0;
    for (let i = 0; i < d.length; i++) if (!g.isColumn[i]) s += d[i];
    while (numerator.length <= s) numerator.push(0);
    numerator[s] = iadd(numerator[s], c);
  }
  return dimensionFromNumerator(numerator, nv).codim;
}

/** Coefficient of v^m in (1 - v)^e for an integer e: (-1)^m C(e, m), generalised to e < 0. */
function oneMinusCoefficient(e: number, m: number): Int {
  if (e >= 0) {
    const b = binomialInt(e, m);
    return m % 2 === 0 ? b : ineg(b);
  }
  return binomialInt(-e + m - 1, m);
}

/** The multidegree of S/M for the grading (0 for the unit ideal). */
export function monomialMultidegree(M: MonomialIdeal, g: RowColumnGrading, opts: HilbertOptions = {}): PolyLike {
  if (M.isUnit()) return 0;
  const K = kPolynomialTerms(M, g.weights, opts);
  const c = codimOf(K, g, M.nv);
  const k = g.coordinates.length;
  const out = new Map<string, [number[], Int]>();
  const m = new Array<number>(k).fill(0);
  for (const [a, coef] of K.values()) {
    // Every m with |m| = c and m_i <= a_i where a_i >= 0.
    const rec = (i: number, left: number, acc: Int) => {
      if (acc === 0) return;
      if (i === k) {
        if (left !== 0) return;
        const key = m.join(',');
        const e = out.get(key);
        if (e) e[1] = iadd(e[1], acc);
        else out.set(key, [m.slice(), acc]);
        return;
      }
      const hi = a[i] >= 0 ? Math.min(a[i], left) : left;
      for (let t = 0; t <= hi; t++) {
        m[i] = t;
        rec(i + 1, left - t, imul(acc, oneMinusCoefficient(a[i], t)));
      }
      m[i] = 0;
    };
    rec(0, c, coef);
  }
  const terms: [number[], Int][] = [];
  for (const [e, cf] of out.values()) if (cf !== 0) terms.push([e, cf]);
  return fromTerms(g.coordinates, terms);
}

/** The K-polynomial in Grothendieck variables: t_i = 1 - x[i], 1/u_j = 1 - y[j]. */
export function monomialKPolynomial(M: MonomialIdeal, g: RowColumnGrading, opts: HilbertOptions = {}): PolyLike {
  const K = kPolynomialTerms(M, g.weights, opts);
  const k = g.coordinates.length;
  const base = g.coordinates.map((id) => psub(1, variable(varName(id))));
  const powers = base.map(() => new Map<number, PolyLike>());
  const power = (i: number, e: number): PolyLike => {
    if (e === 0) return 1;
    let p = powers[i].get(e);
    if (p === undefined) powers[i].set(e, (p = e === 1 ? base[i] : pmul(power(i, e - 1), base[i])));
    return p;
  };
  let sum: PolyLike = 0;
  for (const [a, coef] of K.values()) {
    let term: PolyLike = coef;
    for (let i = 0; i < k; i++) if (a[i] !== 0) term = pmul(term, power(i, Math.abs(a[i])));
    sum = padd(sum, term);
  }
  return sum;
}
