// Running `hunch check` off the main thread, so that the main thread stays free for Ctrl-C, the
// progress line and the records: a pool of K worker threads (K = 1 with --workers 1) and the
// pool executor, conjecture after conjecture.

import { availableParallelism } from 'node:os';
import type { CompiledConjecture } from '../language/conjecture/compiled.js';
import { decodeValue } from '../values/decode.js';
import { checkConjectureOnPool } from './pool-executor.js';
import type { CheckedPiece, ConjectureResult } from './result.js';
import { checkOptionsFor, type RunRequest } from './run-request.js';
import { WorkerPool } from './transport/pool.js';

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
  const pool = new WorkerPool(Math.max(1, workers), req, flag);
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
        const r = await checkConjectureOnPool(
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
