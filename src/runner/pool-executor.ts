// The worker-pool executor: drives the phase engine from the main thread, keeping every worker
// busy with units of work; the engine takes the outcomes back in size order, so the result is the
// same whatever the number of workers: the same counts, the same simplest counterexample, the same
// sampled cases.

import type { CompiledConjecture } from '../language/conjecture/compiled.js';
import type { CheckOptions } from './check-options.js';
import type { RunHooks } from './hooks.js';
import { PhaseEngine } from './phase-engine.js';
import type { ConjectureResult } from './result.js';
import type { WorkerPool } from './transport/pool.js';

export interface PoolContext {
  pool: WorkerPool;
  /** The conjecture's index in the run (the workers compiled the same list). */
  index: number;
  /** Absolute time (Date.now()) after which the budget stops the conjecture, or null. */
  deadline: number | null;
}

export async function checkConjectureOnPool(
  compiled: CompiledConjecture,
  opts: CheckOptions,
  hooks: RunHooks,
  ctx: PoolContext,
): Promise<ConjectureResult> {
  const { pool } = ctx;
  // A single worker runs whole sizes, one at a time (a size started ahead of a failure would be
  // wasted). Several workers share sliced sizes, two lanes each, so every worker has its next unit
  // queued when it finishes one and never waits for a round trip through the main thread.
  const single = pool.size === 1;
  const engine = new PhaseEngine(compiled, opts, hooks, { sliceSizes: !single });
  const lanes = single ? 1 : 2 * pool.size;
  while (engine.advance()) {
    await Promise.all(
      Array.from({ length: lanes }, async (_, lane) => {
        for (let t = engine.next(); t; t = engine.next()) {
          const ticket = t;
          const o = await pool.runUnit(lane, ctx.index, ticket.unit, ctx.deadline, (visited) => engine.progress(ticket, visited));
          engine.accept(ticket, o);
        }
      }),
    );
  }
  return engine.result();
}
