// What an export or the report page says about a notebook: per conjecture, its expectation, the
// latest outcome, what the ledger verifies (exhaustive sizes: proof for those sizes) and what it
// only sampled (evidence, not proof), staleness, time spent, and its counterexample if one is saved.

import type { LedgerRecord } from '../../records/ledger.js';
import type { ConjectureStatus } from '../../records/status.js';
import { exhaustiveText, sampledText } from '../status-table.js';
import type { CounterexampleModel } from './counterexample-model.js';

export type SizeState = 'verified' | 'failed' | 'sampled' | 'sample-failed' | 'unfinished';

export interface SizeCell {
  /** The size's value (the first range binding), or null for a conjecture without one. */
  size: number | null;
  label: string;
  state: SizeState;
  cases: number;
}

export interface NotebookEntry {
  id: string;
  file: string;
  statement: string;
  expect: string;
  /** holds / fails / incomplete / never checked */
  latest: string;
  latestAt: string | null;
  /** Whether the latest outcome agrees with the expectation (null: nothing to compare). */
  agrees: boolean | null;
  exhaustive: string;
  sampled: string;
  sizes: SizeCell[];
  stale: string | null;
  /** Milliseconds spent on the records that count (the current hash). */
  ms: number;
  counterexample: CounterexampleModel | null;
  /** The counterexample file, relative to the project root, when one exists. */
  counterexampleFile: string | null;
}

export interface NotebookModel {
  title: string;
  generatedAt: string;
  tool: string;
  entries: NotebookEntry[];
}

const first = (size: Record<string, number>): number | null => {
  const v = Object.values(size);
  return v.length ? v[0] : null;
};
const label = (size: Record<string, number>) =>
  Object.entries(size)
    .map(([k, v]) => `${k} = ${v}`)
    .join(', ') || 'once';

function sizeCells(s: ConjectureStatus): SizeCell[] {
  const cells: SizeCell[] = [];
  for (const e of s.exhaustive)
    cells.push({ size: first(e.size), label: label(e.size), state: e.failures ? 'failed' : 'verified', cases: e.cases });
  for (const u of s.unfinished) cells.push({ size: first(u.size), label: label(u.size), state: 'unfinished', cases: 0 });
  for (const e of s.sampled)
    cells.push({ size: first(e.size), label: label(e.size), state: e.failures ? 'sample-failed' : 'sampled', cases: e.cases });
  return cells.sort((a, b) => (a.size ?? 0) - (b.size ?? 0));
}

export function notebookEntry(
  s: ConjectureStatus,
  statement: string,
  records: readonly LedgerRecord[],
  counterexample: { model: CounterexampleModel; file: string } | null,
): NotebookEntry {
  const counted = records.filter((r) => r.id === s.id && r.hash === s.hash);
  return {
    id: s.id,
    file: s.file,
    statement,
    expect: s.expect,
    latest: s.latest ? s.latest.outcome : 'never checked',
    latestAt: s.latest ? s.latest.at : null,
    agrees: s.agrees,
    exhaustive: exhaustiveText(s),
    sampled: sampledText(s),
    sizes: sizeCells(s),
    stale: s.stale
      ? `${s.stale.records} record${s.stale.records === 1 ? '' : 's'} of ${s.stale.versions} earlier version${s.stale.versions === 1 ? '' : 's'}`
      : null,
    ms: counted.reduce((a, r) => a + r.ms, 0),
    counterexample: counterexample ? counterexample.model : null,
    counterexampleFile: counterexample ? counterexample.file : null,
  };
}
