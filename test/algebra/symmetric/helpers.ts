// Shared helpers of the symmetric-function tests: building symmetric polynomials directly from
// their definitions in x[1..n] (an algorithm independent of the transition tables), and shorthands.

import { fromTerms, padd, pmul, type PolyLike } from '../../../src/algebra/polynomial.js';
import { fromBasis, type BasisName } from '../../../src/algebra/symmetric/bases.js';
import type { SymLike } from '../../../src/algebra/symmetric/symmetricFunction.js';
import { indexedVarId } from '../../../src/algebra/variables.js';

export function basisElement(b: BasisName, parts: readonly number[]): SymLike {
  return fromBasis(b, [[parts, 1]]);
}
export const s = (...p: number[]) => basisElement('schur', p);
export const m = (...p: number[]) => basisElement('monomial', p);
export const e = (...p: number[]) => basisElement('elementary', p);
export const h = (...p: number[]) => basisElement('complete', p);
export const p = (...q: number[]) => basisElement('power', q);

function ids(n: number): number[] {
  return Array.from({ length: n }, (_, i) => indexedVarId('x', i + 1));
}

/** Every exponent vector of length n and total degree d. */
function* vectors(n: number, d: number): Generator<number[]> {
  const v = new Array(n).fill(0);
  const go = function* (i: number, left: number): Generator<number[]> {
    if (i === n - 1) {
      v[i] = left;
      yield v.slice();
      return;
    }
    for (let k = left; k >= 0; k--) {
      v[i] = k;
      yield* go(i + 1, left - k);
    }
  };
  if (n === 0) {
    if (d === 0) yield [];
    return;
  }
  yield* go(0, d);
}

/** m_lambda(x_1..x_n): the distinct rearrangements of x^lambda. */
export function monomialDirect(lam: readonly number[], n: number): PolyLike {
  if (lam.length > n) return 0;
  const target = lam
    .slice()
    .sort((a, b) => b - a)
    .join(',');
  const d = lam.reduce((a, b) => a + b, 0);
  const terms: [number[], number][] = [];
  for (const v of vectors(n, d))
    if (
      v
        .filter((x) => x > 0)
        .sort((a, b) => b - a)
        .join(',') === target
    )
      terms.push([v, 1]);
  return fromTerms(ids(n), terms);
}

/** e_k, h_k and p_k in x_1..x_n straight from their definitions. */
export function oneRowDirect(b: 'elementary' | 'complete' | 'power', k: number, n: number): PolyLike {
  const terms: [number[], number][] = [];
  for (const v of vectors(n, k)) {
    if (b === 'elementary' && v.some((x) => x > 1)) continue;
    if (b === 'power' && v.filter((x) => x > 0).length > 1) continue;
    terms.push([v, 1]);
  }
  return fromTerms(ids(n), terms);
}

export function productDirect(b: 'elementary' | 'complete' | 'power', parts: readonly number[], n: number): PolyLike {
  let r: PolyLike = 1;
  for (const k of parts) r = pmul(r, oneRowDirect(b, k, n));
  return r;
}

export function sumPoly(xs: PolyLike[]): PolyLike {
  return xs.reduce((a, b) => padd(a, b), 0 as PolyLike);
}
