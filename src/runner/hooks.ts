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

/** At most this many cases pass between polls of shouldStop and onProgress (a power of two minus 1). */
export const POLL_MASK = 4095;

/**
 * When to poll: after every case at first, then less and less often while polls come quickly (up
 * to every POLL_MASK + 1 cases), and more often again when they come slowly — so a budget or a
 * Ctrl-C is noticed within a fraction of a second whether a case takes a microsecond or a second,
 * and the fast loop pays for a clock read only every few thousand cases.
 */
export class Poller {
  private mask = 0;
  private count = 0;
  private last = performance.now();

  due(): boolean {
    if ((++this.count & this.mask) !== 0) return false;
    const now = performance.now();
    const dt = now - this.last;
    this.last = now;
    if (dt < 5) {
      if (this.mask < POLL_MASK) this.mask = this.mask * 2 + 1;
    } else if (dt > 50 && this.mask > 0) this.mask >>= 1;
    return true;
  }
}
