// Every permutation family enumerates in lexicographic order, like permutations(n), so that
// list(...) comparisons across families mean what they say. Counts: OEIS A000108 (132), A000085
// (involutions), A000166 (derangements), A006012 (separable: 2413 and 3142).

import { describe, expect, test } from 'vitest';
import '../../../src/families/index.js';
import '../../../src/library/index.js';
import { evaluate } from '../../../src/language/expr/index.js';

describe('permutation families in lexicographic order', () => {
  test.each([
    ['avoiders(n, "132")', 'avoids(w, "132")'],
    ['avoiders(n, "2413", "3142")', 'avoids(w, "2413") and avoids(w, "3142")'],
    ['avoiders(n, "1342")', 'avoids(w, "1342")'],
    ['involutions(n)', 'w^2 == perm(list(i for i in 1..n))'],
    ['derangements(n)', 'fixedPoints(w) == 0'],
  ])('%s is permutations(n) filtered, in the same order', (fam, cond) => {
    for (const n of [0, 1, 3, 5, 6]) {
      expect(
        evaluate(
          `list(w for w in permutations(${n}) where ${cond.replace(/\bn\b/g, String(n))}) == list(w for w in ${fam.replace(/\bn\b/, String(n))})`,
        ),
      ).toBe(true);
    }
  });
});
