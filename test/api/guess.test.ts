// Guessing from the library: the conjecture files it writes load and compile, and they hold when
// checked on more terms than the guesses were made from.
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, test } from 'vitest';
import { check, guessExpression, guessTerms, load } from '../../src/api/index.js';
import { evaluate } from '../../src/language/expr/index.js';
import { loadConjectures } from '../../src/language/conjecture/load-conjectures.js';
import { compileConjecture } from '../../src/language/conjecture/compile-conjecture.js';
import { valueToText } from '../../src/values/operations.js';

const dir = mkdtempSync(join(tmpdir(), 'hunch-guess-api-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

async function roundTrip(name: string, text: string): Promise<string[]> {
  const file = join(dir, `${name}.yaml`);
  writeFileSync(file, text);
  const specs = loadConjectures([file]);
  for (const s of specs) compileConjecture(s);
  const cs = await load(file);
  return cs.map((c) => check(c, { regressionFirst: false }).outcome);
}

describe('guessExpression', () => {
  test('ASM numbers found as a product that the language evaluates to prod_{k=0}^{n-1} (3k+1)!/(n+k)! (OEIS A005130; Zeilberger 1996)', async () => {
    const direct = 'product(factorial(3*k + 1)/factorial(n + k) for k in 0..n - 1)';
    const r = guessExpression(direct, 'n', 1, 16);
    const g = r.guesses[0];
    expect(g.kind).toBe('product');
    const closed = g.formula.replace(/^a\(n\) == /, '');
    for (let n = 1; n <= 24; n++)
      expect(valueToText(evaluate(closed, [['n', String(n)]]))).toBe(valueToText(evaluate(direct, [['n', String(n)]])));
    // The exhaustive count of alternating sign matrices agrees on the small sizes.
    for (let n = 1; n <= 5; n++)
      expect(valueToText(evaluate(closed, [['n', String(n)]]))).toBe(valueToText(evaluate(`count(a in asms(${n}))`)));
    expect(await roundTrip('asm', r.conjectureFile({ to: 22 }))).toEqual(['holds']);
  }, 60_000);

  test('Catalan numbers: every guess, written and checked to n = 20 (OEIS A000108)', async () => {
    const r = guessExpression('catalan(n)', 'n', 0, 12);
    expect(r.guesses.length).toBe(3);
    expect(await roundTrip('catalan', r.conjectureFile({ to: 20 }))).toEqual(['holds', 'holds', 'holds']);
  }, 60_000);

  test('a wrong guess written as a conjecture fails when checked further', async () => {
    // 1, 2, 4, 8, 16, 31: the regions of a circle cut by chords (OEIS A000127) look like 2^n at first.
    const r = guessTerms([1, 2, 4, 8, 16], 0);
    expect(r.guesses[0].formula).toBe('a(n) == 2^n');
    const text = r.conjectureFile().replace('[1, 2, 4, 8, 16]', '[1, 2, 4, 8, 16, 31]').replace('n: 0..4', 'n: 0..5');
    expect(await roundTrip('circle', text)).toEqual(['fails']);
  }, 60_000);

  test('a list of terms makes a file that restates exactly those terms', async () => {
    const r = guessTerms([1, 1, 2, 3, 5, 8, 13, 21, 34], 1);
    const text = r.conjectureFile();
    expect(text).toContain('[1, 1, 2, 3, 5, 8, 13, 21, 34][n]');
    expect(text).toContain('n: 1..7');
    expect(await roundTrip('fib-list', text)).toEqual(['holds']);
  }, 60_000);
});
