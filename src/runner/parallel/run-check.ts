// Starting the work of `hunch check` off the main thread, so that the main thread stays free for
// Ctrl-C, the progress line and the records: one worker running the whole session (--workers 1,
// the in-process runner) or a pool of K workers sharing every size (src/runner/parallel/).

import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import type { CompiledConjecture } from '../../language/conjecture/compiled.js';
import { decodeValue } from '../../values/decode.js';
import type { CheckedPiece, ConjectureResult } from '../result.js';
import { checkOptionsFor, type RunRequest } from '../session.js';
import type { WorkerMessage } from '../worker.js';
import { checkConjectureParallel } from './check-parallel.js';
import { WORKER_LIMITS, WorkerPool } from './pool.js';

export interface RunHandlers {
  onStart?(id: string): void;
  onPiece(id: string, piece: CheckedPiece): void;
  onResult(r: ConjectureResult): void;
  onProgress(done: number, total: number | null, label: string): void;
}

export interface CheckRun {
  /** Resolves when the run ends: null, or the message of an internal error. */
  finished: Promise<string | null>;
  /** Stop at once (a second Ctrl-C). */
  kill(): void;
}

/** --workers, else HUNCH_WORKERS, else the number of cores. */
export function workerCount(flag: number | undefined): number {
  if (flag !== undefined) return Math.max(1, flag);
  const env = process.env.HUNCH_WORKERS;
  if (env && /^[1-9][0-9]*$/.test(env.trim())) return Number(env.trim());
  return Math.max(1, availableParallelism());
}

export function startCheckRun(
  compiled: CompiledConjecture[],
  req: RunRequest,
  workers: number,
  flag: Int32Array,
  h: RunHandlers,
): CheckRun {
  return workers <= 1 ? singleWorker(req, flag, h) : pooled(compiled, req, workers, flag, h);
}

function singleWorker(req: RunRequest, flag: Int32Array, h: RunHandlers): CheckRun {
  const worker = new Worker(new URL('../worker.js', import.meta.url), { workerData: { request: req, flag }, resourceLimits: WORKER_LIMITS });
  let crash: string | null = null;
  const finished = new Promise<string | null>((resolve) => {
    worker.on('message', (m: WorkerMessage) => {
      switch (m.type) {
        case 'start':
          h.onStart?.(m.id);
          break;
        case 'progress':
          h.onProgress(m.done, m.total, m.label);
          break;
        case 'piece':
          h.onPiece(m.id, m.piece as CheckedPiece);
          break;
        case 'result':
          h.onResult(m.result as ConjectureResult);
          break;
        case 'crash':
          crash = m.message + (process.env.HUNCH_DEBUG && m.stack ? `\n${m.stack}` : '');
          break;
        case 'done':
          break;
      }
    });
    worker.on('error', (e) => {
      crash = e.message;
    });
    worker.on('exit', () => resolve(crash));
  });
  return { finished, kill: () => void worker.terminate() };
}

function pooled(compiled: CompiledConjecture[], req: RunRequest, workers: number, flag: Int32Array, h: RunHandlers): CheckRun {
  const pool = new WorkerPool(workers, req, flag);
  pool.onSolve = (f) => h.onProgress(Math.round(f * 1000), 1000, 'solving for an exact stationary measure');
  let killed = false;
  const interrupted = () => Atomics.load(flag, 0) !== 0;
  const finished = (async (): Promise<string | null> => {
    try {
      await pool.ready(); // so a conjecture's time does not include starting the threads
      if (pool.crashed) return pool.crashed;
      for (let index = 0; index < compiled.length; index++) {
        if (interrupted()) break;
        const cc = compiled[index];
        h.onStart?.(cc.spec.id);
        const deadline = req.budgetMs === null ? null : Date.now() + req.budgetMs;
        const r = await checkConjectureParallel(
          cc,
          checkOptionsFor(req, cc, decodeValue),
          {
            shouldStop: () => (interrupted() ? 'interrupt' : deadline !== null && Date.now() > deadline ? 'budget' : null),
            onProgress: h.onProgress,
            onPiece: (p) => h.onPiece(cc.spec.id, p),
          },
          { pool, index, deadline },
        );
        if (killed) break;
        h.onResult(r);
      }
      return null;
    } catch (e) {
      return killed ? null : ((e as Error)?.message ?? String(e));
    } finally {
      await pool.close();
    }
  })();
  return {
    finished,
    kill: () => {
      killed = true;
      void pool.close();
    },
  };
}
