// Polynomials in n, and quasi-polynomials (a polynomial for each residue of n modulo a small
// period), as exact relations among the columns 1, n, ..., n^d and -a(n) (relation.ts).

import { denOf, makeRat, numOf, type Scalar } from '../../numbers/rational.js';
import { findRelation } from './relation.js';
import { ratPolyText } from './text.js';
import { MAX_UNKNOWNS, MIN_CONFIRMING_TERMS, type Attempt, type Guess, type Sequence } from './types.js';

export interface QuasiPolynomialFit {
  period: number;
  degree: number;
  /** pieces[c][j]: the coefficient of n^j for n ≡ c (mod period). */
  pieces: Scalar[][];
  determinedTo: number;
}

/** The fit with the given period and degree, if the terms determine it and at least MIN_CONFIRMING_TERMS confirm it (at least one in each residue class). */
export function fitQuasiPolynomial(seq: Sequence, period: number, degree: number): QuasiPolynomialFit | null {
  const a = seq.terms;
  const block = degree + 1;
  const cols = period * block + 1;
  const rel = findRelation(
    {
      rows: a.length,
      cols,
      row(k) {
        const n = seq.offset + k;
        const c = ((n % period) + period) % period;
        const D = denOf(a[k]);
        const out = new Array<bigint>(cols).fill(0n);
        let v = D;
        for (let j = 0; j < block; j++) {
          out[c * block + j] = v;
          v *= BigInt(n);
        }
        out[cols - 1] = -numOf(a[k]);
        return out;
      },
    },
    MIN_CONFIRMING_TERMS,
  );
  if (!rel) return null;
  const last = rel.vector[cols - 1];
  if (last === 0n) return null;
  // Every residue class needs a confirming term of its own.
  for (let c = 0; c < period; c++) {
    let ok = false;
    for (let k = rel.determinedAt + 1; k < a.length && !ok; k++) if ((((seq.offset + k) % period) + period) % period === c) ok = true;
    if (!ok) return null;
  }
  const pieces: Scalar[][] = [];
  for (let c = 0; c < period; c++) {
    const p: Scalar[] = [];
    for (let j = 0; j < block; j++) p.push(makeRat(rel.vector[c * block + j], last));
    let e = p.length;
    while (e > 1 && p[e - 1] === 0) e--;
    pieces.push(p.slice(0, e));
  }
  return { period, degree, pieces, determinedTo: seq.offset + rel.determinedAt };
}

export function quasiPolynomialText(fit: QuasiPolynomialFit, v = 'n'): string {
  if (fit.period === 1) return ratPolyText(fit.pieces[0], v);
  let out = ratPolyText(fit.pieces[fit.period - 1], v);
  for (let c = fit.period - 2; c >= 0; c--) out = `if mod(${v}, ${fit.period}) == ${c} then ${ratPolyText(fit.pieces[c], v)} else ${out}`;
  return out;
}

function closedFormGuess(fit: QuasiPolynomialFit, seq: Sequence): Guess {
  const formula = quasiPolynomialText(fit);
  const poly = fit.period === 1;
  const realDegree = Math.max(...fit.pieces.map((p) => p.length - 1));
  return {
    kind: poly ? 'polynomial' : 'quasi-polynomial',
    title: poly
      ? realDegree === 0
        ? 'constant'
        : `polynomial in n of degree ${realDegree}`
      : `quasi-polynomial of period ${fit.period}, degree ${realDegree}`,
    formula: `a(n) == ${formula}`,
    notes: [],
    unknowns: fit.period * (fit.degree + 1),
    evidence: { from: seq.offset, determinedTo: fit.determinedTo, confirmedTo: seq.offset + seq.terms.length - 1 },
    plan: (f) => ({
      variable: 'n',
      first: seq.offset,
      lastFor: (top) => top,
      defines: [],
      lets: [],
      claim: `${f}(n) == ${formula}`,
      indeterminates: [],
    }),
  };
}

/** The polynomial of lowest degree, else the quasi-polynomial of lowest period (2..4) and degree. */
export function guessPolynomial(seq: Sequence): { guess: Guess | null; tried: Attempt[] } {
  const N = seq.terms.length;
  const maxDeg = Math.min(N - MIN_CONFIRMING_TERMS - 1, MAX_UNKNOWNS - 1);
  const tried: Attempt[] = [];
  for (let d = 0; d <= maxDeg; d++) {
    const fit = fitQuasiPolynomial(seq, 1, d);
    if (fit) return { guess: closedFormGuess(fit, seq), tried };
  }
  if (maxDeg >= 0) tried.push({ guessClass: 'polynomials in n', extent: `degree <= ${maxDeg}`, terms: N });
  let any = false;
  let maxP = 0;
  for (let P = 2; P <= 4; P++)
    for (let d = 0; P * (d + 1) + MIN_CONFIRMING_TERMS + P - 1 <= N && P * (d + 1) <= MAX_UNKNOWNS; d++) {
      any = true;
      maxP = P;
      const fit = fitQuasiPolynomial(seq, P, d);
      if (fit) return { guess: closedFormGuess(fit, seq), tried };
    }
  if (any) tried.push({ guessClass: 'quasi-polynomials', extent: `period 2..${maxP}`, terms: N });
  return { guess: null, tried };
}
