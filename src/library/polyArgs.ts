// Reading polynomial arguments of library functions. The compiler has checked the declared types;
// what remains is the shape: an argument that names an indeterminate must be exactly one variable.
//
// Convention for indexed indeterminates: when a conjecture declares `indeterminates: [x]` and
// writes the bare name `x` as an argument (schubert(w, x), subs(p, x, [1, 1])), the function
// receives the polynomial variable('x') and reads it as "the family x[1], x[2], ...".

import { fail } from '../base/errors.js';
import { isPolynomial, polyText, type PolyLike } from '../algebra/polynomial.js';
import { asVariable } from '../algebra/polynomialOps.js';
import { isBareVar, varBase, varName } from '../algebra/variables.js';
import type { Value } from '../values/value.js';
import { valueToText } from '../values/operations.js';

/** The variable id of an argument that must be a single indeterminate. */
export function variableArg(call: string, what: string, v: Value): number {
  const id = asVariable(v as PolyLike);
  if (id === undefined) {
    const shown = isPolynomial(v) ? polyText(v) : valueToText(v);
    fail(`${call} needs ${what} to be a single indeterminate such as q or x, got ${shown}`);
  }
  return id;
}

/** The base name of an indexed family argument: `x` (bare) gives 'x'; x[3] is refused. */
export function indexedBaseArg(call: string, what: string, v: Value): string {
  const id = variableArg(call, what, v);
  if (!isBareVar(id)) fail(`${call} needs ${what} to be the bare name of indexed indeterminates (x, not ${varName(id)})`);
  return varBase(id);
}
