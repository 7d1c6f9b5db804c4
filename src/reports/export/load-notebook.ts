// Reading a notebook's state for the exports and the report page: its conjectures as they stand
// now, what the ledger holds for them (src/records/status.ts), and each saved counterexample,
// re-checked here by replaying it (a file is never believed as it stands).

import { basename } from 'node:path';
import { existsSync } from 'node:fs';
import { relative } from 'node:path';
import { InputError } from '../../base/errors.js';
import { loadConjectures } from '../../language/conjecture/load-conjectures.js';
import { counterexamplePath, readCounterexampleFile } from '../../records/counterexample-file.js';
import { conjectureHash } from '../../language/conjecture/conjecture-hash.js';
import { readLedger } from '../../records/ledger.js';
import type { Project } from '../../records/open-project.js';
import { pluginHashes } from '../../records/plugins.js';
import { replayCounterexample, type ReplayResult } from '../../records/replay.js';
import { computeStatus } from '../../records/status.js';
import { TOOL_VERSION } from '../../version.js';
import { counterexampleModel, type CounterexampleModel } from './counterexample-model.js';
import { notebookEntry, type NotebookModel } from './notebook-model.js';

/** Read and replay one counterexample file; a file that cannot be replayed is still shown, saying so. */
export function loadCounterexample(path: string, project: Project | null): CounterexampleModel {
  const f = readCounterexampleFile(path);
  let replay: ReplayResult | null = null;
  let error: string | null = null;
  try {
    replay = replayCounterexample(path, project);
  } catch (e) {
    if (!(e instanceof InputError)) throw e;
    error = e.message;
  }
  return counterexampleModel(f, replay, error);
}

export interface NotebookOptions {
  /** Only this conjecture. */
  id?: string;
  ledger?: string;
  title?: string;
}

export function loadNotebook(
  project: Project,
  paths: readonly string[],
  opts: NotebookOptions = {},
): { model: NotebookModel; warnings: string[] } {
  let specs = loadConjectures(paths.length ? [...paths] : project.config.conjectures);
  if (opts.id !== undefined) {
    specs = specs.filter((s) => s.id === opts.id);
    if (specs.length === 0)
      throw new InputError(`no conjecture with id ${opts.id} in ${paths.join(', ') || project.config.conjectures.join(', ')}`);
  }
  const hashes = pluginHashes();
  const infos = specs.map((s) => ({ id: s.id, file: s.file, expect: s.expect, hash: conjectureHash(s, { pluginHashes: hashes }) }));
  const ledger = readLedger(opts.ledger ?? project.config.ledger);
  const status = computeStatus(infos, ledger.records);
  const entries = status.conjectures.map((s, k) => {
    const path = counterexamplePath(project.root, s.id);
    const cx = existsSync(path) ? { model: loadCounterexample(path, project), file: relative(project.root, path) } : null;
    return notebookEntry(s, specs[k].statement, ledger.records, cx);
  });
  const model: NotebookModel = {
    title: opts.title ?? `Notebook ${basename(project.root)}`,
    generatedAt: new Date()
      .toISOString()
      .replace(/\.\d+Z$/, 'Z')
      .replace('T', ' ')
      .replace('Z', ' UTC'),
    tool: TOOL_VERSION,
    entries,
  };
  return { model, warnings: ledger.warnings };
}
