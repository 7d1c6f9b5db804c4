// Classical permutation patterns: reading a pattern argument (a list, a permutation or a digit
// string such as "1342") and testing containment by backtracking over increasing positions with
// the relative order checked as each position is chosen.

import { fail } from '../../base/errors.js';
import { isStructured } from '../../values/structured.js';
import { valueToText } from '../../values/operations.js';
import type { Value } from '../../values/value.js';
import { Permutation } from './permutation.js';

/** A pattern as its one-line notation, 1..k. */
export function patternArg(v: Value): number[] {
  let a: number[];
  if (typeof v === 'string') {
    if (!/^[1-9]+$/.test(v)) fail(`the pattern "${v}" must be a string of digits 1-9 such as "1342", or a list`);
    a = [...v].map(Number);
  } else if (Array.isArray(v)) {
    if (!v.every((x) => typeof x === 'number' && Number.isInteger(x))) fail(`the pattern ${valueToText(v)} must be a list of integers`);
    a = (v as number[]).slice();
  } else if (isStructured(v) && v instanceof Permutation) {
    a = v.a.slice();
  } else {
    fail(`a pattern must be a list, a permutation or a digit string, got ${valueToText(v)}`);
  }
  const k = a.length;
  const seen = new Uint8Array(k + 1);
  for (const x of a) {
    if (x < 1 || x > k || seen[x]) fail(`the pattern ${valueToText(v)} is not a permutation of 1..${k}`);
    seen[x] = 1;
  }
  if (k === 0) fail('the empty pattern is contained in every permutation; give a pattern of length at least 1');
  return a;
}

/**
 * Whether a[0..len) contains pattern `pat`. When `forced` >= 0, only occurrences in which the
 * position `forced` plays the role of the pattern's largest entry count (used when the largest
 * value was just inserted at that position: every new occurrence uses it that way).
 */
export function containsPattern(a: ArrayLike<number>, len: number, pat: readonly number[], forced = -1): boolean {
  const k = pat.length;
  if (k > len) return false;
  const pos = new Int32Array(k);
  const top = forced >= 0 ? pat.indexOf(k) : -1;
  // Choose positions for pattern entries t = 0..k-1, increasing.
  const go = (t: number, from: number): boolean => {
    if (t === k) return true;
    // leave room for the remaining k - t - 1 entries after this one
    let lo = from,
      hi = len - (k - t);
    if (top >= 0) {
      if (t === top) {
        if (forced < lo || forced > hi) return false;
        lo = hi = forced;
      } else if (t < top) {
        hi = Math.min(hi, forced - (top - t));
      } else {
        lo = Math.max(lo, forced + 1);
      }
    }
    for (let i = lo; i <= hi; i++) {
      const x = a[i];
      let ok = true;
      for (let s = 0; s < t; s++) {
        if (a[pos[s]] < x !== pat[s] < pat[t]) {
          ok = false;
          break;
        }
      }
      if (!ok) continue;
      pos[t] = i;
      if (go(t + 1, i + 1)) return true;
    }
    return false;
  };
  return go(0, 0);
}

/** Whether a avoids every pattern. */
export function avoidsAll(a: ArrayLike<number>, len: number, pats: readonly (readonly number[])[]): boolean {
  for (const p of pats) if (containsPattern(a, len, p)) return false;
  return true;
}
