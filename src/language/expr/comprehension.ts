// Running comprehensions: iterating generators (ranges without building a list, families through
// their enumerators, lists and measures' supports) and the eleven reducers. A visitor returns true
// to stop early (all/any).

import { EvalError, type SourcePos } from '../../base/errors.js';
import type { Family } from '../../families/family.js';
import * as ops from '../../library/operators.js';
import { Distribution } from '../../values/distribution.js';
import { own, valueKey } from '../../values/operations.js';
import { compareValues } from '../../values/order.js';
import { isStructured } from '../../values/structured.js';
import { article, typeOf, type TypeName } from '../../values/types.js';
import type { Value } from '../../values/value.js';
import type { Reducer } from './ast.js';
import type { Fn, Frame } from './frame.js';
import { at2, located, notBoolean, short } from './runtime.js';
import { tick } from './stop-poll.js';

export type SourcePlan =
  | { kind: 'range'; lo: (fr: Frame) => number; hi: (fr: Frame) => number }
  | { kind: 'family'; family: Family; args: Fn[]; prepare: (fr: Frame) => unknown; pos: SourcePos | undefined }
  | { kind: 'value'; fn: Fn; pos: SourcePos | undefined };

export interface GenPlan {
  source: SourcePlan;
  slot: number;
  where?: (fr: Frame) => boolean;
}

/** Structured values that can be iterated expose `elements()` (measures: their support). */
interface Iterable_ {
  elements(): readonly Value[];
}

/** The elements of a value used as a source. */
export function elementsOf(v: Value, pos: SourcePos | undefined): readonly Value[] {
  if (Array.isArray(v)) return v;
  if (isStructured(v) && typeof (v as unknown as Iterable_).elements === 'function') {
    try {
      return (v as unknown as Iterable_).elements();
    } catch (e) {
      throw located(e, pos);
    }
  }
  if (v instanceof Distribution) return v.support();
  throw new EvalError(
    `cannot iterate over ${article(typeOf(v))} (${short(v)}): a source is a range a..b, a list, a family or a measure`,
    pos,
  );
}

type Visit = () => boolean;

/** Runs one generator: binds its slot to each element, applies its where, calls inner; true = stopped. */
function iterator(g: GenPlan): (fr: Frame, inner: Visit) => boolean {
  const { slot, where } = g;
  const src = g.source;
  switch (src.kind) {
    case 'range': {
      const { lo, hi } = src;
      return (fr, inner) => {
        const b = hi(fr);
        for (let i = lo(fr); i <= b; i++) {
          tick();
          fr[slot] = i;
          if (where && !where(fr)) continue;
          if (inner()) return true;
        }
        return false;
      };
    }
    case 'family': {
      const { family, prepare, pos } = src;
      return (fr, inner) => {
        const p = prepare(fr);
        const visit = (obj: Value) => {
          tick();
          fr[slot] = obj;
          if (where && !where(fr)) return false;
          return inner();
        };
        try {
          return family.enumerate(p, visit);
        } catch (e) {
          throw located(e, pos);
        }
      };
    }
    case 'value': {
      const { fn, pos } = src;
      return (fr, inner) => {
        const list = elementsOf(fn(fr), pos);
        for (let i = 0; i < list.length; i++) {
          tick();
          fr[slot] = list[i];
          if (where && !where(fr)) continue;
          if (inner()) return true;
        }
        return false;
      };
    }
  }
}

/** Nested generators, outermost first, as one runner: run(fr, visit) visits every combination. */
function runner(plans: GenPlan[]): (fr: Frame, visit: Visit) => boolean {
  const its = plans.map(iterator);
  if (its.length === 1) return its[0];
  let run: (fr: Frame, visit: Visit) => boolean = (_fr, visit) => visit();
  for (let k = its.length - 1; k >= 0; k--) {
    const it = its[k],
      next = run;
    run = (fr, visit) => it(fr, () => next(fr, visit));
  }
  return run;
}

export function compileReduction(
  reducer: Reducer,
  plans: GenPlan[],
  body: { fn: Fn; type: TypeName },
  pos: SourcePos | undefined,
  bodyPos: SourcePos | undefined,
  text: string,
): { fn: Fn; type: TypeName } {
  const run = runner(plans);
  const B = body.fn;
  const boolCheck = body.type !== 'boolean';
  const truth = (v: Value): boolean => {
    if (v === true || v === false) return v;
    return notBoolean(v, `the body of ${reducer}`, bodyPos);
  };
  switch (reducer) {
    case 'sum':
    case 'product': {
      const isSum = reducer === 'sum';
      const op = isSum ? ops.add : ops.mul;
      return {
        fn: (fr) => {
          let acc: Value = isSum ? 0 : 1;
          run(fr, () => {
            const v = B(fr);
            if (isSum && typeof acc === 'number' && typeof v === 'number') {
              const s = acc + v;
              if (s <= Number.MAX_SAFE_INTEGER && s >= -Number.MAX_SAFE_INTEGER) {
                acc = s;
                return false;
              }
            }
            acc = at2(op, acc, v, bodyPos);
            return false;
          });
          return acc;
        },
        type:
          body.type === 'integer'
            ? 'integer'
            : body.type === 'matrix'
              ? 'any'
              : body.type === 'any'
                ? 'any'
                : body.type === 'rational'
                  ? 'number'
                  : body.type,
      };
    }
    case 'count':
      return {
        fn: (fr) => {
          let c = 0;
          run(fr, () => {
            const v = B(fr);
            if (boolCheck ? truth(v) : v) c++;
            return false;
          });
          return c;
        },
        type: 'integer',
      };
    case 'all':
    case 'any': {
      const want = reducer === 'any';
      return {
        fn: (fr) => {
          let found = false;
          run(fr, () => {
            const v = B(fr);
            if ((boolCheck ? truth(v) : v) === want) {
              found = true;
              return true;
            }
            return false;
          });
          return want ? found : !found;
        },
        type: 'boolean',
      };
    }
    case 'min':
    case 'max': {
      const sign = reducer === 'min' ? -1 : 1;
      return {
        fn: (fr) => {
          let best: Value | undefined;
          run(fr, () => {
            const v = B(fr);
            if (best === undefined) best = own(v);
            else if (typeof v === 'number' && typeof best === 'number') {
              if (sign < 0 ? v < best : v > best) best = v;
            } else if (compareValues(v, best) * sign > 0) best = own(v);
            return false;
          });
          if (best === undefined) throw new EvalError(`${reducer} of nothing: ${text} has no elements`, pos);
          return best;
        },
        type: body.type,
      };
    }
    case 'list':
      return {
        fn: (fr) => {
          const out: Value[] = [];
          run(fr, () => {
            out.push(own(B(fr)));
            return false;
          });
          return out;
        },
        type: 'list',
      };
    case 'set':
      return {
        fn: (fr) => {
          const seen = new Map<string, Value>();
          run(fr, () => {
            const v = B(fr);
            const k = valueKey(v);
            if (!seen.has(k)) seen.set(k, own(v));
            return false;
          });
          return [...seen.values()].sort(compareValues);
        },
        type: 'list',
      };
    case 'concat':
      return {
        fn: (fr) => {
          const out: Value[] = [];
          run(fr, () => {
            const v = B(fr);
            if (!Array.isArray(v)) throw new EvalError(`concat joins lists, got ${article(typeOf(v))} (${short(v)})`, bodyPos);
            for (const x of v) out.push(own(x));
            return false;
          });
          return out;
        },
        type: 'list',
      };
    case 'distribution':
      return {
        fn: (fr) => {
          const d = new Distribution();
          run(fr, () => {
            d.add(B(fr));
            return false;
          });
          return d;
        },
        type: 'distribution',
      };
  }
}
