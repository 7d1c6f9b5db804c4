// The units of work a check is cut into, run the same way in-process and in worker threads:
// a slice of an exhaustive size (a range of case indices) and a chunk of a sampled size (a fixed
// number of random cases from its own seed). Each returns plain counts and at most one case.

import { EvalError } from '../../base/errors.js';
import type { CompiledConjecture, Frame } from '../../language/conjecture/compiled.js';
import { own } from '../../values/operations.js';
import type { Value } from '../../values/value.js';
import { compareCases } from '../case-order.js';
import { encodeBindings } from '../case-report.js';
import { enumerateCases } from '../enumerate-cases.js';
import { evaluateCase, SKIPPED } from '../evaluate-case.js';
import { Poller, type StopReason } from '../hooks.js';
import { randomFor } from '../seeds.js';
import { drawBinding } from '../sample.js';
import { enumerateCaseRange } from './case-space.js';

/** What a unit of work may ask while it runs. */
export interface UnitControl {
  shouldStop?(): StopReason | null;
  /** Cases visited so far in this unit (called every few thousand). */
  onProgress?(visited: number): void;
}

/** An evaluation error inside a case, with the encoded bindings of that case. */
export interface CaseFault {
  error: unknown;
  bindings: Record<string, unknown>;
}

export interface SliceOutcome {
  cases: number;
  failures: number;
  skipped: number;
  /** The simplest failing case of the slice (binding values in `for` order, owned), if any. */
  best: Value[] | null;
  /** Its index among the size's cases (for a deterministic tie-break when values cannot be compared). */
  bestIndex: bigint | null;
  fault: CaseFault | null;
  stopped: StopReason | null;
  ms: number;
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
  const out: SliceOutcome = { cases: 0, failures: 0, skipped: 0, best: null, bestIndex: null, fault: null, stopped: null, ms: 0 };
  let visited = 0;
  const poller = new Poller();
  const base = range ? range[0] : 0n;
  const onCase = (): boolean => {
    const r = evaluateCase(cc, frame);
    if (r === SKIPPED) out.skipped++;
    else {
      out.cases++;
      if (r === 0) {
        out.failures++;
        const current = cc.bindings.map((b) => frame[b.slot]);
        if (out.best === null || compareCases(cc, current, out.best) < 0) {
          out.best = current.map(own);
          out.bestIndex = base + BigInt(visited);
        }
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
    if (range === null) enumerateCases(cc, frame, fixed, onCase);
    else enumerateCaseRange(cc, frame, fixed, range[0], range[1], onCase);
  } catch (e) {
    out.fault = { error: e, bindings: encodeBindings(cc, frame) };
  }
  ctl.onProgress?.(visited);
  out.ms = performance.now() - t0;
  return out;
}

export interface ChunkOutcome {
  cases: number;
  failures: number;
  skipped: number;
  /** The failing case (the chunk stops at its first failure). */
  failing: Value[] | null;
  fault: CaseFault | null;
  stopped: StopReason | null;
  ms: number;
}

export interface SampleSettings {
  seed: string;
  /** Sample ranges by binding name, [lo, hi]. */
  ranges: Map<string, [number, number]>;
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
  const out: ChunkOutcome = { cases: 0, failures: 0, skipped: 0, failing: null, fault: null, stopped: null, ms: 0 };
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
      const r = evaluateCase(cc, frame);
      if (r === SKIPPED) {
        out.skipped++;
        continue;
      }
      out.cases++;
      if (r === 0) {
        out.failures++;
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
    if (!(e instanceof EvalError)) throw e;
    out.fault = { error: e, bindings: encodeBindings(cc, frame) };
  }
  out.ms = performance.now() - t0;
  return out;
}
