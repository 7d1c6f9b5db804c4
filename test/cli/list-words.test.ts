// hunch list WORD: functions and families found by a word of their names, topics or descriptions.

import { expect, test } from 'vitest';
import { runCli } from './run-cli.js';

test('hunch list blocks finds the set partition functions', () => {
  const r = runCli(['list', 'blocks', '--json']);
  expect(r.code, r.stderr).toBe(0);
  const names = JSON.parse(r.stdout).functions.map((f: { name: string }) => f.name);
  expect(names).toContain('blocks');
  expect(names).toContain('len');
  const topics = JSON.parse(runCli(['list', '--json']).stdout).functions;
  const topicOf = (n: string) => topics.find((f: { name: string }) => f.name === n).topic;
  expect([topicOf('dyck'), topicOf('asm'), topicOf('schur'), topicOf('setPartition')]).toEqual([
    'dyck paths',
    'alternating sign matrices',
    'symmetric functions',
    'set partitions',
  ]);
  expect(runCli(['list', 'zzzzqq']).code).toBe(2);
}, 60_000);
