// Turning a failing (or erroring) case into the encoded record of CLI.md: bindings, let values and
// the two sides of the claim's top comparison.

import { EvalError } from '../base/errors.js';
import type { CompiledConjecture, Frame } from '../language/conjecture/compiled.js';
import { encodeValue, valueToText } from '../values/operations.js';
import type { Value } from '../values/value.js';

export function encodeBindings(cc: CompiledConjecture, frame: Frame): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const b of cc.bindings) if (frame[b.slot] !== undefined) out[b.name] = encodeValue(frame[b.slot]);
  return out;
}

export function bindingTexts(cc: CompiledConjecture, frame: Frame): Record<string, string> {
  const out: Record<string, string> = {};
  for (const b of cc.bindings) out[b.name] = valueToText(frame[b.slot]);
  return out;
}

export function sizeOf(cc: CompiledConjecture, frame: Frame): Record<string, number> {
  if (cc.sizeIndex < 0) return {};
  const b = cc.bindings[cc.sizeIndex];
  return { [b.name]: frame[b.slot] as number };
}

/** Re-evaluate lets and sides on a frame whose bindings are set (a snapshot of the failing case). */
export function explainCase(cc: CompiledConjecture, frame: Frame): { values: Record<string, unknown>; sides: [unknown, unknown] | null } {
  const values: Record<string, unknown> = {};
  for (const l of cc.lets) {
    frame[l.slot] = l.fn(frame);
    values[l.name] = encodeValue(frame[l.slot]);
  }
  let sides: [unknown, unknown] | null = null;
  if (cc.sides) {
    try {
      sides = [encodeValue(cc.sides[0](frame)), encodeValue(cc.sides[1](frame))];
    } catch (e) {
      if (!(e instanceof EvalError)) throw e;
    }
  }
  return { values, sides };
}

/** Set the bindings of a case into a fresh frame. */
export function frameFor(cc: CompiledConjecture, bindings: readonly Value[]): Frame {
  const frame: Frame = new Array(cc.frameSize);
  cc.bindings.forEach((b, i) => (frame[b.slot] = bindings[i]));
  return frame;
}
