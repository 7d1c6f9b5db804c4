// A function value of the language, `v -> E` (kind 'function'). It exists only as an argument of
// another function (map, chain, ...), which calls it with `call([arg])`. Equality is identity:
// two functions are never compared by their bodies.

import { fail } from '../base/errors.js';
import type { Structured } from './structured.js';
import type { Value } from './value.js';

let nextId = 0;

export class Lambda implements Structured {
  readonly kind = 'function';
  private readonly id = nextId++;

  constructor(
    /** Number of parameters. */
    readonly arity: number,
    /** Evaluates the body with exactly `arity` arguments (the caller has checked the count). */
    private readonly body: (args: readonly Value[]) => Value,
    /** The source text, for messages and printing: `v -> v + 1`. */
    readonly text: string,
  ) {}

  call(args: readonly Value[]): Value {
    if (args.length !== this.arity) {
      fail(`the function ${this.text} takes ${this.arity} argument${this.arity === 1 ? '' : 's'}, got ${args.length}`);
    }
    return this.body(args);
  }

  equals(other: Structured): boolean {
    return other === this;
  }

  key(): string {
    return `#${this.id}`;
  }

  toText(): string {
    return this.text;
  }

  encode(): unknown {
    return { function: this.text };
  }
}

export function isLambda(v: unknown): v is Lambda {
  return v instanceof Lambda;
}
