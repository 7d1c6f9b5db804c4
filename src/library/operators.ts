// The arithmetic and comparison operators of the language (FORMAT.md §3), dispatched on the kinds
// of their operands. The compiler calls these after its own integer fast path, so each function
// starts with the next most common case (scalars) and ends with a type error that names both
// operands' types.
//
//   + - * /   numbers, Laurent polynomials (a constant result is a number), rational functions
//             (p / r is exact when r divides p, else a rational function in normal form), matrices of numbers or
//             polynomials (+ - *, c * M for a number or polynomial c), symmetric functions (a ring
//             over numbers and polynomials; / by a number or polynomial)
//   *         on permutations composes: (u*v)[i] == u[v[i]]
//   ^         integer exponent; w^-1 is the inverse of a permutation; p^k for k < 0 needs a monomial p
//   == !=     structural (values/operations.ts valueEquals)
//   < <= > >= integers and rationals only

import { EvalError, fail } from '../base/errors.js';
import { isInt } from '../numbers/integer.js';
import { Rat, isScalar, type Scalar } from '../numbers/rational.js';
import { sadd, scmp, sdiv, smul, sneg, spow, ssub } from '../numbers/scalar.js';
import { isPolynomial, padd, psub, pmul, pneg, ppow, pdivExact, type PolyLike } from '../algebra/polynomial.js';
import { Matrix, matrixPower, matrixProduct, matrixScale, matrixSum } from '../algebra/matrix.js';
import { Permutation } from '../families/permutations/permutation.js';
import { isSymLike, isSymmetricFunction, mapCoefficients, symAdd, symNeg, symSub } from '../algebra/symmetric/symmetricFunction.js';
import { symMul, symPow } from '../algebra/symmetric/products.js';
import { valueEquals, valueToText } from '../values/operations.js';
import {
  isRationalFunction,
  makeRational,
  rfAdd,
  rfDiv,
  rfMul,
  rfNeg,
  rfPow,
  rfSub,
  type RationalLike,
} from '../algebra/rationalFunction.js';
import { isStructured } from '../values/structured.js';
import { article, typeOf } from '../values/types.js';
import type { Value } from '../values/value.js';

function typeError(op: string, a: Value, b?: Value): never {
  const what = b === undefined ? article(typeOf(a)) : `${article(typeOf(a))} and ${article(typeOf(b))}`;
  const hint = Array.isArray(a) && (b === undefined || Array.isArray(b)) && op === '+' ? ' (to join lists use concat([A, B]))' : '';
  throw new EvalError(`${op} is not defined for ${what}${hint}`);
}

function isPolyLike(v: Value): v is PolyLike {
  return isScalar(v) || isPolynomial(v);
}

/** Operands of rational-function arithmetic: at least one is a rational function. */
function rationalPair(a: Value, b: Value): boolean {
  return (
    (isRationalFunction(a) || isRationalFunction(b)) && (isPolyLike(a) || isRationalFunction(a)) && (isPolyLike(b) || isRationalFunction(b))
  );
}

export function add(a: Value, b: Value): Value {
  if (isScalar(a) && isScalar(b)) return sadd(a, b);
  if (isPolyLike(a) && isPolyLike(b)) return padd(a, b);
  if (rationalPair(a, b)) return rfAdd(a as RationalLike, b as RationalLike);
  if (isMatrixValue(a) && isMatrixValue(b)) return matrixAdd(a, b);
  if (isSymLike(a) && isSymLike(b)) return symAdd(a, b);
  return typeError('+', a, b);
}

export function sub(a: Value, b: Value): Value {
  if (isScalar(a) && isScalar(b)) return ssub(a, b);
  if (isPolyLike(a) && isPolyLike(b)) return psub(a, b);
  if (rationalPair(a, b)) return rfSub(a as RationalLike, b as RationalLike);
  if (isMatrixValue(a) && isMatrixValue(b)) return matrixSub(a, b);
  if (isSymLike(a) && isSymLike(b)) return symSub(a, b);
  return typeError('-', a, b);
}

export function neg(a: Value): Value {
  if (isScalar(a)) return sneg(a);
  if (isPolynomial(a)) return pneg(a);
  if (isRationalFunction(a)) return rfNeg(a);
  if (isMatrixValue(a)) return matrixNeg(a);
  if (isSymmetricFunction(a)) return symNeg(a);
  return typeError('unary -', a);
}

export function mul(a: Value, b: Value): Value {
  if (isScalar(a) && isScalar(b)) return smul(a, b);
  if (isPolyLike(a) && isPolyLike(b)) return pmul(a, b);
  if (rationalPair(a, b)) return rfMul(a as RationalLike, b as RationalLike);
  if (a instanceof Permutation && b instanceof Permutation) return compose(a, b);
  if (isMatrixValue(a)) {
    if (isMatrixValue(b)) return matrixMul(a, b);
    if (isPolyLike(b)) return matrixScale(b, a);
  } else if (isMatrixValue(b) && isPolyLike(a)) return matrixScale(a, b);
  if (isSymLike(a) && isSymLike(b)) return symMul(a, b);
  return typeError('*', a, b);
}

export function div(a: Value, b: Value): Value {
  if (isScalar(a) && isScalar(b)) return sdiv(a, b);
  if (isPolyLike(a) && isPolyLike(b)) {
    if (isScalar(b)) return pmul(a, sdiv(1, b));
    // Exact when b divides a (always for a monomial b), else a rational function.
    return makeRational(a, b);
  }
  if (rationalPair(a, b)) return rfDiv(a as RationalLike, b as RationalLike);
  if (isSymmetricFunction(a) && isPolyLike(b)) return mapCoefficients(a, (c) => (isScalar(b) ? pmul(c, sdiv(1, b)) : pdivExact(c, b)));
  return typeError('/', a, b);
}

/** a^e for an integer exponent e. */
export function pow(a: Value, e: Value): Value {
  if (!isInt(e)) {
    throw new EvalError(`an exponent must be an integer, got ${article(typeOf(e))} (${valueToText(e)})`);
  }
  if (typeof e === 'bigint') {
    if (a === 1 || a === 0) return a;
    if (a === -1) return e % 2n === 0n ? 1 : -1;
    const digits = (e < 0n ? -e : e).toString();
    // A tower such as 2^2^2^2^2^2 has an exponent of thousands of digits: name its size instead.
    fail(
      digits.length > 40
        ? `the exponent (${e < 0n ? 'minus ' : ''}a number of ${digits.length} digits) is too large`
        : `the exponent ${e} is too large`,
    );
  }
  if (isScalar(a)) return spow(a, e);
  if (isPolynomial(a)) return e < 0 && a.length > 1 ? rfPow(a, e) : ppow(a, e);
  if (isRationalFunction(a)) return rfPow(a, e);
  if (a instanceof Permutation) return permPower(a, e);
  if (isMatrixValue(a)) return matrixPow(a, e);
  if (isSymmetricFunction(a)) return symPow(a, e);
  return typeError('^', a, e);
}

export function eq(a: Value, b: Value): boolean {
  return valueEquals(a, b);
}

export function ne(a: Value, b: Value): boolean {
  return !valueEquals(a, b);
}

function orderOperands(op: string, a: Value, b: Value): number {
  if (isScalar(a) && isScalar(b)) return scmp(a as Scalar, b as Scalar);
  throw new EvalError(
    `${op} compares integers and rationals only, got ${article(typeOf(a))} and ${article(typeOf(b))}` +
      (isStructured(a) || isStructured(b) || Array.isArray(a) ? ' (use == to compare other values)' : ''),
  );
}

export function lt(a: Value, b: Value): boolean {
  if (typeof a === 'number' && typeof b === 'number') return a < b;
  return orderOperands('<', a, b) < 0;
}

export function le(a: Value, b: Value): boolean {
  if (typeof a === 'number' && typeof b === 'number') return a <= b;
  return orderOperands('<=', a, b) <= 0;
}

export function gt(a: Value, b: Value): boolean {
  if (typeof a === 'number' && typeof b === 'number') return a > b;
  return orderOperands('>', a, b) > 0;
}

export function ge(a: Value, b: Value): boolean {
  if (typeof a === 'number' && typeof b === 'number') return a >= b;
  return orderOperands('>=', a, b) >= 0;
}

/** (u*v)(i) = u(v(i)). */
export function compose(u: Permutation, v: Permutation): Permutation {
  const n = u.a.length;
  if (v.a.length !== n) fail(`cannot compose permutations of different sizes (${n} and ${v.a.length}): ${u.toText()} * ${v.toText()}`);
  const out = new Array<number>(n);
  for (let i = 0; i < n; i++) out[i] = u.a[v.a[i] - 1];
  return new Permutation(out);
}

/** w^k for any integer k, by walking each cycle k mod its length steps. */
export function permPower(w: Permutation, k: number): Permutation {
  const n = w.a.length;
  const out = new Array<number>(n);
  const seen = new Uint8Array(n + 1);
  const cycle: number[] = [];
  for (let s = 1; s <= n; s++) {
    if (seen[s]) continue;
    cycle.length = 0;
    for (let i = s; !seen[i]; i = w.a[i - 1]) {
      seen[i] = 1;
      cycle.push(i);
    }
    const L = cycle.length;
    const step = ((k % L) + L) % L;
    for (let j = 0; j < L; j++) out[cycle[j] - 1] = cycle[(j + step) % L];
  }
  return new Permutation(out);
}

export { Rat };

// --- Matrices (src/algebra/matrix.ts). ---
function isMatrixValue(v: Value): v is Matrix {
  return v instanceof Matrix;
}
const matrixAdd = matrixSum;
function matrixSub(a: Matrix, b: Matrix): Matrix {
  return matrixSum(a, matrixScale(-1, b));
}
function matrixNeg(a: Matrix): Matrix {
  return matrixScale(-1, a);
}
const matrixMul = matrixProduct;
const matrixPow = matrixPower;
