// The registry of built-in functions (LIBRARY.md §2). Every entry carries its signature, a
// description, an example with its expected value (the test suite evaluates every example), and
// the published source its tests check it against. `hunch list` and "did you mean" read from here.

import type { TypeName } from '../values/types.js';
import type { Value } from '../values/value.js';

export interface ParamDecl {
  name: string;
  /** One type or several accepted ones. */
  type: TypeName | TypeName[];
  optional?: boolean;
  rest?: boolean;
}

export interface FunctionSpec {
  name: string;
  /** Grouping for `hunch list TOPIC`: 'permutations', 'matchings', 'numbers', 'lists', 'polynomials', ... */
  topic: string;
  params: ParamDecl[];
  /** Result type; 'any' when it depends on the arguments. */
  returns: TypeName;
  description: string;
  /** An expression using the function, and the text of its value (as printed by the language). */
  example: string;
  exampleValue: string;
  /** Published source (sequence number, book and page, paper), or "definition" for pure conventions. */
  source: string;
  impl: (...args: Value[]) => Value;
  /** A plugin's function: the sha256 of the plugin file (it enters the hash of every conjecture that uses it). */
  pluginFileSha256?: string;
}

const functions = new Map<string, FunctionSpec>();

export function defineFunction(spec: FunctionSpec): FunctionSpec {
  if (functions.has(spec.name)) throw new Error(`function ${spec.name} registered twice`);
  functions.set(spec.name, spec);
  return spec;
}

export function getFunction(name: string): FunctionSpec | undefined {
  return functions.get(name);
}

export function allFunctions(): FunctionSpec[] {
  return [...functions.values()].sort((a, b) => a.name.localeCompare(b.name));
}

/** "inv(w: permutation) -> integer" */
export function signatureOf(f: FunctionSpec): string {
  const ps = f.params.map((p) => {
    const t = Array.isArray(p.type) ? p.type.join('|') : p.type;
    return `${p.rest ? '...' : ''}${p.name}${p.optional ? '?' : ''}: ${t}`;
  });
  return `${f.name}(${ps.join(', ')}) -> ${f.returns}`;
}

/** Function name → sha256 of its plugin file, for every plugin function registered. */
export function pluginFileHashes(): Record<string, string> {
  const out: Record<string, string> = {};
  for (const f of functions.values()) if (f.pluginFileSha256 !== undefined) out[f.name] = f.pluginFileSha256;
  return out;
}
