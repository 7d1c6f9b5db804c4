// Prints a tree back as source text with the fewest parentheses the grammar needs, so that
// parseExpression(printExpression(e)) is structurally equal to e (levels as in parser.ts).
// Comprehensions print body first, `sum(E for i in S)`; one without a body (`count(w in S where C)`)
// prints binder first. printHashForm keeps the binder-first spelling `sum(i in S: E)` that the
// conjecture hash has always been computed over, so that records made before the body-first form
// existed stay valid: the hash depends on the tree, never on which spelling a file uses.

import type { BinaryOp, Expr } from './ast.js';

const LEVEL_OF_BINARY: Record<BinaryOp, number> = {
  implies: 2,
  iff: 2,
  or: 3,
  and: 4,
  '==': 6,
  '!=': 6,
  '<': 6,
  '<=': 6,
  '>': 6,
  '>=': 6,
  '+': 8,
  '-': 8,
  '*': 9,
  '/': 9,
  '^': 10,
};

function level(e: Expr): number {
  switch (e.type) {
    case 'if':
    case 'lambda':
      return 1;
    case 'binary':
      return LEVEL_OF_BINARY[e.op];
    case 'unary':
      return e.op === 'not' ? 5 : 9;
    case 'range':
      return 7;
    default:
      return 11;
  }
}

function at(e: Expr, min: number, m: Mode): string {
  const s = print(e, m);
  return level(e) < min ? `(${s})` : s;
}

/** The exponent of ^: signs, then a power or anything tighter. */
function exponent(e: Expr, m: Mode): string {
  if (e.type === 'unary' && e.op === '-') return '-' + exponent(e.operand, m);
  return at(e, 10, m);
}

type Mode = 'bodyFirst' | 'binderFirst';

function print(e: Expr, m: Mode): string {
  switch (e.type) {
    case 'int':
      return e.value.toString();
    case 'string':
      return JSON.stringify(e.value);
    case 'bool':
      return e.value ? 'true' : 'false';
    case 'name':
      return e.name;
    case 'list':
      return `[${e.items.map((x) => at(x, 1, m)).join(', ')}]`;
    case 'range':
      return `${at(e.lo, 8, m)}..${at(e.hi, 8, m)}`;
    case 'unary':
      return e.op === 'not'
        ? `not ${at(e.operand, 5, m)}`
        : `-${e.operand.type === 'unary' && e.operand.op === '-' ? print(e.operand, m) : at(e.operand, 10, m)}`;
    case 'binary': {
      const L = LEVEL_OF_BINARY[e.op];
      if (e.op === '^') return `${at(e.left, 11, m)}^${exponent(e.right, m)}`;
      if (e.op === 'implies') {
        const right = e.right.type === 'binary' && e.right.op === 'iff' ? `(${print(e.right, m)})` : at(e.right, 2, m);
        return `${at(e.left, 3, m)} implies ${right}`;
      }
      if (e.op === 'iff') return `${at(e.left, 3, m)} iff ${at(e.right, 3, m)}`;
      if (L === 6) return `${at(e.left, 7, m)} ${e.op} ${at(e.right, 7, m)}`;
      return `${at(e.left, L, m)} ${e.op} ${at(e.right, L + 1, m)}`;
    }
    case 'if':
      return `if ${at(e.cond, 1, m)} then ${at(e.then, 1, m)} else ${at(e.else, 1, m)}`;
    case 'lambda':
      return `${e.params.length === 1 ? e.params[0] : `(${e.params.join(', ')})`} -> ${at(e.body, 1, m)}`;
    case 'call':
      return `${e.callee}(${e.args.map((x) => at(x, 1, m)).join(', ')})`;
    case 'index':
      return `${at(e.target, 11, m)}[${at(e.index, 1, m)}${e.index2 ? `, ${at(e.index2, 1, m)}` : ''}]`;
    case 'comprehension': {
      const gens = e.generators.map((g) => `${g.name} in ${at(g.source, 1, m)}${g.where ? ` where ${at(g.where, 1, m)}` : ''}`).join(', ');
      if (!e.body) return `${e.reducer}(${gens})`;
      return m === 'bodyFirst' ? `${e.reducer}(${at(e.body, 1, m)} for ${gens})` : `${e.reducer}(${gens}: ${at(e.body, 1, m)})`;
    }
  }
}

/** The canonical text of a tree: comprehensions body first. */
export function printExpression(e: Expr): string {
  return print(e, 'bodyFirst');
}

/** The fixed text the conjecture hash is computed over (binder-first comprehensions); never change it. */
export function printHashForm(e: Expr): string {
  return print(e, 'binderFirst');
}
