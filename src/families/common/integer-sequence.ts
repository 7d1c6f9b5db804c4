// What objects that are a finite sequence of integers share (compositions, partitions, words,
// subsets): equality, key, text form, record encoding, copying, and iteration after `in`.
// Each subclass keeps its own field name (parts, letters, elems) and says how to rebuild itself.

import type { Structured } from '../../values/structured.js';
import type { ObjectKind } from '../../values/types.js';

export abstract class IntegerSequence implements Structured {
  abstract readonly kind: ObjectKind;
  transient = false;

  /** The integers, in the object's own order. */
  protected abstract sequence(): readonly number[];
  /** A new object of the same class over these integers (trusted, already valid). */
  protected abstract rebuild(values: number[]): IntegerSequence;

  /** A source after `in`: sum(c), max(lambda), all(c > 0 for c in S). */
  elements(): readonly number[] {
    return this.sequence();
  }

  equals(other: Structured): boolean {
    const a = this.sequence(),
      b = (other as IntegerSequence).sequence();
    if (a.length !== b.length) return false;
    for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
    return true;
  }

  key(): string {
    return this.sequence().join(',');
  }

  /** composition([1, 2]): the constructor of the language has the kind's name. */
  toText(): string {
    return `${this.kind}([${this.sequence().join(', ')}])`;
  }

  encode(): unknown {
    return { [this.kind]: this.sequence().slice() };
  }

  copy(): IntegerSequence {
    return this.rebuild(this.sequence().slice());
  }
}
