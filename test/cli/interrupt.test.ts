// Ctrl-C: a check stops cleanly with outcome `incomplete`, reports what it covered,
// exits 3, and the ledger holds exactly the sizes it finished.

import { spawn } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { expect, test } from 'vitest';
import { BIN, tempDir } from './run-cli.js';

test('SIGINT in the middle of a size gives incomplete, exit 3 and only finished pieces recorded', async () => {
  const dir = tempDir();
  writeFileSync(
    join(dir, 'long.yaml'),
    'conjecture: long-check\nexpect: holds\nfor:\n  n: 1..12\n  w: permutations(n)\nclaim: inv(w) == inv(inverse(w))\n',
  );
  const child = spawn(process.execPath, [BIN, 'check', 'long.yaml', '--json', '--workers', '1'], {
    cwd: dir,
    env: { ...process.env, NO_COLOR: '1' },
  });
  let out = '';
  let err = '';
  child.stdout.on('data', (d) => (out += d));
  child.stderr.on('data', (d) => (err += d));
  await new Promise((r) => setTimeout(r, 2500)); // well into S_10 or S_11
  child.kill('SIGINT');
  const code = await new Promise<number | null>((r) => child.on('exit', (c) => r(c)));
  expect(code, err).toBe(3);
  expect(err).not.toMatch(/\n\s+at .*:\d+:\d+\)/);
  const doc = JSON.parse(out);
  const r = doc.results[0];
  expect(r.outcome).toBe('incomplete');
  expect(r.stoppedBy).toBe('interrupt');
  const finished = r.checked.filter((p: { partial?: boolean }) => !p.partial);
  expect(finished.length).toBeGreaterThan(0);
  expect(r.checked.some((p: { partial?: boolean }) => p.partial)).toBe(true);
  // The ledger has one record per finished size, none for the interrupted one.
  const lines = readFileSync(join(dir, 'hunch-ledger.jsonl'), 'utf8')
    .trim()
    .split('\n')
    .map((l) => JSON.parse(l));
  const sizes = lines.filter((l) => l.phase === 'exhaustive').map((l) => l.size.n);
  expect(sizes).toEqual(finished.map((p: { size: { n: number } }) => p.size.n));
}, 30_000);
