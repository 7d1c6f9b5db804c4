// The global table of indeterminates. Every name ('q', 'x', 'x[3]', 'z[1,2]') gets a small integer
// id once, so polynomials store exponent vectors over ids instead of strings. The print order of
// variables (base name, then the bare name, then the index lists lexicographically, each index
// numerically, a shorter list before its extensions) is a fixed total order on names; `rankOf`
// gives each id its place in it. Ranks are recomputed when a new name arrives (rare), which never
// changes the relative order of names already present. The canonical spelling of a doubly indexed
// name has no spaces: z[1,2].

import { fail } from '../base/errors.js';

const NAME = /^([A-Za-z_][A-Za-z0-9_]*)(?:\[\s*(-?\d+(?:\s*,\s*-?\d+)*)\s*\])?$/;

const names: string[] = [];
const bases: string[] = [];
const indexLists: (readonly number[])[] = [];
const ids = new Map<string, number>();
let ranks = new Int32Array(0);

function compareNames(a: number, b: number): number {
  if (bases[a] !== bases[b]) return bases[a] < bases[b] ? -1 : 1;
  const ia = indexLists[a],
    ib = indexLists[b];
  const n = Math.min(ia.length, ib.length);
  for (let k = 0; k < n; k++) if (ia[k] !== ib[k]) return ia[k] - ib[k];
  return ia.length - ib.length;
}

function recomputeRanks(): void {
  const order = names.map((_, i) => i).sort(compareNames);
  ranks = new Int32Array(names.length);
  order.forEach((id, r) => (ranks[id] = r));
}

/** The canonical name of base[i, j, ...] ('x' for no indices). */
export function indexedName(base: string, indices: readonly number[]): string {
  return indices.length === 0 ? base : `${base}[${indices.join(',')}]`;
}

/** The id of a variable name, registering it on first use. */
export function varId(name: string): number {
  const known = ids.get(name);
  if (known !== undefined) return known;
  const m = NAME.exec(name);
  if (!m) fail(`${JSON.stringify(name)} is not a valid indeterminate name (use a name such as q, x[3] or z[1,2])`);
  // Normalise the indices ('x[03]' is 'x[3]', 'z[1, 2]' is 'z[1,2]').
  const indices = m[2] === undefined ? [] : m[2].split(',').map((s) => Number(s.trim()));
  for (const i of indices) if (!Number.isSafeInteger(i)) fail(`an index of ${name} is too large`);
  const canonical = indexedName(m[1], indices);
  if (canonical !== name) {
    const id = varId(canonical);
    ids.set(name, id);
    return id;
  }
  const id = names.length;
  names.push(name);
  bases.push(m[1]);
  indexLists.push(Object.freeze(indices));
  ids.set(name, id);
  recomputeRanks();
  return id;
}

/** The id of base[index], e.g. indexedVarId('x', 3) for x[3]. */
export function indexedVarId(base: string, index: number): number {
  return varId(`${base}[${index}]`);
}

/** The id of base[i,j], e.g. doublyIndexedVarId('z', 1, 2) for z[1,2]. */
export function doublyIndexedVarId(base: string, i: number, j: number): number {
  return varId(`${base}[${i},${j}]`);
}

export function varName(id: number): string {
  return names[id];
}

export function varBase(id: number): string {
  return bases[id];
}

/** Whether the variable is a bare name (q, x), without indices. */
export function isBareVar(id: number): boolean {
  return indexLists[id].length === 0;
}

/** The indices of a variable: [] for a bare name, [3] for x[3], [1, 2] for z[1,2]. */
export function varIndices(id: number): readonly number[] {
  return indexLists[id];
}

/**
 * The index of a singly indexed variable, or null for a bare name. A variable with several
 * indices (z[1,2]) is refused with a message naming it: callers that read one index cannot use it.
 */
export function varIndex(id: number): number | null {
  const l = indexLists[id];
  if (l.length === 0) return null;
  if (l.length > 1) fail(`${names[id]} has ${l.length} indices; only a variable with one index (such as x[3]) can be used here`);
  return l[0];
}

/** Position of the variable in the print order (smaller prints first). */
export function rankOf(id: number): number {
  return ranks[id];
}
