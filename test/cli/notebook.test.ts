// End-to-end checks on the bundled notebook: a sampled failure at size 20 or
// more is shrunk, written to counterexamples/, drawn, and replayed from the file alone; the
// plugin example works and editing it makes its conjectures stale.

import { cpSync, existsSync, appendFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { ROOT, runCli, tempDir } from './run-cli.js';

function copyNotebook(): string {
  const dir = tempDir('hunch-notebook-');
  cpSync(join(ROOT, 'conjectures'), join(dir, 'conjectures'), { recursive: true });
  cpSync(join(ROOT, 'hunch.yaml'), join(dir, 'hunch.yaml'));
  return dir;
}

describe('the bundled notebook', { timeout: 120_000 }, () => {
  test('a sampled failure at n >= 20 is shrunk, drawn, written and replayed from the file alone', () => {
    const dir = copyNotebook();
    const r = runCli(
      ['check', 'conjectures/permutation-statistics.yaml', '--id', 'few-cycles', '--no-exhaustive', '--sample', 'n=20..24'],
      { cwd: dir },
    );
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toMatch(/found by random sampling at n = 2\d/);
    expect(r.stdout).toMatch(/shrunk in \d+ steps? to n = 6/);
    expect(r.stdout).toContain('perm([1, 2, 3, 4, 5, 6])');
    expect(r.stdout).toContain('●'); // the permutation diagram
    const file = join(dir, 'counterexamples', 'few-cycles.yaml');
    expect(existsSync(file)).toBe(true);

    // A coauthor gets only the file: replay it in an empty folder.
    const coauthor = tempDir('hunch-coauthor-');
    cpSync(file, join(coauthor, 'few-cycles.yaml'));
    const rep = runCli(['replay', 'few-cycles.yaml'], { cwd: coauthor });
    expect(rep.code, rep.stderr + rep.stdout).toBe(0);
  });

  test('the plugin example works, and editing the plugin makes its conjectures stale', () => {
    const dir = copyNotebook();
    const r = runCli(['check', 'conjectures/alternating-runs.yaml', '--allow-plugins'], { cwd: dir });
    expect(r.code, r.stderr + r.stdout).toBe(0);
    let st = runCli(['status', '--json', '--allow-plugins'], { cwd: dir });
    expect(st.code, st.stderr).toBe(0);
    expect(st.stdout).toContain('alternating-runs-reverse');
    const before = JSON.parse(st.stdout);
    const entry = (doc: any) => (doc.conjectures ?? doc.results ?? doc).find?.((c: any) => c.id === 'alternating-runs-reverse');
    expect(JSON.stringify(entry(before) ?? before)).not.toMatch(/"stale":\s*[1-9]/);

    appendFileSync(join(dir, 'conjectures', 'plugins', 'runs.mjs'), '\n// an edit\n');
    st = runCli(['status', '--allow-plugins'], { cwd: dir });
    expect(st.code, st.stderr).toBe(0);
    expect(st.stdout + st.stderr).toMatch(/alternating-runs-reverse: \d+ stale records/);
  });

  test('the whole notebook comes out as its expectations say', () => {
    const dir = copyNotebook();
    const r = runCli(['check', '--json', '--allow-plugins'], { cwd: dir, timeout: 120_000 });
    expect(r.code, r.stderr).toBe(0);
    const doc = JSON.parse(r.stdout);
    expect(doc.results.length).toBeGreaterThanOrEqual(10);
    for (const res of doc.results) {
      const ok = res.expect === 'fails' ? res.outcome === 'fails' : res.outcome === 'holds';
      expect(ok, `${res.id}: ${res.outcome}`).toBe(true);
    }
    expect(doc.results.some((x: any) => x.expect === 'fails')).toBe(true);
    expect(doc.results.some((x: any) => x.expect === 'holds')).toBe(true);
  }, 120_000);
});
