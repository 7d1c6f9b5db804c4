// A folder received from someone else must not run code. Its hunch.yaml may list a plugin, but
// hunch loads it only once the user trusted the project (hunch trust, a per-user allow list keyed
// by the hunch.yaml's real path and the plugin files' sha256) or with --allow-plugins; replay
// never loads plugins unless asked.

import { appendFileSync, cpSync, existsSync, mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, describe, expect, test } from 'vitest';
import { runCli, tempDir, TEST_CONFIG_DIR } from './run-cli.js';

const made: string[] = [];
afterEach(() => {
  for (const d of made.splice(0)) rmSync(d, { recursive: true, force: true });
  rmSync(join(TEST_CONFIG_DIR, 'trusted-projects.json'), { force: true });
});

function dir(prefix: string): string {
  const d = tempDir(prefix);
  made.push(d);
  return d;
}

/** A coauthor's folder: hunch.yaml listing a plugin that leaves a marker file when it is loaded. */
function coauthorFolder(marker: string): string {
  const d = dir('hunch-coauthor-');
  writeFileSync(join(d, 'hunch.yaml'), 'conjectures: conjectures\nplugins:\n  - plugins/stat.mjs\n');
  mkdirSync(join(d, 'plugins'));
  writeFileSync(
    join(d, 'plugins', 'stat.mjs'),
    `import { writeFileSync } from 'node:fs';\nwriteFileSync(${JSON.stringify(marker)}, 'the plugin ran');\n` +
      `export const functions = [{ name: 'twiceOf', params: ['integer'], returns: 'integer', description: 'twice n', impl: (n) => 2 * n }];\n`,
  );
  mkdirSync(join(d, 'conjectures'));
  writeFileSync(
    join(d, 'conjectures', 'uses.yaml'),
    'conjecture: twice-is-sum\nexpect: holds\nfor:\n  n: 1..5\nclaim: twiceOf(n) == n + n\n',
  );
  writeFileSync(
    join(d, 'conjectures', 'plain.yaml'),
    'conjecture: maj-bounded\nexpect: fails\nfor:\n  n: 1..4\n  w: permutations(n)\nclaim: maj(w) <= inv(w)\n',
  );
  return d;
}

describe('plugin consent', { timeout: 120_000 }, () => {
  test('check and replay of a received folder run none of its code', () => {
    const marker = join(dir('hunch-marker-'), 'ran');
    const folder = coauthorFolder(marker);
    // The coauthor's own counterexample file, made where their plugin ran (a separate copy).
    const theirs = dir('hunch-theirs-');
    cpSync(folder, theirs, { recursive: true });
    const made = runCli(['check', 'conjectures/plain.yaml', '--allow-plugins'], { cwd: theirs });
    expect(made.code, made.stderr).toBe(0);
    rmSync(marker);
    mkdirSync(join(folder, 'counterexamples'));
    cpSync(join(theirs, 'counterexamples', 'maj-bounded.yaml'), join(folder, 'counterexamples', 'x.yaml'));
    const here = dir('hunch-user-');

    const rep = runCli(['replay', join(folder, 'counterexamples', 'x.yaml')], { cwd: here });
    expect(rep.code, rep.stderr).toBe(0); // it still refutes, checked without any plugin
    expect(existsSync(marker)).toBe(false);

    const chk = runCli(['check', folder], { cwd: here });
    expect(existsSync(marker)).toBe(false);
    expect(chk.code).toBe(2);
    expect(chk.stderr).toContain('not loading the plugin plugins/stat.mjs');
    expect(chk.stderr).toContain('has not been trusted');
    expect(chk.stderr).toMatch(/unknown function twiceOf.*were not loaded.*hunch trust/s);
    expect(chk.stderr).not.toMatch(/internal error|\n\s+at .*:\d+:\d+/);

    for (const args of [
      ['status', folder],
      ['list', 'functions'],
      ['eval', '1 + 1'],
      ['table', 'n', '--over', 'n=1..3'],
    ]) {
      const r = runCli(args, { cwd: folder });
      expect(r.code, `${args.join(' ')}: ${r.stderr}`).toBe(0);
      expect(r.stderr).toContain('not loading the plugin');
    }
    const ev = runCli(['eval', 'twiceOf(2)'], { cwd: folder });
    expect(ev.code).toBe(2);
    expect(ev.stderr).toContain('hunch trust');
    expect(existsSync(marker)).toBe(false);
  });

  test('a conjecture file with no plugin use still checks in an untrusted project (with a note)', () => {
    const marker = join(dir('hunch-marker-'), 'ran');
    const folder = coauthorFolder(marker);
    const r = runCli(['check', 'conjectures/plain.yaml', '--no-ledger'], { cwd: folder });
    expect(r.code, r.stderr).toBe(0);
    expect(r.stderr).toContain('not loading the plugin plugins/stat.mjs');
    expect(existsSync(marker)).toBe(false);
  });

  test('a hunch.yaml in a shared parent folder (such as /tmp) runs nothing', () => {
    const marker = join(dir('hunch-marker-'), 'ran');
    const parent = coauthorFolder(marker);
    mkdirSync(join(parent, 'mine'));
    writeFileSync(join(parent, 'mine', 'a.yaml'), 'conjecture: trivial\nexpect: holds\nfor:\n  n: 1..3\nclaim: n == n\n');
    const r = runCli(['check', 'a.yaml', '--no-ledger'], { cwd: join(parent, 'mine') });
    expect(r.code, r.stderr).toBe(0);
    expect(existsSync(marker)).toBe(false);
  });

  test('hunch trust shows what it trusts; then the plugins run; editing a plugin withdraws the trust', () => {
    const marker = join(dir('hunch-marker-'), 'ran');
    const folder = coauthorFolder(marker);
    const tr = runCli(['trust', folder]);
    expect(tr.code, tr.stderr).toBe(0);
    expect(tr.stdout).toContain('plugins/stat.mjs');
    expect(tr.stdout).toMatch(/sha256 [0-9a-f]{64}/);
    expect(existsSync(marker)).toBe(false); // trusting hashes the files; it runs nothing
    expect(readdirSync(TEST_CONFIG_DIR)).toContain('trusted-projects.json');

    const r = runCli(['check', '--no-ledger'], { cwd: folder });
    expect(r.code, r.stderr).toBe(0);
    expect(r.stderr).not.toContain('not loading');
    expect(existsSync(marker)).toBe(true);
    rmSync(marker);

    appendFileSync(join(folder, 'plugins', 'stat.mjs'), '\n// changed\n');
    const again = runCli(['check', '--no-ledger'], { cwd: folder });
    expect(again.code).toBe(2);
    expect(again.stderr).toContain('plugins/stat.mjs changed after the project was trusted');
    expect(existsSync(marker)).toBe(false);

    const once = runCli(['check', '--no-ledger', '--allow-plugins'], { cwd: folder });
    expect(once.code, once.stderr).toBe(0);
    expect(existsSync(marker)).toBe(true);
    rmSync(marker);

    expect(runCli(['trust', '--forget', folder]).stdout).toContain('No longer trusted');
    expect(JSON.parse(readFileSync(join(TEST_CONFIG_DIR, 'trusted-projects.json'), 'utf8')).projects).toEqual([]);
  });

  test('replay loads the local plugins only with --allow-plugins', () => {
    const marker = join(dir('hunch-marker-'), 'ran');
    const folder = coauthorFolder(marker);
    writeFileSync(
      join(folder, 'conjectures', 'uses.yaml'),
      'conjecture: twice-small\nexpect: fails\nfor:\n  n: 1..5\nclaim: twiceOf(n) < 5\n',
    );
    const made = runCli(['check', 'conjectures/uses.yaml', '--allow-plugins'], { cwd: folder });
    expect(made.code, made.stderr).toBe(0);
    rmSync(marker);
    runCli(['trust', folder]);
    const rep = runCli(['replay', 'counterexamples/twice-small.yaml'], { cwd: folder });
    expect(rep.code).toBe(2);
    expect(rep.stderr).toContain('--allow-plugins');
    expect(existsSync(marker)).toBe(false);
    const ok = runCli(['replay', 'counterexamples/twice-small.yaml', '--allow-plugins'], { cwd: folder });
    expect(ok.code, ok.stderr).toBe(0);
    expect(existsSync(marker)).toBe(true);
  });
});
