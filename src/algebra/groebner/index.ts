// The Gröbner basis engine: term orders, reduced bases over Q and F_p, and the ideal operations.
//
// Conventions. Variables are global ids (variables.ts); a TermOrder lists the ring's variables,
// first = largest, and every polynomial handed to a function must use only those. Results are
// `Polynomial | Scalar` (a constant is a Scalar): a reduced basis is monic and sorted by
// ascending leading term, [1] for the unit ideal and [] for the zero ideal. Over F_p
// (opts.prime, a prime below 2^31) coefficients are integers in 0..p-1, and the ring operations of
// polynomial.ts do not reduce them modulo p. Over Q every result is exact and proven
// (rationalBasis.ts explains the proof). Every computation honours opts.maxDegree,
// opts.maxBasisSize and opts.shouldStop (bounds.ts) and fails with an EvalError naming the bound.
// HUNCH_GB_TRACE=1 prints one line per matrix of the modular engine to stderr.
export { termOrder, matrixOrder, TermOrder, type OrderSpec } from './termOrder.js';
export type { GroebnerOptions } from './bounds.js';
export {
  groebnerBasis,
  leadingTerm,
  normalForm,
  isGroebnerBasis,
  inIdeal,
  idealEquals,
  eliminate,
  eliminationOrder,
  intersect,
  quotient,
  saturation,
  inRadical,
  variablesOf,
  type IdealOptions,
  type NormalFormOptions,
} from './ideals.js';
export { lastF4Stats, type F4Stats } from './f4.js';
