// Compiles expression trees to closures over a frame of slots. Names are resolved and checked once,
// at load time (unknown names with "did you mean", argument counts, impossible types); the closures
// then run per case with no look-ups and no re-reading of the tree. Hot-path rules: calls are
// specialised by arity, integer operations are inlined with a `typeof` fast path, and try/catch
// sits only around calls into library code (to give a failing call its position).
//
// This file is the dispatcher and the public face; the parts live beside it:
//   compile-scope.ts       frame layout, definitions' cells, the shared context, positioned errors
//   compile-operators.ts   literals, lists, ranges, logic, comparisons, arithmetic, if, indexing
//   compile-calls.ts       library calls, defined functions, lambdas, functions in variables
//   compile-families.ts    family arguments and preparation, a family as a list
//   compile-reductions.ts  comprehensions and reducer calls (run by comprehension.ts)

import { InputError } from '../../base/errors.js';
import { variable } from '../../algebra/polynomial.js';
import { allFamilies, getFamily } from '../../families/registry.js';
import type { Family } from '../../families/family.js';
import { allFunctions, getFunction } from '../../library/registry.js';
import type { TypeName } from '../../values/types.js';
import { type Expr, type ExprOf, isReducer, REDUCERS } from './ast.js';
import { callDefine, callLibrary, callValue, compileDefine, compileLambda, functionValue, plural } from './compile-calls.js';
import { familyAsList } from './compile-families.js';
import {
  compileArith,
  compileEquality,
  compileIf,
  compileIndex,
  compileList,
  compileLogic,
  compileNegate,
  compileNot,
  compileOrder,
  compileRangeValue,
} from './compile-operators.js';
import { compileComprehension, reducerCall, sourcePlan } from './compile-reductions.js';
import { type CompileContext, type DefineCell, type DefineDecl, errorAt, Layout, unknownName } from './compile-scope.js';
import type { Compiled, Fn } from './frame.js';

export type { Compiled, Fn, Frame } from './frame.js';
export type { DefineDecl } from './compile-scope.js';
export { MAX_CALL_DEPTH } from './compile-calls.js';
export { MAX_FAMILY_AS_LIST } from './compile-families.js';
export { MAX_RANGE_LIST } from './compile-operators.js';

/** What a `for:` binding iterates over. */
export type CompiledSource =
  | { kind: 'range'; lo: Fn; hi: Fn; elementType: 'integer' }
  | { kind: 'family'; family: Family; args: Fn[]; elementType: TypeName }
  | { kind: 'list'; fn: Fn; elementType: TypeName };

export interface CompilerOptions {
  file: string;
  indeterminates: string[];
  defines: DefineDecl[];
  /** How to declare a polynomial variable where these expressions come from (default: the conjecture's indeterminates: key). */
  declareIndeterminate?: (name: string, declared: readonly string[]) => string;
}

/** The hint for an unknown name that looks like a polynomial variable, in a conjecture file. */
export function declareInFile(name: string, declared: readonly string[]): string {
  return `if ${name} is a polynomial variable, declare it: indeterminates: [${[...declared, name].join(', ')}]`;
}

const BOOLEAN_OPS = new Set(['and', 'or', 'implies', 'iff']);
const ORDER_OPS = new Set(['<', '<=', '>', '>=']);

export class Compiler {
  readonly file: string;
  private readonly cx: CompileContext;
  /** The top-level layout: `for` bindings and lets (definitions' bodies get their own). */
  private readonly global = new Layout();

  constructor(opts: CompilerOptions) {
    this.file = opts.file;
    const defines = new Map<string, DefineCell>();
    const cx: CompileContext = {
      file: opts.file,
      indeterminates: new Set(opts.indeterminates),
      defines,
      layout: this.global,
      callDepth: 0,
      expr: (e) => compileExpr(cx, e),
      declareIndeterminate: opts.declareIndeterminate ?? declareInFile,
    };
    this.cx = cx;
    for (const d of opts.defines) {
      if (defines.has(d.name)) {
        throw new InputError(`${d.name} is defined twice`, d.pos, d.name);
      }
      defines.set(d.name, { decl: d, state: 'pending', body: null, frameSize: 0, type: 'any' });
    }
    // Check every definition now, used or not, so that its errors surface at load time.
    for (const cell of defines.values()) this.shallow(cell.decl.body, () => compileDefine(cx, cell));
  }

  /**
   * Run a compile step, turning a stack overflow into an InputError at e. The parser bounds each
   * tree's depth, but definitions calling definitions are compiled one inside the other.
   */
  private shallow<T>(e: Expr, f: () => T): T {
    try {
      return f();
    } catch (err) {
      if (err instanceof RangeError && /call stack/i.test(err.message))
        throw errorAt(this.cx, 'the expression is too deeply nested to compile (definitions that use definitions nest too)', e);
      throw err;
    }
  }

  /** Declare a top-level name (a `for:` binding or a `let:`) in order; returns its frame slot. */
  declareSlot(name: string, type: TypeName = 'any'): number {
    const top = this.global.scopes[0];
    if (top.has(name)) throw new InputError(`${name} is bound twice`);
    const slot = this.global.fresh();
    top.set(name, { slot, type });
    return slot;
  }

  /** Slots used so far; allocate the frame after the last compile (comprehensions add slots). */
  frameSize(): number {
    return this.global.size;
  }

  /** Every name an expression may use here (for "did you mean" in the loader). */
  names(): string[] {
    return [
      ...this.global.visibleNames(),
      ...this.cx.defines.keys(),
      ...this.cx.indeterminates,
      ...REDUCERS,
      ...allFunctions().map((f) => f.name),
      ...allFamilies().map((f) => f.name),
    ];
  }

  compile(e: Expr): Compiled {
    return this.shallow(e, () => this.cx.expr(e));
  }

  /** A `for:` source: a range a..b, a family call, or a list (or a measure's support). */
  compileSource(e: Expr): CompiledSource {
    const plan = this.shallow(e, () => sourcePlan(this.cx, e));
    switch (plan.kind) {
      case 'range':
        return { kind: 'range', lo: plan.lo, hi: plan.hi, elementType: 'integer' };
      case 'family':
        return { kind: 'family', family: plan.family, args: plan.args, elementType: plan.family.objectKind };
      case 'value':
        return { kind: 'list', fn: plan.fn, elementType: 'any' };
    }
  }
}

// ---------------------------------------------------------------- the dispatcher

export function compileExpr(cx: CompileContext, e: Expr): Compiled {
  switch (e.type) {
    case 'int': {
      const v = e.value;
      return { fn: () => v, type: 'integer' };
    }
    case 'string': {
      const v = e.value;
      return { fn: () => v, type: 'string' };
    }
    case 'bool': {
      const v = e.value;
      return { fn: () => v, type: 'boolean' };
    }
    case 'name':
      return compileName(cx, e);
    case 'list':
      return compileList(cx, e);
    case 'range':
      return compileRangeValue(cx, e);
    case 'unary':
      return e.op === 'not' ? compileNot(cx, e) : compileNegate(cx, e);
    case 'binary':
      if (BOOLEAN_OPS.has(e.op)) return compileLogic(cx, e);
      if (e.op === '==' || e.op === '!=') return compileEquality(cx, e);
      if (ORDER_OPS.has(e.op)) return compileOrder(cx, e);
      return compileArith(cx, e);
    case 'if':
      return compileIf(cx, e);
    case 'lambda':
      return compileLambda(cx, e);
    case 'call':
      return compileCall(cx, e);
    case 'index':
      return compileIndex(cx, e);
    case 'comprehension':
      return compileComprehension(cx, e);
  }
}

export function compileName(cx: CompileContext, e: ExprOf<'name'>): Compiled {
  const n = e.name;
  const s = cx.layout.lookup(n);
  if (s) {
    const k = s.slot;
    return { fn: (fr) => fr[k], type: s.type };
  }
  const d = cx.defines.get(n);
  if (d) {
    if (d.decl.params.length === 0) return callDefine(cx, d, [], e);
    return functionValue(cx, n, d.decl.params.length, e);
  }
  if (cx.indeterminates.has(n)) {
    const v = variable(n);
    return { fn: () => v, type: 'polynomial' };
  }
  if (getFunction(n)) return functionValue(cx, n, undefined, e);
  if (getFamily(n)) {
    throw errorAt(cx, `${n} is a family: write it with its arguments, e.g. ${getFamily(n)!.signature}, after "in" or inside count(...)`, e);
  }
  if (isReducer(n)) throw errorAt(cx, `${n} needs arguments, e.g. ${n}(i for i in 1..n)`, e);
  throw unknownName(cx, n, e, false);
}

export function compileCall(cx: CompileContext, e: ExprOf<'call'>): Compiled {
  const name = e.callee;
  const s = cx.layout.lookup(name);
  if (s) return callValue(cx, s, e);
  const d = cx.defines.get(name);
  if (d) {
    if (e.args.length !== d.decl.params.length) {
      throw errorAt(
        cx,
        `${name} takes ${plural(d.decl.params.length, 'argument')}: ${name}(${d.decl.params.join(', ')}); got ${e.args.length}`,
        e,
      );
    }
    return callDefine(cx, d, e.args, e);
  }
  if (isReducer(name)) return reducerCall(cx, name, e);
  const spec = getFunction(name);
  if (spec) return callLibrary(cx, spec, e);
  const fam = getFamily(name);
  if (fam) return familyAsList(cx, fam, e);
  if (cx.indeterminates.has(name)) throw errorAt(cx, `${name} is an indeterminate, not a function`, e, `write ${name}*(...) for a product`);
  throw unknownName(cx, name, e, true);
}
