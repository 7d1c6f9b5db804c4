// Every YAML hazard of a file is printed in one run, each at its own line:column with its fix.

import { copyFileSync } from 'node:fs';
import { join } from 'node:path';
import { expect, test } from 'vitest';
import { ROOT, runCli, tempDir } from './run-cli.js';

test('a file with five hazards reports all five, one message each', () => {
  const dir = tempDir();
  copyFileSync(join(ROOT, 'test/cli/malformed/hazard-five.yaml'), join(dir, 'five.yaml'));
  const r = runCli(['check', 'five.yaml'], { cwd: dir });
  expect(r.code).toBe(2);
  const located = r.stderr.split('\n').filter((l) => /^five\.yaml:\d+:\d+: error: /.test(l));
  expect(located.map((l) => /^five\.yaml:(\d+:\d+)/.exec(l)![1])).toEqual(['3:16', '6:6', '7:19', '10:6', '11:32']);
  expect(r.stderr.match(/hint: /g)).toHaveLength(5);
  expect(r.stderr).toContain('claim: all(inv(w) <= a for w in permutations(n))');
}, 60_000);
