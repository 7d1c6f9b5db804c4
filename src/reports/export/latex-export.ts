// LaTeX exports: a snippet to paste into a paper (needs \usepackage{tikz}; it defines its own
// colours) or, with `document`, a whole .tex file that pdflatex compiles as it is.

import { TOOL_VERSION } from '../../version.js';
import { exprToLatex } from '../latex/math.js';
import { latexCode, latexText } from '../latex/text.js';
import { sceneToTikz, TIKZ_PREAMBLE } from '../render/tikz.js';
import type { CounterexampleModel, ShownValue } from './counterexample-model.js';
import type { NotebookEntry, NotebookModel } from './notebook-model.js';
import { EVIDENCE_NOTE } from './wording.js';

/** Past this length a value is shown as code, cut, rather than typeset (it would not fit a page). */
const MAX_MATH = 1500;

function valueMath(v: ShownValue): string {
  if (v.text.length > MAX_MATH) return `${latexCode(v.text.slice(0, MAX_MATH))}\\dots{} (${v.text.length - MAX_MATH} more characters)`;
  return `$${exprToLatex(v.text)}$`;
}

function shownValue(v: ShownValue): string {
  const math =
    v.text.length > MAX_MATH ? `$${exprToLatex(v.name)} =$ ${valueMath(v)}` : `$${exprToLatex(v.name)} = ${exprToLatex(v.text)}$`;
  const lines = [`\\item ${math}`];
  if (v.scene) {
    lines.push('', '\\smallskip', sceneToTikz(v.scene), '', `{\\footnotesize ${latexText(v.scene.caption)}}`);
  }
  return lines.join('\n');
}

export interface CoverageLines {
  exhaustive: string;
  sampled: string;
}

export function counterexampleLatex(m: CounterexampleModel, coverage: CoverageLines | null = null): string {
  const out = [
    `% Exported by hunch ${TOOL_VERSION}: the counterexample to ${m.id}. Needs \\usepackage{tikz, amssymb}.`,
    TIKZ_PREAMBLE,
    `\\paragraph{Counterexample to ${latexCode(m.id)}.} ${latexText(m.statement)}`,
    '\\begin{description}',
    `\\item[Claim] ${latexCode(m.claim)}`,
    `\\item[Expected] ${latexText(m.expect)}`,
    `\\item[Found by] ${latexText(m.found)}`,
    `\\item[Re-checked] ${latexText(m.recheck.text)}`,
  ];
  if (coverage) {
    out.push(`\\item[Verified] ${latexText(coverage.exhaustive)}`);
    out.push(`\\item[Sampled] ${latexText(coverage.sampled)} (evidence, not proof)`);
  }
  out.push('\\end{description}', '', '\\noindent\\textbf{The case.}', '\\begin{itemize}');
  for (const b of m.bindings) out.push(shownValue(b));
  out.push('\\end{itemize}');
  if (m.values.length) {
    out.push('\\noindent\\textbf{Its values.}', '\\begin{itemize}');
    for (const v of m.values) out.push(shownValue(v));
    out.push('\\end{itemize}');
  }
  if (m.sides) out.push(`\\noindent The two sides of the claim: $${exprToLatex(m.sides[0])}$ and $${exprToLatex(m.sides[1])}$.`, '');
  if (m.witnesses.length) {
    out.push('\\noindent\\textbf{Witnesses.}', '\\begin{itemize}');
    for (const w of m.witnesses)
      out.push(`\\item ${latexCode(w.at)} is decided by ${w.bindings ? latexText(w.bindings) : 'its element'}: ${latexCode(w.value)}`);
    out.push('\\end{itemize}');
  }
  out.push(`\\noindent Replay: ${latexCode(m.replay)}`);
  return out.join('\n') + '\n';
}

function statusRow(e: NotebookEntry): string {
  const latest = e.agrees === false ? `\\textbf{${latexText(e.latest)}}` : latexText(e.latest);
  return `${latexCode(e.id)} & ${latexText(e.expect)} & ${latest} & ${latexText(e.exhaustive)} & ${latexText(e.sampled)} \\\\`;
}

export function notebookLatex(n: NotebookModel): string {
  const out = [
    `% Exported by hunch ${TOOL_VERSION}: the state of ${n.title} on ${n.generatedAt}.`,
    `\\paragraph{${latexText(n.title)}.} ${latexText(EVIDENCE_NOTE)}`,
    '',
    '{\\small',
    '\\begin{tabular}{p{0.2\\linewidth}p{0.07\\linewidth}p{0.09\\linewidth}p{0.27\\linewidth}p{0.22\\linewidth}}',
    '\\hline',
    'conjecture & expect & latest & verified (exhaustive) & sampled (evidence) \\\\',
    '\\hline',
    ...n.entries.map(statusRow),
    '\\hline',
    '\\end{tabular}}',
  ];
  return out.join('\n') + '\n';
}

/** Wrap snippets in a document pdflatex compiles with only the base system and TikZ. */
export function latexDocument(title: string, bodies: readonly string[]): string {
  return [
    '\\documentclass[11pt]{article}',
    '\\usepackage{amsmath, amssymb}',
    '\\usepackage{tikz}',
    '\\setlength{\\parindent}{0pt}',
    '\\setlength{\\emergencystretch}{3em}',
    `\\title{${latexText(title)}}`,
    `\\date{exported by hunch ${TOOL_VERSION}}`,
    '\\begin{document}',
    '\\maketitle',
    ...bodies.flatMap((b) => [b, '\\bigskip']),
    '\\end{document}',
    '',
  ].join('\n');
}
