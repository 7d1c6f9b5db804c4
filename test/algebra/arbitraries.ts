// fast-check generators for exact polynomials, shared by the algebra and library tests.
import fc from 'fast-check';
import { makeRat, type Scalar } from '../../src/numbers/rational.js';
import { fromTerms, type PolyLike } from '../../src/algebra/polynomial.js';
import { varId } from '../../src/algebra/variables.js';

export const VARS = ['q', 'x[1]', 'x[2]', 'x[10]', 'y'];

export const scalarArb: fc.Arbitrary<Scalar> = fc.oneof(
  fc.integer({ min: -5, max: 5 }),
  fc.tuple(fc.integer({ min: -9, max: 9 }), fc.integer({ min: 1, max: 4 })).map(([n, d]) => makeRat(BigInt(n), BigInt(d))),
  fc.bigInt({ min: -(2n ** 70n), max: 2n ** 70n }).map((b) => makeRat(b, 1n)),
);

const termArb = fc.tuple(fc.array(fc.integer({ min: 0, max: 3 }), { minLength: VARS.length, maxLength: VARS.length }), scalarArb);

/** Polynomials (and constants) over VARS with up to 5 terms. */
export const polyArb: fc.Arbitrary<PolyLike> = fc.array(termArb, { maxLength: 5 }).map((terms) =>
  fromTerms(
    VARS.map((v) => varId(v)),
    terms as [number[], Scalar][],
  ),
);
