// Markdown exports, for an issue tracker or a mail: the same content as the LaTeX export, the
// pictures as fenced text (the terminal pictures).

import { TOOL_VERSION } from '../../version.js';
import type { CounterexampleModel, ShownValue } from './counterexample-model.js';
import type { CoverageLines } from './latex-export.js';
import type { NotebookModel } from './notebook-model.js';
import { EVIDENCE_NOTE } from './wording.js';

/** Code spans that survive any content: a fence longer than the longest run of backquotes inside. */
function code(s: string): string {
  const runs = s.match(/`+/g) ?? [];
  const fence = '`'.repeat(Math.max(0, ...runs.map((r) => r.length)) + 1);
  return `${fence}${fence.length > 1 || s.startsWith('`') || s.endsWith('`') ? ' ' : ''}${s.replace(/\n/g, ' ')}${fence.length > 1 || s.startsWith('`') || s.endsWith('`') ? ' ' : ''}${fence}`;
}

/** Escape characters Markdown would read as formatting in running text. */
function text(s: string): string {
  return s.replace(/[\\`*_{}[\]<>#|]/g, (c) => `\\${c}`).replace(/\n/g, ' ');
}

function fenced(picture: string): string[] {
  return ['```text', ...picture.split('\n'), '```'];
}

function shown(v: ShownValue): string[] {
  const out = [`- ${code(v.name)} = ${code(v.text)}`];
  if (v.picture) out.push('', ...fenced(v.picture), '');
  return out;
}

export function counterexampleMarkdown(m: CounterexampleModel, coverage: CoverageLines | null = null): string {
  const out = [
    `### Counterexample to ${code(m.id)}`,
    '',
    `> ${text(m.statement)}`,
    '',
    `- **Claim:** ${code(m.claim)}`,
    `- **Expected:** ${m.expect}`,
    `- **Found by:** ${text(m.found)}`,
    `- **Re-checked:** ${text(m.recheck.text)}`,
  ];
  if (coverage) out.push(`- **Verified:** ${text(coverage.exhaustive)}`, `- **Sampled:** ${text(coverage.sampled)} (evidence, not proof)`);
  out.push('', '**The case**', '', ...m.bindings.flatMap(shown));
  if (m.values.length) out.push('', '**Its values**', '', ...m.values.flatMap(shown));
  if (m.sides) out.push('', `The two sides of the claim: ${code(m.sides[0])} and ${code(m.sides[1])}.`);
  if (m.witnesses.length) {
    out.push('', '**Witnesses**', '');
    for (const w of m.witnesses)
      out.push(`- ${code(w.at)} is decided by ${w.bindings ? code(w.bindings) : 'its element'}: ${code(w.value)}`);
  }
  out.push('', `Replay: ${code(m.replay)}`, '', `<sub>exported by hunch ${TOOL_VERSION}</sub>`);
  return out.join('\n') + '\n';
}

export function notebookMarkdown(n: NotebookModel): string {
  const cell = (s: string) => text(s).replace(/\|/g, '\\|');
  const out = [
    `### ${text(n.title)}`,
    '',
    EVIDENCE_NOTE,
    '',
    '| conjecture | expect | latest | verified (exhaustive) | sampled (evidence, not proof) |',
    '|---|---|---|---|---|',
    ...n.entries.map(
      (e) =>
        `| ${code(e.id)} | ${e.expect} | ${e.agrees === false ? `**${cell(e.latest)}**` : cell(e.latest)} | ${cell(e.exhaustive)} | ${cell(e.sampled)} |`,
    ),
    '',
    `<sub>exported by hunch ${TOOL_VERSION} on ${n.generatedAt}</sub>`,
  ];
  return out.join('\n') + '\n';
}
