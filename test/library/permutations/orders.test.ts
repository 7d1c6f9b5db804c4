// Bruhat and right weak order (src/library/permutations/orders.ts), each compared exhaustively
// with independent characterisations (Björner and Brenti, Combinatorics of Coxeter Groups).

import { describe, expect, it } from 'vitest';
import '../../../src/library/permutations.js';
import { allPerms, call, compose, perm } from './helpers.js';

const inv = (a: number[]) => {
  let c = 0;
  for (let i = 0; i < a.length; i++) for (let j = i + 1; j < a.length; j++) if (a[i] > a[j]) c++;
  return c;
};

/** Tableau criterion (Björner–Brenti ch. 2): for every k, sorted u[1..k] <= sorted v[1..k] entrywise. */
function bruhatTableau(u: number[], v: number[]): boolean {
  for (let k = 1; k <= u.length; k++) {
    const a = u.slice(0, k).sort((x, y) => x - y),
      b = v.slice(0, k).sort((x, y) => x - y);
    if (a.some((x, i) => x > b[i])) return false;
  }
  return true;
}

/** The definition: the transitive closure of u -> u * t, t a transposition, inv(u t) > inv(u). */
function bruhatClosure(n: number): Map<string, Set<string>> {
  const S = allPerms(n);
  const up = new Map<string, Set<string>>();
  // process from the top so every upper set is known when needed
  const byInvDesc = [...S].sort((a, b) => inv(b) - inv(a));
  for (const u of byInvDesc) {
    const above = new Set<string>([u.join()]);
    for (let i = 0; i < n; i++)
      for (let j = i + 1; j < n; j++) {
        const w = u.slice();
        [w[i], w[j]] = [w[j], w[i]];
        if (inv(w) > inv(u)) for (const x of up.get(w.join())!) above.add(x);
      }
    up.set(u.join(), above);
  }
  return up;
}

/** Subword property: products of the reduced subwords of one reduced word of v are exactly [e, v]. */
function bruhatBelowBySubwords(v: number[]): Set<string> {
  const n = v.length;
  const word = call('reducedWord', perm(v)) as number[];
  const out = new Set<string>();
  for (let mask = 0; mask < 1 << word.length; mask++) {
    let p = Array.from({ length: n }, (_, i) => i + 1),
      len = 0;
    word.forEach((i, k) => {
      if (mask & (1 << k)) {
        p = compose(p, (call('simple', i, n) as unknown as { a: number[] }).a);
        len++;
      }
    });
    if (inv(p) === len) out.add(p.join());
  }
  return out;
}

describe('bruhatLeq', () => {
  it('agrees with the definition (chains of transpositions) and the tableau criterion on all of S_1..S_4', () => {
    for (let n = 1; n <= 4; n++) {
      const up = bruhatClosure(n);
      for (const u of allPerms(n))
        for (const v of allPerms(n)) {
          const r = call('bruhatLeq', perm(u), perm(v));
          expect(r).toBe(up.get(u.join())!.has(v.join()));
          expect(r).toBe(bruhatTableau(u, v));
        }
    }
  });
  it('agrees with the subword property and the tableau criterion on all of S_5', () => {
    const S = allPerms(5);
    for (const v of S) {
      const below = bruhatBelowBySubwords(v);
      for (const u of S) {
        const r = call('bruhatLeq', perm(u), perm(v));
        expect(r).toBe(below.has(u.join()));
        expect(r).toBe(bruhatTableau(u, v));
      }
    }
  });
  it('is graded by inv: covering pairs differ by one inversion; S_4 has 24 elements between e and w0', () => {
    const S = allPerms(4);
    const w0 = perm([4, 3, 2, 1]),
      e = perm([1, 2, 3, 4]);
    expect(S.filter((a) => call('bruhatLeq', e, perm(a)) && call('bruhatLeq', perm(a), w0)).length).toBe(24);
    for (const u of S) for (const v of S) if (call('bruhatLeq', perm(u), perm(v))) expect(inv(u) <= inv(v)).toBe(true);
  });
  it('refuses permutations of different sizes', () => {
    expect(() => call('bruhatLeq', perm([1, 2]), perm([1, 2, 3]))).toThrow(/same size, got sizes 2 and 3/);
    expect(() => call('weakLeq', perm([1]), perm([]))).toThrow(/same size, got sizes 1 and 0/);
  });
});

/** Right weak order by the definition: search upwards from u by u -> u * s_i with inv + 1. */
function weakUpSet(u: number[]): Set<string> {
  const seen = new Set<string>([u.join()]);
  const queue = [u];
  while (queue.length) {
    const w = queue.pop()!;
    for (let i = 1; i < w.length; i++)
      if (w[i - 1] < w[i]) {
        const x = w.slice();
        [x[i - 1], x[i]] = [x[i], x[i - 1]]; // w * s_i
        if (!seen.has(x.join())) {
          seen.add(x.join());
          queue.push(x);
        }
      }
  }
  return seen;
}

describe('weakLeq', () => {
  it('agrees with the definition v = u * s_{a_1} ... s_{a_k}, inv(v) = inv(u) + k, on all of S_1..S_5', () => {
    for (let n = 1; n <= 5; n++) {
      const S = allPerms(n);
      for (const u of S) {
        const up = weakUpSet(u);
        for (const v of S) expect(call('weakLeq', perm(u), perm(v))).toBe(up.has(v.join()));
      }
    }
  });
  it('is contained in the Bruhat order and is the right (not the left) weak order', () => {
    const S = allPerms(4);
    for (const u of S) for (const v of S) if (call('weakLeq', perm(u), perm(v))) expect(call('bruhatLeq', perm(u), perm(v))).toBe(true);
    // 312 = s2 * s1 lies above s2 = 132 on the right but not above s1 = 213 (which it is above on the left).
    expect(call('weakLeq', perm([1, 3, 2]), perm([3, 1, 2]))).toBe(true);
    expect(call('weakLeq', perm([2, 1, 3]), perm([3, 1, 2]))).toBe(false);
  });
});
