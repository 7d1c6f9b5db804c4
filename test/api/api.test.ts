import { mkdirSync, writeFileSync } from 'node:fs';
import { tempDir } from '../helpers/temp-dirs.js';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { check, ConjectureTestFailure, defineConjectureTests, describeResult, load, passes, readLedger } from '../../src/api/index.js';

function project(files: Record<string, string>): string {
  const d = tempDir('hunch-api-');
  for (const [p, text] of Object.entries(files)) {
    mkdirSync(join(d, p, '..'), { recursive: true });
    writeFileSync(join(d, p), text);
  }
  return d;
}

// maj(132) = 2 > inv(132) = 1: the smallest counterexample (the major index and inversions are
// equidistributed, MacMahon, Combinatory Analysis vol. I, but not bounded by one another).
const WRONG = `
conjecture: maj-le-inv
expect: holds
for:
  n: 1..5
  w: permutations(n)
claim: maj(w) <= inv(w)
---
conjecture: inv-of-inverse
expect: holds
for:
  n: 1..5
  w: permutations(n)
claim: inv(w) == inv(inverse(w))
`;

describe('library API', () => {
  test('load and check; results agree or not with expect', async () => {
    const d = project({ 'hunch.yaml': '', 'conjectures/a.yaml': WRONG });
    const cs = await load(join(d, 'conjectures'));
    expect(cs.map((c) => c.id)).toEqual(['maj-le-inv', 'inv-of-inverse']);
    const [bad, good] = cs.map((c) => check(c));
    expect(bad.outcome).toBe('fails');
    expect(bad.counterexample?.bindings).toEqual({ n: 3, w: { permutation: [1, 3, 2] } });
    expect(passes(bad)).toBe(false);
    expect(good.outcome).toBe('holds');
    expect(passes(good)).toBe(true);
    expect(describeResult(bad)).toMatch(/FAILS, but expected to hold/);
    expect(good.hash).toMatch(/^[0-9a-f]{64}$/);
  });

  test('check records in the project ledger only when asked', async () => {
    const d = project({ 'hunch.yaml': '', 'conjectures/a.yaml': WRONG });
    const [, good] = await load(join(d, 'conjectures'));
    check(good);
    expect(readLedger(join(d, 'hunch-ledger.jsonl')).records).toEqual([]);
    check(good, { ledger: true });
    const recs = readLedger(join(d, 'hunch-ledger.jsonl')).records;
    expect(recs.map((r) => r.size.n)).toEqual([1, 2, 3, 4, 5]);
    expect(recs.every((r) => r.hash === good.compiled.hash)).toBe(true);
  });

  test('defineConjectureTests makes one test per conjecture; a contradiction fails with the case drawn', async () => {
    const d = project({ 'hunch.yaml': '', 'conjectures/a.yaml': WRONG });
    const made: Array<{ name: string; body: () => unknown }> = [];
    const suites: string[] = [];
    defineConjectureTests(join(d, 'conjectures'), {
      describe: (name, body) => {
        suites.push(name);
        body();
      },
      test: (name, body) => void made.push({ name, body }),
    });
    expect(suites).toHaveLength(1);
    expect(made.map((m) => m.name)).toEqual(['maj-le-inv', 'inv-of-inverse']);
    const err = await Promise.resolve(made[0].body()).then(
      () => null,
      (e) => e,
    );
    expect(err).toBeInstanceOf(ConjectureTestFailure);
    expect(String(err.message)).toMatch(/maj-le-inv \(expect: holds\) came out fails/);
    expect(String(err.message)).toMatch(/w = /);
    await made[1].body();
  });
});
