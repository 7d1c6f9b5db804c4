// Schur polynomials s_lambda(x[1], ..., x[m]) by the branching rule
//   s_lambda(x_1..x_m) = sum over mu with lambda/mu a horizontal strip of s_mu(x_1..x_{m-1}) x_m^{|lambda|-|mu|}
// (Macdonald, Symmetric Functions and Hall Polynomials, 2nd ed., I (5.11)), memoised on (x, m, lambda).

import { padd, pmul, ppow, type PolyLike, variable } from './polynomial.js';

const memo = new Map<string, PolyLike>();

export function schurPolynomial(parts: readonly number[], x: string, m: number): PolyLike {
  const lam = parts.filter((p) => p > 0);
  if (lam.length > m) return 0;
  if (lam.length === 0) return 1;
  if (m === 1) return ppow(variable(`${x}[1]`), lam[0]);
  const key = `${x}:${m}:${lam.join(',')}`;
  const known = memo.get(key);
  if (known !== undefined) return known;
  const size = lam.reduce((a, b) => a + b, 0);
  const xm = variable(`${x}[${m}]`);
  let total: PolyLike = 0;
  // mu_i ranges over [lambda_{i+1}, lambda_i]; mu has at most m-1 nonzero parts.
  const mu = new Array(lam.length).fill(0);
  const rec = (i: number, muSize: number) => {
    if (i === lam.length) {
      const sub = schurPolynomial(mu, x, m - 1);
      if (sub !== 0) total = padd(total, pmul(sub, ppow(xm, size - muSize)));
      return;
    }
    const lo = i + 1 < lam.length ? lam[i + 1] : 0;
    for (let v = lo; v <= lam[i]; v++) {
      mu[i] = v;
      rec(i + 1, muSize + v);
    }
  };
  rec(0, 0);
  memo.set(key, total);
  return total;
}
