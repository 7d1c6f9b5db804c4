// Shared helpers of the runner tests: load a conjecture from YAML text and check it.

import '../../src/families/index.js';
import '../../src/library/index.js';
import { compileConjecture } from '../../src/language/conjecture/compile-conjecture.js';
import type { CompiledConjecture } from '../../src/language/conjecture/compiled.js';
import { loadConjectureFile } from '../../src/language/conjecture/load-file.js';
import type { CheckOptions } from '../../src/runner/check-options.js';
import { checkConjecture } from '../../src/runner/in-process-executor.js';
import type { RunHooks } from '../../src/runner/hooks.js';
import type { ConjectureResult } from '../../src/runner/result.js';

/** Compile the conjectures of one YAML text, in file order. */
export function compileAll(yaml: string, file = 'test.yaml'): CompiledConjecture[] {
  return loadConjectureFile(file, yaml).conjectures.map(compileConjecture);
}

/** Compile the single conjecture of a YAML text. */
export function compileOne(yaml: string, file = 'test.yaml'): CompiledConjecture {
  const all = compileAll(yaml, file);
  if (all.length !== 1) throw new Error(`expected one conjecture, got ${all.length}`);
  return all[0];
}

/** Load, compile and check the single conjecture of a YAML text. */
export function check(yaml: string, opts: CheckOptions = {}, hooks: RunHooks = {}): ConjectureResult {
  return checkConjecture(compileOne(yaml), opts, hooks);
}

/** A conjecture document from its parts (keeps the tests short). */
export function doc(parts: {
  id?: string;
  for: string[];
  claim: string;
  where?: string;
  let?: string[];
  sample?: string[];
  extra?: string[];
}): string {
  const lines = [`conjecture: ${parts.id ?? 'c'}`, 'for:', ...parts.for.map((l) => `  ${l}`)];
  if (parts.where) lines.push(`where: ${JSON.stringify(parts.where)}`);
  if (parts.let) lines.push('let:', ...parts.let.map((l) => `  ${l}`));
  lines.push(`claim: ${JSON.stringify(parts.claim)}`);
  if (parts.sample) lines.push('sample:', ...parts.sample.map((l) => `  ${l}`));
  if (parts.extra) lines.push(...parts.extra);
  return lines.join('\n') + '\n';
}
