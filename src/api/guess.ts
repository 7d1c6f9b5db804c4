// Guessing from the library: tabulate an expression (or take a list of terms), guess, and turn
// chosen guesses into the text of a conjecture file.

import '../families/index.js';
import '../library/index.js';
import { InputError } from '../base/errors.js';
import { guessSequence, MAX_GUESS_TERMS, type Guess, type GuessReport } from '../algebra/guessing/index.js';
import type { Scalar } from '../numbers/rational.js';
import { guessConjectureFile, type GuessOrigin } from '../reports/guess-conjecture.js';
import { scalarColumn, tabulate } from '../reports/tabulate.js';

export interface GuessResult extends GuessReport {
  origin: GuessOrigin;
  /** The text of a conjecture file for the guesses with these ranks (1-based; all by default), checked up to `to`. */
  conjectureFile(opts?: { ranks?: number[]; to?: number; idPrefix?: string }): string;
}

function result(report: GuessReport, origin: GuessOrigin): GuessResult {
  return {
    ...report,
    origin,
    conjectureFile: (opts = {}) => {
      const ranks = opts.ranks ?? report.guesses.map((_, i) => i + 1);
      const picked = ranks.map((k) => ({ rank: k, guess: report.guesses[k - 1] as Guess }));
      return guessConjectureFile(picked, origin, { to: opts.to ?? origin.hi + 1, idPrefix: opts.idPrefix ?? 'guess' });
    },
  };
}

/** Guesses for EXPR over name = lo..hi (the expression is evaluated as `hunch table` does). */
export function guessExpression(expr: string, name: string, lo: number, hi: number): GuessResult {
  if (hi - lo + 1 > MAX_GUESS_TERMS) throw new InputError(`guessing takes at most ${MAX_GUESS_TERMS} terms, not ${hi - lo + 1}`);
  const terms = scalarColumn(tabulate(expr, name, lo, hi), name, expr);
  return result(guessSequence({ offset: lo, terms }), { expr, variable: name, lo, hi });
}

/** Guesses for the terms a(offset), a(offset + 1), ... */
export function guessTerms(terms: readonly Scalar[], offset = 0): GuessResult {
  if (terms.length > MAX_GUESS_TERMS) throw new InputError(`guessing takes at most ${MAX_GUESS_TERMS} terms, not ${terms.length}`);
  return result(guessSequence({ offset, terms }), { variable: 'n', lo: offset, hi: offset + terms.length - 1, terms });
}
