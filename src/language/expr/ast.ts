// The syntax tree of an expression (FORMAT.md §3). Every node keeps the offsets [start, end) of its
// text and the source it came from, so that load-time and run-time errors can point at the exact
// sub-expression (the file position comes from the source's Origin). Structural equality of trees
// (exprEquals) ignores positions.

import type { Int } from '../../numbers/integer.js';

/** Maps an offset in an expression's text to its place in the user's file. */
export interface Origin {
  file: string;
  locate(offset: number): { line: number; column: number };
}

/** The text an expression was parsed from, shared by all its nodes. */
export interface SourceText {
  text: string;
  origin: Origin;
}

interface NodeBase {
  start: number;
  end: number;
  src?: SourceText;
}

export type ArithOp = '+' | '-' | '*' | '/' | '^';
export type CompareOp = '==' | '!=' | '<' | '<=' | '>' | '>=';
export type LogicOp = 'and' | 'or' | 'implies' | 'iff';
export type BinaryOp = ArithOp | CompareOp | LogicOp;

/** The reducers that take comprehensions: sum(i^2 for i in 1..n), count(w in S where ...), ... */
export const REDUCERS = ['sum', 'product', 'count', 'all', 'any', 'min', 'max', 'list', 'set', 'concat', 'distribution'] as const;
export type Reducer = (typeof REDUCERS)[number];
export function isReducer(name: string): name is Reducer {
  return (REDUCERS as readonly string[]).includes(name);
}

export interface Generator {
  /** The bound variable. */
  name: string;
  source: Expr;
  /** A filter right after this generator (`i in 1..n where C`). */
  where?: Expr;
  start: number;
  end: number;
}

export type Expr =
  | (NodeBase & { type: 'int'; value: Int })
  | (NodeBase & { type: 'string'; value: string })
  | (NodeBase & { type: 'bool'; value: boolean })
  | (NodeBase & { type: 'name'; name: string })
  | (NodeBase & { type: 'list'; items: Expr[] })
  | (NodeBase & { type: 'range'; lo: Expr; hi: Expr })
  | (NodeBase & { type: 'binary'; op: BinaryOp; left: Expr; right: Expr })
  | (NodeBase & { type: 'unary'; op: '-' | 'not'; operand: Expr })
  | (NodeBase & { type: 'if'; cond: Expr; then: Expr; else: Expr })
  | (NodeBase & { type: 'lambda'; params: string[]; body: Expr })
  | (NodeBase & { type: 'call'; callee: string; args: Expr[] })
  /** L[i]; z[i, j] (index2 set) only on a declared indeterminate: the variable z[i,j]. */
  | (NodeBase & { type: 'index'; target: Expr; index: Expr; index2?: Expr })
  | (NodeBase & { type: 'comprehension'; reducer: Reducer; generators: Generator[]; body?: Expr });

export type ExprOf<T extends Expr['type']> = Extract<Expr, { type: T }>;

/** Structural equality, ignoring positions and sources. */
export function exprEquals(a: Expr, b: Expr): boolean {
  return JSON.stringify(stripPositions(a)) === JSON.stringify(stripPositions(b));
}

/** A position-free plain copy of the tree (bigints as strings), for comparisons and snapshots. */
export function stripPositions(e: unknown): unknown {
  if (typeof e === 'bigint') return `${e}n`;
  if (Array.isArray(e)) return e.map(stripPositions);
  if (e && typeof e === 'object') {
    const out: Record<string, unknown> = {};
    for (const k of Object.keys(e).sort()) {
      if (k === 'start' || k === 'end' || k === 'src') continue;
      const v = (e as Record<string, unknown>)[k];
      if (v === undefined) continue;
      out[k] = stripPositions(v);
    }
    return out;
  }
  return e;
}
