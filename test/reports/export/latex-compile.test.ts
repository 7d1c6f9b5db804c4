// Every TikZ picture kind compiles with a real TeX system, and so does the --document export of
// every refuted conjecture of the bundled notebook; the PDF pages are turned into images and
// checked not to be blank. .ci/run installs pdflatex (texlive-latex-base, texlive-pictures) and
// pdftoppm (poppler-utils) from Debian's packages; where they are missing this prints SKIPPED.

import { spawnSync } from 'node:child_process';
import { readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { latexDocument } from '../../../src/reports/export/latex-export.js';
import { sceneToTikz } from '../../../src/reports/render/tikz.js';
import { TIKZ_PREAMBLE } from '../../../src/reports/render/tikz.js';
import { sceneOf } from '../../../src/reports/scenes/index.js';
import { runCli, tempDir } from '../../cli/run-cli.js';
import { checkedNotebook, onPath, type CheckedNotebook } from '../checked-notebook.js';
import { exampleValue, KIND_EXAMPLES } from './kinds.js';

const haveTex = onPath('pdflatex') && onPath('pdftoppm');
if (!haveTex)
  console.log(
    'SKIPPED: LaTeX compile tests: pdflatex or pdftoppm is not installed (Debian: texlive-latex-base texlive-pictures poppler-utils)',
  );

/** Compile a .tex file in its folder; returns the log's tail when it fails. */
function pdflatex(dir: string, file: string): { ok: boolean; log: string } {
  const r = spawnSync('pdflatex', ['-interaction=nonstopmode', '-halt-on-error', '-no-shell-escape', file], {
    cwd: dir,
    encoding: 'utf8',
    timeout: 120_000,
  });
  return { ok: r.status === 0, log: (r.stdout ?? '').slice(-3000) };
}

/** The darkest gray level on each page (0 black .. 255 white), from pdftoppm's PGM output. */
function darkestPerPage(dir: string, pdf: string): number[] {
  const r = spawnSync('pdftoppm', ['-r', '30', '-gray', pdf, join(dir, 'page')], { encoding: 'utf8', timeout: 60_000 });
  expect(r.status, r.stderr).toBe(0);
  return readdirSync(dir)
    .filter((f) => /^page-\d+\.pgm$/.test(f))
    .sort()
    .map((f) => {
      const bytes = readFileSync(join(dir, f));
      // P5 <w> <h> <max>\n then one byte per pixel
      const header = bytes
        .subarray(0, 64)
        .toString('latin1')
        .match(/^P5\s+(\d+)\s+(\d+)\s+(\d+)\s/);
      if (!header) throw new Error(`${f} is not a binary PGM`);
      const pixels = bytes.subarray(header[0].length);
      let min = 255;
      for (const p of pixels) if (p < min) min = p;
      return min;
    });
}

describe.skipIf(!haveTex)('LaTeX exports compile with pdflatex', () => {
  let nb: CheckedNotebook;
  const dirs: string[] = [];
  const work = () => {
    const d = tempDir('hunch-tex-');
    dirs.push(d);
    return d;
  };
  beforeAll(() => {
    nb = checkedNotebook();
  }, 240_000);
  afterAll(() => {
    nb?.dispose();
    for (const d of dirs) rmSync(d, { recursive: true, force: true });
  });

  it('one picture of every kind, in one document', () => {
    const dir = work();
    const bodies = KIND_EXAMPLES.map((k) => {
      const scene = sceneOf(exampleValue(k.text), k.hint)!;
      return `\\paragraph{${k.name}}\n${TIKZ_PREAMBLE}\n${sceneToTikz(scene)}`;
    });
    writeFileSync(join(dir, 'kinds.tex'), latexDocument('Every picture kind', bodies));
    const r = pdflatex(dir, 'kinds.tex');
    expect(r.ok, r.log).toBe(true);
    const pages = darkestPerPage(dir, join(dir, 'kinds.pdf'));
    expect(pages.length).toBeGreaterThan(0);
    for (const darkest of pages) expect(darkest).toBeLessThan(100);
  }, 180_000);

  it('hunch export --latex --document of every refuted conjecture of the notebook', () => {
    expect(nb.counterexamples.length).toBeGreaterThanOrEqual(5);
    for (const f of nb.counterexamples) {
      const dir = work();
      const out = runCli(['export', join('counterexamples', f), '--latex', '--document', '--allow-plugins'], { cwd: nb.dir });
      expect(out.code, out.stderr).toBe(0);
      expect(out.stdout).toContain('re-checked by this export: the case still refutes');
      writeFileSync(join(dir, 'x.tex'), out.stdout);
      const r = pdflatex(dir, 'x.tex');
      expect(r.ok, `${f}:\n${r.log}`).toBe(true);
      for (const darkest of darkestPerPage(dir, join(dir, 'x.pdf'))) expect(darkest).toBeLessThan(100);
    }
  }, 600_000);

  it('the notebook status as a whole document', () => {
    const dir = work();
    const out = runCli(['export', 'conjectures', '--latex', '--document', '--allow-plugins'], { cwd: nb.dir });
    expect(out.code, out.stderr).toBe(0);
    expect(out.stdout).toContain('evidence, not proof');
    writeFileSync(join(dir, 'status.tex'), out.stdout);
    const r = pdflatex(dir, 'status.tex');
    expect(r.ok, r.log).toBe(true);
  }, 180_000);
});
