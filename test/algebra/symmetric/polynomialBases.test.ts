// Schubert expansion, key polynomials and atoms, Stanley symmetric functions.
// Sources: I. G. Macdonald, Notes on Schubert Polynomials (1991); D. Monk, The geometry of flag
// manifolds, Proc. London Math. Soc. 9 (1959) (Monk's rule); A. Lascoux, M.-P. Schützenberger, Keys &
// standard bases (1990); V. Reiner, M. Shimozono, J. Combin. Theory Ser. A 70 (1995); R. Stanley,
// European J. Combin. 5 (1984); P. Edelman, C. Greene, Adv. Math. 63 (1987); OEIS A005118.

import { describe, expect, it } from 'vitest';
import { fromTerms, padd, pequals, pmul, variable, type PolyLike } from '../../../src/algebra/polynomial.js';
import { substitute } from '../../../src/algebra/polynomialOps.js';
import { schubertPolynomial } from '../../../src/algebra/schubertPolynomials.js';
import { schurPolynomial } from '../../../src/algebra/schur.js';
import { expandIn } from '../../../src/algebra/symmetric/bases.js';
import { keyFamily } from '../../../src/algebra/symmetric/keyPolynomials.js';
import { partitionsOf } from '../../../src/algebra/symmetric/partitions.js';
import { fromLehmerCode, lehmerCode, lengthOf, padTo } from '../../../src/algebra/symmetric/permutationWords.js';
import { schubertExpansion } from '../../../src/algebra/symmetric/schubertExpansion.js';
import { toPolynomialIn } from '../../../src/algebra/symmetric/specialize.js';
import { monomialCoefficientOfStanley, stanleySchurCoefficients } from '../../../src/algebra/symmetric/stanley.js';
import { TermMap, type SymLike } from '../../../src/algebra/symmetric/symmetricFunction.js';
import { indexedVarId } from '../../../src/algebra/variables.js';
import { hookLengthCount } from '../../../src/families/tableaux/shapes.js';

function* permutations(n: number): Generator<number[]> {
  const a = Array.from({ length: n }, (_, i) => i + 1);
  const go = function* (k: number): Generator<number[]> {
    if (k === n) {
      yield a.slice();
      return;
    }
    for (let i = k; i < n; i++) {
      [a[k], a[i]] = [a[i], a[k]];
      yield* go(k + 1);
      [a[k], a[i]] = [a[i], a[k]];
    }
  };
  yield* go(0);
}
const key = (w: number[]) => w.join(',');
const trim = (w: number[]) => fromLehmerCode(lehmerCode(w));
const expansionMap = (P: PolyLike) => new Map(schubertExpansion(P, 'x', 'test').map(([w, c]) => [key(w), c]));

describe('Lehmer codes', () => {
  it('code and inverse on S_5', () => {
    for (const w of permutations(5)) expect(key(padTo(fromLehmerCode(lehmerCode(w)), 5))).toBe(key(w));
  });
});

describe('schubertExpand', () => {
  it('S_w expands to S_w alone, for every w in S_5', () => {
    for (const w of permutations(5)) {
      const got = schubertExpansion(schubertPolynomial(w, 'x'), 'x', 'test');
      expect(got.map(([u, c]) => [key(u), c])).toEqual([[key(trim(w)), 1]]);
    }
  });
  it("Monk's rule: S_{s_r} S_w = sum of S_{w t_jk} over j <= r < k with l(w t_jk) = l(w) + 1 (w in S_4)", () => {
    for (const w0 of permutations(4)) {
      const w = padTo(w0, 5);
      for (let r = 1; r <= 3; r++) {
        const sr = padTo([], 5);
        [sr[r - 1], sr[r]] = [sr[r], sr[r - 1]];
        const got = expansionMap(pmul(schubertPolynomial(sr, 'x'), schubertPolynomial(w, 'x')));
        const want = new Map<string, number>();
        for (let j = 1; j <= r; j++)
          for (let k = r + 1; k <= 5; k++) {
            const v = w.slice();
            [v[j - 1], v[k - 1]] = [v[k - 1], v[j - 1]];
            if (lengthOf(v) === lengthOf(w) + 1) want.set(key(trim(v)), 1);
          }
        expect(got).toEqual(want);
      }
    }
  });
  it('coefficients in other indeterminates; the expansion sums back to P', () => {
    const q = variable('q');
    const x1 = variable('x[1]'),
      x3 = variable('x[3]');
    const P = padd(pmul(q, pmul(x1, x3)), pmul(x3, x3));
    let back: PolyLike = 0;
    for (const [w, c] of schubertExpansion(P, 'x', 'test')) back = padd(back, pmul(c, schubertPolynomial(w, 'x')));
    expect(pequals(back, P)).toBe(true);
  });
});

describe('key polynomials and atoms', () => {
  const x = (i: number) => indexedVarId('x', i);
  it('dominant alpha gives x^alpha; antidominant alpha gives s_lambda(x_1..x_n)', () => {
    for (let d = 0; d <= 5; d++)
      for (const lam of partitionsOf(d))
        for (let n = Math.max(1, lam.length); n <= 4; n++) {
          const alpha = padTo([], 0).concat(lam, new Array(n - lam.length).fill(0));
          expect(
            pequals(
              keyFamily(alpha, 'x', false),
              fromTerms(
                alpha.map((_, i) => x(i + 1)),
                [[alpha, 1]],
              ),
            ),
          ).toBe(true);
          expect(pequals(keyFamily(alpha.slice().reverse(), 'x', false), schurPolynomial(lam, 'x', n))).toBe(true);
        }
  });
  it('the atoms of the distinct rearrangements of lambda add up to s_lambda (n <= 4)', () => {
    for (let d = 1; d <= 4; d++)
      for (const lam of partitionsOf(d))
        for (let n = lam.length; n <= 4; n++) {
          const base = [...lam, ...new Array(n - lam.length).fill(0)];
          const seen = new Set<string>();
          let sum: PolyLike = 0;
          for (const p of permutations(n)) {
            const beta = p.map((i) => base[i - 1]);
            if (seen.has(key(beta))) continue;
            seen.add(key(beta));
            sum = padd(sum, keyFamily(beta, 'x', true));
          }
          expect(pequals(sum, schurPolynomial(lam, 'x', n))).toBe(true);
        }
  });
  it('a vexillary (2143-avoiding) Schubert polynomial is the key polynomial of its code (S_5)', () => {
    for (const w of permutations(5)) {
      let vex = true;
      for (let a = 0; a < 5 && vex; a++)
        for (let b = a + 1; b < 5 && vex; b++)
          for (let c = b + 1; c < 5 && vex; c++)
            for (let d = c + 1; d < 5 && vex; d++) if (w[b] < w[a] && w[a] < w[d] && w[d] < w[c]) vex = false;
      if (!vex) continue;
      expect(pequals(schubertPolynomial(w, 'x'), keyFamily(lehmerCode(w), 'x', false)), key(w)).toBe(true);
    }
  });
});

function stanley(w: number[]): SymLike {
  const m = new TermMap();
  for (const [lam, c] of stanleySchurCoefficients(w)) m.add(lam, c);
  return m.result();
}

describe('Stanley symmetric functions', () => {
  it('F_{w0} = s_(n-1, ..., 1), and #reduced words of w0 = f^staircase (OEIS A005118), n <= 6', () => {
    const counts = [1, 1, 2, 16, 768, 292864];
    for (let n = 1; n <= 6; n++) {
      const w0 = Array.from({ length: n }, (_, i) => n - i);
      const stair = Array.from({ length: n - 1 }, (_, i) => n - 1 - i);
      const got = stanleySchurCoefficients(w0);
      expect(got.map(([l, c]) => [key(l), c])).toEqual([[key(stair), 1]]);
      expect(Number(hookLengthCount(stair))).toBe(counts[n - 1]);
    }
    expect(monomialCoefficientOfStanley([4, 3, 2, 1], [1, 1, 1, 1, 1, 1])).toBe(16);
  });
  it('Edelman–Greene coefficients agree with the monomial expansion from reduced words (S_4, S_5)', { timeout: 60_000 }, () => {
    for (const n of [4, 5])
      for (const w of permutations(n)) {
        const F = stanley(w);
        const l = lengthOf(w);
        if (l === 0) continue;
        const mono = new Map(expandIn(F, 'monomial').map((t) => [key(t.parts as number[]), t.coef]));
        for (const lam of partitionsOf(l))
          expect(mono.get(key(lam as number[])) ?? 0, `${w} ${lam}`).toBe(monomialCoefficientOfStanley(w, lam));
      }
  });
  it('F_w(x_1..x_3) = S_{1^3 × w}(x_1, x_2, x_3, 0, ...) (w in S_4)', { timeout: 60_000 }, () => {
    for (const w of permutations(4)) {
      const shifted = [1, 2, 3, ...w.map((v) => v + 3)];
      const S = schubertPolynomial(shifted, 'x');
      const zero = new Map<number, PolyLike>();
      for (let i = 4; i <= 7; i++) zero.set(indexedVarId('x', i), 0);
      expect(pequals(toPolynomialIn(stanley(w), 'x', 3), substitute(S, zero)), key(w)).toBe(true);
    }
  });
});
