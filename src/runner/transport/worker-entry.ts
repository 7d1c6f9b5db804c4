// The one worker thread of hunch (every thread of the pool runs this): set up like the main thread
// (the project's plugins, the function library and families), compile the run's conjectures once,
// then run units of work on request. The interrupt flag is shared memory, so a stop reaches a
// running unit at its next poll.

import { parentPort, workerData } from 'node:worker_threads';
import '../../library/index.js';
import '../../families/index.js';
import { setStationaryProgress } from '../../library/markov.js';
import { decodeValue } from '../../values/decode.js';
// This file is the composition root of its thread, like the CLI of the main one: it opens the
// project (hunch.yaml, its plugins) before compiling, so it alone in the runner reaches up to the
// records layer (the layer test allows exactly this import).
import { openProjectAt } from '../../records/open-project.js';
import type { StopReason } from '../hooks.js';
import { checkOptionsFor, prepareRun, type RunRequest } from '../run-request.js';
import { executeUnit, prepareConjecture, type PreparedConjecture } from '../work/units.js';
import { outcomeToWire, type PoolReply, type PoolTask } from './messages.js';

const { request, flag } = workerData as { request: RunRequest; flag: Int32Array };
const post = (m: PoolReply) => parentPort!.postMessage(m);

/** A conjecture this thread could not prepare: the main thread reports the error and sends it no work. */
interface Unprepared {
  error: unknown;
}

async function main(): Promise<void> {
  if (request.root) await openProjectAt(request.root, request.plugins ?? []);
  const prepared: Array<PreparedConjecture | Unprepared> = prepareRun(request).map((c) => {
    try {
      return prepareConjecture(c, checkOptionsFor(request, c, decodeValue));
    } catch (error) {
      return { error };
    }
  });
  let current: number | null = null;
  let lastProgress = 0;
  let lastSolve = 0;
  // A long exact solve inside one case (a stationary measure) reports how far it has got.
  setStationaryProgress((fraction) => {
    const now = performance.now();
    if (now - lastSolve > 200) {
      lastSolve = now;
      post({ t: 'solve', fraction });
    }
  });
  const control = (task: number, deadline: number | null) => ({
    shouldStop: (): StopReason | null =>
      Atomics.load(flag, 0) !== 0 ? 'interrupt' : deadline !== null && Date.now() > deadline ? 'budget' : null,
    onProgress: (visited: number) => {
      const now = performance.now();
      if (now - lastProgress > 100) {
        lastProgress = now;
        post({ t: 'progress', task, visited });
      }
    },
  });
  parentPort!.on('message', (m: PoolTask) => {
    current = m.task;
    try {
      const p = prepared[m.conj];
      if ('error' in p) throw p.error;
      const out = executeUnit(p, m.unit, control(m.task, m.deadline));
      post({ t: 'done', task: m.task, out: outcomeToWire(out) });
    } catch (e) {
      const err = e as Error;
      post({ t: 'crash', task: current, message: err?.message ?? String(e), stack: err?.stack });
    }
  });
  post({ t: 'ready' });
}

main().catch((e) => {
  const err = e as Error;
  post({ t: 'crash', task: null, message: err?.message ?? String(e), stack: err?.stack });
});
