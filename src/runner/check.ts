// Checking one compiled conjecture: a regression case first (a counterexample file from an earlier
// run), then the exhaustive phase, then the sample phase (FORMAT.md §4).

import { EvalError, InputError } from '../base/errors.js';
import type { CompiledConjecture, Fn } from '../language/conjecture/compiled.js';
import { witnessesOfBindings } from '../language/conjecture/witnesses.js';
import type { Value } from '../values/value.js';
import { bindingTexts, encodeBindings, explainCase, frameFor, sizeOf } from './case-report.js';
import { rangeBound } from './enumerate-cases.js';
import { evaluateCase } from './evaluate-case.js';
import { isValid } from './shrink.js';
import { CaseError, PhaseResult, runExhaustive } from './exhaustive.js';
import type { RunHooks, StopReason } from './hooks.js';
import type { CheckedPiece, ConjectureResult, Counterexample, ErrorInfo } from './result.js';
import { runSample } from './sample.js';
import { DEFAULT_SEED } from './seeds.js';
import { ResumeIndex, type HeldRecord } from './parallel/resume.js';
import type { Shard } from './parallel/slicing.js';

export interface CheckOptions {
  /** --sizes: replacement exhaustive ranges by binding name. */
  sizes?: Map<string, [number, number]>;
  exhaustive?: boolean;
  /** --sample: replacement sample ranges by binding name. */
  sampleRanges?: Map<string, [number, number]>;
  /** --count; 0 skips sampling. */
  count?: number;
  seed?: string;
  /** A case to try first (from counterexamples/<id>.yaml), as decoded binding values in `for` order. */
  regression?: Value[] | null;
  /** --shard I/K: only this shard's slices of every size and chunks of every sampled size. */
  shard?: Shard | null;
  /** --resume: ledger records of earlier runs; finished sizes and slices of the current hash are skipped. */
  resume?: readonly HeldRecord[] | null;
}

export const DEFAULT_SAMPLE_COUNT = 100;

const constFn = (v: number): Fn => () => v;

/** Apply --sizes to range bindings other than the size (the size's range is read by `sizesOf`). */
function withSizes(cc: CompiledConjecture, sizes?: Map<string, [number, number]>): CompiledConjecture {
  if (!sizes || sizes.size === 0) return cc;
  return {
    ...cc,
    bindings: cc.bindings.map((b) => {
      const r = sizes.get(b.name);
      return r && b.source.kind === 'range' ? { ...b, source: { kind: 'range', lo: constFn(r[0]), hi: constFn(r[1]) } } : b;
    }),
  };
}

/** The exhaustive sizes: the size binding's range (which may not depend on other bindings). */
export function sizesOf(cc: CompiledConjecture): number[] {
  if (cc.sizeIndex < 0) return [];
  const b = cc.bindings[cc.sizeIndex];
  if (b.source.kind !== 'range') return [];
  const frame: Value[] = new Array(cc.frameSize);
  const lo = rangeBound(b.source.lo(frame), b.name), hi = rangeBound(b.source.hi(frame), b.name);
  const out: number[] = [];
  for (let v = lo; v <= hi; v++) out.push(v);
  return out;
}

/** The sample ranges: the file's `sample:` with --sample overrides, evaluated. */
export function sampleRangesOf(cc: CompiledConjecture, overrides?: Map<string, [number, number]>): Map<string, [number, number]> {
  const out = new Map<string, [number, number]>();
  const frame: Value[] = new Array(cc.frameSize);
  for (const b of cc.bindings) {
    if (b.sample) out.set(b.name, [rangeBound(b.sample.lo(frame), b.name), rangeBound(b.sample.hi(frame), b.name)]);
  }
  for (const [k, v] of overrides ?? []) out.set(k, v);
  return out;
}

export function errorInfo(e: unknown, bindings: Record<string, unknown> | null): ErrorInfo {
  if (e instanceof EvalError || e instanceof InputError) {
    return {
      message: e.message,
      file: e.pos?.file ?? null,
      line: e.pos?.line ?? null,
      column: e.pos?.column ?? null,
      bindings,
      ...(e instanceof InputError && e.snippet ? { snippet: e.snippet } : {}),
      ...(e instanceof InputError && e.suggestion ? { suggestion: e.suggestion } : {}),
    };
  }
  throw e; // a bug in hunch itself: the CLI reports it as such
}

/** The exhaustive sizes of a run: the size binding's range, or --sizes for it. */
export function exhaustiveSizes(cc: CompiledConjecture, opts: CheckOptions): number[] {
  const override = cc.sizeIndex >= 0 ? opts.sizes?.get(cc.bindings[cc.sizeIndex].name) : undefined;
  if (override) return Array.from({ length: Math.max(0, override[1] - override[0] + 1) }, (_, i) => override[0] + i);
  return sizesOf(cc);
}

/** The sample count and ranges of a run (file, then options). */
export function sampleSettingsOf(cc: CompiledConjecture, opts: CheckOptions): { count: number; ranges: Map<string, [number, number]> } {
  return { count: opts.count ?? cc.spec.sample?.count ?? DEFAULT_SAMPLE_COUNT, ranges: sampleRangesOf(cc, opts.sampleRanges) };
}

/** --sizes applied to a compiled conjecture (the runner and the worker pool both check this). */
export function withSizeOverrides(cc: CompiledConjecture, opts: CheckOptions): CompiledConjecture {
  return withSizes(cc, opts.sizes);
}

export function tryRegression(cc: CompiledConjecture, vals: Value[], sampleRanges = new Map<string, [number, number]>()): Counterexample | null {
  // A saved case (perhaps edited by hand) counts only if it is still a case of the conjecture.
  if (vals.length !== cc.bindings.length || !isValid(cc, vals, sampleRanges)) return null;
  const f = frameFor(cc, vals);
  if (evaluateCase(cc, f) !== 0) return null;
  const { values, sides } = explainCase(cc, f);
  return {
    phase: 'regression',
    size: sizeOf(cc, f),
    bindings: encodeBindings(cc, f),
    values,
    sides,
    failuresAtSize: null,
    shrinkSteps: 0,
    seed: null,
    text: bindingTexts(cc, f),
  };
}

/** A result before any work: it holds until something fails. */
export function startResult(cc: CompiledConjecture): ConjectureResult {
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

/** The outcome from what was found: an error, else a counterexample, else a stop, else it holds. */
export function finishResult(result: ConjectureResult, t0: number, stoppedBy: StopReason | null, cc?: CompiledConjecture): ConjectureResult {
  if (cc && result.counterexample) result.counterexample.witnesses = witnessesOfBindings(cc, result.counterexample.bindings);
  result.ms = performance.now() - t0;
  if (result.error) result.outcome = 'error';
  else if (result.counterexample) result.outcome = 'fails';
  else if (stoppedBy) {
    result.outcome = 'incomplete';
    result.stoppedBy = stoppedBy;
  }
  return result;
}

export function checkConjecture(compiled: CompiledConjecture, opts: CheckOptions, hooks: RunHooks): ConjectureResult {
  const t0 = performance.now();
  const cc = withSizes(compiled, opts.sizes);
  const spec = cc.spec;
  const result = startResult(cc);
  const finish = (stoppedBy: StopReason | null) => finishResult(result, t0, stoppedBy, cc);
  const absorb = (r: PhaseResult) => {
    result.checked.push(...r.pieces);
    result.counterexample = r.counterexample;
    return r.stoppedBy;
  };
  try {
    if (opts.regression) {
      try {
        result.counterexample = tryRegression(cc, opts.regression, sampleSettingsOf(cc, opts).ranges);
      } catch (e) {
        if (!(e instanceof EvalError)) throw e; // an old case that no longer evaluates is simply not a counterexample
      }
      if (result.counterexample) return finish(null);
    }
    const shard = opts.shard ?? null;
    const resume = opts.resume ? new ResumeIndex(opts.resume, spec.id, cc.hash) : null;
    if (opts.exhaustive !== false) {
      const stopped = absorb(runExhaustive(cc, exhaustiveSizes(cc, opts), hooks, { shard, resume }));
      if (stopped || result.counterexample) return finish(stopped);
    }
    const { count, ranges } = sampleSettingsOf(cc, opts);
    if (count > 0 && ranges.size > 0) {
      const stopped = absorb(runSample(cc, { seed: opts.seed ?? DEFAULT_SEED, count, ranges, shard, resume }, hooks));
      return finish(stopped);
    }
    return finish(null);
  } catch (e) {
    if (e instanceof CaseError) result.error = errorInfo(e.error, e.bindings);
    else result.error = errorInfo(e, null);
    return finish(null);
  }
}

export type { CheckedPiece };
