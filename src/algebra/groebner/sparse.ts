// Sparse polynomials over a field on exponent rows of a fixed variable list, terms sorted
// descending in a term order. This is the plain representation used for exact work over Q
// (normal forms, verification) and by the reference Buchberger algorithm; the fast modular
// engine has its own (see f4.ts).

import type { Field } from './field.js';
import type { TermOrder } from './termOrder.js';

export interface Sparse<T> {
  /** n rows of nv exponents, descending in the order. */
  readonly exps: Int32Array;
  readonly coefs: T[];
}

export function termCount<T>(f: Sparse<T>): number {
  return f.coefs.length;
}

/** Build from terms in any order (equal monomials add up, zeros drop). */
export function sparseFromTerms<T>(K: Field<T>, order: TermOrder, rows: ArrayLike<number>[], coefs: T[]): Sparse<T> {
  const nv = order.nv;
  const idx = rows.map((_, i) => i).sort((a, b) => order.compareAt(rows[b], 0, rows[a], 0));
  const exps = new Int32Array(idx.length * nv);
  const out: T[] = [];
  let last = -1;
  for (const i of idx) {
    if (last >= 0 && order.compareAt(rows[i], 0, exps, last * nv) === 0) {
      out[last] = K.add(out[last], coefs[i]);
      continue;
    }
    if (last >= 0 && K.isZero(out[last])) {
      out.pop();
      last--;
    }
    last++;
    for (let v = 0; v < nv; v++) exps[last * nv + v] = rows[i][v];
    out.push(coefs[i]);
  }
  if (last >= 0 && K.isZero(out[last])) out.pop();
  return { exps: exps.slice(0, out.length * nv), coefs: out };
}

export function totalDegreeOf<T>(f: Sparse<T>, nv: number): number {
  let best = 0;
  for (let t = 0; t < f.coefs.length; t++) {
    let d = 0;
    for (let v = 0; v < nv; v++) d += f.exps[t * nv + v];
    if (d > best) best = d;
  }
  return best;
}

export function makeMonic<T>(K: Field<T>, f: Sparse<T>): Sparse<T> {
  if (f.coefs.length === 0) return f;
  const lc = f.coefs[0];
  if (K.isZero(K.sub(lc, K.one))) return f;
  return { exps: f.exps, coefs: f.coefs.map((c) => K.div(c, lc)) };
}

/** f - c * x^m * g, merged in order (m an exponent row). */
export function subMul<T>(K: Field<T>, order: TermOrder, f: Sparse<T>, c: T, m: ArrayLike<number>, g: Sparse<T>, fromTerm = 0): Sparse<T> {
  const nv = order.nv,
    nf = f.coefs.length,
    ng = g.coefs.length;
  const exps = new Int32Array((nf - fromTerm + ng) * nv);
  const coefs: T[] = [];
  const shifted = new Int32Array(nv);
  let i = fromTerm,
    j = 0;
  const cmp = order.compareAt;
  while (i < nf || j < ng) {
    let s: number;
    if (j < ng) for (let v = 0; v < nv; v++) shifted[v] = g.exps[j * nv + v] + m[v];
    if (i >= nf) s = -1;
    else if (j >= ng) s = 1;
    else s = cmp(f.exps, i * nv, shifted, 0);
    const at = coefs.length * nv;
    if (s > 0) {
      for (let v = 0; v < nv; v++) exps[at + v] = f.exps[i * nv + v];
      coefs.push(f.coefs[i++]);
    } else if (s < 0) {
      exps.set(shifted, at);
      coefs.push(K.neg(K.mul(c, g.coefs[j++])));
    } else {
      const r = K.sub(f.coefs[i], K.mul(c, g.coefs[j]));
      if (!K.isZero(r)) {
        exps.set(shifted, at);
        coefs.push(r);
      }
      i++;
      j++;
    }
  }
  return { exps: exps.slice(0, coefs.length * nv), coefs };
}

/** Whether row a (at ia) divides row b (at ib); on success fills q with b - a. */
export function dividesRow(a: ArrayLike<number>, ia: number, b: ArrayLike<number>, ib: number, nv: number, q?: Int32Array): boolean {
  for (let v = 0; v < nv; v++) if (a[ia + v] > b[ib + v]) return false;
  if (q) for (let v = 0; v < nv; v++) q[v] = b[ib + v] - a[ia + v];
  return true;
}

/**
 * The remainder of f on division by the list G (each nonzero, leading coefficient 1 or not):
 * every term of the result is divisible by no leading term of G. When G is a Gröbner basis this
 * is the normal form of f. `poll` is called once per reduction step.
 */
export function remainder<T>(K: Field<T>, order: TermOrder, f: Sparse<T>, G: readonly Sparse<T>[], poll?: () => void): Sparse<T> {
  const nv = order.nv;
  const q = new Int32Array(nv);
  const doneExps: number[] = [];
  const doneCoefs: T[] = [];
  let r = f;
  let start = 0;
  while (start < r.coefs.length) {
    poll?.();
    let reduced = false;
    for (const g of G) {
      if (g.coefs.length === 0) continue;
      if (dividesRow(g.exps, 0, r.exps, start * nv, nv, q)) {
        const c = K.div(r.coefs[start], g.coefs[0]);
        r = subMul(K, order, r, c, q, g, start);
        start = 0;
        reduced = true;
        break;
      }
    }
    if (!reduced) {
      for (let v = 0; v < nv; v++) doneExps.push(r.exps[start * nv + v]);
      doneCoefs.push(r.coefs[start]);
      start++;
    }
  }
  return { exps: Int32Array.from(doneExps), coefs: doneCoefs };
}

/** The S-polynomial of f and g (both nonzero). */
export function sPolynomial<T>(K: Field<T>, order: TermOrder, f: Sparse<T>, g: Sparse<T>): Sparse<T> {
  const nv = order.nv;
  const mf = new Int32Array(nv),
    mg = new Int32Array(nv);
  for (let v = 0; v < nv; v++) {
    const l = Math.max(f.exps[v], g.exps[v]);
    mf[v] = l - f.exps[v];
    mg[v] = l - g.exps[v];
  }
  const a = subMul(K, order, { exps: new Int32Array(0), coefs: [] }, K.neg(K.div(K.one, f.coefs[0])), mf, f);
  return subMul(K, order, a, K.div(K.one, g.coefs[0]), mg, g);
}
