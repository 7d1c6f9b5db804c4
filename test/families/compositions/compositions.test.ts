import { describe, expect, it } from 'vitest';
import { compositions } from '../../../src/families/compositions/compositions.js';
import { Composition } from '../../../src/families/compositions/composition.js';
import { lexCompareArrays } from '../../../src/families/common/arbitrary.js';
import { decodeValue } from '../../../src/values/decode.js';
import { checkEarlyStop, checkEnumeration } from '../familyChecks.js';

describe('compositions', () => {
  it('the class validates, prints and decodes', () => {
    const c = Composition.from([1, 3, 1]);
    expect(c.toText()).toBe('composition([1, 3, 1])');
    expect(c.encode()).toEqual({ composition: [1, 3, 1] });
    expect((decodeValue({ composition: [1, 3, 1] }) as Composition).equals(c)).toBe(true);
    expect(() => Composition.from([2, 0])).toThrow(/positive/);
  });
  it('counts OEIS A011782: 1, 1, 2, 4, 8, 16, 32, 64', () => {
    const a011782 = [1, 1, 2, 4, 8, 16, 32, 64];
    a011782.forEach((v, n) => expect(compositions.count(compositions.prepare([n]))).toBe(BigInt(v)));
  });
  it('enumerates every composition once, lexicographically', () => {
    for (let n = 0; n <= 9; n++) checkEnumeration(compositions, [n], (a, b) => lexCompareArrays(a.parts, b.parts));
    checkEarlyStop(compositions, [5], 6);
  });
  it('shrinks by lowering a part, then merging neighbours', () => {
    const out = [...compositions.shrink!(compositions.prepare([4]), Composition.from([1, 3]))];
    expect(out.map((s) => [s.size, s.obj.key()])).toEqual([
      [3, '3'],
      [3, '1,2'],
      [undefined, '4'],
    ]);
  });
});
