// Products, skew Schur functions and plethysm in the ring of symmetric functions.
// Sources: Macdonald, Symmetric Functions and Hall Polynomials, 2nd ed., I.5, I.8, I.9. Second
// algorithms: products through power sums (p_mu p_nu = p_{mu ∪ nu}) and through polynomials in
// enough variables; the library's own Littlewood–Richardson count (src/library/littlewoodRichardson.ts).

import { describe, expect, it } from 'vitest';
import { padd, pequals, pmul, variable } from '../../../src/algebra/polynomial.js';
import { expandIn, fromBasis } from '../../../src/algebra/symmetric/bases.js';
import { partitionsOf, unionParts } from '../../../src/algebra/symmetric/partitions.js';
import { plethysmOf } from '../../../src/algebra/symmetric/plethysm.js';
import { lrCoefficientOf, skewSchur, symMul, symPow } from '../../../src/algebra/symmetric/products.js';
import { toPolynomialIn } from '../../../src/algebra/symmetric/specialize.js';
import { symAdd, symScale, type SymLike } from '../../../src/algebra/symmetric/symmetricFunction.js';
import { lrCoefficient } from '../../../src/library/littlewoodRichardson.js';
import { valueToText } from '../../../src/values/operations.js';
import { e, h, p, s } from './helpers.js';

const sameSym = (a: SymLike, b: SymLike) => expect(valueToText(a)).toBe(valueToText(b));
const sum = (...fs: SymLike[]) => fs.reduce((a, b) => symAdd(a, b), 0 as SymLike);

/** The product through the power-sum basis. */
function productByPowerSums(f: SymLike, g: SymLike): SymLike {
  const out: [number[], ReturnType<typeof pmul>][] = [];
  for (const a of expandIn(f, 'power'))
    for (const b of expandIn(g, 'power')) out.push([unionParts(a.parts, b.parts), pmul(a.coef, b.coef)]);
  return fromBasis('power', out);
}

describe('products', () => {
  it('s_mu s_nu by Littlewood–Richardson = by power sums = by polynomials (|mu| + |nu| <= 6)', { timeout: 60_000 }, () => {
    for (let a = 1; a <= 3; a++)
      for (let b = 1; b <= 3; b++)
        for (const mu of partitionsOf(a))
          for (const nu of partitionsOf(b)) {
            const prod = symMul(s(...mu), s(...nu));
            sameSym(prod, productByPowerSums(s(...mu), s(...nu)));
            const n = a + b;
            expect(pequals(toPolynomialIn(prod, 'x', n), pmul(toPolynomialIn(s(...mu), 'x', n), toPolynomialIn(s(...nu), 'x', n)))).toBe(
              true,
            );
          }
  });
  it('Littlewood–Richardson coefficients agree with the library count (n <= 7)', () => {
    for (let n = 2; n <= 7; n++)
      for (const lam of partitionsOf(n))
        for (let k = 1; k < n; k++)
          for (const mu of partitionsOf(k))
            for (const nu of partitionsOf(n - k)) expect(lrCoefficientOf(lam, mu, nu)).toBe(Number(lrCoefficient(lam, mu, nu)));
  });
  it('Pieri: h_1^n = sum f^lambda s_lambda; s_21^2 (Macdonald I.9 example)', () => {
    sameSym(symPow(s(1), 3), sum(s(3), symScale(2, s(2, 1)), s(1, 1, 1)));
    sameSym(symMul(s(2, 1), s(2, 1)), sum(s(4, 2), s(4, 1, 1), s(3, 3), symScale(2, s(3, 2, 1)), s(3, 1, 1, 1), s(2, 2, 2), s(2, 2, 1, 1)));
  });
  it('coefficients in q: (q s_1)(s_1 - q s_1) = (q - q^2) s_1^2', () => {
    const q = variable('q');
    const f = symMul(symScale(q, s(1)), symAdd(s(1), symScale(pmul(-1, q), s(1))));
    sameSym(f, symScale(padd(q, pmul(-1, pmul(q, q))), symMul(s(1), s(1))));
  });
});

describe('skew Schur functions (Macdonald I.5)', () => {
  it('s_{21/1} = s_2 + s_11, s_{lambda/0} = s_lambda, s_{lambda/lambda} = 1, mu not inside lambda gives 0', () => {
    sameSym(skewSchur([2, 1], [1]), sum(s(2), s(1, 1)));
    sameSym(skewSchur([3, 2, 1], []), s(3, 2, 1));
    sameSym(skewSchur([3, 2, 1], [3, 2, 1]), 1);
    sameSym(skewSchur([2], [1, 1]), 0);
  });
  it('<s_{lambda/mu}, s_nu> = <s_lambda, s_mu s_nu> (I (5.1))', () => {
    const lam = [4, 2, 1];
    for (const mu of partitionsOf(3)) {
      const sk = skewSchur(lam, mu);
      for (const nu of partitionsOf(4)) {
        const c = expandIn(symMul(s(...mu), s(...nu)), 'schur').find((t) => t.parts.join(',') === lam.join(','))?.coef ?? 0;
        const d = expandIn(sk, 'schur').find((t) => t.parts.join(',') === nu.join(','))?.coef ?? 0;
        expect(d).toBe(c);
      }
    }
  });
});

describe('plethysm (Macdonald I.8)', () => {
  it('h_2[h_2] = s_4 + s_22', () => sameSym(plethysmOf(h(2), h(2)), sum(s(4), s(2, 2))));
  it('h_2[h_n] = sum_k s_(2n-2k, 2k) and e_2[h_n] = sum_k s_(2n-2k-1, 2k+1) (I.8 Ex. 6)', () => {
    for (let n = 1; n <= 5; n++) {
      const even: SymLike[] = [],
        odd: SymLike[] = [];
      for (let k = 0; 2 * k <= n; k++) even.push(s(...[2 * n - 2 * k, 2 * k].filter((x) => x > 0)));
      for (let k = 0; 2 * k + 1 <= n; k++) odd.push(s(2 * n - 2 * k - 1, 2 * k + 1));
      sameSym(plethysmOf(h(2), h(n)), sum(...even));
      sameSym(plethysmOf(e(2), h(n)), sum(...odd));
    }
  });
  it('h_3[h_2] = s_6 + s_42 + s_222 (I.8 Ex. 6)', () => sameSym(plethysmOf(h(3), h(2)), sum(s(6), s(4, 2), s(2, 2, 2))));
  it('p_k[p_j] = p_jk, f[p_1] = f, p_1[g] = g, p_2[q p_1] = q^2 p_2', () => {
    sameSym(plethysmOf(p(3), p(2)), p(6));
    sameSym(plethysmOf(s(3, 1), p(1)), s(3, 1));
    sameSym(plethysmOf(p(1), s(2, 1)), s(2, 1));
    const q = variable('q');
    sameSym(plethysmOf(p(2), symScale(q, p(1))), symScale(pmul(q, q), p(2)));
  });
  it('plethysm is a ring map in f: (f g)[h] = f[h] g[h]', () => {
    sameSym(plethysmOf(symMul(h(2), e(1)), h(2)), symMul(plethysmOf(h(2), h(2)), h(2)));
  });
});
