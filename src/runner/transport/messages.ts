// The messages between the main thread and the pool's worker threads (plain data only), and the
// conversion of units and outcomes to and from them: values travel encoded (CLI.md), and a sampled
// failing case stays in the thread that drew it (the shrink unit draws it again).

import { decodeValue } from '../../values/decode.js';
import { encodeValue } from '../../values/operations.js';
import type { Value } from '../../values/value.js';
import type { Counterexample, ErrorInfo } from '../result.js';
import type { ChunkOutcome, SliceOutcome, UnitOutcome, WorkUnit } from '../work/units.js';

/** A unit as sent: a shrink unit without its failing case. */
export type WireUnit = WorkUnit;

export interface PoolTask {
  task: number;
  /** The conjecture's index in the run (every worker compiled the same list). */
  conj: number;
  unit: WireUnit;
  /** Absolute time (Date.now()) after which the budget stops the unit, or null. */
  deadline: number | null;
}

export type WireSlice = Omit<SliceOutcome, 'best'> & { bestValues: unknown[] | null };
export type WireChunk = Omit<ChunkOutcome, 'failing'>;
export type WireOutcome = WireSlice | WireChunk | { kind: 'shrink'; counterexample: Counterexample | null };

export type PoolReply =
  | { t: 'ready' }
  | { t: 'done'; task: number; out: WireOutcome }
  | { t: 'progress'; task: number; visited: number }
  /** How far a long exact solve (a stationary measure) inside the current case has got, 0..1. */
  | { t: 'solve'; fraction: number }
  | { t: 'crash'; task: number | null; message: string; stack?: string };

export function unitToWire(u: WorkUnit): WireUnit {
  if (u.kind !== 'shrink') return u;
  const { failing: _dropped, ...rest } = u;
  return rest;
}

export function outcomeToWire(o: UnitOutcome): WireOutcome {
  switch (o.kind) {
    case 'slice': {
      const { best, ...rest } = o;
      return { ...rest, bestValues: best ? best.map(encodeValue) : null };
    }
    case 'chunk': {
      const { failing: _stays, ...rest } = o;
      return rest;
    }
    default:
      return o;
  }
}

export function outcomeFromWire(w: WireOutcome): UnitOutcome {
  switch (w.kind) {
    case 'slice': {
      const { bestValues, ...rest } = w as WireSlice;
      return { ...rest, best: bestValues ? (bestValues.map(decodeValue) as Value[]) : null };
    }
    case 'chunk':
      return { ...(w as WireChunk), failing: null };
    default:
      return w as UnitOutcome;
  }
}

export type { ErrorInfo };
