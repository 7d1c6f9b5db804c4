// The exhaustive phase (FORMAT.md §4.2): sizes in increasing order; stop after the first size with
// a failure, but finish that size, count its failures and keep the simplest failing case.
// In-process, a size is one plain enumeration; with a shard or a resumed ledger it is cut into the
// slices of src/runner/parallel/exhaustive-size.ts (the worker pool cuts it the same way).

import type { CompiledConjecture } from '../language/conjecture/compiled.js';
import type { RunHooks, StopReason } from './hooks.js';
import type { CheckedPiece, Counterexample } from './result.js';
import { coveredPiece, finishSize, planExhaustiveSize, unitRange } from './parallel/exhaustive-size.js';
import type { ResumeIndex } from './parallel/resume.js';
import type { Shard } from './parallel/slicing.js';
import { runSlice, type SliceOutcome } from './parallel/work-units.js';

export interface PhaseResult {
  pieces: CheckedPiece[];
  counterexample: Counterexample | null;
  stoppedBy: StopReason | null;
}

/** Raised inside enumeration to unwind with the frame intact (the case that failed to evaluate). */
export class CaseError extends Error {
  constructor(
    readonly error: unknown,
    readonly bindings: Record<string, unknown>,
  ) {
    super('case error');
  }
}

export interface ExhaustiveOptions {
  shard?: Shard | null;
  resume?: ResumeIndex | null;
}

export function runExhaustive(cc: CompiledConjecture, sizes: number[], hooks: RunHooks, opts: ExhaustiveOptions = {}): PhaseResult {
  const pieces: CheckedPiece[] = [];
  let stoppedBy: StopReason | null = null;
  const sizeList: Array<number | null> = cc.sizeIndex < 0 ? [null] : sizes;
  const shouldStop = () => {
    const s = hooks.shouldStop?.() ?? null;
    if (s) stoppedBy = s;
    return s;
  };

  for (const size of sizeList) {
    const plan = planExhaustiveSize(cc, size, { shard: opts.shard ?? null, resume: opts.resume ?? null, slice: false });
    if (plan.covered) {
      const held = coveredPiece(cc, plan);
      if (held) pieces.push(held);
      continue;
    }
    const total = plan.total === null ? null : Number(plan.total);
    const t0 = performance.now();
    const outcomes = new Map<number, SliceOutcome>();
    let done = 0;
    for (const h of plan.held.values()) done += h.cases + h.skipped;
    for (const j of plan.units) {
      const o = runSlice(cc, size, unitRange(plan, j), {
        shouldStop,
        onProgress: (k) => hooks.onProgress?.(done + k, total, plan.label),
      });
      outcomes.set(j, o);
      done += o.cases + o.skipped;
      if (o.fault || o.stopped) break;
      if (shouldStop()) break;
    }
    const fin = finishSize(cc, plan, outcomes, performance.now() - t0);
    if (fin.fault) throw new CaseError(fin.fault.error, fin.fault.bindings);
    pieces.push(fin.piece);
    for (const r of fin.records) hooks.onPiece?.(r);
    if (fin.counterexample) return { pieces, stoppedBy, counterexample: fin.counterexample };
    if (stoppedBy) break;
  }
  return { pieces, counterexample: null, stoppedBy };
}
