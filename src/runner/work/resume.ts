// `hunch check --resume`: what the ledger already holds for a conjecture as it stands now, so a run
// skips finished sizes and finished slices. The records layer reads the ledger and hands the records
// over in this plain shape (a structural subset of its ledger record), keeping the runner below it.

import type { Phase } from '../result.js';
import { shardText, type Shard } from './slicing.js';

export interface HeldRecord {
  id: string;
  hash: string;
  phase: Phase;
  size: Record<string, number>;
  cases: number;
  failures: number;
  skipped: number;
  shard?: string;
  seed?: string;
  partial?: boolean;
}

/** Counts held by the ledger for some part of a size. */
export interface HeldCounts {
  cases: number;
  skipped: number;
  /** False when the ledger covers the whole size but not in a way that gives our shard's own counts. */
  known?: boolean;
}

const sizeKey = (size: Record<string, number>) =>
  JSON.stringify(Object.fromEntries(Object.entries(size).sort((a, b) => (a[0] < b[0] ? -1 : 1))));

/** Only finished work without a failure can be skipped: a failing piece is re-run to find its counterexample. */
const usable = (r: HeldRecord) => !r.partial && r.failures === 0;

export class ResumeIndex {
  private readonly bySize = new Map<string, HeldRecord[]>();

  constructor(records: readonly HeldRecord[], id: string, hash: string) {
    for (const r of records) {
      if (r.id !== id || r.hash !== hash || !usable(r)) continue;
      const k = `${r.phase} ${sizeKey(r.size)}`;
      if (!this.bySize.has(k)) this.bySize.set(k, []);
      this.bySize.get(k)!.push(r);
    }
  }

  private records(phase: Phase, size: Record<string, number>): HeldRecord[] {
    return this.bySize.get(`${phase} ${sizeKey(size)}`) ?? [];
  }

  /**
   * The counts of an exhaustive size (or of our shard of it) when the ledger already covers it:
   * a record of the whole, every slice a/b for some b, or (for a shard) that shard's record.
   */
  exhaustiveCovered(size: Record<string, number>, shard: Shard | null): HeldCounts | null {
    const rs = this.records('exhaustive', size);
    if (shard) {
      const mine = rs.find((r) => r.shard === shardText(shard));
      if (mine) return { cases: mine.cases, skipped: mine.skipped };
    }
    const whole = rs.find((r) => r.shard === undefined);
    if (whole) return shard ? { cases: 0, skipped: 0, known: false } : { cases: whole.cases, skipped: whole.skipped };
    const byK = new Map<number, Map<number, HeldRecord>>();
    for (const r of rs) {
      if (r.shard === undefined) continue;
      const [i, k] = r.shard.split('/').map(Number);
      if (!byK.has(k)) byK.set(k, new Map());
      byK.get(k)!.set(i, r);
    }
    for (const [k, m] of byK) {
      if (m.size !== k) continue;
      if (shard) return { cases: 0, skipped: 0, known: false };
      let cases = 0, skipped = 0;
      for (const r of m.values()) {
        cases += r.cases;
        skipped += r.skipped;
      }
      return { cases, skipped };
    }
    return null;
  }

  /** Slices (0-based) of s slices that the ledger holds as records "j/s", with their counts. */
  exhaustiveSlices(size: Record<string, number>, s: number): Map<number, HeldCounts> {
    const out = new Map<number, HeldCounts>();
    for (const r of this.records('exhaustive', size)) {
      if (r.shard === undefined) continue;
      const [i, k] = r.shard.split('/').map(Number);
      if (k === s) out.set(i - 1, { cases: r.cases, skipped: r.skipped });
    }
    return out;
  }

  /** Whether the ledger holds any slice record of this exhaustive size. */
  hasSlices(size: Record<string, number>): boolean {
    return this.records('exhaustive', size).some((r) => r.shard !== undefined);
  }

  /** A sampled size already recorded with this seed (for this shard, or whole). */
  sampleCovered(size: Record<string, number>, seed: string, shard: Shard | null): HeldCounts | null {
    const want = shard ? shardText(shard) : undefined;
    const r = this.records('sample', size).find((x) => x.seed === seed && x.shard === want);
    return r ? { cases: r.cases, skipped: r.skipped } : null;
  }
}
