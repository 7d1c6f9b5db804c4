// Which algorithm computes a reduced Gröbner basis: the plain Buchberger algorithm (any field).
// The fast modular engine and the multi-modular route over Q plug in here.

import type { Scalar } from '../../numbers/rational.js';
import type { Limits } from './bounds.js';
import { buchberger } from './buchberger.js';
import { primeField, rationals } from './field.js';
import type { Sparse } from './sparse.js';
import type { TermOrder } from './termOrder.js';

export function basisModP(p: number, order: TermOrder, F: readonly Sparse<number>[], limits: Limits): Sparse<number>[] {
  return buchberger(primeField(p), order, F, limits);
}

export function basisOverQ(order: TermOrder, F: readonly Sparse<Scalar>[], limits: Limits): Sparse<Scalar>[] {
  return buchberger(rationals, order, F, limits);
}
