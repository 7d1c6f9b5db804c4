// What `hunch check` records, in one object the command drives: the ledger line of every finished
// piece, the counterexample file of every failure, the regression cases to try first. Records are
// written from the main thread only.

import type { CompiledConjecture } from '../language/conjecture/compiled.js';
import type { CheckedPiece, ConjectureResult } from '../runner/result.js';
import { counterexamplePath, readRegressionEncoded, writeCounterexampleFile } from './counterexample-file.js';
import { checkWritablePath } from './atomic-write.js';
import { LedgerWriter } from './ledger.js';
import type { Project } from './open-project.js';
import { pluginsUsedBy } from './plugins.js';
import { readProjectConfig } from './config.js';
import { findProjectRoot } from './project-root.js';

export interface CheckRecorder {
  /** Encoded binding values in `for` order, by conjecture id, from counterexamples/<id>.yaml. */
  regressionCases(compiled: CompiledConjecture[]): Record<string, unknown[]>;
  piece(id: string, piece: CheckedPiece): void;
  /** Record a finished result; returns the path of its counterexample file, if there is one. */
  result(r: ConjectureResult): string | null;
  /** Messages for standard error (a damaged saved counterexample, ...). */
  warnings: string[];
  close(): void;
}

export interface RecorderOptions {
  /** --ledger PATH (string), default (true) or --no-ledger (false). */
  ledger: string | boolean;
  /** Write counterexample files (default true; independent of the ledger). */
  counterexamples?: boolean;
}

export function createCheckRecorder(project: Project, compiled: CompiledConjecture[], opts: RecorderOptions): CheckRecorder {
  const byId = new Map(compiled.map((cc) => [cc.spec.id, cc]));
  const ledgerPath = opts.ledger === false ? null : typeof opts.ledger === 'string' ? opts.ledger : project.config.ledger;
  // The project's ledger must really lie inside the project; one the user named on the command line may lie anywhere.
  const writer = ledgerPath ? new LedgerWriter(ledgerPath, undefined, typeof opts.ledger === 'string' ? undefined : project.root) : null;
  // A counterexample file that would be written through a link or outside the project.
  if (opts.counterexamples !== false)
    for (const cc of compiled)
      checkWritablePath(counterexamplePath(project.root, cc.spec.id), { within: project.root, what: 'the counterexample file' });
  writer?.open(); // a ledger that cannot be written is reported before any work is done
  const warnings: string[] = [];
  return {
    warnings,
    regressionCases(list) {
      const out: Record<string, unknown[]> = {};
      for (const cc of list) {
        const enc = readRegressionEncoded(project.root, cc.spec, (m) => warnings.push(m), cc.hash);
        if (enc) out[cc.spec.id] = enc;
      }
      return out;
    },
    piece(id, piece) {
      const cc = byId.get(id);
      if (!cc || !writer || piece.partial) return;
      writer.piece(id, cc.hash, piece);
    },
    result(r) {
      const cc = byId.get(r.id);
      if (cc) writer?.result({ ...r, hash: cc.hash });
      if (!cc || !r.counterexample || opts.counterexamples === false) return null;
      // The main thread's hash (canonical, with plugins) is the one the ledger uses.
      return writeCounterexampleFile(project.root, cc.spec, { ...r, hash: cc.hash }, pluginsUsedBy(cc.spec));
    },
    close() {
      writer?.close();
    },
  };
}

/** A project opened without its plugins (for callers that cannot wait; plugins need openProject). */
export function projectWithoutPlugins(start: string): Project {
  const root = findProjectRoot(start);
  return { root, config: readProjectConfig(root), plugins: [], skipped: null };
}
