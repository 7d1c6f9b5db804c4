// User plugins: JavaScript modules listed in the project's own hunch.yaml that add functions to the
// language. A plugin module exports its functions with declared argument types:
//
//   export const functions = [
//     {
//       name: 'peakCount',
//       params: [{ name: 'w', type: 'permutation' }],   // or just ['permutation']
//       returns: 'integer',
//       description: 'The number of peaks of w.',
//       example: 'peakCount(perm([1, 3, 2]))', exampleValue: '1',   // optional
//       source: 'definition',                                              // optional
//       impl: (w) => ...,   // receives evaluated values, returns a value of the language
//     },
//   ];
//
// (`functions` may also be an object keyed by name, and `export default { functions }` works.)
// Plugins are code, so they are loaded only from the project's hunch.yaml — never from a
// counterexample file or from a path written inside a conjecture. Each plugin file's sha256 enters
// the hash of every conjecture that uses one of its functions, so editing a plugin makes exactly
// those conjectures' ledger records stale.

import { readFileSync } from 'node:fs';
import { extname, relative } from 'node:path';
import { pathToFileURL } from 'node:url';
import { InputError } from '../base/errors.js';
import { nearest } from '../base/suggest.js';
import { allTypeNames, isTypeName, type TypeName } from '../protocol/type-names.js';
import { defineFunction, getFunction, type ParamDecl } from '../library/registry.js';
import type { Value } from '../values/value.js';
import { fileHash, namesUsed } from '../language/conjecture/conjecture-hash.js';
import type { ConjectureSpec } from '../language/conjecture/conjecture.js';
import type { PluginNeed } from './counterexample-file.js';

export interface LoadedPlugin {
  /** Absolute path. */
  path: string;
  /** As listed, relative to the project root. */
  file: string;
  sha256: string;
  functions: string[];
}

export const PLUGIN_TOPIC = 'plugins';

/** Every plugin loaded in this process, by absolute path. */
const loaded = new Map<string, LoadedPlugin>();

/** Function name → sha256 of the plugin file that defines it, over every plugin loaded in this process. */
export function pluginHashes(): Record<string, string> {
  const out: Record<string, string> = {};
  for (const p of loaded.values()) for (const f of p.functions) out[f] = p.sha256;
  return out;
}

export function loadedPlugins(): LoadedPlugin[] {
  return [...loaded.values()];
}

/** The plugins a conjecture uses (for its counterexample file). */
export function pluginsUsedBy(spec: ConjectureSpec): PluginNeed[] {
  const used = namesUsed(spec);
  return loadedPlugins()
    .map((p) => ({ file: p.file, sha256: p.sha256, functions: p.functions.filter((f) => used.has(f)) }))
    .filter((p) => p.functions.length > 0);
}

function pluginError(file: string, why: string): InputError {
  return new InputError(`the plugin ${file} ${why}`, { file, line: 1, column: 1 });
}

const NAME = /^[A-Za-z_][A-Za-z0-9_]*$/;

interface RawFunction {
  name?: unknown;
  params?: unknown;
  returns?: unknown;
  description?: unknown;
  example?: unknown;
  exampleValue?: unknown;
  source?: unknown;
  impl?: unknown;
}

/** A type name from a plugin file: one of the language's, else a clear error with the nearest. */
function readTypeName(file: string, what: string, t: string): TypeName {
  if (isTypeName(t)) return t;
  const near = nearest(t, allTypeNames());
  throw pluginError(file, `declares ${what} with the unknown type '${t}'${near ? `; did you mean '${near}'?` : ''}`);
}

function readParams(file: string, fname: string, raw: unknown): ParamDecl[] {
  if (!Array.isArray(raw))
    throw pluginError(file, `declares ${fname} without a "params" list (e.g. params: [{ name: 'w', type: 'permutation' }])`);
  return raw.map((p, i) => {
    if (typeof p === 'string') return { name: `x${i + 1}`, type: readTypeName(file, `parameter ${i + 1} of ${fname}`, p) };
    if (p && typeof p === 'object') {
      const o = p as Record<string, unknown>;
      const type = o.type;
      const ok = typeof type === 'string' || (Array.isArray(type) && type.every((t) => typeof t === 'string'));
      if (!ok)
        throw pluginError(file, `declares parameter ${i + 1} of ${fname} without a type (a type name such as 'integer' or 'permutation')`);
      return {
        name: typeof o.name === 'string' ? o.name : `x${i + 1}`,
        type: Array.isArray(type)
          ? type.map((t) => readTypeName(file, `parameter ${i + 1} of ${fname}`, t as string))
          : readTypeName(file, `parameter ${i + 1} of ${fname}`, type as string),
        ...(o.optional ? { optional: true } : {}),
        ...(o.rest ? { rest: true } : {}),
      };
    }
    throw pluginError(file, `declares parameter ${i + 1} of ${fname} as ${JSON.stringify(p)}; give a type name or { name, type }`);
  });
}

function functionList(file: string, mod: Record<string, unknown>): RawFunction[] {
  const fromDefault = mod.default && typeof mod.default === 'object' ? (mod.default as Record<string, unknown>).functions : undefined;
  const fs = mod.functions ?? fromDefault;
  if (Array.isArray(fs)) return fs as RawFunction[];
  if (fs && typeof fs === 'object') return Object.entries(fs as Record<string, RawFunction>).map(([name, f]) => ({ name, ...f }));
  throw pluginError(file, 'exports no "functions" (export const functions = [{ name, params, returns, description, impl }])');
}

async function importModule(path: string, file: string): Promise<Record<string, unknown>> {
  const ext = extname(path);
  if (ext === '.ts' || ext === '.mts') {
    const strips = (process as unknown as { features?: { typescript?: unknown } }).features?.typescript;
    if (!strips)
      throw pluginError(
        file,
        `is TypeScript, which this Node ${process.versions.node} cannot load directly; compile it to JavaScript (e.g. with tsc) and list the .js file in hunch.yaml`,
      );
  } else if (ext !== '.js' && ext !== '.mjs') throw pluginError(file, 'must be a JavaScript module (.js or .mjs)');
  try {
    return (await import(pathToFileURL(path).href)) as Record<string, unknown>;
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code === 'ERR_MODULE_NOT_FOUND' && String((e as Error).message).includes(path)) throw pluginError(file, 'does not exist');
    throw pluginError(file, `could not be loaded: ${(e as Error).message}`);
  }
}

/**
 * Load one plugin and register its functions. Loading the same unchanged file again is a no-op;
 * a built-in or another plugin's function of the same name is an error.
 */
export async function loadPlugin(path: string, root: string): Promise<LoadedPlugin> {
  const file = relative(root, path) || path;
  let bytes: Buffer;
  try {
    bytes = readFileSync(path);
  } catch {
    throw pluginError(file, `listed in hunch.yaml does not exist (looked for ${path})`);
  }
  const sha256 = fileHash(bytes);
  const prev = loaded.get(path);
  if (prev) {
    if (prev.sha256 === sha256) return prev;
    throw pluginError(file, 'changed since this process loaded it; start again to use the new version');
  }
  const mod = await importModule(path, file);
  const specs = functionList(file, mod).map((f, i) => {
    const name = f.name;
    if (typeof name !== 'string' || !NAME.test(name)) throw pluginError(file, `declares function ${i + 1} without a valid name`);
    if (typeof f.impl !== 'function') throw pluginError(file, `declares ${name} without an "impl" function`);
    if (getFunction(name)) throw pluginError(file, `defines ${name}, which already exists (a built-in or another plugin's); rename it`);
    const impl = f.impl as (...args: Value[]) => Value;
    return {
      name,
      topic: PLUGIN_TOPIC,
      params: readParams(file, name, f.params),
      returns: typeof f.returns === 'string' ? readTypeName(file, `the result of ${name}`, f.returns) : 'any',
      description: typeof f.description === 'string' ? f.description : `${name}, from the plugin ${file}`,
      example: typeof f.example === 'string' ? f.example : '',
      exampleValue: typeof f.exampleValue === 'string' ? f.exampleValue : '',
      source: typeof f.source === 'string' ? f.source : `plugin ${file}`,
      impl,
      pluginFileSha256: sha256,
    };
  });
  const seen = new Set<string>();
  for (const s of specs) {
    if (seen.has(s.name)) throw pluginError(file, `defines ${s.name} twice`);
    seen.add(s.name);
  }
  for (const s of specs) defineFunction(s);
  const p: LoadedPlugin = { path, file, sha256, functions: specs.map((s) => s.name) };
  loaded.set(path, p);
  return p;
}

/** Load every plugin of a project config, in order. */
export async function loadPlugins(paths: readonly string[], root: string): Promise<LoadedPlugin[]> {
  const out: LoadedPlugin[] = [];
  for (const p of paths) out.push(await loadPlugin(p, root));
  return out;
}
