// Numbers and sequences (LIBRARY.md §2): combinatorial numbers and integer helpers, all exact.
// Sizes are capped so that a mistaken argument fails at once with a clear message instead of
// computing for minutes.

import { fail } from '../base/errors.js';
import { iabs, igcd, ilcm, imod, iquo, Int, isZero, normBig } from '../numbers/integer.js';
import { denOf, numOf, Rat, Scalar } from '../numbers/rational.js';
import { sabs, sceil, sfloor } from '../numbers/scalar.js';
import { defineFunction } from './registry.js';
import type { Value } from '../values/value.js';
import { smallIntArg } from './integerArgs.js';
import * as C from './numbers/combinatorial.js';
import { isPrimeExact, PSI13 } from './numbers/primality.js';

const topic = 'numbers';
const FACTORIAL_MAX = 100_000;
const TRIANGLE_MAX = 1000;

defineFunction({
  name: 'factorial',
  topic,
  params: [{ name: 'n', type: 'integer' }],
  returns: 'integer',
  description: 'n! = 1 * 2 * ... * n, for n >= 0 (0! = 1)',
  example: 'factorial(20)',
  exampleValue: '2432902008176640000',
  source: 'OEIS A000142',
  impl: (n) => C.factorial(smallIntArg('factorial(n)', 'n', n, 0, FACTORIAL_MAX)),
});

defineFunction({
  name: 'doubleFactorial',
  topic,
  params: [{ name: 'n', type: 'integer' }],
  returns: 'integer',
  description:
    'n!! = n * (n-2) * (n-4) * ... down to 1 or 2, for n >= -1 ((-1)!! = 0!! = 1); (2n-1)!! counts perfect matchings of 2n points',
  example: 'doubleFactorial(9)',
  exampleValue: '945',
  source: 'OEIS A006882; odd case A001147',
  impl: (n) => C.doubleFactorial(smallIntArg('doubleFactorial(n)', 'n', n, -1, 2 * FACTORIAL_MAX)),
});

defineFunction({
  name: 'binomial',
  topic,
  params: [
    { name: 'n', type: 'integer' },
    { name: 'k', type: 'integer' },
  ],
  returns: 'integer',
  description:
    'the binomial coefficient C(n, k) = n(n-1)...(n-k+1)/k!, for any integer n (so C(-1, k) = (-1)^k); 0 when k < 0 or 0 <= n < k',
  example: 'binomial(10, 3)',
  exampleValue: '120',
  source: "OEIS A007318 (Pascal's triangle); negative n: Graham, Knuth, Patashnik, Concrete Mathematics, eq. (5.14)",
  impl: (n, k) => {
    const r = C.binomial(n as Int, k as Int, FACTORIAL_MAX);
    if (r === undefined) {
      fail(`binomial(n, k) is limited to k <= ${FACTORIAL_MAX} (or n - k <= ${FACTORIAL_MAX} when n >= 0), got binomial(${n}, ${k})`);
    }
    return r;
  },
});

defineFunction({
  name: 'catalan',
  topic,
  params: [{ name: 'n', type: 'integer' }],
  returns: 'integer',
  description: 'the Catalan number C(2n, n)/(n+1), for n >= 0',
  example: 'catalan(5)',
  exampleValue: '42',
  source: 'OEIS A000108',
  impl: (n) => C.catalan(smallIntArg('catalan(n)', 'n', n, 0, FACTORIAL_MAX)),
});

defineFunction({
  name: 'stirling1',
  topic,
  params: [
    { name: 'n', type: 'integer' },
    { name: 'k', type: 'integer' },
  ],
  returns: 'integer',
  description:
    'the unsigned Stirling number of the first kind: permutations of n elements with exactly k cycles; defined for n >= 0 (a negative n is an error, unlike binomial)',
  example: 'stirling1(5, 2)',
  exampleValue: '50',
  source: 'OEIS A132393 (signed: A008275, A048994)',
  impl: (n, k) => {
    const nn = smallIntArg('stirling1(n, k)', 'n', n, 0, TRIANGLE_MAX);
    return C.stirling1(nn, triangleColumn(k));
  },
});

defineFunction({
  name: 'stirling2',
  topic,
  params: [
    { name: 'n', type: 'integer' },
    { name: 'k', type: 'integer' },
  ],
  returns: 'integer',
  description:
    'the Stirling number of the second kind: partitions of an n-element set into exactly k blocks; defined for n >= 0 (a negative n is an error, unlike binomial)',
  example: 'stirling2(5, 2)',
  exampleValue: '15',
  source: 'OEIS A008277, A048993',
  impl: (n, k) => {
    const nn = smallIntArg('stirling2(n, k)', 'n', n, 0, TRIANGLE_MAX);
    return C.stirling2(nn, triangleColumn(k));
  },
});

/** A column index of a Stirling triangle: anything outside 0..n gives 0, so clamp huge ones. */
function triangleColumn(k: Value): number {
  const x = k as Int;
  if (typeof x === 'bigint') return x < 0n ? -1 : TRIANGLE_MAX + 1;
  return x;
}

defineFunction({
  name: 'bell',
  topic,
  params: [{ name: 'n', type: 'integer' }],
  returns: 'integer',
  description: 'the Bell number: partitions of an n-element set into blocks',
  example: 'bell(5)',
  exampleValue: '52',
  source: 'OEIS A000110',
  impl: (n) => C.bell(smallIntArg('bell(n)', 'n', n, 0, TRIANGLE_MAX)),
});

defineFunction({
  name: 'fibonacci',
  topic,
  params: [{ name: 'n', type: 'integer' }],
  returns: 'integer',
  description: 'the Fibonacci number F(n), F(0) = 0, F(1) = 1, F(n) = F(n-1) + F(n-2) for every integer n',
  example: 'fibonacci(10)',
  exampleValue: '55',
  source: 'OEIS A000045 (negative n: A039834)',
  impl: (n) => C.fibonacci(smallIntArg('fibonacci(n)', 'n', n, -1_000_000, 1_000_000)),
});

defineFunction({
  name: 'gcd',
  topic,
  params: [
    { name: 'a', type: 'integer' },
    { name: 'b', type: 'integer' },
  ],
  returns: 'integer',
  description: 'the greatest common divisor, always >= 0; gcd(0, 0) = 0',
  example: 'gcd(12, -18)',
  exampleValue: '6',
  source: 'definition',
  impl: (a, b) => igcd(a as Int, b as Int),
});

defineFunction({
  name: 'lcm',
  topic,
  params: [
    { name: 'a', type: 'integer' },
    { name: 'b', type: 'integer' },
  ],
  returns: 'integer',
  description: 'the least common multiple, always >= 0; 0 when a or b is 0',
  example: 'lcm(4, 6)',
  exampleValue: '12',
  source: 'definition',
  impl: (a, b) => ilcm(a as Int, b as Int),
});

defineFunction({
  name: 'quo',
  topic,
  params: [
    { name: 'a', type: 'integer' },
    { name: 'b', type: 'integer' },
  ],
  returns: 'integer',
  description: 'the floor of a/b (so quo(-7, 2) = -4); a == b*quo(a, b) + mod(a, b)',
  example: 'quo(-7, 2)',
  exampleValue: '-4',
  source: 'definition (floor division; Graham, Knuth, Patashnik, Concrete Mathematics, §3.4)',
  impl: (a, b) => {
    if (isZero(b as Int)) fail(`quo(a, b) with b = 0: division by zero (a = ${a})`);
    return iquo(a as Int, b as Int);
  },
});

defineFunction({
  name: 'mod',
  topic,
  params: [
    { name: 'a', type: 'integer' },
    { name: 'b', type: 'integer' },
  ],
  returns: 'integer',
  description: 'a - b*quo(a, b): the remainder of floor division, with the sign of b (in 0..b-1 for b > 0)',
  example: 'mod(-7, 3)',
  exampleValue: '2',
  source: 'definition (Graham, Knuth, Patashnik, Concrete Mathematics, §3.4)',
  impl: (a, b) => {
    if (isZero(b as Int)) fail(`mod(a, b) with b = 0: division by zero (a = ${a})`);
    return imod(a as Int, b as Int);
  },
});

defineFunction({
  name: 'divides',
  topic,
  params: [
    { name: 'a', type: 'integer' },
    { name: 'b', type: 'integer' },
  ],
  returns: 'boolean',
  description: 'whether a divides b, i.e. b = a*c for an integer c (0 divides only 0)',
  example: 'divides(3, 12)',
  exampleValue: 'true',
  source: 'definition',
  impl: (a, b) => (isZero(a as Int) ? isZero(b as Int) : isZero(imod(b as Int, a as Int))),
});

defineFunction({
  name: 'isInteger',
  topic,
  params: [{ name: 'x', type: 'number' }],
  returns: 'boolean',
  description: 'whether an exact number is an integer',
  example: 'isInteger(6/3)',
  exampleValue: 'true',
  source: 'definition',
  impl: (x) => !(x instanceof Rat),
});

defineFunction({
  name: 'numerator',
  topic,
  params: [{ name: 'x', type: 'number' }],
  returns: 'integer',
  description: 'the numerator of x in lowest terms, carrying the sign (numerator(-6/4) = -3)',
  example: 'numerator(-6/4)',
  exampleValue: '-3',
  source: 'definition',
  impl: (x) => (x instanceof Rat ? normBig(numOf(x)) : x),
});

defineFunction({
  name: 'denominator',
  topic,
  params: [{ name: 'x', type: 'number' }],
  returns: 'integer',
  description: 'the denominator of x in lowest terms, always >= 1 (1 for an integer)',
  example: 'denominator(-6/4)',
  exampleValue: '2',
  source: 'definition',
  impl: (x) => normBig(denOf(x as Scalar)),
});

defineFunction({
  name: 'floor',
  topic,
  params: [{ name: 'x', type: 'number' }],
  returns: 'integer',
  description: 'the largest integer <= x',
  example: 'floor(-7/2)',
  exampleValue: '-4',
  source: 'definition',
  impl: (x) => sfloor(x as Scalar),
});

defineFunction({
  name: 'ceil',
  topic,
  params: [{ name: 'x', type: 'number' }],
  returns: 'integer',
  description: 'the smallest integer >= x',
  example: 'ceil(-7/2)',
  exampleValue: '-3',
  source: 'definition',
  impl: (x) => sceil(x as Scalar),
});

defineFunction({
  name: 'abs',
  topic,
  params: [{ name: 'x', type: 'number' }],
  returns: 'number',
  description: 'the absolute value of an exact number',
  example: 'abs(-3/4)',
  exampleValue: '3/4',
  source: 'definition',
  impl: (x) => (x instanceof Rat ? sabs(x) : iabs(x as Int)),
});

defineFunction({
  name: 'isPrime',
  topic,
  params: [{ name: 'n', type: 'integer' }],
  returns: 'boolean',
  description:
    'whether n is a prime number (false for n < 2); exact: Miller–Rabin with bases proved sufficient, for n below about 3.3 * 10^24',
  example: 'isPrime(2147483647)',
  exampleValue: 'true',
  source: 'OEIS A000040; bases proved sufficient: OEIS A014233 (Sorenson and Webster, Math. Comp. 86 (2017))',
  impl: (n) => {
    const r = isPrimeExact(n as Int);
    if (r === undefined) fail(`isPrime(n) is proved exact only for n < ${PSI13}, got n = ${n}`);
    return r;
  },
});
