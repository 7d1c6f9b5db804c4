// `hunch status` as a table: one row per conjecture (expect, latest outcome, exhaustive and sampled
// coverage, when last checked), then notes on what is not verified, stale or contradicted. The
// records layer decides what counts (src/records/status.ts); this only presents it.

import type { ChalkInstance } from 'chalk';
import { formatCount } from '../base/format-count.js';
import type { ConjectureStatus, StatusReport } from '../records/status.js';
import { sizeValue } from '../runner/work/size-cover.js';
import { consecutiveRuns, rangeText } from './size-ranges.js';

const plural = (n: number, one: string, many = one + 's') => `${formatCount(n)} ${n === 1 ? one : many}`;

function sizeLabel(size: Record<string, number>): string {
  const e = Object.entries(size);
  return e.map(([k, v]) => `${k} = ${v}`).join(', ');
}

/** Runs of consecutive sizes (one size binding) merged: `n = 1..8 (46,233 cases)`. */
function compress<T extends { size: Record<string, number>; cases: number }>(
  items: T[],
  joinable: (t: T) => boolean,
  word: string,
  extra: (t: T) => string,
): string[] {
  const firstName = (t: T) => Object.keys(t.size)[0];
  return consecutiveRuns(
    items,
    (t) => (joinable(t) ? sizeValue(t.size) : null),
    (a, b) => firstName(a) === firstName(b),
  ).map((run) => {
    const a = run[0];
    const v = sizeValue(a.size);
    if (v === null || !joinable(a))
      return `${Object.keys(a.size).length ? sizeLabel(a.size) + ' ' : ''}${word} (${plural(a.cases, 'case')}${extra(a)})`;
    const cases = run.reduce((sum, t) => sum + t.cases, 0);
    return `${firstName(a)} = ${rangeText(v, sizeValue(run[run.length - 1].size)!)} ${word} (${plural(cases, 'case')})`;
  });
}

export function exhaustiveText(s: ConjectureStatus): string {
  if (s.exhaustive.length === 0) return s.unfinished.length ? 'none finished' : 'none';
  return compress(
    s.exhaustive,
    (e) => e.failures === 0,
    'exhaustive',
    (e) => (e.failures ? `, ${formatCount(e.failures)} failing` : ''),
  ).join('; ');
}

export function sampledText(s: ConjectureStatus): string {
  if (s.sampled.length === 0) return 'none';
  return compress(
    s.sampled,
    (e) => e.failures === 0,
    'sampled',
    (e) => (e.failures ? `, ${formatCount(e.failures)} failing` : ''),
  ).join('; ');
}

/** "2025-03-01 14:02 UTC" from an ISO time. */
export function shortTime(iso: string): string {
  return iso.replace('T', ' ').replace(/:\d\d(\.\d+)?Z$/, ' UTC');
}

type Styler = Pick<ChalkInstance, 'bold' | 'red' | 'green' | 'yellow' | 'dim'>;

function table(rows: string[][], style: Array<(s: string, row: number) => string>): string {
  const widths = rows[0].map((_, c) => Math.max(...rows.map((r) => r[c].length)));
  return (
    rows
      .map((r, i) =>
        r
          .map((cell, c) => (c === r.length - 1 ? style[c](cell, i) : style[c](cell.padEnd(widths[c]), i)))
          .join('  ')
          .trimEnd(),
      )
      .join('\n') + '\n'
  );
}

export function formatStatus(report: StatusReport, color: Styler, warnings: readonly string[] = []): string {
  let out = '';
  for (const w of warnings) out += `${color.yellow('warning:')} ${w}\n`;
  if (report.conjectures.length === 0) return out + 'No conjectures found.\n';
  const header = ['conjecture', 'expect', 'latest', 'exhaustive', 'sampled', 'last checked'];
  const rows = [header];
  for (const s of report.conjectures) {
    const latest = s.latest ? s.latest.outcome : 'never checked';
    rows.push([
      s.id,
      s.expect,
      latest,
      exhaustiveText(s),
      sampledText(s),
      s.latest ? `${shortTime(s.latest.at)}, hunch ${s.latest.tool}` : '',
    ]);
  }
  const agreeOf = (row: number) => report.conjectures[row - 1]?.agrees;
  const plain = (x: string, row: number) => (row === 0 ? color.bold(x) : x);
  out += table(rows, [
    plain,
    plain,
    (x, row) =>
      row === 0 ? color.bold(x) : agreeOf(row) === true ? color.green(x) : agreeOf(row) === false ? color.red(x) : color.yellow(x),
    plain,
    plain,
    (x, row) => (row === 0 ? color.bold(x) : color.dim(x)),
  ]);
  const notes: string[] = [];
  for (const s of report.conjectures) {
    for (const u of s.unfinished) {
      const parts = Object.entries(u.slices).map(([k, is]) => `slices ${is.join(', ')} of ${k}`);
      if (u.stopped) parts.push(`${plural(u.stopped, 'piece')} stopped before the end`);
      notes.push(`${s.id}: ${sizeLabel(u.size)} is not verified: only ${parts.join('; ')} present`);
    }
    if (s.regressionFailures) notes.push(`${s.id}: its saved counterexample still fails`);
    if (s.agrees === false) notes.push(`${s.id}: the latest outcome (${s.latest!.outcome}) contradicts expect: ${s.expect}`);
    if (s.stale)
      notes.push(
        `${s.id}: ${plural(s.stale.records, 'stale record')} of ${plural(s.stale.versions, 'earlier version')} of this conjecture, last ${shortTime(s.stale.lastAt)} (not counted: the conjecture has changed since)`,
      );
  }
  for (const u of report.unknown)
    notes.push(
      `${u.id}: ${plural(u.records, 'record')} for a conjecture not among these files (renamed or removed?), last ${shortTime(u.lastAt)}`,
    );
  if (notes.length) out += '\n' + notes.map((n) => color.dim('• ') + n).join('\n') + '\n';
  if (report.conjectures.some((s) => s.sampled.length))
    out += color.dim('Sampled cases are evidence, not proof; only exhaustive sizes are verified.\n');
  return out;
}
