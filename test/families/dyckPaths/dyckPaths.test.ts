import { describe, expect, it } from 'vitest';
import { dyckPaths, catalanBig } from '../../../src/families/dyckPaths/dyckPaths.js';
import { DyckPath } from '../../../src/families/dyckPaths/dyckPath.js';
import { decodeValue } from '../../../src/values/decode.js';
import { checkEnumeration, checkShrinks, chiSquareUniform } from '../partitions/uniformity.js';

// OEIS A000108, Catalan numbers C(0..15).
const A000108 = [1, 1, 2, 5, 14, 42, 132, 429, 1430, 4862, 16796, 58786, 208012, 742900, 2674440, 9694845];

describe('dyckPaths(n)', () => {
  it('counts Catalan numbers (OEIS A000108)', () => {
    for (let n = 0; n < A000108.length; n++) expect(catalanBig(n)).toBe(BigInt(A000108[n]));
  });
  it('enumerates C(n) distinct paths (OEIS A000108)', () => {
    for (let n = 0; n <= 9; n++) {
      const all = checkEnumeration(dyckPaths, { n });
      expect(all.length).toBe(A000108[n]);
      for (const d of all) DyckPath.from(d.word());
    }
  });
  it('area is distributed by the Carlitz q-Catalan numbers at n = 4 (OEIS A138158 row 4)', () => {
    // OEIS A138158, row n = 4: 1, 3, 3, 3, 2, 1, 1 for area 0..6.
    const t = new Array<number>(7).fill(0);
    dyckPaths.enumerate({ n: 4 }, (d) => void t[d.area()]++);
    expect(t).toEqual([1, 3, 3, 3, 2, 1, 1]);
  });
  it('samples uniformly by the cycle lemma (chi-square at n = 5, all 42)', () => {
    const all = checkEnumeration(dyckPaths, { n: 5 });
    const { chi, threshold } = chiSquareUniform(dyckPaths.arbitrary!({ n: 5 }), all, 21000);
    expect(chi).toBeLessThan(threshold);
  });
  it('shrinks to strictly simpler members', () => {
    for (let n = 1; n <= 6; n++) checkShrinks(dyckPaths, { n }, checkEnumeration(dyckPaths, { n }));
  });
  it('reads, prints and rejects', () => {
    const d = DyckPath.from('UUDUDD');
    expect(d.toText()).toBe('dyck("UUDUDD")');
    expect(decodeValue(d.encode())).toEqual(d);
    expect(() => DyckPath.from('UDDU')).toThrow(/below the axis/);
    expect(() => DyckPath.from('UUD')).toThrow(/height 1/);
  });
});
