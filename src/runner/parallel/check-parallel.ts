// Checking one conjecture with a pool of worker threads: the same phases, sizes, slices and chunks as
// the in-process runner (src/runner/check.ts), so the result is the same whatever the number of
// workers: the same counts, the same simplest counterexample, the same sampled cases.

import type { CompiledConjecture } from '../../language/conjecture/compiled.js';
import { decodeValue } from '../../values/decode.js';
import type { Value } from '../../values/value.js';
import { errorInfo, exhaustiveSizes, finishResult, startResult, sampleSettingsOf, tryRegression, withSizeOverrides, type CheckOptions } from '../check.js';
import { EvalError } from '../../base/errors.js';
import type { RunHooks, StopReason } from '../hooks.js';
import type { ConjectureResult, ErrorInfo } from '../result.js';
import { DEFAULT_SEED } from '../seeds.js';
import { sampleSizes } from '../sample.js';
import { coveredPiece, finishSize, planExhaustiveSize, unitRange, type SizePlan } from './exhaustive-size.js';
import type { PoolReply, WireChunk, WireSlice } from './messages.js';
import { runOrderedPhase } from './ordered-phase.js';
import type { WorkerPool } from './pool.js';
import { ResumeIndex } from './resume.js';
import { coveredSamplePiece, finishSampleSize, plannedDraws, planSampleSize, quotaOf, type SamplePlan } from './sample-size.js';
import type { ChunkOutcome, SliceOutcome } from './work-units.js';

/** An evaluation error reported by a worker, already in the form of the result document. */
class RemoteFault {
  constructor(readonly info: ErrorInfo) {}
}

function sliceFromWire(w: WireSlice): SliceOutcome & { encoded: Record<string, unknown> | null } {
  return {
    cases: w.cases, failures: w.failures, skipped: w.skipped, ms: w.ms, stopped: w.stopped,
    best: w.bestValues ? (w.bestValues.map(decodeValue) as Value[]) : null,
    bestIndex: null,
    fault: w.fault ? { error: new RemoteFault(w.fault), bindings: w.fault.bindings ?? {} } : null,
    encoded: w.bestBindings,
  };
}

function chunkFromWire(w: WireChunk): ChunkOutcome {
  return {
    cases: w.cases, failures: w.failures, skipped: w.skipped, ms: w.ms, stopped: w.stopped,
    failing: w.failed ? [] : null,
    fault: w.fault ? { error: new RemoteFault(w.fault), bindings: w.fault.bindings ?? {} } : null,
  };
}

export interface ParallelContext {
  pool: WorkerPool;
  /** The conjecture's index in the run (the workers compiled the same list). */
  index: number;
  /** Absolute time (Date.now()) after which the budget stops the conjecture, or null. */
  deadline: number | null;
}

export async function checkConjectureParallel(
  compiled: CompiledConjecture,
  opts: CheckOptions,
  hooks: RunHooks,
  ctx: ParallelContext,
): Promise<ConjectureResult> {
  const t0 = performance.now();
  const cc = withSizeOverrides(compiled, opts);
  const spec = cc.spec;
  const result = startResult(cc);
  const finish = (stoppedBy: StopReason | null) => finishResult(result, t0, stoppedBy, cc);
  // Two lanes per worker: each worker has its next unit queued when it finishes one, so it never
  // waits for a round trip through the main thread.
  const lanes = 2 * ctx.pool.size;
  const shouldStop = () => hooks.shouldStop?.() ?? null;
  const shard = opts.shard ?? null;
  const resume = opts.resume ? new ResumeIndex(opts.resume, spec.id, cc.hash) : null;
  const faultToError = (e: unknown) => {
    result.error = e instanceof RemoteFault ? e.info : errorInfo(e, null);
  };

  try {
    if (opts.regression) {
      try {
        result.counterexample = tryRegression(cc, opts.regression, sampleSettingsOf(cc, opts).ranges);
      } catch (e) {
        if (!(e instanceof EvalError)) throw e;
      }
      if (result.counterexample) return finish(null);
    }

    // --- exhaustive ---
    if (opts.exhaustive !== false) {
      const sizes: Array<number | null> = cc.sizeIndex < 0 ? [null] : exhaustiveSizes(cc, opts);
      const run = await runOrderedPhase<SizePlan, ReturnType<typeof sliceFromWire>>(lanes, {
        planAt: (i) => (i < sizes.length ? planExhaustiveSize(cc, sizes[i], { shard, resume, slice: true }) : null),
        units: (plan) => plan.units,
        dispatch: async (lane, plan, j, progress) => {
          const range = unitRange(plan, j);
          const [lo, hi] = range ? range.map(String) : [null, null];
          const r = await ctx.pool.run<Extract<PoolReply, { t: 'slice' }>>(
            lane, { t: 'slice', conj: ctx.index, size: plan.size, lo, hi, deadline: ctx.deadline }, progress,
          );
          return sliceFromWire(r.out);
        },
        stopReason: (o) => o.stopped,
        visited: (o) => o.cases + o.skipped,
        shouldStop,
        onProgress: (done, plan) => {
          let held = 0;
          for (const h of plan.held.values()) held += h.cases + h.skipped;
          hooks.onProgress?.(held + done, plan.total === null ? null : Number(plan.total), plan.label);
        },
        ready: (_i, plan, outcomes, ms, final) => {
          if (plan.covered) {
            const held = coveredPiece(cc, plan);
            if (held) result.checked.push(held);
            return false;
          }
          const encoded = new Map([...outcomes].filter(([, o]) => o.encoded).map(([j, o]) => [j, o.encoded!]));
          const fin = finishSize(cc, plan, outcomes, ms, encoded);
          if (fin.fault) {
            faultToError(fin.fault.error);
            return true;
          }
          result.checked.push(fin.piece);
          for (const r of fin.records) hooks.onPiece?.(r);
          if (fin.counterexample && !result.counterexample) result.counterexample = fin.counterexample;
          return fin.counterexample !== null || (!fin.complete && !final);
        },
      });
      if (result.error || result.counterexample || run.stoppedBy) return finish(run.stoppedBy);
    }

    // --- sample ---
    const { count, ranges } = sampleSettingsOf(cc, opts);
    const seed = opts.seed ?? DEFAULT_SEED;
    const sSizes = ranges.size > 0 ? sampleSizes(cc, { count, ranges }) : [];
    if (sSizes.length === 0) return finish(null);
    let toShrink: { plan: SamplePlan; chunk: number } | null = null;
    const run = await runOrderedPhase<SamplePlan, ChunkOutcome>(lanes, {
      planAt: (i) => (i < sSizes.length ? planSampleSize(cc, sSizes[i], count, seed, shard, resume) : null),
      units: (plan) => plan.units,
      dispatch: async (lane, plan, c, progress) => {
        const r = await ctx.pool.run<Extract<PoolReply, { t: 'chunk' }>>(
          lane, { t: 'chunk', conj: ctx.index, size: plan.size, chunk: c, quota: quotaOf(plan, c), deadline: ctx.deadline }, progress,
        );
        return chunkFromWire(r.out);
      },
      stopReason: (o) => o.stopped,
      visited: (o) => o.cases,
      shouldStop,
      onProgress: (done, plan) => hooks.onProgress?.(done, plannedDraws(plan), plan.label),
      ready: (_i, plan, outcomes, ms, final) => {
        if (plan.covered) {
          const held = coveredSamplePiece(cc, plan, seed);
          if (held) result.checked.push(held);
          return false;
        }
        const fin = finishSampleSize(cc, plan, outcomes, ms, seed);
        if (fin.fault) {
          faultToError(fin.fault.error);
          return true;
        }
        result.checked.push(fin.piece);
        if (fin.complete) hooks.onPiece?.(fin.piece);
        if (fin.failingChunk !== null && !toShrink) {
          toShrink = { plan, chunk: fin.failingChunk };
          return true;
        }
        return !fin.complete && !final;
      },
    });
    if (toShrink && !result.error) {
      const { plan, chunk } = toShrink as { plan: SamplePlan; chunk: number };
      const r = await ctx.pool.run<Extract<PoolReply, { t: 'shrink' }>>(0, {
        t: 'shrink', conj: ctx.index, size: plan.size, chunk, quota: quotaOf(plan, chunk), deadline: ctx.deadline,
      });
      result.counterexample = r.out;
    }
    return finish(run.stoppedBy);
  } catch (e) {
    faultToError(e);
    return finish(null);
  }
}
