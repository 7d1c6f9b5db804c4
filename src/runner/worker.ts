// The worker thread of `hunch check`: the check runs here so that the main thread stays free to
// notice Ctrl-C, draw progress and write records while cases are being evaluated.

import { parentPort, workerData } from 'node:worker_threads';
import '../library/index.js';
import '../families/index.js';
import { decodeValue } from '../values/decode.js';
import { setStationaryProgress } from '../library/markov.js';
import { prepareRun, runSession, type RunRequest } from './session.js';
// The worker is the composition root of its thread, like the CLI of the main one: it opens the
// project (plugins, canonical hash) before compiling, so it may reach up to the records layer.
import { openProjectAt } from '../records/open-project.js';

export type WorkerMessage =
  | { type: 'start'; id: string }
  | { type: 'piece'; id: string; piece: unknown }
  | { type: 'result'; result: unknown }
  | { type: 'progress'; done: number; total: number | null; label: string }
  | { type: 'done' }
  | { type: 'crash'; message: string; stack?: string };

const { request, flag } = workerData as { request: RunRequest; flag: Int32Array };
const post = (m: WorkerMessage) => parentPort!.postMessage(m);

try {
  if (request.root) await openProjectAt(request.root, request.plugins ?? []);
  const compiled = prepareRun(request);
  let lastProgress = 0;
  // A long exact solve inside one case (a stationary measure) reports how far it has got.
  setStationaryProgress((f) => {
    const now = performance.now();
    if (now - lastProgress > 200) {
      lastProgress = now;
      post({ type: 'progress', done: Math.round(f * 1000), total: 1000, label: 'solving for an exact stationary measure' });
    }
  });
  runSession(
    compiled,
    request,
    {
      onStart: (cc) => post({ type: 'start', id: cc.spec.id }),
      onPiece: (cc, piece) => post({ type: 'piece', id: cc.spec.id, piece }),
      onResult: (_cc, result) => post({ type: 'result', result }),
      onProgress: (done, total, label) => {
        const now = performance.now();
        if (now - lastProgress > 100) {
          lastProgress = now;
          post({ type: 'progress', done, total, label });
        }
      },
      interrupted: () => Atomics.load(flag, 0) !== 0,
    },
    decodeValue,
  );
  post({ type: 'done' });
} catch (e) {
  const err = e as Error;
  post({ type: 'crash', message: err?.message ?? String(e), stack: err?.stack });
}
