// The run-time shape every compiled expression shares: a frame of slots and closures over it.

import type { TypeName } from '../../values/types.js';
import type { Value } from '../../values/value.js';

/** One case's slots: `for` bindings, lets, and the slots comprehensions and lambdas add. */
export type Frame = Value[];

/** A compiled expression: evaluates against a frame. */
export type Fn = (frame: Frame) => Value;

/** A compiled expression with its static type. */
export interface Compiled {
  fn: Fn;
  type: TypeName;
}
