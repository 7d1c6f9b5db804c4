// Reduced words of permutations. Composition as in FORMAT.md, (u*v)[i] = u[v[i]]: w = s_{a_1} * ...
// * s_{a_l}, so a_1 is a left descent of w (the value a_1 + 1 stands before a_1 in one-line
// notation) and a_2 ... a_l is a reduced word of s_{a_1} * w (w with the values a_1, a_1 + 1
// exchanged). Counted by R(w) = sum over left descents i of R(s_i w), R(id) = 1 (memoised).

import { fail } from '../../base/errors.js';
import { valueToText } from '../../values/operations.js';
import { Permutation, inversions } from '../permutations/permutation.js';
import type { Value } from '../../values/value.js';

const memo = new Map<string, bigint>();
/** Bounds the memory of the memo (about 100 bytes an entry); S_9 fits entirely. */
const MEMO_LIMIT = 1_000_000;

/** Left descents of w, increasing: i with w^{-1}(i+1) < w^{-1}(i). */
export function leftDescents(w: readonly number[]): number[] {
  const pos = new Array<number>(w.length + 1);
  w.forEach((v, j) => (pos[v] = j));
  const out: number[] = [];
  for (let i = 1; i < w.length; i++) if (pos[i + 1] < pos[i]) out.push(i);
  return out;
}

/** s_i * w: exchange the values i and i+1. */
export function leftMultiply(w: readonly number[], i: number): number[] {
  return w.map((v) => (v === i ? i + 1 : v === i + 1 ? i : v));
}

/** The number of reduced words of w. */
export function reducedWordCount(w: readonly number[]): bigint {
  // Trailing fixed points do not matter: S_n inside S_{n+1}.
  let n = w.length;
  while (n > 0 && w[n - 1] === n) n--;
  if (n === 0) return 1n;
  const key = w.slice(0, n).join(',');
  const hit = memo.get(key);
  if (hit !== undefined) return hit;
  if (memo.size >= MEMO_LIMIT) {
    fail(`counting reduced words needs every permutation below w in weak order; w = [${w.join(', ')}] has too many (over ${MEMO_LIMIT})`);
  }
  let s = 0n;
  for (const i of leftDescents(w.slice(0, n))) s += reducedWordCount(leftMultiply(w.slice(0, n), i));
  memo.set(key, s);
  return s;
}

/** Whether the letters form a reduced word of w (each step s_a raises the length by one). */
export function isReducedWordOf(letters: readonly number[], w: readonly number[]): boolean {
  const n = w.length;
  if (letters.length !== inversions(w)) return false;
  const a = Array.from({ length: n }, (_, i) => i + 1);
  // w = s_{a_1} ... s_{a_l}: build from the right, u -> u * s_a exchanges positions a, a+1.
  for (const x of letters) {
    if (!(Number.isInteger(x) && x >= 1 && x < n)) return false;
    if (a[x - 1] > a[x]) return false;
    const t = a[x - 1];
    a[x - 1] = a[x];
    a[x] = t;
  }
  for (let i = 0; i < n; i++) if (a[i] !== w[i]) return false;
  return true;
}

/** A permutation argument: a permutation or a list in one-line notation. */
export function permutationArg(v: Value, what = 'w'): number[] {
  if (v instanceof Permutation) return v.a;
  if (Array.isArray(v)) return Permutation.from(v as number[]).a;
  fail(`${what} must be a permutation, got ${valueToText(v)}`);
}
