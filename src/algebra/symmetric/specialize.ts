// Between Λ and symmetric polynomials in finitely many variables x[1..m]:
//   toPolynomial: f -> f(x[1], ..., x[m]), through Schur polynomials (s_lambda(x_1..x_m) = 0 when
//     lambda has more than m parts);
//   fromPolynomial: a polynomial symmetric in x[1..m] (its other indeterminates are coefficients)
//     -> the unique combination of s_lambda with at most m parts that specialises to it (the
//     restricted Kostka matrix is unitriangular, so it is solved from the top of dominance down).

import { fail } from '../../base/errors.js';
import { isScalar, type Scalar } from '../../numbers/rational.js';
import { sisZero } from '../../numbers/scalar.js';
import { fromTerms, isPolynomial, padd, pequals, pmul, polyText, psub, type PolyLike } from '../polynomial.js';
import { schurPolynomial } from '../schur.js';
import { varBase, varIndex, varName } from '../variables.js';
import { partitionIndex, partitionsOf } from './partitions.js';
import { checkDegree, tablesOf } from './tables.js';
import { schurTerms, TermMap, type SymLike } from './symmetricFunction.js';

export function toPolynomialIn(f: SymLike, x: string, m: number): PolyLike {
  let out: PolyLike = 0;
  for (const t of schurTerms(f)) {
    const s = schurPolynomial(t.parts, x, m);
    if (!(isScalar(s) && sisZero(s))) out = padd(out, pmul(t.coef, s));
  }
  return out;
}

/** Split p into x-exponent vectors (length m) with coefficients in the other variables. */
export function xCoefficients(p: PolyLike, x: string, m: number, call: string): Map<string, { e: number[]; coef: PolyLike }> {
  const out = new Map<string, { e: number[]; coef: PolyLike }>();
  if (!isPolynomial(p)) {
    const e = new Array<number>(m).fill(0);
    if (!(isScalar(p) && sisZero(p))) out.set(e.join(','), { e, coef: p });
    return out;
  }
  const nv = p.nv;
  const xPos: number[] = [];
  const others: number[] = [];
  for (let v = 0; v < nv; v++) {
    const id = p.vars[v];
    if (varBase(id) === x) {
      const i = varIndex(id);
      if (i === null || i < 1 || i > m) fail(`${call}: ${polyText(p)} contains ${varName(id)}, which is not among ${x}[1..${m}]`);
      xPos[v] = i - 1;
    } else {
      xPos[v] = -1;
      others.push(v);
    }
  }
  const otherIds = others.map((v) => p.vars[v]);
  const groups = new Map<string, { e: number[]; rows: [number[], Scalar][] }>();
  for (let t = 0; t < p.length; t++) {
    const e = new Array<number>(m).fill(0);
    const rest: number[] = [];
    for (let v = 0; v < nv; v++) {
      const k = p.exps[t * nv + v];
      if (xPos[v] >= 0) e[xPos[v]] = k;
      else rest.push(k);
    }
    const key = e.join(',');
    let g = groups.get(key);
    if (!g) groups.set(key, (g = { e, rows: [] }));
    g.rows.push([rest, p.coefs[t]]);
  }
  for (const [k, g] of groups) out.set(k, { e: g.e, coef: fromTerms(otherIds, g.rows) });
  return out;
}

export function fromPolynomialIn(p: PolyLike, x: string, m: number, call: string): SymLike {
  const terms = xCoefficients(p, x, m, call);
  // Symmetric: unchanged by each adjacent transposition of x[i], x[i+1] (they generate S_m).
  for (const { e, coef } of terms.values()) {
    let ok = true;
    for (let i = 0; i + 1 < m && ok; i++) {
      if (e[i] === e[i + 1]) continue;
      const f = e.slice();
      [f[i], f[i + 1]] = [f[i + 1], f[i]];
      const other = terms.get(f.join(','));
      ok = other !== undefined && pequals(other.coef, coef);
    }
    if (!ok) {
      const mono =
        e
          .map((k, i) => (k === 0 ? '' : k === 1 ? `${x}[${i + 1}]` : `${x}[${i + 1}]^${k}`))
          .filter((s) => s)
          .join('*') || '1';
      fail(`${call}: ${polyText(p)} is not symmetric in ${x}[1..${m}] (compare the coefficients of ${mono} and its rearrangements)`);
    }
  }
  const byDegree = new Map<number, Map<string, PolyLike>>();
  for (const { e, coef } of terms.values()) {
    if (!e.every((k, i) => i === 0 || k <= e[i - 1])) continue;
    const d = e.reduce((a, b) => a + b, 0);
    let g = byDegree.get(d);
    if (!g) byDegree.set(d, (g = new Map()));
    g.set(e.filter((k) => k > 0).join(','), coef);
  }
  const out = new TermMap();
  for (const [d, coefs] of byDegree) {
    checkDegree(d, 'the symmetric polynomial');
    const T = tablesOf(d);
    const parts = partitionsOf(d).filter((l) => l.length <= m);
    const residual = new Map<string, PolyLike>(coefs);
    for (let a = 0; a < parts.length; a++) {
      const lam = parts[a];
      const c = residual.get(lam.join(',')) ?? 0;
      if (isScalar(c) && sisZero(c)) continue;
      out.add(lam, c);
      const i = partitionIndex(lam);
      for (let b = a + 1; b < parts.length; b++) {
        const k = T.K[i][partitionIndex(parts[b])];
        if (k === 0) continue;
        const key = parts[b].join(',');
        residual.set(key, psub(residual.get(key) ?? 0, pmul(k, c)));
      }
    }
  }
  return out.result();
}
