// Evaluating one case on a frame whose bindings are set: where, lets, claim.

import { EvalError } from '../base/errors.js';
import type { CompiledConjecture, Frame } from '../language/conjecture/compiled.js';
import { valueToText } from '../values/operations.js';

export const SKIPPED = 2;

/** 1 holds, 0 fails, SKIPPED when `where` excludes the case. */
export function evaluateCase(cc: CompiledConjecture, frame: Frame): 0 | 1 | 2 {
  if (cc.where !== null) {
    const w = cc.where(frame);
    if (w === false) return SKIPPED;
    if (w !== true) throw new EvalError(`where must be true or false, got ${valueToText(w)}`, cc.spec.where?.pos);
  }
  const lets = cc.lets;
  for (let i = 0; i < lets.length; i++) frame[lets[i].slot] = lets[i].fn(frame);
  const c = cc.claim(frame);
  if (c === true) return 1;
  if (c === false) return 0;
  throw new EvalError(`the claim must be true or false, got ${valueToText(c)}`, cc.spec.claim.pos);
}
