// Helpers the compiled closures call at run time: attaching positions to errors, the boolean and
// type guards, indexing. Kept out of the closures themselves so those stay small.

import { EvalError, InputError, StopSignal, type SourcePos } from '../../base/errors.js';
import { Matrix } from '../../algebra/matrix.js';
import { indexedVariable, Polynomial } from '../../algebra/polynomial.js';
import { isBareVar, varName } from '../../algebra/variables.js';
import { INDEX_UNITS, lengthOf } from '../../library/lists.js';
import { valueToText } from '../../values/operations.js';
import { isStructured, type Structured } from '../../values/structured.js';
import { article, typeOf } from '../../values/types.js';
import type { Value } from '../../values/value.js';

/**
 * The error to rethrow from a sub-expression at `pos`: an EvalError keeps the innermost position
 * it already has; a stack overflow becomes an EvalError; a JS error from a bug in library code
 * becomes an EvalError that says so (never a stack trace for the user).
 */
export function located(e: unknown, pos: SourcePos | undefined): unknown {
  if (e instanceof EvalError) {
    if (!e.pos) e.pos = pos;
    return e;
  }
  if (e instanceof InputError || e instanceof StopSignal) return e;
  if (e instanceof RangeError && /call stack/i.test(e.message)) {
    return new EvalError('the computation nested too deeply (a recursion without end?)', pos);
  }
  if (e instanceof RangeError && /BigInt|Invalid array length|Array buffer allocation/i.test(e.message)) {
    return new EvalError('a number or list here is too large to compute exactly (it would not fit in memory)', pos);
  }
  if (e instanceof Error) return new EvalError(`internal error: ${e.message}`, pos);
  return e;
}

export function at1(f: (a: Value) => Value, a: Value, pos: SourcePos | undefined): Value {
  try {
    return f(a);
  } catch (e) {
    throw located(e, pos);
  }
}

export function at2(f: (a: Value, b: Value) => Value, a: Value, b: Value, pos: SourcePos | undefined): Value {
  try {
    return f(a, b);
  } catch (e) {
    throw located(e, pos);
  }
}

export function notBoolean(v: Value, what: string, pos: SourcePos | undefined): never {
  throw new EvalError(`${what} must be true or false, got ${article(typeOf(v))} (${short(v)})`, pos);
}

/** The value's text, cut short for messages. */
export function short(v: Value): string {
  const t = valueToText(v);
  return t.length > 80 ? t.slice(0, 77) + '...' : t;
}

/** Structured values that can be indexed expose a 1-based `at(i)`; see index.ts. */
interface Indexable extends Structured {
  at(i: number): Value | undefined;
}

function outOfRange(i: number, size: number, what: string, pos: SourcePos | undefined): never {
  throw new EvalError(
    size === 0 ? `index ${i} is out of range: ${what} is empty` : `index ${i} is out of range: ${what} has indices 1..${size}`,
    pos,
  );
}

/** t[i], 1-based, with a clear error out of range. */
export function indexValue(t: Value, i: Value, pos: SourcePos | undefined): Value {
  if (typeof i !== 'number') {
    if (typeof i === 'bigint') throw new EvalError(`the index ${i} is out of range`, pos);
    throw new EvalError(`an index must be an integer, got ${article(typeOf(i))} (${short(i)})`, pos);
  }
  if (Array.isArray(t)) {
    if (i < 1 || i > t.length) outOfRange(i, t.length, 'the list', pos);
    return t[i - 1];
  }
  if (typeof t === 'string') {
    if (i < 1 || i > t.length) outOfRange(i, t.length, `the string ${JSON.stringify(t)}`, pos);
    return t[i - 1];
  }
  if (t instanceof Matrix) {
    if (i < 1 || i > t.rows) outOfRange(i, t.rows, `the ${t.rows}×${t.cols} matrix (rows)`, pos);
    return t.rowList()[i - 1];
  }
  if (isStructured(t) && typeof (t as Indexable).at === 'function') {
    if (i < 1) throw new EvalError(`index ${i} is out of range: indices start at 1`, pos);
    let v: Value | undefined;
    try {
      v = (t as Indexable).at(i);
    } catch (e) {
      throw located(e, pos);
    }
    if (v === undefined) {
      let count: number | null = null;
      try {
        count = lengthOf(t);
      } catch {
        /* a kind without a length */
      }
      if (count !== null) {
        const units = INDEX_UNITS[(t as Structured).kind] ?? 'entries';
        const unit =
          count !== 1 ? units : (({ entries: 'entry', crosses: 'cross' } as Record<string, string>)[units] ?? units.replace(/s$/, ''));
        throw new EvalError(`index ${i} is out of range: ${short(t)} has ${count} ${unit}${count ? `: indices 1..${count}` : ''}`, pos);
      }
      throw new EvalError(`index ${i} is out of range for ${short(t)}`, pos);
    }
    return v;
  }
  if (t instanceof Polynomial) {
    // An indeterminate passed as an argument (a define's parameter y given x) indexes like x itself.
    const base = bareIndeterminate(t);
    if (base !== null) return indexedVariable(base, i);
    throw new EvalError(
      `a polynomial cannot be indexed (${short(t)}); only an indeterminate such as x can: x[i] is its i-th variable`,
      pos,
    );
  }
  throw new EvalError(`${article(typeOf(t))} cannot be indexed (${short(t)})`, pos);
}

/** The name of a polynomial that is one bare indeterminate (x, not x[2] or 2*x), else null. */
export function bareIndeterminate(p: Polynomial): string | null {
  if (p.length !== 1 || p.nv !== 1 || p.exps[0] !== 1 || p.coefs[0] !== 1 || !isBareVar(p.vars[0])) return null;
  return varName(p.vars[0]);
}
