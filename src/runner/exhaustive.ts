// The exhaustive phase (FORMAT.md §4.2): sizes in increasing order; stop after the first size with
// a failure, but finish that size, count its failures and keep the simplest failing case.

import type { CompiledConjecture, Frame } from '../language/conjecture/compiled.js';
import { own } from '../values/operations.js';
import type { Value } from '../values/value.js';
import { compareCases } from './case-order.js';
import { bindingTexts, encodeBindings, explainCase, frameFor, sizeOf } from './case-report.js';
import { enumerateCases } from './enumerate-cases.js';
import { evaluateCase, SKIPPED } from './evaluate-case.js';
import { POLL_MASK, RunHooks, StopReason } from './hooks.js';
import { plannedCases } from './plan.js';
import type { CheckedPiece, Counterexample } from './result.js';

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

export function runExhaustive(cc: CompiledConjecture, sizes: number[], hooks: RunHooks): PhaseResult {
  const pieces: CheckedPiece[] = [];
  const frame: Frame = new Array(cc.frameSize);
  let stoppedBy: StopReason | null = null;
  const sizeList: Array<number | null> = cc.sizeIndex < 0 ? [null] : sizes;

  for (const size of sizeList) {
    const fixed = new Map<number, Value>();
    if (size !== null) fixed.set(cc.sizeIndex, size);
    const planned = plannedCases(cc, fixed);
    const total = planned === null ? null : Number(planned);
    const label = size === null ? cc.spec.id : `${cc.spec.id}: ${cc.bindings[cc.sizeIndex].name} = ${size}`;
    let cases = 0, failures = 0, skipped = 0, visited = 0;
    let best: Value[] | null = null;
    const t0 = performance.now();
    const stopped = (() => {
      try {
        return enumerateCases(cc, frame, fixed, () => {
          const r = evaluateCase(cc, frame);
          if (r === SKIPPED) skipped++;
          else {
            cases++;
            if (r === 0) {
              failures++;
              const current = cc.bindings.map((b) => frame[b.slot]);
              if (best === null || compareCases(cc, current, best) < 0) best = current.map(own);
            }
          }
          if ((++visited & POLL_MASK) === 0) {
            hooks.onProgress?.(visited, total, label);
            const s = hooks.shouldStop?.() ?? null;
            if (s) {
              stoppedBy = s;
              return true;
            }
          }
          return false;
        });
      } catch (e) {
        throw new CaseError(e, encodeBindings(cc, frame));
      }
    })();
    const piece: CheckedPiece = {
      phase: 'exhaustive',
      size: size === null ? {} : { [cc.bindings[cc.sizeIndex].name]: size },
      cases,
      failures,
      skipped,
      ms: performance.now() - t0,
    };
    if (stopped) piece.partial = true;
    pieces.push(piece);
    if (!stopped) hooks.onPiece?.(piece);
    if (best !== null) {
      const f = frameFor(cc, best);
      const { values, sides } = explainCase(cc, f);
      return {
        pieces,
        stoppedBy,
        counterexample: {
          phase: 'exhaustive',
          size: sizeOf(cc, f),
          bindings: encodeBindings(cc, f),
          values,
          sides,
          failuresAtSize: stopped ? null : failures,
          shrinkSteps: 0,
          seed: null,
          text: bindingTexts(cc, f),
        },
      };
    }
    if (stopped) break;
  }
  return { pieces, counterexample: null, stoppedBy };
}
