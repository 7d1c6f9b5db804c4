import { describe, expect, it } from 'vitest';
import { standardTableaux } from '../../../src/families/tableaux/standardTableaux.js';
import { semistandardTableaux } from '../../../src/families/tableaux/semistandardTableaux.js';
import { Tableau } from '../../../src/families/tableaux/tableau.js';
import { partitions } from '../../../src/families/partitions/partitions.js';
import { decodeValue } from '../../../src/values/decode.js';
import { checkEnumeration, checkShrinks, chiSquareUniform, listAll } from '../partitions/uniformity.js';

// OEIS A000085: number of SYT with n cells = number of involutions: 1, 1, 2, 4, 10, 26, 76, 232, 764.
const A000085 = [1, 1, 2, 4, 10, 26, 76, 232, 764];

describe('standardTableaux(lambda)', () => {
  it('hook length formula = enumeration, and sum over shapes is OEIS A000085', () => {
    for (let n = 0; n < A000085.length; n++) {
      let total = 0n;
      for (const l of listAll(partitions, { n })) {
        const p = { parts: l.parts, n };
        const all = checkEnumeration(standardTableaux, p);
        total += BigInt(all.length);
      }
      expect(total).toBe(BigInt(A000085[n]));
    }
  });
  it('f^(n-1,1) = n - 1 and f^(3,3) = 5 (Catalan, OEIS A000108), f^(4,3,2,1) = 768 (OEIS A005118)', () => {
    expect(standardTableaux.count({ parts: [4, 1], n: 5 })).toBe(4n);
    expect(standardTableaux.count({ parts: [3, 3], n: 6 })).toBe(5n);
    expect(standardTableaux.count({ parts: [4, 3, 2, 1], n: 10 })).toBe(768n);
  });
  it('samples uniformly by the hook walk (chi-square on shape (3,2,1): 16 tableaux; (4,2): 9)', () => {
    for (const parts of [
      [3, 2, 1],
      [4, 2],
    ]) {
      const p = { parts, n: 6 };
      const all = checkEnumeration(standardTableaux, p);
      const { chi, threshold } = chiSquareUniform(standardTableaux.arbitrary!(p), all, 800 * all.length);
      expect(chi).toBeLessThan(threshold);
    }
  });
  it('shrinks to strictly simpler members', () => {
    for (const l of listAll(partitions, { n: 5 })) {
      const p = { parts: l.parts, n: 5 };
      checkShrinks(standardTableaux, p, checkEnumeration(standardTableaux, p));
    }
  });
});

describe('semistandardTableaux(lambda, m)', () => {
  it('hook-content formula = enumeration (Stanley, EC2 Cor. 7.21.4)', () => {
    // s_(2,1)(1,1,1) = 8 (EC2 Example 7.21.3 style; also by enumeration below).
    expect(semistandardTableaux.count({ parts: [2, 1], m: 3, n: 3 })).toBe(8n);
    for (let n = 0; n <= 5; n++)
      for (const l of listAll(partitions, { n }))
        for (let m = 0; m <= 4; m++) checkEnumeration(semistandardTableaux, { parts: l.parts, m, n });
  });
  it('sum over lambda of s_lambda(1^m) with |lambda| = n is the number of multisets... m^n by RSK: sum f^l s_l(1^m) = m^n', () => {
    // Schur-Weyl / RSK for words (Stanley, EC2 Cor. 7.13.9 via RSK): sum_lambda f^lambda s_lambda(1^m) = m^n.
    for (let n = 0; n <= 6; n++) {
      let s = 0n;
      for (const l of listAll(partitions, { n }))
        s += standardTableaux.count({ parts: l.parts, n }) * semistandardTableaux.count({ parts: l.parts, m: 3, n });
      expect(s).toBe(3n ** BigInt(n));
    }
  });
  it('samples uniformly (chi-square on shape (2,1), m = 3: 8; (2,2), m = 3: 6; (3,1), m=3: 15)', () => {
    for (const parts of [
      [2, 1],
      [2, 2],
      [3, 1],
    ]) {
      const p = { parts, m: 3, n: parts[0] + parts[1] };
      const all = checkEnumeration(semistandardTableaux, p);
      const { chi, threshold } = chiSquareUniform(semistandardTableaux.arbitrary!(p), all, 1000 * all.length);
      expect(chi).toBeLessThan(threshold);
    }
  });
  it('shrinks to strictly simpler members', () => {
    for (const l of listAll(partitions, { n: 4 })) {
      const p = { parts: l.parts, m: 3, n: 4 };
      checkShrinks(semistandardTableaux, p, checkEnumeration(semistandardTableaux, p));
    }
  });
});

describe('Tableau', () => {
  it('reads, prints and rejects', () => {
    const t = Tableau.from([[1, 2], [3]]);
    expect(t.toText()).toBe('tableau([[1, 2], [3]])');
    expect(decodeValue(t.encode())).toEqual(t);
    expect(() => Tableau.from([[1, 2], [1]])).toThrow(/column 1/);
    expect(() => Tableau.from([[2, 1]])).toThrow(/row 1/);
    expect(() => Tableau.from([[1], [2, 3]])).toThrow(/decrease/);
  });
});
