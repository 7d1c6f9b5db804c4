// The Gröbner basis engine: term orders, reduced bases over Q and F_p, and the ideal operations.
export { termOrder, matrixOrder, TermOrder, type OrderSpec } from './termOrder.js';
export type { GroebnerOptions } from './bounds.js';
export {
  groebnerBasis, leadingTerm, normalForm, isGroebnerBasis, inIdeal, idealEquals, eliminate, eliminationOrder,
  intersect, quotient, saturation, inRadical, variablesOf, type IdealOptions, type NormalFormOptions,
} from './ideals.js';
