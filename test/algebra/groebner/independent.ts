// An independent plain implementation for checking Gröbner bases in the tests: polynomials as
// arrays of [exponents, coefficient] sorted by a comparison function, over Q (exact Scalars of
// src/numbers) or F_p (BigInt arithmetic, so no overflow question arises). Nothing here uses
// the engine under test.
import { isPolynomial, type PolyLike } from '../../../src/algebra/polynomial.js';
import type { Scalar } from '../../../src/numbers/rational.js';
import { sadd, sdiv, sisZero, smul, ssub } from '../../../src/numbers/scalar.js';
import { makeRat, Rat } from '../../../src/numbers/rational.js';

export type Cmp = (a: number[], b: number[]) => number;
export type Term = [number[], Scalar];
export type Plain = Term[];

export interface PlainField {
  add(a: Scalar, b: Scalar): Scalar;
  sub(a: Scalar, b: Scalar): Scalar;
  mul(a: Scalar, b: Scalar): Scalar;
  div(a: Scalar, b: Scalar): Scalar;
  norm(a: Scalar): Scalar;
  zero(a: Scalar): boolean;
}

export const Q: PlainField = { add: sadd, sub: ssub, mul: smul, div: sdiv, norm: (a) => a, zero: sisZero };

export function Fp(p: number): PlainField {
  const P = BigInt(p);
  const n = (a: Scalar): bigint => {
    if (a instanceof Rat) return (n(a.num) * inv(n(a.den))) % P;
    const r = BigInt(a) % P;
    return r < 0n ? r + P : r;
  };
  const inv = (a: bigint): bigint => {
    let [r0, r1, t0, t1] = [P, a, 0n, 1n];
    while (r1 !== 0n) {
      const q = r0 / r1;
      [r0, r1, t0, t1] = [r1, r0 - q * r1, t1, t0 - q * t1];
    }
    if (r0 !== 1n) throw new Error('not invertible');
    return ((t0 % P) + P) % P;
  };
  const out = (b: bigint): Scalar => Number(b);
  return {
    add: (a, b) => out((n(a) + n(b)) % P),
    sub: (a, b) => out((n(a) - n(b) + P) % P),
    mul: (a, b) => out((n(a) * n(b)) % P),
    div: (a, b) => out((n(a) * inv(n(b))) % P),
    norm: (a) => out(n(a)),
    zero: (a) => n(a) === 0n,
  };
}

/** grevlex, lex, deglex on plain exponent arrays (first variable largest). */
export const plainOrders: Record<string, Cmp> = {
  lex: (a, b) => {
    for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return a[i] - b[i];
    return 0;
  },
  deglex: (a, b) => {
    const d = a.reduce((s, x) => s + x, 0) - b.reduce((s, x) => s + x, 0);
    return d !== 0 ? d : plainOrders.lex(a, b);
  },
  grevlex: (a, b) => {
    const d = a.reduce((s, x) => s + x, 0) - b.reduce((s, x) => s + x, 0);
    if (d !== 0) return d;
    for (let i = a.length - 1; i >= 0; i--) if (a[i] !== b[i]) return b[i] - a[i];
    return 0;
  },
};

export function toPlain(K: PlainField, f: PolyLike, ids: readonly number[], cmp: Cmp): Plain {
  if (!isPolynomial(f)) return K.zero(f) ? [] : [[ids.map(() => 0), K.norm(f)]];
  const pos = Array.from(f.vars, (id) => {
    const p = ids.indexOf(id);
    if (p < 0) throw new Error('variable outside the ring');
    return p;
  });
  const terms: Term[] = [];
  for (let t = 0; t < f.length; t++) {
    const e = ids.map(() => 0);
    for (let k = 0; k < f.nv; k++) e[pos[k]] = f.exps[t * f.nv + k];
    terms.push([e, f.coefs[t]]);
  }
  return normalize(K, terms, cmp);
}

export function normalize(K: PlainField, terms: Term[], cmp: Cmp): Plain {
  const m = new Map<string, Term>();
  for (const [e, c] of terms) {
    const k = e.join(',');
    const o = m.get(k);
    m.set(k, [e, o ? K.add(o[1], c) : K.norm(c)]);
  }
  return [...m.values()].filter(([, c]) => !K.zero(c)).sort((a, b) => cmp(b[0], a[0]));
}

function subMul(K: PlainField, f: Plain, c: Scalar, m: number[], g: Plain, cmp: Cmp): Plain {
  const terms: Term[] = f.slice();
  for (const [e, x] of g) terms.push([e.map((v, i) => v + m[i]), K.sub(0, K.mul(c, x))]);
  return normalize(K, terms, cmp);
}

const divides = (a: number[], b: number[]) => a.every((x, i) => x <= b[i]);

/** The remainder of f on division by G (the division algorithm). */
export function plainRemainder(K: PlainField, f: Plain, G: Plain[], cmp: Cmp): Plain {
  const r: Term[] = [];
  let p = f;
  while (p.length > 0) {
    const [e, c] = p[0];
    const g = G.find((g) => g.length > 0 && divides(g[0][0], e));
    if (g)
      p = subMul(
        K,
        p,
        K.div(c, g[0][1]),
        e.map((x, i) => x - g[0][0][i]),
        g,
        cmp,
      );
    else {
      r.push(p[0]);
      p = p.slice(1);
    }
  }
  return r;
}

/** Buchberger's criterion, every pair (no criteria at all): all S-polynomials reduce to 0. */
export function plainIsGroebner(K: PlainField, G: Plain[], cmp: Cmp): boolean {
  for (let i = 0; i < G.length; i++)
    for (let j = i + 1; j < G.length; j++) {
      const [a, ca] = G[i][0],
        [b, cb] = G[j][0];
      const l = a.map((x, v) => Math.max(x, b[v]));
      let s = subMul(
        K,
        [],
        K.div(-1, ca),
        l.map((x, v) => x - a[v]),
        G[i],
        cmp,
      );
      s = subMul(
        K,
        s,
        K.div(1, cb),
        l.map((x, v) => x - b[v]),
        G[j],
        cmp,
      );
      if (plainRemainder(K, s, G, cmp).length > 0) return false;
    }
  return true;
}

/** Reduced: monic, no term of any element divisible by another element's leading monomial. */
export function plainIsReduced(K: PlainField, G: Plain[]): boolean {
  return G.every((g, i) => (!K.zero(K.sub(g[0][1], 1)) ? false : G.every((h, j) => i === j || g.every(([e]) => !divides(h[0][0], e)))));
}

export const half = makeRat(1n, 2n);
