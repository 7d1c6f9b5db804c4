// What every combinatorial family provides (LIBRARY.md §1). A family is parameterised
// (permutations(n), avoiders(n, p), standardTableaux(lambda)); `prepare` turns the language's
// argument values into the family's own parameter object once per size, and everything else works
// on that.

import type * as fc from 'fast-check';
import type { Structured } from '../values/structured.js';
import type { ObjectKind, TypeName } from '../values/types.js';
import type { Value } from '../values/value.js';

export interface ParamSpec {
  name: string;
  type: TypeName;
  optional?: boolean;
  /** Takes all remaining arguments (avoiders(n, p1, p2, ...)). */
  rest?: boolean;
}

/** Visitor of an enumeration. Return true to stop early (any/all, budgets, interrupts). */
export type Visit<T> = (obj: T) => boolean | void;

export interface Family<P = unknown, T extends Structured = Structured> {
  /** The name used in the language: 'permutations'. */
  readonly name: string;
  readonly params: ParamSpec[];
  /** The kind of the objects, as in Structured.kind: 'permutation'. */
  readonly objectKind: ObjectKind;
  readonly signature: string;
  readonly description: string;
  readonly example: string;
  /** The published source its tests check it against (sequence number, book and page, paper). */
  readonly source: string;

  /** Check and normalise the arguments; throw (via fail) with a clear message when they are invalid. */
  prepare(args: readonly Value[]): P;
  /** The exact number of objects. */
  count(p: P): bigint;
  /**
   * Visit every object once, in a fixed order. The object handed to `visit` may be transient
   * (mutated in place afterwards; see Structured.transient). Returns true if `visit` stopped it.
   */
  enumerate(p: P, visit: Visit<T>): boolean;
  /**
   * Optional: visit only the objects with indices lo..hi-1 of `enumerate`'s order, in that
   * order, without walking the ones before (unranking). Parallel and sharded checks cut a size into
   * such ranges; a family without it is cut by enumerating from the start and skipping.
   */
  enumerateRange?(p: P, lo: bigint, hi: bigint, visit: Visit<T>): boolean;
  /** Whether a value is an object of this family with these parameters. */
  isMember(p: P, obj: Structured): boolean;
  /**
   * The simplicity order among objects of the same parameters (LIBRARY.md §1: the listed statistic,
   * then lexicographic). Negative when a is simpler. Must be a total order.
   */
  compare(a: T, b: T): number;

  // --- The sample phase: drawing at random and shrinking a failure. ---
  /** An exactly uniform fast-check arbitrary over the family at these parameters. */
  arbitrary(p: P): fc.Arbitrary<T>;
  /**
   * Candidate shrinks of obj, size-reducing ones first. Each is a strictly simpler member of the
   * family, possibly at smaller parameters (then `params` says which, and `size` the new size).
   */
  shrink(p: P, obj: T): Iterable<Shrunk<P, T>>;
}

export interface Shrunk<P, T> {
  /** The family parameters of the shrunk object (equal to the old ones when the size is unchanged). */
  params: P;
  /** The new value of the size argument, when it changed (permutations(n) shrunk to n-1). */
  size?: number;
  obj: T;
}
