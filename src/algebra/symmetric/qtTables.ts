// Polynomials in one or two parameters stored as dense integer tables, and their evaluation at
// values of the language (numbers or polynomials). The Hall–Littlewood and Macdonald computations
// run on these tables and turn them into PolyLike coefficients only at the end.

import { iadd, imul, ineg, type Int } from '../../numbers/integer.js';
import { asVariable } from '../polynomialOps.js';
import { fromTerms, padd, pmul, ppow, type PolyLike } from '../polynomial.js';

/** A polynomial c[0] + c[1] t + ... with integer coefficients. */
export type Uni = Int[];

export function uniAdd(a: Uni, b: Uni): Uni {
  const out: Uni = new Array(Math.max(a.length, b.length)).fill(0);
  for (let i = 0; i < a.length; i++) out[i] = a[i];
  for (let i = 0; i < b.length; i++) out[i] = iadd(out[i], b[i]);
  return trim(out);
}

export function uniMul(a: Uni, b: Uni): Uni {
  if (a.length === 0 || b.length === 0) return [];
  const out: Uni = new Array(a.length + b.length - 1).fill(0);
  for (let i = 0; i < a.length; i++) {
    if (a[i] === 0) continue;
    for (let j = 0; j < b.length; j++) if (b[j] !== 0) out[i + j] = iadd(out[i + j], imul(a[i], b[j]));
  }
  return trim(out);
}

export function uniNeg(a: Uni): Uni {
  return a.map(ineg);
}

function trim(a: Uni): Uni {
  let n = a.length;
  while (n > 0 && a[n - 1] === 0) n--;
  return n === a.length ? a : a.slice(0, n);
}

/** sum c_i t^i at a value of t. */
export function evalUni(c: Uni, t: PolyLike): PolyLike {
  const id = asVariable(t);
  if (id !== undefined) {
    const terms: [number[], Int][] = [];
    c.forEach((x, i) => {
      if (x !== 0) terms.push([[i], x]);
    });
    return fromTerms([id], terms);
  }
  let r: PolyLike = 0;
  for (let i = c.length - 1; i >= 0; i--) r = padd(pmul(r, t), c[i]);
  return r;
}

/** A polynomial sum c[i][j] q^i t^j with integer coefficients (rows may have different lengths). */
export type Bi = Int[][];

/** sum c_ij q^i t^j at values of q and t. */
export function evalBi(c: Bi, q: PolyLike, t: PolyLike): PolyLike {
  const qi = asVariable(q),
    ti = asVariable(t);
  if (qi !== undefined && ti !== undefined && qi !== ti) {
    const terms: [number[], Int][] = [];
    c.forEach((row, i) =>
      row.forEach((x, j) => {
        if (x !== 0) terms.push([[i, j], x]);
      }),
    );
    return fromTerms([qi, ti], terms);
  }
  const tp: PolyLike[] = [];
  let r: PolyLike = 0;
  c.forEach((row, i) => {
    let qpow: PolyLike | undefined;
    row.forEach((x, j) => {
      if (x === 0) return;
      if (qpow === undefined) qpow = ppow(q, i);
      if (tp[j] === undefined) tp[j] = ppow(t, j);
      r = padd(r, pmul(x, pmul(qpow, tp[j])));
    });
  });
  return r;
}
