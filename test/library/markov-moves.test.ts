// The moves of src/library/moves.ts. On matchings around a circle, joinAt and crossAt are the
// actions of the Temperley–Lieb generators e_i and the crossing generators s_i of the Brauer
// algebra on link patterns with closed loops removed (weight 1). Their defining relations, as in
// Birman and Wenzl, "Braids, link polynomials and a new algebra", Trans. AMS 313 (1989), and
// Brauer, Ann. of Math. 38 (1937): e_i^2 = e_i, e_i e_{i+1} e_i = e_i, s_i^2 = 1, the braid
// relation, s_i e_i = e_i s_i = e_i, and far generators commute. Second algorithm for crossAt:
// s_i acts by conjugating the partner involution by the transposition (i, i+1).

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import '../../src/library/moves.js';
import { getFunction } from '../../src/library/registry.js';
import { Matching, matchingCrossings } from '../../src/families/matchings/matching.js';
import { Permutation } from '../../src/families/permutations/permutation.js';
import { EvalError } from '../../src/base/errors.js';
import type { Value } from '../../src/values/value.js';

const call = (name: string, ...args: Value[]): Value => getFunction(name)!.impl(...args);
const join = (m: Matching, i: number) => call('joinAt', m, i) as Matching;
const cross = (m: Matching, i: number) => call('crossAt', m, i) as Matching;
const eq = (a: Matching, b: Matching) => expect(a.p).toEqual(b.p);

/** A uniformly shuffled list of the 2n points, paired consecutively: a random perfect matching. */
const matchingArb = fc.integer({ min: 1, max: 6 }).chain((n) =>
  fc
    .shuffledSubarray(
      Array.from({ length: 2 * n }, (_, i) => i + 1),
      { minLength: 2 * n, maxLength: 2 * n },
    )
    .map((pts) => {
      const arcs: [number, number][] = [];
      for (let k = 0; k < pts.length; k += 2) arcs.push([Math.min(pts[k], pts[k + 1]), Math.max(pts[k], pts[k + 1])]);
      return Matching.fromArcs(arcs.sort((a, b) => a[0] - b[0]));
    }),
);
const withPos = matchingArb.chain((m) => fc.integer({ min: 1, max: m.p.length }).map((i) => [m, i] as const));
const next = (m: Matching, i: number) => (i % m.p.length) + 1;

describe('joinAt and crossAt on a circle', () => {
  it('worked examples: join and cross at 2 on [[1, 4], [2, 3]], at 4 (wrapping to 1) on [[1, 2], [3, 4]]', () => {
    const m = Matching.fromArcs([
      [1, 4],
      [2, 3],
    ]);
    eq(join(m, 2), m); // 2, 3 already an arc
    eq(
      join(m, 1),
      Matching.fromArcs([
        [1, 2],
        [3, 4],
      ]),
    );
    eq(
      cross(m, 1),
      Matching.fromArcs([
        [1, 3],
        [2, 4],
      ]),
    );
    const c = Matching.fromArcs([
      [1, 2],
      [3, 4],
    ]);
    eq(
      join(c, 4),
      Matching.fromArcs([
        [1, 4],
        [2, 3],
      ]),
    );
    eq(join(c, 0), join(c, 4)); // positions are taken mod 2n
    eq(join(c, 8), join(c, 4));
  });
  it('Temperley–Lieb relations: e_i^2 = e_i, e_i e_{i+1} e_i = e_i, e_{i+1} e_i e_{i+1} = e_{i+1}', () => {
    fc.assert(
      fc.property(withPos, ([m, i]) => {
        const j = next(m, i);
        eq(join(join(m, i), i), join(m, i));
        eq(join(join(join(m, i), j), i), join(m, i));
        eq(join(join(join(m, j), i), j), join(m, j));
      }),
    );
  });
  it('crossAt is conjugation by (i, i+1) (second algorithm), hence s_i^2 = 1 and the braid relation', () => {
    fc.assert(
      fc.property(withPos, ([m, i]) => {
        const j = next(m, i);
        const s = (x: number) => (x === i ? j : x === j ? i : x);
        const conj = new Matching(m.p.map((_, k) => s(m.p[s(k + 1) - 1])));
        eq(cross(m, i), conj);
        eq(cross(cross(m, i), i), m);
        eq(cross(cross(cross(m, i), j), i), cross(cross(cross(m, j), i), j));
      }),
    );
  });
  it('mixed relations s_i e_i = e_i s_i = e_i, and generators two or more apart commute', () => {
    fc.assert(
      fc.property(withPos, fc.nat(), ([m, i], r) => {
        eq(join(cross(m, i), i), join(m, i));
        eq(cross(join(m, i), i), join(m, i));
        const size = m.p.length;
        if (size < 4) return;
        const k = ((i - 1 + 2 + (r % (size - 3))) % size) + 1; // at distance >= 2 from i around the circle
        eq(join(join(m, i), k), join(join(m, k), i));
        eq(cross(cross(m, i), k), cross(cross(m, k), i));
        eq(join(cross(m, i), k), cross(join(m, k), i));
      }),
    );
  });
  it('rotation of the circle: rotate(joinAt(m, i)) = joinAt(rotate(m), i + 1); crossings are kept; rotate(m, 2n) = m', () => {
    fc.assert(
      fc.property(withPos, ([m, i]) => {
        const rot = (x: Matching, k = 1) => call('rotate', x, k) as Matching;
        eq(rot(join(m, i)), join(rot(m), i + 1));
        eq(rot(cross(m, i)), cross(rot(m), i + 1));
        expect(matchingCrossings(rot(m).p)).toBe(matchingCrossings(m.p));
        eq(rot(m, m.p.length), m);
        eq(rot(rot(m, 3), -3), m);
      }),
    );
  });
});

describe('moves on permutations', () => {
  const permArb = fc.integer({ min: 2, max: 8 }).chain((n) =>
    fc.shuffledSubarray(
      Array.from({ length: n }, (_, i) => i + 1),
      { minLength: n, maxLength: n },
    ),
  );
  it('swapAt(w, i) = w * s_i, i.e. (w s_i)(j) = w(s_i(j)); an involution', () => {
    fc.assert(
      fc.property(permArb, fc.nat(), (a, r) => {
        const w = new Permutation(a),
          n = a.length,
          i = (r % (n - 1)) + 1;
        const v = call('swapAt', w, i) as Permutation;
        const s = (j: number) => (j === i ? i + 1 : j === i + 1 ? i : j);
        expect(v.a).toEqual(a.map((_, j) => a[s(j + 1) - 1]));
        expect((call('swapAt', v, i) as Permutation).a).toEqual(a);
      }),
    );
    expect(() => call('swapAt', new Permutation([2, 1]), 2)).toThrow(EvalError);
    expect(() => call('swapAt', new Permutation([2, 1]), 2)).toThrow('swapAt(w, i) needs 1 <= i <= 1 for a permutation of 2, got i = 2');
  });
  it('rotate(w, k)(j) = w(j + k mod n): rotations add up and rotate(w, n) = w', () => {
    fc.assert(
      fc.property(permArb, fc.integer({ min: -20, max: 20 }), fc.integer({ min: -20, max: 20 }), (a, k, l) => {
        const w = new Permutation(a),
          n = a.length;
        const r = call('rotate', w, k) as Permutation;
        expect(r.a).toEqual(a.map((_, j) => a[(((j + k) % n) + n) % n]));
        expect((call('rotate', r, l) as Permutation).a).toEqual((call('rotate', w, k + l) as Permutation).a);
        expect((call('rotate', w, n) as Permutation).a).toEqual(a);
      }),
    );
    expect((call('rotate', new Permutation([2, 3, 1, 4])) as Permutation).a).toEqual([3, 1, 4, 2]);
  });
});
