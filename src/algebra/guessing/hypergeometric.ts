// Hypergeometric terms (a(n+1)/a(n) a rational function of n, i.e. a recurrence of order 1) as
// products of factorials and powers, or as a product the language evaluates when the roots are not
// all rational; and "second-order" products such as the alternating sign matrix numbers, whose
// successive ratios a(n+1)/a(n) are themselves hypergeometric.

import { makeRat, type Scalar } from '../../numbers/rational.js';
import { sdiv, seq as sEq, sisZero, smul } from '../../numbers/scalar.js';
import { completeForm, evaluateForm, factorialFormText, factorialRatio, type FactorialForm } from './factorialForm.js';
import { recurrenceCandidates, searchRecurrence, recurrenceText, type RecurrenceFit } from './recurrence.js';
import { rationalRoots } from './roots.js';
import { comprehension, evalIntPoly, factor, intPolyText, scalarFactor, times } from './text.js';
import { type Attempt, type Guess, type Sequence } from './types.js';

export interface HypergeometricForm {
  /** a(n) for n >= offset, in the variable given to `text`. */
  text(v: string): string;
  /** The factorial form, when the roots allowed one. */
  factorial: FactorialForm | null;
}

/** Whether p has an integer root >= from (where the ratio would be undefined). */
function vanishesFrom(p: bigint[], from: number, roots: Scalar[] | null): boolean {
  if (roots) return roots.some((r) => typeof r !== 'object' && Number(r) >= from);
  return false;
}

/**
 * The closed form of a sequence with p1(n) a(n+1) + p0(n) a(n) = 0 from a(n0) on; null when p1 or
 * p0 vanishes at an integer >= n0 (the recurrence does not then determine the terms by a product).
 */
export function hypergeometricForm(fit: RecurrenceFit, a0: Scalar, n0: number): HypergeometricForm | null {
  const [p0, p1] = fit.coeffs;
  const f0 = rationalRoots(p0),
    f1 = rationalRoots(p1);
  if (vanishesFrom(p1, n0, f1?.roots ?? null) || vanishesFrom(p0, n0, f0?.roots ?? null)) return null;
  if (!f0 || !f1) {
    // Some root is irrational: check the integers in range directly.
    for (let k = n0; k < n0 + 200; k++) if (evalIntPoly(p1, BigInt(k)) === 0n || evalIntPoly(p0, BigInt(k)) === 0n) return null;
  }
  let factorial: FactorialForm | null = null;
  if (f0 && f1) {
    // a(k+1)/a(k) = -p0(k)/p1(k) = (-lead0/lead1) prod (k - root0) / prod (k - root1).
    const c = makeRat(-f0.lead, f1.lead);
    const roots = [...f0.roots.map((r) => ({ s: negS(r), e: 1 })), ...f1.roots.map((r) => ({ s: negS(r), e: -1 }))];
    const ratio = factorialRatio(c, roots);
    if (ratio) factorial = completeForm(a0, n0, ratio);
  }
  const ratioText = (v: string) => {
    const num = intPolyText(
      p0.map((x) => -x),
      v,
    );
    const den = intPolyText(p1, v);
    return den === '1' ? num : `${factor(num)}/${factor(den)}`;
  };
  return {
    factorial,
    text: (v) =>
      factorial
        ? factorialFormText(factorial, v)
        : times(scalarFactor(a0), comprehension('product', ratioText('k'), 'k', `${n0}..${v} - 1`)),
  };
}

function negS(s: Scalar): Scalar {
  return smul(s, -1);
}

/** Whether the closed form gives every term (the factorial form is checked exactly; the product is the recurrence itself). */
function formAgrees(form: HypergeometricForm, seq: Sequence): boolean {
  if (!form.factorial) return true;
  const cache = new Map<number, bigint>();
  return seq.terms.every((t, i) => {
    const v = evaluateForm(form.factorial!, seq.offset + i, cache);
    return v !== null && sEq(v, t);
  });
}

/** The guess from an order-1 recurrence: the closed form, with the recurrence as a note. */
export function hypergeometricGuess(fit: RecurrenceFit, seq: Sequence): Guess | null {
  if (fit.order !== 1 || seq.terms.length === 0 || sisZero(seq.terms[0])) return null;
  const form = hypergeometricForm(fit, seq.terms[0], seq.offset);
  if (!form || !formAgrees(form, seq)) return null;
  const closed = form.text('n');
  return {
    kind: 'hypergeometric',
    title: form.factorial ? 'hypergeometric: a product of factorials and powers' : 'hypergeometric: a product of a rational function',
    formula: `a(n) == ${closed}`,
    notes: [`from the recurrence ${recurrenceText(fit, 'a')}`],
    unknowns: (fit.degree + 1) * 2 - 1,
    evidence: { from: seq.offset, determinedTo: fit.determinedTo, confirmedTo: seq.offset + seq.terms.length - 1 },
    plan: (f) => ({
      variable: 'n',
      first: seq.offset,
      lastFor: (top) => top,
      defines: [],
      lets: [],
      claim: `${f}(n) == ${closed}`,
      indeterminates: [],
    }),
  };
}

/**
 * a(n) = a(n0) * prod_{k=n0}^{n-1} b(k) where b(k) = a(k+1)/a(k) is hypergeometric with a factorial
 * form: the products of factorials over k such as the alternating sign matrix numbers.
 */
export function secondOrderProductGuess(seq: Sequence): { guess: Guess | null; tried: Attempt | null } {
  const a = seq.terms;
  if (a.length < 3 || a.some(sisZero)) return { guess: null, tried: null };
  const b: Scalar[] = [];
  for (let i = 0; i + 1 < a.length; i++) b.push(sdiv(a[i + 1], a[i]));
  const bseq: Sequence = { offset: seq.offset, terms: b };
  const { fit, tried } = searchRecurrence(bseq, { maxOrder: 1 });
  if (!fit) {
    const maxD = Math.max(...recurrenceCandidates(b.length, { maxOrder: 1 }).map((c) => c[1]));
    return {
      guess: null,
      tried: tried && {
        guessClass: 'products of hypergeometric ratios',
        extent: `a(n+1)/a(n) with a ratio of degree <= ${maxD}`,
        terms: a.length,
      },
    };
  }
  const form = hypergeometricForm(fit, b[0], seq.offset);
  if (!form || !form.factorial || !formAgrees(form, bseq)) return { guess: null, tried: null };
  const body = form.text('k');
  const closed = times(scalarFactor(a[0]), comprehension('product', body, 'k', `${seq.offset}..n - 1`));
  return {
    guess: {
      kind: 'product',
      title: 'product over k of a hypergeometric ratio',
      formula: `a(n) == ${closed}`,
      notes: [`the ratio a(n + 1)/a(n) == ${form.text('n')}`],
      unknowns: (fit.degree + 1) * 2,
      evidence: { from: seq.offset, determinedTo: fit.determinedTo + 1, confirmedTo: seq.offset + a.length - 1 },
      plan: (f) => ({
        variable: 'n',
        first: seq.offset,
        lastFor: (top) => top,
        defines: [],
        lets: [],
        claim: `${f}(n) == ${closed}`,
        indeterminates: [],
      }),
    },
    tried: null,
  };
}
