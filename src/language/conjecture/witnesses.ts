// Witnesses of a failing claim (CLI.md, `witnesses`): for each all/any/min/max on the path to
// false, the element that decided it — the simplest one, by the family's simplicity order (a
// range by value, a list by position) — and, for and/or/implies/iff and comparisons at the top of
// the claim, the value of each side.
//
// Nothing here runs until a claim has failed: the claim's tree is walked once, for the final
// counterexample only, evaluating each sub-expression on the path with a fresh compiler whose
// names are the case's bindings and lets (and the witnesses found above it). A part that cannot
// be evaluated is left out: witnesses explain a failure, they never cause one.

import { EvalError, InputError } from '../../base/errors.js';
import type { Family } from '../../families/family.js';
import { decodeValue } from '../../values/decode.js';
import { encodeValue, own } from '../../values/operations.js';
import { compareValues } from '../../values/order.js';
import { typeOf, type TypeName } from '../../values/types.js';
import type { Value } from '../../values/value.js';
import type { Expr, ExprOf, Generator } from '../expr/ast.js';
import { elementsOf } from '../expr/comprehension.js';
import { Compiler, type DefineDecl } from '../expr/compiler.js';
import { parseExpression } from '../expr/parser.js';
import { parseDefines } from './compile-conjecture.js';
import type { CompiledConjecture, Frame } from './compiled.js';

/** One step of the explanation: a sub-expression, the extra bindings it was evaluated with, its value. */
export interface Witness {
  /** 'element': a quantifier's deciding element (all/any) or extreme (min/max); 'value': a side at the top of the claim. */
  kind: 'element' | 'value';
  /** For an element: which reducer it decides. */
  reducer?: 'all' | 'any' | 'min' | 'max';
  /** The sub-expression's text as written. */
  at: string;
  line: number;
  column: number;
  /** For a quantifier: its deciding element (and any found above it); otherwise the witnesses above it. Encoded. */
  bindings: Record<string, unknown>;
  /** For a quantifier: its body's value at the element (for min/max, the extreme value); otherwise the expression's value. Encoded. */
  value: unknown;
  /** When the quantifier's body is a comparison (or, for a value, the expression is one): its two sides. Encoded. */
  sides?: [unknown, unknown];
  /** True when the source was too large to scan whole: the element is the simplest among the first MAX_WITNESS_SCAN. */
  partial?: boolean;
}

/** At most this many elements of a source are scanned for the simplest witness. */
export const MAX_WITNESS_SCAN = 1_000_000;

/** At most this many witnesses are reported for one claim. */
const MAX_WITNESSES = 24;

const COMPARISONS = new Set(['==', '!=', '<', '<=', '>', '>=']);
const CONNECTIVES = new Set(['and', 'or', 'implies', 'iff']);

interface Name {
  name: string;
  type: TypeName;
  value: Value;
}

interface Ctx {
  file: string;
  indeterminates: string[];
  defines: DefineDecl[];
  /** Each let's tree, for following a claim that names a let. */
  lets: Map<string, Expr>;
  /** Top sides already recorded. */
  recorded: Set<Expr>;
  out: Witness[];
}

function typeFor(v: Value): TypeName {
  const t = typeOf(v);
  return t === 'unknown' ? 'any' : t;
}

/** A compiler whose names are `env`, in order, and the frame holding their values. */
function scope(ctx: Ctx, env: Name[]): { c: Compiler; slots: number[] } {
  const c = new Compiler({ file: ctx.file, indeterminates: ctx.indeterminates, defines: ctx.defines });
  return { c, slots: env.map((n) => c.declareSlot(n.name, n.type)) };
}

function frameOf(c: Compiler, env: Name[], slots: number[]): Frame {
  const frame: Frame = new Array(c.frameSize());
  env.forEach((n, i) => (frame[slots[i]] = n.value));
  return frame;
}

function evaluate(ctx: Ctx, env: Name[], e: Expr): Value {
  const { c, slots } = scope(ctx, env);
  const fn = c.compile(e).fn;
  return fn(frameOf(c, env, slots));
}

function textOf(e: Expr): string {
  return e.src ? e.src.text.slice(e.start, e.end) : '';
}

function where(e: Expr): { line: number; column: number } {
  return e.src ? e.src.origin.locate(e.start) : { line: 0, column: 0 };
}

function encodeBound(bound: Name[]): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const b of bound) out[b.name] = encodeValue(b.value);
  return out;
}

function push(ctx: Ctx, w: Witness): void {
  if (ctx.out.length < MAX_WITNESSES) ctx.out.push(w);
}

/** A comparison's value with its two sides, recorded once. */
function comparisonSides(ctx: Ctx, env: Name[], bound: Name[], e: ExprOf<'binary'>): Value {
  const v = evaluate(ctx, env, e);
  if (ctx.recorded.has(e)) return v;
  ctx.recorded.add(e);
  push(ctx, {
    kind: 'value',
    at: textOf(e),
    ...where(e),
    bindings: encodeBound(bound),
    value: encodeValue(v),
    sides: [encodeValue(evaluate(ctx, env, e.left)), encodeValue(evaluate(ctx, env, e.right))],
  });
  return v;
}

/** The value of a side, recorded once. */
function side(ctx: Ctx, env: Name[], bound: Name[], e: Expr): Value {
  if (e.type === 'binary' && COMPARISONS.has(e.op)) return comparisonSides(ctx, env, bound, e);
  const v = evaluate(ctx, env, e);
  if (ctx.recorded.has(e)) return v;
  ctx.recorded.add(e);
  push(ctx, { kind: 'value', at: textOf(e), ...where(e), bindings: encodeBound(bound), value: encodeValue(v) });
  return v;
}

/** A let named by the claim (not shadowed by a witness variable). */
function letTree(ctx: Ctx, bound: Name[], e: Expr): Expr | null {
  if (e.type !== 'name' || bound.some((b) => b.name === e.name)) return null;
  return ctx.lets.get(e.name) ?? null;
}

/** Explain why e has the value it has, on the path to the claim's false. `top`: still in the claim's top connectives. */
function explain(ctx: Ctx, env: Name[], bound: Name[], e: Expr, top: boolean, root = false): void {
  if (ctx.out.length >= MAX_WITNESSES) return;
  const viaLet = letTree(ctx, bound, e);
  if (viaLet) {
    explain(ctx, env, bound, viaLet, top);
    return;
  }
  switch (e.type) {
    case 'unary':
      if (e.op === 'not') explain(ctx, env, bound, e.operand, top);
      return;
    case 'if': {
      const cond = evaluate(ctx, env, e.cond);
      explain(ctx, env, bound, cond === true ? e.then : e.else, top);
      return;
    }
    case 'binary': {
      if (CONNECTIVES.has(e.op)) {
        const value = evaluate(ctx, env, e);
        // At the top, each side's value is recorded (a comparison with its own two sides).
        const l = top ? side(ctx, env, bound, e.left) : evaluate(ctx, env, e.left);
        const r = top ? side(ctx, env, bound, e.right) : evaluate(ctx, env, e.right);
        const follow: Expr[] = [];
        if (e.op === 'and')
          (value ? [e.left, e.right] : [l === false ? e.left : null, r === false ? e.right : null]).forEach((x) => x && follow.push(x));
        else if (e.op === 'or')
          (value ? [l === true ? e.left : null, r === true ? e.right : null] : [e.left, e.right]).forEach((x) => x && follow.push(x));
        else if (e.op === 'implies') follow.push(...(value ? [l === false ? e.left : e.right] : [e.left, e.right]));
        else follow.push(e.left, e.right);
        for (const x of follow) explain(ctx, env, bound, x, top);
        return;
      }
      if (COMPARISONS.has(e.op)) {
        // The claim's own top comparison has its sides in the counterexample already.
        if (top && !root) comparisonSides(ctx, env, bound, e);
        extremes(ctx, env, bound, e.left);
        extremes(ctx, env, bound, e.right);
      }
      return;
    }
    case 'comprehension':
      if (e.reducer === 'all' || e.reducer === 'any') quantifier(ctx, env, bound, e, e.reducer === 'any');
      return;
    default:
      return;
  }
}

/** The min/max comprehensions inside an operand of a comparison (through arithmetic and lets). */
function extremes(ctx: Ctx, env: Name[], bound: Name[], e: Expr): void {
  const viaLet = letTree(ctx, bound, e);
  if (viaLet) {
    extremes(ctx, env, bound, viaLet);
    return;
  }
  if (e.type === 'comprehension' && (e.reducer === 'min' || e.reducer === 'max')) return void search(ctx, env, bound, e, e.reducer);
  if (e.type === 'binary' && !COMPARISONS.has(e.op) && !CONNECTIVES.has(e.op)) {
    extremes(ctx, env, bound, e.left);
    extremes(ctx, env, bound, e.right);
  } else if (e.type === 'unary' && e.op === '-') extremes(ctx, env, bound, e.operand);
}

/** all(...) that is false, or any(...) that is true: its simplest deciding element, then why the body is what it is there. */
function quantifier(ctx: Ctx, env: Name[], bound: Name[], e: ExprOf<'comprehension'>, wanted: boolean): void {
  const value = evaluate(ctx, env, e);
  if (value !== wanted) return; // a true all or a false any: no single element decides it
  const found = search(ctx, env, bound, e, wanted ? 'true' : 'false');
  if (found && e.body) explain(ctx, [...env, ...found], [...bound, ...found], e.body, false);
}

type Goal = 'true' | 'false' | 'min' | 'max';

/** How simple one element of a generator is, relative to another (negative: simpler). */
type Order = (a: Value, b: Value) => number;

/**
 * Scan a comprehension's elements for the simplest one meeting the goal (a body that is true or
 * false, or the extreme value of the body), record it, and return its bindings.
 */
function search(ctx: Ctx, env: Name[], bound: Name[], e: ExprOf<'comprehension'>, goal: Goal): Name[] | null {
  const { c, slots } = scope(ctx, env);
  const gens = e.generators;
  const plans: Array<{
    g: Generator;
    slot: number;
    order: Order;
    ordered: boolean;
    each: (fr: Frame, visit: (v: Value, rank: Value) => boolean) => boolean;
    where: ((fr: Frame) => Value) | null;
  }> = [];
  for (const g of gens) {
    const src = c.compileSource(g.source);
    const slot = c.declareSlot(g.name, src.elementType);
    const where = g.where ? c.compile(g.where).fn : null;
    if (src.kind === 'range') {
      const { lo, hi } = src;
      plans.push({
        g,
        slot,
        where,
        order: compareValues,
        ordered: true,
        each: (fr, visit) => {
          const a = lo(fr),
            b = hi(fr);
          if (typeof a !== 'number' || typeof b !== 'number') return false;
          for (let i = a; i <= b; i++) if (visit(i, i)) return true;
          return false;
        },
      });
    } else if (src.kind === 'family') {
      const fam = src.family as Family<any, any>;
      const args = src.args;
      plans.push({
        g,
        slot,
        where,
        order: (a, b) => fam.compare(a, b),
        ordered: false,
        each: (fr, visit) => {
          const p = fam.prepare(args.map((f) => f(fr)));
          return fam.enumerate(p, (obj) => visit(obj, obj));
        },
      });
    } else {
      const fn = src.fn;
      plans.push({
        g,
        slot,
        where,
        order: compareValues,
        ordered: true,
        each: (fr, visit) => {
          const list = elementsOf(fn(fr), undefined);
          for (let i = 0; i < list.length; i++) if (visit(list[i], i)) return true;
          return false;
        },
      });
    }
  }
  const allOrdered = plans.every((p) => p.ordered);
  const body = e.body ? c.compile(e.body).fn : null;
  const sides =
    e.body && e.body.type === 'binary' && COMPARISONS.has(e.body.op) ? [c.compile(e.body.left).fn, c.compile(e.body.right).fn] : null;
  const frame = frameOf(c, env, slots);

  let best: { elems: Value[]; ranks: Value[]; value: Value } | null = null;
  let visits = 0;
  let partial = false;
  const elems: Value[] = new Array(plans.length);
  const ranks: Value[] = new Array(plans.length);
  const simpler = (r: Value[]): number => {
    for (let k = 0; k < plans.length; k++) {
      const d = plans[k].order(r[k], best!.ranks[k]);
      if (d !== 0) return d;
    }
    return 0;
  };
  const leaf = (): boolean => {
    if (++visits > MAX_WITNESS_SCAN) {
      partial = true;
      return true;
    }
    const v = body ? body(frame) : frame[plans[plans.length - 1].slot];
    let better: boolean;
    if (goal === 'true' || goal === 'false') {
      if (v !== (goal === 'true')) return false;
      better = best === null || simpler(ranks) < 0;
    } else {
      const d = best === null ? 1 : compareValues(v, best.value) * (goal === 'max' ? 1 : -1);
      better = d > 0 || (d === 0 && simpler(ranks) < 0);
    }
    if (better) best = { elems: elems.map(own), ranks: ranks.map(own), value: own(v) };
    // Ranges and lists are visited simplest first: the first element meeting a true/false goal is the one.
    return (goal === 'true' || goal === 'false') && allOrdered;
  };
  const run = (k: number): boolean => {
    if (k === plans.length) return leaf();
    const p = plans[k];
    return p.each(frame, (obj, rank) => {
      frame[p.slot] = obj;
      if (p.where && p.where(frame) !== true) return false;
      elems[k] = obj;
      ranks[k] = rank;
      return run(k + 1);
    });
  };
  run(0);
  if (!best) return null;
  const found = best as { elems: Value[]; ranks: Value[]; value: Value };
  const names: Name[] = plans.map((p, k) => ({ name: p.g.name, type: typeFor(found.elems[k]), value: found.elems[k] }));
  const reducer = e.reducer as 'all' | 'any' | 'min' | 'max';
  const w: Witness = {
    kind: 'element',
    reducer,
    at: textOf(e),
    ...where(e),
    bindings: encodeBound([...bound, ...names]),
    value: encodeValue(found.value),
  };
  if (sides) {
    plans.forEach((p, k) => (frame[p.slot] = found.elems[k]));
    try {
      w.sides = [encodeValue(sides[0](frame)), encodeValue(sides[1](frame))];
    } catch (err) {
      if (!(err instanceof EvalError)) throw err;
    }
  }
  if (partial) w.partial = true;
  push(ctx, w);
  return names;
}

/**
 * The witnesses of a failing case: `frame` holds the case's bindings (its lets are evaluated
 * here). Returns [] when the claim has no quantifier or connective to explain.
 */
export function traceWitnesses(cc: CompiledConjecture, frame: Frame): Witness[] {
  const spec = cc.spec;
  const ctx: Ctx = { file: spec.file, indeterminates: spec.indeterminates, defines: [], lets: new Map(), recorded: new Set(), out: [] };
  try {
    ctx.defines = parseDefines(spec);
    const env: Name[] = [];
    for (const b of cc.bindings)
      if (frame[b.slot] !== undefined) env.push({ name: b.name, type: typeFor(frame[b.slot]), value: frame[b.slot] });
    for (let i = 0; i < cc.lets.length; i++) {
      const l = cc.lets[i];
      frame[l.slot] = l.fn(frame);
      env.push({ name: l.name, type: typeFor(frame[l.slot]), value: frame[l.slot] });
      ctx.lets.set(l.name, parseExpression(spec.lets[i].expr.text, spec.lets[i].expr.origin));
    }
    const claim = parseExpression(spec.claim.text, spec.claim.origin);
    explain(ctx, env, [], claim, true, true);
  } catch (e) {
    if (!(e instanceof EvalError || e instanceof InputError)) throw e;
  }
  return ctx.out;
}

/** The witnesses of an encoded counterexample's bindings (as the runner and replay keep them). */
export function witnessesOfBindings(cc: CompiledConjecture, bindings: Record<string, unknown>): Witness[] {
  const frame: Frame = new Array(cc.frameSize);
  try {
    for (const b of cc.bindings) if (b.name in bindings) frame[b.slot] = decodeValue(bindings[b.name]);
  } catch (e) {
    if (e instanceof EvalError) return [];
    throw e;
  }
  return traceWitnesses(cc, frame);
}
