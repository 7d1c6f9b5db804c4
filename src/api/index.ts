// The library entry point: load conjecture files, check them, read the results — and a helper that
// turns a folder of conjectures into one vitest test per conjecture.
//
//   import { describe, test, expect } from 'vitest';
//   import { defineConjectureTests } from 'hunch';
//   defineConjectureTests('conjectures/', { describe, test, expect });

import { Chalk } from 'chalk';
import { statSync } from 'node:fs';
import '../families/index.js';
import '../library/index.js';
import { InputError } from '../base/errors.js';
import type { CompiledConjecture } from '../language/conjecture/compiled.js';
import { compileConjecture } from '../language/conjecture/compile-conjecture.js';
import type { ConjectureSpec } from '../language/conjecture/conjecture.js';
import { loadConjectures } from '../language/conjecture/load-conjectures.js';
import type { CheckOptions } from '../runner/check-options.js';
import { checkConjecture } from '../runner/in-process-executor.js';
import type { RunHooks } from '../runner/hooks.js';
import { agreesWithExpectation, type ConjectureResult } from '../runner/result.js';
import { formatResult } from '../reports/human.js';
import { readRegressionCase } from '../records/counterexample-file.js';
import { LedgerWriter } from '../records/ledger.js';
import { explainSkippedPlugins, openProject, type Project } from '../records/open-project.js';
import { TOOL_VERSION } from '../version.js';

export type { CompiledConjecture, ConjectureSpec, ConjectureResult, CheckOptions, Project };
export type { CheckedPiece, Counterexample, Expectation, Outcome } from '../runner/result.js';
export { agreesWithExpectation } from '../runner/result.js';
export { conjectureHash } from '../language/conjecture/conjecture-hash.js';
export { readLedger } from '../records/ledger.js';
export { computeStatus } from '../records/status.js';
export const version = TOOL_VERSION;

export interface LoadOptions {
  /** Only these ids. */
  ids?: string[];
  /** Run the project's plugins even when the project is not on the user's allow list (`hunch trust`). */
  allowPlugins?: boolean;
}

/** A loaded conjecture: the spec as written and its compiled form, ready to check. */
export interface Conjecture {
  id: string;
  spec: ConjectureSpec;
  compiled: CompiledConjecture;
  project: Project;
}

/**
 * Load and compile every conjecture under the paths (files or folders). The project (hunch.yaml,
 * its plugins) is the one holding the first path. Throws InputError for any invalid file.
 */
export async function load(paths: string | string[], opts: LoadOptions = {}): Promise<Conjecture[]> {
  const list = typeof paths === 'string' ? [paths] : paths;
  const project = await openProject(list[0] ?? process.cwd(), { allowPlugins: opts.allowPlugins });
  let specs = loadConjectures(list.length ? list : project.config.conjectures);
  if (opts.ids) specs = specs.filter((s) => opts.ids!.includes(s.id));
  return specs.map((spec) => {
    try {
      return { id: spec.id, spec, compiled: compileConjecture(spec), project };
    } catch (e) {
      throw explainSkippedPlugins(e, project);
    }
  });
}

export interface ApiCheckOptions extends CheckOptions {
  /** Stop after this many milliseconds (outcome `incomplete`). */
  budgetMs?: number;
  /** Try the project's saved counterexample (counterexamples/<id>.yaml) first (default true). */
  regressionFirst?: boolean;
  /** Record finished pieces in a ledger: true for the project's, or a path (default: nothing recorded). */
  ledger?: boolean | string;
  onProgress?: RunHooks['onProgress'];
}

/** Check one conjecture in this thread. */
export function check(c: Conjecture, options: ApiCheckOptions = {}): ConjectureResult {
  const deadline = options.budgetMs === undefined ? Infinity : performance.now() + options.budgetMs;
  const ledgerPath = options.ledger === true ? c.project.config.ledger : typeof options.ledger === 'string' ? options.ledger : null;
  const writer = ledgerPath ? new LedgerWriter(ledgerPath) : null;
  const regression = options.regression ?? (options.regressionFirst === false ? null : readRegressionCase(c.project.root, c.spec));
  try {
    const r = checkConjecture(
      c.compiled,
      { ...options, regression },
      {
        shouldStop: () => (performance.now() > deadline ? 'budget' : null),
        onProgress: options.onProgress,
        onPiece: (p) => writer?.piece(c.id, c.compiled.hash, p),
      },
    );
    writer?.result(r);
    return r;
  } finally {
    writer?.close();
  }
}

/** Whether a result is what its `expect` says (an incomplete run of a non-failing conjecture passes). */
export function passes(r: ConjectureResult): boolean {
  return agreesWithExpectation(r) || (r.outcome === 'incomplete' && r.expect !== 'fails');
}

/** The result in words, with the counterexample drawn as text (no colour). */
export function describeResult(r: ConjectureResult): string {
  return formatResult(r, { color: new Chalk({ level: 0 }), unicode: false }, null);
}

export interface TestFunctions {
  describe: (name: string, body: () => void) => unknown;
  test: (name: string, body: () => unknown, timeout?: number) => unknown;
  expect?: unknown;
}

export interface ConjectureTestOptions extends ApiCheckOptions {
  /** Per-test timeout in ms (default 60 s). */
  timeout?: number;
  /** Run the project's plugins even when the project is not on the user's allow list (`hunch trust`). */
  allowPlugins?: boolean;
}

function globalTestFunctions(): TestFunctions | null {
  const g = globalThis as Record<string, unknown>;
  return typeof g.describe === 'function' && typeof g.test === 'function' ? (g as unknown as TestFunctions) : null;
}

/**
 * One test per conjecture under a file or folder, in a describe block named after it. A test fails
 * when the result contradicts the conjecture's `expect`, with the counterexample drawn as text.
 * Files are read now (so the tests can be named); compiling and checking happen inside each test.
 */
export function defineConjectureTests(pathOrFolder: string, fns?: TestFunctions, options: ConjectureTestOptions = {}): void {
  const t = fns ?? globalTestFunctions();
  if (!t) throw new Error('defineConjectureTests needs the test functions: pass { describe, test } imported from vitest');
  try {
    statSync(pathOrFolder);
  } catch {
    throw new InputError(`no such file or folder: ${pathOrFolder}`);
  }
  const specs = loadConjectures([pathOrFolder]);
  let project: Promise<Project> | null = null;
  t.describe(`hunch: ${pathOrFolder}`, () => {
    for (const spec of specs) {
      t.test(
        spec.id,
        async () => {
          project ??= openProject(pathOrFolder, { allowPlugins: options.allowPlugins });
          const p = await project;
          let compiled: CompiledConjecture;
          try {
            compiled = compileConjecture(spec);
          } catch (err) {
            const e = explainSkippedPlugins(err, p);
            if (!(e instanceof InputError)) throw e;
            const at = e.pos ? `${e.pos.file}:${e.pos.line}:${e.pos.column}: ` : '';
            throw new Error(`${at}${e.message}${e.snippet && !e.message.includes(e.snippet) ? `\n    ${e.snippet}` : ''}`);
          }
          const c: Conjecture = { id: spec.id, spec, compiled, project: p };
          const r = check(c, options);
          if (!passes(r)) throw new ConjectureTestFailure(r);
        },
        options.timeout ?? 60_000,
      );
    }
  });
}

/** The error a conjecture test fails with: its message is the human report of the result. */
export class ConjectureTestFailure extends Error {
  constructor(readonly result: ConjectureResult) {
    super(`${result.id} (expect: ${result.expect}) came out ${result.outcome}:\n${describeResult(result)}`);
    this.name = 'ConjectureTestFailure';
  }
}
export { guessExpression, guessTerms, type GuessResult } from './guess.js';
export { guessSequence } from '../algebra/guessing/index.js';
export type { Guess, GuessReport, Evidence as GuessEvidence, Attempt as GuessAttempt } from '../algebra/guessing/index.js';
