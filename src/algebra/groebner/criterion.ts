// Buchberger's criterion with the pairs that need no reduction left out: a finite set G is a
// Gröbner basis when the S-polynomial of every pair (i, j) reduces to 0, except that a pair may
// be skipped when its leading monomials are coprime (the product criterion), or when some lm(k)
// divides lcm(i, j) and both lcm(i, k) and lcm(j, k) are proper divisors of lcm(i, j) (the chain
// criterion; the pairs it relies on have strictly smaller lcm, so the skipping is well founded).
// Cox, Little and O'Shea, *Ideals, Varieties, and Algorithms*, Chapter 2, Section 10, Theorem 6
// and Proposition 8 (4th ed.; Section 9 in earlier editions).

import { dividesRow } from './sparse.js';

/** The pairs i < j whose S-polynomials must be reduced; lms[i] is the leading exponent row of i. */
export function pairsToCheck(lms: readonly ArrayLike<number>[], nv: number): [number, number][] {
  const out: [number, number][] = [];
  const lcm = (a: number, b: number) => {
    const l = new Int32Array(nv);
    for (let v = 0; v < nv; v++) l[v] = Math.max(lms[a][v], lms[b][v]);
    return l;
  };
  const same = (a: Int32Array, b: Int32Array) => a.every((x, v) => x === b[v]);
  for (let i = 0; i < lms.length; i++)
    for (let j = i + 1; j < lms.length; j++) {
      let coprime = true;
      for (let v = 0; v < nv; v++) if (lms[i][v] > 0 && lms[j][v] > 0) coprime = false;
      if (coprime) continue;
      const lij = lcm(i, j);
      let chain = false;
      for (let k = 0; k < lms.length && !chain; k++) {
        if (k === i || k === j || !dividesRow(lms[k], 0, lij, 0, nv)) continue;
        if (!same(lcm(i, k), lij) && !same(lcm(j, k), lij)) chain = true;
      }
      if (!chain) out.push([i, j]);
    }
  return out;
}
