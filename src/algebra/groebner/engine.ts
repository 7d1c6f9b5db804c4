// Which algorithm computes a reduced Gröbner basis: the F4-style engine over F_p, and over Q
// the modular computation with its exact proof (rationalBasis.ts).

import type { Scalar } from '../../numbers/rational.js';
import type { Limits } from './bounds.js';
import { f4 } from './f4.js';
import { rationalBasis } from './rationalBasis.js';
import type { Sparse } from './sparse.js';
import type { TermOrder } from './termOrder.js';

export function basisModP(p: number, order: TermOrder, F: readonly Sparse<number>[], limits: Limits): Sparse<number>[] {
  return f4(p, order, F, limits);
}

export function basisOverQ(order: TermOrder, F: readonly Sparse<Scalar>[], limits: Limits): Sparse<Scalar>[] {
  return rationalBasis(order, F, limits);
}
