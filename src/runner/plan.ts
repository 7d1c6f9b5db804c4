// How many cases a size has, computed from the families' exact counts before anything runs: used
// for progress, for coverage reports, and to refuse an enumeration that would take years.

import { EvalError, InputError } from '../base/errors.js';
import type { CompiledConjecture, Frame } from '../language/conjecture/compiled.js';
import type { Value } from '../values/value.js';
import { rangeBound } from './enumerate-cases.js';

/** Beyond this many cases in one size, the exhaustive phase is refused (it would take days to years). */
export const MAX_EXHAUSTIVE_CASES = 10n ** 13n;

const UNSET = Symbol('unset');

/**
 * The exact number of assignments at a size (before `where`), or null when a family's
 * parameters depend on another family's object (then only enumeration can tell).
 */
export function plannedCases(cc: CompiledConjecture, fixed: Map<number, Value>, strict = false): bigint | null {
  const frame: Frame = new Array(cc.frameSize).fill(UNSET);
  const bs = cc.bindings;
  const level = (i: number): bigint | null => {
    if (i === bs.length) return 1n;
    const b = bs[i];
    if (fixed.has(i)) {
      frame[b.slot] = fixed.get(i)!;
      return level(i + 1);
    }
    const src = b.source;
    try {
      if (src.kind === 'range') {
        const lo = rangeBound(src.lo(frame), b.name),
          hi = rangeBound(src.hi(frame), b.name);
        if (hi < lo) return 0n;
        let total = 0n;
        // Later bindings may depend on this one; sum exactly over a modest number of values.
        if (hi - lo > 10_000) {
          frame[b.slot] = hi;
          const per = level(i + 1);
          return per === null ? null : per * BigInt(hi - lo + 1);
        }
        for (let v = lo; v <= hi; v++) {
          frame[b.slot] = v;
          const r = level(i + 1);
          if (r === null) return null;
          total += r;
        }
        return total;
      }
      if (src.kind === 'list') {
        const list = src.list(frame) as Value[];
        let total = 0n;
        for (const v of list) {
          frame[b.slot] = v;
          const r = level(i + 1);
          if (r === null) return null;
          total += r;
        }
        return total;
      }
      const args = src.args.map((f) => f(frame));
      if (args.some((a) => (a as unknown) === UNSET)) return null;
      let p: unknown;
      try {
        p = src.family.prepare(args);
      } catch (e) {
        // The arguments are known, so the family itself refuses them: a mistake in the file.
        if (strict && e instanceof EvalError) throw new InputError(`${b.name}: ${e.message}`, b.pos, b.name);
        throw e;
      }
      const n = src.family.count(p);
      frame[b.slot] = UNSET as unknown as Value;
      const rest = level(i + 1);
      return rest === null ? null : n * rest;
    } catch (e) {
      if (e instanceof InputError) throw e;
      return null; // depends on an unset object, or invalid: enumeration will report it
    } finally {
      frame[b.slot] = UNSET as unknown as Value;
    }
  };
  return level(0);
}
