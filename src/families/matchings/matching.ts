// A perfect matching of the points 1..2n: p[i-1] is the partner of point i (1-based points).
// Arcs are written (a, b) with a < b, sorted by a (LIBRARY.md §1).

import { fail } from '../../base/errors.js';
import { registerDecoder } from '../../values/decode.js';
import type { Structured } from '../../values/structured.js';

export class Matching implements Structured {
  readonly kind = 'matching';
  transient = false;

  /** Trusts that `p` is a fixed-point-free involution of 1..2n; use Matching.fromArcs for user data. */
  constructor(readonly p: number[]) {}

  /** The number of arcs. */
  get n(): number {
    return this.p.length >> 1;
  }

  /** The partner of point i, 1 <= i <= 2n. */
  partner(i: number): number {
    return this.p[i - 1];
  }

  /** The arcs (a, b) with a < b, sorted by a. */
  arcs(): [number, number][] {
    const out: [number, number][] = [];
    for (let i = 1; i <= this.p.length; i++) {
      const j = this.p[i - 1];
      if (i < j) out.push([i, j]);
    }
    return out;
  }

  /** Validates: the arcs must cover 1..2n exactly once each, every arc two distinct points. */
  static fromArcs(arcs: readonly (readonly number[])[]): Matching {
    const m = arcs.length * 2;
    const p = new Array<number>(m).fill(0);
    const shown = () => '[' + arcs.map((a) => (Array.isArray(a) ? `[${a.join(', ')}]` : String(a))).join(', ') + ']';
    for (const arc of arcs) {
      if (!Array.isArray(arc) || arc.length !== 2) fail(`${shown()} is not a matching: every arc must be a pair [a, b]`);
      const [a, b] = arc;
      for (const x of [a, b]) {
        if (!Number.isInteger(x) || x < 1 || x > m) fail(`${shown()} is not a perfect matching of 1..${m}: the point ${x} is out of range`);
      }
      if (a === b) fail(`${shown()} is not a matching: the arc [${a}, ${b}] joins a point to itself`);
      if (p[a - 1] || p[b - 1]) fail(`${shown()} is not a matching: the point ${p[a - 1] ? a : b} lies on two arcs`);
      p[a - 1] = b;
      p[b - 1] = a;
    }
    return new Matching(p);
  }

  /** Validates a partner list (p[i-1] = partner of i). */
  static fromPartners(p: readonly number[]): Matching {
    const m = p.length;
    if (m % 2) fail(`a perfect matching needs an even number of points, got ${m}`);
    for (let i = 1; i <= m; i++) {
      const j = p[i - 1];
      if (!Number.isInteger(j) || j < 1 || j > m || j === i || p[j - 1] !== i)
        fail(`[${p.join(', ')}] is not the partner list of a perfect matching of 1..${m}`);
    }
    return new Matching(p.slice());
  }

  equals(other: Structured): boolean {
    const b = (other as Matching).p,
      a = this.p;
    if (a.length !== b.length) return false;
    for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
    return true;
  }

  key(): string {
    return this.p.join(',');
  }

  toText(): string {
    return `matching([${this.arcs()
      .map(([a, b]) => `[${a}, ${b}]`)
      .join(', ')}])`;
  }

  encode(): unknown {
    return { matching: this.arcs() };
  }

  copy(): Matching {
    return new Matching(this.p.slice());
  }
}

registerDecoder('matching', (x) => {
  if (!Array.isArray(x) || !x.every((a) => Array.isArray(a) && a.every((v) => typeof v === 'number')))
    fail('a matching is a list of arcs [a, b]');
  return Matching.fromArcs(x as number[][]);
});

/** Number of crossing pairs of arcs a < c < b < d. O(n^2) over arcs. */
export function matchingCrossings(p: readonly number[]): number {
  let c = 0;
  const m = p.length;
  for (let a = 1; a <= m; a++) {
    const b = p[a - 1];
    if (b < a) continue;
    for (let c1 = a + 1; c1 < b; c1++) if (p[c1 - 1] > b) c++;
  }
  return c;
}

/** Number of nesting pairs of arcs a < c < d < b. */
export function matchingNestings(p: readonly number[]): number {
  let c = 0;
  const m = p.length;
  for (let a = 1; a <= m; a++) {
    const b = p[a - 1];
    if (b < a) continue;
    for (let c1 = a + 1; c1 < b; c1++) {
      const d = p[c1 - 1];
      if (d > c1 && d < b) c++;
    }
  }
  return c;
}
