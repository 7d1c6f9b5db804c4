// The five classical bases of Λ and the transitions between them and the Schur basis, degree by
// degree, from the tables of tables.ts (Macdonald, Symmetric Functions and Hall Polynomials, I.6,
// I.7):
//   s_lambda = sum_mu K_{lambda mu} m_mu          m_mu = sum_lambda (K^-1)_{mu lambda} s_lambda
//   h_mu = sum_lambda K_{lambda mu} s_lambda       s_lambda = sum_mu (K^-1)_{mu lambda} h_mu
//   e_mu = sum_lambda K_{lambda' mu} s_lambda      s_lambda = sum_mu (K^-1)_{mu lambda'} e_mu
//   p_rho = sum_lambda chi^lambda(rho) s_lambda     s_lambda = sum_rho chi^lambda(rho) / z_rho p_rho

import { fail } from '../../base/errors.js';
import type { Int } from '../../numbers/integer.js';
import { makeRat, type Scalar } from '../../numbers/rational.js';
import { pmul, type PolyLike } from '../polynomial.js';
import { conjugate, partitionIndex, sizeOfParts, zee, type Parts } from './partitions.js';
import { schurTerms, TermMap, type SymLike, type SymTerm } from './symmetricFunction.js';
import { tablesOf } from './tables.js';

export type BasisName = 'schur' | 'monomial' | 'elementary' | 'complete' | 'power';
export const BASIS_NAMES: readonly BasisName[] = ['schur', 'monomial', 'elementary', 'complete', 'power'];

export function basisArg(name: string, call: string): BasisName {
  if ((BASIS_NAMES as readonly string[]).includes(name)) return name as BasisName;
  fail(`${call}: unknown basis ${JSON.stringify(name)}; the bases are ${BASIS_NAMES.map((b) => `"${b}"`).join(', ')}`);
}

/** The function (in the language) that builds an element of each basis. */
export const BASIS_CONSTRUCTOR: Record<BasisName, string> = {
  schur: 'schurSym',
  monomial: 'monomialSym',
  elementary: 'elementarySym',
  complete: 'completeSym',
  power: 'powerSym',
};

/** b_mu in the Schur basis, as [lambda, coefficient] pairs. */
export function basisToSchur(basis: BasisName, mu: Parts): [readonly number[], Scalar][] {
  const n = sizeOfParts(mu);
  if (basis === 'schur') return [[mu.slice(), 1]];
  const T = tablesOf(n);
  const j = partitionIndex(mu);
  const out: [readonly number[], Scalar][] = [];
  T.parts.forEach((lam, i) => {
    let c: Int;
    switch (basis) {
      case 'monomial':
        c = T.Kinv[j][i];
        break;
      case 'complete':
        c = T.K[i][j];
        break;
      case 'elementary':
        c = T.K[partitionIndex(conjugate(lam))][j];
        break;
      case 'power':
        c = T.X[i][j];
        break;
    }
    if (c !== 0) out.push([lam, c]);
  });
  return out;
}

/** s_lambda in another basis, as [mu, coefficient] pairs. */
export function schurToBasis(basis: BasisName, lam: Parts): [readonly number[], Scalar][] {
  const n = sizeOfParts(lam);
  if (basis === 'schur') return [[lam.slice(), 1]];
  const T = tablesOf(n);
  const i = partitionIndex(lam);
  const ic = basis === 'elementary' ? partitionIndex(conjugate(lam)) : i;
  const out: [readonly number[], Scalar][] = [];
  T.parts.forEach((mu, j) => {
    let c: Scalar;
    switch (basis) {
      case 'monomial':
        c = T.K[i][j];
        break;
      case 'complete':
        c = T.Kinv[j][i];
        break;
      case 'elementary':
        c = T.Kinv[j][ic];
        break;
      case 'power': {
        const x = T.X[i][j];
        c = x === 0 ? 0 : makeRat(BigInt(x), zee(mu));
        break;
      }
    }
    if (c !== 0) out.push([mu, c]);
  });
  return out;
}

/** The combination sum c_mu b_mu, given in the basis b, as a SymLike. */
export function fromBasis(basis: BasisName, terms: Iterable<readonly [Parts, PolyLike]>): SymLike {
  const m = new TermMap();
  for (const [mu, c] of terms) for (const [lam, k] of basisToSchur(basis, mu)) m.add(lam, pmul(k, c));
  return m.result();
}

/** The coefficients of f in the basis b: sorted terms (highest degree first, then decreasing lex). */
export function expandIn(f: SymLike, basis: BasisName): SymTerm[] {
  const m = new TermMap();
  for (const t of schurTerms(f)) for (const [mu, k] of schurToBasis(basis, t.parts)) m.add(mu, pmul(k, t.coef));
  return m.terms();
}
