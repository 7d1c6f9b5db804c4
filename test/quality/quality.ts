// Shared measurement of shrink quality: run one sampled conjecture over
// many seeds and report how often the shrunk counterexample reaches the true minimal size (found by
// brute force in each test) and how often it is exactly the simplest failing case.

import { check } from '../runner/helpers.js';

export interface Quality {
  seeds: number;
  /** Fraction of seeds whose shrunk case has the true minimal size. */
  minimalSize: number;
  /** Fraction of seeds whose shrunk case is exactly the expected one. */
  exact: number;
  /** The slowest whole run (sampling plus shrinking), in ms. */
  worstMs: number;
  /** Shrunk sizes that missed, for the failure message. */
  misses: string[];
}

export const SEEDS = 50;

export function measure(yaml: string, sizeName: string, minSize: number, expected: Record<string, unknown>): Quality {
  let atSize = 0,
    exact = 0,
    worstMs = 0;
  const misses: string[] = [];
  for (let s = 1; s <= SEEDS; s++) {
    const r = check(yaml, { seed: String(s), exhaustive: false });
    worstMs = Math.max(worstMs, r.ms);
    const c = r.counterexample;
    if (!c || c.phase !== 'sample') {
      misses.push(`seed ${s}: no sampled counterexample (${r.outcome}${r.error ? ': ' + r.error.message : ''})`);
      continue;
    }
    if (c.size[sizeName] === minSize) atSize++;
    else misses.push(`seed ${s}: shrunk from ${JSON.stringify(c.shrunkFrom)} to ${JSON.stringify(c.bindings)}`);
    if (JSON.stringify(c.bindings) === JSON.stringify(expected)) exact++;
  }
  return { seeds: SEEDS, minimalSize: atSize / SEEDS, exact: exact / SEEDS, worstMs, misses };
}

export function report(name: string, q: Quality): void {
  const pct = (x: number) => `${Math.round(x * 100)}%`;
  console.log(
    `shrink quality: ${name}: minimal size in ${pct(q.minimalSize)} of ${q.seeds} seeds, ` +
      `exactly the simplest case in ${pct(q.exact)}; slowest run ${q.worstMs.toFixed(0)} ms`,
  );
}
