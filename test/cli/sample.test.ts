// hunch sample: random objects of a family with pictures, the JSON encoding, repeatable seeds, and
// exit code 2 with a clear message for an unknown family or bad arguments.

import { describe, expect, it } from 'vitest';
import { runCli } from './run-cli.js';

describe('hunch sample', () => {
  it('prints three permutations of 1..30 with pictures', () => {
    const r = runCli(['sample', 'permutations(30)', '--count', '3']);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('3 uniform random objects of permutations(30)');
    expect(r.stdout.match(/^\d\. perm\(\[/gm)?.length).toBe(3);
    expect(r.stdout.match(/dots at \(i, w\(i\)\)/g)?.length).toBe(3);
  }, 60_000);

  it('prints a Dyck path of semilength 20 with its mountain picture', () => {
    const r = runCli(['sample', 'dyckPaths(20)']);
    expect(r.code).toBe(0);
    const word = /dyck\("([UD]{40})"\)/.exec(r.stdout);
    expect(word).not.toBeNull();
    expect(r.stdout).toContain(word![1] + '\n'); // the word under the picture
  }, 60_000);

  it('--json prints one encoded object per line; the same seed gives the same objects, another seed others', () => {
    const a = runCli(['sample', 'setPartitions(12)', '--count', '5', '--json', '--seed', '7']);
    const b = runCli(['sample', 'setPartitions(12)', '--count', '5', '--json', '--seed', '7']);
    const c = runCli(['sample', 'setPartitions(12)', '--count', '5', '--json', '--seed', '8']);
    expect(a.code).toBe(0);
    const lines = a.stdout.trim().split('\n');
    expect(lines).toHaveLength(5);
    for (const l of lines) expect(Object.keys(JSON.parse(l))).toEqual(['setPartition']);
    expect(b.stdout).toBe(a.stdout);
    expect(c.stdout).not.toBe(a.stdout);
  }, 60_000);

  it('takes families with structured arguments', () => {
    const r = runCli(['sample', 'standardTableaux(partition([3, 2]))', '--count', '2']);
    expect(r.code).toBe(0);
    expect(r.stdout.match(/tableau\(\[\[/g)?.length).toBe(2);
  }, 60_000);

  it('an unknown family: exit 2 and the nearest name', () => {
    const r = runCli(['sample', 'dyckPath(5)']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('there is no family "dyckPath"; did you mean dyckPaths?');
    expect(r.stderr).not.toMatch(/at .*\.js:\d+/); // no stack trace
  }, 60_000);

  it('bad arguments and options: exit 2 with a clear message', () => {
    const neg = runCli(['sample', 'permutations(-1)']);
    expect(neg.code).toBe(2);
    expect(neg.stderr).toContain('n must be a nonnegative integer');
    const notCall = runCli(['sample', '3 + 4']);
    expect(notCall.code).toBe(2);
    expect(notCall.stderr).toContain('expected a family with its arguments');
    const count = runCli(['sample', 'permutations(3)', '--count', '0']);
    expect(count.code).toBe(2);
    expect(count.stderr).toContain('--count must be a whole number from 1 to 10000');
    const syntax = runCli(['sample', 'permutations(3']);
    expect(syntax.code).toBe(2);
  }, 60_000);
});
