// Fuzzing the expression language: random texts made from the registry's functions and families,
// numbers small and huge, operators, comprehensions, lambdas and strings, often damaged (truncated,
// shuffled, misspelt, nested or chained past the limits). Parsing, compiling and evaluating each
// must succeed or fail with an InputError / EvalError that says something clear: never another
// exception, never a stack overflow, never a message that leaks JavaScript internals, never slow.

import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import '../../src/families/index.js';
import '../../src/library/index.js';
import { InputError } from '../../src/base/errors.js';
import { evaluate, MAX_DEPTH, parseExpression, textOrigin } from '../../src/language/expr/index.js';
import { qbinomialCoefficients } from '../../src/library/qanalogs.js';
import { valueToText } from '../../src/values/operations.js';
import { damage, expressionText, gen, INDETERMINATES, LETS } from './expression-texts.js';
import { expectCleanError, timed } from './outcome.js';
import { fcRand, seededRand } from './random-source.js';

/** Evaluate a text as `hunch eval` would (with a few lets); 'ok', 'input' or 'eval'. */
function outcome(text: string): 'ok' | 'input' | 'eval' {
  return timed(1500, text, () => {
    try {
      valueToText(evaluate(text, LETS, INDETERMINATES));
      return 'ok';
    } catch (e) {
      return expectCleanError(e, text);
    }
  });
}

describe('random expressions', () => {
  test('evaluate or fail cleanly (fixed seed)', () => {
    const seen = { ok: 0, input: 0, eval: 0 };
    fc.assert(
      fc.property(fc.gen(), (g) => {
        seen[outcome(expressionText(fcRand(g)))]++;
      }),
      { seed: 20_240_611, numRuns: 600 },
    );
    // The generator is useful only if it reaches all three outcomes often.
    expect(seen.ok).toBeGreaterThan(60);
    expect(seen.input).toBeGreaterThan(60);
    expect(seen.eval).toBeGreaterThan(20);
  });

  test('well-formed expressions of every kind, with wrong argument types now and then', () => {
    fc.assert(
      fc.property(
        fc.gen(),
        fc.constantFrom('integer', 'boolean', 'list', 'polynomial', 'permutation', 'partition', 'tableau', 'matrix', 'function', 'any'),
        (g, type) => {
          outcome(gen(fcRand(g), type, 3));
        },
      ),
      { seed: 7, numRuns: 300 },
    );
  });

  test('a few thousand damaged texts from a seeded generator', () => {
    for (let s = 1; s <= 1500; s++) {
      const r = seededRand(s);
      outcome(damage(r, gen(r, 'any', 3)));
    }
  });
});

describe('found by fuzzing', () => {
  const errorOf = (text: string) => {
    try {
      evaluate(text, LETS, INDETERMINATES);
    } catch (e) {
      return e as Error;
    }
    throw new Error(`expected ${text} to fail`);
  };

  test('a long chain of operators is refused with a position, not a stack overflow', () => {
    for (const text of [
      Array(20_000).fill('1').join('+'),
      '[1]' + '[1]'.repeat(20_000),
      Array(20_000).fill('true').join(' and '),
      Array(5_000).fill('q').join(' * '),
    ]) {
      const e = errorOf(text);
      expect(e).toBeInstanceOf(InputError);
      expect(e.message).toContain(`more than ${MAX_DEPTH} levels`);
      expect((e as InputError).pos).toEqual({ file: '<expression>', line: 1, column: 1 });
    }
    // Chains up to the limit still work.
    expect(evaluate(Array(MAX_DEPTH).fill('1').join(' + '))).toBe(MAX_DEPTH);
    expect(() => parseExpression(Array(MAX_DEPTH).fill('x').join(' * '), textOrigin('f', ''))).not.toThrow();
  });

  test('family arguments of the wrong kind are shown in the notation of the language', () => {
    expect(errorOf('count(permutations(q^2 + 1))').message).toBe('n must be a nonnegative integer, got q^2 + 1');
    expect(errorOf('count(pipeDreams([q, 1]))').message).toBe('[q, 1] is not a permutation of 1..2');
    expect(errorOf('count(reducedWords(q))').message).toBe('w must be a permutation, got q');
  });

  test('q-analogues and Schur polynomials refuse sizes that would run for minutes', () => {
    for (const [text, limit] of [
      ['qfactorial(1000, q)', 'n <= 300'],
      ['qbinomial(402, 201, q)', 'k(n - k) <= 40000'],
      ['qint(4000000, 2)', 'n <= 100000'],
      ['schur(partition([3, 1]), x, 64)', 'more than 100,000 terms'],
    ]) {
      const t0 = performance.now();
      expect(errorOf(text).message).toContain(limit);
      expect(performance.now() - t0).toBeLessThan(500);
    }
    // Just inside the limits, still quick.
    expect(valueToText(evaluate('degree(qbinomial(400, 200, q), q)', [], ['q']))).toBe('40000');
    expect(valueToText(evaluate('len(terms(schur(partition([1, 1, 1, 1, 1, 1, 1, 1]), x, 8)))', [], ['x']))).toBe('1');
  });

  test('the product formula for Gaussian binomials agrees with the q-Pascal rule', () => {
    // Brute force second algorithm: [n, k] = [n-1, k-1] + q^k [n-1, k] (Andrews, Theory of Partitions, (3.3.4)).
    const pascal = (n: number, k: number): number[] => {
      if (k < 0 || k > n) return [];
      if (k === 0 || k === n) return [1];
      const a = pascal(n - 1, k - 1),
        b = pascal(n - 1, k);
      const out = new Array(Math.max(a.length, b.length + k)).fill(0);
      a.forEach((c, i) => (out[i] += c));
      b.forEach((c, i) => (out[i + k] += c));
      return out;
    };
    for (let n = 0; n <= 11; n++)
      for (let k = 0; k <= n; k++) expect(qbinomialCoefficients(n, k).map(Number), `[${n}, ${k}]`).toEqual(pascal(n, k));
  });

  test('an exponent of thousands of digits is described by its length, not printed', () => {
    expect(errorOf('2^2^2^2^2^2').message).toBe('the exponent (a number of 19729 digits) is too large');
    expect(errorOf('2^(10^30)').message).toBe('the exponent 1000000000000000000000000000000 is too large');
  });

  test('promotion of the empty tableau is the empty tableau', () => {
    expect(valueToText(evaluate('promotion(tableau([]))'))).toBe('tableau([])');
  });

  test('a non-number matrix entry or partition part is shown in the notation of the language', () => {
    expect(errorOf('matrix([[perm([2, 1])]])').message).toBe('a matrix entry must be a number or a polynomial, not perm([2, 1])');
    expect(errorOf('kostka([q], [1])').message).toContain('got [q]');
    expect(errorOf('syt([[1]])').message).toContain('got [[1]]');
  });
});
