// `hunch check --resume`: what the ledger already holds for a conjecture as it stands now, so a run
// skips finished sizes and finished slices. The records layer reads the ledger and hands the records
// over in this plain shape (a structural subset of its ledger record), keeping the runner below it.

import type { Phase } from '../result.js';
import { sizeCover, sizeKey } from './size-cover.js';
import { parseShard, shardText, type Shard } from './slicing.js';

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
  /** When it was written (ISO time). */
  at?: string;
}

/** Counts held by the ledger for some part of a size. */
export interface HeldCounts {
  cases: number;
  skipped: number;
  /** False when the ledger covers the whole size but not in a way that gives our shard's own counts. */
  known?: boolean;
}

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
   * for a shard, that shard's record; else the size's cover (src/runner/work/size-cover.ts).
   */
  exhaustiveCovered(size: Record<string, number>, shard: Shard | null): HeldCounts | null {
    const rs = this.records('exhaustive', size);
    if (shard) {
      const mine = rs.find((r) => r.shard === shardText(shard));
      if (mine) return { cases: mine.cases, skipped: mine.skipped };
    }
    const cover = sizeCover(rs).complete;
    if (!cover) return null;
    // Covered whole, but not in a way that gives our shard's own counts.
    if (shard) return { cases: 0, skipped: 0, known: false };
    let cases = 0,
      skipped = 0;
    for (const r of cover) {
      cases += r.cases;
      skipped += r.skipped;
    }
    return { cases, skipped };
  }

  /** Slices (0-based) of s slices that the ledger holds as records "j/s", with their counts. */
  exhaustiveSlices(size: Record<string, number>, s: number): Map<number, HeldCounts> {
    const out = new Map<number, HeldCounts>();
    for (const r of this.records('exhaustive', size)) {
      const slice = r.shard === undefined ? null : parseShard(r.shard);
      if (slice && slice.of === s) out.set(slice.index - 1, { cases: r.cases, skipped: r.skipped });
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
