// A permutation of 1..n in one-line notation: a[i-1] = w(i). Positions and values are 1-based in
// the language; the array is 0-based.

import { fail } from '../../base/errors.js';
import { valueToText } from '../../values/operations.js';
import { registerDecoder } from '../../values/decode.js';
import type { Structured } from '../../values/structured.js';
import type { Value } from '../../values/value.js';

export class Permutation implements Structured {
  readonly kind = 'permutation';
  transient = false;

  /** Trusts that `a` is a bijection of 1..n; use Permutation.from for user data. */
  constructor(readonly a: number[]) {}

  get n(): number {
    return this.a.length;
  }

  /** w(i) for 1 <= i <= n. */
  at(i: number): number {
    return this.a[i - 1];
  }

  static from(values: readonly number[]): Permutation {
    const n = values.length;
    const seen = new Uint8Array(n + 1);
    for (const v of values) {
      if (!Number.isInteger(v) || v < 1 || v > n || seen[v]) {
        fail(`${valueToText(values as Value)} is not a permutation of 1..${n}`);
      }
      seen[v] = 1;
    }
    return new Permutation(values.slice());
  }

  static identity(n: number): Permutation {
    return new Permutation(Array.from({ length: n }, (_, i) => i + 1));
  }

  equals(other: Structured): boolean {
    const b = (other as Permutation).a,
      a = this.a;
    if (a.length !== b.length) return false;
    for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
    return true;
  }

  key(): string {
    return this.a.join(',');
  }

  toText(): string {
    return `perm([${this.a.join(', ')}])`;
  }

  encode(): unknown {
    return { permutation: this.a.slice() };
  }

  copy(): Permutation {
    return new Permutation(this.a.slice());
  }
}

registerDecoder('permutation', (x) => {
  if (!Array.isArray(x) || !x.every((v) => typeof v === 'number')) fail('a permutation is a list of integers');
  return Permutation.from(x as number[]);
});

/** Number of inversions; O(n^2) but allocation-free, which wins for the n <= 30 of most checks. */
export function inversions(a: readonly number[]): number {
  let c = 0;
  const n = a.length;
  for (let i = 0; i < n; i++) {
    const ai = a[i];
    for (let j = i + 1; j < n; j++) if (ai > a[j]) c++;
  }
  return c;
}

/** Lexicographic comparison of equal-length arrays. */
export function lexCompare(a: readonly number[], b: readonly number[]): number {
  const n = Math.min(a.length, b.length);
  for (let i = 0; i < n; i++) if (a[i] !== b[i]) return a[i] - b[i];
  return a.length - b.length;
}

/** Rearrange a to the next permutation in lexicographic order; false after the last. */
export function nextPermutation(a: number[]): boolean {
  let i = a.length - 2;
  while (i >= 0 && a[i] >= a[i + 1]) i--;
  if (i < 0) return false;
  let j = a.length - 1;
  while (a[j] <= a[i]) j--;
  let t = a[i];
  a[i] = a[j];
  a[j] = t;
  for (let l = i + 1, r = a.length - 1; l < r; l++, r--) {
    t = a[l];
    a[l] = a[r];
    a[r] = t;
  }
  return true;
}
