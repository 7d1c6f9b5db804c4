// Compiling comprehensions and reducer calls: each generator's source (a range, a family, or a
// value), its slot and where-condition, the body's static checks; `comprehension.ts` runs them.

import { getFamily } from '../../families/registry.js';
import { getFunction } from '../../library/registry.js';
import type { TypeName } from '../../values/types.js';
import type { Expr, ExprOf, Generator, Reducer } from './ast.js';
import { plural } from './compile-calls.js';
import { familyPlan } from './compile-families.js';
import { checkArith, condition, smallInt } from './compile-operators.js';
import { type CompileContext, errorAt, posOf, type SlotInfo } from './compile-scope.js';
import { compileReduction, type GenPlan, type SourcePlan } from './comprehension.js';
import type { Compiled } from './frame.js';
import { printExpression } from './printer.js';
import { located } from './runtime.js';
import { mayAccept, describeType } from './statictypes.js';

/** How a generator source is iterated: a range without a list, a family by enumeration, or a value. */
export function sourcePlan(cx: CompileContext, e: Expr): SourcePlan {
  if (e.type === 'range') {
    return { kind: 'range', lo: smallInt(cx, e.lo, 'the start of a range'), hi: smallInt(cx, e.hi, 'the end of a range') };
  }
  if (e.type === 'call' && !cx.layout.lookup(e.callee) && !cx.defines.has(e.callee) && !getFunction(e.callee)) {
    const fam = getFamily(e.callee);
    if (fam) {
      const plan = familyPlan(cx, fam, e);
      return { kind: 'family', family: fam, args: plan.args, prepare: plan.prepare, pos: posOf(cx, e) };
    }
  }
  const c = cx.expr(e);
  if (['integer', 'rational', 'number', 'boolean', 'polynomial', 'scalarOrPolynomial', 'function'].includes(c.type)) {
    throw errorAt(
      cx,
      `cannot iterate over ${describeType(c.type)}: a source is a range a..b, a list, a family or a measure`,
      e,
      c.type === 'integer' ? `1..${printExpression(e)}` : undefined,
    );
  }
  return { kind: 'value', fn: c.fn, pos: posOf(cx, e) };
}

export function elementType(cx: CompileContext, plan: SourcePlan): TypeName {
  return plan.kind === 'range' ? 'integer' : plan.kind === 'family' ? plan.family.objectKind : 'any';
}

/** Reducer comprehension sum(E for i in S where C). */
export function compileComprehension(cx: CompileContext, e: ExprOf<'comprehension'>): Compiled {
  return reduction(cx, e.reducer, e.generators, e.body, e);
}

/** The plain forms: sum(L), max(L), max(a, b), count(partitions(n)), set(1..n), ... */
export function reducerCall(cx: CompileContext, name: Reducer, e: ExprOf<'call'>): Compiled {
  if ((name === 'min' || name === 'max') && e.args.length >= 2) {
    const list: Expr = { type: 'list', items: e.args, start: e.start, end: e.end, src: e.src };
    return reduction(cx, name, [{ name: '', source: list, start: e.start, end: e.end }], undefined, e);
  }
  if (e.args.length !== 1) {
    const tail = name === 'min' || name === 'max' ? `, several values ${name}(a, b, ...)` : '';
    throw errorAt(
      cx,
      `${name} takes one list${tail}, or a comprehension ${name}(... for v in S); got ${plural(e.args.length, 'argument')}`,
      e,
      `${name}(... for v in S)`,
    );
  }
  const arg = e.args[0];
  if (name === 'count' && arg.type === 'call' && !cx.layout.lookup(arg.callee) && !cx.defines.has(arg.callee) && getFamily(arg.callee)) {
    // count(family(...)): the family's exact count, without enumerating.
    const fam = getFamily(arg.callee)!;
    const plan = familyPlan(cx, fam, arg);
    const pos = posOf(cx, arg);
    return {
      fn: (fr) => {
        const p = plan.prepare(fr);
        try {
          const c = fam.count(p);
          return c <= BigInt(Number.MAX_SAFE_INTEGER) ? Number(c) : c;
        } catch (err) {
          throw located(err, pos);
        }
      },
      type: 'integer',
    };
  }
  return reduction(cx, name, [{ name: '', source: arg, start: arg.start, end: arg.end }], undefined, e);
}

export function reduction(cx: CompileContext, reducer: Reducer, gens: Generator[], bodyExpr: Expr | undefined, e: Expr): Compiled {
  const layout = cx.layout;
  const depthBefore = layout.scopes.length;
  const plans: GenPlan[] = [];
  try {
    for (const g of gens) {
      const source = sourcePlan(cx, g.source);
      const slot = layout.fresh();
      const scope = new Map<string, SlotInfo>();
      if (g.name) scope.set(g.name, { slot, type: elementType(cx, source) });
      layout.scopes.push(scope);
      const where = g.where ? condition(cx, g.where, 'a where condition') : undefined;
      plans.push({ source, slot, where });
    }
    let body: Compiled;
    if (bodyExpr) body = cx.expr(bodyExpr);
    else if (reducer === 'count') body = { fn: () => true, type: 'boolean' };
    else if (plans.length === 1) {
      const k = plans[0].slot;
      body = { fn: (fr) => fr[k], type: elementType(cx, plans[0].source) };
    } else {
      throw errorAt(
        cx,
        `${reducer}(...) with several generators needs a body to say what to ${reducer === 'sum' || reducer === 'product' ? 'combine' : 'collect'}`,
        e,
        `${reducer}(E for ${gens.map((g) => `${g.name} in ...`).join(', ')})`,
      );
    }
    if ((reducer === 'all' || reducer === 'any' || (reducer === 'count' && bodyExpr)) && !mayAccept('boolean', body.type)) {
      throw errorAt(cx, `the body of ${reducer} must be true or false, but it is ${describeType(body.type)}`, bodyExpr ?? e);
    }
    if (
      (reducer === 'sum' || reducer === 'product') &&
      bodyExpr === undefined &&
      !(mayAccept('scalarOrPolynomial', body.type) || body.type === 'matrix')
    ) {
      throw errorAt(cx, `${reducer} adds up numbers or polynomials, but the elements are ${describeType(body.type)}`, e);
    }
    if ((reducer === 'sum' || reducer === 'product') && bodyExpr)
      checkArith(cx, reducer === 'sum' ? '+' : '*', body.type, body.type, bodyExpr);
    if (reducer === 'concat' && !mayAccept('list', body.type)) {
      throw errorAt(cx, `concat joins lists, but the elements are ${describeType(body.type)}`, bodyExpr ?? e);
    }
    const text = e.src ? e.src.text.slice(e.start, e.end) : printExpression(e);
    return compileReduction(reducer, plans, body, posOf(cx, e), bodyExpr ? posOf(cx, bodyExpr) : posOf(cx, e), text);
  } finally {
    layout.scopes.length = depthBefore;
  }
}
