// Linear recurrences with polynomial coefficients, sum_{i=0..r} p_i(n) a(n+i) = 0 with deg p_i <= d,
// by exact linear algebra over the rationals (relation.ts), searching (r, d) with the fewest unknowns
// first, so the first recurrence found has the lowest order and degree the terms allow. d = 0 is the
// C-finite case (constant coefficients), which also gives the rational generating function.

import { denOf, numOf, type Scalar } from '../../numbers/rational.js';
import { bigGcd, normBig } from '../../numbers/integer.js';
import { sadd, smul } from '../../numbers/scalar.js';
import { findRelation } from './relation.js';
import { intPolyText, shifted, times } from './text.js';
import { MAX_UNKNOWNS, MIN_CONFIRMING_TERMS, type Attempt, type ClaimPlan, type Guess, type Sequence } from './types.js';

export interface RecurrenceFit {
  order: number;
  degree: number;
  /** coeffs[i][j]: the coefficient of n^j in p_i(n). Content 1, p_r's leading coefficient positive. */
  coeffs: bigint[][];
  /** Term index up to which the terms determined it. */
  determinedTo: number;
}

export interface RecurrenceSearch {
  maxOrder?: number;
  maxDegree?: number;
  /** Only constant coefficients (d = 0). */
  constantOnly?: boolean;
}

function lcm(a: bigint, b: bigint): bigint {
  return (a / bigGcd(a, b)) * b;
}

/** The candidate (r, d) with enough terms to be determined and confirmed, fewest unknowns first. */
export function recurrenceCandidates(terms: number, opts: RecurrenceSearch = {}): Array<[number, number]> {
  const out: Array<[number, number]> = [];
  const maxR = opts.maxOrder ?? 12;
  const maxD = opts.constantOnly ? 0 : (opts.maxDegree ?? 30);
  for (let r = 1; r <= maxR; r++)
    for (let d = 0; d <= maxD; d++) {
      const cols = (r + 1) * (d + 1);
      if (cols - 1 <= MAX_UNKNOWNS && terms - r >= cols - 1 + MIN_CONFIRMING_TERMS) out.push([r, d]);
    }
  out.sort((a, b) => (a[0] + 1) * (a[1] + 1) - (b[0] + 1) * (b[1] + 1) || a[0] - b[0] || a[1] - b[1]);
  return out;
}

/** The recurrence of order r and degree d that the terms satisfy, if there is exactly one. */
export function fitRecurrence(seq: Sequence, r: number, d: number): RecurrenceFit | null {
  const a = seq.terms;
  const cols = (r + 1) * (d + 1);
  const rel = findRelation(
    {
      rows: a.length - r,
      cols,
      row(k) {
        let L = 1n;
        for (let i = 0; i <= r; i++) L = lcm(L, denOf(a[k + i]));
        const n = BigInt(seq.offset + k);
        const out = new Array<bigint>(cols);
        for (let i = 0; i <= r; i++) {
          let v = numOf(a[k + i]) * (L / denOf(a[k + i]));
          for (let j = 0; j <= d; j++) {
            out[i * (d + 1) + j] = v;
            v *= n;
          }
        }
        return out;
      },
    },
    MIN_CONFIRMING_TERMS,
  );
  if (!rel) return null;
  const coeffs: bigint[][] = [];
  for (let i = 0; i <= r; i++) coeffs.push(rel.vector.slice(i * (d + 1), (i + 1) * (d + 1)));
  // A relation without a(n) or without a(n + r) is one of lower order, shifted: not this one.
  if (coeffs[0].every((c) => c === 0n) || coeffs[r].every((c) => c === 0n)) return null;
  const top = coeffs[r];
  let lead = 0n;
  for (let j = top.length - 1; j >= 0; j--)
    if (top[j] !== 0n) {
      lead = top[j];
      break;
    }
  if (lead < 0n) for (const p of coeffs) for (let j = 0; j < p.length; j++) p[j] = -p[j];
  return { order: r, degree: d, coeffs: coeffs.map(trim), determinedTo: seq.offset + rel.determinedAt + r };
}

function trim(p: bigint[]): bigint[] {
  let e = p.length;
  while (e > 1 && p[e - 1] === 0n) e--;
  return p.slice(0, e);
}

/** The first recurrence in the search order, with what was tried. */
export function searchRecurrence(seq: Sequence, opts: RecurrenceSearch = {}): { fit: RecurrenceFit | null; tried: Attempt | null } {
  const cands = recurrenceCandidates(seq.terms.length, opts);
  if (cands.length === 0) return { fit: null, tried: null };
  const maxR = Math.max(...cands.map((c) => c[0]));
  for (const [r, d] of cands) {
    const fit = fitRecurrence(seq, r, d);
    if (fit) return { fit, tried: null };
  }
  const maxD = Math.max(...cands.map((c) => c[1]));
  const maxU = Math.max(...cands.map(([r, d]) => (r + 1) * (d + 1) - 1));
  // With only constant coefficients within reach, say so rather than "degree <= 0".
  if (opts.constantOnly || maxD === 0)
    return { fit: null, tried: { guessClass: 'C-finite recurrences', extent: `order <= ${maxR}`, terms: seq.terms.length } };
  const extent = `order r and degree d with at most ${maxU} unknown${maxU === 1 ? '' : 's'} (r <= ${maxR}, d <= ${maxD})`;
  return { fit: null, tried: { guessClass: 'P-recursive recurrences', extent, terms: seq.terms.length } };
}

/** "p_r(n)*a(n + r) == -p_{r-1}(n)*a(n + r - 1) - ...", with the highest shift on the left. */
export function recurrenceText(fit: RecurrenceFit, f: string, v = 'n'): string {
  const term = (p: bigint[], i: number, negate: boolean): [boolean, string] => {
    const q = negate ? p.map((c) => -c) : p;
    let lead = 0n;
    for (let j = q.length - 1; j >= 0; j--)
      if (q[j] !== 0n) {
        lead = q[j];
        break;
      }
    const neg = lead < 0n;
    const body = times(intPolyText(neg ? q.map((c) => -c) : q, v), shifted(f, v, i));
    return [neg, body];
  };
  const lhs = term(fit.coeffs[fit.order], fit.order, false)[1];
  let rhs = '';
  for (let i = fit.order - 1; i >= 0; i--) {
    if (fit.coeffs[i].every((c) => c === 0n)) continue;
    const [neg, body] = term(fit.coeffs[i], i, true);
    rhs += rhs === '' ? (neg ? `-${body}` : body) : neg ? ` - ${body}` : ` + ${body}`;
  }
  return `${lhs} == ${rhs === '' ? '0' : rhs}`;
}

export function recurrencePlan(fit: RecurrenceFit, seq: Sequence, f: string): ClaimPlan {
  return {
    variable: 'n',
    first: seq.offset,
    lastFor: (top) => top - fit.order,
    defines: [],
    lets: [],
    claim: recurrenceText(fit, f),
    indeterminates: [],
  };
}

/** The rational generating function sum_{k>=0} a(offset + k) x^k = P(x)/Q(x) of a C-finite fit. */
export function rationalGeneratingFunction(fit: RecurrenceFit, seq: Sequence): { num: Scalar[]; den: bigint[] } {
  const r = fit.order;
  // sum_i c_i a(k + i) = 0 for k >= 0 gives Q(x) = sum_i c_i x^(r-i).
  const den: bigint[] = new Array(r + 1).fill(0n);
  for (let i = 0; i <= r; i++) den[r - i] = fit.coeffs[i][0] ?? 0n;
  if (den[0] < 0n) for (let i = 0; i <= r; i++) den[i] = -den[i];
  const num: Scalar[] = [];
  for (let m = 0; m < r; m++) {
    let s: Scalar = 0;
    for (let i = 0; i <= m; i++) s = addS(s, mulS(den[i], seq.terms[m - i]));
    num.push(s);
  }
  return { num, den };
}

function addS(a: Scalar, b: Scalar): Scalar {
  return sadd(a, b);
}
function mulS(c: bigint, b: Scalar): Scalar {
  return smul(normBig(c), b);
}

export function recurrenceGuess(fit: RecurrenceFit, seq: Sequence, gfText?: string): Guess {
  const constant = fit.degree === 0;
  const notes: string[] = [];
  if (gfText) notes.push(gfText);
  return {
    kind: constant ? 'c-finite' : 'p-recursive',
    title: constant ? `C-finite recurrence, order ${fit.order}` : `P-recursive recurrence, order ${fit.order}, degree ${fit.degree}`,
    formula: recurrenceText(fit, 'a'),
    notes,
    unknowns: (fit.order + 1) * (fit.degree + 1) - 1,
    evidence: { from: seq.offset, determinedTo: fit.determinedTo, confirmedTo: seq.offset + seq.terms.length - 1 },
    plan: (f) => recurrencePlan(fit, seq, f),
  };
}
