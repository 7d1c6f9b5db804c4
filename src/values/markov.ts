// The values of Markov chains in the language (LIBRARY.md §2 "Markov chains"):
//   a chain (kind 'chain'): its states, in the order given, and for each state its moves with
//     exact positive weights (repeated targets already added up);
//   a measure (kind 'measure'): a finitely supported probability measure with exact rational
//     masses. Its support, in the order of the chain's states, is what `v in mu` and
//     `v in support(mu)` iterate (see elements()).

import { fail } from '../base/errors.js';
import { buildChain, type SparseChain } from '../algebra/linear/sparseChain.js';
import { stationaryMeasure, type StationaryOptions } from '../algebra/linear/stationary.js';
import { isScalar, parseScalar, type Scalar } from '../numbers/rational.js';
import { sadd, scmp, seq, sisZero } from '../numbers/scalar.js';
import { decodeValue, registerDecoder } from './decode.js';
import { encodeValue, own, valueKey, valueToText } from './operations.js';
import type { Structured } from './structured.js';
import { typeOf } from './types.js';
import type { Value } from './value.js';

/** A state with its moves: [target state, weight] pairs, as the chain's move function gave them. */
export type Moves = Iterable<readonly [Value, unknown]>;

export class MarkovChain implements Structured {
  readonly kind = 'chain';
  private readonly index = new Map<string, number>();
  private measure: Measure | null = null;

  private constructor(
    /** The states, owned, in the order given. */
    readonly states: readonly Value[],
    /** The transition weights over state numbers 0..N-1. */
    readonly sparse: SparseChain,
    index: Map<string, number>,
  ) {
    this.index = index;
  }

  /**
   * The chain on `states` (duplicates are an error) whose moves from the i-th state are
   * movesOf(state). Fails, naming the state, on a target that is not a state, a weight that is not
   * a nonnegative exact number, or a state without a move of positive weight.
   */
  static build(states: readonly Value[], movesOf: (s: Value) => Moves): MarkovChain {
    const owned = states.map(own);
    const index = new Map<string, number>();
    owned.forEach((s, i) => {
      const k = valueKey(s);
      if (index.has(k)) fail(`the state ${valueToText(s)} is listed twice in the chain's states`);
      index.set(k, i);
    });
    const describe = (i: number) => valueToText(owned[i]);
    const sparse = buildChain(
      owned.length,
      (i) => {
        const out: [number, unknown][] = [];
        for (const [t, w] of movesOf(owned[i])) {
          const j = index.get(valueKey(t));
          if (j === undefined) {
            fail(`the move from ${describe(i)} leads to ${valueToText(t)}, which is not a state of the chain`);
          }
          out.push([j, w]);
        }
        return out;
      },
      describe,
    );
    return new MarkovChain(owned, sparse, index);
  }

  get size(): number {
    return this.states.length;
  }

  /** The number of a state, or -1. */
  indexOf(v: Value): number {
    return this.index.get(valueKey(v)) ?? -1;
  }

  describe(i: number): string {
    return valueToText(this.states[i]);
  }

  /** The exact stationary measure (computed once; fails naming the closed classes if not unique). */
  stationary(opts: Omit<StationaryOptions, 'describe'> = {}): Measure {
    if (!this.measure) {
      const pi = stationaryMeasure(this.sparse, { ...opts, describe: (i) => this.describe(i) });
      const pairs: [Value, Scalar][] = [];
      pi.forEach((x, i) => {
        if (!sisZero(x)) pairs.push([this.states[i], x]);
      });
      this.measure = Measure.trusted(pairs);
    }
    return this.measure;
  }

  /** The moves out of state i: [target index, weight]. */
  movesOut(i: number): [number, Scalar][] {
    const c = this.sparse;
    const out: [number, Scalar][] = [];
    for (let k = c.rowStart[i]; k < c.rowStart[i + 1]; k++) out.push([c.target[k], c.weight[k]]);
    return out;
  }

  equals(other: Structured): boolean {
    return this.key() === (other as MarkovChain).key();
  }

  key(): string {
    return this.states
      .map(
        (s, i) =>
          `${valueKey(s)}>${this.movesOut(i)
            .map(([j, w]) => `${j}:${w.toString()}`)
            .join(',')}`,
      )
      .join(';');
  }

  /** Chains are not printed in full (their move function is not kept): `<chain on 3 states>`. */
  toText(): string {
    return `<chain on ${this.size} state${this.size === 1 ? '' : 's'}>`;
  }

  /** {"chain": {"states": [...], "moves": [[[j, w], ...], ...]}} with 1-based state numbers j. */
  encode(): unknown {
    return {
      chain: {
        states: this.states.map(encodeValue),
        moves: this.states.map((_, i) => this.movesOut(i).map(([j, w]) => [j + 1, encodeValue(w)])),
      },
    };
  }
}

export class Measure implements Structured {
  readonly kind = 'measure';
  private readonly mass = new Map<string, Scalar>();

  private constructor(
    private readonly points: readonly Value[],
    private readonly masses: readonly Scalar[],
  ) {
    points.forEach((v, i) => this.mass.set(valueKey(v), masses[i]));
  }

  /** From [value, mass] pairs with distinct owned values and positive masses summing to 1. */
  static trusted(pairs: readonly (readonly [Value, Scalar])[]): Measure {
    return new Measure(
      pairs.map((p) => p[0]),
      pairs.map((p) => p[1]),
    );
  }

  /** From user data: checks the masses are positive exact numbers with sum 1, values distinct. */
  static from(pairs: readonly (readonly [Value, unknown])[]): Measure {
    const seen = new Set<string>();
    let sum: Scalar = 0;
    const out: [Value, Scalar][] = [];
    for (const [v, m] of pairs) {
      if (!isScalar(m) || scmp(m, 0) <= 0) {
        fail(`a measure needs positive exact masses; ${valueToText(v)} has mass ${String(m)}`);
      }
      const k = valueKey(v);
      if (seen.has(k)) fail(`the value ${valueToText(v)} appears twice in a measure`);
      seen.add(k);
      sum = sadd(sum, m);
      out.push([own(v), m]);
    }
    if (!seq(sum, 1)) fail(`the masses of a measure must add up to 1, not ${sum.toString()}`);
    return Measure.trusted(out);
  }

  /** The support in a fixed order (the chain's order of states): what comprehensions iterate. */
  elements(): readonly Value[] {
    return this.points;
  }

  /** The masses, in the order of elements(). */
  probabilities(): readonly Scalar[] {
    return this.masses;
  }

  /** The mass of v: 0 off the support. Fails when v is not of the kind the measure lives on. */
  prob(v: Value): Scalar {
    const m = this.mass.get(valueKey(v));
    if (m !== undefined) return m;
    if (this.points.length && typeOf(v) !== typeOf(this.points[0])) {
      fail(`the measure lives on values of type ${typeOf(this.points[0])}, so it gives no mass to ${valueToText(v)}, of type ${typeOf(v)}`);
    }
    return 0;
  }

  equals(other: Structured): boolean {
    const o = other as Measure;
    if (o.mass.size !== this.mass.size) return false;
    for (const [k, m] of this.mass) {
      const n = o.mass.get(k);
      if (n === undefined || !seq(m, n)) return false;
    }
    return true;
  }

  key(): string {
    return [...this.mass.entries()]
      .sort((a, b) => (a[0] < b[0] ? -1 : a[0] > b[0] ? 1 : 0))
      .map(([k, m]) => `${k}*${m.toString()}`)
      .join(';');
  }

  /** measure([[value, mass], ...]) in support order. */
  toText(): string {
    return `measure([${this.points.map((v, i) => `[${valueToText(v)}, ${this.masses[i].toString()}]`).join(', ')}])`;
  }

  encode(): unknown {
    return { measure: this.points.map((v, i) => [encodeValue(v), encodeValue(this.masses[i])]) };
  }
}

registerDecoder('measure', (x) => {
  if (!Array.isArray(x) || !x.every((e) => Array.isArray(e) && e.length === 2)) {
    fail('a measure is a list of [value, mass] pairs');
  }
  return Measure.from(
    (x as unknown[][]).map(([v, m]) => [decodeValue(v), typeof m === 'string' ? parseScalar(m) : decodeValue(m)] as const),
  );
});

registerDecoder('chain', (x) => {
  const o = x as { states?: unknown; moves?: unknown };
  if (!o || !Array.isArray(o.states) || !Array.isArray(o.moves) || o.moves.length !== o.states.length) {
    fail('a chain record has "states" and, for each state, its "moves"');
  }
  const states = (o.states as unknown[]).map(decodeValue);
  const moves = o.moves as unknown[];
  const byKey = new Map(states.map((s, i) => [valueKey(s), i]));
  return MarkovChain.build(states, (s) => {
    const row = moves[byKey.get(valueKey(s))!];
    if (!Array.isArray(row)) fail('the moves of a state in a chain record must be a list');
    return (row as unknown[]).map((e) => {
      if (!Array.isArray(e) || e.length !== 2 || typeof e[0] !== 'number' || !states[e[0] - 1]) {
        fail('a move in a chain record is a pair [state number, weight]');
      }
      return [states[(e[0] as number) - 1], decodeValue(e[1] as unknown)] as const;
    });
  });
});
