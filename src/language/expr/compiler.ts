// Compiles expression trees to closures over a frame of slots. Names are resolved and checked once,
// at load time (unknown names with "did you mean", argument counts, impossible types); the closures
// then run per case with no look-ups and no re-reading of the tree. Hot-path rules: calls are
// specialised by arity, integer operations are inlined with a `typeof` fast path, and try/catch
// sits only around calls into library code (to give a failing call its position).

import { EvalError, InputError, type SourcePos } from '../../base/errors.js';
import { nearest } from '../../base/suggest.js';
import { variable, type Polynomial } from '../../algebra/polynomial.js';
import { getFamily, allFamilies } from '../../families/registry.js';
import type { Family } from '../../families/family.js';
import { getFunction, allFunctions, signatureOf, type FunctionSpec } from '../../library/registry.js';
import * as ops from '../../library/operators.js';
import { Lambda } from '../../values/lambda.js';
import { typeOf, type TypeName } from '../../values/types.js';
import type { Value } from '../../values/value.js';
import { type Expr, type ExprOf, type Generator, isReducer, REDUCERS, type Reducer } from './ast.js';
import { inputError, sourcePos } from './origin.js';
import { printExpression } from './printer.js';
import { at1, at2, indexValue, located, notBoolean, short } from './runtime.js';
import { describeType, equalityPossible, expand, isNumber, isNumericish, join, mayAccept, surelyAccepts } from './statictypes.js';
import { compileReduction, type GenPlan, type SourcePlan } from './comprehension.js';

export type Frame = Value[];
export type Fn = (frame: Frame) => Value;

export interface Compiled {
  fn: Fn;
  type: TypeName;
}

/** What a `for:` binding iterates over. */
export type CompiledSource =
  | { kind: 'range'; lo: Fn; hi: Fn; elementType: 'integer' }
  | { kind: 'family'; family: Family; args: Fn[]; elementType: TypeName }
  | { kind: 'list'; fn: Fn; elementType: TypeName };

/** A `define:` entry: 'peaks(w)': 'count(...)'. The body keeps its own source and origin. */
export interface DefineDecl {
  name: string;
  params: string[];
  body: Expr;
  /** Where the header is, for errors about the definition itself. */
  pos?: SourcePos;
}

export interface CompilerOptions {
  file: string;
  indeterminates: string[];
  defines: DefineDecl[];
}

/** Calls of defined functions nested deeper than this are an error (a recursion without end). */
export const MAX_CALL_DEPTH = 1000;

/** A family used as a plain value (a list of its objects) may have at most this many objects. */
export const MAX_FAMILY_AS_LIST = 1_000_000;

/** A range used as a plain value may have at most this many elements. */
export const MAX_RANGE_LIST = 10_000_000;

interface SlotInfo {
  slot: number;
  type: TypeName;
}

/** Compile-time layout of one frame: nested scopes of named slots. */
class Layout {
  scopes: Map<string, SlotInfo>[] = [new Map()];
  size = 0;

  lookup(name: string): SlotInfo | undefined {
    for (let i = this.scopes.length - 1; i >= 0; i--) {
      const s = this.scopes[i].get(name);
      if (s) return s;
    }
    return undefined;
  }

  fresh(): number {
    return this.size++;
  }

  visibleNames(): string[] {
    return this.scopes.flatMap((s) => [...s.keys()]);
  }
}

interface DefineCell {
  decl: DefineDecl;
  state: 'pending' | 'compiling' | 'done';
  /** The body over its own frame (params in slots 0..k-1). */
  body: Fn | null;
  frameSize: number;
  type: TypeName;
}

const BOOLEAN_OPS = new Set(['and', 'or', 'implies']);
const ORDER_OPS = new Set(['<', '<=', '>', '>=']);

export class Compiler {
  readonly file: string;
  private readonly indeterminates: Set<string>;
  private readonly defines = new Map<string, DefineCell>();
  private layout = new Layout();
  private readonly global = this.layout;
  private callDepth = 0;

  constructor(opts: CompilerOptions) {
    this.file = opts.file;
    this.indeterminates = new Set(opts.indeterminates);
    for (const d of opts.defines) {
      if (this.defines.has(d.name)) {
        throw new InputError(`${d.name} is defined twice`, d.pos, d.name);
      }
      this.defines.set(d.name, { decl: d, state: 'pending', body: null, frameSize: 0, type: 'any' });
    }
    // Check every definition now, used or not, so that its errors surface at load time.
    for (const cell of this.defines.values()) this.shallow(cell.decl.body, () => this.compileDefine(cell));
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
        throw this.err('the expression is too deeply nested to compile (definitions that use definitions nest too)', e);
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
      ...this.defines.keys(),
      ...this.indeterminates,
      ...REDUCERS,
      ...allFunctions().map((f) => f.name),
      ...allFamilies().map((f) => f.name),
    ];
  }

  compile(e: Expr): Compiled {
    return this.shallow(e, () => this.expr(e));
  }

  /** A `for:` source: a range a..b, a family call, or a list (or a measure's support). */
  compileSource(e: Expr): CompiledSource {
    const plan = this.shallow(e, () => this.sourcePlan(e));
    switch (plan.kind) {
      case 'range':
        return { kind: 'range', lo: plan.lo, hi: plan.hi, elementType: 'integer' };
      case 'family':
        return { kind: 'family', family: plan.family, args: plan.args, elementType: plan.family.objectKind };
      case 'value':
        return { kind: 'list', fn: plan.fn, elementType: 'any' };
    }
  }

  // ---------------------------------------------------------------- errors

  private err(message: string, e: { start: number; end: number; src?: Expr['src'] }, suggestion?: string): InputError {
    return inputError(message, e.src, e.start, e.end, suggestion);
  }

  private pos(e: Expr): SourcePos | undefined {
    return sourcePos(e.src, e.start) ?? { file: this.file, line: 0, column: 0 };
  }

  private unknownName(name: string, e: Expr, asCall: boolean): InputError {
    const candidates = asCall
      ? [...this.defines.keys(), ...REDUCERS, ...allFunctions().map((f) => f.name), ...allFamilies().map((f) => f.name), ...this.layout.visibleNames()]
      : [...this.layout.visibleNames(), ...this.indeterminates, ...this.defines.keys(), ...allFunctions().map((f) => f.name)];
    const near = nearest(name, candidates);
    const what = asCall ? `unknown function ${name}` : `unknown name ${name}`;
    return this.err(near ? `${what}; did you mean ${near}?` : what, e, near);
  }

  // ---------------------------------------------------------------- expressions

  private expr(e: Expr): Compiled {
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
        return this.name(e);
      case 'list':
        return this.list(e);
      case 'range':
        return this.rangeValue(e);
      case 'unary':
        return e.op === 'not' ? this.not(e) : this.negate(e);
      case 'binary':
        if (BOOLEAN_OPS.has(e.op)) return this.logic(e);
        if (e.op === '==' || e.op === '!=') return this.equality(e);
        if (ORDER_OPS.has(e.op)) return this.order(e);
        return this.arith(e);
      case 'if':
        return this.conditional(e);
      case 'lambda':
        return this.lambda(e);
      case 'call':
        return this.call(e);
      case 'index':
        return this.index(e);
      case 'comprehension':
        return this.comprehension(e);
    }
  }

  /** A boolean-valued closure, checked statically when the type is known, else at run time. */
  private condition(e: Expr, what: string): (fr: Frame) => boolean {
    const c = this.expr(e);
    if (!mayAccept('boolean', c.type)) {
      throw this.err(`${what} must be true or false, but this is ${describeType(c.type)}`, e);
    }
    const f = c.fn;
    if (c.type === 'boolean') return f as (fr: Frame) => boolean;
    const pos = this.pos(e);
    return (fr) => {
      const v = f(fr);
      if (v === true || v === false) return v;
      return notBoolean(v, what, pos);
    };
  }

  private name(e: ExprOf<'name'>): Compiled {
    const n = e.name;
    const s = this.layout.lookup(n);
    if (s) {
      const k = s.slot;
      return { fn: (fr) => fr[k], type: s.type };
    }
    const d = this.defines.get(n);
    if (d) {
      if (d.decl.params.length === 0) return this.callDefine(d, [], e);
      return this.functionValue(n, d.decl.params.length, e);
    }
    if (this.indeterminates.has(n)) {
      const v = variable(n);
      return { fn: () => v, type: 'polynomial' };
    }
    if (getFunction(n)) return this.functionValue(n, undefined, e);
    if (getFamily(n)) {
      throw this.err(`${n} is a family: write it with its arguments, e.g. ${getFamily(n)!.signature}, after "in" or inside count(...)`, e);
    }
    if (isReducer(n)) throw this.err(`${n} needs arguments, e.g. ${n}(i in 1..n: i)`, e);
    throw this.unknownName(n, e, false);
  }

  /** A named function used as a value (map(L, inv)): a Lambda calling it. */
  private functionValue(name: string, arity: number | undefined, e: Expr): Compiled {
    const spec = getFunction(name);
    const params = arity ?? spec!.params.filter((p) => !p.optional && !p.rest).length;
    const argNames = Array.from({ length: params }, (_, i) => `_${i + 1}`);
    const callExpr: Expr = {
      type: 'call', callee: name, start: e.start, end: e.end, src: e.src,
      args: argNames.map((a) => ({ type: 'name', name: a, start: e.start, end: e.end, src: e.src }) as Expr),
    };
    return this.lambda({ type: 'lambda', params: argNames, body: callExpr, start: e.start, end: e.end, src: e.src }, name);
  }

  private list(e: ExprOf<'list'>): Compiled {
    const items = e.items.map((x) => this.expr(x).fn);
    switch (items.length) {
      case 0:
        return { fn: () => [], type: 'list' };
      case 1: {
        const [a] = items;
        return { fn: (fr) => [a(fr)], type: 'list' };
      }
      case 2: {
        const [a, b] = items;
        return { fn: (fr) => [a(fr), b(fr)], type: 'list' };
      }
      case 3: {
        const [a, b, c] = items;
        return { fn: (fr) => [a(fr), b(fr), c(fr)], type: 'list' };
      }
      default:
        return {
          fn: (fr) => {
            const out = new Array<Value>(items.length);
            for (let i = 0; i < items.length; i++) out[i] = items[i](fr);
            return out;
          },
          type: 'list',
        };
    }
  }

  /** An integer-valued closure returning a JS number (for range ends). */
  private smallInt(e: Expr, what: string): (fr: Frame) => number {
    const c = this.expr(e);
    if (!mayAccept('integer', c.type)) throw this.err(`${what} must be an integer, but this is ${describeType(c.type)}`, e);
    const f = c.fn;
    const pos = this.pos(e);
    return (fr) => {
      const v = f(fr);
      if (typeof v === 'number' && Number.isInteger(v)) return v;
      if (typeof v === 'bigint') throw new EvalError(`${what} ${v} is too large`, pos);
      throw new EvalError(`${what} must be an integer, got ${short(v)}`, pos);
    };
  }

  private rangeValue(e: ExprOf<'range'>): Compiled {
    const lo = this.smallInt(e.lo, 'the start of a range');
    const hi = this.smallInt(e.hi, 'the end of a range');
    const pos = this.pos(e);
    return {
      fn: (fr) => {
        const a = lo(fr), b = hi(fr);
        if (b - a + 1 > MAX_RANGE_LIST) throw new EvalError(`the range ${a}..${b} is too long to make into a list`, pos);
        const out: number[] = [];
        for (let i = a; i <= b; i++) out.push(i);
        return out;
      },
      type: 'list',
    };
  }

  private not(e: ExprOf<'unary'>): Compiled {
    const c = this.condition(e.operand, 'the operand of not');
    return { fn: (fr) => !c(fr), type: 'boolean' };
  }

  private negate(e: ExprOf<'unary'>): Compiled {
    const c = this.expr(e.operand);
    this.checkArith('unary -', c.type, undefined, e);
    const f = c.fn;
    const pos = this.pos(e);
    return {
      fn: (fr) => {
        const a = f(fr);
        if (typeof a === 'number') return a === 0 ? 0 : -a;
        return at1(ops.neg, a, pos);
      },
      type: c.type === 'integer' || isNumericish(c.type) || c.type === 'matrix' ? c.type : 'any',
    };
  }

  private logic(e: ExprOf<'binary'>): Compiled {
    const a = this.condition(e.left, `the left side of ${e.op}`);
    const b = this.condition(e.right, `the right side of ${e.op}`);
    switch (e.op) {
      case 'and':
        return { fn: (fr) => a(fr) && b(fr), type: 'boolean' };
      case 'or':
        return { fn: (fr) => a(fr) || b(fr), type: 'boolean' };
      default:
        return { fn: (fr) => !a(fr) || b(fr), type: 'boolean' };
    }
  }

  private equality(e: ExprOf<'binary'>): Compiled {
    const l = this.expr(e.left), r = this.expr(e.right);
    if (!equalityPossible(l.type, r.type)) {
      throw this.err(`cannot compare ${describeType(l.type)} with ${describeType(r.type)}`, e,
        'both sides of == must be the same kind of value');
    }
    const lf = l.fn, rf = r.fn;
    const pos = this.pos(e);
    const negate = e.op === '!=';
    if (l.type === 'integer' && r.type === 'integer') {
      // Integers are normalised (a bigint is never a safe integer), so === is exact equality.
      return { fn: negate ? (fr) => lf(fr) !== rf(fr) : (fr) => lf(fr) === rf(fr), type: 'boolean' };
    }
    const slow = negate ? ops.ne : ops.eq;
    return {
      fn: (fr) => {
        const a = lf(fr), b = rf(fr);
        if (typeof a === 'number' && typeof b === 'number') return negate ? a !== b : a === b;
        return at2(slow, a, b, pos);
      },
      type: 'boolean',
    };
  }

  private order(e: ExprOf<'binary'>): Compiled {
    const l = this.expr(e.left), r = this.expr(e.right);
    for (const [side, t, x] of [['left', l.type, e.left], ['right', r.type, e.right]] as const) {
      if (!mayAccept('number', t)) {
        throw this.err(`${e.op} compares integers and rationals only, but the ${side} side is ${describeType(t)}`, x,
          t === 'polynomial' || t === 'scalarOrPolynomial' ? undefined : 'use == to compare other values');
      }
    }
    const lf = l.fn, rf = r.fn;
    const pos = this.pos(e);
    let fn: Fn;
    switch (e.op) {
      case '<':
        fn = (fr) => {
          const a = lf(fr), b = rf(fr);
          return typeof a === 'number' && typeof b === 'number' ? a < b : at2(ops.lt, a, b, pos);
        };
        break;
      case '<=':
        fn = (fr) => {
          const a = lf(fr), b = rf(fr);
          return typeof a === 'number' && typeof b === 'number' ? a <= b : at2(ops.le, a, b, pos);
        };
        break;
      case '>':
        fn = (fr) => {
          const a = lf(fr), b = rf(fr);
          return typeof a === 'number' && typeof b === 'number' ? a > b : at2(ops.gt, a, b, pos);
        };
        break;
      default:
        fn = (fr) => {
          const a = lf(fr), b = rf(fr);
          return typeof a === 'number' && typeof b === 'number' ? a >= b : at2(ops.ge, a, b, pos);
        };
    }
    return { fn, type: 'boolean' };
  }

  /** Load-time check of an arithmetic operator; returns the result type. */
  private checkArith(op: string, a: TypeName, b: TypeName | undefined, e: Expr): TypeName {
    const bad = (why?: string): never => {
      const what = b === undefined ? describeType(a) : `${describeType(a)} and ${describeType(b)}`;
      throw this.err(`${op} is not defined for ${what}`, e,
        why ?? (op === '+' && a === 'list' && (b === 'list' || b === 'any') ? 'to join lists use concat([A, B])' : undefined));
    };
    const arithmetic = (t: TypeName) => t === 'any' || isNumericish(t) || t === 'permutation' || t === 'matrix';
    if (!arithmetic(a) || (b !== undefined && !arithmetic(b))) bad();
    if (b === undefined) {
      if (a === 'permutation') bad('use inverse(w) or w^-1');
      return a;
    }
    if (a === 'any' || b === 'any') {
      if (op === '^') {
        if (!mayAccept('integer', b)) bad('an exponent must be an integer');
        return a === 'permutation' || a === 'matrix' ? a : 'any';
      }
      return 'any';
    }
    if (op === '^') {
      if (!mayAccept('integer', b)) bad('an exponent must be an integer');
      if (a === 'integer') return 'number';
      return isNumber(a) ? 'number' : a === 'permutation' || a === 'matrix' ? a : 'scalarOrPolynomial';
    }
    if (a === 'permutation' || b === 'permutation') {
      if (op === '*' && a === b) return 'permutation';
      bad(op === '*' ? undefined : 'permutations multiply (compose) with *');
    }
    if (a === 'matrix' || b === 'matrix') {
      if (op === '/') bad();
      if ((op === '+' || op === '-') && a !== b) bad();
      return 'matrix';
    }
    if (a === 'integer' && b === 'integer') return op === '/' ? 'number' : 'integer';
    if (isNumber(a) && isNumber(b)) return 'number';
    return 'scalarOrPolynomial';
  }

  private arith(e: ExprOf<'binary'>): Compiled {
    const l = this.expr(e.left), r = this.expr(e.right);
    let type = this.checkArith(e.op, l.type, r.type, e);
    // A nonnegative literal exponent keeps integers integers: n^2.
    if (e.op === '^' && l.type === 'integer' && e.right.type === 'int') type = 'integer';
    const lf = l.fn, rf = r.fn;
    const pos = this.pos(e);
    let fn: Fn;
    switch (e.op) {
      case '+':
        fn = (fr) => {
          const a = lf(fr), b = rf(fr);
          if (typeof a === 'number' && typeof b === 'number') {
            const s = a + b;
            if (s <= Number.MAX_SAFE_INTEGER && s >= -Number.MAX_SAFE_INTEGER) return s;
          }
          return at2(ops.add, a, b, pos);
        };
        break;
      case '-':
        fn = (fr) => {
          const a = lf(fr), b = rf(fr);
          if (typeof a === 'number' && typeof b === 'number') {
            const s = a - b;
            if (s <= Number.MAX_SAFE_INTEGER && s >= -Number.MAX_SAFE_INTEGER) return s;
          }
          return at2(ops.sub, a, b, pos);
        };
        break;
      case '*':
        fn = (fr) => {
          const a = lf(fr), b = rf(fr);
          if (typeof a === 'number' && typeof b === 'number') {
            const s = a * b;
            if (s <= Number.MAX_SAFE_INTEGER && s >= -Number.MAX_SAFE_INTEGER) return s === 0 ? 0 : s;
          }
          return at2(ops.mul, a, b, pos);
        };
        break;
      case '/':
        fn = (fr) => {
          const a = lf(fr), b = rf(fr);
          if (typeof a === 'number' && typeof b === 'number' && b !== 0 && a % b === 0) return a / b + 0;
          return at2(ops.div, a, b, pos);
        };
        break;
      default:
        fn = (fr) => at2(ops.pow, lf(fr), rf(fr), pos);
    }
    return { fn, type };
  }

  private conditional(e: ExprOf<'if'>): Compiled {
    const c = this.condition(e.cond, 'the condition of if');
    const a = this.expr(e.then), b = this.expr(e.else);
    const af = a.fn, bf = b.fn;
    return { fn: (fr) => (c(fr) ? af(fr) : bf(fr)), type: join(a.type, b.type) };
  }

  private lambda(e: ExprOf<'lambda'>, text?: string): Compiled {
    const layout = this.layout;
    const scope = new Map<string, SlotInfo>();
    const slots = e.params.map((p) => {
      const slot = layout.fresh();
      scope.set(p, { slot, type: 'any' });
      return slot;
    });
    layout.scopes.push(scope);
    let body: Fn;
    try {
      body = this.expr(e.body).fn;
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
          new Lambda(1, (args) => {
            const old = fr[s0];
            fr[s0] = args[0];
            try {
              return body(fr);
            } finally {
              fr[s0] = old;
            }
          }, src),
        type: 'function',
      };
    }
    return {
      fn: (fr) =>
        new Lambda(n, (args) => {
          const old = slots.map((s) => fr[s]);
          for (let i = 0; i < n; i++) fr[slots[i]] = args[i];
          try {
            return body(fr);
          } finally {
            for (let i = 0; i < n; i++) fr[slots[i]] = old[i];
          }
        }, src),
      type: 'function',
    };
  }

  // ---------------------------------------------------------------- calls

  private call(e: ExprOf<'call'>): Compiled {
    const name = e.callee;
    const s = this.layout.lookup(name);
    if (s) return this.callValue(s, e);
    const d = this.defines.get(name);
    if (d) {
      if (e.args.length !== d.decl.params.length) {
        throw this.err(`${name} takes ${plural(d.decl.params.length, 'argument')}: ${name}(${d.decl.params.join(', ')}); got ${e.args.length}`, e);
      }
      return this.callDefine(d, e.args, e);
    }
    if (isReducer(name)) return this.reducerCall(name, e);
    const spec = getFunction(name);
    if (spec) return this.callLibrary(spec, e);
    const fam = getFamily(name);
    if (fam) return this.familyAsList(fam, e);
    if (this.indeterminates.has(name)) throw this.err(`${name} is an indeterminate, not a function`, e, `write ${name}*(...) for a product`);
    throw this.unknownName(name, e, true);
  }

  /** f(x) where f is a bound variable holding a function. */
  private callValue(s: SlotInfo, e: ExprOf<'call'>): Compiled {
    if (!mayAccept('function', s.type)) throw this.err(`${e.callee} is ${describeType(s.type)}, not a function`, e);
    const k = s.slot;
    const args = e.args.map((a) => this.expr(a).fn);
    const pos = this.pos(e);
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

  private compileDefine(cell: DefineCell): void {
    if (cell.state !== 'pending') return;
    cell.state = 'compiling';
    const saved = this.layout;
    const layout = new Layout();
    cell.decl.params.forEach((p) => layout.scopes[0].set(p, { slot: layout.fresh(), type: 'any' }));
    this.layout = layout;
    try {
      const c = this.expr(cell.decl.body);
      cell.body = c.fn;
      cell.type = c.type;
    } finally {
      this.layout = saved;
    }
    cell.frameSize = layout.size;
    cell.state = 'done';
  }

  private callDefine(cell: DefineCell, argExprs: Expr[], e: Expr): Compiled {
    this.compileDefine(cell); // a recursive reference finds it 'compiling' and uses type 'any'
    const args = argExprs.map((a) => this.expr(a).fn);
    const pos = this.pos(e);
    const name = cell.decl.name;
    const n = args.length;
    const enter = (nf: Frame): Value => {
      if (++this.callDepth > MAX_CALL_DEPTH) {
        this.callDepth = 0;
        throw new EvalError(`${name} called itself more than ${MAX_CALL_DEPTH} levels deep (a recursion without end?)`, pos);
      }
      try {
        return cell.body!(nf);
      } catch (err) {
        throw located(err, pos);
      } finally {
        if (this.callDepth > 0) this.callDepth--;
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

  private arityError(spec: FunctionSpec, got: number, e: Expr): InputError {
    const required = spec.params.filter((p) => !p.optional && !p.rest).length;
    const max = spec.params.some((p) => p.rest) ? Infinity : spec.params.length;
    const wanted = required === max ? plural(required, 'argument')
      : max === Infinity ? `at least ${plural(required, 'argument')}`
      : `${required} to ${max} arguments`;
    return this.err(`${spec.name} takes ${wanted}, got ${got}: ${signatureOf(spec)}`, e, signatureOf(spec));
  }

  private callLibrary(spec: FunctionSpec, e: ExprOf<'call'>): Compiled {
    const required = spec.params.filter((p) => !p.optional && !p.rest).length;
    const hasRest = spec.params.some((p) => p.rest);
    if (e.args.length < required || (!hasRest && e.args.length > spec.params.length)) throw this.arityError(spec, e.args.length, e);
    const args = e.args.map((a, i) => {
      const decl = i < spec.params.length ? spec.params[i] : spec.params[spec.params.length - 1];
      const c = this.expr(a);
      if (!mayAccept(decl.type, c.type)) {
        throw this.err(
          `the argument ${decl.name} of ${spec.name} must be ${typeList(decl.type)}, but this is ${describeType(c.type)}`,
          a, signatureOf(spec));
      }
      if (surelyAccepts(decl.type, c.type)) return c.fn;
      return this.guard(c.fn, decl.type, `the argument ${decl.name} of ${spec.name}`, a, spec);
    });
    const impl = spec.impl;
    const pos = this.pos(e);
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
          const x = a(fr), y = b(fr);
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
          const x = a(fr), y = b(fr), z = c(fr);
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
  private guard(f: Fn, expected: TypeName | TypeName[], what: string, e: Expr, spec?: FunctionSpec): Fn {
    const exps = Array.isArray(expected) ? expected : [expected];
    const pos = this.pos(e);
    return (fr) => {
      const v = f(fr);
      const t = typeOf(v);
      if (!surelyAccepts(exps, t)) {
        throw new EvalError(`${what} must be ${typeList(expected)}, got ${describeType(t)} (${short(v)})` +
          (spec ? `: ${signatureOf(spec)}` : ''), pos);
      }
      return v;
    };
  }

  /** partitions(4) as a value: the list of its objects. */
  private familyAsList(fam: Family, e: ExprOf<'call'>): Compiled {
    const plan = this.familyPlan(fam, e);
    const pos = this.pos(e);
    return {
      fn: (fr) => {
        const p = plan.prepare(fr);
        const count = fam.count(p);
        if (count > BigInt(MAX_FAMILY_AS_LIST)) {
          throw new EvalError(`${short(printExpression(e))} has ${count} objects, too many to make into a list; iterate over it with "v in ..." instead`, pos);
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

  private familyPlan(fam: Family, e: ExprOf<'call'>): { prepare: (fr: Frame) => unknown; args: Fn[] } {
    const required = fam.params.filter((p) => !p.optional && !p.rest).length;
    const hasRest = fam.params.some((p) => p.rest);
    if (e.args.length < required || (!hasRest && e.args.length > fam.params.length)) {
      throw this.err(`${fam.name} takes ${required === fam.params.length && !hasRest ? plural(required, 'argument') : `${required} or more arguments`}, got ${e.args.length}: ${fam.signature}`, e, fam.signature);
    }
    const args = e.args.map((a, i) => {
      const decl = i < fam.params.length ? fam.params[i] : fam.params[fam.params.length - 1];
      const c = this.expr(a);
      if (!mayAccept(decl.type, c.type)) {
        throw this.err(`the argument ${decl.name} of ${fam.name} must be ${typeList(decl.type)}, but this is ${describeType(c.type)}`, a, fam.signature);
      }
      return c.fn;
    });
    const pos = this.pos(e);
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

  // ---------------------------------------------------------------- indexing

  private index(e: ExprOf<'index'>): Compiled {
    const t = e.target;
    if (t.type === 'name' && this.indeterminates.has(t.name) && !this.layout.lookup(t.name)) return this.indexedVariable(t.name, e);
    const target = this.expr(t), idx = this.expr(e.index);
    const notIndexable = ['integer', 'rational', 'number', 'boolean', 'polynomial', 'scalarOrPolynomial', 'function', 'distribution'];
    if (notIndexable.includes(target.type)) throw this.err(`${describeType(target.type)} cannot be indexed`, t);
    if (!mayAccept('integer', idx.type)) throw this.err(`an index must be an integer, but this is ${describeType(idx.type)}`, e.index);
    const tf = target.fn, xf = idx.fn;
    const pos = this.pos(e);
    const type = target.type === 'permutation' ? 'integer' : target.type === 'string' ? 'string' : 'any';
    return { fn: (fr) => indexValue(tf(fr), xf(fr), pos), type };
  }

  /** x[i] for a declared indeterminate x: the polynomial variable named 'x[i]'. */
  private indexedVariable(base: string, e: ExprOf<'index'>): Compiled {
    const idx = this.expr(e.index);
    if (!mayAccept('integer', idx.type)) throw this.err(`the index of ${base}[...] must be an integer, but this is ${describeType(idx.type)}`, e.index);
    const xf = idx.fn;
    const pos = this.pos(e);
    const cache = new Map<number, Polynomial>();
    return {
      fn: (fr) => {
        const i = xf(fr);
        if (typeof i !== 'number') throw new EvalError(`the index of ${base}[...] must be a small integer, got ${short(i)}`, pos);
        let v = cache.get(i);
        if (!v) cache.set(i, (v = variable(`${base}[${i}]`)));
        return v;
      },
      type: 'polynomial',
    };
  }

  // ---------------------------------------------------------------- comprehensions

  /** How a generator source is iterated: a range without a list, a family by enumeration, or a value. */
  private sourcePlan(e: Expr): SourcePlan {
    if (e.type === 'range') {
      return { kind: 'range', lo: this.smallInt(e.lo, 'the start of a range'), hi: this.smallInt(e.hi, 'the end of a range') };
    }
    if (e.type === 'call' && !this.layout.lookup(e.callee) && !this.defines.has(e.callee) && !getFunction(e.callee)) {
      const fam = getFamily(e.callee);
      if (fam) {
        const plan = this.familyPlan(fam, e);
        return { kind: 'family', family: fam, args: plan.args, prepare: plan.prepare, pos: this.pos(e) };
      }
    }
    const c = this.expr(e);
    if (['integer', 'rational', 'number', 'boolean', 'polynomial', 'scalarOrPolynomial', 'function'].includes(c.type)) {
      throw this.err(`cannot iterate over ${describeType(c.type)}: a source is a range a..b, a list, a family or a measure`, e,
        c.type === 'integer' ? `1..${printExpression(e)}` : undefined);
    }
    return { kind: 'value', fn: c.fn, pos: this.pos(e) };
  }

  private elementType(plan: SourcePlan): TypeName {
    return plan.kind === 'range' ? 'integer' : plan.kind === 'family' ? plan.family.objectKind : 'any';
  }

  /** Reducer comprehension sum(i in S where C: E). */
  private comprehension(e: ExprOf<'comprehension'>): Compiled {
    return this.reduction(e.reducer, e.generators, e.body, e);
  }

  /** The plain forms: sum(L), max(L), max(a, b), count(partitions(n)), set(1..n), ... */
  private reducerCall(name: Reducer, e: ExprOf<'call'>): Compiled {
    if ((name === 'min' || name === 'max') && e.args.length >= 2) {
      const list: Expr = { type: 'list', items: e.args, start: e.start, end: e.end, src: e.src };
      return this.reduction(name, [{ name: '', source: list, start: e.start, end: e.end }], undefined, e);
    }
    if (e.args.length !== 1) {
      const tail = name === 'min' || name === 'max' ? `, several values ${name}(a, b, ...)` : '';
      throw this.err(`${name} takes one list${tail}, or a comprehension ${name}(v in S: ...); got ${plural(e.args.length, 'argument')}`, e,
        `${name}(v in S: ...)`);
    }
    const arg = e.args[0];
    if (name === 'count' && arg.type === 'call' && !this.layout.lookup(arg.callee) && !this.defines.has(arg.callee) && getFamily(arg.callee)) {
      // count(family(...)): the family's exact count, without enumerating.
      const fam = getFamily(arg.callee)!;
      const plan = this.familyPlan(fam, arg);
      const pos = this.pos(arg);
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
    return this.reduction(name, [{ name: '', source: arg, start: arg.start, end: arg.end }], undefined, e);
  }

  private reduction(reducer: Reducer, gens: Generator[], bodyExpr: Expr | undefined, e: Expr): Compiled {
    const layout = this.layout;
    const depthBefore = layout.scopes.length;
    const plans: GenPlan[] = [];
    try {
      for (const g of gens) {
        const source = this.sourcePlan(g.source);
        const slot = layout.fresh();
        const scope = new Map<string, SlotInfo>();
        if (g.name) scope.set(g.name, { slot, type: this.elementType(source) });
        layout.scopes.push(scope);
        const where = g.where ? this.condition(g.where, 'a where condition') : undefined;
        plans.push({ source, slot, where });
      }
      let body: Compiled;
      if (bodyExpr) body = this.expr(bodyExpr);
      else if (reducer === 'count') body = { fn: () => true, type: 'boolean' };
      else if (plans.length === 1) {
        const k = plans[0].slot;
        body = { fn: (fr) => fr[k], type: this.elementType(plans[0].source) };
      } else {
        throw this.err(`${reducer}(...) with several generators needs ": expression" to say what to ${reducer === 'sum' || reducer === 'product' ? 'combine' : 'collect'}`, e);
      }
      if ((reducer === 'all' || reducer === 'any' || (reducer === 'count' && bodyExpr)) && !mayAccept('boolean', body.type)) {
        throw this.err(`the body of ${reducer} must be true or false, but it is ${describeType(body.type)}`, bodyExpr ?? e);
      }
      if ((reducer === 'sum' || reducer === 'product') && bodyExpr === undefined && !(mayAccept('scalarOrPolynomial', body.type) || body.type === 'matrix')) {
        throw this.err(`${reducer} adds up numbers or polynomials, but the elements are ${describeType(body.type)}`, e);
      }
      if ((reducer === 'sum' || reducer === 'product') && bodyExpr) this.checkArith(reducer === 'sum' ? '+' : '*', body.type, body.type, bodyExpr);
      if (reducer === 'concat' && !mayAccept('list', body.type)) {
        throw this.err(`concat joins lists, but the elements are ${describeType(body.type)}`, bodyExpr ?? e);
      }
      const text = e.src ? e.src.text.slice(e.start, e.end) : printExpression(e);
      return compileReduction(reducer, plans, body, this.pos(e), bodyExpr ? this.pos(bodyExpr) : this.pos(e), text);
    } finally {
      layout.scopes.length = depthBefore;
    }
  }
}

function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

function typeList(t: TypeName | TypeName[]): string {
  const ts = Array.isArray(t) ? t : [t];
  return ts.map(describeType).join(' or ');
}


