// What `hunch check` records: ledger lines for finished pieces, counterexample files, JUnit.
// (The records layer does the work; this file only wires it to the command.)

import type { CompiledConjecture } from '../../language/conjecture/compiled.js';
import { createCheckRecorder, projectWithoutPlugins, type CheckRecorder } from '../../records/check-recorder.js';
import { installConjectureHash } from '../../records/plugins.js';

export type { CheckRecorder };

// The canonical conjecture hash, installed before anything is compiled in this thread.
// TODO(lead): replace by `await openProject(paths[0])` in runCheck (and openProjectAt(root) in the
// worker) so that hunch.yaml's plugins are loaded and their file hashes enter the hash.
installConjectureHash();

export function checkRecorder(ledger: string | boolean, compiled: CompiledConjecture[]): CheckRecorder {
  const start = compiled[0]?.spec.file ?? process.cwd();
  return createCheckRecorder(projectWithoutPlugins(start), compiled, { ledger });
}
