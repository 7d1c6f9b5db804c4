import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { InputError } from '../../../src/base/errors.js';
import {
  type Expr,
  exprEquals,
  parseDefineHeader,
  parseExpression,
  printExpression,
  printHashForm,
  REDUCERS,
  stripPositions,
  textOrigin,
} from '../../../src/language/expr/index.js';
import { errorOf } from './helpers.js';

const o = (t: string) => textOrigin('f.yaml', t);
const parse = (t: string) => parseExpression(t, o(t));
/** The tree with minimal parentheses as a reader would write them, to check grouping. */
const shape = (t: string) => printExpression(parse(t));

describe('precedence (FORMAT.md §3)', () => {
  const cases: Array<[string, string]> = [
    ['1 + 2 * 3', '1 + (2 * 3)'],
    ['-q^2', '-(q^2)'],
    ['2^3^2', '2^(3^2)'],
    ['w^-1', 'w^(-1)'],
    ['a - b - c', '(a - b) - c'],
    ['a / b * c', '(a / b) * c'],
    ['1..n-1', '1..(n - 1)'],
    ['a + 1 == b', '(a + 1) == b'],
    ['not a == b', 'not (a == b)'],
    ['not a and b', '(not a) and b'],
    ['a or b and c', 'a or (b and c)'],
    ['a or b implies c', '(a or b) implies c'],
    ['a implies b implies c', 'a implies (b implies c)'],
    ['a or b iff c and d', '(a or b) iff (c and d)'],
    ['a iff (b iff c)', 'a iff (b iff c)'],
    ['a implies (b iff c)', 'a implies (b iff c)'],
    ['if a then b else c + 1', 'if a then b else (c + 1)'],
    ['v -> v + 1', 'v -> (v + 1)'],
    ['-a * b', '(-a) * b'],
    ['L[i]^2', '(L[i])^2'],
    ['f(x)[1]', '(f(x))[1]'],
    ['a * -b', 'a * (-b)'],
    ['1..n == L', '(1..n) == L'],
  ];
  test.each(cases)('%s groups as %s', (a, b) => {
    expect(exprEquals(parse(a), parse(b))).toBe(true);
  });

  test('the printer uses the fewest parentheses', () => {
    expect(shape('(1 + (2 * 3))')).toBe('1 + 2 * 3');
    expect(shape('(-2)^2')).toBe('(-2)^2');
    expect(shape('(2^3)^2')).toBe('(2^3)^2');
    expect(shape('a - (b - c)')).toBe('a - (b - c)');
    expect(shape('sum(i in 1..n, j in i..n where gcd(i, j) == 1: 1)')).toBe('sum(1 for i in 1..n, j in i..n where gcd(i, j) == 1)');
    expect(shape('count(w in S where des(w) == 1)')).toBe('count(w in S where des(w) == 1)');
    expect(shape('(a, b) -> a')).toBe('(a, b) -> a');
  });
});

describe('comprehensions: body first (canonical) and binder first mean the same', () => {
  const same: Array<[string, string]> = [
    ['sum(q^inv(w) for w in permutations(n))', 'sum(w in permutations(n): q^inv(w))'],
    ['all(c <= 1 for c in coefficients(s))', 'all(c in coefficients(s): c <= 1)'],
    ['distribution(inv(w) for w in permutations(n))', 'distribution(w in permutations(n): inv(w))'],
    ['sum(i*j for i in 1..n, j in i..n where gcd(i, j) == 1)', 'sum(i in 1..n, j in i..n where gcd(i, j) == 1: i*j)'],
    // `for` may also separate generators
    ['sum(i*j for i in 1..n for j in i..n where gcd(i, j) == 1)', 'sum(i in 1..n, j in i..n where gcd(i, j) == 1: i*j)'],
    // the body is a whole expression: an if, a lambda, a comparison, a logical formula
    ['sum(if des(w) == 0 then 1 else q for w in S)', 'sum(w in S: if des(w) == 0 then 1 else q)'],
    ['list(v -> v + k for k in 1..3)', 'list(k in 1..3: v -> v + k)'],
    ['all(a implies b or c for a in L)', 'all(a in L: a implies b or c)'],
    // nested comprehensions, in the body and in a source
    ['sum(sum(j for j in 1..i) for i in 1..n)', 'sum(i in 1..n: sum(j in 1..i: j))'],
    ['max(x for x in list(y^2 for y in 1..n) where x > 2)', 'max(x in list(y in 1..n: y^2) where x > 2: x)'],
    // a where whose condition is an if, then another generator
    [
      'sum(1 for i in 1..n where if i > 2 then true else false, j in 1..i)',
      'sum(i in 1..n where if i > 2 then true else false, j in 1..i: 1)',
    ],
  ];
  test.each(same)('%s == %s', (a, b) => {
    expect(stripPositions(parse(a))).toEqual(stripPositions(parse(b)));
  });

  test('the printer writes body first; the hash form keeps binder first', () => {
    const e = parse('sum(i in 1..n, j in i..n where gcd(i, j) == 1: i*j)');
    expect(printExpression(e)).toBe('sum(i * j for i in 1..n, j in i..n where gcd(i, j) == 1)');
    expect(printHashForm(e)).toBe('sum(i in 1..n, j in i..n where gcd(i, j) == 1: i * j)');
    expect(printExpression(parse('count(w in S)'))).toBe('count(w in S)');
    expect(printHashForm(parse('count(w in S where P)'))).toBe('count(w in S where P)');
    expect(printExpression(parse('sum(if a then b else c for x in S)'))).toBe('sum(if a then b else c for x in S)');
  });

  test('a body-first comprehension positions its parts', () => {
    const t = 'sum(q^inv(w) for w in permutations(n) where des(w) == 1)';
    const e = parse(t);
    if (e.type !== 'comprehension') throw new Error('not a comprehension');
    expect(t.slice(e.body!.start, e.body!.end)).toBe('q^inv(w)');
    expect(t.slice(e.generators[0].start, e.generators[0].end)).toBe('w in permutations(n) where des(w) == 1');
    expect([e.start, e.end]).toEqual([0, t.length]);
  });

  test('mistakes get a hint', () => {
    expect(errorOf(() => parse('[x for x in S]')).suggestion).toMatch(/list\(E for v in S\)/);
    expect(errorOf(() => parse('f(x for x in S)')).message).toMatch(/not a comprehension/);
    expect(errorOf(() => parse('sum(x for x in S if x > 1)')).suggestion).toMatch(/where/);
    expect(errorOf(() => parse('sum(x for x in S: x)')).suggestion).toMatch(/no ":"/);
    expect(errorOf(() => parse('sum(x for 3)')).message).toMatch(/expected a generator/);
    expect(errorOf(() => parse('sum(x for y)')).suggestion).toBe('write y in S');
    expect(errorOf(() => parse('sum(x for x in S')).message).toMatch(/never closed/);
    expect(errorOf(() => parse('sum(a, b for x in S)')).suggestion).toMatch(/single body/);
    expect(errorOf(() => parse('for + 1')).message).toMatch(/the word for/);
  });
});

describe('literals', () => {
  test('big integers are exact', () => {
    const e = parse('123456789012345678901234');
    expect(e.type === 'int' && e.value).toBe(123456789012345678901234n);
    const s = parse('9007199254740991');
    expect(s.type === 'int' && s.value).toBe(9007199254740991);
  });
  test('strings with escapes', () => {
    const e = parse('"a\\"b"');
    expect(e.type === 'string' && e.value).toBe('a"b');
  });
});

describe('syntax errors carry line, column, snippet and a suggestion', () => {
  test('chained comparison', () => {
    const e = errorOf(() => parse('x + 1 < y <= z'));
    expect(e).toBeInstanceOf(InputError);
    expect(e.message).toMatch(/do not chain/);
    expect(e.suggestion).toBe('x + 1 < y and y <= z');
    expect(e.pos).toEqual({ file: 'f.yaml', line: 1, column: 1 });
  });
  test('unclosed parenthesis points at the opener', () => {
    const e = errorOf(() => parse('2 * (3 + 4'));
    expect(e.message).toMatch(/never closed/);
    expect(e.pos).toMatchObject({ line: 1, column: 5 });
    expect(e.snippet).toBe('(');
  });
  test('an extra closing parenthesis', () => {
    const e = errorOf(() => parse('(1 + 2))'));
    expect(e.message).toMatch(/no matching \(/);
    expect(e.pos).toMatchObject({ column: 8 });
  });
  test('positions on later lines and with an offset origin', () => {
    const t = 'count(w in S\n  where 1.5 < 2)';
    const e = errorOf(() => parseExpression(t, textOrigin('c.yaml', t, 7, 10)));
    expect(e.message).toMatch(/decimal/);
    expect(e.pos).toEqual({ file: 'c.yaml', line: 8, column: 9 });
    expect(e.suggestion).toMatch(/fraction/);
  });
  test('common slips', () => {
    expect(errorOf(() => parse('a = b')).suggestion).toMatch(/==/);
    expect(errorOf(() => parse('a && b')).suggestion).toBe('use and');
    expect(errorOf(() => parse("'abc'")).message).toMatch(/double quotes/);
    expect(errorOf(() => parse('2x')).suggestion).toBe('write 2*x for a product');
    expect(errorOf(() => parse('if a then b')).message).toMatch(/else/);
    expect(errorOf(() => parse('')).message).toMatch(/empty/);
    expect(errorOf(() => parse('1 +')).message).toMatch(/ends too early/);
    expect(errorOf(() => parse('f(x in L)')).suggestion).toMatch(/comprehensions are sum/);
    expect(errorOf(() => parse('1..2..3')).message).toMatch(/two ends/);
    expect(errorOf(() => parse('a iff b iff c')).suggestion).toMatch(/parentheses/);
    expect(errorOf(() => parse('a implies b iff c')).suggestion).toMatch(/parentheses/);
    expect(errorOf(() => parse('a iff b implies c')).suggestion).toMatch(/parentheses/);
    expect(errorOf(() => parse('a implies (b) iff c')).message).toMatch(/does not chain/);
    expect(errorOf(() => parse('f(a b)')).message).toMatch(/expected , or \)/);
  });
  test('deep nesting fails fast', () => {
    const t = '('.repeat(5000) + '1' + ')'.repeat(5000);
    // The depth bound refuses the text before any deep recursion (no wall-clock assertion: the
    // suite runs on loaded machines; test/bench is where times are measured).
    expect(errorOf(() => parse(t)).message).toMatch(/nested more than/);
    expect(errorOf(() => parse('-'.repeat(5000) + '1')).message).toMatch(/nested more than/);
  });
});

describe('define headers', () => {
  test('with and without parameters', () => {
    expect(parseDefineHeader('peaks(w)', o('peaks(w)'))).toEqual({ name: 'peaks', params: ['w'] });
    expect(parseDefineHeader(' f( a , b ) ', o(''))).toEqual({ name: 'f', params: ['a', 'b'] });
    expect(parseDefineHeader('c', o('c'))).toEqual({ name: 'c', params: [] });
    expect(() => parseDefineHeader('f(a, a)', o('f(a, a)'))).toThrow(/twice/);
    expect(() => parseDefineHeader('f(1)', o('f(1)'))).toThrow(InputError);
    expect(() => parseDefineHeader('f(a', o('f(a'))).toThrow(InputError);
  });
});

// ---- Round trips on generated trees ----

const KEYWORDS = new Set(['if', 'then', 'else', 'and', 'or', 'not', 'implies', 'iff', 'in', 'for', 'where', 'true', 'false']);
const ident = fc.stringMatching(/^[a-z][a-zA-Z0-9_]{0,4}$/).filter((s) => !KEYWORDS.has(s));
const P = { start: 0, end: 0 };

const exprArb: fc.Arbitrary<Expr> = fc.letrec<{ e: Expr }>((tie) => ({
  e: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    fc.oneof(
      fc.bigInt({ min: 0n, max: 10n ** 30n }).map((v) => ({ type: 'int', value: v <= 9007199254740991n ? Number(v) : v, ...P }) as Expr),
      fc.string({ maxLength: 4 }).map((value) => ({ type: 'string', value, ...P }) as Expr),
      fc.boolean().map((value) => ({ type: 'bool', value, ...P }) as Expr),
      ident.map((name) => ({ type: 'name', name, ...P }) as Expr),
    ),
    fc.array(tie('e'), { maxLength: 3 }).map((items) => ({ type: 'list', items, ...P }) as Expr),
    fc.tuple(tie('e'), tie('e')).map(([lo, hi]) => ({ type: 'range', lo, hi, ...P }) as Expr),
    fc
      .tuple(fc.constantFrom('+', '-', '*', '/', '^', '==', '!=', '<', '<=', '>', '>=', 'and', 'or', 'implies', 'iff'), tie('e'), tie('e'))
      .map(([op, left, right]) => ({ type: 'binary', op, left, right, ...P }) as Expr),
    fc.tuple(fc.constantFrom('-', 'not'), tie('e')).map(([op, operand]) => ({ type: 'unary', op, operand, ...P }) as Expr),
    fc.tuple(tie('e'), tie('e'), tie('e')).map(([cond, then, els]) => ({ type: 'if', cond, then, else: els, ...P }) as Expr),
    fc.tuple(fc.uniqueArray(ident, { maxLength: 3 }), tie('e')).map(([params, body]) => ({ type: 'lambda', params, body, ...P }) as Expr),
    fc.tuple(ident, fc.array(tie('e'), { maxLength: 3 })).map(([callee, args]) => ({ type: 'call', callee, args, ...P }) as Expr),
    fc.tuple(tie('e'), tie('e')).map(([target, index]) => ({ type: 'index', target, index, ...P }) as Expr),
    fc
      .tuple(
        fc.constantFrom(...REDUCERS),
        fc.array(fc.record({ name: ident, source: tie('e'), where: fc.option(tie('e'), { nil: undefined }) }), {
          minLength: 1,
          maxLength: 2,
        }),
        fc.option(tie('e'), { nil: undefined }),
      )
      .map(
        ([reducer, gens, body]) =>
          ({
            type: 'comprehension',
            reducer,
            body,
            ...P,
            generators: gens.map((g) => ({ ...g, ...P })),
          }) as Expr,
      ),
  ),
})).e;

describe('parse(print(e)) == e', () => {
  test('on generated trees', () => {
    fc.assert(
      fc.property(exprArb, (e) => {
        const text = printExpression(e);
        const back = parseExpression(text, o(text));
        expect(stripPositions(back)).toEqual(stripPositions(e));
      }),
      { numRuns: 1500 },
    );
  });
  test('on generated trees, through the binder-first hash form', () => {
    fc.assert(
      fc.property(exprArb, (e) => {
        const text = printHashForm(e);
        expect(stripPositions(parseExpression(text, o(text)))).toEqual(stripPositions(e));
      }),
      { numRuns: 500 },
    );
  });
  test('print is stable: print(parse(print(e))) == print(e)', () => {
    fc.assert(
      fc.property(exprArb, (e) => {
        const text = printExpression(e);
        expect(printExpression(parseExpression(text, o(text)))).toBe(text);
      }),
      { numRuns: 300 },
    );
  });
  test('node positions cover their text', () => {
    const t = 'sum(i in 1..n: i^2) + w[3]';
    const e = parse(t);
    expect(e.type).toBe('binary');
    if (e.type === 'binary') {
      expect(t.slice(e.left.start, e.left.end)).toBe('sum(i in 1..n: i^2)');
      expect(t.slice(e.right.start, e.right.end)).toBe('w[3]');
    }
  });
});
