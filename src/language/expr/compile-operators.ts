// Compiling operators and literals: lists, ranges, not/and/or/implies/iff, ==, order comparisons,
// arithmetic (with a `typeof` fast path for small integers), if, and indexing.

import { EvalError } from '../../base/errors.js';
import { variable, type Polynomial } from '../../algebra/polynomial.js';
import * as ops from '../../library/operators.js';
import type { TypeName } from '../../values/types.js';
import type { Value } from '../../values/value.js';
import type { Expr, ExprOf } from './ast.js';
import { type CompileContext, errorAt, posOf, unknownName } from './compile-scope.js';
import { getFunction } from '../../library/registry.js';
import { getFamily } from '../../families/registry.js';
import type { Compiled, Fn, Frame } from './frame.js';
import { at1, at2, indexValue, notBoolean, short } from './runtime.js';
import { describeType, equalityPossible, isNumber, isNumericish, join, mayAccept } from './statictypes.js';

/** A range used as a plain value may have at most this many elements. */
export const MAX_RANGE_LIST = 10_000_000;

/** A boolean-valued closure, checked statically when the type is known, else at run time. */
export function condition(cx: CompileContext, e: Expr, what: string): (fr: Frame) => boolean {
  const c = cx.expr(e);
  if (!mayAccept('boolean', c.type)) {
    throw errorAt(cx, `${what} must be true or false, but this is ${describeType(c.type)}`, e);
  }
  const f = c.fn;
  if (c.type === 'boolean') return f as (fr: Frame) => boolean;
  const pos = posOf(cx, e);
  return (fr) => {
    const v = f(fr);
    if (v === true || v === false) return v;
    return notBoolean(v, what, pos);
  };
}

/** An integer-valued closure returning a JS number (for range ends). */
export function smallInt(cx: CompileContext, e: Expr, what: string): (fr: Frame) => number {
  const c = cx.expr(e);
  if (!mayAccept('integer', c.type)) throw errorAt(cx, `${what} must be an integer, but this is ${describeType(c.type)}`, e);
  const f = c.fn;
  const pos = posOf(cx, e);
  return (fr) => {
    const v = f(fr);
    if (typeof v === 'number' && Number.isInteger(v)) return v;
    if (typeof v === 'bigint') throw new EvalError(`${what} ${v} is too large`, pos);
    throw new EvalError(`${what} must be an integer, got ${short(v)}`, pos);
  };
}

export function compileList(cx: CompileContext, e: ExprOf<'list'>): Compiled {
  const items = e.items.map((x) => cx.expr(x).fn);
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

export function compileRangeValue(cx: CompileContext, e: ExprOf<'range'>): Compiled {
  const lo = smallInt(cx, e.lo, 'the start of a range');
  const hi = smallInt(cx, e.hi, 'the end of a range');
  const pos = posOf(cx, e);
  return {
    fn: (fr) => {
      const a = lo(fr),
        b = hi(fr);
      if (b - a + 1 > MAX_RANGE_LIST) throw new EvalError(`the range ${a}..${b} is too long to make into a list`, pos);
      const out: number[] = [];
      for (let i = a; i <= b; i++) out.push(i);
      return out;
    },
    type: 'list',
  };
}

export function compileNot(cx: CompileContext, e: ExprOf<'unary'>): Compiled {
  const c = condition(cx, e.operand, 'the operand of not');
  return { fn: (fr) => !c(fr), type: 'boolean' };
}

export function compileNegate(cx: CompileContext, e: ExprOf<'unary'>): Compiled {
  const c = cx.expr(e.operand);
  checkArith(cx, 'unary -', c.type, undefined, e);
  const f = c.fn;
  const pos = posOf(cx, e);
  return {
    fn: (fr) => {
      const a = f(fr);
      if (typeof a === 'number') return a === 0 ? 0 : -a;
      return at1(ops.neg, a, pos);
    },
    type: c.type === 'integer' || isNumericish(c.type) || c.type === 'matrix' || c.type === 'symmetric' ? c.type : 'any',
  };
}

export function compileLogic(cx: CompileContext, e: ExprOf<'binary'>): Compiled {
  const a = condition(cx, e.left, `the left side of ${e.op}`);
  const b = condition(cx, e.right, `the right side of ${e.op}`);
  switch (e.op) {
    case 'and':
      return { fn: (fr) => a(fr) && b(fr), type: 'boolean' };
    case 'or':
      return { fn: (fr) => a(fr) || b(fr), type: 'boolean' };
    case 'iff':
      return { fn: (fr) => a(fr) === b(fr), type: 'boolean' };
    default:
      return { fn: (fr) => !a(fr) || b(fr), type: 'boolean' };
  }
}

export function compileEquality(cx: CompileContext, e: ExprOf<'binary'>): Compiled {
  const l = cx.expr(e.left),
    r = cx.expr(e.right);
  if (!equalityPossible(l.type, r.type)) {
    throw errorAt(
      cx,
      `cannot compare ${describeType(l.type)} with ${describeType(r.type)}`,
      e,
      'both sides of == must be the same kind of value',
    );
  }
  const lf = l.fn,
    rf = r.fn;
  const pos = posOf(cx, e);
  const negate = e.op === '!=';
  if (l.type === 'integer' && r.type === 'integer') {
    // Integers are normalised (a bigint is never a safe integer), so === is exact equality.
    return { fn: negate ? (fr) => lf(fr) !== rf(fr) : (fr) => lf(fr) === rf(fr), type: 'boolean' };
  }
  const slow = negate ? ops.ne : ops.eq;
  return {
    fn: (fr) => {
      const a = lf(fr),
        b = rf(fr);
      if (typeof a === 'number' && typeof b === 'number') return negate ? a !== b : a === b;
      return at2(slow, a, b, pos);
    },
    type: 'boolean',
  };
}

export function compileOrder(cx: CompileContext, e: ExprOf<'binary'>): Compiled {
  const l = cx.expr(e.left),
    r = cx.expr(e.right);
  for (const [side, t, x] of [
    ['left', l.type, e.left],
    ['right', r.type, e.right],
  ] as const) {
    if (!mayAccept('number', t)) {
      throw errorAt(
        cx,
        `${e.op} compares integers and rationals only, but the ${side} side is ${describeType(t)}`,
        x,
        t === 'polynomial' || t === 'scalarOrPolynomial' ? undefined : 'use == to compare other values',
      );
    }
  }
  const lf = l.fn,
    rf = r.fn;
  const pos = posOf(cx, e);
  let fn: Fn;
  switch (e.op) {
    case '<':
      fn = (fr) => {
        const a = lf(fr),
          b = rf(fr);
        return typeof a === 'number' && typeof b === 'number' ? a < b : at2(ops.lt, a, b, pos);
      };
      break;
    case '<=':
      fn = (fr) => {
        const a = lf(fr),
          b = rf(fr);
        return typeof a === 'number' && typeof b === 'number' ? a <= b : at2(ops.le, a, b, pos);
      };
      break;
    case '>':
      fn = (fr) => {
        const a = lf(fr),
          b = rf(fr);
        return typeof a === 'number' && typeof b === 'number' ? a > b : at2(ops.gt, a, b, pos);
      };
      break;
    default:
      fn = (fr) => {
        const a = lf(fr),
          b = rf(fr);
        return typeof a === 'number' && typeof b === 'number' ? a >= b : at2(ops.ge, a, b, pos);
      };
  }
  return { fn, type: 'boolean' };
}

/** Load-time check of an arithmetic operator; returns the result type. */
export function checkArith(cx: CompileContext, op: string, a: TypeName, b: TypeName | undefined, e: Expr): TypeName {
  const bad = (why?: string): never => {
    const what = b === undefined ? describeType(a) : `${describeType(a)} and ${describeType(b)}`;
    throw errorAt(
      cx,
      `${op} is not defined for ${what}`,
      e,
      why ?? (op === '+' && a === 'list' && (b === 'list' || b === 'any') ? 'to join lists use concat([A, B])' : undefined),
    );
  };
  const arithmetic = (t: TypeName) => t === 'any' || isNumericish(t) || t === 'permutation' || t === 'matrix' || t === 'symmetric';
  if (!arithmetic(a) || (b !== undefined && !arithmetic(b))) bad();
  // Symmetric functions: a ring over the numbers and polynomials (division only by those).
  if (a === 'symmetric' || b === 'symmetric') {
    if (b === undefined) return a;
    const other = a === 'symmetric' ? b : a;
    if (op === '^') {
      if (b === 'symmetric' || !mayAccept('integer', b)) bad('an exponent must be an integer');
      return 'symmetric';
    }
    if (op === '/' && b === 'symmetric') bad('a symmetric function can be divided only by a number or a polynomial');
    if (other !== 'any' && other !== 'symmetric' && !isNumericish(other)) bad();
    return 'symmetric';
  }
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

export function compileArith(cx: CompileContext, e: ExprOf<'binary'>): Compiled {
  const l = cx.expr(e.left),
    r = cx.expr(e.right);
  let type = checkArith(cx, e.op, l.type, r.type, e);
  // A nonnegative literal exponent keeps integers integers: n^2.
  if (e.op === '^' && l.type === 'integer' && e.right.type === 'int') type = 'integer';
  const lf = l.fn,
    rf = r.fn;
  const pos = posOf(cx, e);
  let fn: Fn;
  switch (e.op) {
    case '+':
      fn = (fr) => {
        const a = lf(fr),
          b = rf(fr);
        if (typeof a === 'number' && typeof b === 'number') {
          const s = a + b;
          if (s <= Number.MAX_SAFE_INTEGER && s >= -Number.MAX_SAFE_INTEGER) return s;
        }
        return at2(ops.add, a, b, pos);
      };
      break;
    case '-':
      fn = (fr) => {
        const a = lf(fr),
          b = rf(fr);
        if (typeof a === 'number' && typeof b === 'number') {
          const s = a - b;
          if (s <= Number.MAX_SAFE_INTEGER && s >= -Number.MAX_SAFE_INTEGER) return s;
        }
        return at2(ops.sub, a, b, pos);
      };
      break;
    case '*':
      fn = (fr) => {
        const a = lf(fr),
          b = rf(fr);
        if (typeof a === 'number' && typeof b === 'number') {
          const s = a * b;
          if (s <= Number.MAX_SAFE_INTEGER && s >= -Number.MAX_SAFE_INTEGER) return s === 0 ? 0 : s;
        }
        return at2(ops.mul, a, b, pos);
      };
      break;
    case '/':
      fn = (fr) => {
        const a = lf(fr),
          b = rf(fr);
        if (typeof a === 'number' && typeof b === 'number' && b !== 0 && a % b === 0) return a / b + 0;
        return at2(ops.div, a, b, pos);
      };
      break;
    default:
      fn = (fr) => at2(ops.pow, lf(fr), rf(fr), pos);
  }
  return { fn, type };
}

export function compileIf(cx: CompileContext, e: ExprOf<'if'>): Compiled {
  const c = condition(cx, e.cond, 'the condition of if');
  const a = cx.expr(e.then),
    b = cx.expr(e.else);
  const af = a.fn,
    bf = b.fn;
  return { fn: (fr) => (c(fr) ? af(fr) : bf(fr)), type: join(a.type, b.type) };
}

export function compileIndex(cx: CompileContext, e: ExprOf<'index'>): Compiled {
  const t = e.target;
  if (t.type === 'name' && cx.indeterminates.has(t.name) && !cx.layout.lookup(t.name)) return indexedVariable(cx, t.name, e);
  if (e.index2)
    throw errorAt(
      cx,
      'two indices [i, j] name a doubly indexed indeterminate such as z[i, j] (declared under indeterminates:); to index a list twice write L[i][j]',
      e,
    );
  if (
    t.type === 'name' &&
    !cx.layout.lookup(t.name) &&
    !cx.defines.has(t.name) &&
    !cx.indeterminates.has(t.name) &&
    !getFunction(t.name) &&
    !getFamily(t.name)
  ) {
    throw unknownName(cx, t.name, t, false, true);
  }
  const target = cx.expr(t),
    idx = cx.expr(e.index);
  // A polynomial may be an indeterminate passed as an argument (y given x): y[i] is then x[i], checked when it runs.
  const notIndexable = ['integer', 'rational', 'number', 'boolean', 'function', 'distribution'];
  if (notIndexable.includes(target.type)) throw errorAt(cx, `${describeType(target.type)} cannot be indexed`, t);
  if (!mayAccept('integer', idx.type)) throw errorAt(cx, `an index must be an integer, but this is ${describeType(idx.type)}`, e.index);
  const tf = target.fn,
    xf = idx.fn;
  const pos = posOf(cx, e);
  const type =
    target.type === 'permutation' ? 'integer' : target.type === 'string' ? 'string' : target.type === 'polynomial' ? 'polynomial' : 'any';
  return { fn: (fr) => indexValue(tf(fr), xf(fr), pos), type };
}

/** x[i] for a declared indeterminate x: the polynomial variable named 'x[i]'. */
export function indexedVariable(cx: CompileContext, base: string, e: ExprOf<'index'>): Compiled {
  if (e.index2) return doublyIndexedVariable(cx, base, e, e.index2);
  const idx = cx.expr(e.index);
  if (!mayAccept('integer', idx.type))
    throw errorAt(cx, `the index of ${base}[...] must be an integer, but this is ${describeType(idx.type)}`, e.index);
  const xf = idx.fn;
  const pos = posOf(cx, e);
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

/** z[i, j] for a declared indeterminate z: the polynomial variable named 'z[i,j]'. */
function doublyIndexedVariable(cx: CompileContext, base: string, e: ExprOf<'index'>, second: Expr): Compiled {
  const a = cx.expr(e.index),
    b = cx.expr(second);
  for (const [c, x] of [
    [a, e.index],
    [b, second],
  ] as const)
    if (!mayAccept('integer', c.type))
      throw errorAt(cx, `the indices of ${base}[i, j] must be integers, but this is ${describeType(c.type)}`, x);
  const af = a.fn,
    bf = b.fn;
  const pos = posOf(cx, e);
  const cache = new Map<string, Polynomial>();
  return {
    fn: (fr) => {
      const i = af(fr),
        j = bf(fr);
      if (typeof i !== 'number' || typeof j !== 'number')
        throw new EvalError(`the indices of ${base}[i, j] must be small integers, got ${short(typeof i !== 'number' ? i : j)}`, pos);
      const name = `${base}[${i},${j}]`;
      let v = cache.get(name);
      if (!v) cache.set(name, (v = variable(name)));
      return v;
    },
    type: 'polynomial',
  };
}
