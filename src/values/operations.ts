// Kind-independent operations on values: equality, canonical keys, printing, JSON encoding and
// taking ownership of transient objects.

import { EvalError } from '../base/errors.js';
import { Rat, isScalar } from '../numbers/rational.js';
import { seq } from '../numbers/scalar.js';
import { isStructured, Structured } from './structured.js';
import { article, typeOf } from './types.js';
import type { Value } from './value.js';

/** Kinds that compare with each other by `==` even though their types differ. */
function comparableKinds(a: string, b: string): boolean {
  const numeric = (t: string) => t === 'integer' || t === 'rational' || t === 'polynomial' || t === 'symmetric' || t === 'rationalFunction';
  return a === b || (numeric(a) && numeric(b));
}

/**
 * Structural, exact equality (FORMAT.md §3). Comparing unrelated kinds is a type error, not false.
 */
export function valueEquals(a: Value, b: Value): boolean {
  if (a === b) return true;
  const ta = typeof a,
    tb = typeof b;
  if ((ta === 'number' || ta === 'bigint') && (tb === 'number' || tb === 'bigint')) return false; // normalised ints
  if (isScalar(a) && isScalar(b)) return seq(a, b);
  if (Array.isArray(a) && Array.isArray(b)) {
    if (a.length !== b.length) return false;
    for (let i = 0; i < a.length; i++) if (!valueEquals(a[i], b[i])) return false;
    return true;
  }
  if (isStructured(a) && isStructured(b) && a.kind === b.kind) return a.equals(b);
  const ka = typeOf(a),
    kb = typeOf(b);
  if (comparableKinds(ka, kb)) return false;
  // Two lists of different element kinds are unequal; anything else unrelated is a mistake.
  throw new EvalError(`cannot compare ${article(ka)} with ${article(kb)}`);
}

/** A canonical string: equal values have equal keys (used for sets and distributions). */
export function valueKey(v: Value): string {
  switch (typeof v) {
    case 'number':
    case 'bigint':
      return v.toString();
    case 'boolean':
      return v ? 'true' : 'false';
    case 'string':
      return JSON.stringify(v);
  }
  if (Array.isArray(v)) return '[' + v.map(valueKey).join(',') + ']';
  if (v instanceof Rat) return v.toString();
  if (isStructured(v)) return v.kind + ':' + v.key();
  return String(v);
}

/** The value in the language's syntax. */
export function valueToText(v: Value): string {
  switch (typeof v) {
    case 'number':
    case 'bigint':
      return v.toString();
    case 'boolean':
      return v ? 'true' : 'false';
    case 'string':
      return JSON.stringify(v);
  }
  if (Array.isArray(v)) return '[' + v.map(valueToText).join(', ') + ']';
  if (v instanceof Rat) return v.toString();
  if (isStructured(v)) return v.toText();
  return String(v);
}

/** CLI.md's record encoding: small integers as numbers, large ones and rationals as strings. */
export function encodeValue(v: Value): unknown {
  switch (typeof v) {
    case 'number':
      return v;
    case 'bigint':
      return v.toString();
    case 'boolean':
    case 'string':
      return v;
  }
  if (Array.isArray(v)) return v.map(encodeValue);
  if (v instanceof Rat) return v.toString();
  if (isStructured(v)) return v.encode();
  return String(v);
}

/** A value safe to keep beyond the current case: transient objects are copied, lists deeply. */
export function own(v: Value): Value {
  if (typeof v !== 'object' || v instanceof Rat) return v;
  if (Array.isArray(v)) {
    let changed = false;
    const out = v.map((x) => {
      const y = own(x);
      if (y !== x) changed = true;
      return y;
    });
    return changed ? out : v;
  }
  const s = v as Structured;
  return s.transient && s.copy ? s.copy() : s;
}
