// Compiling family calls: checking a family's arguments, preparing it per case, and a family
// used as a plain value (the list of its objects).

import { EvalError } from '../../base/errors.js';
import type { Family } from '../../families/family.js';
import type { Value } from '../../values/value.js';
import type { ExprOf } from './ast.js';
import { plural, typeList } from './compile-calls.js';
import { type CompileContext, errorAt, posOf } from './compile-scope.js';
import type { Compiled, Fn, Frame } from './frame.js';
import { printExpression } from './printer.js';
import { located, short } from './runtime.js';
import { describeType, mayAccept } from './statictypes.js';

/** A family used as a plain value (a list of its objects) may have at most this many objects. */
export const MAX_FAMILY_AS_LIST = 1_000_000;

/** partitions(4) as a value: the list of its objects. */
export function familyAsList(cx: CompileContext, fam: Family, e: ExprOf<'call'>): Compiled {
  const plan = familyPlan(cx, fam, e);
  const pos = posOf(cx, e);
  return {
    fn: (fr) => {
      const p = plan.prepare(fr);
      const count = fam.count(p);
      if (count > BigInt(MAX_FAMILY_AS_LIST)) {
        throw new EvalError(
          `${short(printExpression(e))} has ${count} objects, too many to make into a list; iterate over it with "v in ..." instead`,
          pos,
        );
      }
      const out: Value[] = [];
      try {
        fam.enumerate(p, (obj) => {
          out.push(obj.transient && obj.copy ? obj.copy() : obj);
        });
      } catch (err) {
        throw located(err, pos);
      }
      return out;
    },
    type: 'list',
  };
}

export function familyPlan(cx: CompileContext, fam: Family, e: ExprOf<'call'>): { prepare: (fr: Frame) => unknown; args: Fn[] } {
  const required = fam.params.filter((p) => !p.optional && !p.rest).length;
  const hasRest = fam.params.some((p) => p.rest);
  if (e.args.length < required || (!hasRest && e.args.length > fam.params.length)) {
    throw errorAt(
      cx,
      `${fam.name} takes ${required === fam.params.length && !hasRest ? plural(required, 'argument') : `${required} or more arguments`}, got ${e.args.length}: ${fam.signature}`,
      e,
      fam.signature,
    );
  }
  const args = e.args.map((a, i) => {
    const decl = i < fam.params.length ? fam.params[i] : fam.params[fam.params.length - 1];
    const c = cx.expr(a);
    if (!mayAccept(decl.type, c.type)) {
      throw errorAt(
        cx,
        `the argument ${decl.name} of ${fam.name} must be ${typeList(decl.type)}, but this is ${describeType(c.type)}`,
        a,
        fam.signature,
      );
    }
    return c.fn;
  });
  const pos = posOf(cx, e);
  const n = args.length;
  return {
    args,
    prepare: (fr) => {
      const vals = new Array<Value>(n);
      for (let i = 0; i < n; i++) vals[i] = args[i](fr);
      try {
        return fam.prepare(vals);
      } catch (err) {
        throw located(err, pos);
      }
    },
  };
}
