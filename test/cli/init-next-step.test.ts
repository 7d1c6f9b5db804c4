// `hunch init` prints a next step that works as printed, and --no-ledger --counterexamples writes
// the counterexample file it was asked for.

import { spawnSync } from 'node:child_process';
import { existsSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { expect, test } from 'vitest';
import { runCli, tempDir } from './run-cli.js';

test('the next step hunch init prints runs as printed', () => {
  const d = tempDir('hunch-init-next-');
  try {
    const r = runCli(['init', 'proj'], { cwd: d });
    expect(r.code, r.stderr).toBe(0);
    const next = /Next: (.*?)\s+\(then/.exec(r.stdout)?.[1];
    expect(next, r.stdout).toBeTruthy();
    expect(next).not.toMatch(/(^|&& )hunch check/); // "hunch" alone is not on PATH in a fresh clone
    const run = spawnSync('sh', ['-c', next!], { cwd: d, encoding: 'utf8', env: { ...process.env, NO_COLOR: '1' }, timeout: 120_000 });
    expect(run.status, run.stderr + run.stdout).toBe(0);
    expect(run.stdout).toMatch(/3 conjectures: 3 as expected/);
  } finally {
    rmSync(d, { recursive: true, force: true });
  }
}, 120_000);

test('--no-ledger --counterexamples writes the counterexample file and no ledger', () => {
  const d = tempDir('hunch-cx-');
  try {
    writeFileSync(
      join(d, 'a.yaml'),
      'conjecture: maj-bounded\nexpect: fails\nfor:\n  n: 1..4\n  w: permutations(n)\nclaim: maj(w) <= inv(w)\n',
    );
    const r = runCli(['check', 'a.yaml', '--no-ledger', '--counterexamples'], { cwd: d });
    expect(r.code, r.stderr).toBe(0);
    expect(existsSync(join(d, 'counterexamples', 'maj-bounded.yaml'))).toBe(true);
    expect(existsSync(join(d, 'hunch-ledger.jsonl'))).toBe(false);
  } finally {
    rmSync(d, { recursive: true, force: true });
  }
}, 120_000);
