// The outcome of checking one conjecture, shaped like CLI.md's result document. Values inside are
// already encoded (encodeValue), so a result can be printed, written to JSON or to the ledger as is.

import type { Expectation } from '../language/conjecture/conjecture.js';
import type { Witness } from '../language/conjecture/witnesses.js';

export type { Expectation, Witness };
export type Outcome = 'holds' | 'fails' | 'error' | 'incomplete';
export type Phase = 'exhaustive' | 'sample' | 'regression';

/** One finished piece of work: a size of a phase (or a slice of it). */
export interface CheckedPiece {
  phase: Phase;
  /** The range bindings' values, first the size: { n: 5 }. */
  size: Record<string, number>;
  cases: number;
  failures: number;
  /** Cases excluded by `where` (counted apart, never as passes). */
  skipped: number;
  /** Wall time in milliseconds (timings are the only floating point). */
  ms: number;
  /** True when a budget or interrupt stopped the piece before its end: then it counts only what it finished. */
  partial?: boolean;
  /** The slice of the work: "3/8", or absent for the whole. */
  shard?: string;
  /** The seed of a sample piece. */
  seed?: string;
}

export interface ErrorInfo {
  message: string;
  file: string | null;
  line: number | null;
  column: number | null;
  /** The bindings of the case in which an evaluation failed (encoded). */
  bindings: Record<string, unknown> | null;
  snippet?: string;
  suggestion?: string;
}

export interface Counterexample {
  phase: Phase;
  size: Record<string, number>;
  bindings: Record<string, unknown>;
  values: Record<string, unknown>;
  /** The two operands of the claim's top comparison, when it has one. */
  sides: [unknown, unknown] | null;
  failuresAtSize: number | null;
  shrinkSteps: number;
  seed: string | null;
  /** Size before shrinking, for sampled cases. */
  shrunkFrom?: Record<string, number>;
  /** The bindings as text in the language, for the human report. */
  text?: Record<string, string>;
  /** What decided the failure: each all/any/min/max on the path to false and its simplest element (CLI.md). */
  witnesses?: Witness[];
}

export interface ConjectureResult {
  id: string;
  file: string;
  hash: string;
  expect: Expectation;
  outcome: Outcome;
  statement?: string;
  /** The claim as written, for reports. */
  claim?: string;
  checked: CheckedPiece[];
  counterexample: Counterexample | null;
  error: ErrorInfo | null;
  /** Total wall time in ms. */
  ms: number;
  /** Why the run is incomplete (budget, interrupt), when it is. */
  stoppedBy?: 'budget' | 'interrupt';
}

/** Whether a result agrees with its expectation (CLI.md exit code 0 vs 1). */
export function agreesWithExpectation(r: ConjectureResult): boolean {
  if (r.outcome === 'error' || r.outcome === 'incomplete') return false;
  if (r.expect === 'fails') return r.outcome === 'fails';
  return r.outcome === 'holds';
}
