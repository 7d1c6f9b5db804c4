// Records under stress: a closed pipe, a file size limit, a killed writer. hunch never shows a
// stack trace or an internal error, keeps what it recorded, and leaves no temporary file behind.

import { spawnSync } from 'node:child_process';
import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, describe, expect, test } from 'vitest';
import { writeFileAtomic } from '../../src/records/atomic-write.js';
import { BIN, tempDir } from './run-cli.js';

const TWO = `conjecture: maj-bounded
expect: fails
for:
  n: 1..4
  w: permutations(n)
claim: maj(w) <= inv(w)
---
conjecture: inv-inverse
expect: holds
for:
  n: 1..6
  w: permutations(n)
claim: inv(w) == inv(inverse(w))
`;

const made: string[] = [];
afterEach(() => {
  for (const d of made.splice(0)) rmSync(d, { recursive: true, force: true });
});
function project(): string {
  const d = tempDir('hunch-records-');
  made.push(d);
  writeFileSync(join(d, 'a.yaml'), TWO);
  return d;
}

function sh(script: string, cwd: string) {
  return spawnSync('sh', ['-c', script], {
    cwd,
    encoding: 'utf8',
    env: { ...process.env, NO_COLOR: '1', HUNCH: `${process.execPath} ${BIN}` },
    timeout: 120_000,
  });
}

describe('records under stress', { timeout: 120_000 }, () => {
  test('a closed pipe (hunch check | head -1): the records are finished and hunch exits quietly', () => {
    const d = project();
    const r = sh('$HUNCH check a.yaml --workers 1 | head -1; echo "status=$(cat /dev/null)"', d);
    expect(r.stdout.split('\n')[0]).toMatch(/maj-bounded/);
    expect(r.stderr).not.toMatch(/EPIPE|internal error|\n\s+at /);
    const lines = readFileSync(join(d, 'hunch-ledger.jsonl'), 'utf8').trim().split('\n');
    expect(lines.some((l) => l.includes('"inv-inverse"') && l.includes('"n":6'))).toBe(true); // the second conjecture was finished
    expect(readdirSync(join(d, 'counterexamples'))).toEqual(['maj-bounded.yaml']);
  });

  test('a file size limit (ulimit -f) is a clear error, exit 2, not a crash', () => {
    const d = project();
    const r = sh('ulimit -f 1; $HUNCH check a.yaml --workers 1 > out.txt; echo "exit=$?"', d);
    expect(r.stdout).toContain('exit=2');
    expect(r.stderr).toMatch(/error: .*(ledger|counterexample)/);
    expect(r.stderr).toContain('could not be written');
    expect(r.stderr).not.toMatch(/internal error|\n\s+at /);
  });

  test('an atomic write leaves no temporary file, and removes one a killed writer left', () => {
    const d = project();
    mkdirSync(join(d, 'c'));
    // A temporary file of a process that no longer exists (pid 2^22 + 1 is above Linux's pid limit).
    writeFileSync(join(d, 'c', `.x.yaml.hunch-${4194305}-00000000.tmp`), 'half');
    writeFileAtomic(join(d, 'c', 'x.yaml'), 'whole\n');
    expect(readdirSync(join(d, 'c'))).toEqual(['x.yaml']);
    expect(readFileSync(join(d, 'c', 'x.yaml'), 'utf8')).toBe('whole\n');
  });

  test('no *.yaml.<digits> file is left after a check killed with SIGKILL while writing', () => {
    const d = project();
    // Kill at random moments of a run that writes a counterexample; whatever was written is whole.
    for (const ms of [150, 400, 700]) {
      sh(`$HUNCH check a.yaml --workers 1 >/dev/null 2>&1 & p=$!; sleep ${ms / 1000}; kill -9 $p; wait $p`, d);
    }
    sh('$HUNCH check a.yaml --workers 1 >/dev/null 2>&1', d);
    const files = readdirSync(join(d, 'counterexamples'));
    expect(files.filter((f) => /\.yaml\.\d+$/.test(f) || f.endsWith('.tmp'))).toEqual([]);
  });
});
