// Stopping inside one long case. Loops of the language (comprehensions over ranges, lists and
// families) call tick() once per element; every 4096th call asks the poll installed by the runner
// whether the run must stop (budget spent, Ctrl-C, SIGTERM) and if so throws StopSignal. The
// common call is one increment and one mask test, so exhaustive loops keep their speed.

import { StopSignal } from '../../base/errors.js';
import { setIdealStop } from '../../algebra/ideals/stop.js';

export type StopPoll = () => 'budget' | 'interrupt' | null;

let poll: StopPoll | null = null;
let counter = 0;

export function tick(): void {
  if ((++counter & 0xfff) !== 0 || poll === null) return;
  const r = poll();
  if (r) throw new StopSignal(r);
}

/** Run `body` with `p` as the stop poll (restoring the previous one afterwards). */
export function withStopPoll<T>(p: StopPoll | null | undefined, body: () => T): T {
  const before = poll;
  poll = p ?? null;
  // Long ideal computations (Gröbner bases, Hilbert series) poll the same stop between steps.
  setIdealStop(poll === null ? undefined : idealStop);
  try {
    return body();
  } finally {
    poll = before;
    setIdealStop(poll === null ? undefined : idealStop);
  }
}

/** The ideal computations' stop check: throws the run's StopSignal instead of answering true. */
function idealStop(): boolean {
  const r = poll?.() ?? null;
  if (r) throw new StopSignal(r);
  return false;
}
