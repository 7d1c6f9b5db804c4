// Products in Λ through Littlewood–Richardson coefficients: s_mu s_nu = sum_lambda c^lambda_{mu nu}
// s_lambda, with c^lambda_{mu nu} counted as the semistandard skew tableaux of shape lambda/mu and
// content nu whose reverse reading word is a lattice word (Macdonald, Symmetric Functions and Hall
// Polynomials, I.9). The expansion of each product s_mu s_nu is cached. Skew Schur functions use the
// same coefficients: s_{lambda/mu} = sum_nu c^lambda_{mu nu} s_nu (I (5.3)).

import { fail } from '../../base/errors.js';
import { padd as addPoly, pmul, ppow, type PolyLike } from '../polynomial.js';
import { conjugate, containsParts, partitionsOf, partsKey, sizeOfParts, type Parts } from './partitions.js';
import { checkDegree } from './tables.js';
import { isSymmetricFunction, schurTerms, symScale, TermMap, type SymLike } from './symmetricFunction.js';

const lrMemo = new Map<string, number>();

/** c^lambda_{mu nu}. */
export function lrCoefficientOf(lam: Parts, mu: Parts, nu: Parts): number {
  if (sizeOfParts(lam) !== sizeOfParts(mu) + sizeOfParts(nu) || !containsParts(lam, mu) || !containsParts(lam, nu)) return 0;
  const key = `${lam.join(',')}|${mu.join(',')}|${nu.join(',')}`;
  const hit = lrMemo.get(key);
  if (hit !== undefined) return hit;
  const cells: [number, number][] = [];
  for (let i = 0; i < lam.length; i++) for (let j = lam[i] - 1; j >= (mu[i] ?? 0); j--) cells.push([i, j]);
  const T = lam.map((l) => new Array<number>(l).fill(0));
  const used = new Array<number>(nu.length + 1).fill(0);
  let count = 0;
  const go = (k: number) => {
    if (k === cells.length) {
      count++;
      return;
    }
    const [i, j] = cells[k];
    const right = j + 1 < lam[i] ? T[i][j + 1] : Infinity;
    const above = i > 0 && j >= (mu[i - 1] ?? 0) ? T[i - 1][j] : 0;
    const top = Math.min(right, nu.length, i + 1);
    for (let v = above + 1; v <= top; v++) {
      if (used[v] >= nu[v - 1]) continue;
      if (v > 1 && used[v] + 1 > used[v - 1]) continue;
      used[v]++;
      T[i][j] = v;
      go(k + 1);
      used[v]--;
    }
    T[i][j] = 0;
  };
  go(0);
  lrMemo.set(key, count);
  return count;
}

const productMemo = new Map<string, [readonly number[], number][]>();

/** s_mu s_nu as [lambda, c^lambda_{mu nu}] pairs. */
export function schurProduct(mu: Parts, nu: Parts): [readonly number[], number][] {
  if (mu.length === 0) return [[nu.slice(), 1]];
  if (nu.length === 0) return [[mu.slice(), 1]];
  const key = `${partsKey(mu)}|${partsKey(nu)}`;
  const hit = productMemo.get(key);
  if (hit) return hit;
  const n = sizeOfParts(mu) + sizeOfParts(nu);
  checkDegree(n, 'a product of symmetric functions');
  const out: [readonly number[], number][] = [];
  for (const lam of partitionsOf(n)) {
    const c = lrCoefficientOf(lam, mu, nu);
    if (c !== 0) out.push([lam, c]);
  }
  productMemo.set(key, out);
  return out;
}

export function symMul(a: SymLike, b: SymLike): SymLike {
  if (!isSymmetricFunction(a)) return symScale(a, b);
  if (!isSymmetricFunction(b)) return symScale(b, a);
  checkDegree(a.degree + b.degree, 'a product of symmetric functions');
  const m = new TermMap();
  for (const s of a.terms)
    for (const t of b.terms) {
      const c = pmul(s.coef, t.coef);
      for (const [lam, k] of schurProduct(s.parts, t.parts)) m.add(lam, k === 1 ? c : pmul(k, c));
    }
  return m.result();
}

export function symPow(a: SymLike, e: number): SymLike {
  if (!isSymmetricFunction(a)) return ppow(a, e);
  if (!Number.isInteger(e) || e < 0) fail(`a symmetric function to a negative power (${e}) is not a symmetric function`);
  checkDegree(a.degree * e, 'a power of a symmetric function');
  let result: SymLike = 1,
    base: SymLike = a;
  while (e > 0) {
    if (e & 1) result = symMul(result, base);
    e = Math.floor(e / 2);
    if (e > 0) base = symMul(base, base);
  }
  return result;
}

/** s_{lambda/mu} = sum_nu c^lambda_{mu nu} s_nu (0 when mu is not inside lambda). */
export function skewSchur(lam: Parts, mu: Parts): SymLike {
  const m = new TermMap();
  if (!containsParts(lam, mu)) return 0;
  const d = sizeOfParts(lam) - sizeOfParts(mu);
  checkDegree(sizeOfParts(lam), 'a skew Schur function');
  for (const nu of partitionsOf(d)) {
    const c = lrCoefficientOf(lam, mu, nu);
    if (c !== 0) m.add(nu, c);
  }
  return m.result();
}

/** The Hall inner product: <s_lambda, s_mu> = delta, extended bilinearly over the coefficients. */
export function hallProduct(f: SymLike, g: SymLike): PolyLike {
  const gt = new Map(schurTerms(g).map((t) => [partsKey(t.parts), t.coef]));
  let s: PolyLike = 0;
  for (const t of schurTerms(f)) {
    const c = gt.get(partsKey(t.parts));
    if (c !== undefined) s = addPoly(s, pmul(t.coef, c));
  }
  return s;
}

/** The involution omega: s_lambda -> s_lambda'. */
export function omegaOf(f: SymLike): SymLike {
  const m = new TermMap();
  for (const t of schurTerms(f)) m.add(conjugate(t.parts), t.coef);
  return m.result();
}
