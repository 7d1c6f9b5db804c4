import { describe, expect, it } from 'vitest';
import * as fc from 'fast-check';
import { asms, asmCount } from '../../../src/families/asms/asms.js';
import { Asm } from '../../../src/families/asms/asm.js';
import { decodeValue } from '../../../src/values/decode.js';
import { checkEnumeration, checkShrinks, chiSquareUniform } from '../partitions/uniformity.js';

// OEIS A005130: 1, 1, 2, 7, 42, 429, 7436, 218348, 10850216, 911835460.
const A005130 = [1, 1, 2, 7, 42, 429, 7436, 218348, 10850216, 911835460];

describe('asms(n)', () => {
  it('counts by the product formula (OEIS A005130)', () => {
    for (let n = 0; n < A005130.length; n++) expect(asmCount(n)).toBe(BigInt(A005130[n]));
  });
  it('enumerates distinct valid ASMs, as many as the count (OEIS A005130)', () => {
    for (let n = 0; n <= 6; n++) {
      const all = checkEnumeration(asms, { n });
      expect(all.length).toBe(A005130[n]);
      if (n <= 5) for (const a of all) Asm.from(a.rows); // validates
    }
  });
  it('the ASMs without -1 are the permutation matrices (n! of them, OEIS A000142)', () => {
    let c = 0;
    asms.enumerate({ n: 5 }, (a) => void (a.negatives() === 0 && c++));
    expect(c).toBe(120);
  });
  it('samples uniformly by coupling from the past (chi-square at n = 4, all 42)', () => {
    const all = checkEnumeration(asms, { n: 4 });
    const { chi, threshold } = chiSquareUniform(asms.arbitrary!({ n: 4 }), all, 12600);
    expect(chi).toBeLessThan(threshold);
  });
  it('samples uniformly at n = 5 too (chi-square over all 429, about 1 s)', () => {
    const all = checkEnumeration(asms, { n: 5 });
    const { chi, threshold } = chiSquareUniform(asms.arbitrary!({ n: 5 }), all, 50 * 429, 5);
    expect(chi).toBeLessThan(threshold);
  });
  it('samples valid ASMs at n = 12', () => {
    for (const a of fc.sample(asms.arbitrary!({ n: 12 }), { numRuns: 3, seed: 3 })) Asm.from(a.rows);
  });
  it('shrinks to strictly simpler members', () => {
    for (let n = 1; n <= 4; n++) checkShrinks(asms, { n }, checkEnumeration(asms, { n }));
  });
  it('reads, prints and rejects', () => {
    const a = Asm.from([
      [0, 1, 0],
      [1, -1, 1],
      [0, 1, 0],
    ]);
    expect(a.toText()).toBe('asm([[0, 1, 0], [1, -1, 1], [0, 1, 0]])');
    expect(decodeValue(a.encode())).toEqual(a);
    expect(() =>
      Asm.from([
        [1, 1],
        [0, 0],
      ]),
    ).toThrow(/alternat/);
  });
});
