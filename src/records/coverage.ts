// Which slices of a size a set of records covers: a size is covered when one record holds the whole
// of it, or when for some K every slice i/K (i = 1..K) is present. Only complete (not partial)
// exhaustive records count; the caller filters by conjecture and hash.

import { parseShard, type LedgerRecord } from './ledger.js';

export interface SizeCover {
  /** The records that together make the size whole (the latest of each slice), or null when none do. */
  complete: LedgerRecord[] | null;
  /** Slices present for each K when no K is complete, e.g. { 8: [1, 2, 5] }. */
  partialSlices: Record<number, number[]>;
  /** Also present: records stopped before their end (never counted). */
  stopped: number;
}

const later = (a: LedgerRecord, b: LedgerRecord) => (a.at > b.at ? a : b);
const latestAt = (rs: LedgerRecord[]) => rs.reduce((m, r) => (r.at > m ? r.at : m), '');

/** The cover of one size from its exhaustive records (same id, same hash). */
export function sizeCover(records: readonly LedgerRecord[]): SizeCover {
  let whole: LedgerRecord | null = null;
  const byK = new Map<number, Map<number, LedgerRecord>>();
  let stopped = 0;
  for (const r of records) {
    if (r.partial) {
      stopped++;
      continue;
    }
    if (r.shard === undefined) {
      whole = whole ? later(whole, r) : r;
      continue;
    }
    const [i, k] = parseShard(r.shard)!;
    if (!byK.has(k)) byK.set(k, new Map());
    const m = byK.get(k)!;
    m.set(i, m.has(i) ? later(m.get(i)!, r) : r);
  }
  const candidates: LedgerRecord[][] = [];
  if (whole) candidates.push([whole]);
  for (const [k, m] of byK) if (m.size === k) candidates.push([...m.entries()].sort((a, b) => a[0] - b[0]).map((e) => e[1]));
  // The most recent complete cover speaks for the size (a newer tool may count differently).
  let complete: LedgerRecord[] | null = null;
  for (const c of candidates) if (!complete || latestAt(c) > latestAt(complete)) complete = c;
  const partialSlices: Record<number, number[]> = {};
  if (!complete) for (const [k, m] of byK) partialSlices[k] = [...m.keys()].sort((a, b) => a - b);
  return { complete, partialSlices, stopped };
}

/** A stable key for a size: {"n":5}. */
export function sizeKey(size: Record<string, number>): string {
  return JSON.stringify(Object.fromEntries(Object.entries(size).sort((a, b) => (a[0] < b[0] ? -1 : 1))));
}

/** The size's value for ordering and ranges (the single size binding), or null for an empty size. */
export function sizeValue(size: Record<string, number>): number | null {
  const vs = Object.values(size);
  return vs.length === 1 ? vs[0] : null;
}

/** Group records by size key, sizes in increasing order. */
export function bySize(records: readonly LedgerRecord[]): Array<{ size: Record<string, number>; records: LedgerRecord[] }> {
  const m = new Map<string, { size: Record<string, number>; records: LedgerRecord[] }>();
  for (const r of records) {
    const k = sizeKey(r.size);
    if (!m.has(k)) m.set(k, { size: r.size, records: [] });
    m.get(k)!.records.push(r);
  }
  return [...m.values()].sort((a, b) => (sizeValue(a.size) ?? -Infinity) - (sizeValue(b.size) ?? -Infinity) || (sizeKey(a.size) < sizeKey(b.size) ? -1 : 1));
}

/** Format 46233 as "46,233". */
export function groupDigits(n: number): string {
  const s = String(Math.abs(n));
  return (n < 0 ? '-' : '') + s.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}
