// Cycles, symmetries, records, Foata's bijection and imaj (src/library/permutations/cycles.ts,
// symmetries.ts, foata.ts), and inv, maj, des on words, each against a published count and a
// second computation.

import { describe, expect, it } from 'vitest';
import '../../../src/library/permutations.js';
import { allPerms, call, compose, distribution, perm } from './helpers.js';
import { Permutation } from '../../../src/families/permutations/permutation.js';
import { Word } from '../../../src/families/words/word.js';
import { qbinomialCoefficients } from '../../../src/library/qanalogs.js';
import type { Value } from '../../../src/values/value.js';

const num = (v: Value) => v as number;
const P = (a: number[]) => new Permutation(a);
const invOf = (a: number[]) => {
  let c = 0;
  for (let i = 0; i < a.length; i++) for (let j = i + 1; j < a.length; j++) if (a[i] > a[j]) c++;
  return c;
};
const majOf = (a: number[]) => a.reduce((s, _, i) => (i > 0 && a[i - 1] > a[i] ? s + i : s), 0);
const inverse = (a: number[]) => {
  const b = a.slice();
  a.forEach((v, i) => (b[v - 1] = i + 1));
  return b;
};
const descentSet = (a: number[]) => a.flatMap((_, i) => (i > 0 && a[i - 1] > a[i] ? [i] : []));

/** Unsigned Stirling numbers of the first kind by c(n,k) = c(n-1,k-1) + (n-1) c(n-1,k) (OEIS A132393). */
function stirling1Row(n: number): number[] {
  let row = [1];
  for (let m = 1; m <= n; m++) {
    const next = new Array(m + 1).fill(0);
    for (let k = 0; k <= m; k++) next[k] = (k > 0 ? row[k - 1] : 0) + (m - 1) * (row[k] ?? 0);
    row = next;
  }
  return row;
}

describe('cycles', () => {
  it('cycleList rebuilds w, starts each cycle at its least element, and has cycles(w) entries (n <= 6)', () => {
    for (let n = 0; n <= 6; n++)
      for (const a of allPerms(n)) {
        const cs = call('cycleList', P(a)) as number[][];
        expect(cs.length).toBe(call('cycles', P(a)));
        const b = new Array(n);
        for (const c of cs) {
          expect(Math.min(...c)).toBe(c[0]);
          c.forEach((x, k) => (b[x - 1] = c[(k + 1) % c.length]));
        }
        expect(b).toEqual(a);
        expect(cs.map((c) => c[0])).toEqual(cs.map((c) => c[0]).sort((x, y) => x - y));
      }
  });

  it('order: the least power that is the identity (brute force), n <= 7', () => {
    for (let n = 1; n <= 7; n++)
      for (const a of allPerms(n)) {
        let k = 1,
          p = a;
        const id = a.map((_, i) => i + 1);
        while (p.join() !== id.join()) {
          p = compose(p, a);
          k++;
        }
        expect(call('order', P(a))).toBe(k);
      }
  });

  it("order <= 2 exactly on involutions (OEIS A000085); the largest order is Landau's g(n) (OEIS A000793)", () => {
    const A000085 = [1, 1, 2, 4, 10, 26, 76, 232, 764];
    const A000793 = [1, 1, 2, 3, 4, 6, 6, 12, 15];
    for (let n = 0; n <= 8; n++) {
      const orders = allPerms(n).map((a) => num(call('order', P(a))));
      expect(orders.filter((o) => o <= 2).length).toBe(A000085[n]);
      expect(Math.max(...orders)).toBe(A000793[n]);
    }
  });

  it('transposition(i, j, n) exchanges i and j; inv(t_ij) = 2|i - j| - 1 (a standard fact, from memory; the inversions are counted here directly)', () => {
    for (let n = 2; n <= 6; n++)
      for (let i = 1; i <= n; i++)
        for (let j = 1; j <= n; j++) {
          if (i === j) continue;
          const t = (call('transposition', i, j, n) as Permutation).a;
          expect(t[i - 1]).toBe(j);
          expect(t[j - 1]).toBe(i);
          expect(invOf(t)).toBe(2 * Math.abs(i - j) - 1);
        }
    expect(() => call('transposition', 2, 2, 3)).toThrow(/i != j/);
    expect(() => call('transposition', 1, 4, 3)).toThrow(/j <= 3/);
  });
});

describe('symmetries and records', () => {
  it('complement: inv(complement(w)) = C(n,2) - inv(w); reverseComplement is an involution keeping inv and des (n <= 6)', () => {
    for (let n = 0; n <= 6; n++)
      for (const a of allPerms(n)) {
        const c = (call('complement', P(a)) as Permutation).a;
        expect(invOf(c)).toBe((n * (n - 1)) / 2 - invOf(a) + 0);
        const rc = (call('reverseComplement', P(a)) as Permutation).a;
        expect(rc).toEqual(c.slice().reverse());
        expect((call('reverseComplement', P(rc)) as Permutation).a).toEqual(a);
        expect(invOf(rc)).toBe(invOf(a));
        expect(descentSet(rc).length).toBe(descentSet(a).length);
      }
  });

  it('left-to-right maxima and minima: the Stirling numbers of the first kind (OEIS A132393), n <= 7', () => {
    for (let n = 1; n <= 7; n++) {
      const ws = allPerms(n);
      expect(distribution(ws, (a) => num(call('leftToRightMaxima', P(a))))).toEqual(stirling1Row(n));
      expect(distribution(ws, (a) => num(call('leftToRightMinima', P(a))))).toEqual(stirling1Row(n));
      // second check: the records of w are those of its complement with max and min exchanged
      for (const a of ws) expect(call('leftToRightMinima', P(a))).toBe(call('leftToRightMaxima', P(a.map((v) => n + 1 - v))));
    }
    expect(call('leftToRightMaxima', perm([3, 1, 4, 2, 5]))).toBe(3);
  });
});

describe("Foata's bijection and imaj", () => {
  it('is a bijection of S_n with inv(phi(w)) = maj(w), the same last entry and the same inverse descent set (n <= 7)', () => {
    for (let n = 1; n <= 7; n++) {
      const seen = new Set<string>();
      for (const a of allPerms(n)) {
        const f = (call('foata', P(a)) as Permutation).a;
        seen.add(f.join());
        expect(invOf(f)).toBe(majOf(a));
        expect(f[n - 1]).toBe(a[n - 1]);
        expect(descentSet(inverse(f))).toEqual(descentSet(inverse(a)));
      }
      expect(seen.size).toBe(allPerms(n).length);
    }
  });

  it('the worked example 3142 -> 3412 (by hand, following Foata 1968)', () => {
    expect((call('foata', perm([3, 1, 4, 2])) as Permutation).a).toEqual([3, 4, 1, 2]);
  });

  it('imaj = maj of the inverse; (maj, imaj) is jointly symmetric (Foata and Schützenberger 1978), n <= 6', () => {
    for (let n = 1; n <= 6; n++) {
      const joint = new Map<string, number>();
      for (const a of allPerms(n)) {
        const im = num(call('imaj', P(a)));
        expect(im).toBe(majOf(inverse(a)));
        const k = `${majOf(a)},${im}`;
        joint.set(k, (joint.get(k) ?? 0) + 1);
      }
      for (const [k, c] of joint) expect(joint.get(k.split(',').reverse().join(','))).toBe(c);
    }
  });
});

describe('inv, maj and des on words', () => {
  /** All distinct rearrangements of a multiset. */
  function rearrangements(letters: number[]): number[][] {
    if (letters.length === 0) return [[]];
    const out: number[][] = [];
    for (const x of new Set(letters)) {
      const rest = letters.slice();
      rest.splice(rest.indexOf(x), 1);
      for (const r of rearrangements(rest)) out.push([x, ...r]);
    }
    return out;
  }
  /** q-multinomial [n; m1, m2, ...]_q as a product of Gaussian binomials (Andrews, The Theory of Partitions, (3.3.2)). */
  function qMultinomial(ms: number[]): number[] {
    let c = [1],
      n = 0;
    for (const m of ms) {
      n += m;
      const b = qbinomialCoefficients(n, m).map(Number);
      const out = new Array(c.length + b.length - 1).fill(0);
      c.forEach((x, i) => b.forEach((y, j) => (out[i + j] += x * y)));
      c = out;
    }
    return c;
  }
  it('inv and maj both have the q-multinomial distribution on the rearrangements of a word (MacMahon)', () => {
    for (const ms of [
      [2, 2],
      [2, 1, 2],
      [3, 1, 2],
      [1, 1, 1, 1],
      [2, 2, 2],
    ]) {
      const letters = ms.flatMap((m, i) => new Array(m).fill(i + 1));
      const ws = rearrangements(letters);
      const want = qMultinomial(ms);
      expect(distribution(ws, (a) => num(call('inv', new Word(a))))).toEqual(want);
      expect(distribution(ws, (a) => num(call('maj', new Word(a))))).toEqual(want);
      for (const a of ws) expect(call('des', new Word(a))).toBe(descentSet(a).length);
    }
  });
  it('worked examples, and long words with letters larger than the length', () => {
    expect(call('inv', new Word([2, 1, 2, 1]))).toBe(3);
    expect(call('maj', new Word([2, 1, 2, 1]))).toBe(4);
    expect(call('descents', new Word([3, 3, 1, 2, 1]))).toEqual([2, 4]);
    const long = Array.from({ length: 200 }, (_, i) => ((i * 37) % 11) * 50 + 1);
    expect(call('inv', new Word(long))).toBe(invOf(long));
  });
});
