// Every YAML example in README.md is a real conjecture file: it loads, and its result agrees with
// its `expect:` (so the tour never shows something hunch would reject).

import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { expect, test } from 'vitest';
import { ROOT, runCli, tempDir } from './run-cli.js';

const readme = readFileSync(join(ROOT, 'README.md'), 'utf8');
const blocks = [...readme.matchAll(/```yaml\n([\s\S]*?)```/g)].map((m) => m[1]);

test('the README has YAML examples', () => {
  expect(blocks.length).toBeGreaterThanOrEqual(3);
});

test.each(blocks.map((b, i) => [i + 1, b] as const))('README example %i checks as its expect says', (_i, text) => {
  const dir = tempDir('hunch-readme-');
  writeFileSync(join(dir, 'example.yaml'), text);
  const r = runCli(['check', 'example.yaml', '--no-ledger'], { cwd: dir, timeout: 120_000 });
  expect(r.code, r.stderr + r.stdout).toBe(0);
});
