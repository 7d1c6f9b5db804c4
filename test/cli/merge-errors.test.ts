// Mistakes around ledgers that must not pass silently (found by fuzzing): a misspelt ledger name
// in `hunch merge` is an error, and a damaged line is shown with its control bytes escaped.

import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { expect, test } from 'vitest';
import { runCli, tempDir } from './run-cli.js';

test('hunch merge of a ledger that does not exist exits 2 and names it', () => {
  const dir = tempDir();
  const r = runCli(['merge', 'no-such-ledger.jsonl'], { cwd: dir });
  expect(r.code).toBe(2);
  expect(r.stderr).toContain('no such ledger: no-such-ledger.jsonl');
});

test('a damaged ledger line is shown without raw control bytes', () => {
  const dir = tempDir();
  mkdirSync(join(dir, 'conjectures'));
  writeFileSync(join(dir, 'conjectures', 'a.yaml'), 'conjecture: a\nclaim: true\n');
  writeFileSync(join(dir, 'l.jsonl'), 'garbage\u0001\u0007 here\n{"v":1}\n');
  const r = runCli(['status', '--ledger', 'l.jsonl'], { cwd: dir });
  expect(r.code).toBe(2);
  expect(r.stderr).toMatch(/l\.jsonl:1:1/);
  expect(r.stderr).not.toMatch(/[\u0001\u0007]/);
});
