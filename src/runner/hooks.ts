// What the runner asks of whoever drives it: when to stop, where to report progress and finished
// pieces. The CLI wires these to the interrupt flag, the progress bar and the ledger.

import type { CheckedPiece } from './result.js';

export type StopReason = 'budget' | 'interrupt';

export interface RunHooks {
  /** Polled every few thousand cases. */
  shouldStop?(): StopReason | null;
  onProgress?(done: number, total: number | null, label: string): void;
  /** Called when a piece of work (a size of a phase) is finished, before the next starts. */
  onPiece?(piece: CheckedPiece): void;
}

/** How many cases pass between polls of shouldStop and onProgress (a power of two, for a mask). */
export const POLL_MASK = 4095;
