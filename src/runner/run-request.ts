// A run of `hunch check` as plain data (it crosses to every worker thread), and what both the main
// thread and each worker do with it: load and compile the requested conjectures, refuse sizes that
// would take years, and derive each conjecture's check options.

import { formatCount } from '../base/format-count.js';
import { EvalError, InputError } from '../base/errors.js';
import { nearest } from '../base/suggest.js';
import type { CompiledConjecture } from '../language/conjecture/compiled.js';
import { compileConjecture } from '../language/conjecture/compile-conjecture.js';
import type { ConjectureSpec } from '../language/conjecture/conjecture.js';
import { loadConjectures } from '../language/conjecture/load-conjectures.js';
import type { Value } from '../values/value.js';
import { sizesOf, type CheckOptions } from './check-options.js';
import { MAX_EXHAUSTIVE_CASES, plannedCases } from './plan.js';
import type { HeldRecord } from './work/resume.js';
import type { Shard } from './work/slicing.js';

/** Everything a run needs, in a form that can cross to a worker thread (plain data). */
export interface RunRequest {
  paths: string[];
  ids: string[] | null;
  sizes: Array<[string, number, number]>;
  sampleRanges: Array<[string, number, number]>;
  exhaustive: boolean;
  count: number | null;
  seed: string | null;
  budgetMs: number | null;
  /** The project root: a worker thread opens the project there (plugins, the canonical hash). */
  root: string | null;
  /** The plugin files the main thread was allowed to load (path, sha256); a worker loads exactly these. */
  plugins?: Array<{ path: string; sha256: string }>;
  /** Encoded regression cases by conjecture id (from counterexample files). */
  regression: Record<string, unknown[]>;
  /** --shard I/K (absent or null: the whole). */
  shard?: Shard | null;
  /** --resume: the ledger's records of the requested conjectures (any hash; the runner keeps the current one's). */
  resume?: HeldRecord[] | null;
}

/** Load and compile; every problem is an InputError (exit 2) before anything runs. */
export function prepareRun(req: RunRequest): CompiledConjecture[] {
  let specs: ConjectureSpec[] = loadConjectures(req.paths);
  if (req.ids) {
    for (const id of req.ids) {
      if (!specs.some((s) => s.id === id)) {
        const s = nearest(
          id,
          specs.map((x) => x.id),
        );
        throw new InputError(`no conjecture has the id ${id}${s ? `; did you mean ${s}?` : ''}`, undefined, id, s);
      }
    }
    specs = specs.filter((s) => req.ids!.includes(s.id));
  }
  const compiled = specs.map(compileConjecture);
  for (const cc of compiled) refuseHugeSizes(cc, req);
  return compiled;
}

export function overrides(list: Array<[string, number, number]>): Map<string, [number, number]> {
  return new Map(list.map(([k, a, b]) => [k, [a, b] as [number, number]]));
}

/** Refuse, before anything runs, an exhaustive size whose enumeration would take years. */
function refuseHugeSizes(cc: CompiledConjecture, req: RunRequest): void {
  if (!req.exhaustive || cc.sizeIndex < 0) return;
  const b = cc.bindings[cc.sizeIndex];
  const o = overrides(req.sizes).get(b.name);
  let sizes: number[];
  try {
    sizes = o ? [o[1]] : sizesOf(cc).slice(-1);
  } catch (e) {
    if (e instanceof InputError) throw e;
    const why = e instanceof EvalError ? ` (${e.message})` : '';
    throw new InputError(`the range of ${b.name} must be a range of integers that does not depend on other bindings${why}`, b.pos, b.name);
  }
  for (const size of sizes) {
    const planned = plannedCases(cc, new Map([[cc.sizeIndex, size]]), true);
    if (planned !== null && planned > MAX_EXHAUSTIVE_CASES) {
      throw new InputError(
        `${cc.spec.id}: ${b.name} = ${size} has ${formatCount(planned)} cases; checking them all would take years. ` +
          `Lower the exhaustive range (e.g. --sizes ${b.name}=1..${Math.max(1, size - 3)}) and check larger sizes with "sample:"`,
        b.pos,
        b.name,
      );
    }
  }
}

export function checkOptionsFor(req: RunRequest, cc: CompiledConjecture, decode: (x: unknown) => Value): CheckOptions {
  const reg = req.regression[cc.spec.id];
  return {
    sizes: overrides(req.sizes),
    exhaustive: req.exhaustive,
    sampleRanges: overrides(req.sampleRanges),
    count: req.count ?? undefined,
    seed: req.seed ?? undefined,
    regression: reg ? reg.map(decode) : null,
    shard: req.shard ?? null,
    resume: req.resume ? req.resume.filter((r) => r.id === cc.spec.id) : null,
  };
}
