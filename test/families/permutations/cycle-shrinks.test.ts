// Shrink steps on cycles: every step is a permutation of a smaller symmetric group (so strictly
// simpler), steps are distinct, and a claim about orders now shrinks to its true minimum.

import fc from 'fast-check';
import { rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { cycleShrinks } from '../../../src/families/permutations/cycleMoves.js';
import { runCli, tempDir } from '../../cli/run-cli.js';

function isPermutation(b: number[]): boolean {
  const s = [...b].sort((x, y) => x - y);
  return s.every((v, i) => v === i + 1);
}

function cycleType(w: number[]): number[] {
  const seen = new Array(w.length).fill(false);
  const out: number[] = [];
  for (let i = 0; i < w.length; i++) {
    if (seen[i]) continue;
    let l = 0;
    for (let j = i; !seen[j]; j = w[j] - 1) (seen[j] = true), l++;
    out.push(l);
  }
  return out.sort((x, y) => y - x);
}

describe('cycle shrink steps of permutations', () => {
  test('each step is a permutation of a smaller size, and no step repeats', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 9 }).chain((n) =>
          fc.shuffledSubarray(
            [...Array(n).keys()].map((i) => i + 1),
            { minLength: n, maxLength: n },
          ),
        ),
        (a) => {
          const seen = new Set<string>();
          const steps = [...cycleShrinks(a, seen)];
          for (const b of steps) {
            expect(b.length).toBeLessThan(a.length);
            expect(isPermutation(b)).toBe(true);
          }
          expect(new Set(steps.map((b) => b.join(','))).size).toBe(steps.length);
        },
      ),
      { seed: 11, numRuns: 200 },
    );
  });

  test('a split keeps the two parts as cycles: (1 2 3 4 5 6 7) gives cycle type (3, 2) among its steps', () => {
    const steps = [...cycleShrinks([2, 3, 4, 5, 6, 7, 1], new Set())];
    expect(steps.some((b) => cycleType(b).join(',') === '3,2')).toBe(true);
    expect(steps.some((b) => cycleType(b).join(',') === '4')).toBe(true); // shortened by three points
  });

  // The largest order of an element of S_n is Landau's function, OEIS A000793: g(18) = 210 < 18^2
  // and g(19) = 420 > 19^2, with 420 = lcm(7, 5, 4, 3) the only cycle type reaching it at n = 19.
  // So the simplest counterexample to order(w) <= n^2 has n = 19 and cycle type (7, 5, 4, 3).
  test('order(w) <= n^2 sampled with seed 0 shrinks to n = 19, cycle type (7, 5, 4, 3)', () => {
    const d = tempDir('hunch-order-');
    try {
      writeFileSync(
        join(d, 'a.yaml'),
        'conjecture: order-bound\nexpect: fails\nfor:\n  n: 1..8\n  w: permutations(n)\nclaim: order(w) <= n^2\nsample:\n  n: 9..30\n  count: 200\n',
      );
      const r = runCli(['check', 'a.yaml', '--no-ledger', '--seed', '0', '--no-exhaustive', '--json'], { cwd: d, timeout: 120_000 });
      expect(r.code, r.stderr).toBe(0);
      const cx = JSON.parse(r.stdout).results[0].counterexample;
      expect(cx.size).toEqual({ n: 19 });
      expect(cycleType(cx.bindings.w.permutation)).toEqual([7, 5, 4, 3]);
    } finally {
      rmSync(d, { recursive: true, force: true });
    }
  }, 120_000);
});
