// The fast-check arbitrary every family uses: values come from the family's own exactly uniform
// draw, and the shrink tree is the family's own shrink list (LIBRARY.md §1), so the random phase
// and the runner's shrinker take the same steps. The context of a value is the family parameters
// it belongs to: a shrink may lower the size (permutations(5) -> permutations(4)) and its own
// shrinks must then be taken at the new parameters.

import * as fc from 'fast-check';
import { isStructured, type Structured } from '../../values/structured.js';
import type { Family } from '../family.js';

export type Draw<T> = (rng: fc.Random) => T;

export class FamilyArbitrary<P, T extends Structured> extends fc.Arbitrary<T> {
  constructor(
    private readonly family: Family<P, T>,
    private readonly params: P,
    private readonly draw: Draw<T>,
  ) {
    super();
  }

  generate(mrng: fc.Random, _biasFactor: number | undefined): fc.Value<T> {
    // No bias: the value must be exactly uniform, so biasFactor is ignored on purpose.
    return new fc.Value(this.draw(mrng), this.params);
  }

  canShrinkWithoutContext(value: unknown): value is T {
    return isStructured(value) && this.family.isMember(this.params, value);
  }

  shrink(value: T, context: unknown): fc.Stream<fc.Value<T>> {
    const family = this.family;
    const params = (context === undefined ? this.params : context) as P;
    function* steps(): IterableIterator<fc.Value<T>> {
      for (const s of family.shrink(params, value)) yield new fc.Value(s.obj, s.params);
    }
    return new fc.Stream(steps());
  }
}

/** A uniform integer in 0..bound-1 for a bigint bound >= 1 (exact: fast-check draws by rejection). */
export function uniformBelow(rng: fc.Random, bound: bigint): bigint {
  if (bound <= 0x7fffffffn) return BigInt(rng.nextInt(0, Number(bound) - 1));
  return rng.nextBigInt(0n, bound - 1n);
}

/** A uniformly random permutation of 1..n in one-line notation (Fisher–Yates). */
export function fisherYates(rng: fc.Random, n: number): number[] {
  const a = new Array<number>(n);
  for (let i = 0; i < n; i++) a[i] = i + 1;
  for (let i = n - 1; i > 0; i--) {
    const j = rng.nextInt(0, i);
    const t = a[i];
    a[i] = a[j];
    a[j] = t;
  }
  return a;
}

/** Lexicographic comparison of arrays (a proper prefix is smaller). */
export function lexCompareArrays(a: readonly number[], b: readonly number[]): number {
  const n = Math.min(a.length, b.length);
  for (let i = 0; i < n; i++) if (a[i] !== b[i]) return a[i] - b[i];
  return a.length - b.length;
}
