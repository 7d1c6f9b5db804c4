// The LaTeX and Markdown exports of a fixed counterexample and of a fixed notebook state, pinned
// as snapshots, with the promises every export keeps: the re-check is stated, sampled ranges are
// called evidence, and hostile text cannot break out of its place.

import { describe, expect, it } from 'vitest';
import '../../../src/families/index.js';
import '../../../src/library/index.js';
import type { CounterexampleFile } from '../../../src/records/counterexample-file.js';
import type { ReplayResult } from '../../../src/records/replay.js';
import { computeStatus } from '../../../src/records/status.js';
import { counterexampleModel } from '../../../src/reports/export/counterexample-model.js';
import { counterexampleLatex, latexDocument, notebookLatex } from '../../../src/reports/export/latex-export.js';
import { counterexampleMarkdown, notebookMarkdown } from '../../../src/reports/export/markdown-export.js';
import { notebookEntry, type NotebookModel } from '../../../src/reports/export/notebook-model.js';
import { reportPage } from '../../../src/reports/html/report-page.js';
import { H1, rec } from '../../records/fixtures.js';

function file(over: Partial<CounterexampleFile> = {}): CounterexampleFile {
  return {
    format: 1,
    tool: '0.1.0',
    conjecture: 'maj-bounded-by-inv',
    hash: H1,
    statement: 'The major index never exceeds the number of inversions.',
    expect: 'fails',
    found: {
      phase: 'exhaustive',
      size: { n: 3 },
      seed: null,
      shrinkSteps: 0,
      shrunkFrom: null,
      failuresAtSize: 1,
      at: '2025-01-01T00:00:00Z',
    },
    bindings: { n: 3, w: { permutation: [1, 3, 2] }, r: { word: [1, 2, 1] } },
    values: { a: 2, b: 1, p: 'q^2 + 1/2*x[1]' },
    sides: [2, 1],
    plugins: [],
    replay: 'hunch replay counterexamples/maj-bounded-by-inv.yaml',
    defines: [],
    document: {
      conjecture: 'maj-bounded-by-inv',
      for: { n: '1..4', w: 'permutations(n)', r: 'reducedWords(longest(3))' },
      claim: 'maj(w) <= inv(w)',
    },
    ...over,
  };
}

const refutes = { verdict: 'refutes', missingPlugins: [] } as unknown as ReplayResult;
const holds = { verdict: 'holds', missingPlugins: [] } as unknown as ReplayResult;

function notebook(): NotebookModel {
  const records = [
    rec({ id: 'c1', size: { n: 1 } }),
    rec({ id: 'c1', size: { n: 2 } }),
    rec({ id: 'c1', phase: 'sample', size: { n: 9 }, cases: 100, seed: '7' }),
  ];
  const status = computeStatus([{ id: 'c1', file: 'conjectures/a.yaml', expect: 'holds', hash: H1 }], records);
  return {
    title: 'Notebook of the working group',
    generatedAt: '2025-01-02 10:00 UTC',
    tool: '0.1.0',
    entries: [notebookEntry(status.conjectures[0], 'Every case holds & <b>more</b>.', records, null)],
  };
}

describe('counterexample exports', () => {
  it('LaTeX snippet and document as pinned', () => {
    const m = counterexampleModel(file(), refutes);
    const tex = counterexampleLatex(m, { exhaustive: 'n = 1..2 exhaustive (3 cases)', sampled: 'none' });
    expect(tex).toMatchSnapshot();
    expect(tex).toContain('\\begin{tikzpicture}');
    expect(tex).toContain('x_{1}'); // the polynomial value typeset
    expect(tex).toContain('wiring diagram'); // the reduced word drawn as one
    expect(latexDocument('Counterexample', [tex])).toMatch(/^\\documentclass/);
  });

  it('Markdown as pinned, pictures as fenced text', () => {
    const md = counterexampleMarkdown(counterexampleModel(file(), refutes));
    expect(md).toMatchSnapshot();
    expect(md).toContain('```text');
  });

  it('says when the re-check does not confirm the file', () => {
    const m = counterexampleModel(file(), holds);
    expect(m.recheck.ok).toBe(false);
    expect(counterexampleMarkdown(m)).toContain('HOLDS for this case');
    expect(counterexampleModel(file(), null, 'the file cannot be read').recheck.text).toContain('not re-checked');
  });

  it('hostile text stays text', () => {
    const m = counterexampleModel(file({ statement: 'x}\\end{document}\\input{/etc/passwd} `code` | <script>' }), refutes);
    const tex = counterexampleLatex(m);
    expect(tex).not.toContain('\\end{document}\\input');
    expect(tex).not.toContain('\\input{');
    const md = counterexampleMarkdown(m);
    expect(md).not.toContain('<script>');
  });
});

describe('notebook exports', () => {
  it('LaTeX and Markdown status as pinned; sampled ranges are evidence', () => {
    const n = notebook();
    expect(notebookLatex(n)).toMatchSnapshot();
    expect(notebookMarkdown(n)).toMatchSnapshot();
    expect(notebookMarkdown(n)).toContain('evidence, not proof');
  });

  it('the report page is one file with nothing external and escaped text', () => {
    const html = reportPage(notebook());
    expect(html).toContain('evidence, not proof');
    expect(html).not.toMatch(/<script|<link|@import|url\(|src=/i);
    expect(html).toContain('Every case holds &amp; &lt;b&gt;more&lt;/b&gt;.');
    expect(html.match(/<tr class="conjecture"/g)?.length).toBe(1);
  });
});
