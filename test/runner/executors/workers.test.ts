// Through the command line (dist/, built by `npm test`): results do not depend on the number of
// workers, shards, or on a run being stopped and resumed.

import { describe, expect, it } from 'vitest';
import { cpSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { ROOT, runCli, tempDir } from '../../cli/run-cli.js';

const withoutTimes = (text: string) => JSON.stringify(JSON.parse(text), (k, v) => (k === 'ms' ? undefined : v), 1);

const FIXTURES = `conjecture: maj-not-above-inv
expect: fails
for:
  n: 1..6
  u: permutations(n)
  w: permutations(n)
claim: maj(w) <= inv(w) or des(u) > 2
---
conjecture: sampled-failure
expect: fails
for:
  n: 1..4
  w: permutations(n)
claim: n < 7 or inv(w) < 5
sample:
  n: 5..9
  count: 500
---
conjecture: where-and-sample
for:
  n: 1..7
  w: permutations(n)
where: des(w) <= 2
claim: inv(w) == inv(inverse(w))
sample:
  n: 8..12
  count: 700
`;

describe('the worker pool', () => {
  it('gives the same results with 1 and 2 workers on the bundled conjectures and on fixtures', () => {
    // Each run in a fresh project, so no run sees the counterexample files of another.
    const fresh = () => {
      const dir = tempDir();
      cpSync(join(ROOT, 'hunch.yaml'), join(dir, 'hunch.yaml')); // the bundled conjectures' plugin
      writeFileSync(join(dir, 'fixtures.yaml'), FIXTURES);
      cpSync(join(ROOT, 'conjectures'), join(dir, 'conjectures'), { recursive: true });
      return dir;
    };
    for (const paths of [['conjectures'], ['fixtures.yaml']]) {
      const one = runCli(['check', ...paths, '--no-ledger', '--json', '--allow-plugins', '--workers', '1'], { cwd: fresh() });
      const two = runCli(['check', ...paths, '--no-ledger', '--json', '--allow-plugins', '--workers', '2'], { cwd: fresh() });
      expect(one.code, one.stderr).toBe(two.code);
      expect(one.code === 0 || one.code === 1).toBe(true);
      expect(withoutTimes(two.stdout)).toBe(withoutTimes(one.stdout));
    }
    // The fixtures do what they say: a simplest exhaustive counterexample and a shrunk sampled one.
    const r = JSON.parse(runCli(['check', 'fixtures.yaml', '--no-ledger', '--json', '--workers', '2'], { cwd: fresh() }).stdout).results;
    expect(r.map((x: { outcome: string }) => x.outcome)).toEqual(['fails', 'fails', 'holds']);
    expect(r[0].counterexample.bindings).toEqual({ n: 3, u: { permutation: [1, 2, 3] }, w: { permutation: [1, 3, 2] } });
    expect(r[1].counterexample.phase).toBe('sample');
  }, 300_000);

  it('4 shards written to 4 ledgers merge into the unsharded counts, same counterexample', () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'hunch.yaml'), '');
    writeFileSync(join(dir, 'fixtures.yaml'), FIXTURES);
    const whole = JSON.parse(runCli(['check', 'fixtures.yaml', '--no-ledger', '--json', '--workers', '2'], { cwd: dir }).stdout).results;
    const shards = [1, 2, 3, 4].map((i) => {
      const r = runCli(['check', 'fixtures.yaml', '--shard', `${i}/4`, '--ledger', `shard-${i}.jsonl`, '--json', '--workers', '2'], {
        cwd: dir,
      });
      return JSON.parse(r.stdout).results;
    });
    const maj = shards
      .map((s) => s[0].counterexample)
      .filter(Boolean)
      .map((c) => JSON.stringify(c.bindings));
    expect(maj).toContain(JSON.stringify(whole[0].counterexample.bindings));
    const merged = runCli(['merge', 'shard-1.jsonl', 'shard-2.jsonl', 'shard-3.jsonl', 'shard-4.jsonl', '-o', 'hunch-ledger.jsonl'], {
      cwd: dir,
    });
    expect(merged.code, merged.stderr).toBe(0);
    const status = JSON.parse(runCli(['status', 'fixtures.yaml', '--json'], { cwd: dir }).stdout);
    const holds = status.conjectures.find((c: { id: string }) => c.id === 'where-and-sample');
    const want = whole[2].checked.filter((p: { phase: string }) => p.phase === 'exhaustive');
    expect(holds.exhaustive.map((e: { size: object; cases: number }) => [e.size, e.cases])).toEqual(
      want.map((p: { size: object; cases: number }) => [p.size, p.cases]),
    );
    expect(holds.unfinished).toEqual([]);
  }, 300_000);

  it('a run stopped by its budget inside a size resumes from its finished slices', () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'hunch.yaml'), '');
    writeFileSync(join(dir, 'big.yaml'), 'conjecture: big\nfor:\n  n: 1..10\n  w: permutations(n)\nclaim: inv(w) == inv(inverse(w))\n');
    const first = runCli(['check', 'big.yaml', '--budget', '400ms', '--json', '--workers', '2'], { cwd: dir });
    const r1 = JSON.parse(first.stdout).results[0];
    expect(r1.outcome).toBe('incomplete');
    const ledger = readFileSync(join(dir, 'hunch-ledger.jsonl'), 'utf8')
      .trim()
      .split('\n')
      .map((l) => JSON.parse(l));
    // Where the budget ends depends on the machine's speed and load: look at the size it stopped in.
    const stoppedIn = r1.checked.find((p: { partial?: boolean }) => p.partial).size.n;
    const slices = ledger.filter((x) => x.size.n === stoppedIn && x.shard);
    expect(slices.length).toBeGreaterThan(0);
    const second = runCli(['check', 'big.yaml', '--resume', '--json', '--workers', '2'], { cwd: dir });
    const r2 = JSON.parse(second.stdout).results[0];
    expect(r2.outcome).toBe('holds');
    // S_1..S_10 has 4,037,913 permutations (OEIS A007489), however the work was split.
    expect(r2.checked.reduce((s: number, p: { cases: number }) => s + p.cases, 0)).toBe(4037913);
    const status = JSON.parse(runCli(['status', 'big.yaml', '--json'], { cwd: dir }).stdout).conjectures[0];
    expect(status.exhaustive.map((e: { cases: number }) => e.cases).reduce((a: number, b: number) => a + b, 0)).toBe(4037913);
  }, 300_000);
});
