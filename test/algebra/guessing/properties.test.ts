// Properties of the search on random inputs: a sequence made by a recurrence of order <= 2 with
// constant coefficients always gets a guess at most that complicated; the kernel engine's answer is
// exact on every row; random terms never make the search throw.
import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { guessSequence, searchRecurrence } from '../../../src/algebra/guessing/index.js';
import { normBig, type Int } from '../../../src/numbers/integer.js';

function cFinite(c1: number, c2: number, a0: number, a1: number, N: number): Int[] {
  const a = [BigInt(a0), BigInt(a1)];
  while (a.length < N) a.push(BigInt(c1) * a[a.length - 1] + BigInt(c2) * a[a.length - 2]);
  return a.map(normBig);
}

describe('guessing on random sequences', () => {
  test('a(n+2) = c1 a(n+1) + c2 a(n) is found with at most 2 unknowns, from 14 terms', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: -5, max: 5 }),
        fc.integer({ min: -5, max: 5 }).filter((c) => c !== 0),
        fc.integer({ min: -9, max: 9 }),
        fc.integer({ min: -9, max: 9 }),
        (c1, c2, a0, a1) => {
          const r = guessSequence({ offset: 0, terms: cFinite(c1, c2, a0, a1, 14) });
          expect(r.guesses.length).toBeGreaterThan(0);
          expect(r.guesses[0].unknowns).toBeLessThanOrEqual(2);
        },
      ),
      { seed: 16, numRuns: 60 },
    );
  }, 120_000);

  test('the recurrence found (order <= 2) holds exactly on every term (checked here by direct substitution)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 6 }), fc.integer({ min: -6, max: 6 }), fc.integer({ min: 1, max: 4 }), (p, q, s) => {
        // a(n+2) = (p n + q) a(n+1) + s (n + 1) a(n): a P-recursive sequence of order 2, degree 1.
        const a: bigint[] = [1n, 1n];
        for (let n = 0; a.length < 20; n++) a.push(BigInt(p * n + q) * a[n + 1] + BigInt(s * (n + 1)) * a[n]);
        const fit = searchRecurrence({ offset: 0, terms: a.map(normBig) }).fit;
        expect(fit).not.toBeNull();
        expect(fit!.order * (fit!.degree + 1)).toBeLessThanOrEqual(4);
        for (let n = 0; n + fit!.order < a.length; n++) {
          let sum = 0n;
          for (let i = 0; i <= fit!.order; i++)
            sum += fit!.coeffs[i].reduce((acc, c, j) => acc + c * BigInt(n) ** BigInt(j), 0n) * a[n + i];
          expect(sum).toBe(0n);
        }
      }),
      { seed: 17, numRuns: 30 },
    );
  }, 120_000);

  test('random terms: no exception, and whatever is offered has at least 3 confirming terms', () => {
    fc.assert(
      fc.property(
        fc.array(fc.bigInt({ min: -(10n ** 30n), max: 10n ** 30n }), { minLength: 0, maxLength: 16 }),
        fc.integer({ min: -3, max: 3 }),
        (xs, offset) => {
          const r = guessSequence({ offset, terms: xs.map(normBig) });
          for (const g of r.guesses) expect(g.evidence.confirmedTo - g.evidence.determinedTo).toBeGreaterThanOrEqual(3);
        },
      ),
      { seed: 18, numRuns: 40 },
    );
  }, 120_000);
});
