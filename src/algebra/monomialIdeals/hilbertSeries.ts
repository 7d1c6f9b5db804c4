// The numerator of the Hilbert series of S/M for a monomial ideal M of S = k[v_1..v_n], graded by
// an integer weight matrix (deg v = W[v] in Z^k):  H(S/M; t) = K(t) / prod_v (1 - t^{W[v]}),
// K the K-polynomial (a Laurent polynomial in t_1..t_k when weights are negative somewhere).
//
// Pivot algorithm (the divide-and-conquer recursion of A. M. Bigatti, "Computation of Hilbert-
// Poincaré series", J. Pure Appl. Algebra 119 (1997)): for a pivot monomial p,
//   K(M) = K(M + (p)) + t^{deg p} K(M : p),
// with the base case that generators sharing no variable with any other generator split off as
// factors (1 - t^{deg g}). The pivot is a power x^e of a variable x that occurs in the most
// generators, e the median of its positive exponents. The recursion carries a shift and a sign
// and expands the product of split-off factors only at the leaves, into an accumulator keyed by
// the degree vector.

import { fail } from '../../base/errors.js';
import { iadd, type Int } from '../../numbers/integer.js';
import { minimalMonomials, type Exponents, type MonomialIdeal } from './monomialIdeal.js';

/** A Laurent polynomial in t_1..t_k: degree vector (as its joined text) -> [degree, coefficient]. */
export type LaurentTerms = Map<string, [Int32Array, Int]>;

export interface HilbertOptions {
  /** Largest number of leaves of the recursion (default 2,000,000): beyond it, an error naming the bound. */
  maxSteps?: number;
  /** Called now and then; returning true stops the computation with an error. */
  shouldStop?: () => boolean;
}

const DEFAULT_MAX_STEPS = 2_000_000;

/**
 * The K-polynomial of S/M for the grading W (weights[v] = degree of the v-th variable of M's ring,
 * all of length k). The unit ideal gives 0.
 */
export function kPolynomialTerms(M: MonomialIdeal, weights: readonly Int32Array[], opts: HilbertOptions = {}): LaurentTerms {
  const k = weights.length ? weights[0].length : 0;
  const acc: LaurentTerms = new Map();
  const maxSteps = opts.maxSteps ?? DEFAULT_MAX_STEPS;
  let steps = 0;
  const degOf = (m: Exponents): Int32Array => {
    const d = new Int32Array(k);
    for (let v = 0; v < m.length; v++) if (m[v]) for (let c = 0; c < k; c++) d[c] += m[v] * weights[v][c];
    return d;
  };
  const addTerm = (deg: Int32Array, coef: Int) => {
    const key = deg.join(',');
    const e = acc.get(key);
    if (e) {
      const s = iadd(e[1], coef);
      if (s === 0) acc.delete(key);
      else e[1] = s;
    } else acc.set(key, [deg, coef]);
  };
  const leaf = (shift: Int32Array, sign: number, factors: Int32Array[]) => {
    // shift * prod (1 - t^f), expanded.
    let terms: [Int32Array, number][] = [[shift, sign]];
    for (const f of factors) {
      const next: [Int32Array, number][] = [];
      for (const [d, c] of terms) {
        next.push([d, c]);
        const e = new Int32Array(k);
        for (let i = 0; i < k; i++) e[i] = d[i] + f[i];
        next.push([e, -c]);
      }
      terms = next;
    }
    for (const [d, c] of terms) addTerm(d, c);
  };
  const rec = (gens: Exponents[], shift: Int32Array, sign: number, factors: Int32Array[]) => {
    if (++steps > maxSteps) fail(`the Hilbert series computation passed its bound of ${maxSteps.toLocaleString('en-US')} steps`);
    if ((steps & 1023) === 1 && opts.shouldStop?.()) fail('the Hilbert series computation was stopped');
    if (gens.length === 0) return leaf(shift, sign, factors);
    const nv = gens[0].length;
    if (gens.some((g) => g.every((e) => e === 0))) return; // the unit ideal contributes 0
    // How many generators each variable occurs in.
    const count = new Int32Array(nv);
    for (const g of gens) for (let v = 0; v < nv; v++) if (g[v]) count[v]++;
    const rest: Exponents[] = [];
    const fs = factors.slice();
    for (const g of gens) {
      let alone = true;
      for (let v = 0; v < nv; v++)
        if (g[v] && count[v] > 1) {
          alone = false;
          break;
        }
      if (alone) fs.push(degOf(g));
      else rest.push(g);
    }
    if (rest.length === 0) return leaf(shift, sign, fs);
    let x = 0;
    for (let v = 1; v < nv; v++) if (count[v] > count[x]) x = v;
    const exps = rest
      .filter((g) => g[x] > 0)
      .map((g) => g[x])
      .sort((a, b) => a - b);
    const e = exps[(exps.length - 1) >> 1];
    // M + (x^e): generators not divisible by x^e, and x^e.
    const plus: Exponents[] = [];
    for (const g of rest) if (g[x] < e) plus.push(g);
    const p = new Int32Array(nv);
    p[x] = e;
    plus.push(p);
    rec(minimalMonomials(plus), shift, sign, fs);
    // M : x^e, times t^{e deg x}.
    const colon = rest.map((g) => {
      const h = g.slice();
      h[x] = Math.max(0, h[x] - e);
      return h;
    });
    const s2 = new Int32Array(k);
    for (let c = 0; c < k; c++) s2[c] = shift[c] + e * weights[x][c];
    rec(minimalMonomials(colon), s2, sign, fs);
  };
  rec(M.gens.slice(), new Int32Array(k), 1, []);
  return acc;
}

/** The standard grading's numerator: coefficients c_0..c_D of K(t) = sum c_d t^d (all weights 1). */
export function hilbertNumeratorCoefficients(M: MonomialIdeal, opts: HilbertOptions = {}): Int[] {
  if (M.nv === 0) return M.isUnit() ? [] : [1]; // the ring is the field itself
  const ones = Array.from({ length: M.nv }, () => Int32Array.of(1));
  const terms = kPolynomialTerms(M, ones, opts);
  let top = -1;
  for (const [d] of terms.values()) top = Math.max(top, d[0]);
  const out: Int[] = new Array(top + 1).fill(0);
  for (const [d, c] of terms.values()) out[d[0]] = c;
  return out;
}
