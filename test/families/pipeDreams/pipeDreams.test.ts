import { describe, expect, it } from 'vitest';
import { pipeDreams, pipeDreamCount } from '../../../src/families/pipeDreams/pipeDreams.js';
import { tracePipes, PipeDream } from '../../../src/families/pipeDreams/pipeDream.js';
import { permutations } from '../../../src/families/permutations/permutations.js';
import { Permutation, inversions } from '../../../src/families/permutations/permutation.js';
import { hookContentCount } from '../../../src/families/tableaux/shapes.js';
import { decodeValue } from '../../../src/values/decode.js';
import { checkEnumeration, checkShrinks, chiSquareUniform, listAll } from '../partitions/uniformity.js';

/** Second algorithm: every set of inv(w) staircase cells whose traced pipes read w with no double crossing. */
function bruteForce(w: number[]): Set<string> {
  const n = w.length,
    l = inversions(w);
  const cells: [number, number][] = [];
  for (let i = 1; i < n; i++) for (let j = 1; i + j <= n; j++) cells.push([i, j]);
  const out = new Set<string>();
  for (let mask = 0; mask < 1 << cells.length; mask++) {
    const chosen = cells.filter((_, t) => mask & (1 << t));
    if (chosen.length !== l) continue;
    const { exits, reduced } = tracePipes(chosen, n);
    if (reduced && exits.every((c, i) => c === w[i])) out.add(new PipeDream(chosen).key());
  }
  return out;
}

describe('pipeDreams(w)', () => {
  it('matches the pipe-tracing definition by brute force on S_4 and S_5', () => {
    for (const n of [1, 2, 3, 4, 5]) {
      for (const w of listAll(permutations, { n })) {
        const p = pipeDreams.prepare([w]);
        const all = checkEnumeration(pipeDreams, p);
        const bf = bruteForce(w.a);
        expect(new Set(all.map((x) => x.key()))).toEqual(bf);
      }
    }
  });
  it('S_w(1,...,1) on S_3 from the Schubert polynomials of S_3 (the table of Schubert polynomials of S_3 in Macdonald, Notes on Schubert Polynomials (1991); from memory, and confirmed by the brute force above)', () => {
    // S_123 = 1, S_213 = x1, S_132 = x1 + x2, S_231 = x1 x2, S_312 = x1^2, S_321 = x1^2 x2.
    const expected: Record<string, number> = { '1,2,3': 1, '2,1,3': 1, '1,3,2': 2, '2,3,1': 1, '3,1,2': 1, '3,2,1': 1 };
    for (const [k, v] of Object.entries(expected)) expect(pipeDreamCount(k.split(',').map(Number))).toBe(BigInt(v));
    // S_1432 = x1^2 x2 + x1^2 x3 + x1 x2^2 + x1 x2 x3 + x2^2 x3 (from memory; brute force agrees): 5 pipe dreams.
    expect(pipeDreamCount([1, 4, 3, 2])).toBe(5n);
  });
  it('a Grassmannian w with descent k has S_w = s_lambda(x_1..x_k), so count = s_lambda(1^k) (Lascoux and Schützenberger 1982; Macdonald, Notes on Schubert Polynomials, ch. IV)', () => {
    for (const w of listAll(permutations, { n: 6 })) {
      const d = w.a.findIndex((v, i) => i + 1 < w.a.length && v > w.a[i + 1]);
      if (d < 0) continue;
      if (w.a.some((v, i) => i !== d && i + 1 < w.a.length && v > w.a[i + 1])) continue; // one descent only
      const k = d + 1;
      const lambda: number[] = [];
      for (let i = k; i >= 1; i--) if (w.a[i - 1] - i > 0) lambda.push(w.a[i - 1] - i);
      expect(pipeDreamCount(w.a)).toBe(hookContentCount(lambda, k));
    }
  });
  it('samples uniformly (chi-square on w = 1432 and w = 21543)', () => {
    for (const w of [
      [1, 4, 3, 2],
      [2, 1, 5, 4, 3],
    ]) {
      const p = pipeDreams.prepare([new Permutation(w)]);
      const all = checkEnumeration(pipeDreams, p);
      const { chi, threshold } = chiSquareUniform(pipeDreams.arbitrary!(p), all, 2000 * all.length);
      expect(chi).toBeLessThan(threshold);
    }
  });
  it('shrinks to strictly simpler pipe dreams of the same w', () => {
    for (const w of listAll(permutations, { n: 4 })) {
      const p = pipeDreams.prepare([w]);
      checkShrinks(pipeDreams, p, checkEnumeration(pipeDreams, p));
    }
  });
  it('round-trips', () => {
    const p = PipeDream.from([
      [1, 2],
      [1, 1],
    ]);
    expect(p.toText()).toBe('pipeDream([[1, 1], [1, 2]])');
    expect(decodeValue(p.encode())).toEqual(p);
  });
});
