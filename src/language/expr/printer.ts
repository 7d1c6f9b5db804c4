// Prints a tree back as source text with the fewest parentheses the grammar needs, so that
// parseExpression(printExpression(e)) is structurally equal to e (levels as in parser.ts).

import type { BinaryOp, Expr } from './ast.js';

const LEVEL_OF_BINARY: Record<BinaryOp, number> = {
  implies: 2, or: 3, and: 4,
  '==': 6, '!=': 6, '<': 6, '<=': 6, '>': 6, '>=': 6,
  '+': 8, '-': 8, '*': 9, '/': 9, '^': 10,
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

function at(e: Expr, min: number): string {
  const s = print(e);
  return level(e) < min ? `(${s})` : s;
}

/** The exponent of ^: signs, then a power or anything tighter. */
function exponent(e: Expr): string {
  if (e.type === 'unary' && e.op === '-') return '-' + exponent(e.operand);
  return at(e, 10);
}

function print(e: Expr): string {
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
      return `[${e.items.map((x) => at(x, 1)).join(', ')}]`;
    case 'range':
      return `${at(e.lo, 8)}..${at(e.hi, 8)}`;
    case 'unary':
      return e.op === 'not' ? `not ${at(e.operand, 5)}` : `-${e.operand.type === 'unary' && e.operand.op === '-' ? print(e.operand) : at(e.operand, 10)}`;
    case 'binary': {
      const L = LEVEL_OF_BINARY[e.op];
      if (e.op === '^') return `${at(e.left, 11)}^${exponent(e.right)}`;
      if (e.op === 'implies') return `${at(e.left, 3)} implies ${at(e.right, 2)}`;
      if (L === 6) return `${at(e.left, 7)} ${e.op} ${at(e.right, 7)}`;
      return `${at(e.left, L)} ${e.op} ${at(e.right, L + 1)}`;
    }
    case 'if':
      return `if ${at(e.cond, 1)} then ${at(e.then, 1)} else ${at(e.else, 1)}`;
    case 'lambda':
      return `${e.params.length === 1 ? e.params[0] : `(${e.params.join(', ')})`} -> ${at(e.body, 1)}`;
    case 'call':
      return `${e.callee}(${e.args.map((x) => at(x, 1)).join(', ')})`;
    case 'index':
      return `${at(e.target, 11)}[${at(e.index, 1)}]`;
    case 'comprehension': {
      const gens = e.generators.map((g) => `${g.name} in ${at(g.source, 1)}${g.where ? ` where ${at(g.where, 1)}` : ''}`);
      return `${e.reducer}(${gens.join(', ')}${e.body ? `: ${at(e.body, 1)}` : ''})`;
    }
  }
}

export function printExpression(e: Expr): string {
  return print(e);
}
