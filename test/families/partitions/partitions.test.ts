import * as fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { partitions, nextPartition, comparePartitions } from '../../../src/families/partitions/partitions.js';
import { partitionCount } from '../../../src/families/partitions/partitionCounts.js';
import { Partition } from '../../../src/families/partitions/partition.js';
import { decodeValue } from '../../../src/values/decode.js';
import { checkEnumeration, checkShrinks, chiSquareUniform } from './uniformity.js';

// OEIS A000041, p(0..30).
const A000041 = [
  1, 1, 2, 3, 5, 7, 11, 15, 22, 30, 42, 56, 77, 101, 135, 176, 231, 297, 385, 490, 627, 792, 1002, 1255, 1575, 1958, 2436, 3010, 3718, 4565,
  5604,
];

describe('partitions(n)', () => {
  it('counts p(n) by the pentagonal recurrence (OEIS A000041)', () => {
    for (let n = 0; n < A000041.length; n++) expect(partitionCount(n)).toBe(BigInt(A000041[n]));
    // OEIS A000041: p(100) = 190569292, p(200) = 3972999029388.
    expect(partitionCount(100)).toBe(190569292n);
    expect(partitionCount(200)).toBe(3972999029388n);
  });

  it('enumerates p(n) distinct partitions of n in reverse lexicographic order (OEIS A000041)', () => {
    for (let n = 0; n <= 15; n++) {
      const all = checkEnumeration(partitions, { n });
      expect(all.length).toBe(A000041[n]);
      for (const l of all) expect(Partition.from(l.parts).size).toBe(n);
    }
    const five = [] as string[];
    partitions.enumerate({ n: 5 }, (l) => void five.push(l.key()));
    expect(five).toEqual(['5', '4,1', '3,2', '3,1,1', '2,2,1', '2,1,1,1', '1,1,1,1,1']);
  });

  it('steps in place and stops after 1^n', () => {
    const a = [1, 1];
    expect(nextPartition(a)).toBe(false);
  });

  it('orders by size, then length, then reverse lexicographic', () => {
    const c = (x: number[], y: number[]) => Math.sign(comparePartitions(new Partition(x), new Partition(y)));
    expect(c([3, 1], [2, 2])).toBe(-1);
    expect(c([4], [3, 1])).toBe(-1);
    expect(c([1, 1, 1], [4])).toBe(-1);
  });

  it('samples uniformly (chi-square at n = 8, all 22 partitions)', () => {
    const all = checkEnumeration(partitions, { n: 8 });
    const { chi, threshold } = chiSquareUniform(partitions.arbitrary!({ n: 8 }), all, 22000);
    expect(chi).toBeLessThan(threshold);
  });

  it('samples members at large n', () => {
    for (const l of fc.sample(partitions.arbitrary!({ n: 300 }), { numRuns: 20, seed: 7 })) {
      expect(partitions.isMember({ n: 300 }, Partition.from(l.parts))).toBe(true);
    }
  });

  it('shrinks to strictly simpler members', () => {
    for (let n = 1; n <= 8; n++) {
      const all = checkEnumeration(partitions, { n });
      expect(checkShrinks(partitions, { n }, all)).toBeGreaterThan(0);
    }
    const s = [...partitions.shrink!({ n: 6 }, new Partition([3, 2, 1]))].map((x) => x.obj.key());
    expect(s).toEqual(['3,2', '3,1,1', '2,2,1', '4,2']);
  });

  it('round-trips through the record encoding and rejects non-partitions', () => {
    const l = new Partition([3, 1, 1]);
    expect(decodeValue(l.encode())).toEqual(l);
    expect(l.toText()).toBe('partition([3, 1, 1])');
    expect(l.at(1)).toBe(3);
    expect(l.at(4)).toBe(0);
    expect(() => Partition.from([1, 2])).toThrow(/weakly decreasing/);
    expect(() => Partition.from([2, 0])).toThrow(/positive/);
  });
});
