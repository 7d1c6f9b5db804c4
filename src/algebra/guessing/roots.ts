// Rational roots of a polynomial with integer coefficients (coeffs[j] is the coefficient of n^j):
// each root p/q has p dividing the lowest nonzero coefficient and q the leading one (the rational
// root theorem); found roots are divided out exactly, so multiplicities come out too.

import { makeRat, type Scalar } from '../../numbers/rational.js';
import { scmp } from '../../numbers/scalar.js';

/** Divisors of |x| by trial division; null when x has a prime factor above the bound. */
function divisors(x: bigint, bound = 1_000_000n): bigint[] | null {
  if (x < 0n) x = -x;
  const primes: Array<[bigint, number]> = [];
  for (let d = 2n; d * d <= x; d++) {
    if (d > bound) return null;
    if (x % d === 0n) {
      let e = 0;
      while (x % d === 0n) {
        x /= d;
        e++;
      }
      primes.push([d, e]);
    }
  }
  if (x > 1n) primes.push([x, 1]);
  let out = [1n];
  for (const [p, e] of primes) {
    const next: bigint[] = [];
    for (const d of out) {
      let m = d;
      for (let i = 0; i <= e; i++) {
        next.push(m);
        m *= p;
      }
    }
    out = next;
  }
  return out;
}

/** p(x) / (q x - r) when it divides exactly (by Gauss's lemma it does whenever r/q is a root in lowest terms of a primitive p). */
function divideLinear(c: bigint[], q: bigint, r: bigint): bigint[] | null {
  // c = (q x - r) * b: from the top, b[d-1] = c[d]/q, ..., and the constant must match.
  const d = c.length - 1;
  const b = new Array<bigint>(d).fill(0n);
  for (let j = d; j >= 1; j--) {
    const need = c[j] + (j < d ? r * b[j] : 0n);
    if (need % q !== 0n) return null;
    b[j - 1] = need / q;
  }
  return -r * b[0] === c[0] ? b : null;
}

/**
 * The factorisation c(x) = lead * prod (x - root)^(multiplicity) when every root is rational,
 * else null. Roots in increasing order, repeated by multiplicity.
 */
export function rationalRoots(coeffs: readonly bigint[]): { lead: bigint; roots: Scalar[] } | null {
  let c = coeffs.slice();
  while (c.length > 1 && c[c.length - 1] === 0n) c.pop();
  const roots: Scalar[] = [];
  while (c.length > 1 && c[0] === 0n) {
    roots.push(0);
    c = c.slice(1);
  }
  while (c.length > 1) {
    const lead = c[c.length - 1];
    const ps = divisors(c[0]);
    const qs = divisors(lead);
    if (!ps || !qs) return null;
    let found = false;
    outer: for (const q of qs)
      for (const p of ps)
        for (const s of [p, -p]) {
          const b = divideLinear(c, q, s);
          if (b) {
            roots.push(makeRat(s, q));
            // (q x - s) = q (x - s/q): the leading coefficient keeps the q.
            c = b.map((x) => x * q);
            found = true;
            break outer;
          }
        }
    if (!found) return null;
  }
  roots.sort(scmp);
  return { lead: c[0], roots };
}
