// A finite set of positive integers, kept as its elements in increasing order. The ground set
// {1..n} is not part of the value: `subset([1, 3])` is the same value whether it is read as a
// subset of 1..3 or of 1..10 (the family subsets(n) decides membership), so toText and encode
// show the elements only, as CLI.md's {"subset": [...]}.

import { fail } from '../../base/errors.js';
import { registerDecoder } from '../../values/decode.js';
import type { Structured } from '../../values/structured.js';

export class Subset implements Structured {
  readonly kind = 'subset';
  transient = false;

  /** Trusts that `elems` is strictly increasing positive integers; use Subset.from for user data. */
  constructor(readonly elems: number[]) {}

  /** The i-th smallest element (1-based), S[i]. */
  at(i: number): number | undefined {
    return this.elems[i - 1];
  }

  /** The number of elements. */
  get size(): number {
    return this.elems.length;
  }

  /** The largest element, 0 for the empty set. */
  get max(): number {
    return this.elems.length ? this.elems[this.elems.length - 1] : 0;
  }

  has(x: number): boolean {
    const e = this.elems;
    let lo = 0,
      hi = e.length - 1;
    while (lo <= hi) {
      const mid = (lo + hi) >> 1;
      if (e[mid] === x) return true;
      if (e[mid] < x) lo = mid + 1;
      else hi = mid - 1;
    }
    return false;
  }

  /** Accepts the elements in any order; a repeated element is an error (a set has it once). */
  static from(elems: readonly number[]): Subset {
    for (const x of elems) {
      if (!Number.isSafeInteger(x) || x < 1) fail(`[${elems.join(', ')}] is not a set of positive integers: ${x}`);
    }
    const s = elems.slice().sort((a, b) => a - b);
    for (let i = 1; i < s.length; i++)
      if (s[i] === s[i - 1]) fail(`[${elems.join(', ')}] lists ${s[i]} twice; a subset holds each element once`);
    return new Subset(s);
  }

  /** The elements in increasing order: a subset is a source after `in` (sum(S), all(i > 0 for i in S)). */
  elements(): readonly number[] {
    return this.elems;
  }

  equals(other: Structured): boolean {
    const b = (other as Subset).elems,
      a = this.elems;
    if (a.length !== b.length) return false;
    for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
    return true;
  }

  key(): string {
    return this.elems.join(',');
  }

  toText(): string {
    return `subset([${this.elems.join(', ')}])`;
  }

  encode(): unknown {
    return { subset: this.elems.slice() };
  }

  copy(): Subset {
    return new Subset(this.elems.slice());
  }
}

registerDecoder('subset', (x) => {
  if (!Array.isArray(x) || !x.every((v) => typeof v === 'number')) fail('a subset is a list of positive integers');
  return Subset.from(x as number[]);
});
