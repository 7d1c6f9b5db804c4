// The charge of Lascoux and Schützenberger ("Sur une conjecture de H. O. Foulkes", C. R. Acad.
// Sci. Paris 286 (1978)), as in Macdonald, Symmetric Functions and Hall Polynomials, 2nd ed.,
// III.6: for a word whose content is a partition, split off standard subwords one at a time (from
// the right end read leftwards, cyclically: the first unused 1, then the first unused 2 to its left,
// and so on); in a standard subword 1 has index 0 and r+1 has the index of r, or one more when it
// stands to the right of r (the search wrapped around). The charge is the sum of all indices.

import { fail } from '../../base/errors.js';

/** The content [#1s, #2s, ...] when it is a partition (no gaps, weakly decreasing); else undefined. */
export function partitionContent(w: readonly number[]): number[] | undefined {
  const c: number[] = [];
  for (const v of w) {
    while (c.length < v) c.push(0);
    c[v - 1]++;
  }
  for (let i = 0; i < c.length; i++) if (c[i] === 0 || (i > 0 && c[i] > c[i - 1])) return undefined;
  return c;
}

/** n(mu) = sum (i - 1) mu_i, the largest charge of a word of content mu. */
export function nOf(mu: readonly number[]): number {
  let s = 0;
  mu.forEach((m, i) => (s += i * m));
  return s;
}

export function charge(w: readonly number[], call = 'charge'): number {
  const content = partitionContent(w);
  if (!content)
    fail(
      `${call} needs a word whose content is a partition (as many 1s as 2s or more, as many 2s as 3s or more, ...), got [${w.join(', ')}]`,
    );
  const n = w.length;
  const used = new Uint8Array(n);
  let left = n,
    total = 0;
  while (left > 0) {
    // letters 1..k remain, where k is the number of distinct letters still unused
    let k = 0;
    for (let i = 0; i < n; i++) if (!used[i] && w[i] > k) k = w[i];
    let pos = n; // start just right of the end
    let index = 0;
    for (let r = 1; r <= k; r++) {
      // move left cyclically from pos to the first unused r
      let p = pos - 1,
        wrapped = false;
      for (;;) {
        if (p < 0) {
          p = n - 1;
          wrapped = true;
        }
        if (!used[p] && w[p] === r) break;
        p--;
      }
      if (r > 1 && wrapped) index++;
      total += index;
      used[p] = 1;
      left--;
      pos = p;
    }
  }
  return total;
}

/**
 * The reading words of the semistandard tableaux of shape lambda and content mu (partitions of
 * the same size), built by adding the mu_i cells labelled i as a horizontal strip, i = 1, 2, ...
 */
export function* tableauxWords(lambda: readonly number[], mu: readonly number[]): Generator<number[][]> {
  const rows: number[][] = lambda.map(() => []);
  function* add(i: number): Generator<number[][]> {
    if (i === mu.length) {
      yield rows;
      return;
    }
    // before: row lengths before adding the letter i + 1
    const before = rows.map((r) => r.length);
    function* strip(r: number, left: number): Generator<number[][]> {
      if (left === 0) {
        yield* add(i + 1);
        return;
      }
      if (r === lambda.length) return;
      const cap = Math.min(lambda[r], r === 0 ? Infinity : before[r - 1]) - before[r];
      for (let k = Math.min(cap, left); k >= 0; k--) {
        for (let j = 0; j < k; j++) rows[r].push(i + 1);
        yield* strip(r + 1, left - k);
        for (let j = 0; j < k; j++) rows[r].pop();
      }
    }
    yield* strip(0, mu[i]);
  }
  yield* add(0);
}

/** Coefficients (from t^0) of K_{lambda mu}(t) = sum over SSYT(lambda, mu) of t^charge(reading word). */
export function kostkaFoulkesCoefficients(lambda: readonly number[], mu: readonly number[]): number[] {
  const c: number[] = [];
  for (const rows of tableauxWords(lambda, mu)) {
    const w: number[] = [];
    for (let i = rows.length - 1; i >= 0; i--) w.push(...rows[i]);
    const k = charge(w);
    while (c.length <= k) c.push(0);
    c[k]++;
  }
  return c;
}
