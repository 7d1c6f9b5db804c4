// Exact reduction over Z, fraction free, for the proofs of rationalBasis.ts: "f reduces to 0
// by G over Q" is decided with integer polynomials (a nonzero integer factor never changes
// whether a reduction reaches 0), so no rational arithmetic and almost no gcds are needed.
// Only top reduction is done: when the leading term of what is left is divisible by no leading
// monomial of G, the division algorithm's remainder is nonzero.

import { bigGcd } from '../../numbers/integer.js';
import { Rat, type Scalar } from '../../numbers/rational.js';
import type { Limits } from './bounds.js';
import { dividesRow, type Sparse } from './sparse.js';
import type { TermOrder } from './termOrder.js';

export interface ZPoly {
  exps: Int32Array;
  coefs: bigint[];
}

/** The primitive integer multiple of f (positive content removed). */
export function toZ(f: Sparse<Scalar>): ZPoly {
  let L = 1n;
  for (const c of f.coefs) if (c instanceof Rat) L = (L / bigGcd(L, c.den)) * c.den;
  const coefs = f.coefs.map((c) => (c instanceof Rat ? (c.num * L) / c.den : BigInt(c) * L));
  return primitive({ exps: f.exps, coefs });
}

function primitive(f: ZPoly): ZPoly {
  let g = 0n;
  for (const c of f.coefs) {
    g = bigGcd(g, c < 0n ? -c : c);
    if (g === 1n) return f;
  }
  if (g <= 1n) return f;
  return { exps: f.exps, coefs: f.coefs.map((c) => c / g) };
}

/** a f - b x^m g with the leading terms cancelling (f's first term dropped). */
function combine(order: TermOrder, f: ZPoly, a: bigint, b: bigint, m: Int32Array, g: ZPoly): ZPoly {
  const nv = order.nv,
    nf = f.coefs.length,
    ng = g.coefs.length;
  const exps = new Int32Array((nf + ng) * nv);
  const coefs: bigint[] = [];
  const sh = new Int32Array(nv);
  const cmp = order.compareAt;
  let i = 1,
    j = 1;
  while (i < nf || j < ng) {
    if (j < ng) for (let v = 0; v < nv; v++) sh[v] = g.exps[j * nv + v] + m[v];
    const s = i >= nf ? -1 : j >= ng ? 1 : cmp(f.exps, i * nv, sh, 0);
    const at = coefs.length * nv;
    if (s > 0) {
      for (let v = 0; v < nv; v++) exps[at + v] = f.exps[i * nv + v];
      coefs.push(a * f.coefs[i++]);
    } else if (s < 0) {
      exps.set(sh, at);
      coefs.push(-b * g.coefs[j++]);
    } else {
      const c = a * f.coefs[i] - b * g.coefs[j];
      if (c !== 0n) {
        exps.set(sh, at);
        coefs.push(c);
      }
      i++;
      j++;
    }
  }
  return { exps: exps.subarray(0, coefs.length * nv), coefs };
}

/** Whether f reduces to 0 by top reduction with G (every element nonzero). */
export function reducesToZero(order: TermOrder, f: ZPoly, G: readonly ZPoly[], limits: Limits): boolean {
  const nv = order.nv;
  const m = new Int32Array(nv);
  let steps = 0;
  while (f.coefs.length > 0) {
    limits.tick();
    const g = G.find((g) => dividesRow(g.exps, 0, f.exps, 0, nv, m));
    if (!g) return false;
    const lf = f.coefs[0],
      lg = g.coefs[0];
    let d = bigGcd(lf < 0n ? -lf : lf, lg < 0n ? -lg : lg);
    if (d === 0n) d = 1n;
    f = combine(order, f, lg / d, lf / d, m, g);
    if (++steps % 16 === 0) f = primitive(f);
  }
  return true;
}

/** The S-polynomial of integer polynomials, fraction free. */
export function zSPolynomial(order: TermOrder, f: ZPoly, g: ZPoly): ZPoly {
  const nv = order.nv;
  const mf = new Int32Array(nv),
    mg = new Int32Array(nv);
  for (let v = 0; v < nv; v++) {
    const l = Math.max(f.exps[v], g.exps[v]);
    mf[v] = l - f.exps[v];
    mg[v] = l - g.exps[v];
  }
  const lf = f.coefs[0],
    lg = g.coefs[0];
  let d = bigGcd(lf < 0n ? -lf : lf, lg < 0n ? -lg : lg);
  if (d === 0n) d = 1n;
  // (lg/d) x^mf f - (lf/d) x^mg g: shift f by mf first, then combine (leading terms cancel).
  const shifted: ZPoly = { exps: new Int32Array(f.exps.length), coefs: f.coefs };
  for (let t = 0; t < f.coefs.length; t++) for (let v = 0; v < nv; v++) shifted.exps[t * nv + v] = f.exps[t * nv + v] + mf[v];
  return primitive(combine(order, shifted, lg / d, lf / d, mg, g));
}
