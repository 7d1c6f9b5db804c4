// Replaying a counterexample file from the file alone: rebuild the conjecture from the embedded
// documents, compile it, decode the bindings and evaluate the case. Plugins are never loaded from
// the file: the caller opens the local project (its own hunch.yaml) first, and a file that needs
// functions the local project does not provide is reported, not run.

import { EvalError, InputError, StopSignal } from '../base/errors.js';
import { withStopPoll } from '../language/expr/stop-poll.js';
import { compileConjecture } from '../language/conjecture/compile-conjecture.js';
import type { ConjectureSpec } from '../language/conjecture/conjecture.js';
import { loadConjectureFile } from '../language/conjecture/load-file.js';
import { loadConjectures } from '../language/conjecture/load-conjectures.js';
import { traceWitnesses, type Witness } from '../language/conjecture/witnesses.js';
import { getFunction } from '../library/registry.js';
import { bindingTexts, explainCase, frameFor } from '../runner/case-report.js';
import { evaluateCase, SKIPPED } from '../runner/evaluate-case.js';
import { notACaseReason } from '../runner/case-validity.js';
import { sampleSettingsOf } from '../runner/check-options.js';
import { decodeValue } from '../values/decode.js';
import { canonicalForm, conjectureHash } from '../language/conjecture/conjecture-hash.js';
import { conjectureText, readCounterexampleFile, type CounterexampleFile, type PluginNeed } from './counterexample-file.js';
import { pluginHashes } from './plugins.js';
import type { Project } from './open-project.js';

/** 'not-a-case': the bindings are not a case of the conjecture (not in their families or ranges, or excluded by where). */
export type ReplayVerdict = 'refutes' | 'holds' | 'not-a-case' | 'error' | 'needs-plugins' | 'stopped';

export interface ReplayResult {
  file: CounterexampleFile;
  verdict: ReplayVerdict;
  /** The case as text in the language. */
  bindings: Record<string, string>;
  values: Record<string, unknown>;
  sides: [unknown, unknown] | null;
  /** What decided the failure, computed again from the file's case. */
  witnesses: Witness[];
  /** When the verdict is 'error' or 'not-a-case': why. */
  error: string | null;
  /** Plugins the file needs that the local project does not provide. */
  missingPlugins: PluginNeed[];
  /** Plugins provided locally but with a different file than the one the case was found with. */
  changedPlugins: PluginNeed[];
  /** False when the embedded conjecture no longer has the hash recorded in the file (it was edited). */
  embeddedHashMatches: boolean;
  /** A conjecture of the same id in the local project whose hash differs, with what changed. */
  local: { file: string; hash: string; differences: string[] } | null;
}

/** The keys of two canonical forms that differ, in words. */
export function describeDifferences(was: Record<string, unknown>, now: Record<string, unknown>): string[] {
  const names: Record<string, string> = {
    indeterminates: 'the indeterminates',
    for: 'the bindings (for)',
    where: 'where',
    let: 'the lets',
    claim: 'the claim',
    sample: 'the sample ranges',
    define: 'the definitions it uses',
    plugins: 'the plugin files it uses',
  };
  const out: string[] = [];
  for (const k of Object.keys(names)) {
    const a = JSON.stringify(was[k] ?? null),
      b = JSON.stringify(now[k] ?? null);
    if (a !== b) out.push(`${names[k]}: was ${a}, now ${b}`);
  }
  return out;
}

function embeddedSpec(f: CounterexampleFile, path: string): ConjectureSpec {
  const text = conjectureText(f.defines, f.document);
  let loaded;
  try {
    loaded = loadConjectureFile(`${path} (the conjecture inside it)`, text);
  } catch (e) {
    if (e instanceof InputError)
      throw new InputError(`the conjecture inside ${path} cannot be read: ${e.message}`, e.pos, e.snippet, e.suggestion);
    throw e;
  }
  const spec = loaded.conjectures.find((c) => c.id === f.conjecture);
  if (!spec) throw new InputError(`${path} does not hold the conjecture ${f.conjecture}`);
  return spec;
}

function localConjecture(project: Project | null, id: string): ConjectureSpec | null {
  if (!project) return null;
  try {
    return loadConjectures(project.config.conjectures).find((c) => c.id === id) ?? null;
  } catch {
    return null; // the local files are not what is being replayed: their problems are reported by check
  }
}

/** How long a replay may take by default (the case of a mailed file may be slow, but not endless). */
export const DEFAULT_REPLAY_BUDGET_MS = 5 * 60_000;

export function replayCounterexample(
  path: string,
  project: Project | null,
  opts: { budgetMs?: number; interrupted?: () => boolean } = {},
): ReplayResult {
  const f = readCounterexampleFile(path);
  const base: ReplayResult = {
    file: f,
    verdict: 'error',
    bindings: {},
    values: {},
    sides: null,
    witnesses: [],
    error: null,
    missingPlugins: [],
    changedPlugins: [],
    embeddedHashMatches: true,
    local: null,
  };
  const local = pluginHashes();
  base.missingPlugins = f.plugins.filter((p) => p.functions.some((fn) => !getFunction(fn)));
  base.changedPlugins = f.plugins.filter(
    (p) => !base.missingPlugins.includes(p) && p.functions.some((fn) => local[fn] !== undefined && local[fn] !== p.sha256),
  );
  if (base.missingPlugins.length) return { ...base, verdict: 'needs-plugins' };

  const spec = embeddedSpec(f, path);
  const recorded: Record<string, string> = {};
  for (const p of f.plugins) for (const fn of p.functions) recorded[fn] = p.sha256;
  base.embeddedHashMatches = conjectureHash(spec, { pluginHashes: recorded }) === f.hash;

  const here = localConjecture(project, f.conjecture);
  if (here) {
    const hash = conjectureHash(here, { pluginHashes: local });
    if (hash !== f.hash)
      base.local = {
        file: here.file,
        hash,
        differences: describeDifferences(canonicalForm(spec, { pluginHashes: recorded }), canonicalForm(here, { pluginHashes: local })),
      };
  }

  const cc = compileConjecture(spec);
  const names = cc.bindings.map((b) => b.name);
  const missing = names.filter((n) => !(n in f.bindings));
  if (missing.length) throw new InputError(`${path} gives no value for the binding${missing.length > 1 ? 's' : ''} ${missing.join(', ')}`);
  let vals;
  try {
    vals = names.map((n) => decodeValue(f.bindings[n]));
  } catch (e) {
    if (e instanceof EvalError) throw new InputError(`${path}: a binding cannot be read: ${e.message}`);
    throw e;
  }
  const frame = frameFor(cc, vals);
  base.bindings = bindingTexts(cc, frame);
  // The file's case is believed only once it is shown to be a case of the conjecture.
  const why = notACaseReason(cc, vals, sampleSettingsOf(cc, {}).ranges);
  if (why) return { ...base, verdict: 'not-a-case', error: why };
  // The evaluation stops at the budget (or an interrupt) even inside one long case.
  const deadline = Date.now() + (opts.budgetMs ?? DEFAULT_REPLAY_BUDGET_MS);
  const poll = () => (opts.interrupted?.() ? 'interrupt' : Date.now() > deadline ? 'budget' : null);
  try {
    return withStopPoll(poll, () => {
      const r = evaluateCase(cc, frame);
      if (r === SKIPPED) return { ...base, verdict: 'not-a-case', error: '"where" excludes it' };
      const { values, sides } = explainCase(cc, frameFor(cc, vals));
      const witnesses = r === 0 ? traceWitnesses(cc, frameFor(cc, vals)) : [];
      return { ...base, values, sides, witnesses, verdict: r === 0 ? 'refutes' : 'holds' };
    });
  } catch (e) {
    if (e instanceof EvalError) return { ...base, verdict: 'error', error: e.message };
    if (e instanceof StopSignal) return { ...base, verdict: 'stopped', error: e.reason };
    throw e;
  }
}
