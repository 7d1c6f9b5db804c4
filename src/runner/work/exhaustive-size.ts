// One size of the exhaustive phase as a set of slices: which slices this run must evaluate (its
// shard, minus what a resumed ledger holds), and how the slices' outcomes make the size's piece, its
// ledger records and its simplest failing case. The phase engine uses this for every executor, so
// all give the same counts and the same simplest counterexample.

import type { CompiledConjecture } from '../../language/conjecture/compiled.js';
import type { Value } from '../../values/value.js';
import { compareCases } from '../case-order.js';
import { plannedCases } from '../plan.js';
import type { CheckedPiece, ErrorInfo } from '../result.js';
import { countCases, hasCheapRanges } from './case-space.js';
import type { HeldCounts, ResumeIndex } from './resume.js';
import { shardText, sliceBounds, sliceCount, slicesOfShard, type Shard } from './slicing.js';
import { sizeFixing, type SliceOutcome } from './units.js';

export interface SizePlan {
  size: number | null;
  label: string;
  /** The size's number of cases when it was counted (always, unless the size runs whole). */
  total: bigint | null;
  /** The number of slices S of the size; 1 with `whole`. */
  slices: number;
  /** Run the size as one plain enumeration (no shard, nothing to resume, nothing to balance). */
  whole: boolean;
  /** The slices (0-based) to evaluate, in order. */
  units: number[];
  /** Slices the ledger already holds (resume), with their counts. */
  held: Map<number, HeldCounts>;
  shard: Shard | null;
  /** The ledger covers this size (or our shard of it) already: nothing to run. */
  covered: HeldCounts | null;
}

export interface PlanOptions {
  shard: Shard | null;
  resume: ResumeIndex | null;
  /** Cut the size into slices even without a shard (to share it among workers). */
  slice: boolean;
}

export function sizeRecord(cc: CompiledConjecture, size: number | null): Record<string, number> {
  return size === null ? {} : { [cc.bindings[cc.sizeIndex].name]: size };
}

export function sizeLabel(cc: CompiledConjecture, size: number | null): string {
  return size === null ? cc.spec.id : `${cc.spec.id}: ${cc.bindings[cc.sizeIndex].name} = ${size}`;
}

export function planExhaustiveSize(cc: CompiledConjecture, size: number | null, o: PlanOptions): SizePlan {
  const plan: SizePlan = {
    size,
    label: sizeLabel(cc, size),
    total: null,
    slices: 1,
    whole: true,
    units: [0],
    held: new Map(),
    shard: o.shard,
    covered: null,
  };
  const rec = sizeRecord(cc, size);
  if (o.resume) {
    plan.covered = o.resume.exhaustiveCovered(rec, o.shard);
    if (plan.covered) {
      plan.units = [];
      return plan;
    }
  }
  if (!o.shard && !o.slice && !o.resume?.hasSlices(rec)) {
    // The plain path: one enumeration, counted beforehand only where the families' counts tell it.
    const planned = plannedCases(cc, sizeFixing(cc, size));
    plan.total = planned;
    return plan;
  }
  let total: bigint;
  try {
    total = countCases(cc, sizeFixing(cc, size));
  } catch {
    // The size cannot even be counted (a family refuses its arguments): run it whole, so the
    // error is reported from the case that raises it, exactly as the plain enumeration does.
    return plan;
  }
  const s = sliceCount(total, o.shard?.of ?? 1, hasCheapRanges(cc));
  const held = o.resume ? o.resume.exhaustiveSlices(rec, s) : new Map<number, HeldCounts>();
  plan.total = total;
  plan.slices = s;
  plan.whole = false;
  plan.units = slicesOfShard(s, o.shard).filter((j) => !held.has(j));
  for (const j of slicesOfShard(s, o.shard)) if (held.has(j)) plan.held.set(j, held.get(j)!);
  return plan;
}

/** The case range of a unit of a plan (null: the whole size). */
export function unitRange(plan: SizePlan, j: number): [bigint, bigint] | null {
  return plan.whole ? null : sliceBounds(plan.total!, plan.slices, j);
}

/** The piece of a size the ledger already covers (resume), for the report; null when its counts are not ours to tell. */
export function coveredPiece(cc: CompiledConjecture, plan: SizePlan): CheckedPiece | null {
  const c = plan.covered;
  if (!c || c.known === false) return null;
  const piece: CheckedPiece = {
    phase: 'exhaustive',
    size: sizeRecord(cc, plan.size),
    cases: c.cases,
    failures: 0,
    skipped: c.skipped,
    ms: 0,
  };
  if (plan.shard) piece.shard = shardText(plan.shard);
  return piece;
}

export interface SizeOutcome {
  /** The size's piece for the result (partial when the run stopped inside it). */
  piece: CheckedPiece;
  /** What to record in the ledger: the piece when complete, else one record per finished slice. */
  records: CheckedPiece[];
  /** The simplest failing case of the size, with its encoded bindings. */
  best: { values: Value[]; encoded: Record<string, unknown> | null } | null;
  /** The size's failures when it was finished (null when the run stopped inside it). */
  failuresAtSize: number | null;
  /** The first evaluation error in case order, if any (it makes the outcome `error`). */
  fault: ErrorInfo | null;
  complete: boolean;
}

/** The slices' outcomes (by slice) make the size's piece, its records and its simplest failing case. */
export function finishSize(cc: CompiledConjecture, plan: SizePlan, outcomes: Map<number, SliceOutcome>, ms: number): SizeOutcome {
  let cases = 0,
    failures = 0,
    skipped = 0;
  for (const h of plan.held.values()) {
    cases += h.cases;
    skipped += h.skipped;
  }
  let complete = true;
  let fault: ErrorInfo | null = null;
  let best: SliceOutcome | null = null;
  for (const j of plan.units) {
    const o = outcomes.get(j);
    if (!o) {
      complete = false;
      continue;
    }
    cases += o.cases;
    failures += o.failures;
    skipped += o.skipped;
    if (o.stopped) complete = false;
    if (o.fault && fault === null) fault = o.fault; // units are in case order: the first fault is the earliest
    if (o.best && (best === null || compareCases(cc, o.best, best.best!) < 0)) best = o;
  }
  const piece: CheckedPiece = { phase: 'exhaustive', size: sizeRecord(cc, plan.size), cases, failures, skipped, ms };
  if (plan.shard) piece.shard = shardText(plan.shard);
  if (!complete) piece.partial = true;
  const records: CheckedPiece[] = [];
  if (complete) records.push(piece);
  else if (!plan.whole) {
    // Stopped inside the size: record each slice that did finish, so --resume can skip it.
    for (const j of plan.units) {
      const o = outcomes.get(j);
      if (!o || o.stopped || o.fault) continue;
      records.push({
        phase: 'exhaustive',
        size: piece.size,
        cases: o.cases,
        failures: o.failures,
        skipped: o.skipped,
        ms: o.ms,
        shard: `${j + 1}/${plan.slices}`,
      });
    }
  }
  return {
    piece,
    records,
    best: best ? { values: best.best!, encoded: best.bestEncoded } : null,
    failuresAtSize: complete ? failures : null,
    fault,
    complete,
  };
}
