// Guessing formulas, recurrences and generating functions for sequences of exact numbers.

export * from './types.js';
export { guessSequence, sequenceOf, type GuessOptions } from './guess.js';
export { fitRecurrence, recurrenceCandidates, searchRecurrence, recurrenceText, type RecurrenceFit } from './recurrence.js';
export { fitAlgebraic, algebraicText, type AlgebraicFit } from './algebraic.js';
export { fitQuasiPolynomial, type QuasiPolynomialFit } from './polynomialFit.js';
export { factorialRatio, type FactorialForm } from './factorialForm.js';
export { rationalRoots } from './roots.js';
