// Merging ledgers from shards or coauthors (`hunch merge`): the union of their records without exact
// duplicates, and a report, per conjecture version and size, of whether the slices present make the
// size whole.

import { existsSync } from 'node:fs';
import { InputError } from '../base/errors.js';
import { resolve } from 'node:path';
import { writeFileAtomic } from './atomic-write.js';
import { bySize, sizeCover } from '../runner/work/size-cover.js';
import { parseShard } from '../runner/work/slicing.js';
import { readLedger, recordLine, type LedgerRecord } from './ledger.js';

export interface SizeCoverage {
  size: Record<string, number>;
  complete: boolean;
  /** K of the covering slices (null: one record covers the size whole). */
  slices: number | null;
  /** When incomplete: the K with most slices present, and the slices missing from it. */
  of?: number;
  missing?: number[];
  cases: number;
}

export interface VersionCoverage {
  id: string;
  hash: string;
  sizes: SizeCoverage[];
}

export interface MergeResult {
  records: LedgerRecord[];
  inputs: Array<{ path: string; records: number }>;
  duplicates: number;
  coverage: VersionCoverage[];
  warnings: string[];
}

/** Union of record lists, exact duplicates removed, in time order (stable). */
export function mergeRecords(lists: readonly (readonly LedgerRecord[])[]): { records: LedgerRecord[]; duplicates: number } {
  const seen = new Set<string>();
  const out: LedgerRecord[] = [];
  let duplicates = 0;
  for (const list of lists)
    for (const r of list) {
      const line = recordLine(r);
      if (seen.has(line)) duplicates++;
      else {
        seen.add(line);
        out.push(r);
      }
    }
  out.sort((a, b) => (a.at < b.at ? -1 : a.at > b.at ? 1 : 0));
  return { records: out, duplicates };
}

/** Per (conjecture, hash) and exhaustive size: whether the slices present cover the whole. */
export function coverageOf(records: readonly LedgerRecord[]): VersionCoverage[] {
  const groups = new Map<string, VersionCoverage & { rs: LedgerRecord[] }>();
  for (const r of records) {
    if (r.phase !== 'exhaustive') continue;
    const k = `${r.id} ${r.hash}`;
    if (!groups.has(k)) groups.set(k, { id: r.id, hash: r.hash, sizes: [], rs: [] });
    groups.get(k)!.rs.push(r);
  }
  return [...groups.values()]
    .sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : a.hash < b.hash ? -1 : 1))
    .map(({ id, hash, rs }) => ({
      id,
      hash,
      sizes: bySize(rs).map(({ size, records: sr }) => {
        const c = sizeCover(sr);
        if (c.complete) {
          const whole = c.complete.length === 1 && c.complete[0].shard === undefined;
          return { size, complete: true, slices: whole ? null : c.complete.length, cases: c.complete.reduce((a, r) => a + r.cases, 0) };
        }
        let of = 0,
          present: number[] = [];
        for (const [k, is] of Object.entries(c.partialSlices)) if (is.length > present.length) (of = Number(k)), (present = is);
        const missing = Array.from({ length: of }, (_, i) => i + 1).filter((i) => !present.includes(i));
        const cases = sr.filter((r) => !r.partial && r.shard && parseShard(r.shard)?.of === of).reduce((a, r) => a + r.cases, 0);
        return { size, complete: false, slices: null, of, missing, cases };
      }),
    }));
}

/**
 * Merge ledger files into `out`. The records already in `out` are kept (it is read as one more
 * input), so merging never loses anything; the result replaces `out` atomically.
 */
export function mergeLedgers(paths: readonly string[], out: string | null): MergeResult {
  const inputs = [...paths];
  if (out && existsSync(out) && !inputs.some((p) => resolve(p) === resolve(out))) inputs.push(out);
  const warnings: string[] = [];
  const lists = inputs.map((p) => {
    // A ledger named on the command line must exist: a misspelt name is a mistake, not an empty ledger.
    if (paths.includes(p) && !existsSync(p)) throw new InputError(`no such ledger: ${p}`);
    const c = readLedger(p);
    warnings.push(...c.warnings);
    return c.records;
  });
  const { records, duplicates } = mergeRecords(lists);
  if (out) writeFileAtomic(out, records.map((r) => recordLine(r) + '\n').join(''), { what: 'the merged ledger' });
  return {
    records,
    inputs: inputs.map((p, i) => ({ path: p, records: lists[i].length })),
    duplicates,
    coverage: coverageOf(records),
    warnings,
  };
}
