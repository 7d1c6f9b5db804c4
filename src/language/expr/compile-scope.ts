// Compile-time scope: the layout of a frame (nested scopes of named slots), the state the
// compiler's parts share while compiling, and the errors they raise with positions.

import { InputError, type SourcePos } from '../../base/errors.js';
import { nearest } from '../../base/suggest.js';
import { allFamilies } from '../../families/registry.js';
import { allFunctions } from '../../library/registry.js';
import type { TypeName } from '../../values/types.js';
import { type Expr, REDUCERS } from './ast.js';
import type { Compiled, Fn } from './frame.js';
import { inputError, sourcePos } from './origin.js';

/** A `define:` entry: 'peaks(w)': 'count(...)'. The body keeps its own source and origin. */
export interface DefineDecl {
  name: string;
  params: string[];
  body: Expr;
  /** Where the header is, for errors about the definition itself. */
  pos?: SourcePos;
}

export interface SlotInfo {
  slot: number;
  type: TypeName;
}

/** Compile-time layout of one frame: nested scopes of named slots. */
export class Layout {
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

export interface DefineCell {
  decl: DefineDecl;
  state: 'pending' | 'compiling' | 'done';
  /** The body over its own frame (params in slots 0..k-1). */
  body: Fn | null;
  frameSize: number;
  type: TypeName;
}

/**
 * What the compiler's parts share: the names in scope, the definitions, the current frame layout
 * (a definition's body is compiled over its own), the depth of defined-function calls at run time,
 * and `expr`, the dispatcher every part calls to compile a sub-expression.
 */
export interface CompileContext {
  readonly file: string;
  readonly indeterminates: Set<string>;
  readonly defines: Map<string, DefineCell>;
  layout: Layout;
  callDepth: number;
  expr(e: Expr): Compiled;
  /** The hint for an unknown name that looks like a polynomial variable. */
  declareIndeterminate(name: string, declared: readonly string[]): string;
}

/** A name that is plausibly a polynomial variable: one letter, perhaps with digits (q, t, x, y2), or one used as x[i]. */
export function looksLikeIndeterminate(name: string, indexed: boolean): boolean {
  return indexed || /^[A-Za-z][0-9]*$/.test(name);
}

export function errorAt(
  cx: CompileContext,
  message: string,
  e: { start: number; end: number; src?: Expr['src'] },
  suggestion?: string,
): InputError {
  return inputError(message, e.src, e.start, e.end, suggestion);
}

export function posOf(cx: CompileContext, e: Expr): SourcePos | undefined {
  return sourcePos(e.src, e.start) ?? { file: cx.file, line: 0, column: 0 };
}

export function unknownName(cx: CompileContext, name: string, e: Expr, asCall: boolean, indexed = false): InputError {
  const candidates = asCall
    ? [
        ...cx.defines.keys(),
        ...REDUCERS,
        ...allFunctions().map((f) => f.name),
        ...allFamilies().map((f) => f.name),
        ...cx.layout.visibleNames(),
      ]
    : [...cx.layout.visibleNames(), ...cx.indeterminates, ...cx.defines.keys(), ...allFunctions().map((f) => f.name)];
  const near = nearest(name, candidates);
  const what = asCall ? `unknown function ${name}` : `unknown name ${name}`;
  if (!asCall && looksLikeIndeterminate(name, indexed)) {
    const declare = cx.declareIndeterminate(name, [...cx.indeterminates]);
    return errorAt(cx, `${what}${near ? ` (did you mean ${near}?)` : ''}; ${declare}`, e, declare);
  }
  return errorAt(cx, near ? `${what}; did you mean ${near}?` : what, e, near);
}
