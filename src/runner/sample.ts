// The sample phase (FORMAT.md §4.3): for each value of the size in its sample range, `count` random
// cases drawn exactly uniformly (range bindings uniformly from their sample range, families by their
// exact samplers); the first failure is shrunk. Sampling is evidence, not proof, and reports say so.

import { EvalError, fail } from '../base/errors.js';
import type { CompiledBinding, CompiledConjecture, Frame } from '../language/conjecture/compiled.js';
import type { Value } from '../values/value.js';
import { bindingTexts, encodeBindings, explainCase, frameFor, sizeOf } from './case-report.js';
import { rangeBound } from './enumerate-cases.js';
import { evaluateCase, SKIPPED } from './evaluate-case.js';
import { CaseError, PhaseResult } from './exhaustive.js';
import { RunHooks, StopReason } from './hooks.js';
import type { CheckedPiece } from './result.js';
import { randomFor } from './seeds.js';
import { shrinkCase } from './shrink.js';
import type fc from 'fast-check';

export interface SampleOptions {
  seed: string;
  count: number;
  /** Sample ranges by binding name (overrides of the file's `sample:`), as [lo, hi]. */
  ranges: Map<string, [number, number]>;
}

/** Draw a value for one binding into the frame. */
function draw(b: CompiledBinding, frame: Frame, rng: fc.Random, ranges: Map<string, [number, number]>): void {
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

export function runSample(cc: CompiledConjecture, opts: SampleOptions, hooks: RunHooks): PhaseResult {
  const pieces: CheckedPiece[] = [];
  let stoppedBy: StopReason | null = null;
  if (cc.sizeIndex < 0 || opts.count === 0) return { pieces, counterexample: null, stoppedBy };
  const sizeB = cc.bindings[cc.sizeIndex];
  const sr = opts.ranges.get(sizeB.name);
  if (!sr) return { pieces, counterexample: null, stoppedBy };
  const frame: Frame = new Array(cc.frameSize);

  for (let size = sr[0]; size <= sr[1]; size++) {
    const rng = randomFor(opts.seed, cc.spec.id, String(size));
    let cases = 0, failures = 0, skipped = 0, attempts = 0;
    const t0 = performance.now();
    const label = `${cc.spec.id}: sampling ${sizeB.name} = ${size}`;
    let failing: Value[] | null = null;
    const maxAttempts = opts.count * 20 + 100;
    try {
      while (cases < opts.count && attempts < maxAttempts) {
        attempts++;
        for (let i = 0; i < cc.bindings.length; i++) {
          if (i === cc.sizeIndex) frame[sizeB.slot] = size;
          else draw(cc.bindings[i], frame, rng, opts.ranges);
        }
        const r = evaluateCase(cc, frame);
        if (r === SKIPPED) {
          skipped++;
          continue;
        }
        cases++;
        if (r === 0) {
          failures++;
          failing = cc.bindings.map((b) => frame[b.slot]);
          break;
        }
        if ((cases & 63) === 0) {
          hooks.onProgress?.(cases, opts.count, label);
          const s = hooks.shouldStop?.() ?? null;
          if (s) {
            stoppedBy = s;
            break;
          }
        }
      }
    } catch (e) {
      if (e instanceof EvalError) throw new CaseError(e, encodeBindings(cc, frame));
      throw e;
    }
    const piece: CheckedPiece = {
      phase: 'sample',
      size: { [sizeB.name]: size },
      cases,
      failures,
      skipped,
      ms: performance.now() - t0,
      seed: opts.seed,
    };
    if (stoppedBy) piece.partial = true;
    pieces.push(piece);
    if (!stoppedBy) hooks.onPiece?.(piece);
    if (failing) {
      const before = sizeOf(cc, frameFor(cc, failing));
      const shrunk = shrinkCase(cc, failing, opts.ranges, hooks);
      const f = frameFor(cc, shrunk.bindings);
      const { values, sides } = explainCase(cc, f);
      return {
        pieces,
        stoppedBy,
        counterexample: {
          phase: 'sample',
          size: sizeOf(cc, f),
          bindings: encodeBindings(cc, f),
          values,
          sides,
          failuresAtSize: null,
          shrinkSteps: shrunk.steps,
          seed: opts.seed,
          shrunkFrom: before,
          text: bindingTexts(cc, f),
        },
      };
    }
    if (stoppedBy) break;
  }
  return { pieces, counterexample: null, stoppedBy };
}
