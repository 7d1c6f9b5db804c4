// The human report of `hunch check` (CLI.md, "Human output"): a line per conjecture with its
// outcome against its expectation, what was covered and the time; for a counterexample the
// bindings as pictures, the lets, the two sides and the replay command.

import type { ChalkInstance } from 'chalk';
import { decodeValue } from '../values/decode.js';
import { valueToText } from '../values/operations.js';
import { agreesWithExpectation, type ConjectureResult, type Counterexample } from '../runner/result.js';
import { formatCount } from '../base/format-count.js';
import { describeCoverage, formatMs } from './coverage-text.js';
import { drawValue } from './pictures/index.js';
import { witnessLines } from './witnesses.js';

export interface ReportStyle {
  color: ChalkInstance;
  unicode: boolean;
}

function indent(s: string, by: string): string {
  return s
    .split('\n')
    .map((l) => (l ? by + l : l))
    .join('\n');
}

/** Long values are cut in the report; the counterexample file keeps them whole. */
const MAX_VALUE_TEXT = 300;

function shorten(s: string): string {
  return s.length <= MAX_VALUE_TEXT ? s : `${s.slice(0, MAX_VALUE_TEXT)}... (${s.length - MAX_VALUE_TEXT} more characters)`;
}

function encodedToText(x: unknown): string {
  try {
    return shorten(valueToText(decodeValue(x)));
  } catch {
    return shorten(JSON.stringify(x));
  }
}

function sizeText(size: Record<string, number>): string {
  return Object.entries(size)
    .map(([k, v]) => `${k} = ${v}`)
    .join(', ');
}

export function verdictLabel(r: ConjectureResult, c: ChalkInstance, unicode: boolean): string {
  const ok = agreesWithExpectation(r);
  const mark = unicode ? (ok ? '✔' : r.outcome === 'incomplete' ? '…' : '✘') : ok ? '+' : r.outcome === 'incomplete' ? '~' : 'x';
  let word: string;
  switch (r.outcome) {
    case 'holds':
      word = r.expect === 'fails' ? c.red('holds, but expected to fail') : c.green('holds');
      break;
    case 'fails':
      word =
        r.expect === 'fails'
          ? c.green('fails, as expected')
          : c.red(r.expect === 'open' ? 'fails (a counterexample to an open conjecture)' : 'FAILS, but expected to hold');
      break;
    case 'error':
      word = c.red('error');
      break;
    default:
      word = c.yellow(`incomplete (${r.stoppedBy === 'interrupt' ? 'interrupted' : 'budget reached'})`);
  }
  return `${ok ? c.green(mark) : r.outcome === 'incomplete' ? c.yellow(mark) : c.red(mark)} ${c.bold(r.id)}  ${word}`;
}

function counterexampleBlock(cx: Counterexample, r: ConjectureResult, s: ReportStyle, replayPath: string | null): string {
  const c = s.color;
  const lines: string[] = [];
  let how: string;
  if (cx.phase === 'exhaustive') {
    const piece = r.checked.find((p) => p.phase === 'exhaustive' && sizeText(p.size) === sizeText(cx.size));
    const failing =
      cx.failuresAtSize !== null ? `${formatCount(cx.failuresAtSize)}${piece ? ` of ${formatCount(piece.cases)}` : ''}` : null;
    how = `the simplest failing case at ${sizeText(cx.size)}${failing ? ` (failing: ${failing} cases)` : ''}`;
  } else if (cx.phase === 'sample') {
    how = `found by random sampling at ${sizeText(cx.shrunkFrom ?? cx.size)} (seed ${cx.seed}), shrunk in ${cx.shrinkSteps} step${cx.shrinkSteps === 1 ? '' : 's'} to ${sizeText(cx.size)}`;
  } else how = 'the counterexample recorded by an earlier run still fails';
  lines.push(`counterexample: ${how}`);
  for (const [name, enc] of Object.entries(cx.bindings)) {
    const text = cx.text?.[name] ? shorten(cx.text[name]) : encodedToText(enc);
    lines.push(`  ${c.cyan(name)} = ${text}`);
    try {
      const pic = drawValue(decodeValue(enc), { unicode: s.unicode });
      if (pic) lines.push(indent(pic, '      '));
    } catch {
      /* a value without a picture */
    }
  }
  for (const [name, enc] of Object.entries(cx.values)) lines.push(`  ${c.cyan(name)} = ${encodedToText(enc)}`);
  if (cx.sides)
    lines.push(
      `  ${r.claim ? `claim ${r.claim}: ` : 'the two sides: '}${encodedToText(cx.sides[0])} against ${encodedToText(cx.sides[1])}`,
    );
  lines.push(...witnessLines(cx.witnesses, s).map((l) => `  ${l}`));
  if (replayPath) lines.push(`  replay: hunch replay ${replayPath}`);
  return lines.join('\n');
}

export function formatResult(r: ConjectureResult, s: ReportStyle, replayPath: string | null): string {
  const c = s.color;
  const cov = describeCoverage(r.checked);
  const covered = [cov.exhaustive, cov.sampled].filter(Boolean).join('; ');
  let out = `${verdictLabel(r, c, s.unicode)}  ${c.dim(formatMs(r.ms))}\n`;
  if (covered) out += `    ${covered}\n`;
  if (cov.sampled && r.outcome !== 'fails')
    out += c.dim('    (random cases are evidence, not proof: only the exhaustive sizes are verified)\n');
  if (r.counterexample) out += indent(counterexampleBlock(r.counterexample, r, s, replayPath), '    ') + '\n';
  if (r.error) {
    const e = r.error;
    const where = e.file ? `${e.file}${e.line ? `:${e.line}` : ''}${e.column ? `:${e.column}` : ''}: ` : '';
    out += `    ${c.red('error:')} ${where}${e.message}\n`;
    if (e.bindings) {
      out += `    in the case ${Object.entries(e.bindings)
        .map(([k, v]) => `${k} = ${encodedToText(v)}`)
        .join(', ')}\n`;
      out += '    (a case that cannot be evaluated is never counted as a pass)\n';
    }
  }
  return out;
}

export function formatSummary(results: ConjectureResult[], ms: number, s: ReportStyle): string {
  const c = s.color;
  const agree = results.filter(agreesWithExpectation).length;
  const contra = results.filter((r) => !agreesWithExpectation(r) && r.outcome !== 'incomplete' && r.outcome !== 'error').length;
  const errors = results.filter((r) => r.outcome === 'error').length;
  const incomplete = results.filter((r) => r.outcome === 'incomplete').length;
  const parts = [`${agree} as expected`];
  if (contra) parts.push(c.red(`${contra} contradicting ${contra === 1 ? 'its' : 'their'} expectation`));
  if (errors) parts.push(c.red(`${errors} with errors`));
  if (incomplete) parts.push(c.yellow(`${incomplete} incomplete`));
  return `\n${results.length} conjecture${results.length === 1 ? '' : 's'}: ${parts.join(', ')}  ${c.dim(formatMs(ms))}\n`;
}
