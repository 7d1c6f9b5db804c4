// The expression language of FORMAT.md §2–§3: parse, print, check and compile.
//
// API (what the conjecture loader, the runner and `hunch eval` use):
//
//   parseExpression(text, origin): Expr            InputError (pos, snippet, suggestion) on bad syntax
//   printExpression(e): string                      parse(print(e)) is structurally equal to e (exprEquals);
//                                                   comprehensions body first: sum(E for v in S)
//   printHashForm(e): string                        the fixed binder-first text the conjecture hash uses
//   parseDefineHeader('peaks(w)', origin)           -> { name: 'peaks', params: ['w'] }
//   textOrigin(file, text, line?, column?)          an Origin for text that sits verbatim in a file
//   new Compiler({ file, indeterminates, defines }) checks every define at once (InputError)
//     .declareSlot(name, type?) -> slot             for-bindings and lets, in order, each after
//                                                   compiling what it may not see (a let its own body)
//     .compileSource(expr) -> CompiledSource        a for-binding's source: range | family | list,
//                                                   with elementType for declareSlot
//     .compile(expr) -> { fn, type }                fn(frame) evaluates; load-time InputErrors for
//                                                   unknown names (with "did you mean"), arity, types
//     .frameSize()                                  allocate `new Array(c.frameSize())` AFTER the last
//                                                   compile (comprehensions and lambdas add slots)
//     .names()                                      every visible name, for "did you mean"
//   evaluate(text, lets?, indeterminates?)          one-shot evaluation for `hunch eval`
//
// Run-time failures are EvalError with `pos` set to the innermost failing sub-expression.
//
// Indexing protocol for objects: a Structured value may define `at(i: number): Value | undefined`
// with a 1-based i; `undefined` means out of range (reported with the object's `n` or `length`
// when it has one), and at() may also fail() itself (a partition returns 0 past its length).
// Lists, strings and matrices (M[i] is row i as a list) are indexed by the compiler itself.
// Iteration protocol: a Structured value with `elements(): readonly Value[]` (measures) can be a
// source after `in`; so can a distribution (its distinct values).

import { own } from '../../values/operations.js';
import type { Value } from '../../values/value.js';
import { Compiler } from './compiler.js';
import { textOrigin } from './origin.js';
import { parseExpression } from './parser.js';
import { located } from './runtime.js';

export type { Expr, Generator, Origin, SourceText, Reducer, BinaryOp } from './ast.js';
export { exprEquals, stripPositions, REDUCERS, isReducer } from './ast.js';
export { parseExpression, parseDefineHeader, MAX_NESTING, MAX_DEPTH } from './parser.js';
export { printExpression, printHashForm } from './printer.js';
export { textOrigin, sourcePos } from './origin.js';
export {
  Compiler,
  MAX_CALL_DEPTH,
  type Compiled,
  type CompiledSource,
  type DefineDecl,
  type CompilerOptions,
  type Fn,
  type Frame,
} from './compiler.js';

/**
 * Evaluate one expression (for `hunch eval`), after `lets` ([name, expression] pairs, in order,
 * each seeing the earlier ones). `indeterminates` are the polynomial variables it may use.
 */
export function evaluate(text: string, lets: Array<[string, string]> = [], indeterminates: string[] = []): Value {
  const c = new Compiler({
    file: '<expression>',
    indeterminates,
    defines: [],
    declareIndeterminate: (name, declared) => `if ${name} is a polynomial variable, pass --indeterminates ${[...declared, name].join(',')}`,
  });
  const steps: Array<[number, (fr: Value[]) => Value]> = [];
  for (const [name, t] of lets) {
    const compiled = c.compile(parseExpression(t, textOrigin(`--let ${name}`, t)));
    steps.push([c.declareSlot(name, compiled.type), compiled.fn]);
  }
  const main = c.compile(parseExpression(text, textOrigin('<expression>', text)));
  const frame = new Array<Value>(c.frameSize());
  try {
    for (const [slot, fn] of steps) frame[slot] = own(fn(frame));
    return main.fn(frame);
  } catch (e) {
    // Only a stack overflow outside library calls is left to catch here (those calls catch their own).
    if (e instanceof RangeError && /call stack/i.test(e.message)) throw located(e, undefined);
    throw e;
  }
}
