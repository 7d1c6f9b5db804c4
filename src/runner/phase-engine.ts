// The phase engine: the one place that knows the order of a check (FORMAT.md §4) — a saved
// regression case first, then the exhaustive sizes in increasing order (stop after the first size
// with a failure, but finish that size, count its failures and keep its simplest failing case), then
// the sampled sizes (the first failure in chunk order is shrunk), with the stop rules (budget,
// interrupt) and the folding of errors into the result. It does no work itself: it hands out units
// of work (src/runner/work/units.ts) and takes their outcomes back, so the in-process executor
// (synchronous) and the worker-pool executor (asynchronous) drive the very same steps:
//
//   while (engine.advance())                  // regression -> exhaustive -> sample -> shrink
//     for (let t; (t = engine.next()); )      // several units may be out at once
//       engine.accept(t, run(t.unit))         // outcomes in any order
//   engine.result()
//
// Counterexamples are built by src/runner/counterexample.ts, once per check.

import type { CompiledConjecture } from '../language/conjecture/compiled.js';
import { exhaustiveSizes, sampleSettingsOf, sampleSizes, withSizeOverrides, type CheckOptions } from './check-options.js';
import { buildCounterexample, regressionCounterexample } from './counterexample.js';
import { witnessesOfBindings } from '../language/conjecture/witnesses.js';
import { errorInfo } from './error-info.js';
import type { RunHooks, StopReason } from './hooks.js';
import { OrderedSizes, type SizeTicket } from './ordered-sizes.js';
import type { ConjectureResult } from './result.js';
import { DEFAULT_SEED } from './seeds.js';
import { coveredPiece, finishSize, planExhaustiveSize, unitRange, type SizePlan } from './work/exhaustive-size.js';
import { ResumeIndex } from './work/resume.js';
import { coveredSamplePiece, finishSampleSize, plannedDraws, planSampleSize, quotaOf, type SamplePlan } from './work/sample-size.js';
import type { Shard } from './work/slicing.js';
import {
  prepareConjecture,
  type ChunkOutcome,
  type PreparedConjecture,
  type SliceOutcome,
  type UnitOutcome,
  type WorkUnit,
} from './work/units.js';

export interface EngineShape {
  /**
   * Cut every exhaustive size into slices (to share it among workers). Without it a size runs as
   * one plain enumeration unless a shard or a resumed ledger needs its slices.
   */
  sliceSizes: boolean;
}

/** A unit of work handed out by the engine. */
export interface EngineTicket {
  unit: WorkUnit;
  /** Which stage handed it out (an outcome of an earlier stage is ignored). */
  stage: number;
  size: SizeTicket | null;
}

type Stage = 'start' | 'exhaustive' | 'sample' | 'shrink' | 'done';

export class PhaseEngine {
  readonly prepared: PreparedConjecture;
  private readonly cc: CompiledConjecture;
  private readonly res: ConjectureResult;
  private readonly t0 = performance.now();
  private stage: Stage = 'start';
  private stageNo = 0;
  private stoppedBy: StopReason | null = null;
  private readonly shard: Shard | null;
  private resume: ResumeIndex | null = null;
  private exhaustive: OrderedSizes<SizePlan, SliceOutcome> | null = null;
  private sample: OrderedSizes<SamplePlan, ChunkOutcome> | null = null;
  private toShrink: WorkUnit | null = null;
  private startError: unknown = null;

  constructor(
    compiled: CompiledConjecture,
    private readonly opts: CheckOptions,
    private readonly hooks: RunHooks,
    private readonly shape: EngineShape,
  ) {
    try {
      this.prepared = prepareConjecture(compiled, opts);
    } catch (e) {
      // Reported as the result's error by the first step, like every error outside a case.
      this.startError = e;
      this.prepared = { cc: withSizeOverrides(compiled, opts), sample: { seed: opts.seed ?? DEFAULT_SEED, ranges: new Map() } };
    }
    this.cc = this.prepared.cc;
    this.shard = opts.shard ?? null;
    this.res = startResult(this.cc);
  }

  /**
   * Close the current stage (every unit it handed out has returned) and open the next one that has
   * work. False when the check is over: then `result()` is final.
   */
  advance(): boolean {
    try {
      return this.step();
    } catch (e) {
      this.abort(e);
      return false;
    }
  }

  private step(): boolean {
    switch (this.stage) {
      case 'start': {
        if (this.startError) throw this.startError;
        const regression = this.opts.regression;
        if (regression) {
          this.res.counterexample = regressionCounterexample(this.cc, regression, sampleSettingsOf(this.cc, this.opts).ranges);
          if (this.res.counterexample) return this.end(null);
        }
        this.resume = this.opts.resume ? new ResumeIndex(this.opts.resume, this.cc.spec.id, this.cc.hash) : null;
        if (this.opts.exhaustive !== false) return this.open('exhaustive');
        return this.openSample();
      }
      case 'exhaustive': {
        const q = this.exhaustive!;
        q.end();
        if (q.failed) throw q.error;
        if (this.res.error || this.res.counterexample || q.stoppedBy) return this.end(q.stoppedBy);
        return this.openSample();
      }
      case 'sample': {
        const q = this.sample!;
        q.end();
        if (q.failed) throw q.error;
        this.stoppedBy = q.stoppedBy;
        if (this.toShrink && !this.res.error) return this.open('shrink');
        return this.end(this.stoppedBy);
      }
      case 'shrink':
        return this.end(this.stoppedBy);
      case 'done':
        return false;
    }
  }

  private open(stage: Stage): boolean {
    this.stage = stage;
    this.stageNo++;
    if (stage === 'exhaustive') this.exhaustive = this.exhaustiveQueue();
    return true;
  }

  private openSample(): boolean {
    const { count, ranges } = sampleSettingsOf(this.cc, this.opts);
    const sizes = ranges.size > 0 ? sampleSizes(this.cc, count, ranges) : [];
    if (sizes.length === 0) return this.end(null);
    this.sample = this.sampleQueue(sizes, count);
    return this.open('sample');
  }

  private end(stoppedBy: StopReason | null): false {
    this.stage = 'done';
    this.stageNo++;
    this.stoppedBy = stoppedBy;
    // What decided the failure, computed once for the final counterexample only (free until a claim fails).
    const cx = this.res.counterexample;
    if (cx && !cx.witnesses) cx.witnesses = witnessesOfBindings(this.cc, cx.bindings);
    return false;
  }

  /** An error outside any case (a size that cannot be planned, a failure explaining a case). */
  private abort(e: unknown): void {
    this.res.error = errorInfo(e, null);
    this.end(null);
  }

  /** The next unit of work of the current stage, or null when it has none left to start. */
  next(): EngineTicket | null {
    try {
      switch (this.stage) {
        case 'exhaustive': {
          const q = this.exhaustive!;
          const t = q.next();
          if (!t) return null;
          const plan = this.exhaustivePlans[t.i];
          const range = unitRange(plan, t.unit);
          return {
            stage: this.stageNo,
            size: t,
            unit: { kind: 'slice', size: plan.size, lo: range ? range[0] : null, hi: range ? range[1] : null },
          };
        }
        case 'sample': {
          const t = this.sample!.next();
          if (!t) return null;
          const plan = this.samplePlans[t.i];
          return { stage: this.stageNo, size: t, unit: { kind: 'chunk', size: plan.size, chunk: t.unit, quota: quotaOf(plan, t.unit) } };
        }
        case 'shrink': {
          const u = this.toShrink;
          this.toShrink = null;
          return u ? { stage: this.stageNo, size: null, unit: u } : null;
        }
        default:
          return null;
      }
    } catch (e) {
      this.abort(e);
      return null;
    }
  }

  /** Cases visited so far by a unit that is running. */
  progress(t: EngineTicket, visited: number): void {
    if (t.stage !== this.stageNo || !t.size) return;
    if (this.stage === 'exhaustive') this.exhaustive!.progress(t.size, visited);
    else if (this.stage === 'sample') this.sample!.progress(t.size, visited);
  }

  /** A unit's outcome. */
  accept(t: EngineTicket, o: UnitOutcome): void {
    if (t.stage !== this.stageNo) return;
    try {
      if (o.kind === 'slice') this.exhaustive!.accept(t.size!, o);
      else if (o.kind === 'chunk') this.sample!.accept(t.size!, o);
      else this.res.counterexample = o.counterexample;
    } catch (e) {
      this.abort(e);
    }
  }

  /** The result so far; final once `advance()` returned false. */
  result(): ConjectureResult {
    const r = this.res;
    r.ms = performance.now() - this.t0;
    if (r.error) r.outcome = 'error';
    else if (r.counterexample) r.outcome = 'fails';
    else if (this.stoppedBy) {
      r.outcome = 'incomplete';
      r.stoppedBy = this.stoppedBy;
    }
    return r;
  }

  // ---------------------------------------------------------------- the exhaustive phase

  private readonly exhaustivePlans: SizePlan[] = [];

  private exhaustiveQueue(): OrderedSizes<SizePlan, SliceOutcome> {
    const cc = this.cc,
      res = this.res,
      hooks = this.hooks;
    const sizes: Array<number | null> = cc.sizeIndex < 0 ? [null] : exhaustiveSizes(cc, this.opts);
    return new OrderedSizes<SizePlan, SliceOutcome>({
      planAt: (i) => {
        if (i >= sizes.length) return null;
        const plan = planExhaustiveSize(cc, sizes[i], { shard: this.shard, resume: this.resume, slice: this.shape.sliceSizes });
        this.exhaustivePlans.push(plan);
        return plan;
      },
      units: (plan) => plan.units,
      endsPhase: (o) => o.failures > 0 || o.fault !== null,
      closesSize: (o) => o.fault !== null,
      stopReason: (o) => o.stopped,
      visited: (o) => o.cases + o.skipped,
      shouldStop: () => hooks.shouldStop?.() ?? null,
      onProgress: (done, plan) => {
        let held = 0;
        for (const h of plan.held.values()) held += h.cases + h.skipped;
        hooks.onProgress?.(held + done, plan.total === null ? null : Number(plan.total), plan.label);
      },
      ready: (_i, plan, outcomes, ms, final) => {
        if (plan.covered) {
          const held = coveredPiece(cc, plan);
          if (held) res.checked.push(held);
          return false;
        }
        const fin = finishSize(cc, plan, outcomes, ms);
        if (fin.fault) {
          res.error = fin.fault;
          return true;
        }
        res.checked.push(fin.piece);
        for (const r of fin.records) hooks.onPiece?.(r);
        if (fin.best && !res.counterexample) {
          res.counterexample = buildCounterexample(cc, 'exhaustive', fin.best.values, {
            failuresAtSize: fin.failuresAtSize,
            encoded: fin.best.encoded,
          });
        }
        return fin.best !== null || (!fin.complete && !final);
      },
    });
  }

  // ---------------------------------------------------------------- the sample phase

  private readonly samplePlans: SamplePlan[] = [];

  private sampleQueue(sizes: number[], count: number): OrderedSizes<SamplePlan, ChunkOutcome> {
    const cc = this.cc,
      res = this.res,
      hooks = this.hooks;
    const seed = this.prepared.sample.seed;
    return new OrderedSizes<SamplePlan, ChunkOutcome>({
      planAt: (i) => {
        if (i >= sizes.length) return null;
        const plan = planSampleSize(cc, sizes[i], count, seed, this.shard, this.resume);
        this.samplePlans.push(plan);
        return plan;
      },
      units: (plan) => plan.units,
      endsPhase: (o) => o.failed || o.fault !== null,
      closesSize: (o) => o.failed || o.fault !== null,
      stopReason: (o) => o.stopped,
      visited: (o) => o.cases,
      shouldStop: () => hooks.shouldStop?.() ?? null,
      onProgress: (done, plan) => hooks.onProgress?.(done, plannedDraws(plan), plan.label),
      ready: (_i, plan, outcomes, ms, final) => {
        if (plan.covered) {
          const held = coveredSamplePiece(cc, plan, seed);
          if (held) res.checked.push(held);
          return false;
        }
        const fin = finishSampleSize(cc, plan, outcomes, ms, seed);
        if (fin.fault) {
          res.error = fin.fault;
          return true;
        }
        res.checked.push(fin.piece);
        if (fin.complete) hooks.onPiece?.(fin.piece);
        if (fin.failingChunk !== null && !this.toShrink) {
          const c = fin.failingChunk;
          this.toShrink = { kind: 'shrink', size: plan.size, chunk: c, quota: quotaOf(plan, c), failing: outcomes.get(c)!.failing };
          return true;
        }
        return !fin.complete && !final;
      },
    });
  }
}

/** A result before any work: it holds until something fails. */
function startResult(cc: CompiledConjecture): ConjectureResult {
  const spec = cc.spec;
  return {
    id: spec.id,
    file: spec.file,
    hash: cc.hash,
    expect: spec.expect,
    outcome: 'holds',
    statement: spec.statement,
    claim: spec.claim.text,
    checked: [],
    counterexample: null,
    error: null,
    ms: 0,
  };
}
