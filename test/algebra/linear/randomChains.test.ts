// The modular solver against dense rational elimination (denseRational.ts, the second algorithm)
// on random small chains, with and without lumping; closed classes against brute-force
// reachability. Facts used: a finite chain has a unique stationary measure iff it has exactly one
// closed class, and that measure vanishes on transient states (Kemeny and Snell, Finite Markov
// Chains, 1960, Theorems 4.1.4 and 5.1.2).

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { closedClasses } from '../../../src/algebra/linear/closedClasses.js';
import { stationaryDense } from '../../../src/algebra/linear/denseRational.js';
import { stationaryMeasure } from '../../../src/algebra/linear/stationary.js';
import { buildChain, type SparseChain } from '../../../src/algebra/linear/sparseChain.js';
import { EvalError } from '../../../src/base/errors.js';
import { makeRat, type Scalar } from '../../../src/numbers/rational.js';

type Row = [number, Scalar][];

const weightArb = fc.oneof(
  fc.integer({ min: 0, max: 5 }),
  fc.tuple(fc.integer({ min: 1, max: 9 }), fc.integer({ min: 1, max: 9 })).map(([n, d]) => makeRat(BigInt(n), BigInt(d))),
);

/** Rows over `size` states; every row gets at least one positive weight. */
const chainArb = fc.integer({ min: 1, max: 7 }).chain((size) =>
  fc
    .array(fc.tuple(fc.array(fc.tuple(fc.nat(size - 1), weightArb), { maxLength: 5 }), fc.nat(size - 1)), {
      minLength: size,
      maxLength: size,
    })
    .map((rows) => ({ size, rows: rows.map(([moves, t]) => [...moves, [t, 1]] as Row) })),
);

function build(size: number, rows: Row[]): SparseChain {
  return buildChain(size, (s) => rows[s]);
}

/** Closed classes by brute force: s is recurrent iff every state it reaches reaches it back. */
function bruteClosed(c: SparseChain): number[][] {
  const n = c.size;
  const reach = Array.from({ length: n }, (_, s) => {
    const seen = new Set([s]);
    const stack = [s];
    while (stack.length) {
      const u = stack.pop()!;
      for (let k = c.rowStart[u]; k < c.rowStart[u + 1]; k++) {
        if (!seen.has(c.target[k])) {
          seen.add(c.target[k]);
          stack.push(c.target[k]);
        }
      }
    }
    return seen;
  });
  const recurrent = (s: number) => [...reach[s]].every((t) => reach[t].has(s));
  const classes = new Map<string, number[]>();
  for (let s = 0; s < n; s++) {
    if (!recurrent(s)) continue;
    const key = [...reach[s]].sort((a, b) => a - b).join(',');
    classes.set(
      key,
      [...reach[s]].sort((a, b) => a - b),
    );
  }
  return [...classes.values()].sort((a, b) => a[0] - b[0]);
}

describe('random small chains', () => {
  it('closed classes agree with brute-force reachability', () => {
    fc.assert(
      fc.property(chainArb, ({ size, rows }) => {
        const c = build(size, rows);
        expect(closedClasses(c)).toEqual(bruteClosed(c));
      }),
      { numRuns: 300 },
    );
  });

  it('the modular solver agrees with dense rational elimination, or both see several closed classes', () => {
    fc.assert(
      fc.property(chainArb, fc.boolean(), ({ size, rows }, lump) => {
        const c = build(size, rows);
        if (bruteClosed(c).length === 1) {
          expect(stationaryMeasure(c, { lump })).toEqual(stationaryDense(c));
        } else {
          expect(() => stationaryMeasure(c, { lump })).toThrow(/closed classes/);
        }
      }),
      { numRuns: 300 },
    );
  });

  it('chains with a cyclic symmetry: lumping reduces the system, and the answer agrees with dense elimination', () => {
    // States (a, j), a < k, j < m; the weight from (a, j) to (b, j + r mod m) depends on (a, b, r) only.
    const symArb = fc
      .record({ k: fc.integer({ min: 1, max: 3 }), m: fc.integer({ min: 2, max: 4 }) })
      .chain(({ k, m }) =>
        fc
          .array(fc.tuple(fc.nat(k - 1), fc.nat(k - 1), fc.nat(m - 1), weightArb), { minLength: 1, maxLength: 8 })
          .map((moves) => ({ k, m, moves })),
      );
    fc.assert(
      fc.property(symArb, ({ k, m, moves }) => {
        const size = k * m;
        const c = buildChain(size, (s) => {
          const a = Math.floor(s / m),
            j = s % m;
          const out: [number, Scalar][] = [[s, 1]];
          for (const [from, b, r, w] of moves) if (from === a) out.push([b * m + ((j + r) % m), w]);
          return out;
        });
        if (closedClasses(c).length !== 1) return;
        expect(stationaryMeasure(c)).toEqual(stationaryDense(c));
        expect(stationaryMeasure(c, { lump: false })).toEqual(stationaryDense(c));
      }),
      { numRuns: 200 },
    );
  });
});

describe('larger sparse chains (the sparse elimination phase runs for the states past the last 48)', () => {
  it('agree with dense rational elimination', () => {
    const arb = fc.integer({ min: 64, max: 72 }).chain((size) =>
      fc
        .array(fc.array(fc.tuple(fc.nat(size - 1), fc.integer({ min: 1, max: 4 })), { maxLength: 2 }), {
          minLength: size,
          maxLength: size,
        })
        .map((extra) => ({ size, extra })),
    );
    fc.assert(
      fc.property(arb, ({ size, extra }) => {
        // A directed cycle keeps the chain irreducible; the extra moves make it irregular.
        const c = buildChain(size, (s) => [[(s + 1) % size, 1], ...extra[s]] as [number, number][]);
        expect(stationaryMeasure(c, { lump: false })).toEqual(stationaryDense(c));
      }),
      { numRuns: 5 },
    );
  }, 30_000);
});

describe('errors name the states', () => {
  it('several closed classes: the message names the classes by their states', () => {
    const c = buildChain(
      5,
      (s) =>
        s < 2
          ? [[1 - s, 1]]
          : s < 4
            ? [[5 - s, 1]]
            : [
                [0, 1],
                [2, 1],
              ],
      (s) => `s${s}`,
    );
    try {
      stationaryMeasure(c, { describe: (s) => `s${s}` });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(EvalError);
      expect((e as Error).message).toContain('2 closed classes');
      expect((e as Error).message).toContain('{s0, s1 (2 states)}');
      expect((e as Error).message).toContain('{s2, s3 (2 states)}');
      expect((e as Error).message).not.toContain('s4');
    }
  });
  it('a negative weight and a non-numeric weight are refused, naming the state and the move', () => {
    const d = (s: number) => `m${s}`;
    expect(() => buildChain(2, (s) => [[1 - s, s === 1 ? -1 : 1]], d)).toThrow('the move from m1 to m0 has the negative weight -1');
    expect(() => buildChain(2, (s) => [[1 - s, s === 0 ? 'heavy' : 1]], d)).toThrow(
      'the move from m0 to m1 has weight "heavy", which is not a number',
    );
    expect(() => buildChain(2, (s) => [[1 - s, s === 0 ? 0 : 1]], d)).toThrow('m0 has no move of positive weight');
  });
  it('transient states get weight 0 (1 -> 2 <-> 3)', () => {
    const c = buildChain(3, (s) => (s === 0 ? [[1, 1]] : [[3 - s, 1]]));
    expect(stationaryMeasure(c)).toEqual([0, makeRat(1n, 2n), makeRat(1n, 2n)]);
  });
});
