// parkingFunctions(n): (n+1)^(n-1) (OEIS A000272), the enumeration against a brute-force filter
// of all sequences, the completion counts behind the slices, and the increasing ones (Catalan,
// OEIS A000108).

import { describe, expect, it } from 'vitest';
import { completionCount, parkingFunctions } from '../../../src/families/parkingFunctions/parkingFunctions.js';
import { isParkingFunction, ParkingFunction } from '../../../src/families/parkingFunctions/parkingFunction.js';
import { decodeValue } from '../../../src/values/decode.js';
import { checkEnumeration, checkShrinks } from '../partitions/uniformity.js';

const A000272 = [1, 1, 3, 16, 125, 1296, 16807, 262144, 4782969];

/** All sequences in {1..n}^n, lexicographically. */
function allSequences(n: number): number[][] {
  if (n === 0) return [[]];
  let out: number[][] = [[]];
  for (let i = 0; i < n; i++) out = out.flatMap((s) => Array.from({ length: n }, (_, v) => [...s, v + 1]));
  return out;
}

/** The parking test by its definition: the increasing rearrangement b has b_i <= i. */
const parks = (a: number[]) =>
  a
    .slice()
    .sort((x, y) => x - y)
    .every((b, i) => b <= i + 1);

describe('parkingFunctions(n)', () => {
  it('counts (n+1)^(n-1) (OEIS A000272)', () => {
    A000272.forEach((c, n) => expect(parkingFunctions.count({ n })).toBe(BigInt(c)));
  });

  it('enumerates exactly the sequences that park, in lexicographic order (n <= 6)', () => {
    for (let n = 0; n <= 6; n++) {
      const want = allSequences(n)
        .filter(parks)
        .map((a) => a.join(','));
      expect(checkEnumeration(parkingFunctions, { n }).map((p) => p.key())).toEqual(want);
      for (const a of allSequences(Math.min(n, 5))) expect(isParkingFunction(a)).toBe(parks(a));
    }
  });

  it('completion counts agree with brute force for every prefix (n <= 5)', () => {
    for (let n = 1; n <= 5; n++) {
      const seqs = allSequences(n);
      for (let len = 0; len <= n; len++) {
        const byPrefix = new Map<string, number>();
        for (const a of seqs) if (parks(a)) byPrefix.set(a.slice(0, len).join(), (byPrefix.get(a.slice(0, len).join()) ?? 0) + 1);
        for (const a of seqs) {
          const prefix = a.slice(0, len);
          const counts = new Array(n + 2).fill(0);
          for (const v of prefix) counts[v]++;
          expect(completionCount(n, counts, n - len)).toBe(BigInt(byPrefix.get(prefix.join()) ?? 0));
        }
      }
    }
  });

  it('the weakly increasing ones are counted by the Catalan numbers (OEIS A000108)', () => {
    const C = [1, 1, 2, 5, 14, 42, 132];
    for (let n = 0; n <= 6; n++)
      expect(
        checkEnumeration(parkingFunctions, { n }).filter((p) => p.values.every((x, i) => i === 0 || p.values[i - 1] <= x)).length,
      ).toBe(C[n]);
  });

  it('shrinks to strictly simpler members; text form and decoding round-trip', () => {
    for (let n = 1; n <= 5; n++) checkShrinks(parkingFunctions, { n }, checkEnumeration(parkingFunctions, { n }));
    const p = ParkingFunction.from([3, 1, 1]);
    expect(p.toText()).toBe('parkingFunction([3, 1, 1])');
    expect(decodeValue(p.encode())).toEqual(p);
    expect(() => ParkingFunction.from([2, 2])).toThrow(/not a parking function/);
  });
});
