// Where the fuzz generators get their random choices: from fast-check (fc.gen(), so a failure is
// reported with the choices that led to it) or from a small seeded generator (for long exploratory
// runs outside the test suite).

import fc from 'fast-check';

export interface Rand {
  /** A whole number in lo..hi (inclusive). */
  int(lo: number, hi: number): number;
}

export function pick<T>(r: Rand, xs: readonly T[]): T {
  return xs[r.int(0, xs.length - 1)];
}

/** True with probability percent/100. */
export function chance(r: Rand, percent: number): boolean {
  return r.int(1, 100) <= percent;
}

/** Choices drawn through fast-check's generator value (inside a property). */
export function fcRand(g: fc.GeneratorValue): Rand {
  return { int: (lo, hi) => g(fc.integer, { min: lo, max: hi }) };
}

/** A seeded generator (mulberry32), for exploration scripts. */
export function seededRand(seed: number): Rand {
  let s = seed >>> 0;
  const next = () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return { int: (lo, hi) => lo + Math.floor(next() * (hi - lo + 1)) };
}
