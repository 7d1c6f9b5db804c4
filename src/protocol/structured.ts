// The shape every non-primitive value of the language has: combinatorial objects, polynomials,
// matrices, distributions, functions, chains and measures. The value layer (equality, ordering
// keys, JSON encoding, printing) works through this interface only, so a new kind of value needs
// no change outside its own file but its name in type-names.ts. It sits below algebra, which
// implements it.

import type { ObjectKind } from './type-names.js';

export interface Structured {
  /** The kind's name as users see it in type errors and records: 'permutation', 'polynomial', ... */
  readonly kind: ObjectKind;
  /** Exact structural equality with another value of the same kind. */
  equals(other: Structured): boolean;
  /** A canonical string: equal values, and only they, have the same key (used by set/distribution). */
  key(): string;
  /** The value in the expression language's own syntax, e.g. perm([2,1,3]). */
  toText(): string;
  /** The JSON/YAML record encoding of CLI.md, e.g. {"permutation": [2,1,3]}. */
  encode(): unknown;
  /**
   * True for an object that an enumerator owns and mutates in place between cases. Whoever keeps
   * such a value beyond the current case (a list, a counterexample) must keep `copy()` instead.
   */
  transient?: boolean;
  /** A non-transient snapshot (only needed by kinds that can be transient). */
  copy?(): Structured;
}

export function isStructured(v: unknown): v is Structured {
  return typeof v === 'object' && v !== null && !Array.isArray(v) && typeof (v as Structured).kind === 'string';
}
