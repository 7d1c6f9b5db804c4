import { describe, expect, it } from 'vitest';
import { permutations } from '../../../src/families/permutations/permutations.js';
import { Permutation, lexCompare } from '../../../src/families/permutations/permutation.js';
import { checkEarlyStop, checkEnumeration } from '../familyChecks.js';

describe('permutations', () => {
  it('counts n! (OEIS A000142: 1, 1, 2, 6, 24, 120, 720, 5040)', () => {
    const a000142 = [1, 1, 2, 6, 24, 120, 720, 5040];
    a000142.forEach((v, n) => expect(permutations.count(permutations.prepare([n]))).toBe(BigInt(v)));
  });
  it('enumerates every permutation once, in lexicographic order', () => {
    for (let n = 0; n <= 6; n++) checkEnumeration(permutations, [n], (a, b) => lexCompare(a.a, b.a));
    checkEarlyStop(permutations, [4], 7);
  });
  it('shrinks to strictly simpler members: deletions to S_{n-1}, then descent swaps', () => {
    const w = Permutation.from([3, 1, 4, 2]);
    const p = permutations.prepare([4]);
    const out = [...permutations.shrink!(p, w)];
    expect(out.filter((s) => s.size === 3).map((s) => s.obj.key())).toEqual(['1,3,2', '2,3,1', '3,1,2', '2,1,3']);
    expect(out.filter((s) => s.size === undefined).map((s) => s.obj.key())).toEqual(['1,3,4,2', '3,1,2,4']);
  });
});

describe('permutations: removing a point from its cycle', () => {
  it('keeps the other cycles (worked example: (1 2)(3 4 5) without 4 is (1 2)(3 4))', () => {
    // w = 2 1 4 5 3 has cycles (1 2)(3 4 5); removing 4 leaves 3 -> 5 -> 3, standardised to (3 4)
    const out = [...permutations.shrink!(permutations.prepare([5]), Permutation.from([2, 1, 4, 5, 3]))].map((s) => s.obj.key());
    expect(out).toContain('2,1,4,3');
  });
});
