// `hunch report`: one self-contained HTML page of a notebook's state. No scripts, no external
// fonts, styles or images: everything is inline, so it opens from a file:// URL and prints.

import { TOOL_VERSION } from '../../version.js';
import { formatMs } from '../coverage-text.js';
import type { CounterexampleModel, ShownValue } from '../export/counterexample-model.js';
import type { NotebookEntry, NotebookModel } from '../export/notebook-model.js';
import { EVIDENCE_NOTE } from '../export/wording.js';
import { xmlEscape as h } from '../markup/xml.js';
import { sceneToSvg } from '../render/svg.js';
import { legend, sizeBar } from './size-bars.js';
import { REPORT_CSS } from './styles.js';

const anchor = (kind: 'row' | 'cx', id: string) => `${kind}-${id}`;

function outcomeCell(e: NotebookEntry): string {
  const cls = e.agrees === true ? 'agrees' : e.agrees === false ? 'disagrees' : 'unknown';
  const word = e.agrees === false ? `${e.latest} (expected: ${e.expect})` : e.latest;
  return `<td class="outcome ${cls}">${h(word)}</td>`;
}

function row(e: NotebookEntry): string {
  const idCell = e.counterexample ? `<a href="#${anchor('cx', e.id)}"><code>${h(e.id)}</code></a>` : `<code>${h(e.id)}</code>`;
  return [
    `<tr class="conjecture" id="${anchor('row', e.id)}" data-id="${h(e.id)}" data-outcome="${h(e.latest)}">`,
    `<td class="id">${idCell}<div class="meta">${h(e.file)}</div></td>`,
    `<td class="statement">${h(e.statement)}</td>`,
    `<td class="expect">${h(e.expect)}</td>`,
    outcomeCell(e),
    `<td class="exhaustive">${h(e.exhaustive)}</td>`,
    `<td class="sampled sampled-text">${h(e.sampled)}</td>`,
    `<td class="bar">${sizeBar(e.sizes)}</td>`,
    `<td class="records">${h(formatMs(e.ms))}<br>${e.stale ? `stale: ${h(e.stale)}` : 'nothing stale'}</td>`,
    '</tr>',
  ].join('');
}

function shownValue(v: ShownValue): string {
  const value = `<code>${h(v.text)}</code>`;
  if (!v.scene) return `<dt><code>${h(v.name)}</code></dt><dd>${value}</dd>`;
  return `<dt><code>${h(v.name)}</code></dt><dd>${value}<br><figure class="picture">${sceneToSvg(v.scene)}<figcaption>${h(v.scene.caption)}</figcaption></figure></dd>`;
}

function counterexampleSection(e: NotebookEntry, m: CounterexampleModel): string {
  const out = [
    `<section class="counterexample" id="${anchor('cx', e.id)}" data-id="${h(e.id)}">`,
    `<h2>Counterexample to <code>${h(m.id)}</code></h2>`,
    `<p>${h(m.statement)}</p>`,
    '<dl>',
    `<dt>Claim</dt><dd><code>${h(m.claim)}</code></dd>`,
    `<dt>Expected</dt><dd>${h(m.expect)}</dd>`,
    `<dt>Found by</dt><dd>${h(m.found)}</dd>`,
    `<dt>Re-checked</dt><dd class="${m.recheck.ok ? 'recheck-ok' : 'recheck-bad'}">${h(m.recheck.text)}</dd>`,
    '</dl>',
    '<h3>The case</h3><dl>',
    ...m.bindings.map(shownValue),
    '</dl>',
  ];
  if (m.values.length) out.push('<h3>Its values</h3><dl>', ...m.values.map(shownValue), '</dl>');
  if (m.sides) out.push(`<p>The two sides of the claim: <code>${h(m.sides[0])}</code> and <code>${h(m.sides[1])}</code>.</p>`);
  if (m.witnesses.length)
    out.push(
      '<h3>Witnesses</h3><ul class="witnesses">',
      ...m.witnesses.map(
        (w) =>
          `<li><code>${h(w.at)}</code> is decided by ${w.bindings ? `<code>${h(w.bindings)}</code>` : 'its element'}: <code>${h(w.value)}</code></li>`,
      ),
      '</ul>',
    );
  out.push(`<p>Replay: <code>${h(m.replay)}</code> · <a href="#${anchor('row', e.id)}">back to the table</a></p>`, '</section>');
  return out.join('\n');
}

export function reportPage(n: NotebookModel): string {
  const agree = n.entries.filter((e) => e.agrees === true).length;
  const disagree = n.entries.filter((e) => e.agrees === false).length;
  const none = n.entries.length - agree - disagree;
  const withCx = n.entries.filter((e) => e.counterexample);
  return [
    '<!doctype html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    `<title>${h(n.title)} — hunch report</title>`,
    `<style>${REPORT_CSS}</style>`,
    '</head>',
    '<body>',
    `<h1>${h(n.title)}</h1>`,
    `<p class="meta">The ledger's state on ${h(n.generatedAt)}, written by hunch ${h(TOOL_VERSION)}.</p>`,
    `<p class="summary"><span><strong>${n.entries.length}</strong> conjectures</span><span class="agrees"><strong>${agree}</strong> as expected</span><span class="disagrees"><strong>${disagree}</strong> contradicting their expectation</span><span class="unknown"><strong>${none}</strong> not settled (never checked or incomplete)</span><span><strong>${withCx.length}</strong> counterexamples</span></p>`,
    `<p class="note">${h(EVIDENCE_NOTE)}</p>`,
    `<div class="legend">${legend()}</div>`,
    '<table id="conjectures">',
    '<thead><tr><th>conjecture</th><th>statement</th><th>expect</th><th>latest</th><th>verified (exhaustive)</th><th>sampled (evidence, not proof)</th><th>sizes</th><th>time, staleness</th></tr></thead>',
    '<tbody>',
    ...n.entries.map(row),
    '</tbody>',
    '</table>',
    ...withCx.map((e) => counterexampleSection(e, e.counterexample as CounterexampleModel)),
    '</body>',
    '</html>',
    '',
  ].join('\n');
}
