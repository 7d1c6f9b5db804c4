// Term orders: the comparisons printed in Cox, Little and O'Shea, *Ideals, Varieties, and
// Algorithms*, Chapter 2, Section 2 (lex, grlex, grevlex examples), and the defining properties
// of a monomial order (total, multiplicative, 1 smallest) for weight and block orders (fast-check).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { varId } from '../../../src/algebra/variables.js';
import { EvalError } from '../../../src/base/errors.js';
import { termOrder, type OrderSpec } from '../../../src/algebra/groebner/index.js';

const [x, y, z] = ['x', 'y', 'z'].map((n) => varId(n));
const sign = (n: number) => Math.sign(n);

describe('the printed comparisons (Chapter 2, Section 2)', () => {
  it('lex: (1,2,0) > (0,3,4) and (3,2,4) > (3,2,1)', () => {
    const o = termOrder('lex', [x, y, z]);
    expect(sign(o.compare([1, 2, 0], [0, 3, 4]))).toBe(1);
    expect(sign(o.compare([3, 2, 4], [3, 2, 1]))).toBe(1);
  });
  it('grlex: (1,2,3) > (3,2,0) and (1,2,4) > (1,1,5)', () => {
    const o = termOrder('deglex', [x, y, z]);
    expect(sign(o.compare([1, 2, 3], [3, 2, 0]))).toBe(1);
    expect(sign(o.compare([1, 2, 4], [1, 1, 5]))).toBe(1);
  });
  it('grevlex: (4,7,1) > (4,2,3) and (1,5,2) > (4,1,3)', () => {
    const o = termOrder('grevlex', [x, y, z]);
    expect(sign(o.compare([4, 7, 1], [4, 2, 3]))).toBe(1);
    expect(sign(o.compare([1, 5, 2], [4, 1, 3]))).toBe(1);
  });
  it('the variable list decides which variable is largest', () => {
    expect(sign(termOrder('lex', [z, y, x]).compare([1, 0, 0], [0, 0, 1]))).toBe(1); // z > x here
    expect(sign(termOrder('lex', [x, y, z]).compare([1, 0, 0], [0, 0, 1]))).toBe(1);
  });
  it('weights with a tie-break, and block orders', () => {
    const w = termOrder({ weights: [1, 2, 3], then: 'lex' }, [x, y, z]);
    expect(sign(w.compare([3, 0, 0], [0, 0, 1]))).toBe(1); // equal weight 3, lex decides
    expect(sign(w.compare([0, 1, 0], [1, 0, 0]))).toBe(1); // weight 2 > 1
    const b = termOrder(
      {
        blocks: [
          { vars: [z], order: 'grevlex' },
          { vars: [x, y], order: 'lex' },
        ],
      },
      [x, y, z],
    );
    expect(sign(b.compare([0, 0, 1], [5, 5, 0]))).toBe(1); // the first block decides
    expect(sign(b.compare([1, 0, 2], [0, 7, 2]))).toBe(1); // then lex with x > y
  });
  it('rejects malformed orders with a clear message', () => {
    expect(() => termOrder({ weights: [1, 2] }, [x, y, z])).toThrow(/one weight per variable/);
    expect(() => termOrder({ weights: [1, -2, 0] }, [x, y, z])).toThrow(/nonnegative/);
    expect(() => termOrder({ blocks: [{ vars: [x], order: 'lex' }] }, [x, y, z])).toThrow(/missing y, z/);
    expect(() =>
      termOrder(
        {
          blocks: [
            { vars: [x, y], order: 'lex' },
            { vars: [y, z], order: 'lex' },
          ],
        },
        [x, y, z],
      ),
    ).toThrow(/two blocks/);
    expect(() => termOrder('lex', [x, x])).toThrow(EvalError);
    expect(() => termOrder('revlex' as OrderSpec, [x])).toThrow(/unknown term order/);
  });
});

const specArb: fc.Arbitrary<OrderSpec> = fc.oneof(
  fc.constantFrom<OrderSpec>('lex', 'deglex', 'grevlex'),
  fc
    .tuple(fc.array(fc.integer({ min: 0, max: 4 }), { minLength: 3, maxLength: 3 }), fc.constantFrom<OrderSpec>('lex', 'grevlex'))
    .map(([weights, then]) => ({ weights, then })),
  fc
    .tuple(
      fc.constantFrom<OrderSpec>('lex', 'deglex', 'grevlex'),
      fc.constantFrom<OrderSpec>('lex', 'deglex', 'grevlex'),
      fc.integer({ min: 0, max: 2 }),
    )
    .map(([a, b, k]) => {
      const perm = [
        [x, y, z],
        [y, z, x],
        [z, x, y],
      ][k];
      return {
        blocks: [
          { vars: [perm[0]], order: a },
          { vars: [perm[1], perm[2]], order: b },
        ],
      };
    }),
);
const expArb = fc.array(fc.integer({ min: 0, max: 4 }), { minLength: 3, maxLength: 3 });

describe('every order is a monomial order', () => {
  it('total, antisymmetric, transitive, multiplicative, with 1 the smallest monomial', () => {
    fc.assert(
      fc.property(specArb, expArb, expArb, expArb, (spec, a, b, c) => {
        const o = termOrder(spec, [x, y, z]);
        const ab = sign(o.compare(a, b));
        expect(sign(o.compare(b, a))).toBe(-ab || 0);
        expect(ab === 0).toBe(a.every((e, i) => e === b[i]));
        const add = (u: number[], v: number[]) => u.map((e, i) => e + v[i]);
        expect(sign(o.compare(add(a, c), add(b, c)))).toBe(ab);
        if (a.some((e) => e > 0)) expect(sign(o.compare(a, [0, 0, 0]))).toBe(1);
        if (ab >= 0 && sign(o.compare(b, c)) >= 0) expect(sign(o.compare(a, c))).toBeGreaterThanOrEqual(0);
      }),
      { numRuns: 500, seed: 7 },
    );
  });
});
