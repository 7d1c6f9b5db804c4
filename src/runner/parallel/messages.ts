// The messages between the main thread and the pool's worker threads (plain data only).

import type { ErrorInfo, Counterexample } from '../result.js';
import type { StopReason } from '../hooks.js';

export type PoolTask =
  /** Cases [lo, hi) of a size (decimal strings: sizes reach beyond 2^53 cases); null: the whole size. */
  | { t: 'slice'; task: number; conj: number; size: number | null; lo: string | null; hi: string | null; deadline: number | null }
  /** Chunk `chunk` of a sampled size. */
  | { t: 'chunk'; task: number; conj: number; size: number; chunk: number; quota: number; deadline: number | null }
  /** Re-draw a chunk's failing case, shrink it and explain it. */
  | { t: 'shrink'; task: number; conj: number; size: number; chunk: number; quota: number; deadline: number | null };

export interface WireSlice {
  cases: number;
  failures: number;
  skipped: number;
  /** The simplest failing case: encoded values in `for` order, and encoded bindings by name. */
  bestValues: unknown[] | null;
  bestBindings: Record<string, unknown> | null;
  fault: ErrorInfo | null;
  stopped: StopReason | null;
  ms: number;
}

export interface WireChunk {
  cases: number;
  failures: number;
  skipped: number;
  failed: boolean;
  fault: ErrorInfo | null;
  stopped: StopReason | null;
  ms: number;
}

export type PoolReply =
  | { t: 'ready' }
  | { t: 'slice'; task: number; out: WireSlice }
  | { t: 'chunk'; task: number; out: WireChunk }
  | { t: 'shrink'; task: number; out: Counterexample | null }
  | { t: 'progress'; task: number; visited: number }
  /** How far a long exact solve (a stationary measure) inside the current case has got, 0..1. */
  | { t: 'solve'; fraction: number }
  | { t: 'crash'; task: number | null; message: string; stack?: string };
