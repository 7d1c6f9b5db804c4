// hunch export and hunch report from the command line, on a small project of one refuted
// conjecture: each format, the option errors (exit 2), and a file that does not refute.

import { readFileSync, rmSync, writeFileSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runCli, tempDir } from './run-cli.js';

const CONJECTURE = `conjecture: maj-at-most-inv
statement: The major index never exceeds the number of inversions (false).
expect: fails
for:
  n: 1..4
  w: permutations(n)
claim: maj(w) <= inv(w)
`;

describe('hunch export and hunch report', { timeout: 120_000 }, () => {
  let dir: string;
  beforeAll(() => {
    dir = tempDir('hunch-export-cli-');
    mkdirSync(join(dir, 'conjectures'));
    writeFileSync(join(dir, 'hunch.yaml'), 'conjectures:\n  - conjectures\n');
    writeFileSync(join(dir, 'conjectures', 'maj.yaml'), CONJECTURE);
    const r = runCli(['check'], { cwd: dir });
    expect(r.code, r.stderr + r.stdout).toBe(0);
  }, 120_000);
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  const cx = 'counterexamples/maj-at-most-inv.yaml';

  it('Markdown by default, with the checked ranges and the re-check', () => {
    const r = runCli(['export', cx], { cwd: dir });
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toContain('### Counterexample to `maj-at-most-inv`');
    expect(r.stdout).toContain('perm([1, 3, 2])');
    expect(r.stdout).toContain('still refutes');
    expect(r.stdout).toContain('**Verified:** n = 1..2 exhaustive');
  });

  it('LaTeX snippet and whole document', () => {
    const snippet = runCli(['export', cx, '--latex'], { cwd: dir });
    expect(snippet.code, snippet.stderr).toBe(0);
    expect(snippet.stdout).toContain('\\begin{tikzpicture}');
    expect(snippet.stdout).not.toContain('\\documentclass');
    const doc = runCli(['export', cx, '--latex', '--document', '-o', 'x.tex'], { cwd: dir });
    expect(doc.code, doc.stderr).toBe(0);
    expect(readFileSync(join(dir, 'x.tex'), 'utf8')).toMatch(/^\\documentclass[\s\S]*\\end\{document\}\n$/);
  });

  it('one picture as SVG, of the first binding with one or of a named one', () => {
    const r = runCli(['export', cx, '--svg'], { cwd: dir });
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toMatch(/^<svg xmlns="http:\/\/www.w3.org\/2000\/svg"[\s\S]*<title>w = 1 3 2[\s\S]*<\/svg>\n$/);
    expect(runCli(['export', cx, '--svg', '--binding', 'n'], { cwd: dir }).code).toBe(2);
    expect(runCli(['export', cx, '--svg', '--binding', 'nope'], { cwd: dir }).stderr).toContain('it has n, w');
  });

  it('the notebook status in each format', () => {
    const md = runCli(['export', 'conjectures'], { cwd: dir });
    expect(md.code, md.stderr).toBe(0);
    expect(md.stdout).toContain('| `maj-at-most-inv` | fails | fails |');
    const one = runCli(['export', 'conjectures', '--id', 'maj-at-most-inv', '--latex'], { cwd: dir });
    expect(one.code, one.stderr).toBe(0);
    expect(runCli(['export', 'conjectures', '--id', 'nothing-like-this'], { cwd: dir }).code).toBe(2);
  });

  it('option mistakes are exit 2 with a message and no stack trace', () => {
    for (const args of [
      ['export', cx, '--latex', '--markdown'],
      ['export', cx, '--document'],
      ['export', 'conjectures', '--svg'],
      ['export', cx, '--binding', 'w'],
      ['export', 'no/such/file.yaml'],
    ]) {
      const r = runCli(args, { cwd: dir });
      expect(r.code, args.join(' ')).toBe(2);
      expect(r.stderr).toMatch(/error/);
      expect(r.stderr).not.toMatch(/\n\s+at .*\(.*:\d+:\d+\)/);
    }
  });

  it('a file whose case does not refute is exported saying so', () => {
    const text = readFileSync(join(dir, cx), 'utf8').replace('claim: maj(w) <= inv(w)', 'claim: maj(w) <= inv(w) + 10');
    writeFileSync(join(dir, 'edited.yaml'), text);
    const r = runCli(['export', 'edited.yaml'], { cwd: dir });
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toMatch(/HOLDS for this case|not re-checked/);
    expect(r.stdout).not.toContain('still refutes');
  });

  it('hunch report writes one self-contained page', () => {
    const r = runCli(['report', '-o', 'report.html', '--title', 'Small notebook'], { cwd: dir });
    expect(r.code, r.stderr).toBe(0);
    const html = readFileSync(join(dir, 'report.html'), 'utf8');
    expect(html).toMatch(/^<!doctype html>/);
    expect(html).toContain('<title>Small notebook');
    expect(html).toContain('id="cx-maj-at-most-inv"');
    expect(html).toContain('<svg');
    expect(html).not.toMatch(/<script|<link|src=/i);
  });
});
