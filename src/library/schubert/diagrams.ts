// The Rothe diagram and essential set of a permutation, vexillary and dominant permutations, and
// the Demazure (0-Hecke) product. W. Fulton, "Flags, Schubert polynomials, degeneracy loci, and
// determinantal formulas", Duke Math. J. 65 (1992); Macdonald, Notes on Schubert Polynomials (1991).

import { containsPattern } from '../../families/permutations/patterns.js';
import { inv } from '../permutations/statistics.js';
import { reducedWord } from '../permutations/constructions.js';

/** D(w) = {(i, j) : w(i) > j and w^-1(j) > i}, sorted by row then column (1-based). */
export function rotheDiagram(a: readonly number[]): [number, number][] {
  const n = a.length;
  const pos = new Array<number>(n + 1);
  a.forEach((v, i) => (pos[v] = i + 1));
  const out: [number, number][] = [];
  for (let i = 1; i <= n; i++) for (let j = 1; j < a[i - 1]; j++) if (pos[j] > i) out.push([i, j]);
  return out;
}

/** The cells (i, j) of D(w) with neither (i+1, j) nor (i, j+1) in D(w) (Fulton 1992, §3). */
export function essentialSet(a: readonly number[]): [number, number][] {
  const d = rotheDiagram(a);
  const cells = new Set(d.map(([i, j]) => `${i},${j}`));
  return d.filter(([i, j]) => !cells.has(`${i + 1},${j}`) && !cells.has(`${i},${j + 1}`));
}

export const isVexillary = (a: readonly number[]): boolean => !containsPattern(a, a.length, [2, 1, 4, 3]);

/** Dominant: 132-avoiding, equivalently D(w) is the Young diagram of a partition at the corner (1, 1). */
export const isDominant = (a: readonly number[]): boolean => !containsPattern(a, a.length, [1, 3, 2]);

/** u * s_i when that is longer, else u: the 0-Hecke action of s_i on the right. */
function demazureStep(u: number[], i: number): void {
  if (u[i - 1] < u[i]) [u[i - 1], u[i]] = [u[i], u[i - 1]];
}

/** u ⋆ v: start from u and take the 0-Hecke steps of a reduced word of v, in order. */
export function demazureProduct(u: readonly number[], v: readonly number[]): number[] {
  const n = Math.max(u.length, v.length);
  const w = [...u, ...Array.from({ length: n - u.length }, (_, k) => u.length + k + 1)];
  const vv = [...v, ...Array.from({ length: n - v.length }, (_, k) => v.length + k + 1)];
  for (const i of reducedWord(vv)) demazureStep(w, i);
  return w;
}

export { inv };
