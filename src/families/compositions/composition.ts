// A composition: a finite sequence of positive integers (its parts), in order.

import { fail } from '../../base/errors.js';
import { registerDecoder } from '../../values/decode.js';
import { IntegerSequence } from '../common/integer-sequence.js';

export class Composition extends IntegerSequence {
  readonly kind = 'composition';

  /** Trusts that every part is a positive integer; use Composition.from for user data. */
  constructor(readonly parts: number[]) {
    super();
  }

  /** The i-th part (1-based), c[i]. */
  at(i: number): number | undefined {
    return this.parts[i - 1];
  }

  protected sequence(): readonly number[] {
    return this.parts;
  }

  protected rebuild(values: number[]): Composition {
    return new Composition(values);
  }

  /** The sum of the parts. */
  get size(): number {
    let s = 0;
    for (const x of this.parts) s += x;
    return s;
  }

  get length(): number {
    return this.parts.length;
  }

  static from(parts: readonly number[]): Composition {
    for (const x of parts) {
      if (!Number.isSafeInteger(x) || x < 1) fail(`[${parts.join(', ')}] is not a composition: the part ${x} is not a positive integer`);
    }
    return new Composition(parts.slice());
  }
}

registerDecoder('composition', (x) => {
  if (!Array.isArray(x) || !x.every((v) => typeof v === 'number')) fail('a composition is a list of positive integers');
  return Composition.from(x as number[]);
});
