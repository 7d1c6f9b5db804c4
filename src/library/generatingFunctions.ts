// Generating functions: coefficients of Laurent polynomials and of the power series of rational
// functions (src/algebra/seriesCoefficients.ts).

import { fail } from '../base/errors.js';
import { isPolyLike } from '../algebra/polynomial.js';
import { isRationalFunction, type RationalLike } from '../algebra/rationalFunction.js';
import { seriesCoefficient } from '../algebra/seriesCoefficients.js';
import { isInt, toSmall } from '../numbers/integer.js';
import { valueToText } from '../values/operations.js';
import { variableArg } from './polyArgs.js';
import { defineFunction } from './registry.js';

defineFunction({
  name: 'coefficient',
  topic: 'polynomials',
  params: [
    { name: 'f', type: 'any' },
    { name: 'q', type: 'polynomial' },
    { name: 'k', type: 'integer' },
  ],
  returns: 'scalarOrPolynomial',
  description:
    'the coefficient of q^k (k may be negative) in a Laurent polynomial, or in the power series in q of a rational function whose denominator, after removing a power of q, is a nonzero number at q = 0; other indeterminates stay in the coefficient',
  example: 'coefficient(1/((1 - q)*(1 - q^2)), q, 10)',
  exampleValue: '6',
  source:
    'definition; the recurrence c_k = (a_k - sum d_j c_(k-j)) / d_0 for a/d; tested on partitions into at most k parts (OEIS A008284), Fibonacci (OEIS A000045) and q-binomial coefficients',
  impl: (f, q, k) => {
    const call = 'coefficient(f, q, k)';
    if (!isPolyLike(f) && !isRationalFunction(f))
      fail(`${call}: f must be a number, a Laurent polynomial or a rational function, got ${valueToText(f)}`);
    if (!isInt(k)) fail(`${call}: k must be an integer`);
    return seriesCoefficient(f as RationalLike, variableArg(call, 'q', q), toSmall(k, 'k'));
  },
});
