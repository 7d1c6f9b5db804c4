// `hunch guess` as a user runs it: guesses with their evidence, the report of what was tried when
// nothing fits, and the round trip through --write and `hunch check` on a larger range.
import { existsSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, test } from 'vitest';
import { runCli, tempDir } from './run-cli.js';

const dir = tempDir('hunch-guess-cli-');
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** Guess over `over`, write every guess checked up to `to`, check the file; returns the check's output. */
function roundTrip(name: string, expr: string, over: string, to: number): { guess: string; check: string; code: number | null } {
  const file = join(dir, `${name}.yaml`);
  const g = runCli(['guess', expr, '--over', over, '--write', file, '--to', String(to), '--id', name], { timeout: 120_000 });
  expect(g.stderr).toBe('');
  expect(g.code).toBe(0);
  const c = runCli(['check', file, '--workers', '1'], { cwd: dir, timeout: 180_000 });
  return { guess: g.stdout, check: c.stdout + c.stderr, code: c.code };
}

describe('hunch guess', () => {
  test('separable permutations: the large Schröder recurrence and generating function with their evidence (OEIS A006318)', () => {
    const r = runCli(['guess', 'count(w in avoiders(n, "2413", "3142"))', '--over', 'n=1..10']);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('(n + 2)*a(n + 2) == (6*n + 3)*a(n + 1) - (n - 1)*a(n)');
    expect(r.stdout).toContain('found from the terms n = 1..7, confirmed by n = 8..10 (3 terms)');
    expect(r.stdout).toContain('x*f^2 + (x - 1)*f + 1 == 0');
  }, 120_000);

  test('no guess for 1, 3, 31, 1145, 154881 nor for the first 12 primes, and the classes tried are named with their term counts', () => {
    const a = runCli(['guess', '--terms', '1,3,31,1145,154881']);
    expect(a.code).toBe(0);
    expect(a.stdout).toContain('No guess fits the terms given (5 terms, n = 0..4)');
    expect(a.stdout).toContain('polynomials in n: degree <= 1 (5 terms)');
    const p = runCli(['guess', '--terms', '2,3,5,7,11,13,17,19,23,29,31,37', '--offset', '1', '--json']);
    const j = JSON.parse(p.stdout);
    expect(j.guesses).toEqual([]);
    expect(j.tried.map((t: { guessClass: string }) => t.guessClass)).toEqual(
      expect.arrayContaining(['polynomials in n', 'P-recursive recurrences', 'algebraic generating functions']),
    );
  }, 60_000);

  test('hunch table shows the best guess under the table, and in its JSON (Fibonacci numbers, OEIS A000045)', () => {
    const r = runCli(['table', 'fibonacci(n)', '--over', 'n=0..12']);
    expect(r.stdout).toContain(
      'Best guess, with a(n) the value: a(n + 2) == a(n + 1) + a(n)  (C-finite recurrence, order 2; found from the terms n = 0..3, confirmed by n = 4..12 (9 terms))',
    );
    const j = JSON.parse(runCli(['table', 'fibonacci(k)', '--over', 'k=0..12', '--json']).stdout);
    expect(j.bestGuess).toMatchObject({ kind: 'c-finite', evidence: { foundFrom: [0, 3] } });
    const none = runCli(['table', 'perm([1])', '--over', 'n=1..3']);
    expect(none.stdout).not.toContain('Best guess');
  }, 60_000);

  test('--json gives the evidence as ranges', () => {
    const r = runCli(['guess', 'fibonacci(n)', '--over', 'n=0..12', '--json']);
    const j = JSON.parse(r.stdout);
    expect(j.guesses[0]).toMatchObject({
      rank: 1,
      kind: 'c-finite',
      formula: 'a(n + 2) == a(n + 1) + a(n)',
      evidence: { foundFrom: [0, 3], confirmedBy: [4, 12] },
    });
  }, 60_000);

  test('bad input: exit 2 with a message, nothing written', () => {
    const file = join(dir, 'never.yaml');
    const r = runCli(['guess', '--terms', '1,x,3', '--write', file]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('not an exact number');
    expect(existsSync(file)).toBe(false);
    const s = runCli(['guess', 'perm([1,2])', '--over', 'n=1..3']);
    expect(s.code).toBe(2);
    expect(s.stderr).toContain('guessing needs numbers');
    const t = runCli(['guess', 'n^2', '--over', 'n=1..8', '--write', file, '--to', '5']);
    expect(t.code).toBe(2);
    expect(t.stderr).toContain('must lie beyond');
  }, 60_000);

  test('--divide-by: the quotient by another column is guessed too, and its conjecture holds further (involutions, OEIS A000085)', () => {
    const file = join(dir, 'quotient.yaml');
    const g = runCli([
      'guess',
      'count(w in involutions(n))*factorial(2*n)',
      '--over',
      'n=0..12',
      '--divide-by',
      'factorial(2*n)',
      '--write',
      file,
      '--to',
      '14',
      '--pick',
      '1',
    ]);
    expect(g.code).toBe(0);
    expect(g.stdout).toContain('c(n) = factorial(2*n)');
    expect(g.stdout).toContain('b(n + 2) == b(n + 1) + (n + 1)*b(n)');
    expect(g.stdout).toContain('where b(n) = a(n)/c(n)');
    const c = runCli(['check', file, '--workers', '1'], { cwd: dir, timeout: 180_000 });
    expect(c.stdout).toMatch(/holds/);
    expect(c.code).toBe(0);
  }, 300_000);

  // Each written file holds on a range beyond the terms it was guessed from.
  const cases: Array<[string, string, string, number, string]> = [
    ['catalan', 'catalan(n)', 'n=0..12', 18, 'OEIS A000108'],
    ['motzkin', 'sum(binomial(n, 2*k)*catalan(k) for k in 0..n)', 'n=0..14', 20, 'OEIS A001006'],
    ['delannoy', 'sum(binomial(n, k)*binomial(n + k, k) for k in 0..n)', 'n=0..14', 20, 'OEIS A001850'],
    ['franel', 'sum(binomial(n, k)^3 for k in 0..n)', 'n=0..16', 22, 'OEIS A000172'],
    ['apery', 'sum((binomial(n, k)*binomial(n + k, k))^2 for k in 0..n)', 'n=0..18', 24, 'OEIS A005259'],
    [
      'baxter',
      'sum(binomial(n + 1, k - 1)*binomial(n + 1, k)*binomial(n + 1, k + 1) for k in 1..n)/(binomial(n + 1, 1)*binomial(n + 1, 2))',
      'n=1..16',
      22,
      'OEIS A001181',
    ],
    ['fibonacci', 'fibonacci(n)', 'n=0..12', 30, 'OEIS A000045'],
    ['pell', 'sum(binomial(n, 2*k + 1)*2^k for k in 0..quo(n - 1, 2))', 'n=0..12', 30, 'OEIS A000129'],
    ['asm', 'product(factorial(3*k + 1)/factorial(n + k) for k in 0..n - 1)', 'n=1..16', 22, 'OEIS A005130'],
    ['separable', 'count(w in avoiders(n, "2413", "3142"))', 'n=1..10', 11, 'OEIS A006318'],
  ];
  for (const [name, expr, over, to, source] of cases)
    test(`round trip: ${name} (${source}) guessed on ${over}, checked to ${to}`, () => {
      const r = roundTrip(name, expr, over, to);
      expect(r.guess).toContain('Wrote');
      expect(r.check).not.toContain('fails');
      expect(r.check).toMatch(/holds/);
      expect(r.code).toBe(0);
      const text = readFileSync(join(dir, `${name}.yaml`), 'utf8');
      expect(text).toContain('expect: open');
      expect(text).toContain(`up to ${to}`);
    }, 300_000);
});
