// The two coefficient fields: Q (exact Scalars) and F_p (residues 0..p-1 as numbers).

import { fail } from '../../base/errors.js';
import type { Scalar } from '../../numbers/rational.js';
import { sadd, sdiv, sisZero, smul, sneg, ssub } from '../../numbers/scalar.js';
import { checkPrime, invModP, mulModP, scalarModP } from './primeField.js';

export interface Field<T> {
  /** 0 for Q, else the prime. */
  readonly characteristic: number;
  readonly zero: T;
  readonly one: T;
  add(a: T, b: T): T;
  sub(a: T, b: T): T;
  mul(a: T, b: T): T;
  div(a: T, b: T): T;
  neg(a: T): T;
  isZero(a: T): boolean;
  fromScalar(a: Scalar): T;
  toScalar(a: T): Scalar;
}

export const rationals: Field<Scalar> = {
  characteristic: 0,
  zero: 0,
  one: 1,
  add: sadd,
  sub: ssub,
  mul: smul,
  div: sdiv,
  neg: sneg,
  isZero: sisZero,
  fromScalar: (a) => a,
  toScalar: (a) => a,
};

const primeFields = new Map<number, Field<number>>();

/** F_p with residues in 0..p-1. */
export function primeField(p: number): Field<number> {
  const known = primeFields.get(p);
  if (known) return known;
  checkPrime(p);
  const f: Field<number> = {
    characteristic: p,
    zero: 0,
    one: 1,
    add: (a, b) => (a + b >= p ? a + b - p : a + b),
    sub: (a, b) => (a - b < 0 ? a - b + p : a - b),
    mul: (a, b) => mulModP(a, b, p),
    div: (a, b) => {
      if (b === 0) fail('division by zero');
      return mulModP(a, invModP(b, p), p);
    },
    neg: (a) => (a === 0 ? 0 : p - a),
    isZero: (a) => a === 0,
    fromScalar: (a) => scalarModP(a, p),
    toScalar: (a) => a,
  };
  primeFields.set(p, f);
  return f;
}
