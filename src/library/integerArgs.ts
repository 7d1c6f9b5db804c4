// Reading integer arguments of library functions. The compiler has already checked that the value
// is an integer; what remains is the range, and whether it is small enough to be a JS number
// (sizes, indices and counts are). Messages name the function and the offending value.

import { fail } from '../base/errors.js';
import type { Int } from '../numbers/integer.js';
import type { Value } from '../values/value.js';

/**
 * An integer argument that must lie in [min, max] and be a JS number.
 * `call` is how the message shows the call, e.g. "factorial(n)".
 */
export function smallIntArg(call: string, what: string, v: Value, min: number, max: number): number {
  const x = v as Int;
  if (typeof x === 'bigint' || x < min || x > max) {
    if (x < min) fail(`${call} needs ${what} >= ${min}, got ${what} = ${x}`);
    fail(`${call} is limited to ${what} <= ${max}, got ${what} = ${x}`);
  }
  return x;
}
