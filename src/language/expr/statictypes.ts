// Static types of the checker: the TypeNames of values/types.ts, where 'number' means integer or
// rational, 'scalarOrPolynomial' a number or a polynomial, and 'any' unknown until run time. A
// load-time type error is raised only when a combination is impossible for every run-time type
// the static types allow; otherwise the closures check at run time.

import type { TypeName } from '../../values/types.js';
import { typeAccepts } from '../../values/types.js';

/** The run-time types a static type allows; null for any. */
export function expand(t: TypeName): TypeName[] | null {
  switch (t) {
    case 'any':
      return null;
    case 'number':
      return ['integer', 'rational'];
    case 'scalarOrPolynomial':
      return ['integer', 'rational', 'polynomial'];
    default:
      return [t];
  }
}

const NUMERIC_OR_POLY = new Set(['integer', 'rational', 'polynomial']);

export function isNumericish(t: TypeName): boolean {
  const e = expand(t);
  return e !== null && e.every((x) => NUMERIC_OR_POLY.has(x));
}

export function isNumber(t: TypeName): boolean {
  const e = expand(t);
  return e !== null && e.every((x) => x === 'integer' || x === 'rational');
}

/** Some value of static type `actual` may be passed where `expected` (one or several) is declared. */
export function mayAccept(expected: TypeName | TypeName[], actual: TypeName): boolean {
  const exps = Array.isArray(expected) ? expected : [expected];
  const acts = expand(actual);
  if (acts === null) return true;
  return exps.some((x) => acts.some((a) => typeAccepts(x, a)));
}

/** Every value of static type `actual` is accepted: no run-time guard needed. */
export function surelyAccepts(expected: TypeName | TypeName[], actual: TypeName): boolean {
  const exps = Array.isArray(expected) ? expected : [expected];
  if (exps.includes('any')) return true;
  const acts = expand(actual);
  if (acts === null) return false;
  return acts.every((a) => exps.some((x) => typeAccepts(x, a)));
}

/** Whether == between these static types can be meaningful (else it is a load-time type error). */
export function equalityPossible(a: TypeName, b: TypeName): boolean {
  if (a === 'any' || b === 'any') return true;
  if (isNumericish(a) && isNumericish(b)) return true;
  return mayAccept(a, b) || mayAccept(b, a);
}

/** The static type that covers both (for if/then/else). */
export function join(a: TypeName, b: TypeName): TypeName {
  if (a === b) return a;
  if (isNumber(a) && isNumber(b)) return 'number';
  if (isNumericish(a) && isNumericish(b)) return 'scalarOrPolynomial';
  return 'any';
}

export function describeType(t: TypeName): string {
  switch (t) {
    case 'number':
      return 'a number';
    case 'scalarOrPolynomial':
      return 'a number or polynomial';
    case 'any':
      return 'a value';
    case 'symmetric':
      return 'a symmetric function';
    default:
      return /^[aeiou]/.test(t) ? `an ${t}` : `a ${t}`;
  }
}
