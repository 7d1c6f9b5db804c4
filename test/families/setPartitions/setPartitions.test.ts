import { describe, expect, it } from 'vitest';
import { setPartitions, bellNumber } from '../../../src/families/setPartitions/setPartitions.js';
import { SetPartition } from '../../../src/families/setPartitions/setPartition.js';
import { decodeValue } from '../../../src/values/decode.js';
import { checkEnumeration, checkShrinks, chiSquareUniform } from '../partitions/uniformity.js';

// OEIS A000110, Bell numbers B(0..15).
const A000110 = [1, 1, 2, 5, 15, 52, 203, 877, 4140, 21147, 115975, 678570, 4213597, 27644437, 190899322, 1382958545];
// OEIS A008277, Stirling numbers of the second kind S(5, k), k = 1..5: blocks distribution.
const S5 = [1, 15, 25, 10, 1];

describe('setPartitions(n)', () => {
  it('counts Bell numbers (OEIS A000110)', () => {
    for (let n = 0; n < A000110.length; n++) expect(bellNumber(n)).toBe(BigInt(A000110[n]));
  });
  it('enumerates B(n) distinct set partitions (OEIS A000110) with blocks by S(n, k) (OEIS A008277)', () => {
    for (let n = 0; n <= 8; n++) expect(checkEnumeration(setPartitions, { n }).length).toBe(A000110[n]);
    const byBlocks = [0, 0, 0, 0, 0];
    for (const s of checkEnumeration(setPartitions, { n: 5 })) byBlocks[s.blockCount - 1]++;
    expect(byBlocks).toEqual(S5);
  });
  it('samples uniformly (chi-square at n = 5, all 52)', () => {
    const all = checkEnumeration(setPartitions, { n: 5 });
    const { chi, threshold } = chiSquareUniform(setPartitions.arbitrary!({ n: 5 }), all, 26000);
    expect(chi).toBeLessThan(threshold);
  });
  it('shrinks to strictly simpler members', () => {
    for (let n = 1; n <= 6; n++) checkShrinks(setPartitions, { n }, checkEnumeration(setPartitions, { n }));
  });
  it('prints blocks and round-trips', () => {
    const s = SetPartition.fromBlocks([
      [2, 4],
      [1, 3],
    ]);
    expect(s.rgs).toEqual([1, 2, 1, 2]);
    expect(s.toText()).toBe('setPartition([[1, 3], [2, 4]])');
    expect(decodeValue(s.encode())).toEqual(s);
    expect(() => SetPartition.fromBlocks([[1, 2], [2]])).toThrow(/appears twice|out of range/);
  });
});
