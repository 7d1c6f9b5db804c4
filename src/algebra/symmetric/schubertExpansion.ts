// The expansion of a polynomial in x[1], x[2], ... in the basis of Schubert polynomials, by
// repeatedly removing the leading term: S_w = x^code(w) + smaller monomials in the order that
// compares total degree, then the exponents from the last variable down (I. G. Macdonald, Notes on
// Schubert Polynomials (1991), (4.11)), so the leading monomial x^alpha of P is that of
// c S_w with code(w) = alpha and c its coefficient. Other indeterminates (q, y[j], ...) are
// coefficients.

import { fail } from '../../base/errors.js';
import { isScalar } from '../../numbers/rational.js';
import { sisZero } from '../../numbers/scalar.js';
import { isPolynomial, pmul, polyText, psub, type PolyLike } from '../polynomial.js';
import { schubertPolynomial } from '../schubertPolynomials.js';
import { varBase, varIndex } from '../variables.js';
import { fromLehmerCode } from './permutationWords.js';
import { xCoefficients } from './specialize.js';

/** Beyond this many steps the expansion is refused (each step computes one Schubert polynomial). */
const MAX_STEPS = 20_000;

function compareLeading(a: readonly number[], b: readonly number[]): number {
  let da = 0,
    db = 0;
  for (const x of a) da += x;
  for (const x of b) db += x;
  if (da !== db) return da - db;
  for (let i = Math.max(a.length, b.length) - 1; i >= 0; i--) {
    const d = (a[i] ?? 0) - (b[i] ?? 0);
    if (d !== 0) return d;
  }
  return 0;
}

function maxIndex(p: PolyLike, x: string, call: string): number {
  let m = 0;
  if (isPolynomial(p))
    for (const id of p.vars)
      if (varBase(id) === x) {
        const i = varIndex(id);
        if (i === null || i < 1)
          fail(`${call}: ${polyText(p)} contains ${x}${i === null ? '' : `[${i}]`}; the family ${x} starts at ${x}[1]`);
        m = Math.max(m, i);
      }
  return m;
}

/** [w (one-line, trimmed), coefficient] pairs with P = sum c_w S_w. */
export function schubertExpansion(P: PolyLike, x: string, call: string): [number[], PolyLike][] {
  const m = Math.max(1, maxIndex(P, x, call));
  const terms = xCoefficients(P, x, m, call);
  const out: [number[], PolyLike][] = [];
  for (let steps = 0; terms.size > 0; steps++) {
    if (steps >= MAX_STEPS) fail(`${call}: the expansion needs more than ${MAX_STEPS} Schubert polynomials`);
    let lead: { e: number[]; coef: PolyLike } | undefined;
    for (const t of terms.values()) if (!lead || compareLeading(t.e, lead.e) > 0) lead = t;
    const w = fromLehmerCode(lead!.e);
    const c = lead!.coef;
    out.push([w, c]);
    const S = schubertPolynomial(w, x);
    for (const t of xCoefficients(S, x, m, call).values()) {
      const k = t.e.join(',');
      const cur = terms.get(k);
      const next = psub(cur?.coef ?? 0, pmul(c, t.coef));
      if (isScalar(next) && sisZero(next)) terms.delete(k);
      else terms.set(k, { e: t.e, coef: next });
    }
  }
  return out;
}
