// Plethysm f[g] through power sums (Macdonald, Symmetric Functions and Hall Polynomials, I.8):
// p_k[g] is g with every p_j replaced by p_{jk} and every indeterminate of the coefficients
// (q, t, ...) raised to the k-th power (the usual convention that indeterminates are monomials:
// p_k[q] = q^k), and f[g] = sum_rho f_rho prod_i p_{rho_i}[g] for f = sum_rho f_rho p_rho. Products
// of power sums are unions of partitions, so everything stays in the power-sum basis until the end.

import { isPolynomial, padd, pmul, ppow, type PolyLike, variable } from '../polynomial.js';
import { varName } from '../variables.js';
import { substitute } from '../polynomialOps.js';
import { fromBasis, expandIn } from './bases.js';
import { partsKey, unionParts } from './partitions.js';
import { checkDegree } from './tables.js';
import { isSymmetricFunction, type SymLike } from './symmetricFunction.js';

type PowerSum = Map<string, { parts: number[]; coef: PolyLike }>;

function addTo(m: PowerSum, parts: number[], coef: PolyLike): void {
  const k = partsKey(parts);
  const e = m.get(k);
  if (e) e.coef = padd(e.coef, coef);
  else m.set(k, { parts, coef });
}

/** Raise every indeterminate of a coefficient to the k-th power. */
function adams(c: PolyLike, k: number): PolyLike {
  if (k === 1 || !isPolynomial(c)) return c;
  const values = new Map<number, PolyLike>();
  for (const id of c.vars) values.set(id, ppow(variable(varName(id)), k));
  return substitute(c, values);
}

function multiply(a: PowerSum, b: PowerSum): PowerSum {
  const out: PowerSum = new Map();
  for (const x of a.values()) for (const y of b.values()) addTo(out, unionParts(x.parts, y.parts), pmul(x.coef, y.coef));
  return out;
}

export function plethysmOf(f: SymLike, g: SymLike): SymLike {
  const degF = isSymmetricFunction(f) ? f.degree : 0;
  const degG = isSymmetricFunction(g) ? g.degree : 0;
  checkDegree(degF * degG, 'a plethysm');
  const G = expandIn(g, 'power');
  const cache = new Map<number, PowerSum>();
  const pk = (k: number): PowerSum => {
    let m = cache.get(k);
    if (!m) {
      m = new Map();
      for (const t of G)
        addTo(
          m,
          t.parts.map((x) => x * k),
          adams(t.coef, k),
        );
      cache.set(k, m);
    }
    return m;
  };
  const total: PowerSum = new Map();
  for (const t of expandIn(f, 'power')) {
    let prod: PowerSum = new Map([['', { parts: [], coef: 1 as PolyLike }]]);
    for (const k of t.parts) prod = multiply(prod, pk(k));
    for (const e of prod.values()) addTo(total, e.parts, pmul(t.coef, e.coef));
  }
  return fromBasis(
    'power',
    [...total.values()].map((e) => [e.parts, e.coef] as const),
  );
}
