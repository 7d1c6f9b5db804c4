// What the ledger says about each conjecture as it stands now (`hunch status`). Only records whose
// hash equals the conjecture's current hash count; the rest are stale, shown apart and never
// counted. An exhaustive size counts only when every slice of it is present and finished.

import type { ChalkInstance } from 'chalk';
import type { Expectation } from '../runner/result.js';
import { bySize, groupDigits, sizeCover, sizeValue } from './coverage.js';
import type { LedgerRecord, PieceOutcome } from './ledger.js';

/** What status needs to know of a conjecture as it stands now. */
export interface ConjectureInfo {
  id: string;
  file: string;
  hash: string;
  expect: Expectation;
}

export interface ExhaustiveSize {
  size: Record<string, number>;
  cases: number;
  failures: number;
  skipped: number;
  /** K when the size was covered by K slices, null when one record covers it whole. */
  slices: number | null;
  at: string;
  tool: string;
}

export interface UnfinishedSize {
  size: Record<string, number>;
  /** Slices present per K ({ 8: [1, 2, 5] }): not every slice is there, so the size does not count. */
  slices: Record<number, number[]>;
  /** Pieces stopped by a budget or an interrupt. */
  stopped: number;
}

export interface SampledSize {
  size: Record<string, number>;
  cases: number;
  failures: number;
  seeds: string[];
}

export interface LatestRun {
  outcome: PieceOutcome;
  at: string;
  tool: string;
  host: string;
  run: string;
}

export interface ConjectureStatus {
  id: string;
  file: string;
  expect: Expectation;
  hash: string;
  /** The most recent run's outcome over what it finished (null: never checked as it stands). */
  latest: LatestRun | null;
  /** Whether the latest outcome agrees with the expectation (null when there is none). */
  agrees: boolean | null;
  exhaustive: ExhaustiveSize[];
  unfinished: UnfinishedSize[];
  sampled: SampledSize[];
  /** Cases taken from an earlier counterexample file that still fail. */
  regressionFailures: number;
  /** Tool versions of the counted records. */
  tools: string[];
  stale: { records: number; versions: number; lastAt: string } | null;
}

export interface StatusReport {
  conjectures: ConjectureStatus[];
  /** Records of ids no current conjecture has (removed or renamed conjectures). */
  unknown: Array<{ id: string; records: number; lastAt: string }>;
}

const maxAt = (rs: readonly LedgerRecord[]) => rs.reduce((m, r) => (r.at > m ? r.at : m), '');

function latestRun(records: readonly LedgerRecord[]): LatestRun | null {
  if (records.length === 0) return null;
  let last = records[0];
  for (const r of records) if (r.at > last.at) last = r;
  const run = records.filter((r) => r.run === last.run);
  const outcome: PieceOutcome = run.some((r) => r.failures > 0) ? 'fails' : run.some((r) => r.partial) ? 'incomplete' : 'holds';
  return { outcome, at: last.at, tool: last.tool, host: last.host, run: last.run };
}

function sampledOf(records: readonly LedgerRecord[]): SampledSize[] {
  return bySize(records).map(({ size, records: rs }) => {
    // The same seed repeats the same cases: per seed take the larger of the whole runs and the sum over slices.
    const seeds = new Map<string, { whole: LedgerRecord | null; shards: Map<string, LedgerRecord> }>();
    for (const r of rs) {
      const s = r.seed ?? '';
      if (!seeds.has(s)) seeds.set(s, { whole: null, shards: new Map() });
      const g = seeds.get(s)!;
      if (r.shard === undefined) g.whole = !g.whole || r.cases > g.whole.cases ? r : g.whole;
      else {
        const prev = g.shards.get(r.shard);
        if (!prev || r.cases > prev.cases) g.shards.set(r.shard, r);
      }
    }
    let cases = 0, failures = 0;
    for (const g of seeds.values()) {
      const sc = [...g.shards.values()].reduce((a, r) => a + r.cases, 0);
      const sf = [...g.shards.values()].reduce((a, r) => a + r.failures, 0);
      if (g.whole && g.whole.cases >= sc) {
        cases += g.whole.cases;
        failures += g.whole.failures;
      } else {
        cases += sc;
        failures += sf;
      }
    }
    return { size, cases, failures, seeds: [...seeds.keys()].filter((s) => s !== '').sort() };
  });
}

export function conjectureStatus(c: ConjectureInfo, all: readonly LedgerRecord[]): ConjectureStatus {
  const mine = all.filter((r) => r.id === c.id);
  const current = mine.filter((r) => r.hash === c.hash);
  const stale = mine.filter((r) => r.hash !== c.hash);
  const exhaustive: ExhaustiveSize[] = [];
  const unfinished: UnfinishedSize[] = [];
  for (const { size, records } of bySize(current.filter((r) => r.phase === 'exhaustive'))) {
    const cover = sizeCover(records);
    if (cover.complete) {
      const rs = cover.complete;
      exhaustive.push({
        size,
        cases: rs.reduce((a, r) => a + r.cases, 0),
        failures: rs.reduce((a, r) => a + r.failures, 0),
        skipped: rs.reduce((a, r) => a + r.skipped, 0),
        slices: rs.length === 1 && rs[0].shard === undefined ? null : rs.length,
        at: maxAt(rs),
        tool: rs[rs.length - 1].tool,
      });
    } else unfinished.push({ size, slices: cover.partialSlices, stopped: cover.stopped });
  }
  const latest = latestRun(current);
  return {
    id: c.id,
    file: c.file,
    expect: c.expect,
    hash: c.hash,
    latest,
    agrees: latest === null || latest.outcome === 'incomplete' ? null : c.expect === 'fails' ? latest.outcome === 'fails' : latest.outcome === 'holds',
    exhaustive,
    unfinished,
    sampled: sampledOf(current.filter((r) => r.phase === 'sample')),
    regressionFailures: current.filter((r) => r.phase === 'regression').reduce((a, r) => a + r.failures, 0),
    tools: [...new Set(current.map((r) => r.tool))].sort(),
    stale: stale.length ? { records: stale.length, versions: new Set(stale.map((r) => r.hash)).size, lastAt: maxAt(stale) } : null,
  };
}

export function computeStatus(conjectures: readonly ConjectureInfo[], records: readonly LedgerRecord[]): StatusReport {
  const ids = new Set(conjectures.map((c) => c.id));
  const unknown = new Map<string, LedgerRecord[]>();
  for (const r of records) if (!ids.has(r.id)) (unknown.get(r.id) ?? unknown.set(r.id, []).get(r.id)!).push(r);
  return {
    conjectures: conjectures.map((c) => conjectureStatus(c, records)),
    unknown: [...unknown.entries()].sort((a, b) => (a[0] < b[0] ? -1 : 1)).map(([id, rs]) => ({ id, records: rs.length, lastAt: maxAt(rs) })),
  };
}

// ---------------------------------------------------------------------------------------------
// Text

const plural = (n: number, one: string, many = one + 's') => `${groupDigits(n)} ${n === 1 ? one : many}`;

function sizeLabel(size: Record<string, number>): string {
  const e = Object.entries(size);
  return e.map(([k, v]) => `${k} = ${v}`).join(', ');
}

/** Runs of consecutive sizes (one size binding) merged: `n = 1..8 (46,233 cases)`. */
function compress<T extends { size: Record<string, number>; cases: number }>(items: T[], joinable: (t: T) => boolean, word: string, extra: (t: T) => string): string[] {
  const out: string[] = [];
  let i = 0;
  while (i < items.length) {
    const a = items[i];
    const v = sizeValue(a.size);
    const name = Object.keys(a.size)[0];
    if (v === null || !joinable(a)) {
      out.push(`${Object.keys(a.size).length ? sizeLabel(a.size) + ' ' : ''}${word} (${plural(a.cases, 'case')}${extra(a)})`);
      i++;
      continue;
    }
    let j = i, cases = a.cases;
    while (j + 1 < items.length && joinable(items[j + 1]) && Object.keys(items[j + 1].size)[0] === name && sizeValue(items[j + 1].size) === sizeValue(items[j].size)! + 1) {
      j++;
      cases += items[j].cases;
    }
    const last = sizeValue(items[j].size)!;
    out.push(`${name} = ${v === last ? v : `${v}..${last}`} ${word} (${plural(cases, 'case')})`);
    i = j + 1;
  }
  return out;
}

export function exhaustiveText(s: ConjectureStatus): string {
  if (s.exhaustive.length === 0) return s.unfinished.length ? 'none finished' : 'none';
  return compress(s.exhaustive, (e) => e.failures === 0, 'exhaustive', (e) => (e.failures ? `, ${groupDigits(e.failures)} failing` : '')).join('; ');
}

export function sampledText(s: ConjectureStatus): string {
  if (s.sampled.length === 0) return 'none';
  return compress(s.sampled, (e) => e.failures === 0, 'sampled', (e) => (e.failures ? `, ${groupDigits(e.failures)} failing` : '')).join('; ');
}

/** "2025-03-01 14:02 UTC" from an ISO time. */
export function shortTime(iso: string): string {
  return iso.replace('T', ' ').replace(/:\d\d(\.\d+)?Z$/, ' UTC');
}

type Styler = Pick<ChalkInstance, 'bold' | 'red' | 'green' | 'yellow' | 'dim'>;

function table(rows: string[][], style: Array<(s: string, row: number) => string>): string {
  const widths = rows[0].map((_, c) => Math.max(...rows.map((r) => r[c].length)));
  return rows
    .map((r, i) => r.map((cell, c) => (c === r.length - 1 ? style[c](cell, i) : style[c](cell.padEnd(widths[c]), i))).join('  ').trimEnd())
    .join('\n') + '\n';
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
    (x, row) => (row === 0 ? color.bold(x) : agreeOf(row) === true ? color.green(x) : agreeOf(row) === false ? color.red(x) : color.yellow(x)),
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
    notes.push(`${u.id}: ${plural(u.records, 'record')} for a conjecture not among these files (renamed or removed?), last ${shortTime(u.lastAt)}`);
  if (notes.length) out += '\n' + notes.map((n) => color.dim('• ') + n).join('\n') + '\n';
  if (report.conjectures.some((s) => s.sampled.length)) out += color.dim('Sampled cases are evidence, not proof; only exhaustive sizes are verified.\n');
  return out;
}
