// Quasisymmetric polynomials in x[1..m]: the monomial M_alpha = sum over i_1 < ... < i_k of
// x[i_1]^alpha_1 ... x[i_k]^alpha_k and Gessel's fundamental F_alpha = sum over weakly increasing
// i_1 <= ... <= i_n, strictly increasing at the positions of the descent set of alpha
// (alpha_1, alpha_1 + alpha_2, ...). I. M. Gessel, "Multipartite P-partitions and inner products
// of skew Schur functions", Contemp. Math. 34 (1984); Stanley, Enumerative Combinatorics 2, §7.19.

import { fail } from '../base/errors.js';
import { fromTerms, type PolyLike } from '../algebra/polynomial.js';
import { indexedVarId } from '../algebra/variables.js';
import { Composition } from '../families/compositions/composition.js';
import { valueToText } from '../values/operations.js';
import type { Value } from '../values/value.js';
import { defineFunction, type ParamDecl } from './registry.js';
import { indexedBaseArg } from './polyArgs.js';
import { smallIntArg } from './integerArgs.js';

const topic = 'quasisymmetric';
const TERMS_MAX = 200_000;

function compositionArg(v: Value, call: string): number[] {
  if (v instanceof Composition) return v.parts;
  if (Array.isArray(v) && v.every((x) => typeof x === 'number' && Number.isSafeInteger(x) && x >= 1)) return v as number[];
  fail(`${call} needs a composition (a list of positive integers), got ${valueToText(v)}`);
}

/** Exponent vectors of M_alpha in m variables: alpha placed on each increasing choice of k positions. */
export function monomialQuasiTerms(alpha: readonly number[], m: number): number[][] {
  const k = alpha.length,
    out: number[][] = [];
  const pos: number[] = [];
  const go = (t: number, from: number) => {
    if (t === k) {
      const e = new Array<number>(m).fill(0);
      pos.forEach((p, s) => (e[p] = alpha[s]));
      out.push(e);
      if (out.length > TERMS_MAX) fail(`this quasisymmetric polynomial would have more than ${TERMS_MAX} terms`);
      return;
    }
    for (let p = from; p <= m - (k - t); p++) {
      pos.push(p);
      go(t + 1, p + 1);
      pos.pop();
    }
  };
  go(0, 0);
  return out;
}

/** Exponent vectors (with multiplicity 1 each, as the sequences i are distinct monomials) of F_alpha. */
export function fundamentalQuasiTerms(alpha: readonly number[], m: number): number[][] {
  const n = alpha.reduce((a, b) => a + b, 0);
  const strictAfter = new Set<number>(); // positions j (1-based) with i_j < i_{j+1}
  let s = 0;
  for (let t = 0; t + 1 < alpha.length; t++) strictAfter.add((s += alpha[t]));
  const out: number[][] = [];
  const e = new Array<number>(m).fill(0);
  const go = (j: number, prev: number) => {
    if (j > n) {
      out.push(e.slice());
      if (out.length > TERMS_MAX) fail(`this quasisymmetric polynomial would have more than ${TERMS_MAX} terms`);
      return;
    }
    const start = j === 1 ? 0 : strictAfter.has(j - 1) ? prev + 1 : prev;
    for (let i = start; i < m; i++) {
      e[i]++;
      go(j + 1, i);
      e[i]--;
    }
  };
  go(1, 0);
  return out;
}

function build(terms: number[][], x: string, m: number): PolyLike {
  if (m === 0 || terms.length === 0) return terms.length === 1 ? 1 : terms.length === 0 ? 0 : terms.length;
  const ids = Array.from({ length: m }, (_, i) => indexedVarId(x, i + 1));
  return fromTerms(
    ids,
    terms.map((t) => [t, 1] as [number[], number]),
  );
}

const params: ParamDecl[] = [
  { name: 'alpha', type: ['composition', 'list'] },
  { name: 'x', type: 'polynomial' },
  { name: 'm', type: 'integer' },
];

defineFunction({
  name: 'quasiMonomial',
  topic,
  params,
  returns: 'scalarOrPolynomial',
  description: 'the monomial quasisymmetric polynomial M_alpha(x[1..m]): the sum of x[i_1]^alpha_1 ... x[i_k]^alpha_k over i_1 < ... < i_k',
  example: 'quasiMonomial(composition([2, 1]), x, 3)',
  exampleValue: 'x[1]^2*x[2] + x[1]^2*x[3] + x[2]^2*x[3]',
  source: 'Gessel, Contemp. Math. 34 (1984); Stanley, Enumerative Combinatorics 2, §7.19',
  impl: (al, x, m) => {
    const mm = smallIntArg('quasiMonomial(alpha, x, m)', 'm', m, 0, 1000);
    return build(
      monomialQuasiTerms(compositionArg(al, 'quasiMonomial(alpha, x, m)'), mm),
      indexedBaseArg('quasiMonomial(alpha, x, m)', 'x', x),
      mm,
    );
  },
});

defineFunction({
  name: 'quasiFundamental',
  topic,
  params,
  returns: 'scalarOrPolynomial',
  description:
    "Gessel's fundamental quasisymmetric polynomial F_alpha(x[1..m]): the sum of x[i_1] ... x[i_n] over i_1 <= ... <= i_n with i_j < i_(j+1) at the partial sums j of alpha",
  example: 'quasiFundamental(composition([1, 1]), x, 3)',
  exampleValue: 'x[1]*x[2] + x[1]*x[3] + x[2]*x[3]',
  source:
    'Gessel, Contemp. Math. 34 (1984); s_lambda = sum of F over the descent compositions of the standard tableaux (Stanley, EC2, Thm 7.19.7)',
  impl: (al, x, m) => {
    const mm = smallIntArg('quasiFundamental(alpha, x, m)', 'm', m, 0, 1000);
    return build(
      fundamentalQuasiTerms(compositionArg(al, 'quasiFundamental(alpha, x, m)'), mm),
      indexedBaseArg('quasiFundamental(alpha, x, m)', 'x', x),
      mm,
    );
  },
});
