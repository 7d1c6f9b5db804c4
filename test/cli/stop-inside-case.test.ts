// Budgets and interrupts hold inside one long case: a comprehension over 10^12 elements stops on
// --budget and on SIGTERM instead of running for hours.

import { spawn } from 'node:child_process';
import { rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { BIN, runCli, tempDir } from './run-cli.js';

const LONG = 'conjecture: long\nexpect: holds\nfor:\n  n: 1..2\nclaim: count(i in 1..10^12 where i > 0) > 0\n';

describe('stopping inside a long case', { timeout: 120_000 }, () => {
  test('--budget stops count(i in 1..10^12) and reports incomplete', () => {
    const d = tempDir('hunch-stop-');
    try {
      writeFileSync(join(d, 'a.yaml'), LONG);
      const r = runCli(['check', 'a.yaml', '--budget', '2s', '--workers', '1', '--json'], { cwd: d, timeout: 90_000 });
      expect(r.code, r.stderr).toBe(0);
      const res = JSON.parse(r.stdout).results[0];
      expect(res.outcome).toBe('incomplete');
      expect(res.error).toBeNull();
    } finally {
      rmSync(d, { recursive: true, force: true });
    }
  });

  test('--budget stops a long Gröbner basis computation inside one case (the commuting ideal of 4 × 4 matrices)', () => {
    const d = tempDir('hunch-stop-');
    try {
      writeFileSync(
        join(d, 'a.yaml'),
        'conjecture: slow-ideal\nexpect: holds\nindeterminates: [a, b]\nfor:\n  n: 4..4\nlet:\n  X: genericMatrix(a, n, n)\n  Y: genericMatrix(b, n, n)\nclaim: degree(ideal(entries(X*Y - Y*X))) == 1145\n',
      );
      const r = runCli(['check', 'a.yaml', '--budget', '3s', '--workers', '1', '--json'], { cwd: d, timeout: 90_000 });
      expect(r.code, r.stderr).toBe(0);
      const res = JSON.parse(r.stdout).results[0];
      expect(res.outcome).toBe('incomplete');
      expect(res.error).toBeNull();
    } finally {
      rmSync(d, { recursive: true, force: true });
    }
  });

  test('SIGTERM stops count(i in 1..10^12): exit 3, interrupted, no internal error', async () => {
    const d = tempDir('hunch-stop-');
    try {
      writeFileSync(join(d, 'a.yaml'), LONG);
      const child = spawn(process.execPath, [BIN, 'check', 'a.yaml', '--workers', '1'], { cwd: d, env: { ...process.env, NO_COLOR: '1' } });
      let out = '';
      let err = '';
      child.stdout.on('data', (b) => (out += b));
      child.stderr.on('data', (b) => (err += b));
      // Wait until the case is running (the worker is up), then ask it to stop.
      await new Promise((r) => setTimeout(r, 4000));
      child.kill('SIGTERM');
      const code = await new Promise<number | null>((resolve) => {
        const timer = setTimeout(() => child.kill('SIGKILL'), 60_000);
        child.on('exit', (c) => (clearTimeout(timer), resolve(c)));
      });
      expect(code, out + err).toBe(3);
      expect(err).not.toMatch(/internal error/);
      expect(out).toMatch(/incomplete|Interrupted/);
    } finally {
      rmSync(d, { recursive: true, force: true });
    }
  });
});
