// A finite Markov chain in compressed sparse rows: states 0..size-1, row s lists the targets t with
// a positive weight w(s, t); P(s, t) = w(s, t) / total(s). Weights are exact (Int or Rat).

import { fail } from '../../base/errors.js';
import { isScalar, Rat, type Scalar } from '../../numbers/rational.js';
import { sadd, scmp, sisZero } from '../../numbers/scalar.js';

export interface SparseChain {
  readonly size: number;
  /** Row s occupies indices rowStart[s] .. rowStart[s+1]-1 of `target` and `weight`. */
  readonly rowStart: Int32Array;
  readonly target: Int32Array;
  /** Positive exact weights, one per entry; a target appears at most once per row. */
  readonly weight: readonly Scalar[];
  /** The sum of row s's weights (positive). */
  readonly total: readonly Scalar[];
}

/** Prints a state for messages (its value in the language's syntax, or just its number). */
export type Describe = (state: number) => string;

export const describeByNumber: Describe = (s) => `state ${s + 1}`;

function weightText(w: unknown): string {
  if (isScalar(w)) return w.toString();
  if (typeof w === 'string') return JSON.stringify(w);
  if (w && typeof w === 'object' && typeof (w as { toText?: unknown }).toText === 'function') {
    return (w as { toText(): string }).toText();
  }
  return String(w);
}

/**
 * Builds a chain from its rows: row(s) gives the moves [target, weight] out of s. Repeated targets
 * add up, zero weights are dropped. Fails, naming the state, on a weight that is not an exact
 * number, on a negative weight, on a target outside 0..size-1, and on a state with no move.
 */
export function buildChain(
  size: number,
  row: (s: number) => Iterable<readonly [number, unknown]>,
  describe: Describe = describeByNumber,
): SparseChain {
  const rowStart = new Int32Array(size + 1);
  const targets: number[] = [];
  const weights: Scalar[] = [];
  const total: Scalar[] = new Array(size);
  const slot = new Int32Array(size).fill(-1); // slot[t] = index of t in the current row, or -1
  for (let s = 0; s < size; s++) {
    const start = targets.length;
    for (const [t, w] of row(s)) {
      if (!isScalar(w)) {
        fail(
          `the move from ${describe(s)} to ${describe(t)} has weight ${weightText(w)}, which is not a number; weights must be nonnegative integers or rationals`,
        );
      }
      if (scmp(w, 0) < 0) {
        fail(`the move from ${describe(s)} to ${describe(t)} has the negative weight ${w.toString()}; weights must be nonnegative`);
      }
      if (!Number.isInteger(t) || t < 0 || t >= size) fail(`a move from ${describe(s)} leads outside the chain`);
      if (sisZero(w)) continue;
      if (slot[t] >= 0) weights[slot[t]] = sadd(weights[slot[t]], w);
      else {
        slot[t] = targets.length;
        targets.push(t);
        weights.push(w);
      }
    }
    let sum: Scalar = 0;
    for (let k = start; k < targets.length; k++) {
      slot[targets[k]] = -1;
      sum = sadd(sum, weights[k]);
    }
    if (sisZero(sum)) {
      fail(`${describe(s)} has no move of positive weight; a state that stays put needs the move [s, 1]`);
    }
    total[s] = sum;
    rowStart[s + 1] = targets.length;
  }
  return { size, rowStart, target: Int32Array.from(targets), weight: weights, total };
}

/** The chain restricted to a closed set of states (given in order; index i is states[i]). */
export function restrictChain(c: SparseChain, states: readonly number[]): SparseChain {
  const local = new Int32Array(c.size).fill(-1);
  states.forEach((s, i) => (local[s] = i));
  const rowStart = new Int32Array(states.length + 1);
  const target: number[] = [];
  const weight: Scalar[] = [];
  const total: Scalar[] = [];
  states.forEach((s, i) => {
    for (let k = c.rowStart[s]; k < c.rowStart[s + 1]; k++) {
      const t = local[c.target[k]];
      if (t < 0) throw new Error('restrictChain: the set of states is not closed');
      target.push(t);
      weight.push(c.weight[k]);
    }
    total.push(c.total[s]);
    rowStart[i + 1] = target.length;
  });
  return { size: states.length, rowStart, target: Int32Array.from(target), weight, total };
}

export { Rat };
