// An exactly uniform fast-check arbitrary built from a sampler that draws from fast-check's random
// source directly. fast-check's own integer arbitraries bias towards small values on purpose; a
// family's sampler must not, so it reads unbiased integers from the generator and ignores the bias
// factor. Shrinking goes through the family's own simplifying steps (same parameters only: an
// arbitrary is for one parameter value; steps that lower the size are the runner's business).

import * as fc from 'fast-check';

/** The unbiased integers a sampler may draw (both bounds included). */
export interface Rng {
  int(lo: number, hi: number): number;
  big(lo: bigint, hi: bigint): bigint;
}

export function rngOf(mrng: fc.Random): Rng {
  return {
    int: (lo, hi) => mrng.nextInt(lo, hi),
    big: (lo, hi) => (lo === hi ? lo : mrng.nextBigInt(lo, hi)),
  };
}

/** A uniform index in [0, n) for a bigint n >= 1. */
export function uniformBelow(rng: Rng, n: bigint): bigint {
  return rng.big(0n, n - 1n);
}

class ExactArbitrary<T> extends fc.Arbitrary<T> {
  constructor(
    private readonly sample: (rng: Rng) => T,
    private readonly member: (v: unknown) => boolean,
    private readonly simpler: (v: T) => Iterable<T>,
  ) {
    super();
  }

  generate(mrng: fc.Random): fc.Value<T> {
    return new fc.Value(this.sample(rngOf(mrng)), undefined);
  }

  canShrinkWithoutContext(value: unknown): value is T {
    return this.member(value);
  }

  shrink(value: T): fc.Stream<fc.Value<T>> {
    // Lazy: a shrinker usually takes the first candidate that still fails.
    const it = this.simpler(value)[Symbol.iterator]();
    function* values(): IterableIterator<fc.Value<T>> {
      for (let r = it.next(); !r.done; r = it.next()) yield new fc.Value(r.value, undefined);
    }
    return new fc.Stream(values());
  }
}

/**
 * sample: draws one object, exactly uniformly. member: whether a value belongs to the family at
 * these parameters. simpler: strictly simpler members at the same parameters, best first.
 */
export function exactArbitrary<T>(
  sample: (rng: Rng) => T,
  member: (v: unknown) => boolean,
  simpler: (v: T) => Iterable<T> = () => [],
): fc.Arbitrary<T> {
  return new ExactArbitrary(sample, member, simpler);
}
