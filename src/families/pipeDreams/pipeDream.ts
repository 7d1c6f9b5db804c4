// A pipe dream: a finite set of crosses (i, j) (row i, column j, both 1-based) in the quadrant;
// every other tile is an elbow. Stored sorted lexicographically. The pipe entering row i from the
// left leaves through the top of column w(i) ("Gröbner geometry of Schubert
// polynomials", Ann. of Math. 161 (2005), §1.4); the family pipeDreams(w) decides membership.

import { fail } from '../../base/errors.js';
import { registerDecoder } from '../../values/decode.js';
import type { Structured } from '../../values/structured.js';

export class PipeDream implements Structured {
  readonly kind = 'pipeDream';
  transient = false;

  /**
   * The side of the staircase it is drawn in (w in S_n): given by pipeDreams(w), otherwise the
   * smallest n with every cross (i, j) at i + j <= n. Not part of equality or the encoding.
   */
  readonly n: number;

  /** Trusts that `crosses` are distinct and sorted lexicographically; use PipeDream.from for user data. */
  constructor(
    readonly crosses: [number, number][],
    n?: number,
  ) {
    let m = 1;
    for (const [i, j] of crosses) if (i + j > m) m = i + j;
    this.n = n ?? m;
  }

  get size(): number {
    return this.crosses.length;
  }

  /** The i-th cross (1-based, in lexicographic order) as [row, column]. */
  at(i: number): number[] | undefined {
    return i >= 1 && i <= this.crosses.length ? this.crosses[i - 1].slice() : undefined;
  }

  /** The number of crosses (what P[i] ranges over). */
  get length(): number {
    return this.crosses.length;
  }

  has(i: number, j: number): boolean {
    for (const [a, b] of this.crosses) if (a === i && b === j) return true;
    return false;
  }

  static from(crosses: readonly unknown[]): PipeDream {
    const out: [number, number][] = [];
    for (const c of crosses) {
      if (!Array.isArray(c) || c.length !== 2 || !c.every((v) => typeof v === 'number' && Number.isSafeInteger(v) && v >= 1)) {
        fail(`${JSON.stringify(crosses)} is not a pipe dream: each cross is a pair [row, column] of positive integers`);
      }
      out.push([c[0], c[1]]);
    }
    out.sort((x, y) => x[0] - y[0] || x[1] - y[1]);
    for (let k = 1; k < out.length; k++) {
      if (out[k][0] === out[k - 1][0] && out[k][1] === out[k - 1][1])
        fail(`${JSON.stringify(crosses)} is not a pipe dream: the cross [${out[k].join(', ')}] appears twice`);
    }
    return new PipeDream(out);
  }

  equals(other: Structured): boolean {
    return this.key() === other.key();
  }

  key(): string {
    return this.crosses.map((c) => c.join(',')).join(';');
  }

  toText(): string {
    return `pipeDream([${this.crosses.map((c) => `[${c.join(', ')}]`).join(', ')}])`;
  }

  encode(): unknown {
    return { pipeDream: this.crosses.map((c) => [c[0], c[1]]) };
  }

  copy(): PipeDream {
    return new PipeDream(
      this.crosses.map((c) => [c[0], c[1]] as [number, number]),
      this.n,
    );
  }
}

registerDecoder('pipeDream', (x) => {
  if (!Array.isArray(x)) fail('a pipe dream is a list of crosses [row, column]');
  return PipeDream.from(x);
});

/**
 * Follow the pipes of a set of crosses in the n x n staircase (crosses with i + j <= n, elbows
 * elsewhere): out[i-1] is the column where the pipe entering row i leaves, and `reduced` says
 * whether no two pipes cross twice. Direct from the definition; the second algorithm in the tests.
 */
export function tracePipes(crosses: readonly [number, number][], n: number): { exits: number[]; reduced: boolean } {
  const cross = new Set(crosses.map(([i, j]) => i * (n + 2) + j));
  const exits: number[] = [];
  const met = new Set<number>(); // pairs of pipes (by entry row) that have crossed
  // Pipe occupancy is needed to know who crosses whom: trace all pipes, recording per cross tile
  // which pipes pass it; a cross tile is passed by exactly two pipes.
  const passes = new Map<number, number[]>();
  for (let p = 1; p <= n; p++) {
    let i = p,
      j = 1,
      fromLeft = true;
    while (i >= 1) {
      const t = i * (n + 2) + j;
      if (i + j <= n && cross.has(t)) {
        (passes.get(t) ?? passes.set(t, []).get(t)!).push(p);
        if (fromLeft) j++;
        else i--;
      } else if (fromLeft) {
        i--;
        fromLeft = false;
      } else {
        j++;
        fromLeft = true;
      }
    }
    exits.push(j);
  }
  let reduced = true;
  for (const ps of passes.values()) {
    const k = Math.min(ps[0], ps[1]) * (n + 1) + Math.max(ps[0], ps[1]);
    if (met.has(k)) reduced = false;
    met.add(k);
  }
  return { exits, reduced };
}
