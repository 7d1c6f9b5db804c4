// Shards of a check: K shards' pieces add up to the unsharded counts, size by size and phase by phase,
// and the simplest counterexample of a size is found by whichever shard holds it — the same one.

import { describe, expect, it } from 'vitest';
import { check, doc } from '../helpers.js';
import type { CheckedPiece, ConjectureResult } from '../../../src/runner/result.js';

const key = (p: CheckedPiece) => `${p.phase} ${JSON.stringify(p.size)}`;

function totals(results: ConjectureResult[]): Map<string, { cases: number; failures: number; skipped: number }> {
  const m = new Map<string, { cases: number; failures: number; skipped: number }>();
  for (const r of results)
    for (const p of r.checked) {
      const t = m.get(key(p)) ?? { cases: 0, failures: 0, skipped: 0 };
      t.cases += p.cases;
      t.failures += p.failures;
      t.skipped += p.skipped;
      m.set(key(p), t);
    }
  return m;
}

describe('shards', () => {
  const holds = doc({
    for: ['n: 1..7', 'w: permutations(n)'],
    where: 'des(w) <= 3',
    claim: 'inv(w) == inv(inverse(w))',
    sample: ['n: 8..10', 'count: 300'],
  });

  it('K shards cover exactly the unsharded cases (exhaustive and sampled)', () => {
    const whole = check(holds);
    expect(whole.outcome).toBe('holds');
    for (const k of [1, 2, 3, 8, 200]) {
      const parts = Array.from({ length: k }, (_, i) => check(holds, { shard: { index: i + 1, of: k } }));
      for (const p of parts) {
        expect(p.outcome).toBe('holds');
        for (const piece of p.checked) expect(piece.shard).toBe(`${parts.indexOf(p) + 1}/${k}`);
      }
      expect(totals(parts)).toEqual(totals([whole]));
    }
  });

  it('the simplest counterexample is the same with and without shards', () => {
    // maj(w) <= inv(w) fails first at n = 3 (maj(132) = 2 > inv(132) = 1).
    const fails = doc({ for: ['n: 1..6', 'u: permutations(n)', 'w: permutations(n)'], claim: 'maj(w) <= inv(w) or inv(u) > 4' });
    const whole = check(fails);
    expect(whole.outcome).toBe('fails');
    for (const k of [2, 5]) {
      const parts = Array.from({ length: k }, (_, i) => check(fails, { shard: { index: i + 1, of: k } }));
      const found = parts.filter((p) => p.counterexample).map((p) => p.counterexample!);
      expect(found.length).toBeGreaterThan(0);
      // Every shard stops at n = 3; their failures add up, and the simplest of theirs is the unsharded one.
      const failures = parts.reduce((s, p) => s + p.checked.filter((x) => x.size.n === 3).reduce((a, x) => a + x.failures, 0), 0);
      expect(failures).toBe(whole.counterexample!.failuresAtSize);
      expect(found.map((c) => JSON.stringify(c.bindings))).toContain(JSON.stringify(whole.counterexample!.bindings));
    }
  });
});
