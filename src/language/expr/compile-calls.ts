// Compiling calls: library functions (arity and argument types checked at load time, run-time
// guards where only the run can tell), defined functions (each body compiled once over its own
// frame), lambdas, and functions held in variables.

import { EvalError, InputError } from '../../base/errors.js';
import { getFunction, signatureOf, type FunctionSpec } from '../../library/registry.js';
import { Lambda } from '../../values/lambda.js';
import { typeOf, type TypeName } from '../../values/types.js';
import type { Value } from '../../values/value.js';
import type { Expr, ExprOf } from './ast.js';
import { type CompileContext, type DefineCell, errorAt, Layout, posOf, type SlotInfo } from './compile-scope.js';
import type { Compiled, Fn, Frame } from './frame.js';
import { printExpression } from './printer.js';
import { located, short } from './runtime.js';
import { describeType, mayAccept, surelyAccepts } from './statictypes.js';

/** Calls of defined functions nested deeper than this are an error (a recursion without end). */
export const MAX_CALL_DEPTH = 1000;

/** A named function used as a value (map(L, inv)): a Lambda calling it. */
export function functionValue(cx: CompileContext, name: string, arity: number | undefined, e: Expr): Compiled {
  const spec = getFunction(name);
  const params = arity ?? spec!.params.filter((p) => !p.optional && !p.rest).length;
  const argNames = Array.from({ length: params }, (_, i) => `_${i + 1}`);
  const callExpr: Expr = {
    type: 'call',
    callee: name,
    start: e.start,
    end: e.end,
    src: e.src,
    args: argNames.map((a) => ({ type: 'name', name: a, start: e.start, end: e.end, src: e.src }) as Expr),
  };
  return compileLambda(cx, { type: 'lambda', params: argNames, body: callExpr, start: e.start, end: e.end, src: e.src }, name);
}

export function compileLambda(cx: CompileContext, e: ExprOf<'lambda'>, text?: string): Compiled {
  const layout = cx.layout;
  const scope = new Map<string, SlotInfo>();
  const slots = e.params.map((p) => {
    const slot = layout.fresh();
    scope.set(p, { slot, type: 'any' });
    return slot;
  });
  layout.scopes.push(scope);
  let body: Fn;
  try {
    body = cx.expr(e.body).fn;
  } finally {
    layout.scopes.pop();
  }
  const src = text ?? printExpression(e);
  const n = slots.length;
  // Parameters live in the frame the lambda was made in; a call saves and restores them so
  // nested or re-entrant calls see their own arguments.
  if (n === 1) {
    const [s0] = slots;
    return {
      fn: (fr) =>
        new Lambda(
          1,
          (args) => {
            const old = fr[s0];
            fr[s0] = args[0];
            try {
              return body(fr);
            } finally {
              fr[s0] = old;
            }
          },
          src,
        ),
      type: 'function',
    };
  }
  return {
    fn: (fr) =>
      new Lambda(
        n,
        (args) => {
          const old = slots.map((s) => fr[s]);
          for (let i = 0; i < n; i++) fr[slots[i]] = args[i];
          try {
            return body(fr);
          } finally {
            for (let i = 0; i < n; i++) fr[slots[i]] = old[i];
          }
        },
        src,
      ),
    type: 'function',
  };
}

/** f(x) where f is a bound variable holding a function. */
export function callValue(cx: CompileContext, s: SlotInfo, e: ExprOf<'call'>): Compiled {
  if (!mayAccept('function', s.type)) throw errorAt(cx, `${e.callee} is ${describeType(s.type)}, not a function`, e);
  const k = s.slot;
  const args = e.args.map((a) => cx.expr(a).fn);
  const pos = posOf(cx, e);
  const name = e.callee;
  return {
    fn: (fr) => {
      const f = fr[k];
      if (!(f instanceof Lambda)) throw new EvalError(`${name} is ${describeType(typeOf(f))}, not a function`, pos);
      const vals = args.map((a) => a(fr));
      try {
        return f.call(vals);
      } catch (err) {
        throw located(err, pos);
      }
    },
    type: 'any',
  };
}

export function compileDefine(cx: CompileContext, cell: DefineCell): void {
  if (cell.state !== 'pending') return;
  cell.state = 'compiling';
  const saved = cx.layout;
  const layout = new Layout();
  cell.decl.params.forEach((p) => layout.scopes[0].set(p, { slot: layout.fresh(), type: 'any' }));
  cx.layout = layout;
  try {
    const c = cx.expr(cell.decl.body);
    cell.body = c.fn;
    cell.type = c.type;
  } finally {
    cx.layout = saved;
  }
  cell.frameSize = layout.size;
  cell.state = 'done';
}

export function callDefine(cx: CompileContext, cell: DefineCell, argExprs: Expr[], e: Expr): Compiled {
  compileDefine(cx, cell); // a recursive reference finds it 'compiling' and uses type 'any'
  const args = argExprs.map((a) => cx.expr(a).fn);
  const pos = posOf(cx, e);
  const name = cell.decl.name;
  const n = args.length;
  const enter = (nf: Frame): Value => {
    if (++cx.callDepth > MAX_CALL_DEPTH) {
      cx.callDepth = 0;
      throw new EvalError(`${name} called itself more than ${MAX_CALL_DEPTH} levels deep (a recursion without end?)`, pos);
    }
    try {
      return cell.body!(nf);
    } catch (err) {
      throw located(err, pos);
    } finally {
      if (cx.callDepth > 0) cx.callDepth--;
    }
  };
  let fn: Fn;
  if (n === 0) fn = () => enter(new Array(cell.frameSize));
  else if (n === 1) {
    const [a] = args;
    fn = (fr) => {
      const nf = new Array<Value>(cell.frameSize);
      nf[0] = a(fr);
      return enter(nf);
    };
  } else {
    fn = (fr) => {
      const nf = new Array<Value>(cell.frameSize);
      for (let i = 0; i < n; i++) nf[i] = args[i](fr);
      return enter(nf);
    };
  }
  return { fn, type: cell.state === 'done' ? cell.type : 'any' };
}

export function arityError(cx: CompileContext, spec: FunctionSpec, got: number, e: Expr): InputError {
  const required = spec.params.filter((p) => !p.optional && !p.rest).length;
  const max = spec.params.some((p) => p.rest) ? Infinity : spec.params.length;
  const wanted =
    required === max
      ? plural(required, 'argument')
      : max === Infinity
        ? `at least ${plural(required, 'argument')}`
        : `${required} to ${max} arguments`;
  return errorAt(cx, `${spec.name} takes ${wanted}, got ${got}: ${signatureOf(spec)}`, e, signatureOf(spec));
}

export function callLibrary(cx: CompileContext, spec: FunctionSpec, e: ExprOf<'call'>): Compiled {
  const required = spec.params.filter((p) => !p.optional && !p.rest).length;
  const hasRest = spec.params.some((p) => p.rest);
  if (e.args.length < required || (!hasRest && e.args.length > spec.params.length)) throw arityError(cx, spec, e.args.length, e);
  const args = e.args.map((a, i) => {
    const decl = i < spec.params.length ? spec.params[i] : spec.params[spec.params.length - 1];
    const c = cx.expr(a);
    if (!mayAccept(decl.type, c.type)) {
      throw errorAt(
        cx,
        `the argument ${decl.name} of ${spec.name} must be ${typeList(decl.type)}, but this is ${describeType(c.type)}`,
        a,
        signatureOf(spec),
      );
    }
    if (surelyAccepts(decl.type, c.type)) return c.fn;
    return guard(cx, c.fn, decl.type, `the argument ${decl.name} of ${spec.name}`, a, spec);
  });
  const impl = spec.impl;
  const pos = posOf(cx, e);
  let fn: Fn;
  switch (args.length) {
    case 0:
      fn = () => {
        try {
          return impl();
        } catch (err) {
          throw located(err, pos);
        }
      };
      break;
    case 1: {
      const [a] = args;
      fn = (fr) => {
        const x = a(fr);
        try {
          return impl(x);
        } catch (err) {
          throw located(err, pos);
        }
      };
      break;
    }
    case 2: {
      const [a, b] = args;
      fn = (fr) => {
        const x = a(fr),
          y = b(fr);
        try {
          return impl(x, y);
        } catch (err) {
          throw located(err, pos);
        }
      };
      break;
    }
    case 3: {
      const [a, b, c] = args;
      fn = (fr) => {
        const x = a(fr),
          y = b(fr),
          z = c(fr);
        try {
          return impl(x, y, z);
        } catch (err) {
          throw located(err, pos);
        }
      };
      break;
    }
    default:
      fn = (fr) => {
        const vals = args.map((a) => a(fr));
        try {
          return impl(...vals);
        } catch (err) {
          throw located(err, pos);
        }
      };
  }
  return { fn, type: spec.returns };
}

/** A run-time check that a value has one of the declared types. */
export function guard(cx: CompileContext, f: Fn, expected: TypeName | TypeName[], what: string, e: Expr, spec?: FunctionSpec): Fn {
  const exps = Array.isArray(expected) ? expected : [expected];
  const pos = posOf(cx, e);
  return (fr) => {
    const v = f(fr);
    const t = typeOf(v);
    if (!surelyAccepts(exps, t)) {
      throw new EvalError(
        `${what} must be ${typeList(expected)}, got ${describeType(t)} (${short(v)})` + (spec ? `: ${signatureOf(spec)}` : ''),
        pos,
      );
    }
    return v;
  };
}

export function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

export function typeList(t: TypeName | TypeName[]): string {
  const ts = Array.isArray(t) ? t : [t];
  return ts.map(describeType).join(' or ');
}
