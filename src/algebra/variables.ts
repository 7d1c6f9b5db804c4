// The global table of indeterminates. Every name ('q', 'x', 'x[3]') gets a small integer id once,
// so polynomials store exponent vectors over ids instead of strings. The print order of
// variables (base name, then the bare name, then indices numerically) is a fixed total order on
// names; `rankOf` gives each id its place in it. Ranks are recomputed when a new name arrives
// (rare), which never changes the relative order of names already present.

import { fail } from '../base/errors.js';

const NAME = /^([A-Za-z_][A-Za-z0-9_]*)(?:\[(-?\d+)\])?$/;

const names: string[] = [];
const bases: string[] = [];
const indices: (number | null)[] = [];
const ids = new Map<string, number>();
let ranks = new Int32Array(0);

function compareNames(a: number, b: number): number {
  if (bases[a] !== bases[b]) return bases[a] < bases[b] ? -1 : 1;
  const ia = indices[a], ib = indices[b];
  if (ia === ib) return 0;
  if (ia === null) return -1;
  if (ib === null) return 1;
  return ia - ib;
}

function recomputeRanks(): void {
  const order = names.map((_, i) => i).sort(compareNames);
  ranks = new Int32Array(names.length);
  order.forEach((id, r) => (ranks[id] = r));
}

/** The id of a variable name, registering it on first use. */
export function varId(name: string): number {
  const known = ids.get(name);
  if (known !== undefined) return known;
  const m = NAME.exec(name);
  if (!m) fail(`${JSON.stringify(name)} is not a valid indeterminate name (use a name such as q or x[3])`);
  // Normalise the index ('x[03]' is 'x[3]').
  const index = m[2] === undefined ? null : Number(m[2]);
  if (index !== null && !Number.isSafeInteger(index)) fail(`the index of ${name} is too large`);
  const canonical = index === null ? m[1] : `${m[1]}[${index}]`;
  if (canonical !== name) {
    const id = varId(canonical);
    ids.set(name, id);
    return id;
  }
  const id = names.length;
  names.push(name);
  bases.push(m[1]);
  indices.push(index);
  ids.set(name, id);
  recomputeRanks();
  return id;
}

/** The id of base[index], e.g. indexedVarId('x', 3) for x[3]. */
export function indexedVarId(base: string, index: number): number {
  return varId(`${base}[${index}]`);
}

export function varName(id: number): string {
  return names[id];
}

export function varBase(id: number): string {
  return bases[id];
}

/** The index of an indexed variable, or null for a bare name. */
export function varIndex(id: number): number | null {
  return indices[id];
}

/** Position of the variable in the print order (smaller prints first). */
export function rankOf(id: number): number {
  return ranks[id];
}
