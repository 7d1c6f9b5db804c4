import { describe, expect, it } from 'vitest';
import { subsets } from '../../../src/families/subsets/subsets.js';
import { Subset } from '../../../src/families/subsets/subset.js';
import { decodeValue } from '../../../src/values/decode.js';
import { checkEarlyStop, checkEnumeration } from '../familyChecks.js';
import { compareSubsets } from '../../../src/families/subsets/subsets.js';

describe('subsets', () => {
  it('the class sorts, validates, prints and decodes', () => {
    const s = Subset.from([3, 1]);
    expect(s.elems).toEqual([1, 3]);
    expect(s.toText()).toBe('subset([1, 3])');
    expect(s.encode()).toEqual({ subset: [1, 3] });
    expect((decodeValue({ subset: [1, 3] }) as Subset).equals(s)).toBe(true);
    expect(() => Subset.from([1, 1])).toThrow(/twice/);
  });
  it('counts 2^n (OEIS A000079) and binomial coefficients (Pascal triangle, OEIS A007318)', () => {
    const a000079 = [1, 2, 4, 8, 16, 32, 64, 128];
    a000079.forEach((v, n) => expect(subsets.count(subsets.prepare([n]))).toBe(BigInt(v)));
    // row 6 of Pascal's triangle: 1, 6, 15, 20, 15, 6, 1
    [1, 6, 15, 20, 15, 6, 1, 0].forEach((v, k) => expect(subsets.count(subsets.prepare([6, k]))).toBe(BigInt(v)));
  });
  it('enumerates by size, then lexicographically; each subset once', () => {
    for (let n = 0; n <= 8; n++) {
      checkEnumeration(subsets, [n], compareSubsets);
      for (let k = 0; k <= n + 1; k++) checkEnumeration(subsets, [n, k], compareSubsets);
    }
    checkEarlyStop(subsets, [5], 9);
    expect(subsets.isMember(subsets.prepare([3]), Subset.from([1, 4]))).toBe(false);
    expect(subsets.isMember(subsets.prepare([4, 1]), Subset.from([1, 4]))).toBe(false);
  });
});
