// The units of work a check is cut into, run the same way in this thread and in worker threads:
// a slice of an exhaustive size (a range of case indices, or the whole size), a chunk of a sampled
// size (a fixed number of random cases from its own seed), and the shrink of a sampled failure.
// Each returns plain counts and at most one case; `executeUnit` is what every executor calls.

import { EvalError, StopSignal } from '../../base/errors.js';
import { withStopPoll } from '../../language/expr/stop-poll.js';
import type { CompiledConjecture, Frame } from '../../language/conjecture/compiled.js';
import { own } from '../../values/operations.js';
import type { Value } from '../../values/value.js';
import { compareCases } from '../case-order.js';
import { encodeBindings, frameFor } from '../case-report.js';
import { sampleSettingsOf, withSizeOverrides, type CheckOptions } from '../check-options.js';
import { sampledCounterexample } from '../counterexample.js';
import { enumerateCases } from '../enumerate-cases.js';
import { errorInfo } from '../error-info.js';
import { evaluateCase, SKIPPED } from '../evaluate-case.js';
import { Poller, type StopReason } from '../hooks.js';
import type { Counterexample, ErrorInfo } from '../result.js';
import { DEFAULT_SEED, randomFor } from '../seeds.js';
import { enumerateCaseRange } from './case-space.js';
import { drawBinding } from './draw-case.js';

/** Cases [lo, hi) of an exhaustive size; lo and hi null: the whole size, without counting first. */
export interface SliceUnit {
  kind: 'slice';
  size: number | null;
  lo: bigint | null;
  hi: bigint | null;
}

/** Chunk `chunk` of a sampled size: `quota` random cases from the chunk's own generator. */
export interface ChunkUnit {
  kind: 'chunk';
  size: number;
  chunk: number;
  quota: number;
}

/** Re-draw a chunk's failing case (unless it is given), shrink it and build its counterexample. */
export interface ShrinkUnit {
  kind: 'shrink';
  size: number;
  chunk: number;
  quota: number;
  /** The failing case when this thread drew it (a worker thread draws it again). */
  failing?: Value[] | null;
}

export type WorkUnit = SliceUnit | ChunkUnit | ShrinkUnit;

export interface SliceOutcome {
  kind: 'slice';
  cases: number;
  failures: number;
  skipped: number;
  /** The simplest failing case of the slice (binding values in `for` order, owned), if any. */
  best: Value[] | null;
  /** Its bindings, encoded (CLI.md), computed where the case was found. */
  bestEncoded: Record<string, unknown> | null;
  /** The first evaluation error, with the bindings of its case. */
  fault: ErrorInfo | null;
  stopped: StopReason | null;
  ms: number;
}

export interface ChunkOutcome {
  kind: 'chunk';
  cases: number;
  failures: number;
  skipped: number;
  /** Whether a case failed (the chunk stops at its first failure). */
  failed: boolean;
  /** The failing case, in the thread that drew it (not sent between threads). */
  failing: Value[] | null;
  fault: ErrorInfo | null;
  stopped: StopReason | null;
  ms: number;
}

export interface ShrinkOutcome {
  kind: 'shrink';
  counterexample: Counterexample | null;
}

export type UnitOutcome = SliceOutcome | ChunkOutcome | ShrinkOutcome;

/** What a unit of work may ask while it runs. */
export interface UnitControl {
  shouldStop?(): StopReason | null;
  /** Cases visited so far in this unit (called every few thousand). */
  onProgress?(visited: number): void;
}

export interface SampleSettings {
  seed: string;
  /** Sample ranges by binding name, [lo, hi]. */
  ranges: Map<string, [number, number]>;
}

/** A conjecture ready to run units: --sizes applied, the sample seed and ranges resolved. */
export interface PreparedConjecture {
  cc: CompiledConjecture;
  sample: SampleSettings;
}

export function prepareConjecture(compiled: CompiledConjecture, opts: CheckOptions): PreparedConjecture {
  const cc = withSizeOverrides(compiled, opts);
  return { cc, sample: { seed: opts.seed ?? DEFAULT_SEED, ranges: sampleSettingsOf(cc, opts).ranges } };
}

/** Run one unit of work. */
export function executeUnit(p: PreparedConjecture, unit: WorkUnit, ctl: UnitControl): UnitOutcome {
  switch (unit.kind) {
    case 'slice':
      return runSlice(p.cc, unit.size, unit.lo === null || unit.hi === null ? null : [unit.lo, unit.hi], ctl);
    case 'chunk':
      return runSampleChunk(p.cc, unit.size, unit.chunk, unit.quota, p.sample, ctl);
    case 'shrink': {
      const failing = unit.failing ?? runSampleChunk(p.cc, unit.size, unit.chunk, unit.quota, p.sample, ctl).failing;
      const counterexample = failing
        ? sampledCounterexample(p.cc, failing, p.sample.ranges, p.sample.seed, { shouldStop: ctl.shouldStop })
        : null;
      return { kind: 'shrink', counterexample };
    }
  }
}

export function sizeFixing(cc: CompiledConjecture, size: number | null): Map<number, Value> {
  const fixed = new Map<number, Value>();
  if (size !== null && cc.sizeIndex >= 0) fixed.set(cc.sizeIndex, size);
  return fixed;
}

/**
 * Evaluate the cases [lo, hi) of a size; `range` null means the whole size (the plain enumeration,
 * without counting first). Stops at the first evaluation error.
 */
export function runSlice(cc: CompiledConjecture, size: number | null, range: [bigint, bigint] | null, ctl: UnitControl): SliceOutcome {
  const t0 = performance.now();
  const frame: Frame = new Array(cc.frameSize);
  const fixed = sizeFixing(cc, size);
  const out: SliceOutcome = {
    kind: 'slice',
    cases: 0,
    failures: 0,
    skipped: 0,
    best: null,
    bestEncoded: null,
    fault: null,
    stopped: null,
    ms: 0,
  };
  let visited = 0;
  const poller = new Poller();
  const onCase = (): boolean => {
    const r = evaluateCase(cc, frame);
    if (r === SKIPPED) out.skipped++;
    else {
      out.cases++;
      if (r === 0) {
        out.failures++;
        const current = cc.bindings.map((b) => frame[b.slot]);
        if (out.best === null || compareCases(cc, current, out.best) < 0) out.best = current.map(own);
      }
    }
    visited++;
    if (poller.due()) {
      ctl.onProgress?.(visited);
      const s = ctl.shouldStop?.() ?? null;
      if (s) {
        out.stopped = s;
        return true;
      }
    }
    return false;
  };
  try {
    // A long case polls the stop signal from inside its loops (language/expr/stop-poll.ts).
    withStopPoll(ctl.shouldStop, () => {
      if (range === null) enumerateCases(cc, frame, fixed, onCase);
      else enumerateCaseRange(cc, frame, fixed, range[0], range[1], onCase);
    });
  } catch (e) {
    if (e instanceof StopSignal)
      out.stopped = e.reason; // the case in progress is not counted
    else out.fault = errorInfo(e, encodeBindings(cc, frame));
  }
  if (out.best) out.bestEncoded = encodeBindings(cc, frameFor(cc, out.best));
  ctl.onProgress?.(visited);
  out.ms = performance.now() - t0;
  return out;
}

/** The random generator of chunk c of a sampled size: seeded from (seed, id, size, chunk). */
export function chunkRandom(cc: CompiledConjecture, seed: string, size: number, chunk: number) {
  return randomFor(seed, cc.spec.id, `${size}:${chunk}`);
}

/** Draw `quota` random cases of a size from chunk c's own generator; stop at the first failure. */
export function runSampleChunk(
  cc: CompiledConjecture,
  size: number,
  chunk: number,
  quota: number,
  settings: SampleSettings,
  ctl: UnitControl,
): ChunkOutcome {
  const t0 = performance.now();
  const rng = chunkRandom(cc, settings.seed, size, chunk);
  const frame: Frame = new Array(cc.frameSize);
  const out: ChunkOutcome = {
    kind: 'chunk',
    cases: 0,
    failures: 0,
    skipped: 0,
    failed: false,
    failing: null,
    fault: null,
    stopped: null,
    ms: 0,
  };
  const poller = new Poller();
  const sizeB = cc.bindings[cc.sizeIndex];
  // A `where` that rejects most draws must not loop for ever.
  const maxAttempts = quota * 20 + 20;
  let attempts = 0;
  try {
    while (out.cases < quota && attempts < maxAttempts) {
      attempts++;
      for (let i = 0; i < cc.bindings.length; i++) {
        if (i === cc.sizeIndex) frame[sizeB.slot] = size;
        else drawBinding(cc.bindings[i], frame, rng, settings.ranges);
      }
      const r = withStopPoll(ctl.shouldStop, () => evaluateCase(cc, frame));
      if (r === SKIPPED) {
        out.skipped++;
        continue;
      }
      out.cases++;
      if (r === 0) {
        out.failures++;
        out.failed = true;
        out.failing = cc.bindings.map((b) => own(frame[b.slot]));
        break;
      }
      if (poller.due()) {
        ctl.onProgress?.(out.cases);
        const s = ctl.shouldStop?.() ?? null;
        if (s) {
          out.stopped = s;
          break;
        }
      }
    }
  } catch (e) {
    if (e instanceof StopSignal) out.stopped = e.reason;
    else if (!(e instanceof EvalError)) throw e;
    else out.fault = errorInfo(e, encodeBindings(cc, frame));
  }
  out.ms = performance.now() - t0;
  return out;
}
