// Between the code base's Polynomial (variables in print order, terms in graded lex) and the
// sparse rows of a term order's variable list.

import { fail } from '../../base/errors.js';
import type { Scalar } from '../../numbers/rational.js';
import { sisZero } from '../../numbers/scalar.js';
import { fromTerms, isPolynomial, type PolyLike } from '../polynomial.js';
import { varName } from '../variables.js';
import type { Field } from './field.js';
import { sparseFromTerms, type Sparse } from './sparse.js';
import type { TermOrder } from './termOrder.js';

/** The polynomial as sparse rows over order.varIds; fails on a variable outside the ring. */
export function toSparse<T>(K: Field<T>, order: TermOrder, f: PolyLike): Sparse<T> {
  const nv = order.nv;
  if (!isPolynomial(f)) {
    const c = K.fromScalar(f);
    return K.isZero(c) ? { exps: new Int32Array(0), coefs: [] } : { exps: new Int32Array(nv), coefs: [c] };
  }
  const where = Array.from(f.vars, (id) => {
    const p = order.indexOf(id);
    if (p < 0)
      fail(
        `the variable ${varName(id)} of ${f.toText()} is not among the term order's variables (${order.varIds.map(varName).join(', ')})`,
      );
    return p;
  });
  const rows: Int32Array[] = [];
  const coefs: T[] = [];
  for (let t = 0; t < f.length; t++) {
    const c = K.fromScalar(f.coefs[t]);
    if (K.isZero(c)) continue;
    const r = new Int32Array(nv);
    for (let k = 0; k < f.nv; k++) r[where[k]] = f.exps[t * f.nv + k];
    rows.push(r);
    coefs.push(c);
  }
  return sparseFromTerms(K, order, rows, coefs);
}

/** Back to a Polynomial, or a Scalar when constant. */
export function fromSparse<T>(K: Field<T>, order: TermOrder, f: Sparse<T>): PolyLike {
  const nv = order.nv;
  const terms: [Int32Array, Scalar][] = [];
  for (let t = 0; t < f.coefs.length; t++) {
    const c = K.toScalar(f.coefs[t]);
    if (!sisZero(c)) terms.push([f.exps.subarray(t * nv, (t + 1) * nv), c]);
  }
  return fromTerms(order.varIds, terms);
}
