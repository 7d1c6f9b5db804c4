// Evaluating one expression over a range of one variable, as `hunch table` and `hunch guess` do.

import { EvalError, InputError } from '../base/errors.js';
import { evaluate } from '../language/expr/index.js';
import { isScalar, type Scalar } from '../numbers/rational.js';
import { valueToText } from '../values/operations.js';
import type { Value } from '../values/value.js';

export function tabulate(
  expr: string,
  name: string,
  lo: number,
  hi: number,
  lets: Array<[string, string]> = [],
  indeterminates: string[] = [],
): Array<[number, Value]> {
  const rows: Array<[number, Value]> = [];
  for (let v = lo; v <= hi; v++) {
    try {
      rows.push([v, evaluate(expr, [[name, String(v)], ...lets], indeterminates)]);
    } catch (e) {
      // Say at which value of the variable it failed; a mistake in the text itself is reported as it is.
      if (e instanceof EvalError) throw new EvalError(`${e.message} (at ${name} = ${v})`, e.pos);
      throw e;
    }
  }
  return rows;
}

/** The values as exact numbers, or an InputError naming the first value that is not one. */
export function scalarColumn(rows: Array<[number, Value]>, name: string, what: string): Scalar[] {
  return rows.map(([v, x]) => {
    if (!isScalar(x)) throw new InputError(`guessing needs numbers, but ${what} at ${name} = ${v} is ${valueToText(x)}`);
    return x;
  });
}
