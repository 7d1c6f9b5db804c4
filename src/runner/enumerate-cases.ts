// Nested enumeration of a conjecture's bindings into a frame: range bindings loop over their values,
// family bindings use the family's in-place enumerator. Nothing is allocated per case.

import { fail } from '../base/errors.js';
import { isInt } from '../numbers/integer.js';
import type { CompiledConjecture, Frame } from '../language/conjecture/compiled.js';
import type { Value } from '../values/value.js';

/** An integer bound of a range, as a JS number. */
export function rangeBound(v: Value, name: string): number {
  if (!isInt(v)) fail(`the range of ${name} must have integer bounds, got ${String(v)}`);
  if (typeof v === 'bigint') fail(`the range of ${name} is too large to enumerate (bound ${v})`);
  return v;
}

/**
 * Visit every case. `fixed` pins binding index -> value (the size). `onCase` returns true to stop.
 * Returns true when stopped.
 */
export function enumerateCases(cc: CompiledConjecture, frame: Frame, fixed: Map<number, Value>, onCase: () => boolean, from = 0): boolean {
  const bs = cc.bindings;
  const level = (i: number): boolean => {
    if (i === bs.length) return onCase();
    const b = bs[i];
    if (fixed.has(i)) {
      frame[b.slot] = fixed.get(i)!;
      return level(i + 1);
    }
    const src = b.source;
    switch (src.kind) {
      case 'range': {
        const lo = rangeBound(src.lo(frame), b.name),
          hi = rangeBound(src.hi(frame), b.name);
        for (let v = lo; v <= hi; v++) {
          frame[b.slot] = v;
          if (level(i + 1)) return true;
        }
        return false;
      }
      case 'list': {
        const list = src.list(frame);
        if (!Array.isArray(list)) fail(`${b.name} must range over a list, a range or a family`);
        for (const v of list) {
          frame[b.slot] = v;
          if (level(i + 1)) return true;
        }
        return false;
      }
      case 'family': {
        const p = src.family.prepare(src.args.map((f) => f(frame)));
        const next = i + 1;
        const slot = b.slot;
        return src.family.enumerate(p, (obj: Value) => {
          frame[slot] = obj;
          return level(next);
        });
      }
    }
  };
  return level(from);
}
