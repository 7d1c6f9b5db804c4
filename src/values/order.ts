// A total order on the values of the language, used by sort, set, min and max (and to print the
// entries of a distribution in a stable order). It extends the numeric order: integers and
// rationals compare by value. Across kinds the order is by a fixed rank
// (booleans < numbers < strings < lists < objects, objects grouped by kind name); it only has to be
// total and deterministic there, not meaningful.
//
// Objects of one kind compare by their record encoding (Structured.encode), read as nested lists of
// numbers and strings: permutations, partitions, words, ... thus compare lexicographically, which is
// what a reader expects of a sorted list. Ties of the encoding fall back to key(), so the order is
// total on every kind whose key() is canonical.

import { Rat, isScalar } from '../numbers/rational.js';
import { scmp } from '../numbers/scalar.js';
import { isStructured } from './structured.js';
import type { Value } from './value.js';

function rank(v: Value): number {
  switch (typeof v) {
    case 'boolean':
      return 0;
    case 'number':
    case 'bigint':
      return 1;
    case 'string':
      return 2;
  }
  if (v instanceof Rat) return 1;
  if (Array.isArray(v)) return 3;
  return 4;
}

function cmpStrings(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

const INTEGER_TEXT = /^-?\d+$/;

/** Order of decoded JSON payloads: numbers < strings < arrays < objects; numeric strings numerically. */
function compareEncoded(a: unknown, b: unknown): number {
  const ra = encodedRank(a),
    rb = encodedRank(b);
  if (ra !== rb) return ra - rb;
  switch (ra) {
    case 0: {
      const x = BigInt(a as number | string),
        y = BigInt(b as number | string);
      return x < y ? -1 : x > y ? 1 : 0;
    }
    case 1:
      return cmpStrings(a as string, b as string);
    case 2: {
      const x = a as unknown[],
        y = b as unknown[];
      const n = Math.min(x.length, y.length);
      for (let i = 0; i < n; i++) {
        const c = compareEncoded(x[i], y[i]);
        if (c !== 0) return c;
      }
      return x.length - y.length;
    }
    case 3: {
      const x = a as Record<string, unknown>,
        y = b as Record<string, unknown>;
      const kx = Object.keys(x).sort(),
        ky = Object.keys(y).sort();
      const c = compareEncoded(kx, ky);
      if (c !== 0) return c;
      for (const k of kx) {
        const d = compareEncoded(x[k], y[k]);
        if (d !== 0) return d;
      }
      return 0;
    }
  }
  return 0;
}

function encodedRank(x: unknown): number {
  if (typeof x === 'number' && Number.isInteger(x)) return 0;
  if (typeof x === 'string') return INTEGER_TEXT.test(x) ? 0 : 1;
  if (Array.isArray(x)) return 2;
  if (x && typeof x === 'object') return 3;
  return 1; // booleans, non-integral numbers: compared as their text
}

/** Negative when a comes first, 0 only for equal values, positive otherwise. */
export function compareValues(a: Value, b: Value): number {
  if (a === b) return 0;
  if (typeof a === 'number' && typeof b === 'number') return a < b ? -1 : a > b ? 1 : 0;
  const ra = rank(a),
    rb = rank(b);
  if (ra !== rb) return ra - rb;
  switch (ra) {
    case 0:
      return (a ? 1 : 0) - (b ? 1 : 0);
    case 1:
      return scmp(a as never, b as never);
    case 2:
      return cmpStrings(a as string, b as string);
    case 3: {
      const x = a as readonly Value[],
        y = b as readonly Value[];
      const n = Math.min(x.length, y.length);
      for (let i = 0; i < n; i++) {
        const c = compareValues(x[i], y[i]);
        if (c !== 0) return c;
      }
      return x.length - y.length;
    }
  }
  if (isStructured(a) && isStructured(b)) {
    if (a.kind !== b.kind) return cmpStrings(a.kind, b.kind);
    const c = compareEncoded(normaliseForOrder(a.encode()), normaliseForOrder(b.encode()));
    if (c !== 0) return c;
    return cmpStrings(a.key(), b.key());
  }
  return 0;
}

/** Booleans inside encodings become 0/1 so that compareEncoded sees only numbers, strings, arrays, maps. */
function normaliseForOrder(x: unknown): unknown {
  if (typeof x === 'boolean') return x ? 1 : 0;
  if (Array.isArray(x)) return x.map(normaliseForOrder);
  if (x && typeof x === 'object') {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(x)) out[k] = normaliseForOrder(v);
    return out;
  }
  return x;
}

/** Sorts a copy of the list by compareValues. */
export function sortValues(list: readonly Value[]): Value[] {
  return list.slice().sort(compareValues);
}

export { isScalar };
