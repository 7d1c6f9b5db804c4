// hunch export FILE: a counterexample file, a conjecture's result or a notebook's status as LaTeX
// (a snippet, or with --document a whole .tex file), Markdown, or one picture as SVG.

import { readFileSync, statSync } from 'node:fs';
import { dirname } from 'node:path';
import { InputError } from '../../base/errors.js';
import '../../families/index.js';
import '../../library/index.js';
import { writeFileAtomic } from '../../records/atomic-write.js';
import { ALLOW_PLUGINS_HELP, openCommandProject } from '../project.js';
import type { CounterexampleModel } from '../../reports/export/counterexample-model.js';
import { counterexampleLatex, latexDocument, notebookLatex, type CoverageLines } from '../../reports/export/latex-export.js';
import { loadCounterexample, loadNotebook } from '../../reports/export/load-notebook.js';
import { counterexampleMarkdown, notebookMarkdown } from '../../reports/export/markdown-export.js';
import type { NotebookModel } from '../../reports/export/notebook-model.js';
import { sceneToSvg } from '../../reports/render/svg.js';
import { EXIT } from '../errors.js';
import type { AddCommand } from './index.js';

interface ExportFlags {
  latex?: boolean;
  document?: boolean;
  markdown?: boolean;
  svg?: boolean;
  binding?: string;
  id?: string;
  ledger?: string;
  output?: string;
  allowPlugins?: boolean;
}

/** A counterexample file has these top-level keys; a conjecture file has `conjecture:` with `claim:`. */
function looksLikeCounterexample(path: string): boolean {
  try {
    if (!statSync(path).isFile()) return false;
    const text = readFileSync(path, 'utf8');
    return /^bindings:/m.test(text) && /^found:/m.test(text) && /^hash:/m.test(text);
  } catch {
    return false;
  }
}

function format(flags: ExportFlags): 'latex' | 'markdown' | 'svg' {
  const chosen = (['latex', 'markdown', 'svg'] as const).filter((f) => flags[f]);
  if (chosen.length > 1)
    throw new InputError(`choose one of --latex, --markdown and --svg (got ${chosen.map((c) => `--${c}`).join(' and ')})`);
  if (flags.document && chosen[0] !== 'latex') throw new InputError('--document goes with --latex (it writes a whole .tex file)');
  return chosen[0] ?? 'markdown';
}

function svgOf(m: CounterexampleModel, binding: string | undefined): string {
  const all = [...m.bindings, ...m.values];
  if (binding !== undefined) {
    const v = all.find((b) => b.name === binding);
    if (!v)
      throw new InputError(`the counterexample has no binding or value named ${binding} (it has ${all.map((b) => b.name).join(', ')})`);
    if (!v.scene) throw new InputError(`${binding} = ${v.text.slice(0, 80)} has no picture (pictures exist for combinatorial objects)`);
    return sceneToSvg(v.scene) + '\n';
  }
  const v = m.bindings.find((b) => b.scene) ?? m.values.find((b) => b.scene);
  if (!v || !v.scene) throw new InputError(`no binding of the counterexample to ${m.id} has a picture; --svg draws combinatorial objects`);
  return sceneToSvg(v.scene) + '\n';
}

function notebookText(n: NotebookModel, fmt: 'latex' | 'markdown', document: boolean): string {
  const cxs = n.entries.filter((e) => e.counterexample);
  const cover = (e: (typeof cxs)[number]): CoverageLines => ({ exhaustive: e.exhaustive, sampled: e.sampled });
  if (fmt === 'markdown') return [notebookMarkdown(n), ...cxs.map((e) => counterexampleMarkdown(e.counterexample!, cover(e)))].join('\n');
  const bodies = [notebookLatex(n), ...cxs.map((e) => counterexampleLatex(e.counterexample!, cover(e)))];
  return document ? latexDocument(n.title, bodies) : bodies.join('\n\\bigskip\n');
}

export const addExportCommand: AddCommand = (program, t, setExit) => {
  program
    .command('export')
    .description("a counterexample, a result or a notebook's status as LaTeX, Markdown or SVG, for a paper, a mail or a tracker")
    .argument('<file>', 'a counterexample file, a conjecture file, or a folder of conjectures')
    .option('--latex', 'LaTeX with TikZ pictures (a snippet; needs \\usepackage{tikz})')
    .option('--document', 'with --latex: a whole .tex file that pdflatex compiles as it is')
    .option('--markdown', 'Markdown with the pictures as fenced text (the default)')
    .option('--svg', "one picture as SVG (of a counterexample file's first binding that has one)")
    .option('--binding <NAME>', 'with --svg: the binding or value to draw')
    .option('--id <ID>', 'only the conjecture with this id (for a conjecture file or folder)')
    .option('--ledger <PATH>', "the ledger to read (default: the project's)")
    .option('-o, --output <FILE>', 'write to this file instead of standard output')
    .option('--allow-plugins', ALLOW_PLUGINS_HELP)
    .action(async (file: string, flags: ExportFlags) => {
      const fmt = format(flags);
      if (flags.binding !== undefined && fmt !== 'svg') throw new InputError('--binding goes with --svg');
      let text: string;
      if (looksLikeCounterexample(file)) {
        const project = await openCommandProject(t, dirname(file), { allowPlugins: flags.allowPlugins });
        const m = loadCounterexample(file, project);
        let cover: CoverageLines | null = null;
        try {
          const n = loadNotebook(project, [], { id: m.id, ledger: flags.ledger }).model.entries[0];
          if (n) cover = { exhaustive: n.exhaustive, sampled: n.sampled };
        } catch (e) {
          if (!(e instanceof InputError)) throw e; // the conjecture is not in this project: no ranges to show
        }
        if (fmt === 'svg') text = svgOf(m, flags.binding);
        else if (fmt === 'markdown') text = counterexampleMarkdown(m, cover);
        else
          text = flags.document
            ? latexDocument(`Counterexample to ${m.id}`, [counterexampleLatex(m, cover)])
            : counterexampleLatex(m, cover);
      } else {
        if (fmt === 'svg')
          throw new InputError(`--svg draws one picture: give it a counterexample file (counterexamples/<id>.yaml), not ${file}`);
        const project = await openCommandProject(t, file, { allowPlugins: flags.allowPlugins });
        const { model, warnings } = loadNotebook(project, [file], { id: flags.id, ledger: flags.ledger });
        for (const w of warnings) t.err(`${t.color.yellow('warning:')} ${w}\n`);
        text = notebookText(model, fmt, Boolean(flags.document));
      }
      if (flags.output) writeFileAtomic(flags.output, text);
      else t.out(text);
      setExit(EXIT.ok);
    });
};
