// An integer partition: weakly decreasing positive parts, lambda = (lambda_1 >= lambda_2 >= ... > 0).
// In the language lambda[i] is the i-th part, 0 past the length (LIBRARY.md §2).

import { fail } from '../../base/errors.js';
import { registerDecoder } from '../../values/decode.js';
import { IntegerSequence } from '../common/integer-sequence.js';

export class Partition extends IntegerSequence {
  readonly kind = 'partition';

  /** Trusts that `parts` is weakly decreasing and positive; use Partition.from for user data. */
  constructor(readonly parts: number[]) {
    super();
  }

  protected sequence(): readonly number[] {
    return this.parts;
  }

  protected rebuild(values: number[]): Partition {
    return new Partition(values);
  }

  /** The number of parts. */
  get length(): number {
    return this.parts.length;
  }

  /** |lambda|, the sum of the parts. */
  get size(): number {
    let s = 0;
    for (const p of this.parts) s += p;
    return s;
  }

  /** lambda_i for i >= 1; 0 past the length. */
  at(i: number): number {
    return i >= 1 && i <= this.parts.length ? this.parts[i - 1] : 0;
  }

  static from(parts: readonly unknown[]): Partition {
    for (let i = 0; i < parts.length; i++) {
      const v = parts[i];
      if (typeof v !== 'number' || !Number.isSafeInteger(v) || v < 1) {
        fail(`[${parts.join(', ')}] is not a partition: its parts must be positive integers`);
      }
      if (i > 0 && v > (parts[i - 1] as number)) {
        fail(`[${parts.join(', ')}] is not a partition: its parts must be weakly decreasing`);
      }
    }
    return new Partition(parts.slice() as number[]);
  }
}

registerDecoder('partition', (x) => {
  if (!Array.isArray(x)) fail('a partition is a list of positive integers');
  return Partition.from(x);
});

/** The conjugate (transpose) partition: lambda'_j = #{i : lambda_i >= j}. */
export function conjugateParts(parts: readonly number[]): number[] {
  const out: number[] = [];
  const m = parts.length ? parts[0] : 0;
  for (let j = 1; j <= m; j++) {
    let c = 0;
    while (c < parts.length && parts[c] >= j) c++;
    out.push(c);
  }
  return out;
}

/** Whether a list is a partition (weakly decreasing positive safe integers). */
export function isPartitionList(parts: readonly unknown[]): parts is number[] {
  for (let i = 0; i < parts.length; i++) {
    const v = parts[i];
    if (typeof v !== 'number' || !Number.isSafeInteger(v) || v < 1) return false;
    if (i > 0 && v > (parts[i - 1] as number)) return false;
  }
  return true;
}
