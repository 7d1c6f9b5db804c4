// The Stanley–Reisner complex of a squarefree monomial ideal M of k[v_1..v_n]: the faces are the
// sets F of variables containing the support of no generator. Its facets are the complements of
// the minimal vertex covers of the generators' supports, which are also the minimal primes of M
// (R. Stanley, Combinatorics and Commutative Algebra, 2nd ed., II.1; E. Miller, B. Sturmfels,
// Combinatorial Commutative Algebra, Thm 1.7). Covers are found by branching on an uncovered
// generator's variables, then keeping the minimal ones.

import { fail } from '../../base/errors.js';
import type { HilbertOptions } from './hilbertSeries.js';
import type { MonomialIdeal } from './monomialIdeal.js';

const DEFAULT_MAX_STEPS = 2_000_000;

/** The minimal vertex covers, each a sorted list of variable positions (0-based). */
export function minimalCovers(M: MonomialIdeal, opts: HilbertOptions = {}): number[][] {
  if (!M.isSquarefree()) fail('the Stanley–Reisner complex needs a squarefree monomial ideal');
  const supports = M.gens.map((g) => {
    const s: number[] = [];
    for (let v = 0; v < g.length; v++) if (g[v]) s.push(v);
    return s;
  });
  if (supports.some((s) => s.length === 0)) return []; // the unit ideal: no faces at all
  const maxSteps = opts.maxSteps ?? DEFAULT_MAX_STEPS;
  let steps = 0;
  const found = new Map<string, number[]>();
  const chosen = new Uint8Array(M.nv);
  const rec = (i: number) => {
    if (++steps > maxSteps) fail(`the search for the facets passed its bound of ${maxSteps.toLocaleString('en-US')} steps`);
    if ((steps & 1023) === 1 && opts.shouldStop?.()) fail('the search for the facets was stopped');
    while (i < supports.length && supports[i].some((v) => chosen[v])) i++;
    if (i === supports.length) {
      const c: number[] = [];
      for (let v = 0; v < M.nv; v++) if (chosen[v]) c.push(v);
      found.set(c.join(','), c);
      return;
    }
    for (const v of supports[i]) {
      chosen[v] = 1;
      rec(i + 1);
      chosen[v] = 0;
    }
  };
  rec(0);
  const all = [...found.values()].sort((a, b) => a.length - b.length);
  const minimal: number[][] = [];
  for (const c of all) {
    const set = new Set(c);
    if (!minimal.some((m) => m.every((v) => set.has(v)))) minimal.push(c);
  }
  return minimal;
}

/** The facets of the Stanley–Reisner complex, each a sorted list of variable positions. */
export function facetsOf(M: MonomialIdeal, opts: HilbertOptions = {}): number[][] {
  return minimalCovers(M, opts)
    .map((c) => {
      const s = new Set(c);
      const f: number[] = [];
      for (let v = 0; v < M.nv; v++) if (!s.has(v)) f.push(v);
      return f;
    })
    .sort((a, b) => b.length - a.length || cmpLex(a, b));
}

function cmpLex(a: number[], b: number[]): number {
  for (let i = 0; i < Math.min(a.length, b.length); i++) if (a[i] !== b[i]) return a[i] - b[i];
  return a.length - b.length;
}
