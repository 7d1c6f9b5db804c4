// Algebraic generating functions: f = sum_{k>=0} a(offset + k) x^k with P(x, f) = 0 for a
// polynomial P of degree dx in x and dy >= 2 in f, found as a relation among the truncated series
// x^i f^j (relation.ts): row m is the coefficient of x^m. The fewest unknowns come first.

import { denOf, numOf, type Scalar } from '../../numbers/rational.js';
import { bigGcd } from '../../numbers/integer.js';
import { sadd, smul } from '../../numbers/scalar.js';
import { findRelation } from './relation.js';
import { comprehension, intPolyText, times } from './text.js';
import { MIN_CONFIRMING_TERMS, type Attempt, type Guess, type Sequence } from './types.js';

export interface AlgebraicFit {
  dx: number;
  dy: number;
  /** coeffs[j][i]: the coefficient of x^i f^j. */
  coeffs: bigint[][];
  determinedTo: number;
}

/** f^0, ..., f^dy truncated to the first N coefficients. */
function powers(f: readonly Scalar[], dy: number): Scalar[][] {
  const N = f.length;
  const out: Scalar[][] = [[1, ...new Array<Scalar>(N - 1).fill(0)]];
  for (let j = 1; j <= dy; j++) {
    const prev = out[j - 1];
    const next = new Array<Scalar>(N).fill(0);
    for (let m = 0; m < N; m++) {
      let s: Scalar = 0;
      for (let k = 0; k <= m; k++) if (prev[k] !== 0 && f[m - k] !== 0) s = sadd(s, smul(prev[k], f[m - k]));
      next[m] = s;
    }
    out.push(next);
  }
  return out;
}

export function fitAlgebraic(seq: Sequence, dx: number, dy: number, pw?: Scalar[][]): AlgebraicFit | null {
  const f = seq.terms;
  const P = pw ?? powers(f, dy);
  const cols = (dx + 1) * (dy + 1);
  const rel = findRelation(
    {
      rows: f.length,
      cols,
      row(m) {
        const entries: Scalar[] = [];
        for (let j = 0; j <= dy; j++) for (let i = 0; i <= dx; i++) entries.push(m >= i ? P[j][m - i] : 0);
        let L = 1n;
        for (const e of entries) L = (L / bigGcd(L, denOf(e))) * denOf(e);
        return entries.map((e) => numOf(e) * (L / denOf(e)));
      },
    },
    MIN_CONFIRMING_TERMS,
  );
  if (!rel) return null;
  const coeffs: bigint[][] = [];
  for (let j = 0; j <= dy; j++) coeffs.push(rel.vector.slice(j * (dx + 1), (j + 1) * (dx + 1)));
  if (coeffs[dy].every((c) => c === 0n)) return null;
  // Leading coefficient (highest power of f, then of x) positive.
  const top = coeffs[dy];
  let lead = 0n;
  for (let i = top.length - 1; i >= 0; i--)
    if (top[i] !== 0n) {
      lead = top[i];
      break;
    }
  if (lead < 0n) for (const c of coeffs) for (let i = 0; i < c.length; i++) c[i] = -c[i];
  return { dx, dy, coeffs, determinedTo: seq.offset + rel.determinedAt };
}

/** P(x, f) as text, with the series called `f`: "x*f^2 - f + 1". */
export function algebraicText(fit: AlgebraicFit, f: string, x = 'x'): string {
  let out = '';
  for (let j = fit.dy; j >= 0; j--) {
    const c = fit.coeffs[j];
    if (c.every((v) => v === 0n)) continue;
    let lead = 0n;
    for (let i = c.length - 1; i >= 0; i--)
      if (c[i] !== 0n) {
        lead = c[i];
        break;
      }
    const neg = lead < 0n;
    const poly = intPolyText(neg ? c.map((v) => -v) : c, x);
    const pow = j === 0 ? '1' : j === 1 ? f : `${f}^${j}`;
    const body = times(poly, pow);
    out += out === '' ? (neg ? `-${body}` : body) : neg ? ` - ${body}` : ` + ${body}`;
  }
  return out;
}

export function algebraicGuess(fit: AlgebraicFit, seq: Sequence): Guess {
  const n0 = seq.offset;
  const index = n0 === 0 ? 'k' : `k + ${n0}`;
  return {
    kind: 'algebraic',
    title: `algebraic generating function, degree ${fit.dy} in f, ${fit.dx} in x`,
    formula: `${algebraicText(fit, 'f')} == 0`,
    notes: [`where f = sum of a(${n0 === 0 ? 'n' : `n + ${n0}`})*x^n over n >= 0`],
    unknowns: (fit.dx + 1) * (fit.dy + 1) - 1,
    evidence: { from: n0, determinedTo: fit.determinedTo, confirmedTo: n0 + seq.terms.length - 1 },
    plan: (fn) => ({
      variable: 'm',
      first: 0,
      lastFor: (top) => top - n0,
      defines: [],
      lets: [['F', comprehension('sum', `${fn}(${index})*x^k`, 'k', '0..m')]],
      claim: `coeff(${algebraicText(fit, 'F')}, x^m) == 0`,
      indeterminates: ['x'],
    }),
  };
}

/** The algebraic equation with fewest unknowns, degree 2..3 in f. */
export function guessAlgebraic(seq: Sequence): { guess: Guess | null; tried: Attempt | null } {
  const N = seq.terms.length;
  const cands: Array<[number, number]> = [];
  for (let dy = 2; dy <= 3; dy++)
    for (let dx = 1; dx <= 8; dx++) if (N >= (dx + 1) * (dy + 1) - 1 + MIN_CONFIRMING_TERMS) cands.push([dx, dy]);
  cands.sort((a, b) => (a[0] + 1) * (a[1] + 1) - (b[0] + 1) * (b[1] + 1) || a[1] - b[1]);
  if (cands.length === 0) return { guess: null, tried: null };
  const pw = powers(seq.terms, 3);
  for (const [dx, dy] of cands) {
    const fit = fitAlgebraic(seq, dx, dy, pw.slice(0, dy + 1));
    if (fit) return { guess: algebraicGuess(fit, seq), tried: null };
  }
  const maxDy = Math.max(...cands.map((c) => c[1]));
  const maxDx = Math.max(...cands.map((c) => c[0]));
  return {
    guess: null,
    tried: { guessClass: 'algebraic generating functions', extent: `degree 2..${maxDy} in f, <= ${maxDx} in x`, terms: N },
  };
}
