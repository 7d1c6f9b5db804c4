// Recursive-descent parser for FORMAT.md §3. Precedence, lowest first:
//   1  if C then A else B,  v -> E,  (a, b) -> E
//   2  A implies B, A iff B (implies right-associative; iff does not chain; operands are `or` chains)
//   3  A or B
//   4  A and B
//   5  not A
//   6  == != < <= > >=     (no chaining)
//   7  a..b                 (operands are sums; no chaining)
//   8  + -
//   9  * /  and unary -     (-q^2 is -(q^2))
//  10  ^                    (right-associative; the exponent may carry signs: w^-1)
//  11  calls f(a, b), comprehensions, indexing L[i], ( ), [ ]
// Implies sits just below `or` so that `a or b implies c` reads (a or b) implies c.
//
// Comprehensions come in two spellings of the same tree (FORMAT.md §3 "Comprehensions"):
//   body first (canonical):  sum(E for i in S where C, j in T)   (`for` may also separate generators)
//   binder first:            sum(i in S where C, j in T: E)      count(w in S where C) has no body
// In the body-first form the body is a full expression (an if, a lambda): `for` is a keyword and no
// operator, so the body ends where `for` starts; a generator's source ends at `where`, `,`, `for`
// or `)`; `in` appears only right after a generator's variable, so a body never contains one
// outside its own parentheses (a nested comprehension).

import { InputError } from '../../base/errors.js';
import { parseInt10 } from '../../numbers/integer.js';
import {
  type BinaryOp,
  type CompareOp,
  type Expr,
  type Generator,
  type Origin,
  type Reducer,
  type SourceText,
  isReducer,
  REDUCERS,
} from './ast.js';
import { tokenize, type Token } from './lexer.js';
import { inputError } from './origin.js';

/** Deeper nesting than this is refused at once (it is never written by hand). */
export const MAX_NESTING = 200;

/**
 * A syntax tree deeper than this is refused after parsing. Nesting is bounded by MAX_NESTING, but
 * a chain such as 1 + 1 + ... + 1 or L[1][1]...[1] is parsed in a loop and makes a tree one level
 * deeper per operator; compiling and evaluating such a tree recurse once per level, so without
 * this bound a few thousand operators in a row would overflow the stack.
 */
export const MAX_DEPTH = 1000;

type NoSrc<E> = E extends unknown ? Omit<E, 'src'> : never;

const COMPARE_OPS = new Set(['==', '!=', '<', '<=', '>', '>=']);

class Parser {
  private i = 0;
  private depth = 0;

  constructor(
    private readonly src: SourceText,
    private readonly toks: Token[],
  ) {}

  private get tok(): Token {
    return this.toks[this.i];
  }

  private peek(k = 1): Token {
    return this.toks[Math.min(this.i + k, this.toks.length - 1)];
  }

  private is(text: string): boolean {
    const t = this.tok;
    return (t.kind === 'op' || t.kind === 'keyword') && t.text === text;
  }

  private next(): Token {
    const t = this.tok;
    if (t.kind !== 'eof') this.i++;
    return t;
  }

  private err(message: string, t: Token = this.tok, suggestion?: string): InputError {
    return inputError(message, this.src, t.start, t.end, suggestion);
  }

  private describe(t: Token): string {
    if (t.kind === 'eof') return 'the end of the expression';
    if (t.kind === 'string') return `the string ${JSON.stringify(t.text)}`;
    return `"${t.text}"`;
  }

  private expect(text: string, what: string, opener?: Token): Token {
    if (this.is(text)) return this.next();
    if (opener && this.tok.kind === 'eof') {
      throw inputError(`${opener.text} is never closed: expected ${text} ${what}`, this.src, opener.start, opener.end, `add ${text}`);
    }
    throw this.err(`expected ${text} ${what}, found ${this.describe(this.tok)}`);
  }

  private node(e: NoSrc<Expr>): Expr {
    (e as Expr).src = this.src;
    return e as Expr;
  }

  private enter(): void {
    if (++this.depth > MAX_NESTING) throw this.err(`the expression is nested more than ${MAX_NESTING} levels deep`);
  }

  parseAll(): Expr {
    if (this.tok.kind === 'eof') throw this.err('the expression is empty');
    const e = this.expr();
    const t: Token = this.toks[this.i];
    if (t.kind !== 'eof') {
      if (t.text === ')' || t.text === ']') throw this.err(`this ${t.text} has no matching ${t.text === ')' ? '(' : '['}`);
      throw this.err(
        `unexpected ${this.describe(t)} after a complete expression`,
        t,
        t.kind === 'name' || t.kind === 'int' ? 'an operator such as * or a comma may be missing' : undefined,
      );
    }
    return e;
  }

  // Level 1.
  expr(): Expr {
    this.enter();
    try {
      const t = this.tok;
      if (t.kind === 'keyword' && t.text === 'if') {
        this.next();
        const cond = this.expr();
        this.expect('then', 'after the condition of if', t);
        const then = this.expr();
        this.expect('else', 'after then ... (an if needs an else)', t);
        const els = this.expr();
        return this.node({ type: 'if', cond, then, else: els, start: t.start, end: els.end });
      }
      if (t.kind === 'name' && this.peek().text === '->' && this.peek().kind === 'op') {
        this.next();
        this.next();
        const body = this.expr();
        return this.node({ type: 'lambda', params: [t.text], body, start: t.start, end: body.end });
      }
      if (this.is('(') && this.lambdaParamsAhead()) {
        this.next();
        const params: string[] = [];
        while (!this.is(')')) {
          const p = this.next();
          if (params.includes(p.text)) throw this.err(`the parameter ${p.text} appears twice`, p);
          params.push(p.text);
          if (this.is(',')) this.next();
        }
        this.next();
        this.next(); // ->
        const body = this.expr();
        return this.node({ type: 'lambda', params, body, start: t.start, end: body.end });
      }
      return this.implication();
    } finally {
      this.depth--;
    }
  }

  /** At '(' : is this `(a, b) -> ...`? */
  private lambdaParamsAhead(): boolean {
    let k = 1;
    if (this.peek(k).text === ')' && this.peek(k).kind === 'op') return this.peek(k + 1).text === '->';
    for (;;) {
      if (this.peek(k).kind !== 'name') return false;
      k++;
      const t = this.peek(k);
      if (t.kind === 'op' && t.text === ')') return this.peek(k + 1).kind === 'op' && this.peek(k + 1).text === '->';
      if (!(t.kind === 'op' && t.text === ',')) return false;
      k++;
    }
  }

  // Level 2.
  private implication(): Expr {
    const left = this.disjunction();
    if (this.is('iff')) {
      const op = this.next();
      const right = this.disjunction();
      if (this.is('iff') || this.is('implies')) {
        throw this.err(
          `${op.text} does not chain with ${this.tok.text}`,
          this.tok,
          'add parentheses: (A iff B) iff C, or A iff (B implies C)',
        );
      }
      return this.node({ type: 'binary', op: 'iff', left, right, start: left.start, end: right.end });
    }
    if (this.is('implies')) {
      this.next();
      this.enter();
      try {
        const right = this.implication();
        if (right.type === 'binary' && right.op === 'iff' && !this.parenthesized(right)) {
          throw inputError(
            'implies does not chain with iff',
            this.src,
            right.start,
            right.end,
            'add parentheses: A implies (B iff C), or (A implies B) iff C',
          );
        }
        return this.node({ type: 'binary', op: 'implies', left, right, start: left.start, end: right.end });
      } finally {
        this.depth--;
      }
    }
    return left;
  }

  /** Nodes written inside their own parentheses (a tree does not keep them otherwise). */
  private readonly grouped = new Set<Expr>();

  private parenthesized(e: Expr): boolean {
    return this.grouped.has(e);
  }

  private leftAssoc(ops: string[], operand: () => Expr): Expr {
    let left = operand();
    while (ops.includes(this.tok.text) && (this.tok.kind === 'op' || this.tok.kind === 'keyword')) {
      const op = this.next().text as BinaryOp;
      const right = operand();
      left = this.node({ type: 'binary', op, left, right, start: left.start, end: right.end });
    }
    return left;
  }

  // Levels 3, 4.
  private disjunction(): Expr {
    return this.leftAssoc(['or'], () => this.conjunction());
  }

  private conjunction(): Expr {
    return this.leftAssoc(['and'], () => this.negation());
  }

  // Level 5.
  private negation(): Expr {
    if (this.is('not')) {
      const t = this.next();
      this.enter();
      try {
        const operand = this.negation();
        return this.node({ type: 'unary', op: 'not', operand, start: t.start, end: operand.end });
      } finally {
        this.depth--;
      }
    }
    return this.comparison();
  }

  // Level 6.
  private comparison(): Expr {
    const left = this.range();
    if (this.tok.kind === 'op' && COMPARE_OPS.has(this.tok.text)) {
      const op = this.next().text as CompareOp;
      const right = this.range();
      if (this.tok.kind === 'op' && COMPARE_OPS.has(this.tok.text)) {
        const op2 = this.tok.text;
        const third = (() => {
          this.next();
          return this.range();
        })();
        const text = (e: Expr) => this.src.text.slice(e.start, e.end);
        throw inputError(
          'comparisons do not chain',
          this.src,
          left.start,
          third.end,
          `${text(left)} ${op} ${text(right)} and ${text(right)} ${op2} ${text(third)}`,
        );
      }
      return this.node({ type: 'binary', op, left, right, start: left.start, end: right.end });
    }
    return left;
  }

  // Level 7.
  private range(): Expr {
    const lo = this.additive();
    if (this.is('..')) {
      this.next();
      const hi = this.additive();
      if (this.is('..')) throw this.err('a range a..b has two ends; .. cannot follow a range');
      return this.node({ type: 'range', lo, hi, start: lo.start, end: hi.end });
    }
    return lo;
  }

  // Level 8.
  private additive(): Expr {
    return this.leftAssoc(['+', '-'], () => this.multiplicative());
  }

  // Level 9.
  private multiplicative(): Expr {
    return this.leftAssoc(['*', '/'], () => this.unary());
  }

  private unary(): Expr {
    if (this.is('-')) {
      const t = this.next();
      this.enter();
      try {
        const operand = this.unary();
        return this.node({ type: 'unary', op: '-', operand, start: t.start, end: operand.end });
      } finally {
        this.depth--;
      }
    }
    return this.power();
  }

  // Level 10.
  private power(): Expr {
    const base = this.postfix();
    if (this.is('^')) {
      this.next();
      const exponent = this.exponent();
      return this.node({ type: 'binary', op: '^', left: base, right: exponent, start: base.start, end: exponent.end });
    }
    return base;
  }

  private exponent(): Expr {
    this.enter();
    try {
      if (this.is('-')) {
        const t = this.next();
        const operand = this.exponent();
        return this.node({ type: 'unary', op: '-', operand, start: t.start, end: operand.end });
      }
      return this.power();
    } finally {
      this.depth--;
    }
  }

  // Level 11.
  private postfix(): Expr {
    let e = this.primary();
    while (this.is('[')) {
      const open = this.next();
      this.enter();
      const index = this.expr();
      // A second index, z[i, j], names a doubly indexed indeterminate (the compiler checks).
      let index2: Expr | undefined;
      if (this.is(',')) {
        this.next();
        index2 = this.expr();
      }
      this.depth--;
      const close = this.expect(']', 'to close the index', open);
      e = this.node(
        index2
          ? { type: 'index', target: e, index, index2, start: e.start, end: close.end }
          : { type: 'index', target: e, index, start: e.start, end: close.end },
      );
    }
    return e;
  }

  private primary(): Expr {
    const t = this.tok;
    switch (t.kind) {
      case 'int':
        this.next();
        return this.node({ type: 'int', value: parseInt10(t.text), start: t.start, end: t.end });
      case 'string':
        this.next();
        return this.node({ type: 'string', value: t.text, start: t.start, end: t.end });
      case 'name':
        this.next();
        if (this.is('(')) return this.call(t);
        return this.node({ type: 'name', name: t.text, start: t.start, end: t.end });
      case 'keyword':
        if (t.text === 'true' || t.text === 'false') {
          this.next();
          return this.node({ type: 'bool', value: t.text === 'true', start: t.start, end: t.end });
        }
        if (t.text === 'if') return this.expr();
        throw this.err(
          `expected a value, found the word ${t.text}`,
          t,
          t.text === 'in' ? 'a generator "v in S" is written inside sum(...), count(...), all(...) and the like' : undefined,
        );
      case 'op':
        if (t.text === '(') {
          this.next();
          this.enter();
          const e = this.expr();
          this.depth--;
          this.expect(')', 'to close the parenthesis', t);
          this.grouped.add(e);
          return e;
        }
        if (t.text === '[') {
          this.next();
          this.enter();
          const items = this.commaList(']', t);
          this.depth--;
          const close = this.next();
          return this.node({ type: 'list', items, start: t.start, end: close.end });
        }
        if (t.text === ')' || t.text === ']') throw this.err(`this ${t.text} has no matching ${t.text === ')' ? '(' : '['}`);
        throw this.err(`expected a value, found ${this.describe(t)}`);
      case 'eof':
        throw this.err('the expression ends too early: a value is missing');
    }
  }

  /** Items up to (not including) the closer, separated by commas. */
  private commaList(closer: string, opener: Token, first?: Expr): Expr[] {
    const items: Expr[] = [];
    if (first === undefined && this.is(closer)) return items;
    for (;;) {
      items.push(first ?? this.expr());
      first = undefined;
      if (this.is(',')) {
        this.next();
        continue;
      }
      if (this.is(closer)) return items;
      if (this.tok.kind === 'eof') {
        throw inputError(`${opener.text} is never closed: expected ${closer}`, this.src, opener.start, opener.end, `add ${closer}`);
      }
      const hint = !this.is('for')
        ? undefined
        : closer === ']'
          ? 'a list comprehension is written list(E for v in S)'
          : 'a comprehension has a single body before for, as in sum(E for v in S)';
      throw this.err(`expected , or ${closer}, found ${this.describe(this.tok)}`, this.tok, hint);
    }
  }

  private generatorAhead(): boolean {
    return this.tok.kind === 'name' && this.peek().kind === 'keyword' && this.peek().text === 'in';
  }

  private call(name: Token): Expr {
    const open = this.next();
    this.enter();
    try {
      if (this.generatorAhead()) return this.binderFirst(name, open);
      if (this.is(')')) {
        const close = this.next();
        return this.node({ type: 'call', callee: name.text, args: [], start: name.start, end: close.end });
      }
      const first = this.expr();
      if (this.is('for')) return this.bodyFirst(name, open, first);
      const args = this.commaList(')', open, first);
      const close = this.next();
      return this.node({ type: 'call', callee: name.text, args, start: name.start, end: close.end });
    } finally {
      this.depth--;
    }
  }

  private requireReducer(name: Token, form: string): void {
    if (!isReducer(name.text)) {
      throw this.err(`${name.text}(${form}) is not a comprehension`, name, `comprehensions are ${REDUCERS.join(', ')}`);
    }
  }

  /** One generator `v in S` with its optional `where C`. */
  private generator(): Generator {
    if (!this.generatorAhead()) {
      throw this.err(
        `expected a generator "v in S", found ${this.describe(this.tok)}`,
        this.tok,
        this.tok.kind === 'name' ? `write ${this.tok.text} in S` : undefined,
      );
    }
    const v = this.next();
    this.next(); // in
    const source = this.expr();
    let where: Expr | undefined;
    if (this.is('where')) {
      this.next();
      where = this.expr();
    }
    if (this.is('if')) throw this.err('a filter on a generator is written with where, not if', this.tok, 'v in S where C');
    return { name: v.text, source, where, start: v.start, end: (where ?? source).end };
  }

  private close(name: Token, open: Token, expected: string): Token {
    if (this.is(')')) return this.next();
    if (this.tok.kind === 'eof') throw inputError(`( is never closed: expected )`, this.src, open.start, open.end, 'add )');
    const hint = this.is(':') ? 'the body-first form puts the body before for and has no ":"' : undefined;
    throw this.err(`expected ${expected} in ${name.text}(...), found ${this.describe(this.tok)}`, this.tok, hint);
  }

  /** sum(E for i in S where C, j in T): the body was parsed as the call's first argument. */
  private bodyFirst(name: Token, open: Token, body: Expr): Expr {
    this.requireReducer(name, '... for v in S');
    this.next(); // for
    const generators: Generator[] = [this.generator()];
    while (this.is(',') || this.is('for')) {
      this.next();
      generators.push(this.generator());
    }
    const close = this.close(name, open, 'where, a comma, for or )');
    return this.node({ type: 'comprehension', reducer: name.text as Reducer, generators, body, start: name.start, end: close.end });
  }

  /** sum(i in S where C, j in T: E), and count(w in S where C) without a body. */
  private binderFirst(name: Token, open: Token): Expr {
    this.requireReducer(name, 'v in ...');
    const generators: Generator[] = [this.generator()];
    while (this.is(',')) {
      this.next();
      generators.push(this.generator());
    }
    let body: Expr | undefined;
    if (this.is(':')) {
      this.next();
      body = this.expr();
    }
    const close = this.close(name, open, 'where, a comma, : or )');
    return this.node({ type: 'comprehension', reducer: name.text as Reducer, generators, body, start: name.start, end: close.end });
  }
}

/** The children of a node, in no particular order. */
export function children(e: Expr): Expr[] {
  switch (e.type) {
    case 'int':
    case 'string':
    case 'bool':
    case 'name':
      return [];
    case 'list':
      return e.items;
    case 'range':
      return [e.lo, e.hi];
    case 'binary':
      return [e.left, e.right];
    case 'unary':
      return [e.operand];
    case 'if':
      return [e.cond, e.then, e.else];
    case 'lambda':
      return [e.body];
    case 'call':
      return e.args;
    case 'index':
      return e.index2 ? [e.target, e.index, e.index2] : [e.target, e.index];
    case 'comprehension': {
      const out: Expr[] = [];
      for (const g of e.generators) out.push(g.source, ...(g.where ? [g.where] : []));
      if (e.body) out.push(e.body);
      return out;
    }
  }
}

/** Refuse a tree deeper than MAX_DEPTH (walked with an explicit stack, so the check itself cannot overflow). */
function checkDepth(root: Expr, src: SourceText): void {
  const stack: Array<[Expr, number]> = [[root, 1]];
  while (stack.length) {
    const [e, d] = stack.pop()!;
    if (d > MAX_DEPTH) {
      throw inputError(
        `the expression is nested more than ${MAX_DEPTH} levels deep (each operator of a chain such as a + b + c, ` +
          'and each index of L[i][j], counts as a level)',
        src,
        root.start,
        root.end,
        'split it into parts with let:',
      );
    }
    for (const c of children(e)) stack.push([c, d + 1]);
  }
}

/** Parse one expression. Throws InputError (with pos, snippet, suggestion) on bad syntax. */
export function parseExpression(text: string, origin: Origin): Expr {
  const src: SourceText = { text, origin };
  const e = new Parser(src, tokenize(src)).parseAll();
  checkDepth(e, src);
  return e;
}

const DEFINE_HEADER = /^\s*([A-Za-z_][A-Za-z0-9_]*)\s*(?:\(\s*([^)]*)\))?\s*$/;
const IDENT = /^[A-Za-z_][A-Za-z0-9_]*$/;

/** `peaks(w)`, `f(a, b)`, or a bare `c` (a constant): the key of a `define:` entry. */
export function parseDefineHeader(header: string, origin: Origin): { name: string; params: string[] } {
  const src: SourceText = { text: header, origin };
  const m = DEFINE_HEADER.exec(header);
  if (!m)
    throw inputError(
      `${JSON.stringify(header)} is not a definition header`,
      src,
      0,
      header.length,
      'write name(param, ...), e.g. peaks(w)',
    );
  const params = m[2] === undefined || m[2].trim() === '' ? [] : m[2].split(',').map((p) => p.trim());
  for (const p of params) {
    if (!IDENT.test(p)) {
      const at = header.indexOf(p);
      throw inputError(`${JSON.stringify(p)} is not a parameter name`, src, Math.max(0, at), Math.max(0, at) + p.length);
    }
  }
  const seen = new Set<string>();
  for (const p of params) {
    if (seen.has(p))
      throw inputError(`the parameter ${p} appears twice in ${header.trim()}`, src, header.indexOf(p), header.indexOf(p) + p.length);
    seen.add(p);
  }
  return { name: m[1], params };
}
