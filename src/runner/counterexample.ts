// Building the counterexample of a check (CLI.md's `counterexample`): every phase ends here, so this
// is the one place that turns a failing case into what reports, the ledger and counterexample files
// show. `buildCounterexample` re-evaluates the case's lets and the two sides of the claim.

import { EvalError } from '../base/errors.js';
import type { CompiledConjecture } from '../language/conjecture/compiled.js';
import type { Value } from '../values/value.js';
import { bindingTexts, encodeBindings, explainCase, frameFor, sizeOf } from './case-report.js';
import { evaluateCase } from './evaluate-case.js';
import type { RunHooks } from './hooks.js';
import type { Counterexample, Phase } from './result.js';
import { isValid, shrinkCase } from './shrink.js';

export interface CounterexampleDetails {
  /** Failures counted at the size (exhaustive, when the size was finished), else null. */
  failuresAtSize?: number | null;
  shrinkSteps?: number;
  seed?: string | null;
  /** Size before shrinking (sampled cases). */
  shrunkFrom?: Record<string, number>;
  /** The exact encoding of the bindings when it came with the case (from a worker thread). */
  encoded?: Record<string, unknown> | null;
}

/** The counterexample of a failing case, given by its binding values in `for` order. */
export function buildCounterexample(
  cc: CompiledConjecture,
  phase: Phase,
  values: readonly Value[],
  d: CounterexampleDetails = {},
): Counterexample {
  const f = frameFor(cc, values);
  const explained = explainCase(cc, f);
  const cx: Counterexample = {
    phase,
    size: sizeOf(cc, f),
    bindings: d.encoded ?? encodeBindings(cc, f),
    values: explained.values,
    sides: explained.sides,
    failuresAtSize: d.failuresAtSize ?? null,
    shrinkSteps: d.shrinkSteps ?? 0,
    seed: d.seed ?? null,
  };
  if (d.shrunkFrom) cx.shrunkFrom = d.shrunkFrom;
  cx.text = bindingTexts(cc, f);
  return cx;
}

/**
 * A saved case (from counterexamples/<id>.yaml, perhaps edited by hand) as a counterexample, when it
 * is still a case of the conjecture (membership, ranges) and still fails; an old case that no longer
 * evaluates is simply not a counterexample.
 */
export function regressionCounterexample(
  cc: CompiledConjecture,
  vals: Value[],
  sampleRanges: Map<string, [number, number]>,
  hooks: RunHooks = {},
): Counterexample | null {
  try {
    if (vals.length !== cc.bindings.length || !isValid(cc, vals, sampleRanges)) return null;
    if (evaluateCase(cc, frameFor(cc, vals)) !== 0) return null;
    // A saved case must not freeze a worse one: shrink it too (the file is replaced when this finds
    // a simpler case, e.g. after new shrink steps).
    const before = sizeOf(cc, frameFor(cc, vals));
    const shrunk = shrinkCase(cc, vals, sampleRanges, hooks);
    if (shrunk.steps > 0) return buildCounterexample(cc, 'regression', shrunk.bindings, { shrinkSteps: shrunk.steps, shrunkFrom: before });
    return buildCounterexample(cc, 'regression', vals);
  } catch (e) {
    if (e instanceof EvalError) return null;
    throw e;
  }
}

/** Shrink a sampled failing case to the simplest still-failing one, and build its counterexample. */
export function sampledCounterexample(
  cc: CompiledConjecture,
  failing: Value[],
  ranges: Map<string, [number, number]>,
  seed: string,
  hooks: RunHooks,
): Counterexample {
  const before = sizeOf(cc, frameFor(cc, failing));
  const shrunk = shrinkCase(cc, failing, ranges, hooks);
  return buildCounterexample(cc, 'sample', shrunk.bindings, { shrinkSteps: shrunk.steps, seed, shrunkFrom: before });
}
