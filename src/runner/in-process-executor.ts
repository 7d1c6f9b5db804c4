// The in-process executor: drives the phase engine in this thread, one unit of work after another
// (the library API, and tests). Sizes run as plain enumerations unless a shard or --resume needs
// their slices.

import type { CompiledConjecture } from '../language/conjecture/compiled.js';
import type { CheckOptions } from './check-options.js';
import type { RunHooks } from './hooks.js';
import { PhaseEngine } from './phase-engine.js';
import type { ConjectureResult } from './result.js';
import { executeUnit } from './work/units.js';

export function checkConjecture(compiled: CompiledConjecture, opts: CheckOptions, hooks: RunHooks): ConjectureResult {
  const engine = new PhaseEngine(compiled, opts, hooks, { sliceSizes: false });
  while (engine.advance()) {
    for (let t = engine.next(); t; t = engine.next()) {
      const ticket = t;
      engine.accept(
        ticket,
        executeUnit(engine.prepared, ticket.unit, {
          shouldStop: hooks.shouldStop,
          onProgress: (visited) => engine.progress(ticket, visited),
        }),
      );
    }
  }
  return engine.result();
}
