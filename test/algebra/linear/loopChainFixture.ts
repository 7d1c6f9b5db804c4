// The loop chain on perfect matchings of 2n points around a circle, built from plain
// partner arrays (independent of the library's Matching class and move functions, so the solver
// tests do not depend on them): pick a position i uniformly; with weight `join` the points i, i+1
// become an arc and their partners are joined, with weight `cross` they exchange partners.

import { buildChain, type SparseChain } from '../../../src/algebra/linear/sparseChain.js';

export interface LoopChain {
  chain: SparseChain;
  /** states[k][i] = partner of point i (0-based points). */
  states: number[][];
  indexOf(p: readonly number[]): number;
}

export function allMatchings(n: number): number[][] {
  const out: number[][] = [];
  const p = new Array<number>(2 * n).fill(-1);
  const rec = () => {
    const i = p.indexOf(-1);
    if (i < 0) {
      out.push(p.slice());
      return;
    }
    for (let j = i + 1; j < 2 * n; j++) {
      if (p[j] >= 0) continue;
      p[i] = j;
      p[j] = i;
      rec();
      p[i] = p[j] = -1;
    }
  };
  rec();
  return out;
}

export function loopChain(n: number, join: number, cross: number): LoopChain {
  const states = allMatchings(n);
  const size = 2 * n;
  const index = new Map(states.map((p, k) => [p.join(','), k]));
  const indexOf = (p: readonly number[]) => index.get(p.join(','))!;
  const move = (p: number[], i: number, crossing: boolean): number[] => {
    const j = (i + 1) % size;
    if (p[i] === j) return p;
    const q = p.slice(),
      a = p[i],
      b = p[j];
    if (crossing) {
      q[i] = b;
      q[b] = i;
      q[j] = a;
      q[a] = j;
    } else {
      q[i] = j;
      q[j] = i;
      q[a] = b;
      q[b] = a;
    }
    return q;
  };
  const chain = buildChain(states.length, (s) => {
    const out: [number, number][] = [];
    for (let i = 0; i < size; i++) {
      out.push([indexOf(move(states[s], i, false)), join]);
      out.push([indexOf(move(states[s], i, true)), cross]);
    }
    return out;
  });
  return { chain, states, indexOf };
}

/** The matching pairing i with i + n (every arc crosses every other). */
export const allCrossing = (n: number) => Array.from({ length: 2 * n }, (_, i) => (i + n) % (2 * n));
/** The matching pairing i with 2n + 1 - i (1-based; fully nested). */
export const allNested = (n: number) => Array.from({ length: 2 * n }, (_, i) => 2 * n - 1 - i);
