import { describe, expect, it } from 'vitest';
import { rskRows } from '../../src/library/rsk.js';
import { getFunction } from '../../src/library/registry.js';
import { evacuationRows } from '../../src/library/tableaux.js';
import { permutations } from '../../src/families/permutations/permutations.js';
import { Permutation } from '../../src/families/permutations/permutation.js';
import { Tableau } from '../../src/families/tableaux/tableau.js';
import { hookLengthCount } from '../../src/families/tableaux/shapes.js';
import { listAll } from '../families/partitions/uniformity.js';

/** Longest strictly increasing (dir = 1) or decreasing (dir = -1) subsequence, by O(n^2) dynamic programming. */
function longestMonotone(a: number[], dir: number): number {
  const best = a.map(() => 1);
  for (let i = 0; i < a.length; i++) for (let j = 0; j < i; j++) if ((a[i] - a[j]) * dir > 0) best[i] = Math.max(best[i], best[j] + 1);
  return Math.max(0, ...best);
}

const key = (rows: number[][]) => rows.map((r) => r.join(',')).join('/');

describe('rsk(w)', () => {
  it('is a bijection from S_n onto pairs of standard tableaux of equal shape (n <= 6; Stanley EC2 Thm 7.11.5)', () => {
    let fact = 1;
    for (let n = 0; n <= 6; n++) {
      if (n > 0) fact *= n;
      const seen = new Set<string>();
      const shapes = new Map<string, number>();
      for (const w of listAll(permutations, { n })) {
        const { P, Q } = rskRows(w.a);
        const tp = Tableau.from(P),
          tq = Tableau.from(Q);
        expect(tp.isStandard() && tq.isStandard()).toBe(true);
        expect(tp.shapeParts()).toEqual(tq.shapeParts());
        seen.add(key(P) + '|' + key(Q));
        const sh = tp.shapeParts().join(',');
        shapes.set(sh, (shapes.get(sh) ?? 0) + 1);
        // Schensted: first row = longest increasing, number of rows = longest decreasing subsequence.
        expect(P.length ? P[0].length : 0).toBe(longestMonotone(w.a, 1));
        expect(P.length).toBe(longestMonotone(w.a, -1));
        // Symmetry (Schützenberger): P(w^-1) = Q(w).
        const inv = new Array<number>(n);
        w.a.forEach((v, i) => (inv[v - 1] = i + 1));
        expect(key(rskRows(inv).P)).toBe(key(Q));
        // Reverse-complement w# = w0 w w0 gives P(w#) = evac P(w) (Stanley EC2 Thm A1.2.10).
        const sharp = w.a.map((_, i) => n + 1 - w.a[n - 1 - i]);
        expect(key(rskRows(sharp).P)).toBe(key(evacuationRows(P)));
      }
      expect(seen.size).toBe(fact);
      // Each shape occurs (f^lambda)^2 times, so the squares sum to n!.
      for (const [sh, c] of shapes) expect(BigInt(c)).toBe(hookLengthCount(sh ? sh.split(',').map(Number) : []) ** 2n);
    }
  });
  it('words give a semistandard P and a standard Q (RSK for words, Stanley EC2 §7.11)', () => {
    const { P, Q } = rskRows([2, 1, 1, 3, 2]);
    expect(P).toEqual([
      [1, 1, 2],
      [2, 3],
    ]);
    expect(Tableau.from(Q).isStandard()).toBe(true);
  });
  it('the registered functions take permutations and return [P, Q] and the shape', () => {
    const [P, Q] = getFunction('rsk')!.impl(new Permutation([3, 1, 2])) as Tableau[];
    expect(P.toText()).toBe('tableau([[1, 2], [3]])');
    expect(Q.toText()).toBe('tableau([[1, 3], [2]])');
    expect(
      getFunction('rskShape')!
        .impl(new Permutation([1, 2, 3]))
        .toString(),
    ).toBeDefined();
    expect(() => getFunction('rsk')!.impl('abc')).toThrow(/permutation, a word or a list/);
  });
});
