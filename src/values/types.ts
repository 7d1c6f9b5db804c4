// Type names used by signatures, load-time type checks and run-time type errors.

import { Rat } from '../numbers/rational.js';
import { isStructured } from './structured.js';
import type { Value } from './value.js';

import type { TypeName } from '../protocol/type-names.js';

/**
 * 'integer' | 'rational' | 'boolean' | 'string' | 'list' and the kind of any Structured value
 * ('permutation', 'polynomial', 'matching', ...). Signatures may also use:
 *   'number'   an integer or a rational
 *   'scalarOrPolynomial' a number or a polynomial (constants are numbers, never polynomials)
 *   'any'      anything
 * The closed list is src/protocol/type-names.ts.
 */
export type { TypeName };
export { isTypeName, type ObjectKind } from '../protocol/type-names.js';

/** The run-time type of a value. A rational is 'rational' only when it is not an integer. */
export function typeOf(v: Value): TypeName {
  switch (typeof v) {
    case 'number':
    case 'bigint':
      return 'integer';
    case 'boolean':
      return 'boolean';
    case 'string':
      return 'string';
  }
  if (Array.isArray(v)) return 'list';
  if (v instanceof Rat) return 'rational';
  if (isStructured(v)) return v.kind;
  return 'unknown';
}

/** Whether a value of type `actual` may be passed where `expected` is declared. */
export function typeAccepts(expected: TypeName, actual: TypeName): boolean {
  if (expected === 'any' || actual === 'any' || expected === actual) return true;
  if (expected === 'number') return actual === 'integer' || actual === 'rational' || actual === 'number';
  if (expected === 'rational') return actual === 'integer' || actual === 'number';
  if (expected === 'scalarOrPolynomial')
    return actual === 'integer' || actual === 'rational' || actual === 'number' || actual === 'polynomial';
  if (expected === 'polynomial') return actual === 'integer' || actual === 'rational' || actual === 'number';
  // A number or polynomial is a symmetric function of degree 0 (constants are never kept as one).
  if (expected === 'symmetric')
    return (
      actual === 'integer' || actual === 'rational' || actual === 'number' || actual === 'polynomial' || actual === 'scalarOrPolynomial'
    );
  // A statically inferred 'number' may turn out to be an integer at run time.
  if (expected === 'integer') return actual === 'number';
  return false;
}

/** "a permutation", "an integer": for messages. */
export function article(t: TypeName): string {
  if (t === 'symmetric') return 'a symmetric function';
  return /^[aeiou]/.test(t) ? `an ${t}` : `a ${t}`;
}
