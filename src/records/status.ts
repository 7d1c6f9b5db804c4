// What the ledger says about each conjecture as it stands now (`hunch status`). Only records whose
// hash equals the conjecture's current hash count; the rest are stale, shown apart and never
// counted. An exhaustive size counts only when every slice of it is present and finished.

import type { Expectation } from '../runner/result.js';
import { bySize, sizeCover } from '../runner/work/size-cover.js';
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
    let cases = 0,
      failures = 0;
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
    agrees:
      latest === null || latest.outcome === 'incomplete'
        ? null
        : c.expect === 'fails'
          ? latest.outcome === 'fails'
          : latest.outcome === 'holds',
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
    unknown: [...unknown.entries()]
      .sort((a, b) => (a[0] < b[0] ? -1 : 1))
      .map(([id, rs]) => ({ id, records: rs.length, lastAt: maxAt(rs) })),
  };
}
