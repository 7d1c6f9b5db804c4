// Guessing a formula, a recurrence or a generating function for a sequence of exact numbers: every
// guesser of this folder in turn, simplest classes first, each guess with the terms that determined
// it and those that confirm it; and, when nothing fits, the list of what was tried on how many terms.

import type { Scalar } from '../../numbers/rational.js';
import { guessAlgebraic } from './algebraic.js';
import { hypergeometricGuess, secondOrderProductGuess } from './hypergeometric.js';
import { guessPolynomial } from './polynomialFit.js';
import { rationalGeneratingFunction, recurrenceGuess, searchRecurrence } from './recurrence.js';
import { factor, ratPolyText, intPolyText } from './text.js';
import { STANDARD_TRANSFORMS, byColumn, type Transform } from './transforms.js';
import {
  MAX_GUESS_TERMS,
  MIN_CONFIRMING_TERMS,
  type Attempt,
  type ClaimPlan,
  type Guess,
  type GuessKind,
  type GuessReport,
  type Sequence,
} from './types.js';

export interface GuessOptions {
  /** Also try a(n)/c(n) for this column, whose function is called `name` in a conjecture. */
  divisor?: { name: string; column: Sequence };
  /** Try the transforms (default true). */
  transforms?: boolean;
}

const KIND_ORDER: GuessKind[] = ['polynomial', 'quasi-polynomial', 'hypergeometric', 'c-finite', 'product', 'p-recursive', 'algebraic'];

function rank(a: Guess, b: Guess): number {
  return (
    a.unknowns - b.unknowns || KIND_ORDER.indexOf(a.kind) - KIND_ORDER.indexOf(b.kind) || (a.transform ? 1 : 0) - (b.transform ? 1 : 0)
  );
}

/** The guesses made on the sequence itself. `light` keeps to closed forms and constant-coefficient recurrences (for transformed sequences). */
function directGuesses(seq: Sequence, light: boolean): { guesses: Guess[]; tried: Attempt[] } {
  const guesses: Guess[] = [];
  const tried: Attempt[] = [];
  const poly = guessPolynomial(seq);
  tried.push(...poly.tried);
  // A polynomial says it all; a quasi-polynomial may still have a simpler recurrence.
  if (poly.guess?.kind === 'polynomial') return { guesses: [poly.guess], tried };
  if (poly.guess) guesses.push(poly.guess);
  const rec = searchRecurrence(seq, light ? { maxOrder: 1 } : {});
  let cFinite = false;
  if (rec.fit) {
    const fit = rec.fit;
    const hyper = fit.order === 1 ? hypergeometricGuess(fit, seq) : null;
    if (hyper) guesses.push(hyper);
    if (fit.degree === 0) {
      cFinite = true;
      const gf = rationalGeneratingFunction(fit, seq);
      const n0 = seq.offset;
      const note = `generating function: sum of a(${n0 === 0 ? 'n' : `n + ${n0}`})*x^n over n >= 0 == ${factor(ratPolyText(gf.num, 'x', true))}/(${intPolyText(gf.den, 'x', true)})`;
      if (!hyper) guesses.push(recurrenceGuess(fit, seq, note));
      else hyper.notes.push(note);
    } else if (!hyper && !light) guesses.push(recurrenceGuess(fit, seq));
  } else if (rec.tried) tried.push(rec.tried);
  if (!light) {
    if (!rec.fit || rec.fit.order > 1) {
      const prod = secondOrderProductGuess(seq);
      if (prod.guess) guesses.push(prod.guess);
      else if (prod.tried) tried.push(prod.tried);
    }
    if (!cFinite) {
      const alg = guessAlgebraic(seq);
      if (alg.guess) guesses.push(alg.guess);
      else if (alg.tried) tried.push(alg.tried);
    }
  }
  return { guesses, tried };
}

/** A guess about the transformed sequence b, restated so that its claim defines b from a. */
function transformed(t: Transform, seq: Sequence, inner: Guess): Guess {
  const rename = (s: string) => s.replace(/\ba\(/g, 'b(');
  const body = t.body('a', seq);
  // A closed form for b(n) reads best with b spelled out, when b is a short expression.
  const inline = inner.formula.startsWith('a(n) == ') && !body.includes(' in ');
  return {
    ...inner,
    title: `${inner.title}, for b(n) = ${t.label}`,
    formula: inline ? `${body} == ${inner.formula.slice('a(n) == '.length)}` : rename(inner.formula),
    notes: inline ? inner.notes.map(rename).map((n) => `${n}, where b(n) = ${body}`) : [`where b(n) = ${body}`, ...inner.notes.map(rename)],
    transform: t.label,
    evidence: {
      from: inner.evidence.from,
      determinedTo: inner.evidence.determinedTo + t.shift,
      confirmedTo: inner.evidence.confirmedTo + t.shift,
    },
    plan: (f): ClaimPlan => {
      const p = inner.plan('b');
      return { ...p, defines: [['b(n)', t.body(f, seq)], ...p.defines], lastFor: (top) => p.lastFor(top - t.shift) };
    },
  };
}

/** Guesses for the sequence, simplest first (at most MAX_GUESS_TERMS terms: callers refuse more). */
export function guessSequence(seq: Sequence, opts: GuessOptions = {}): GuessReport {
  if (seq.terms.length > MAX_GUESS_TERMS) throw new RangeError(`guessing takes at most ${MAX_GUESS_TERMS} terms, not ${seq.terms.length}`);
  const { guesses, tried } = directGuesses(seq, false);
  if (opts.transforms !== false) {
    const best = guesses.length ? Math.min(...guesses.map((g) => g.unknowns)) : Infinity;
    // The standard transforms look for closed forms; all classes are tried on them only when nothing
    // fits the sequence itself, and always on the quotient by a column the user gave.
    const nothingDirect = guesses.length === 0;
    const ts: Array<[Transform, boolean]> = STANDARD_TRANSFORMS.map((t) => [t, !nothingDirect]);
    if (opts.divisor) ts.push([byColumn(opts.divisor.name, opts.divisor.column), false]);
    for (const [t, light] of ts) {
      const b = t.apply(seq);
      if (!b || b.terms.length < 1 + MIN_CONFIRMING_TERMS) continue;
      const inner = directGuesses(b, light);
      // Offered only when simpler than every direct guess and of another kind (differences of a polynomial say nothing new).
      const simpler = inner.guesses.filter((g) => g.unknowns < best && !guesses.some((d) => !d.transform && d.kind === g.kind));
      guesses.push(...simpler.map((g) => transformed(t, seq, g)));
      if (guesses.length === 0)
        tried.push({
          guessClass: `after the transform b(n) = ${t.label}`,
          extent: light ? 'polynomials, C-finite and hypergeometric' : 'every class above',
          terms: b.terms.length,
        });
    }
  }
  guesses.sort(rank);
  return { guesses, tried: guesses.length ? [] : tried, terms: seq.terms.length, offset: seq.offset };
}

export function sequenceOf(terms: readonly Scalar[], offset: number): Sequence {
  return { offset, terms };
}
