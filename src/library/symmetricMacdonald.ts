// Hall–Littlewood and modified Macdonald symmetric functions (LIBRARY.md, "Symmetric functions"):
// Hall–Littlewood P and Q (through Kostka–Foulkes polynomials by charge), the modified Macdonald
// polynomials H~_mu(x; q, t) by the inv/maj formula on fillings, and their Schur coefficients
// (the modified q,t-Kostka polynomials). The parameters may be indeterminates or any values.

import { fail } from '../base/errors.js';
import { pmul, type PolyLike } from '../algebra/polynomial.js';
import { bOf, hallLittlewoodPTable } from '../algebra/symmetric/hallLittlewood.js';
import { MACDONALD_MAX, macdonaldHTable } from '../algebra/symmetric/macdonald.js';
import { sizeOfParts } from '../algebra/symmetric/partitions.js';
import { evalBi, evalUni } from '../algebra/symmetric/qtTables.js';
import { TermMap, type SymLike } from '../algebra/symmetric/symmetricFunction.js';
import { partitionArg } from '../families/tableaux/shapes.js';
import type { Value } from '../values/value.js';
import { defineFunction } from './registry.js';

const topic = 'symmetric functions';
const MACDONALD = 'I. G. Macdonald, Symmetric Functions and Hall Polynomials, 2nd ed. (1995)';
const HHL = 'J. Haglund, M. Haiman, N. Loehr, A combinatorial formula for Macdonald polynomials, J. Amer. Math. Soc. 18 (2005)';
/** Hall–Littlewood functions invert a p(n) x p(n) matrix of polynomials built from tableaux. */
const HALL_LITTLEWOOD_MAX = 10;

function shape(call: string, v: Value, max: number, what = 'lambda'): number[] {
  const p = partitionArg(v, what);
  if (sizeOfParts(p) > max) fail(`${call} is limited to |${what}| <= ${max}, got |${what}| = ${sizeOfParts(p)}`);
  return p;
}

function hallLittlewood(lam: number[], t: PolyLike, scale: PolyLike): SymLike {
  const m = new TermMap();
  for (const [nu, c] of hallLittlewoodPTable(lam)) m.add(nu, pmul(scale, evalUni(c, t)));
  return m.result();
}

// kostkaFoulkes(lambda, mu, t) is registered once, with the charge statistic (src/library/charge.ts);
// test/algebra/symmetric checks this module's kostkaFoulkes against it.

defineFunction({
  name: 'hallLittlewoodP',
  topic,
  params: [
    { name: 'lambda', type: ['partition', 'list'] },
    { name: 't', type: 'scalarOrPolynomial' },
  ],
  returns: 'symmetric',
  description:
    'the Hall–Littlewood function P_lambda(x; t), from s_lambda = sum_mu K_{lambda mu}(t) P_mu (Kostka–Foulkes polynomials); P_lambda(x; 0) = s_lambda, P_lambda(x; 1) = m_lambda',
  example: 'hallLittlewoodP([1, 1], t)',
  exampleValue: 'schurSym([1, 1])',
  source: `${MACDONALD}, III.2 and III (6.5); tested against the symmetrisation formula III (2.2) in three variables and III (2.10)`,
  impl: (l, t) => hallLittlewood(shape('hallLittlewoodP(lambda, t)', l, HALL_LITTLEWOOD_MAX), t as PolyLike, 1),
});

defineFunction({
  name: 'hallLittlewoodQ',
  topic,
  params: [
    { name: 'lambda', type: ['partition', 'list'] },
    { name: 't', type: 'scalarOrPolynomial' },
  ],
  returns: 'symmetric',
  description:
    'the Hall–Littlewood function Q_lambda(x; t) = b_lambda(t) P_lambda(x; t), b_lambda(t) = prod_i (1 - t)(1 - t^2)...(1 - t^(m_i(lambda)))',
  example: 'hallLittlewoodQ([2], t)',
  exampleValue: '(-t + 1)*schurSym([2]) + (t^2 - t)*schurSym([1, 1])',
  source: `${MACDONALD}, III (2.11); tested against Q_(n) = sum_r (-t)^r e_r h_(n-r), III (2.9)–(2.10)`,
  impl: (l, t) => {
    const lam = shape('hallLittlewoodQ(lambda, t)', l, HALL_LITTLEWOOD_MAX);
    return hallLittlewood(lam, t as PolyLike, evalUni(bOf(lam), t as PolyLike));
  },
});

defineFunction({
  name: 'macdonaldH',
  topic,
  params: [
    { name: 'mu', type: ['partition', 'list'] },
    { name: 'q', type: 'scalarOrPolynomial' },
    { name: 't', type: 'scalarOrPolynomial' },
  ],
  returns: 'symmetric',
  description:
    'the modified Macdonald polynomial H~_mu(x; q, t) = sum over fillings of the diagram of mu of q^inv t^maj x^filling, as a combination of Schur functions (|mu| <= 9)',
  example: 'macdonaldH([2, 1], q, t)',
  exampleValue: 'schurSym([3]) + (q + t)*schurSym([2, 1]) + q*t*schurSym([1, 1, 1])',
  source: `${HHL}; tested against the q,t-Kostka tables of ${MACDONALD}, VI.8, H~_mu(x; 1, 1) = h_1^n and H~_mu(x; 0, t) by Kostka–Foulkes polynomials`,
  impl: (m, q, t) => {
    const mu = shape('macdonaldH(mu, q, t)', m, MACDONALD_MAX, 'mu');
    const out = new TermMap();
    for (const [lam, c] of macdonaldHTable(mu)) out.add(lam, evalBi(c, q as PolyLike, t as PolyLike));
    return out.result();
  },
});

defineFunction({
  name: 'qtKostka',
  topic,
  params: [
    { name: 'lambda', type: ['partition', 'list'] },
    { name: 'mu', type: ['partition', 'list'] },
    { name: 'q', type: 'scalarOrPolynomial' },
    { name: 't', type: 'scalarOrPolynomial' },
  ],
  returns: 'scalarOrPolynomial',
  description:
    'the modified q,t-Kostka polynomial K~_{lambda mu}(q, t) = t^n(mu) K_{lambda mu}(q, 1/t), the coefficient of s_lambda in H~_mu(x; q, t)',
  example: 'qtKostka([2, 1], [2, 1], q, t)',
  exampleValue: 'q + t',
  source: `${MACDONALD}, VI (8.11) and the tables of VI.8; ${HHL}`,
  impl: (l, m, q, t) => {
    const call = 'qtKostka(lambda, mu, q, t)';
    const lam = partitionArg(l, 'lambda');
    const mu = shape(call, m, MACDONALD_MAX, 'mu');
    const key = lam.join(',');
    for (const [nu, c] of macdonaldHTable(mu)) if (nu.join(',') === key) return evalBi(c, q as PolyLike, t as PolyLike);
    return 0;
  },
});
