// Buchberger's algorithm on the plain sparse representation, over any field: pairs are chosen
// by the sugar strategy (Giovini, Mora, Niesi, Robbiano and Traverso, "One sugar cube, please",
// ISSAC 1991) and pruned by the Gebauer–Möller criteria (Gebauer and Möller, "On an installation
// of Buchberger's algorithm", J. Symbolic Comput. 6 (1988); the UPDATE procedure of Becker and
// Weispfenning, *Gröbner Bases*, Section 5.5). The result is the reduced basis, monic, sorted by
// ascending leading term.

import type { Field } from './field.js';
import type { Limits } from './bounds.js';
import { dividesRow, makeMonic, remainder, sPolynomial, totalDegreeOf, type Sparse } from './sparse.js';
import type { TermOrder } from './termOrder.js';

interface Pair {
  i: number;
  j: number;
  lcm: Int32Array;
  deg: number;
  sugar: number;
}

function lcmRow(a: Int32Array, b: Int32Array, nv: number): Int32Array {
  const l = new Int32Array(nv);
  for (let v = 0; v < nv; v++) l[v] = Math.max(a[v], b[v]);
  return l;
}

function rowDegree(a: ArrayLike<number>, nv: number, off = 0): number {
  let d = 0;
  for (let v = 0; v < nv; v++) d += a[off + v];
  return d;
}

function coprime(a: Int32Array, b: Int32Array, nv: number): boolean {
  for (let v = 0; v < nv; v++) if (a[v] > 0 && b[v] > 0) return false;
  return true;
}

function sameRow(a: Int32Array, b: Int32Array, nv: number): boolean {
  for (let v = 0; v < nv; v++) if (a[v] !== b[v]) return false;
  return true;
}

/** Leading-monomial bookkeeping shared by the pair update. */
class Basis<T> {
  polys: Sparse<T>[] = [];
  lms: Int32Array[] = [];
  sugar: number[] = [];
  active: boolean[] = [];
  pairs: Pair[] = [];
  constructor(readonly nv: number) {}

  /** Add h (nonzero, monic) and update the pairs by the Gebauer–Möller criteria. */
  insert(h: Sparse<T>, sugar: number): void {
    const nv = this.nv;
    const k = this.polys.length;
    const lh = h.exps.slice(0, nv);
    this.polys.push(h);
    this.lms.push(lh);
    this.sugar.push(sugar);
    this.active.push(true);
    const degH = rowDegree(lh, nv);
    // Candidate pairs (g, h) for active g.
    const cand: Pair[] = [];
    for (let i = 0; i < k; i++) {
      if (!this.active[i]) continue;
      const l = lcmRow(this.lms[i], lh, nv);
      const deg = rowDegree(l, nv);
      const s = Math.max(this.sugar[i] + deg - rowDegree(this.lms[i], nv), sugar + deg - degH);
      cand.push({ i, j: k, lcm: l, deg, sugar: s });
    }
    const isCoprime = cand.map((p) => coprime(this.lms[p.i], lh, nv));
    // Criterion M/F: drop (g, h) when another candidate's lcm divides its lcm (strictly, or equal
    // and earlier); a coprime pair is always kept here so that it can remove its equals.
    const keep: boolean[] = cand.map(() => true);
    for (let a = 0; a < cand.length; a++) {
      for (let b = 0; b < cand.length; b++) {
        if (a === b || !keep[b]) continue;
        if (!dividesRow(cand[b].lcm, 0, cand[a].lcm, 0, nv)) continue;
        const equal = sameRow(cand[a].lcm, cand[b].lcm, nv);
        if (!equal || (isCoprime[b] && !isCoprime[a]) || (isCoprime[b] === isCoprime[a] && b < a)) {
          keep[a] = false;
          break;
        }
      }
    }
    // Criterion B on the old pairs.
    this.pairs = this.pairs.filter((p) => {
      if (!dividesRow(lh, 0, p.lcm, 0, nv)) return true;
      const li = lcmRow(this.lms[p.i], lh, nv),
        lj = lcmRow(this.lms[p.j], lh, nv);
      return sameRow(li, p.lcm, nv) || sameRow(lj, p.lcm, nv);
    });
    // The product criterion on the survivors.
    for (let a = 0; a < cand.length; a++) if (keep[a] && !isCoprime[a]) this.pairs.push(cand[a]);
    for (let i = 0; i < k; i++) if (this.active[i] && dividesRow(lh, 0, this.lms[i], 0, nv)) this.active[i] = false;
  }
}

/** Reduced Gröbner basis of the nonzero polynomials F (empty input gives []). */
export function buchberger<T>(K: Field<T>, order: TermOrder, F: readonly Sparse<T>[], limits: Limits): Sparse<T>[] {
  const nv = order.nv;
  const B = new Basis<T>(nv);
  const gens = F.filter((f) => f.coefs.length > 0).map((f) => makeMonic(K, f));
  gens.sort((a, b) => order.compareAt(a.exps, 0, b.exps, 0));
  for (const f of gens) {
    const r = remainder(K, order, f, activePolys(B), () => limits.tick());
    if (r.coefs.length === 0) continue;
    if (rowDegree(r.exps, nv) === 0) return [{ exps: new Int32Array(nv), coefs: [K.one] }];
    B.insert(makeMonic(K, r), totalDegreeOf(f, nv));
  }
  while (B.pairs.length > 0) {
    limits.poll();
    // The pair of least sugar, ties by least lcm.
    let best = 0;
    for (let a = 1; a < B.pairs.length; a++) {
      const p = B.pairs[a],
        q = B.pairs[best];
      if (p.sugar < q.sugar || (p.sugar === q.sugar && order.compareAt(p.lcm, 0, q.lcm, 0) < 0)) best = a;
    }
    const pair = B.pairs[best];
    B.pairs[best] = B.pairs[B.pairs.length - 1];
    B.pairs.pop();
    limits.degree(pair.sugar);
    const s = sPolynomial(K, order, B.polys[pair.i], B.polys[pair.j]);
    const r = remainder(K, order, s, activePolys(B), () => limits.tick());
    if (r.coefs.length === 0) continue;
    if (rowDegree(r.exps, nv) === 0) return [{ exps: new Int32Array(nv), coefs: [K.one] }];
    B.insert(makeMonic(K, r), pair.sugar);
    limits.size(B.active.filter(Boolean).length);
  }
  return reduceBasis(K, order, activePolys(B), limits);
}

function activePolys<T>(B: Basis<T>): Sparse<T>[] {
  return B.polys.filter((_, i) => B.active[i]);
}

/** From a Gröbner basis: the reduced one (minimal, tails reduced, monic, ascending). */
export function reduceBasis<T>(K: Field<T>, order: TermOrder, G: readonly Sparse<T>[], limits: Limits): Sparse<T>[] {
  const nv = order.nv;
  const gs = G.filter((g) => g.coefs.length > 0);
  const minimal: Sparse<T>[] = [];
  for (let a = 0; a < gs.length; a++) {
    let redundant = false;
    for (let b = 0; b < gs.length && !redundant; b++) {
      if (a === b || !dividesRow(gs[b].exps, 0, gs[a].exps, 0, nv)) continue;
      // Equal leading monomials: keep the first.
      if (!sameRow(gs[a].exps.subarray(0, nv), gs[b].exps.subarray(0, nv), nv) || b < a) redundant = true;
    }
    if (!redundant) minimal.push(makeMonic(K, gs[a]));
  }
  minimal.sort((a, b) => order.compareAt(a.exps, 0, b.exps, 0));
  const out = minimal.map((g, a) => {
    const others = minimal.filter((_, b) => b !== a);
    return makeMonic(
      K,
      remainder(K, order, g, others, () => limits.tick()),
    );
  });
  return out;
}
