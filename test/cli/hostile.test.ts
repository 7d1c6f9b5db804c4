// Runs the hostile corpus (hostile/corpus.ts): each input ends with its exit code and message,
// never a stack trace or an internal error, and leaves behind nothing it should not write.

import { chmodSync, existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, isAbsolute, join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { corpus } from './hostile/corpus.js';
import { runCli, tempDir } from './run-cli.js';

const RAW_CONTROL = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f]/;
const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;

describe('the hostile corpus', { timeout: 120_000 }, () => {
  test('holds at least 40 inputs', () => {
    expect(corpus.length).toBeGreaterThanOrEqual(40);
  });

  test.each(corpus.map((c) => [c.name, c] as const))('%s', (_name, c) => {
    if (c.notAsRoot && isRoot) return;
    const dir = tempDir('hunch-hostile-');
    try {
      for (const [rel, text] of Object.entries(c.files ?? {})) {
        mkdirSync(dirname(join(dir, rel)), { recursive: true });
        writeFileSync(join(dir, rel), text);
      }
      c.setup?.(dir);
      const r = runCli(c.args, { cwd: dir, env: c.env });
      const all = `exit ${r.code}\nstderr:\n${r.stderr}\nstdout:\n${r.stdout}`;
      expect(r.code, all).toBe(c.code);
      expect(r.stderr, all).not.toMatch(/internal error/);
      expect(r.stderr + r.stdout, all).not.toMatch(/\n\s+at .*\(?.*:\d+:\d+\)?\n/); // no stack trace
      for (const f of c.stderr ?? []) typeof f === 'string' ? expect(r.stderr, all).toContain(f) : expect(r.stderr, all).toMatch(f);
      for (const f of c.stdout ?? []) typeof f === 'string' ? expect(r.stdout, all).toContain(f) : expect(r.stdout, all).toMatch(f);
      // Nothing from input reaches the terminal raw (these runs are not on a terminal: no colour either).
      expect(r.stdout + r.stderr, all).not.toMatch(RAW_CONTROL);
      for (const f of c.clean ?? []) {
        expect(existsSync(join(dir, f)), `${f} must exist`).toBe(true);
        expect(readFileSync(join(dir, f), 'utf8'), f).not.toMatch(RAW_CONTROL);
      }
      const absent = typeof c.absent === 'function' ? c.absent(dir) : (c.absent ?? []);
      for (const p of absent) expect(existsSync(isAbsolute(p) ? p : join(dir, p)), `${p} must not exist`).toBe(false);
    } finally {
      chmodSync(dir, 0o755);
      rmSync(dir, { recursive: true, force: true });
      rmSync(`${dir}-outside`, { recursive: true, force: true });
    }
  });
});
