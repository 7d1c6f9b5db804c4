// motzkinPaths(n): the Motzkin numbers (OEIS A001006), the enumeration against a brute-force
// filter of all step words, and the count by up steps C(n, 2k) C_k (Donaghey and Shapiro, "Motzkin
// numbers", J. Combin. Theory A 23 (1977)).

import { describe, expect, it } from 'vitest';
import { motzkinPaths } from '../../../src/families/motzkinPaths/motzkinPaths.js';
import { MotzkinPath } from '../../../src/families/motzkinPaths/motzkinPath.js';
import { decodeValue } from '../../../src/values/decode.js';
import { checkEnumeration, checkShrinks } from '../partitions/uniformity.js';

const A001006 = [1, 1, 2, 4, 9, 21, 51, 127, 323, 835, 2188, 5798, 15511, 41835, 113634, 310572];

describe('motzkinPaths(n)', () => {
  it('counts the Motzkin numbers (OEIS A001006)', () => {
    A001006.forEach((m, n) => expect(motzkinPaths.count({ n })).toBe(BigInt(m)));
  });

  it('enumerates exactly the step words that stay >= 0 and end at 0, in lexicographic order U < F < D (n <= 8)', () => {
    for (let n = 0; n <= 8; n++) {
      const want: string[] = [];
      const rec = (w: string, h: number) => {
        if (h < 0) return;
        if (w.length === n) {
          if (h === 0) want.push(w);
          return;
        }
        rec(w + 'U', h + 1);
        rec(w + 'F', h);
        rec(w + 'D', h - 1);
      };
      rec('', 0);
      expect(checkEnumeration(motzkinPaths, { n }).map((p) => p.word())).toEqual(want);
    }
  });

  it('by number of up steps: C(n, 2k) C_k (Donaghey and Shapiro 1977), n = 9', () => {
    const by = [0, 0, 0, 0, 0];
    for (const p of checkEnumeration(motzkinPaths, { n: 9 })) by[p.steps.filter((s) => s > 0).length]++;
    const C = [1, 1, 2, 5, 14],
      binom = [1, 36, 126, 84, 9]; // C(9, 2k)
    expect(by).toEqual(binom.map((b, k) => b * C[k]));
  });

  it('shrinks to strictly simpler members; text form and decoding round-trip', () => {
    for (let n = 1; n <= 7; n++) checkShrinks(motzkinPaths, { n }, checkEnumeration(motzkinPaths, { n }));
    const p = MotzkinPath.from('UFDF');
    expect(p.toText()).toBe('motzkinPath("UFDF")');
    expect(decodeValue(p.encode())).toEqual(p);
    expect(() => MotzkinPath.from('DU')).toThrow(/below the axis/);
    expect(() => MotzkinPath.from('UF')).toThrow(/ends at height 1/);
  });
});
