// Reading term-order arguments (LIBRARY.md "Ideals and varieties"). The forms:
//   "lex", "deglex", "grevlex"   on the ring's variables in print order (z[1,1] > z[1,2] > ...)
//   "antidiagonal"               lex with z[i,j] > z[k,l] when i < k, or i = k and j > l: the
//                                leading term of every minor of a generic matrix is its antidiagonal
//   [w1, w2, ...]                a weight vector (nonnegative integers, one per ring variable in
//                                print order), ties broken by grevlex
//   [[vars1, order1], [vars2, order2], ...]
//                                a block (product) order: every variable of block 1 above every one
//                                of block 2, ...; each block's variables in the order listed (so
//                                [[[c, b, a], "lex"]] is lex with c > b > a), a bare name standing
//                                for all of its indexed variables in the ring (in print order);
//                                order_k is one of the forms above except blocks
// The blocks together must cover the ring's variables exactly.

import { antidiagonalVariableOrder } from '../algebra/ideals/matrixSchubert.js';
import { termOrder, type OrderSpec, type TermOrder } from '../algebra/groebner/index.js';
import { isPolynomial } from '../algebra/polynomial.js';
import { asVariable } from '../algebra/polynomialOps.js';
import { isBareVar, rankOf, varBase, varName } from '../algebra/variables.js';
import { fail } from '../base/errors.js';
import { nearest } from '../base/suggest.js';
import { valueToText } from '../values/operations.js';
import type { Value } from '../values/value.js';

const NAMED = ['lex', 'deglex', 'grevlex', 'antidiagonal'];

/** The order an argument describes, on the variables `ring` (ids, in print order). */
export function termOrderArg(call: string, v: Value, ring: readonly number[]): TermOrder {
  const sorted = ring.slice().sort((a, b) => rankOf(a) - rankOf(b));
  if (typeof v === 'string') {
    if (v === 'antidiagonal') return termOrder('lex', antidiagonalVariableOrder(sorted));
    return termOrder(namedSpec(call, v), sorted);
  }
  if (Array.isArray(v) && v.length > 0 && v.every((x) => Array.isArray(x))) {
    const blocks = (v as Value[][]).map((b, k) => blockArg(call, b, k, sorted));
    return termOrder({ blocks }, blocks.flatMap((b) => b.vars).concat(sorted.filter((id) => !blocks.some((b) => b.vars.includes(id)))));
  }
  return termOrder(innerSpec(call, v, sorted.length), sorted);
}

function didYouMean(s: string): string {
  const n = nearest(s, NAMED);
  return n ? ` (did you mean ${JSON.stringify(n)}?)` : '';
}

function namedSpec(call: string, s: string): 'lex' | 'deglex' | 'grevlex' {
  if (s === 'lex' || s === 'deglex' || s === 'grevlex') return s;
  fail(
    `${call}: ${JSON.stringify(s)} is not a term order; the named orders are ${NAMED.map((x) => JSON.stringify(x)).join(', ')}${didYouMean(s)}`,
  );
}

/** A named order or a weight vector over `count` variables. */
function innerSpec(call: string, v: Value, count: number): OrderSpec {
  if (typeof v === 'string') {
    if (v === 'antidiagonal')
      fail(`${call}: "antidiagonal" cannot be the order inside a block; list the block's variables in antidiagonal order with "lex"`);
    return namedSpec(call, v);
  }
  if (Array.isArray(v) && v.every((x) => typeof x === 'number' && Number.isSafeInteger(x) && x >= 0)) {
    if (v.length !== count) fail(`${call}: a weight vector needs one weight per variable (${count}), not ${v.length}`);
    return { weights: v as number[], then: 'grevlex' };
  }
  fail(
    `${call}: ${valueToText(v)} is not a term order (a name such as "grevlex", a list of nonnegative weights, or a list of [variables, order] blocks)`,
  );
}

function blockArg(call: string, b: readonly Value[], k: number, ring: readonly number[]): { vars: number[]; order: OrderSpec } {
  if (b.length !== 2 || !Array.isArray(b[0]))
    fail(`${call}: block ${k + 1} of the order must be a pair [variables, order], such as [[x, y], "grevlex"]`);
  const vars: number[] = [];
  for (const x of b[0] as Value[]) {
    const id = isPolynomial(x) ? asVariable(x) : undefined;
    if (id === undefined) fail(`${call}: block ${k + 1} lists ${valueToText(x)}, which is not a single variable`);
    if (isBareVar(id) && !ring.includes(id)) {
      const family = ring.filter((r) => varBase(r) === varBase(id) && !isBareVar(r));
      if (family.length === 0) fail(`${call}: block ${k + 1} names ${varName(id)}, which is not a variable of the ring`);
      vars.push(...family);
    } else vars.push(id);
  }
  return { vars, order: innerSpec(call, b[1], vars.length) };
}
