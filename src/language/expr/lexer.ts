// The tokens of an expression. Offsets are into the expression's text; the parser turns them
// into file positions through the source's Origin.

import type { SourceText } from './ast.js';
import { inputError } from './origin.js';

export type TokenKind = 'int' | 'string' | 'name' | 'keyword' | 'op' | 'eof';

export interface Token {
  kind: TokenKind;
  /** The token's text; for strings the decoded value. */
  text: string;
  start: number;
  end: number;
}

export const KEYWORDS = new Set(['if', 'then', 'else', 'and', 'or', 'not', 'implies', 'iff', 'in', 'for', 'where', 'true', 'false']);

// Longest first, so that '..' wins over '.', '<=' over '<', '->' over '-'.
const OPERATORS = ['..', '->', '==', '!=', '<=', '>=', '(', ')', '[', ']', ',', ':', '+', '-', '*', '/', '^', '<', '>'];

/** Likely slips from other notations, with what to write instead. */
const MISTAKES: Record<string, string> = {
  '=': 'use == to compare (a single = is not an operator)',
  '!': 'use not',
  '&&': 'use and',
  '||': 'use or',
  '**': 'use ^ for powers',
  '%': 'use mod(a, b)',
  '=>': 'use implies, or -> for a function',
  '{': 'use [ ] for lists',
  '}': 'use [ ] for lists',
};

export function tokenize(src: SourceText): Token[] {
  const text = src.text;
  const tokens: Token[] = [];
  let i = 0;
  const n = text.length;
  while (i < n) {
    const c = text[i];
    if (c === ' ' || c === '\t' || c === '\n' || c === '\r') {
      i++;
      continue;
    }
    const start = i;
    if (c >= '0' && c <= '9') {
      while (i < n && text[i] >= '0' && text[i] <= '9') i++;
      if (text[i] === '.' && text[i + 1] >= '0' && text[i + 1] <= '9') {
        let j = i + 1;
        while (j < n && text[j] >= '0' && text[j] <= '9') j++;
        throw inputError(
          `${text.slice(start, j)} is a decimal number; the language has only exact numbers`,
          src,
          start,
          j,
          'write a fraction such as 3/2',
        );
      }
      if (/[A-Za-z_]/.test(text[i] ?? '')) {
        let j = i;
        while (j < n && /[A-Za-z0-9_]/.test(text[j])) j++;
        throw inputError(
          `${text.slice(start, j)} is not a number or a name`,
          src,
          start,
          j,
          `write ${text.slice(start, i)}*${text.slice(i, j)} for a product`,
        );
      }
      tokens.push({ kind: 'int', text: text.slice(start, i), start, end: i });
      continue;
    }
    if (/[A-Za-z_]/.test(c)) {
      while (i < n && /[A-Za-z0-9_]/.test(text[i])) i++;
      const word = text.slice(start, i);
      tokens.push({ kind: KEYWORDS.has(word) ? 'keyword' : 'name', text: word, start, end: i });
      continue;
    }
    if (c === '"') {
      i++;
      while (i < n && text[i] !== '"' && text[i] !== '\n') i += text[i] === '\\' ? 2 : 1;
      if (text[i] !== '"') throw inputError('this string is not closed (a " is missing)', src, start, i);
      i++;
      let value: string;
      try {
        value = JSON.parse(text.slice(start, i)) as string;
      } catch {
        throw inputError('this string has an invalid escape (use \\" \\\\ \\n or \\uXXXX)', src, start, i);
      }
      tokens.push({ kind: 'string', text: value, start, end: i });
      continue;
    }
    const two = text.slice(i, i + 2);
    if (MISTAKES[two] && !OPERATORS.includes(two)) throw inputError(`${two} is not an operator`, src, i, i + 2, MISTAKES[two]);
    const op = OPERATORS.find((o) => text.startsWith(o, i));
    if (op) {
      i += op.length;
      tokens.push({ kind: 'op', text: op, start, end: i });
      continue;
    }
    if (MISTAKES[c]) throw inputError(`${c} is not an operator`, src, i, i + 1, MISTAKES[c]);
    if (c === "'") throw inputError('strings use double quotes', src, i, i + 1, 'write "..." instead of \'...\'');
    if (c === '.') throw inputError('a single . is not an operator', src, i, i + 1, 'write a..b for a range');
    throw inputError(`unexpected character ${JSON.stringify(c)}`, src, i, i + 1);
  }
  tokens.push({ kind: 'eof', text: '', start: n, end: n });
  return tokens;
}
