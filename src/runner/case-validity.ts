// Whether given binding values are a case of a conjecture: each range binding an integer in its
// range (the size may go beyond the exhaustive range up to any sampled size), each family binding
// an object of that family at the parameters the earlier bindings give, each list binding an
// element of its list. Used where a case comes from outside (a replayed counterexample file), so
// a forged or edited case is never evaluated as if it were one.

import { EvalError } from '../base/errors.js';
import type { CompiledConjecture } from '../language/conjecture/compiled.js';
import { isInt } from '../numbers/integer.js';
import { valueEquals, valueToText } from '../values/operations.js';
import type { Value } from '../values/value.js';
import { frameFor } from './case-report.js';
import { rangeBound } from './enumerate-cases.js';

function shown(v: Value): string {
  try {
    const s = valueToText(v);
    return s.length > 80 ? s.slice(0, 77) + '...' : s;
  } catch {
    return 'this value';
  }
}

/** Why `vals` (in `for` order) is not a case of the conjecture, or null when it is one. */
export function notACaseReason(cc: CompiledConjecture, vals: Value[], sampleRanges: Map<string, [number, number]>): string | null {
  if (vals.length !== cc.bindings.length) return `it gives ${vals.length} values for ${cc.bindings.length} bindings`;
  const frame = frameFor(cc, vals);
  try {
    for (let i = 0; i < cc.bindings.length; i++) {
      const b = cc.bindings[i];
      const src = b.source;
      const v = vals[i];
      if (src.kind === 'range') {
        if (!isInt(v)) return `${b.name} = ${shown(v)} is not an integer`;
        const lo = rangeBound(src.lo(frame), b.name);
        const hi = rangeBound(src.hi(frame), b.name);
        const s = sampleRanges.get(b.name);
        const min = s ? Math.min(lo, s[0]) : lo;
        const n = Number(v);
        if (typeof v === 'bigint' || n < min)
          return `${b.name} = ${shown(v)} is outside its range ${lo}..${hi}${s ? ` (sampled ${s[0]}..${s[1]})` : ''}`;
        if (i !== cc.sizeIndex && n > (s ? Math.max(hi, s[1]) : hi))
          return `${b.name} = ${shown(v)} is outside its range ${lo}..${hi}${s ? ` (sampled ${s[0]}..${s[1]})` : ''}`;
      } else if (src.kind === 'family') {
        const fam = src.family;
        const args = src.args.map((f) => f(frame));
        const call = `${fam.name}(${args.map(shown).join(', ')})`;
        if (typeof v !== 'object' || v === null || (v as { kind?: unknown }).kind !== fam.objectKind)
          return `${b.name} = ${shown(v)} is not a ${fam.objectKind}, so not in ${call}`;
        const p = fam.prepare(args);
        if (!fam.isMember(p, v as never)) return `${b.name} = ${shown(v)} is not in ${call}`;
      } else {
        const list = src.list(frame);
        if (!Array.isArray(list) || !list.some((x) => valueEquals(x as Value, v))) return `${b.name} = ${shown(v)} is not in its list`;
      }
    }
  } catch (e) {
    if (e instanceof EvalError) return `its bindings cannot be evaluated: ${e.message}`;
    throw e;
  }
  return null;
}
