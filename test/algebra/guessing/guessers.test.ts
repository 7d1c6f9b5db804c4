import { describe, expect, test } from 'vitest';
import { fitAlgebraic, fitRecurrence, guessSequence, rationalRoots, recurrenceText } from '../../../src/algebra/guessing/index.js';
import { apery, asm, baxter, catalan, delannoy, fibonacci, franel, motzkin, pell, schroeder, terms } from './sequences.js';

const big = (xs: number[][]) => xs.map((p) => p.map(BigInt));

describe('P-recursive recurrences against published ones', () => {
  test('Catalan numbers: (n+2) a(n+1) = (4n+2) a(n) (OEIS A000108)', () => {
    const fit = fitRecurrence({ offset: 0, terms: terms(0, 15, catalan) }, 1, 1)!;
    expect(fit.coeffs).toEqual(
      big([
        [-2, -4],
        [2, 1],
      ]),
    );
    expect(recurrenceText(fit, 'a')).toBe('(n + 2)*a(n + 1) == (4*n + 2)*a(n)');
  });

  test('Motzkin numbers: (n+2) M(n) = (2n+1) M(n-1) + 3(n-1) M(n-2) (OEIS A001006), found first', () => {
    const r = guessSequence({ offset: 0, terms: terms(0, 20, motzkin) });
    const rec = r.guesses.find((g) => g.kind === 'p-recursive')!;
    // n -> n + 2 in the published form.
    expect(rec.formula).toBe('(n + 4)*a(n + 2) == (2*n + 5)*a(n + 1) + (3*n + 3)*a(n)');
  });

  test('central Delannoy numbers: n a(n) = 3(2n-1) a(n-1) - (n-1) a(n-2) (OEIS A001850)', () => {
    const r = guessSequence({ offset: 0, terms: terms(0, 20, delannoy) });
    expect(r.guesses.find((g) => g.kind === 'p-recursive')!.formula).toBe('(n + 2)*a(n + 2) == (6*n + 9)*a(n + 1) - (n + 1)*a(n)');
  });

  test('Franel numbers: (n+1)^2 a(n+1) = (7n^2+7n+2) a(n) + 8n^2 a(n-1) (OEIS A000172; Franel 1894)', () => {
    const fit = fitRecurrence({ offset: 0, terms: terms(0, 24, franel) }, 2, 2)!;
    // n -> n + 1: (n+2)^2 a(n+2) = (7n^2+21n+16) a(n+1) + 8(n+1)^2 a(n).
    expect(fit.coeffs).toEqual(
      big([
        [-8, -16, -8],
        [-16, -21, -7],
        [4, 4, 1],
      ]),
    );
    const r = guessSequence({ offset: 0, terms: terms(0, 24, franel) });
    expect(r.guesses[0].kind).toBe('p-recursive');
    expect(r.guesses[0].formula).toBe('(n^2 + 4*n + 4)*a(n + 2) == (7*n^2 + 21*n + 16)*a(n + 1) + (8*n^2 + 16*n + 8)*a(n)');
  });

  test('Apéry numbers: (n+1)^3 u(n+1) = (34n^3+51n^2+27n+5) u(n) - n^3 u(n-1) ("A proof that Euler missed", Math. Intelligencer 1 (1979); OEIS A005259)', () => {
    const r = guessSequence({ offset: 0, terms: terms(0, 30, apery) });
    const g = r.guesses[0];
    expect(g.kind).toBe('p-recursive');
    // n -> n + 1 in the published form; 34(n+1)^3 + 51(n+1)^2 + 27(n+1) + 5 = 34n^3 + 153n^2 + 231n + 117.
    expect(g.formula).toBe('(n^3 + 6*n^2 + 12*n + 8)*a(n + 2) == (34*n^3 + 153*n^2 + 231*n + 117)*a(n + 1) - (n^3 + 3*n^2 + 3*n + 1)*a(n)');
    expect(g.evidence).toEqual({ from: 0, determinedTo: 12, confirmedTo: 30 });
  });

  test('Baxter permutations: (n+2)(n+3) a(n) = (7n^2+7n-2) a(n-1) + 8(n-1)(n-2) a(n-2) (OEIS A001181; Chung, Graham, Hoggatt and Kleiman, J. Combin. Theory A 24 (1978))', () => {
    const seq = { offset: 1, terms: terms(1, 25, baxter) };
    expect(seq.terms.slice(0, 7)).toEqual([1, 2, 6, 22, 92, 422, 2074]); // OEIS A001181, first terms
    const fit = fitRecurrence(seq, 2, 2)!;
    // n -> n + 2: (n+4)(n+5) a(n+2) = (7n^2+35n+40) a(n+1) + 8n(n+1) a(n).
    expect(fit.coeffs).toEqual(
      big([
        [0, -8, -8],
        [-40, -35, -7],
        [20, 9, 1],
      ]),
    );
    expect(guessSequence(seq).guesses[0].kind).toBe('p-recursive');
  });

  test('large Schröder numbers: (n+1) r(n) = 3(2n-1) r(n-1) - (n-2) r(n-2) (OEIS A006318), offset 1 as separable permutations', () => {
    const seq = { offset: 1, terms: terms(0, 10, schroeder) };
    expect(seq.terms).toEqual([1, 2, 6, 22, 90, 394, 1806, 8558, 41586, 206098, 1037718]); // OEIS A006318
    const r = guessSequence(seq);
    expect(r.guesses.map((g) => g.formula)).toEqual([
      '(n + 2)*a(n + 2) == (6*n + 3)*a(n + 1) - (n - 1)*a(n)',
      'x*f^2 + (x - 1)*f + 1 == 0',
    ]);
    expect(r.guesses[0].evidence).toEqual({ from: 1, determinedTo: 7, confirmedTo: 11 });
  });
});

describe('C-finite sequences and their generating functions', () => {
  test('Fibonacci: a(n+2) = a(n+1) + a(n), generating function x/(1 - x - x^2) (OEIS A000045)', () => {
    const r = guessSequence({ offset: 0, terms: terms(0, 20, fibonacci) });
    expect(r.guesses[0].kind).toBe('c-finite');
    expect(r.guesses[0].formula).toBe('a(n + 2) == a(n + 1) + a(n)');
    expect(r.guesses[0].notes).toContain('generating function: sum of a(n)*x^n over n >= 0 == x/(1 - x - x^2)');
  });

  test('Pell: a(n+2) = 2a(n+1) + a(n), generating function x/(1 - 2x - x^2) (OEIS A000129)', () => {
    const r = guessSequence({ offset: 0, terms: terms(0, 20, pell) });
    expect(r.guesses[0].formula).toBe('a(n + 2) == 2*a(n + 1) + a(n)');
    expect(r.guesses[0].notes).toContain('generating function: sum of a(n)*x^n over n >= 0 == x/(1 - 2*x - x^2)');
  });
});

describe('closed forms', () => {
  test('Catalan numbers as (2n)!/(n!(n+1)!) and as catalan(n) (OEIS A000108)', () => {
    const r = guessSequence({ offset: 0, terms: terms(0, 14, catalan) });
    expect(r.guesses.map((g) => g.formula)).toEqual([
      'a(n)/catalan(n) == 1',
      'a(n) == factorial(2*n)/(factorial(n)*factorial(n + 1))',
      'x*f^2 - f + 1 == 0',
    ]);
    expect(r.guesses[1].notes).toEqual(['from the recurrence (n + 2)*a(n + 1) == (4*n + 2)*a(n)']);
  });

  test("Catalan's generating function: x f^2 - f + 1 = 0 (OEIS A000108)", () => {
    const fit = fitAlgebraic({ offset: 0, terms: terms(0, 14, catalan) }, 1, 2)!;
    expect(fit.coeffs).toEqual(
      big([
        [1, 0],
        [-1, 0],
        [0, 1],
      ]),
    );
  });

  test('alternating sign matrices: a product over k of a hypergeometric ratio (OEIS A005130)', () => {
    const seq = { offset: 1, terms: terms(1, 18, asm) };
    expect(seq.terms.slice(0, 10)).toEqual([1, 2, 7, 42, 429, 7436, 218348, 10850216, 911835460, 129534272700]); // OEIS A005130
    const r = guessSequence(seq);
    expect(r.guesses[0].kind).toBe('product');
    expect(r.guesses[0].formula).toMatch(/^a\(n\) == product\(/);
    expect(r.guesses[0].notes[0]).toBe('the ratio a(n + 1)/a(n) == factorial(n)*factorial(3*n + 1)/(factorial(2*n)*factorial(2*n + 1))');
  });

  test('polynomials and quasi-polynomials (values from the formulas themselves)', () => {
    const tri = { offset: 0, terms: terms(0, 10, (n) => BigInt((n * (n + 1)) / 2)) };
    expect(guessSequence(tri).guesses[0].formula).toBe('a(n) == (n^2 + n)/2');
    const floorHalf = { offset: 0, terms: terms(0, 12, (n) => BigInt(Math.floor(n / 2))) };
    // The recurrence has 3 unknowns, the quasi-polynomial 4: both are offered, the recurrence first.
    expect(guessSequence(floorHalf).guesses.map((g) => g.formula)).toEqual([
      'a(n + 3) == a(n + 2) + a(n + 1) - a(n)',
      'a(n) == if mod(n, 2) == 0 then n/2 else (n - 1)/2',
    ]);
  });

  test('transforms: n! times a constant, and Motzkin numbers whose binomial transform is Catalan(n+1) (OEIS A001006, A000108)', () => {
    const twice = guessSequence({
      offset: 0,
      terms: terms(0, 10, (n) => 2n * BigInt([...Array(n).keys()].reduce((p, i) => p * (i + 1), 1))),
    });
    expect(twice.guesses[0].formula).toBe('a(n)/factorial(n) == 2');
    const m = guessSequence({ offset: 0, terms: terms(0, 16, motzkin) });
    expect(m.guesses[0].transform).toBe('the binomial transform of a');
    expect(m.guesses[0].formula).toBe('b(n) == factorial(2*n + 2)/(factorial(n + 1)*factorial(n + 2))');
  });
});

describe('no guess', () => {
  test('1, 3, 31, 1145, 154881: too few terms for anything but the smallest classes, and the report says what was tried', () => {
    const r = guessSequence({ offset: 0, terms: [1, 3, 31, 1145, 154881] });
    expect(r.guesses).toEqual([]);
    expect(r.tried.map((t) => t.guessClass)).toContain('polynomials in n');
    expect(r.tried.every((t) => t.terms <= 5)).toBe(true);
    expect(r.tried.find((t) => t.guessClass === 'polynomials in n')!.extent).toBe('degree <= 1');
  });

  test('the first 12 primes (OEIS A000040)', () => {
    const r = guessSequence({ offset: 1, terms: [2, 3, 5, 7, 11, 13, 17, 19, 23, 29, 31, 37] });
    expect(r.guesses).toEqual([]);
    const classes = r.tried.map((t) => t.guessClass);
    for (const c of ['polynomials in n', 'quasi-polynomials', 'P-recursive recurrences', 'algebraic generating functions'])
      expect(classes).toContain(c);
    expect(r.tried.find((t) => t.guessClass === 'P-recursive recurrences')!.terms).toBe(12);
  });
});

describe('rational roots', () => {
  test('6n^2 + 5n + 1 = (2n + 1)(3n + 1); n^2 + 1 has none', () => {
    const r = rationalRoots([1n, 5n, 6n])!;
    expect(r.roots.map(String)).toEqual(['-1/2', '-1/3']);
    expect(r.lead).toBe(6n);
    expect(rationalRoots([1n, 0n, 1n])).toBeNull();
  });
});
