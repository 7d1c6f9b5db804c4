// Whether records cover a whole exhaustive size — the one rule `hunch status`, `hunch merge` and
// `--resume` all use: a size is covered when one record holds the whole of it, or when for some K
// every slice i/K (i = 1..K) is present. Only finished (not partial) records count; the caller
// passes the records of one conjecture, one hash and one size. The slicing rule (slicing.ts) makes
// a record "a/b" mean the same cases whether b was a shard count or a slice count.

import { parseShard } from './slicing.js';

/** What the cover needs of a record (a ledger record, or the runner's view of one). */
export interface CoverRecord {
  shard?: string;
  partial?: boolean;
  /** When it was written (ISO time); the latest complete cover speaks for the size. */
  at?: string;
}

export interface SizeCover<R extends CoverRecord> {
  /** The records that together make the size whole (the latest of each slice), or null when none do. */
  complete: R[] | null;
  /** Slices present for each K when no K is complete, e.g. { 8: [1, 2, 5] }. */
  partialSlices: Record<number, number[]>;
  /** Also present: records stopped before their end (never counted). */
  stopped: number;
}

const atOf = (r: CoverRecord) => r.at ?? '';
const later = <R extends CoverRecord>(a: R, b: R) => (atOf(a) > atOf(b) ? a : b);
const latestAt = (rs: CoverRecord[]) => rs.reduce((m, r) => (atOf(r) > m ? atOf(r) : m), '');

/** The cover of one size from its exhaustive records (same conjecture, same hash). */
export function sizeCover<R extends CoverRecord>(records: readonly R[]): SizeCover<R> {
  let whole: R | null = null;
  const byK = new Map<number, Map<number, R>>();
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
    const s = parseShard(r.shard);
    if (!s) continue;
    if (!byK.has(s.of)) byK.set(s.of, new Map());
    const m = byK.get(s.of)!;
    m.set(s.index, m.has(s.index) ? later(m.get(s.index)!, r) : r);
  }
  const candidates: R[][] = [];
  if (whole) candidates.push([whole]);
  for (const [k, m] of byK) if (m.size === k) candidates.push([...m.entries()].sort((a, b) => a[0] - b[0]).map((e) => e[1]));
  // The most recent complete cover speaks for the size (a newer tool may count differently).
  let complete: R[] | null = null;
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

/** Group records by size, sizes in increasing order. */
export function bySize<R extends { size: Record<string, number> }>(
  records: readonly R[],
): Array<{ size: Record<string, number>; records: R[] }> {
  const m = new Map<string, { size: Record<string, number>; records: R[] }>();
  for (const r of records) {
    const k = sizeKey(r.size);
    if (!m.has(k)) m.set(k, { size: r.size, records: [] });
    m.get(k)!.records.push(r);
  }
  return [...m.values()].sort(
    (a, b) => (sizeValue(a.size) ?? -Infinity) - (sizeValue(b.size) ?? -Infinity) || (sizeKey(a.size) < sizeKey(b.size) ? -1 : 1),
  );
}
