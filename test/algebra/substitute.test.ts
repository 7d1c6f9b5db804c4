// Simultaneous substitution of polynomials for variables (src/algebra/polynomialOps.ts), in one
// pass over the terms with one collector. Checked against the definition (the sum over terms of
// coefficient times the products of powers of the values, added one by one), on random
// polynomials with several substituted variables, and on a large double Schubert polynomial.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isPolynomial, makePolynomial, padd, pequals, pmul, pneg, ppow, variable, type PolyLike } from '../../src/algebra/polynomial.js';
import { substitute } from '../../src/algebra/polynomialOps.js';
import { doubleSchubertPolynomial } from '../../src/algebra/schubertPolynomials.js';
import { varId } from '../../src/algebra/variables.js';
import { polyArb, VARS } from './arbitraries.js';

function byDefinition(p: PolyLike, values: Map<number, PolyLike>): PolyLike {
  if (!isPolynomial(p)) return p;
  let sum: PolyLike = 0;
  for (let t = 0; t < p.length; t++) {
    let term: PolyLike = p.coefs[t];
    const keep = new Int32Array(p.nv);
    for (let v = 0; v < p.nv; v++) {
      const e = p.exps[t * p.nv + v];
      const val = values.get(p.vars[v]);
      if (val === undefined) keep[v] = e;
      else term = pmul(term, ppow(val, e));
    }
    sum = padd(sum, pmul(term, makePolynomial(p.vars, keep, [1])));
  }
  return sum;
}

describe('substitute', () => {
  it('agrees with the definition for up to three simultaneous values (fast-check)', () => {
    fc.assert(
      fc.property(
        polyArb,
        fc.subarray(VARS, { minLength: 1, maxLength: 3 }),
        fc.array(polyArb, { minLength: 3, maxLength: 3 }),
        (p, names, vals) => {
          const values = new Map<number, PolyLike>(names.map((n, i) => [varId(n), vals[i]]));
          expect(pequals(substitute(p, values), byDefinition(p, values))).toBe(true);
        },
      ),
      { numRuns: 200 },
    );
  });
  it('x[1] -> -x[1] twice is the identity on the double Schubert polynomial of 54321', () => {
    const p = doubleSchubertPolynomial([5, 4, 3, 2, 1], 'x', 'y');
    const x1 = variable('x[1]');
    const m = new Map<number, PolyLike>([[varId('x[1]'), pneg(x1)]]);
    const once = substitute(p, m);
    expect(pequals(once, p)).toBe(false);
    expect(pequals(substitute(once, m), p)).toBe(true);
    expect(pequals(once, byDefinition(p, m))).toBe(true);
  });
});
