// Bad input: every malformed file gets one clear message with file:line:column, the
// offending text or nearest valid name, exit code 2, no stack trace, and nothing recorded.
// Each file under malformed/ states on its first line what the message must contain and where.

import { copyFileSync, existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { ROOT, runCli, tempDir } from './run-cli.js';

const DIR = join(ROOT, 'test', 'cli', 'malformed');
const files = readdirSync(DIR)
  .filter((f) => f.endsWith('.yaml'))
  .sort();

describe('malformed conjecture files', () => {
  test('there are at least 30 of them', () => {
    expect(files.length).toBeGreaterThanOrEqual(30);
  });

  test.each(files)('%s', (f) => {
    const header = readFileSync(join(DIR, f), 'utf8').split('\n')[0];
    const m = /^# expect: (.*)$/.exec(header);
    expect(m, 'first line states the expectation').not.toBeNull();
    const parts = m![1].split('|').map((s) => s.trim());
    const at = parts
      .find((p) => p.startsWith('at:'))!
      .slice(3)
      .trim();
    const fragments = parts.filter((p) => !p.startsWith('at:') && p);

    const dir = tempDir();
    copyFileSync(join(DIR, f), join(dir, f));
    const r = runCli(['check', f], { cwd: dir });
    expect(r.code, r.stderr + r.stdout).toBe(2);
    expect(r.stderr).not.toMatch(/\n\s+at .*\(.*:\d+:\d+\)/); // no stack trace
    expect(r.stderr).not.toMatch(/internal error/);
    for (const frag of fragments) expect(r.stderr).toContain(frag);
    expect(r.stderr).toContain(`${f}:${at}`);
    expect(existsSync(join(dir, 'hunch-ledger.jsonl'))).toBe(false);
    expect(existsSync(join(dir, 'counterexamples'))).toBe(false);
  });
});
