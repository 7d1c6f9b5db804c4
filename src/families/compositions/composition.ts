// A composition: a finite sequence of positive integers (its parts), in order.

import { fail } from '../../base/errors.js';
import { registerDecoder } from '../../values/decode.js';
import type { Structured } from '../../values/structured.js';

export class Composition implements Structured {
  readonly kind = 'composition';
  transient = false;

  /** Trusts that every part is a positive integer; use Composition.from for user data. */
  constructor(readonly parts: number[]) {}

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

  /** The parts in order: a composition is a source after `in` (sum(c), max(c)). */
  elements(): readonly number[] {
    return this.parts;
  }

  equals(other: Structured): boolean {
    const b = (other as Composition).parts, a = this.parts;
    if (a.length !== b.length) return false;
    for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
    return true;
  }

  key(): string {
    return this.parts.join(',');
  }

  toText(): string {
    return `composition([${this.parts.join(', ')}])`;
  }

  encode(): unknown {
    return { composition: this.parts.slice() };
  }

  copy(): Composition {
    return new Composition(this.parts.slice());
  }
}

registerDecoder('composition', (x) => {
  if (!Array.isArray(x) || !x.every((v) => typeof v === 'number')) fail('a composition is a list of positive integers');
  return Composition.from(x as number[]);
});
