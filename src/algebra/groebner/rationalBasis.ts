// Reduced Gröbner bases over Q by modular computation with an exact proof.
//
// Homogeneous input F (integer coefficients after clearing denominators): for primes p the F4
// engine gives the reduced basis G_p of I_p = <F mod p>. Bases with the same leading monomials
// are combined coefficientwise by Chinese remaindering and rational reconstruction into a
// candidate G over Q, which must agree with the basis of one further prime. Then G is proven
// to be the reduced Gröbner basis of I = <F> over Q:
//   1. every f in F reduces to 0 by G (exactly, over Q), so I ⊆ J = <G>;
//   2. every S-pair of G reduces to 0 (exactly, fraction free over Z: integerReduction.ts),
//      apart from those the product and chain criteria dismiss (criterion.ts), so G is a
//      Gröbner basis of J, and J is homogeneous (G is checked homogeneous);
//   3. lm(G) = lm(G_p). Let H(K, d) = dim of degree d of R/K. For every degree d the space I_d
//      is spanned by the products m f (deg = d); the integer matrix of their coefficients has
//      rank over F_p at most its rank over Q, so H(I_p, d) >= H(I, d). From 1, H(I, d) >= H(J, d)
//      = H(<lm G>, d). And G_p ⊆ I_p (every row of the modular computation is a combination of
//      multiples of F mod p), so <lm G_p> ⊆ lm(I_p) and H(I_p, d) <= H(<lm G_p>, d) =
//      H(<lm G>, d). All are equal, so dim I_d = dim J_d with I_d ⊆ J_d: I = J.
// Nothing in the proof trusts the modular computation beyond G_p ⊆ I_p.
//
// Inhomogeneous input is homogenised with a new smallest variable h, ordered by total degree
// first and then by the given order on the x-part (a monomial order on the homogeneous ideal
// K = <f^h>). Its basis is proven as above; setting h = 1 gives a Gröbner basis of I for the
// given order: for f in I, h^a f^h lies in K for some a (Cox, Little and O'Shea, Chapter 8,
// Section 2), its leading monomial is h^b lm(f), some g in the basis has lm(g) = x^α h^c
// dividing it, and lm(g(x, 1)) = x^α since the terms of the homogeneous g have distinct x-parts
// and the order compares them by x-part; dehomogenising maps K onto I. The dehomogenised basis
// is then made reduced exactly over Q.

import { fail } from '../../base/errors.js';
import { bigGcd } from '../../numbers/integer.js';
import { makeRat, Rat, type Scalar } from '../../numbers/rational.js';
import { isqrt, rationalReconstruct } from '../linear/reconstruction.js';
import type { Limits } from './bounds.js';
import { reduceBasis } from './buchberger.js';
import { f4 } from './f4.js';
import { rationals } from './field.js';
import { reconstructionPrime, scalarModPOrNone } from './primeField.js';
import { pairsToCheck } from './criterion.js';
import { reducesToZero, toZ, zSPolynomial } from './integerReduction.js';
import { sparseFromTerms, type Sparse } from './sparse.js';
import { matrixOrder, type TermOrder } from './termOrder.js';

const MAX_PRIMES = 400;

function isHomogeneous(f: Sparse<unknown>, nv: number): boolean {
  let d = -1;
  for (let t = 0; t < f.coefs.length; t++) {
    let e = 0;
    for (let v = 0; v < nv; v++) e += f.exps[t * nv + v];
    if (d < 0) d = e;
    else if (e !== d) return false;
  }
  return true;
}

/** The polynomial times the lcm of its denominators (integer coefficients). */
function clearDenominators(f: Sparse<Scalar>): Sparse<Scalar> {
  let L = 1n;
  for (const c of f.coefs) if (c instanceof Rat) L = (L / bigGcd(L, c.den)) * c.den;
  if (L === 1n) return f;
  return { exps: f.exps, coefs: f.coefs.map((c) => rationals.mul(c, makeRat(L, 1n))) };
}

function lmKey(G: readonly Sparse<number>[], nv: number): string {
  return G.map((g) => Array.from(g.exps.subarray(0, nv)).join(',')).join(';');
}

/** Residues of several primes folded together, per basis element and monomial. */
class Accumulator {
  modulus = 1n;
  primes = 0;
  // Per element: monomial key -> index; exps rows; values mod modulus.
  keys: Map<string, number>[] = [];
  rows: Int32Array[][] = [];
  values: bigint[][] = [];

  constructor(readonly nv: number) {}

  add(G: readonly Sparse<number>[], p: number): void {
    const nv = this.nv,
      M = this.modulus,
      P = BigInt(p);
    const inv = this.primes === 0 ? 0n : modInverse(M % P, P);
    for (let i = 0; i < G.length; i++) {
      if (!this.keys[i]) {
        this.keys[i] = new Map();
        this.rows[i] = [];
        this.values[i] = [];
      }
      const keys = this.keys[i],
        vals = this.values[i];
      const residue = new Map<number, number>();
      const g = G[i];
      for (let t = 0; t < g.coefs.length; t++) {
        const row = g.exps.subarray(t * nv, (t + 1) * nv);
        const key = row.join(',');
        let idx = keys.get(key);
        if (idx === undefined) {
          idx = vals.length;
          keys.set(key, idx);
          this.rows[i].push(row.slice());
          vals.push(0n);
        }
        residue.set(idx, g.coefs[t]);
      }
      for (let idx = 0; idx < vals.length; idx++) {
        const r = BigInt(residue.get(idx) ?? 0);
        if (this.primes === 0) vals[idx] = r;
        else {
          const x = vals[idx];
          let d = (r - (x % P)) % P;
          if (d < 0n) d += P;
          if (d !== 0n) vals[idx] = x + M * ((d * inv) % P);
        }
      }
    }
    this.modulus = M * P;
    this.primes++;
  }

  /** The candidate over Q, or null when some coefficient does not reconstruct yet. */
  reconstruct(order: TermOrder): Sparse<Scalar>[] | null {
    const M = this.modulus,
      bound = isqrt(M / 2n);
    const out: Sparse<Scalar>[] = [];
    for (let i = 0; i < this.values.length; i++) {
      const coefs: Scalar[] = [];
      const rows: Int32Array[] = [];
      let D = 1n; // running common denominator: later entries usually reconstruct as integers
      for (let idx = 0; idx < this.values[i].length; idx++) {
        const v = (this.values[i][idx] * D) % M;
        const r = rationalReconstruct(v, M, bound);
        if (!r) return null;
        if (r[0] === 0n) continue;
        coefs.push(makeRat(r[0], r[1] * D));
        D *= r[1];
        if (D > bound) return null;
        rows.push(this.rows[i][idx]);
      }
      out.push(sparseFromTerms(rationals, order, rows, coefs));
    }
    return out;
  }
}

function modInverse(a: bigint, p: bigint): bigint {
  let r0 = p,
    r1 = ((a % p) + p) % p,
    t0 = 0n,
    t1 = 1n;
  while (r1 !== 0n) {
    const q = r0 / r1;
    [r0, r1] = [r1, r0 - q * r1];
    [t0, t1] = [t1, t0 - q * t1];
  }
  return ((t0 % p) + p) % p;
}

/** Whether candidate G over Q reduces modulo p to exactly Gp. */
function agreesWith(G: readonly Sparse<Scalar>[], Gp: readonly Sparse<number>[], p: number, nv: number): boolean {
  if (G.length !== Gp.length) return false;
  for (let i = 0; i < G.length; i++) {
    const want = new Map<string, number>();
    for (let t = 0; t < Gp[i].coefs.length; t++) want.set(Gp[i].exps.subarray(t * nv, (t + 1) * nv).join(','), Gp[i].coefs[t]);
    let seen = 0;
    for (let t = 0; t < G[i].coefs.length; t++) {
      const r = scalarModPOrNone(G[i].coefs[t], p);
      if (r < 0) return false;
      const w = want.get(G[i].exps.subarray(t * nv, (t + 1) * nv).join(',')) ?? 0;
      if (w !== r) return false;
      if (r !== 0) seen++;
    }
    if (seen !== want.size) return false;
  }
  return true;
}

/** The exact proof of the header (steps 1 and 2; step 3 holds by construction of the candidate). */
function provenBasis(order: TermOrder, F: readonly Sparse<Scalar>[], G: readonly Sparse<Scalar>[], limits: Limits): boolean {
  const nv = order.nv;
  for (const g of G) if (!isHomogeneous(g, nv)) return false;
  const GZ = G.map(toZ);
  for (const f of F) if (!reducesToZero(order, toZ(f), GZ, limits)) return false;
  for (const [i, j] of pairsToCheck(
    G.map((g) => g.exps.subarray(0, nv)),
    nv,
  )) {
    limits.poll();
    if (!reducesToZero(order, zSPolynomial(order, GZ[i], GZ[j]), GZ, limits)) return false;
  }
  return true;
}

/** Homogeneous input: the proven reduced basis (see the header). */
function homogeneousBasis(order: TermOrder, F: readonly Sparse<Scalar>[], limits: Limits): Sparse<Scalar>[] {
  const nv = order.nv;
  const FZ = F.map(clearDenominators);
  const groups = new Map<string, Accumulator>();
  let pending: Sparse<Scalar>[] | null = null;
  let pendingKey = '';
  let failedProofs = 0;
  for (let k = 0; k < MAX_PRIMES; k++) {
    limits.poll();
    const p = reconstructionPrime(k);
    const Fp = FZ.map((f) => reduceModP(f, p, nv));
    const Gp = f4(p, order, Fp, limits);
    const key = lmKey(Gp, nv);
    if (pending && key === pendingKey && agreesWith(pending, Gp, p, nv)) {
      if (provenBasis(order, F, pending, limits)) return pending;
      if (++failedProofs >= 3) fail('internal error: a modular Gröbner basis candidate over Q failed its exact verification three times');
    }
    let acc = groups.get(key);
    if (!acc) groups.set(key, (acc = new Accumulator(nv)));
    acc.add(Gp, p);
    // Reconstruct for the pattern seen most often.
    let best: Accumulator = acc,
      bestKey = key;
    for (const [kk, a] of groups) if (a.primes > best.primes) [best, bestKey] = [a, kk];
    pending = best.reconstruct(order);
    pendingKey = bestKey;
  }
  return fail(`the Gröbner basis over Q did not stabilise within ${MAX_PRIMES} primes`);
}

/** f modulo p (f has integer coefficients; terms stay in order, zeros drop). */
function reduceModP(f: Sparse<Scalar>, p: number, nv: number): Sparse<number> {
  const coefs: number[] = [];
  const exps: number[] = [];
  for (let t = 0; t < f.coefs.length; t++) {
    const r = scalarModPOrNone(f.coefs[t], p);
    if (r > 0) {
      coefs.push(r);
      for (let v = 0; v < nv; v++) exps.push(f.exps[t * nv + v]);
    }
  }
  return { exps: Int32Array.from(exps), coefs };
}

/** The homogenisation order: total degree with h, then `order` on the x-part; h is last. */
function homogenisedOrder(order: TermOrder): TermOrder {
  const nv = order.nv;
  const rows: Float64Array[] = [new Float64Array(nv + 1).fill(1)];
  for (const w of order.rows) {
    const r = new Float64Array(nv + 1);
    r.set(w);
    rows.push(r);
  }
  return matrixOrder(order.spec, [...order.varIds, -1], rows);
}

/** The proven reduced Gröbner basis over Q of the nonzero polynomials F. */
export function rationalBasis(order: TermOrder, F: readonly Sparse<Scalar>[], limits: Limits): Sparse<Scalar>[] {
  const nv = order.nv;
  const gens = F.filter((f) => f.coefs.length > 0);
  if (gens.length === 0) return [];
  const unit: Sparse<Scalar> = { exps: new Int32Array(nv), coefs: [1] };
  if (gens.some((f) => f.exps.every((e) => e === 0))) return [unit];
  if (gens.every((f) => isHomogeneous(f, nv))) return homogeneousBasis(order, gens, limits);
  const ho = homogenisedOrder(order);
  const FH = gens.map((f) => {
    let D = 0;
    for (let t = 0; t < f.coefs.length; t++) {
      let e = 0;
      for (let v = 0; v < nv; v++) e += f.exps[t * nv + v];
      D = Math.max(D, e);
    }
    const rows: Int32Array[] = [];
    for (let t = 0; t < f.coefs.length; t++) {
      const r = new Int32Array(nv + 1);
      let e = 0;
      for (let v = 0; v < nv; v++) e += r[v] = f.exps[t * nv + v];
      r[nv] = D - e;
      rows.push(r);
    }
    return sparseFromTerms(rationals, ho, rows, f.coefs.slice());
  });
  const GH = homogeneousBasis(ho, FH, limits);
  const G = GH.map((g) => {
    const rows: Int32Array[] = [];
    for (let t = 0; t < g.coefs.length; t++) rows.push(g.exps.slice(t * (nv + 1), t * (nv + 1) + nv));
    return sparseFromTerms(rationals, order, rows, g.coefs.slice());
  });
  if (G.some((g) => g.exps.subarray(0, nv).every((e) => e === 0))) return [unit];
  return reduceBasis(rationals, order, G, limits);
}
