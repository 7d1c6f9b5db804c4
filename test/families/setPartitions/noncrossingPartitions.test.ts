// noncrossingPartitions(n): counts (Catalan, OEIS A000108; by blocks Narayana, OEIS A001263),
// agreement with the filtered set partitions, the Dyck path bijection both ways, the sampler.

import { describe, expect, it } from 'vitest';
import {
  noncrossingPartitions,
  partitionOfDyckSteps,
  dyckStepsOfPartition,
} from '../../../src/families/setPartitions/noncrossingPartitions.js';
import { setPartitions } from '../../../src/families/setPartitions/setPartitions.js';
import { dyckPaths } from '../../../src/families/dyckPaths/dyckPaths.js';
import { isNoncrossing, partitionCrossings, partitionNestings } from '../../../src/families/setPartitions/arcs.js';
import { checkEnumeration, checkShrinks, chiSquareUniform } from '../partitions/uniformity.js';

const A000108 = [1, 1, 2, 5, 14, 42, 132, 429, 1430, 4862, 16796];
// OEIS A001263, Narayana numbers N(6, k), k = 1..6
const N6 = [1, 15, 50, 50, 15, 1];

/** The noncrossing test by its definition: no a < b < c < d with a, c in one block and b, d in another. */
function crossingFree(rgs: number[]): boolean {
  const n = rgs.length;
  for (let a = 0; a < n; a++)
    for (let b = a + 1; b < n; b++)
      for (let c = b + 1; c < n; c++)
        for (let d = c + 1; d < n; d++) if (rgs[a] === rgs[c] && rgs[b] === rgs[d] && rgs[a] !== rgs[b]) return false;
  return true;
}

describe('noncrossingPartitions(n)', () => {
  it('counts the Catalan numbers (OEIS A000108) and enumerates them, each once', () => {
    for (let n = 0; n < A000108.length; n++) expect(noncrossingPartitions.count({ n })).toBe(BigInt(A000108[n]));
    for (let n = 0; n <= 8; n++) expect(checkEnumeration(noncrossingPartitions, { n }).length).toBe(A000108[n]);
  });

  it('are exactly the set partitions without a crossing by the definition, or with no crossing arcs (n <= 8)', () => {
    for (let n = 0; n <= 8; n++) {
      const want = new Set<string>();
      setPartitions.enumerate({ n }, (s) => {
        const nc = crossingFree(s.rgs);
        expect(isNoncrossing(s.rgs)).toBe(nc);
        expect(partitionCrossings(s.rgs) === 0).toBe(nc);
        if (nc) want.add(s.key());
      });
      const got = new Set(checkEnumeration(noncrossingPartitions, { n }).map((s) => s.key()));
      expect(got).toEqual(want);
    }
  });

  it('by number of blocks: the Narayana numbers (OEIS A001263)', () => {
    const byBlocks = new Array(6).fill(0);
    for (const s of checkEnumeration(noncrossingPartitions, { n: 6 })) byBlocks[s.blockCount - 1]++;
    expect(byBlocks).toEqual(N6);
  });

  it('the Dyck path bijection is inverted by dyckStepsOfPartition (n <= 9)', () => {
    for (let n = 0; n <= 9; n++)
      dyckPaths.enumerate({ n }, (d) => {
        const rgs = new Array<number>(n);
        partitionOfDyckSteps(d.steps, rgs);
        expect(isNoncrossing(rgs)).toBe(true);
        expect(dyckStepsOfPartition(rgs)).toEqual(d.steps);
      });
  });

  it('samples uniformly (chi-square at n = 6, all 132) and shrinks to strictly simpler members', () => {
    const all = checkEnumeration(noncrossingPartitions, { n: 6 });
    const { chi, threshold } = chiSquareUniform(noncrossingPartitions.arbitrary!({ n: 6 }), all, 26400);
    expect(chi).toBeLessThan(threshold);
    for (let n = 1; n <= 6; n++) checkShrinks(noncrossingPartitions, { n }, checkEnumeration(noncrossingPartitions, { n }));
  });

  it('crossings and nestings are equidistributed, jointly symmetric, over all set partitions (Chen, Deng, Du, Stanley and Yan 2007), n <= 8; nonnesting ones are Catalan too', () => {
    for (let n = 0; n <= 8; n++) {
      const joint = new Map<string, number>();
      let nonnesting = 0;
      setPartitions.enumerate({ n }, (s) => {
        const k = `${partitionCrossings(s.rgs)},${partitionNestings(s.rgs)}`;
        joint.set(k, (joint.get(k) ?? 0) + 1);
        if (partitionNestings(s.rgs) === 0) nonnesting++;
      });
      for (const [k, c] of joint) expect(joint.get(k.split(',').reverse().join(','))).toBe(c);
      expect(nonnesting).toBe(A000108[n]);
    }
  });
});
