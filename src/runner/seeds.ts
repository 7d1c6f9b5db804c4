// Reproducible randomness: the seed of every sampled size derives from (seed, conjecture id, size),
// so results do not depend on order, workers, shards or on the other conjectures of a run.

import { createHash } from 'node:crypto';
import fc from 'fast-check';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';

/** The default seed when the user gives none: fixed, so runs repeat. */
export const DEFAULT_SEED = '0';

export function derivedSeed(seed: string, id: string, size: string): number {
  const h = createHash('sha256').update(`${seed}\u0000${id}\u0000${size}`).digest();
  return h.readInt32LE(0);
}

export function randomFor(seed: string, id: string, size: string): fc.Random {
  return new fc.Random(xoroshiro128plus(derivedSeed(seed, id, size)));
}
