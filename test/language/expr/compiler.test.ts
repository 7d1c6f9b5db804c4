import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { EvalError, InputError } from '../../../src/base/errors.js';
import {
  Compiler,
  MAX_CALL_DEPTH,
  parseDefineHeader,
  parseExpression,
  textOrigin,
  type DefineDecl,
} from '../../../src/language/expr/index.js';
import { Distribution } from '../../../src/values/distribution.js';
import { Lambda } from '../../../src/values/lambda.js';
import { valueToText } from '../../../src/values/operations.js';
import type { Value } from '../../../src/values/value.js';
import { errorOf, ev, show } from './helpers.js';

describe('exact arithmetic through the language', () => {
  test('rationals are normalised and integers stay integers', () => {
    expect(ev('2 == 4/2')).toBe(true);
    expect(ev('4/2')).toBe(2);
    expect(show('6/4')).toBe('3/2');
    expect(show('1/3 + 1/6')).toBe('1/2');
    expect(ev('1/3 + 2/3')).toBe(1);
    expect(show('-6/4')).toBe('-3/2');
    expect(show('2^-2')).toBe('1/4');
    expect(show('(2/3)^-2')).toBe('9/4');
    expect(ev('0 * -5')).toBe(0);
    expect(Object.is(ev('0 * -5'), -0)).toBe(false);
  });
  test('big integers are exact and promote/demote across 2^53', () => {
    expect(show('123456789012345678901234 * 10')).toBe('1234567890123456789012340');
    expect(ev('9007199254740991 + 1 - 1')).toBe(9007199254740991);
    expect(show('2^64')).toBe('18446744073709551616');
    expect(ev('2^64 / 2^60')).toBe(16);
    expect(ev('2^100 == 2^50 * 2^50')).toBe(true);
    expect(ev('-(2^53) < 2^53')).toBe(true);
  });
  test('polynomials: expanded, constants are numbers', () => {
    expect(ev('q^2 - 1 == (q-1)*(q+1)')).toBe(true);
    expect(ev('(q + 1)^2 - q^2 - 2*q')).toBe(1);
    expect(ev('q - q')).toBe(0);
    expect(ev('(q^2 - 1) / (q - 1) == q + 1')).toBe(true);
    expect(ev('sum(x[i] for i in 1..3) == x[1] + x[2] + x[3]')).toBe(true);
    expect(ev('x[2] == x[1+1]')).toBe(true);
    // A quotient that is no polynomial is a rational function in lowest terms.
    expect(valueToText(ev('q / (q + 1)'))).toBe('q/(q + 1)');
  });
  test('laws hold on random integers (fast-check)', () => {
    fc.assert(
      fc.property(fc.bigInt({ min: -(10n ** 20n), max: 10n ** 20n }), fc.bigInt({ min: -(10n ** 20n), max: 10n ** 20n }), (a, b) => {
        const lets: Array<[string, string]> = [
          ['a', `${a}`.replace(/^-/, '0-')],
          ['b', `${b}`.replace(/^-/, '0-')],
        ];
        expect(ev('(a + b) * (a - b) == a^2 - b^2', lets)).toBe(true);
        expect(valueToText(ev('a * b', lets))).toBe(`${a * b}`);
        if (b !== 0n) expect(ev('(a / b) * b == a', lets)).toBe(true);
      }),
      { numRuns: 200 },
    );
  });
});

describe('permutations: * composes, ^ powers, ^-1 inverts', () => {
  const lets: Array<[string, string]> = [
    ['u', 't_perm([2, 3, 1, 4])'],
    ['v', 't_perm([1, 4, 2, 3])'],
  ];
  test('(u*v)[i] == u[v[i]]', () => {
    expect(ev('all((u*v)[i] == u[v[i]] for i in 1..4)', lets)).toBe(true);
    expect(show('u*v', lets)).toBe('perm([2, 4, 3, 1])');
  });
  test('powers and inverses', () => {
    expect(ev('u^3 == t_perm([1, 2, 3, 4])', lets)).toBe(true);
    expect(ev('u^-1 == t_inverse(u)', lets)).toBe(true);
    expect(ev('u^-1 * u == u^0', lets)).toBe(true);
    expect(ev('(u*v)^-1 == v^-1 * u^-1', lets)).toBe(true);
    expect(ev('u^5 == u^2', lets)).toBe(true);
  });
  test('indexing is 1-based with a clear error', () => {
    expect(ev('u[1]', lets)).toBe(2);
    expect(errorOf(() => ev('u[5]', lets)).message).toMatch(/out of range: .* indices 1\.\.4/);
    expect(errorOf(() => ev('[1, 2][0]')).message).toBe('index 0 is out of range: the list has indices 1..2');
  });
});

describe('comprehensions', () => {
  test('every reducer', () => {
    expect(ev('sum(i^2 for i in 1..10)')).toBe(385); // 10*11*21/6
    expect(ev('product(i for i in 1..5)')).toBe(120);
    expect(ev('count(w in permutations(4))')).toBe(24); // 4!, OEIS A000142
    expect(ev('count(w in permutations(4) where t_inv(w) == 1)')).toBe(3); // Mahonian T(4,1), OEIS A008302
    expect(ev('count(t_inv(w) == 2 for w in permutations(4))')).toBe(5); // Mahonian T(4,2), OEIS A008302
    expect(ev('all(i > 0 for i in 1..5)')).toBe(true);
    expect(ev('any(i > 5 for i in 1..5)')).toBe(false);
    expect(ev('min((i - 3)^2 for i in 1..5)')).toBe(0);
    expect(ev('max(t_inv(w) for w in permutations(4))')).toBe(6);
    expect(show('list(i * 2 for i in 1..3)')).toBe('[2, 4, 6]');
    expect(show('set(t_mod(i, 3) for i in 1..6)')).toBe('[0, 1, 2]');
    expect(show('concat(1..i for i in 1..3)')).toBe('[1, 1, 2, 1, 2, 3]');
    const d = ev('distribution(t_inv(w) for w in permutations(3))') as Distribution;
    expect(d).toBeInstanceOf(Distribution);
    expect(d.toText()).toBe('distributionOf([[0, 1], [1, 2], [2, 2], [3, 1]])'); // Mahonian row n=3, OEIS A008302
  });
  test('several generators and where clauses', () => {
    // Pairs 1 <= i <= j <= 6 with gcd 1: sum_{j<=6} phi(j), with (1,1): 1+1+2+2+4+2 = 12 (OEIS A002088).
    expect(ev('sum(1 for i in 1..6, j in i..6 where t_mod(j, i) == 0 implies i == 1 or i == j)')).toBe(
      ev('count(i in 1..6, j in i..6 where t_mod(j, i) != 0 or i == 1 or i == j)'),
    );
    expect(show('list([i, j] for i in 1..3 where i != 2, j in 1..i)')).toBe('[[1, 1], [3, 1], [3, 2], [3, 3]]');
  });
  test('sources: ranges, lists, families, distributions', () => {
    expect(ev('sum(v for v in [3, 4, 5])')).toBe(12);
    expect(ev('sum(i for i in 1..0)')).toBe(0);
    expect(ev('product(i for i in 1..0)')).toBe(1);
    expect(show('list(v for v in distribution([2, 1, 2]))')).toBe('[1, 2]');
    expect(errorOf(() => ev('sum(i for i in 5)')).suggestion).toBe('1..5');
  });
  test('equidistribution: inv on S_4 equals a Mahonian row', () => {
    // OEIS A008302 row n=4: 1, 3, 5, 6, 5, 3, 1.
    expect(
      ev(
        'distribution(t_inv(w) for w in permutations(4)) == distribution(concat([[0], [1,1,1], [2,2,2,2,2], [3,3,3,3,3,3], [4,4,4,4,4], [5,5,5], [6]]))',
      ),
    ).toBe(true);
    expect(ev('distribution([1, 2]) == distribution([2, 1])')).toBe(true);
    expect(ev('distribution([1, 2]) == distribution([2, 2])')).toBe(false);
  });
  test('plain-list forms reduce the list', () => {
    expect(ev('sum([1, 2, 3])')).toBe(6);
    expect(ev('max([3, 1, 2])')).toBe(3);
    expect(ev('min(3, 1, 2)')).toBe(1);
    expect(ev('count([5, 6, 7])')).toBe(3);
    expect(ev('count(permutations(10))')).toBe(3628800); // 10!, OEIS A000142, without enumerating
    expect(ev('all([true, true])')).toBe(true);
    expect(show('set(["b", "a", "b"])')).toBe('["a", "b"]');
    expect(show('list(permutations(2))')).toBe('[perm([1, 2]), perm([2, 1])]');
    expect(ev('sum(1..100)')).toBe(5050);
  });
  test("kept objects are copies, not the enumerator's transient object", () => {
    expect(show('list(w for w in permutations(3))')).toBe(
      '[perm([1, 2, 3]), perm([1, 3, 2]), perm([2, 1, 3]), perm([2, 3, 1]), perm([3, 1, 2]), perm([3, 2, 1])]',
    );
    expect(show('max([t_inv(w), w] for w in permutations(3))')).toBe('[3, perm([3, 2, 1])]');
    expect(show('set(w^2 for w in permutations(3))')).toBe('[perm([1, 2, 3]), perm([2, 3, 1]), perm([3, 1, 2])]');
  });
  test('all/any stop early', () => {
    expect(ev('any(i == 3 for i in 1..1000000000)')).toBe(true);
    expect(ev('all(t_inv(w) == 0 for w in permutations(12))')).toBe(false);
  });
  test('an empty min or max names the comprehension', () => {
    const e = errorOf(() => ev('1 + min(i for i in 1..0)'));
    expect(e).toBeInstanceOf(EvalError);
    expect(e.message).toBe('min of nothing: min(i for i in 1..0) has no elements');
    expect(e.pos).toMatchObject({ line: 1, column: 5 });
  });
  test('several generators need a body except for count', () => {
    expect(() => ev('sum(i in 1..2, j in 1..2)')).toThrow(/needs a body/);
    expect(errorOf(() => ev('sum(i in 1..2, j in 1..2)')).suggestion).toBe('sum(E for i in ..., j in ...)');
    expect(ev('count(i in 1..2, j in 1..3)')).toBe(6);
  });
});

describe('conditionals, logic, strings', () => {
  test('if/then/else and short-circuit', () => {
    expect(ev('if 1 < 2 then "a" else "b"')).toBe('a');
    expect(ev('false and 1/0 == 1')).toBe(false);
    expect(ev('true or 1/0 == 1')).toBe(true);
    expect(ev('false implies 1/0 == 1')).toBe(true);
    // iff: both sides are evaluated; the truth table
    expect([ev('true iff true'), ev('true iff false'), ev('false iff true'), ev('false iff false')]).toEqual([true, false, false, true]);
    expect(ev('all((t_mod(n, 2) == 0) iff (t_mod(n*n, 2) == 0) for n in 1..20)')).toBe(true);
    expect(errorOf(() => ev('1 iff true')).message).toMatch(/left side of iff must be true or false/);
    expect(ev('not (1 == 2)')).toBe(true);
    expect(ev('"abc"[2]')).toBe('b');
  });
  test('booleans are required', () => {
    expect(errorOf(() => ev('1 and true')).message).toMatch(/left side of and must be true or false, but this is an integer/);
    expect(errorOf(() => ev('if t_any(1) then 1 else 2')).message).toMatch(/condition of if must be true or false, got an integer/);
  });
});

describe('names and load-time checks', () => {
  test('unknown names suggest the nearest one, with position', () => {
    const e = errorOf(() => ev('count(w in permutations(3) where t_iv(w) == 0)'));
    expect(e).toBeInstanceOf(InputError);
    expect(e.message).toBe('unknown function t_iv; did you mean t_inv?');
    expect(e.suggestion).toBe('t_inv');
    expect(e.pos).toMatchObject({ line: 1, column: 34 });
    const f = errorOf(() => ev('sum(ii for i in 1..3)'));
    expect(f.message).toBe('unknown name ii; did you mean i?');
    expect(errorOf(() => ev('permutatons(3)')).suggestion).toBe('permutations');
  });
  test('wrong argument counts name the signature', () => {
    const e = errorOf(() => ev('t_inv(1, 2)'));
    expect(e.message).toBe('t_inv takes 1 argument, got 2: t_inv(w: permutation) -> integer');
    expect(errorOf(() => ev('count(w in permutations())')).message).toMatch(/permutations takes 1 argument, got 0/);
    expect(errorOf(() => ev('sum(1, 2)')).message).toMatch(/sum takes one list/);
  });
  test('impossible types are load-time errors', () => {
    const lets: Array<[string, string]> = [['w', 't_perm([2, 1])']];
    expect(errorOf(() => ev('w == 1', lets)).message).toBe('cannot compare a permutation with an integer');
    expect(errorOf(() => ev('w < w', lets)).message).toMatch(/< compares integers and rationals only, but the left side is a permutation/);
    expect(errorOf(() => ev('t_inv(3)')).message).toMatch(/the argument w of t_inv must be a permutation, but this is an integer/);
    expect(errorOf(() => ev('w + w', lets)).message).toMatch(/\+ is not defined for a permutation and a permutation/);
    expect(errorOf(() => ev('[1] + [2]')).suggestion).toMatch(/concat/);
    expect(errorOf(() => ev('true[1]')).message).toMatch(/cannot be indexed/);
    expect(errorOf(() => ev('count(w in permutations(3) where t_inv(w) == w)')).message).toMatch(
      /cannot compare an integer with a permutation/,
    );
    expect(show('permutations(3)[2]')).toBe('perm([1, 3, 2])'); // a family as a value is the list of its objects
  });
  test('types unknown until run time are guarded, with the position of the failing part', () => {
    const e = errorOf(() => ev('1 + t_inv(t_any(5))'));
    expect(e).toBeInstanceOf(EvalError);
    expect(e.message).toMatch(/the argument w of t_inv must be a permutation, got an integer \(5\)/);
    expect(e.pos).toMatchObject({ column: 11 });
    const f = errorOf(() => ev('t_any(t_perm([1])) == 1'));
    expect(f).toBeInstanceOf(EvalError);
    expect(f.message).toBe('cannot compare a permutation with an integer');
  });
  test('run-time errors carry the innermost position', () => {
    const t = 'sum(1 / (i - 2) for i in 1..3)';
    const e = errorOf(() => ev(t));
    expect(e).toBeInstanceOf(EvalError);
    expect(e.message).toMatch(/division by zero/);
    expect(e.pos).toMatchObject({ line: 1, column: 5 });
    const old = errorOf(() => ev('sum(i in 1..3: 1 / (i - 2))'));
    expect(old.pos).toMatchObject({ line: 1, column: 16 });
    const g = errorOf(() => ev('2 + t_mod(3, 0)'));
    expect(g.message).toBe('mod by zero');
    expect(g.pos).toMatchObject({ column: 5 });
    expect(errorOf(() => ev('t_perm([1, 1])')).message).toMatch(/not a permutation/);
  });
  test('indeterminates: bare names and indexed ones', () => {
    expect(show('q^2 + 3*q*x[1]')).toBe(valueToText(ev('3*x[1]*q + q^2')));
    expect(errorOf(() => ev('q(2)')).message).toMatch(/indeterminate, not a function/);
    expect(errorOf(() => ev('y + 1')).message).toMatch(/unknown name y/);
  });
});

describe('define: functions', () => {
  function compileWith(defs: Record<string, string>, text: string): Value {
    const defines: DefineDecl[] = Object.entries(defs).map(([h, body]) => {
      const { name, params } = parseDefineHeader(h, textOrigin('d.yaml', h));
      return { name, params, body: parseExpression(body, textOrigin('d.yaml', body, 3, 5)) };
    });
    const c = new Compiler({ file: 'd.yaml', indeterminates: ['q'], defines });
    const { fn } = c.compile(parseExpression(text, textOrigin('d.yaml', text)));
    return fn(new Array(c.frameSize()));
  }
  test('with parameters, calling each other, recursion', () => {
    const defs = {
      'peaks(w)': 'count(i in 2..t_len(w) - 1 where w[i-1] < w[i] and w[i] > w[i+1])',
      'fact(n)': 'if n == 0 then 1 else n * fact(n - 1)',
      'twice(n)': 'fact(n) + fact(n)',
      'qint(n)': 'sum(q^i for i in 0..n-1)',
      c: '7',
    };
    expect(compileWith(defs, 'peaks([1, 3, 2, 5, 4])')).toBe(2);
    expect(compileWith(defs, 'fact(20)')).toBe(2432902008176640000n);
    expect(compileWith(defs, 'twice(3) + c')).toBe(19);
    expect(compileWith(defs, 'qint(3) == 1 + q + q^2')).toBe(true);
  });
  test('errors in definitions surface at load time with their position', () => {
    const e = errorOf(() => compileWith({ 'f(n)': 'n + nn' }, '1'));
    expect(e).toBeInstanceOf(InputError);
    expect(e.message).toBe('unknown name nn; did you mean n?');
    expect(e.pos).toEqual({ file: 'd.yaml', line: 3, column: 9 });
    expect(errorOf(() => compileWith({ 'f(a, b)': 'a' }, 'f(1)')).message).toMatch(/f takes 2 arguments: f\(a, b\); got 1/);
  });
  test('endless recursion is a clear error', () => {
    const e = errorOf(() => compileWith({ 'f(n)': 'f(n + 1)' }, 'f(0)'));
    expect(e).toBeInstanceOf(EvalError);
    expect(e.message).toMatch(new RegExp(`more than ${MAX_CALL_DEPTH} levels|nested too deeply`));
    // The depth counter is reset: the next evaluation works.
    expect(compileWith({ 'g(n)': 'if n == 0 then 0 else 1 + g(n - 1)' }, 'g(500)')).toBe(500);
  });
});

describe('lambdas', () => {
  test('as arguments', () => {
    expect(show('t_map([1, 2, 3], v -> v^2)')).toBe('[1, 4, 9]');
    expect(show('t_map([1, 2], a -> t_map([10, 20], b -> a + b))')).toBe('[[11, 21], [12, 22]]');
    expect(show('t_map([t_perm([2, 1, 3])], t_inv)')).toBe('[1]');
    const f = ev('(a, b) -> a * b') as Lambda;
    expect(f).toBeInstanceOf(Lambda);
    expect(f.call([6, 7])).toBe(42);
    expect(f.toText()).toBe('(a, b) -> a * b');
    expect(() => f.call([1])).toThrow(/takes 2 arguments/);
  });
  test('a bound function can be called', () => {
    expect(ev('f(4)', [['f', 'v -> v + 1']])).toBe(5);
    expect(errorOf(() => ev('n(4)', [['n', '3']])).message).toMatch(/n is an integer, not a function/);
  });
});

describe('for-binding sources', () => {
  test('range, family and list', () => {
    const c = new Compiler({ file: 'f', indeterminates: [], defines: [] });
    const n = c.declareSlot('n', 'integer');
    const o = (t: string) => parseExpression(t, textOrigin('f', t));
    const r = c.compileSource(o('1..n'));
    expect(r.kind).toBe('range');
    const fam = c.compileSource(o('permutations(n)'));
    expect(fam.kind === 'family' && fam.family.name).toBe('permutations');
    expect(fam.elementType).toBe('permutation');
    const w = c.declareSlot('w', fam.elementType);
    const l = c.compileSource(o('[1, 2]'));
    expect(l.kind).toBe('list');
    const claim = c.compile(o('t_inv(w) <= n * (n - 1) / 2'));
    expect(claim.type).toBe('boolean');
    const frame = new Array(c.frameSize());
    frame[n] = 3;
    if (fam.kind === 'family') {
      const p = fam.family.prepare(fam.args.map((a) => a(frame)));
      let ok = 0;
      fam.family.enumerate(p, (obj) => {
        frame[w] = obj;
        if (claim.fn(frame) === true) ok++;
      });
      expect(ok).toBe(6);
    }
    expect(c.names()).toContain('permutations');
    expect(() => c.compile(o('count(v in permutations(n) where v == w)'))).not.toThrow();
  });
});
