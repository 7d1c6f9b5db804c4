import { describe, expect, it } from 'vitest';
import { matchings } from '../../../src/families/matchings/matchings.js';
import { noncrossingMatchings } from '../../../src/families/matchings/noncrossingMatchings.js';
import { Matching, matchingCrossings, matchingNestings } from '../../../src/families/matchings/matching.js';
import { lexCompareArrays } from '../../../src/families/common/arbitrary.js';
import { decodeValue } from '../../../src/values/decode.js';
import { checkEarlyStop, checkEnumeration, collect } from '../familyChecks.js';

describe('the Matching class', () => {
  it('reads arcs, prints and encodes them sorted', () => {
    const m = Matching.fromArcs([
      [2, 4],
      [3, 1],
    ]);
    expect(m.p).toEqual([3, 4, 1, 2]);
    expect(m.n).toBe(2);
    expect(m.arcs()).toEqual([
      [1, 3],
      [2, 4],
    ]);
    expect(m.toText()).toBe('matching([[1, 3], [2, 4]])');
    expect(m.encode()).toEqual({
      matching: [
        [1, 3],
        [2, 4],
      ],
    });
    expect(
      (
        decodeValue({
          matching: [
            [1, 3],
            [2, 4],
          ],
        }) as Matching
      ).equals(m),
    ).toBe(true);
    expect(() =>
      Matching.fromArcs([
        [1, 2],
        [2, 3],
      ]),
    ).toThrow(/two arcs/);
    expect(() =>
      Matching.fromArcs([
        [1, 5],
        [2, 3],
      ]),
    ).toThrow(/out of range/);
    expect(() => Matching.fromArcs([[1, 1]])).toThrow(/itself/);
  });
  it('counts crossings and nestings by definition on small examples', () => {
    expect(
      matchingCrossings(
        Matching.fromArcs([
          [1, 3],
          [2, 4],
        ]).p,
      ),
    ).toBe(1);
    expect(
      matchingNestings(
        Matching.fromArcs([
          [1, 4],
          [2, 3],
        ]).p,
      ),
    ).toBe(1);
    expect(
      matchingCrossings(
        Matching.fromArcs([
          [1, 2],
          [3, 4],
        ]).p,
      ),
    ).toBe(0);
  });
});

describe('matchings', () => {
  it('counts (2n-1)!! (OEIS A001147: 1, 1, 3, 15, 105, 945, 10395)', () => {
    const a001147 = [1, 1, 3, 15, 105, 945, 10395];
    a001147.forEach((v, n) => expect(matchings.count(matchings.prepare([n]))).toBe(BigInt(v)));
  });
  it('enumerates every perfect matching once, lexicographically by partner list', () => {
    for (let n = 0; n <= 5; n++) checkEnumeration(matchings, [n], (a, b) => lexCompareArrays(a.p, b.p));
    checkEarlyStop(matchings, [4], 20);
  });
  it('has crossings and nestings equidistributed, jointly symmetric (Chen, Deng, Du, Stanley, Yan, Trans. AMS 359 (2007))', () => {
    for (let n = 1; n <= 6; n++) {
      const joint = new Map<string, number>();
      for (const m of collect(matchings, matchings.prepare([n]))) {
        const k = `${matchingCrossings(m.p)},${matchingNestings(m.p)}`;
        joint.set(k, (joint.get(k) ?? 0) + 1);
      }
      for (const [k, c] of joint) {
        const [cr, ne] = k.split(',');
        expect(joint.get(`${ne},${cr}`)).toBe(c);
      }
    }
  });
  it('has exactly Catalan-many noncrossing (and nonnesting) matchings (OEIS A000108)', () => {
    const a000108 = [1, 1, 2, 5, 14, 42, 132];
    a000108.forEach((v, n) => {
      const all = collect(matchings, matchings.prepare([n]));
      expect(all.filter((m) => matchingCrossings(m.p) === 0).length).toBe(v);
      expect(all.filter((m) => matchingNestings(m.p) === 0).length).toBe(v);
    });
  });
});

describe('noncrossingMatchings', () => {
  it('counts Catalan numbers (OEIS A000108: 1, 1, 2, 5, 14, 42, 132, 429, 1430)', () => {
    const a000108 = [1, 1, 2, 5, 14, 42, 132, 429, 1430];
    a000108.forEach((v, n) => expect(noncrossingMatchings.count(noncrossingMatchings.prepare([n]))).toBe(BigInt(v)));
  });
  it('enumerates exactly the matchings without a crossing (filtering matchings(n) as a second algorithm)', () => {
    for (let n = 0; n <= 6; n++) {
      const all = checkEnumeration(noncrossingMatchings, [n]);
      const brute = collect(matchings, matchings.prepare([n])).filter((m) => matchingCrossings(m.p) === 0);
      expect(all.map((m) => m.key()).sort()).toEqual(brute.map((m) => m.key()).sort());
    }
    checkEarlyStop(noncrossingMatchings, [4], 5);
    const p = noncrossingMatchings.prepare([2]);
    expect(
      noncrossingMatchings.isMember(
        p,
        Matching.fromArcs([
          [1, 3],
          [2, 4],
        ]),
      ),
    ).toBe(false);
  });
});
