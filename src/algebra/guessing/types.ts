// What a guesser returns: a formula or relation in the language's notation, the terms that found it
// and the terms that confirm it, and a plan for a conjecture that checks it on more terms.

import type { Scalar } from '../../numbers/rational.js';

/** At least this many terms beyond those that determined a guess must agree before it is offered. */
export const MIN_CONFIRMING_TERMS = 3;

/** Guessing takes at most this many terms (more would only slow the search: the unknowns are bounded below). */
export const MAX_GUESS_TERMS = 200;

/** No guess has more unknowns than this (a recurrence of order r and degree d has (r+1)(d+1) - 1). */
export const MAX_UNKNOWNS = 64;

/** A sequence a(offset), a(offset + 1), ... of exact numbers. */
export interface Sequence {
  offset: number;
  terms: readonly Scalar[];
}

/** Term indices n (not positions): the guess was determined by a(from..determinedTo) and agrees on a(determinedTo + 1..confirmedTo). */
export interface Evidence {
  from: number;
  determinedTo: number;
  confirmedTo: number;
}

export type GuessKind = 'polynomial' | 'quasi-polynomial' | 'hypergeometric' | 'product' | 'c-finite' | 'p-recursive' | 'algebraic';

/** How to state the guess as a checkable claim, given the name of the sequence's function. */
export interface ClaimPlan {
  /** The range variable of the conjecture. */
  variable: string;
  /** Its first value. */
  first: number;
  /** Its last value when terms up to index `top` may be computed. */
  lastFor(top: number): number;
  /** Definitions the claim needs besides the sequence's own (header, body), e.g. a transformed sequence. */
  defines: Array<[string, string]>;
  lets: Array<[string, string]>;
  claim: string;
  indeterminates: string[];
}

export interface Guess {
  kind: GuessKind;
  /** e.g. "P-recursive recurrence, order 2, degree 1". */
  title: string;
  /** The guess as an expression (a relation, a closed form or an equation), writing the sequence as a(n). */
  formula: string;
  /** Further facts that come with it (a generating function, the recurrence behind a product). */
  notes: string[];
  /** How many numbers the guess is made of (what the terms had to determine); fewer is simpler. */
  unknowns: number;
  evidence: Evidence;
  /** The transform applied before guessing, if any (e.g. "a(n)/n!"). */
  transform?: string;
  plan(f: string): ClaimPlan;
}

/** One class the search tried, for the report of what was looked for. */
export interface Attempt {
  guessClass: string;
  /** e.g. "degree <= 4", "order <= 3 with degree <= 2". */
  extent: string;
  terms: number;
}

export interface GuessReport {
  guesses: Guess[];
  tried: Attempt[];
  terms: number;
  offset: number;
}
