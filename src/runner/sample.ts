// The sample phase (FORMAT.md §4.3): for each value of the size in its sample range, `count` random
// cases drawn exactly uniformly (range bindings uniformly from their sample range, families by their
// exact samplers); the first failure is shrunk. Sampling is evidence, not proof, and reports say so.
// A size's cases come in fixed chunks, each with its own seed (src/runner/parallel/sample-size.ts),
// so the same cases are drawn in-process, by any number of workers and by any number of shards.

import { fail } from '../base/errors.js';
import type { CompiledBinding, CompiledConjecture, Frame } from '../language/conjecture/compiled.js';
import type { Value } from '../values/value.js';
import { rangeBound } from './enumerate-cases.js';
import { CaseError, PhaseResult } from './exhaustive.js';
import { RunHooks, StopReason } from './hooks.js';
import type { CheckedPiece } from './result.js';
import type { ResumeIndex } from './parallel/resume.js';
import { coveredSamplePiece, finishSampleSize, plannedDraws, planSampleSize, quotaOf, sampleCounterexample } from './parallel/sample-size.js';
import type { Shard } from './parallel/slicing.js';
import { runSampleChunk, type ChunkOutcome } from './parallel/work-units.js';
import type fc from 'fast-check';

export interface SampleOptions {
  seed: string;
  count: number;
  /** Sample ranges by binding name (overrides of the file's `sample:`), as [lo, hi]. */
  ranges: Map<string, [number, number]>;
  shard?: Shard | null;
  resume?: ResumeIndex | null;
}

/** Draw a value for one binding into the frame. */
export function drawBinding(b: CompiledBinding, frame: Frame, rng: fc.Random, ranges: Map<string, [number, number]>): void {
  const src = b.source;
  if (src.kind === 'range') {
    const r = ranges.get(b.name);
    const lo = r ? r[0] : rangeBound(src.lo(frame), b.name);
    const hi = r ? r[1] : rangeBound(src.hi(frame), b.name);
    if (hi < lo) fail(`the range of ${b.name} is empty (${lo}..${hi})`);
    frame[b.slot] = rng.nextInt(lo, hi);
  } else if (src.kind === 'list') {
    const list = src.list(frame) as Value[];
    if (list.length === 0) fail(`${b.name} ranges over an empty list`);
    frame[b.slot] = list[rng.nextInt(0, list.length - 1)];
  } else {
    const fam = src.family;
    if (!fam.arbitrary) fail(`the family ${fam.name} has no random sampler yet; leave ${b.name} out of sample:`);
    const p = fam.prepare(src.args.map((f) => f(frame)));
    if (fam.count(p) === 0n) fail(`${fam.name}(...) is empty for ${b.name}; nothing to sample`);
    frame[b.slot] = fam.arbitrary(p).generate(rng, undefined).value as Value;
  }
}

/** The sizes of the sample phase, in order (empty when there is nothing to sample). */
export function sampleSizes(cc: CompiledConjecture, opts: Pick<SampleOptions, 'count' | 'ranges'>): number[] {
  if (cc.sizeIndex < 0 || opts.count === 0) return [];
  const sr = opts.ranges.get(cc.bindings[cc.sizeIndex].name);
  if (!sr) return [];
  const out: number[] = [];
  for (let s = sr[0]; s <= sr[1]; s++) out.push(s);
  return out;
}

export function runSample(cc: CompiledConjecture, opts: SampleOptions, hooks: RunHooks): PhaseResult {
  const pieces: CheckedPiece[] = [];
  let stoppedBy: StopReason | null = null;
  const shouldStop = () => {
    const s = hooks.shouldStop?.() ?? null;
    if (s) stoppedBy = s;
    return s;
  };
  for (const size of sampleSizes(cc, opts)) {
    const plan = planSampleSize(cc, size, opts.count, opts.seed, opts.shard ?? null, opts.resume ?? null);
    if (plan.covered) {
      const held = coveredSamplePiece(cc, plan, opts.seed);
      if (held) pieces.push(held);
      continue;
    }
    const t0 = performance.now();
    const total = plannedDraws(plan);
    const outcomes = new Map<number, ChunkOutcome>();
    let done = 0;
    for (const c of plan.units) {
      const o = runSampleChunk(cc, size, c, quotaOf(plan, c), opts, {
        shouldStop,
        onProgress: (k) => hooks.onProgress?.(done + k, total, plan.label),
      });
      outcomes.set(c, o);
      done += o.cases;
      if (o.failing || o.fault || o.stopped) break;
      if (shouldStop()) break;
    }
    const fin = finishSampleSize(cc, plan, outcomes, performance.now() - t0, opts.seed);
    if (fin.fault) throw new CaseError(fin.fault.error, fin.fault.bindings);
    pieces.push(fin.piece);
    if (fin.complete) hooks.onPiece?.(fin.piece);
    if (fin.failingChunk !== null) {
      const failing = outcomes.get(fin.failingChunk)!.failing!;
      return { pieces, stoppedBy, counterexample: sampleCounterexample(cc, failing, opts.ranges, opts.seed, hooks) };
    }
    if (stoppedBy) break;
  }
  return { pieces, counterexample: null, stoppedBy };
}
