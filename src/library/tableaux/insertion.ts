// Insertion algorithms beyond RSK on permutations and words:
// - RSK on two-line arrays (nonnegative integer matrices): Knuth, Pacific J. Math. 34 (1970);
//   Stanley, Enumerative Combinatorics 2, §7.11;
// - dual RSK on 0/1 matrices (x bumps the leftmost entry >= x): Stanley, EC2, §7.14;
// - jeu de taquin rectification of skew tableaux: Schützenberger (1977); Fulton, Young Tableaux,
//   ch. 1-3 (it equals the insertion tableau of the reading word);
// - Edelman–Greene insertion of reduced words: Edelman and Greene, "Balanced tableaux", Adv. Math.
//   63 (1987), §6.

import { fail } from '../../base/errors.js';

/** The two-line array of a matrix of nonnegative integers: pairs [i, j] with multiplicity M[i, j], lexicographic. */
export function twoLineArrayOf(rows: readonly (readonly number[])[]): [number, number][] {
  const out: [number, number][] = [];
  rows.forEach((r, i) =>
    r.forEach((m, j) => {
      for (let k = 0; k < m; k++) out.push([i + 1, j + 1]);
    }),
  );
  return out;
}

export function sortTwoLine(pairs: [number, number][]): [number, number][] {
  return pairs.slice().sort((a, b) => a[0] - b[0] || a[1] - b[1]);
}

/**
 * Row insertion of the bottom line, recording the top line. `weak` = false: x bumps the leftmost
 * entry > x (RSK); weak = true: the leftmost entry >= x (dual RSK, on arrays without repeated pairs).
 */
export function insertTwoLine(pairs: readonly [number, number][], weak: boolean): { P: number[][]; Q: number[][] } {
  const P: number[][] = [],
    Q: number[][] = [];
  for (const [top, bottom] of pairs) {
    let x = bottom,
      r = 0;
    for (;;) {
      if (r === P.length) {
        P.push([x]);
        Q.push([top]);
        break;
      }
      const row = P[r];
      let k = 0;
      while (k < row.length && (weak ? row[k] < x : row[k] <= x)) k++;
      if (k === row.length) {
        row.push(x);
        Q[r].push(top);
        break;
      }
      [row[k], x] = [x, row[k]];
      r++;
    }
  }
  return { P, Q };
}

/**
 * Rectify a skew tableau of shape lambda/mu given by its rows (row i holds the lambda_i - mu_i
 * entries right of the mu_i inner cells): slide into the inner corners, the lowest one first each
 * time, until the inner shape is empty.
 */
export function rectifyRows(rows: readonly (readonly number[])[], mu: readonly number[]): number[][] {
  // cells as a grid with null for empty inner cells
  const grid: (number | null)[][] = rows.map((r, i) => [...new Array(mu[i] ?? 0).fill(null), ...r]);
  const inner = mu.slice();
  while (inner.length && inner[inner.length - 1] === 0) inner.pop();
  while (inner.length) {
    // the lowest inner corner: the last row of the inner shape, its last cell
    let i = inner.length - 1;
    let j = inner[i] - 1;
    inner[i]--;
    if (inner[i] === 0) inner.pop();
    // slide the hole at (i, j) outwards
    for (;;) {
      const right = j + 1 < grid[i].length ? grid[i][j + 1] : null;
      const below = i + 1 < grid.length && j < grid[i + 1].length ? grid[i + 1][j] : null;
      if (right === null && below === null) {
        grid[i].splice(j, 1);
        break;
      }
      if (below !== null && (right === null || below <= right)) {
        grid[i][j] = below;
        i++;
      } else {
        grid[i][j] = right;
        j++;
      }
    }
    while (grid.length && grid[grid.length - 1].length === 0) grid.pop();
  }
  return grid.map((r) => r.map((v) => v as number));
}

/** Whether the filling of lambda/mu has rows weakly and columns strictly increasing. */
export function isSkewSemistandard(rows: readonly (readonly number[])[], mu: readonly number[]): boolean {
  for (let i = 0; i < rows.length; i++) {
    const off = mu[i] ?? 0;
    if (i > 0 && off + rows[i].length > (mu[i - 1] ?? 0) + rows[i - 1].length) return false;
    if ((mu[i] ?? 0) > (i > 0 ? (mu[i - 1] ?? 0) : Infinity)) return false;
    for (let j = 1; j < rows[i].length; j++) if (rows[i][j] < rows[i][j - 1]) return false;
    if (i > 0)
      for (let j = 0; j < rows[i].length; j++) {
        const c = off + j,
          above = c - (mu[i - 1] ?? 0);
        if (above >= 0 && above < rows[i - 1].length && rows[i - 1][above] >= rows[i][j]) return false;
      }
  }
  return true;
}

/**
 * Edelman–Greene insertion of a reduced word, letter by letter. Inserting x into a row: let y be
 * the least entry > x; if there is none, x is appended. If y = x + 1 and x is already in the row,
 * the row is unchanged and x + 1 goes on to the next row; otherwise y is replaced by x and goes on.
 */
export function edelmanGreeneInsert(word: readonly number[]): { P: number[][]; Q: number[][] } {
  const P: number[][] = [],
    Q: number[][] = [];
  word.forEach((letter, step) => {
    let x = letter,
      r = 0;
    for (;;) {
      if (r === P.length) {
        P.push([x]);
        Q.push([step + 1]);
        return;
      }
      const row = P[r];
      let k = 0;
      while (k < row.length && row[k] <= x) k++;
      if (k === row.length) {
        row.push(x);
        Q[r].push(step + 1);
        return;
      }
      const y = row[k];
      if (!(y === x + 1 && k > 0 && row[k - 1] === x)) row[k] = x;
      x = y;
      r++;
    }
  });
  return { P, Q };
}

export function checkReducedWord(word: readonly number[], call: string): void {
  // a word is reduced when applying it to the identity raises the inversions each time
  const n = Math.max(0, ...word) + 1;
  const w = Array.from({ length: n }, (_, i) => i + 1);
  for (const a of word) {
    if (!Number.isSafeInteger(a) || a < 1) fail(`${call} needs a word of positive integers, got [${word.join(', ')}]`);
    if (w[a - 1] > w[a]) fail(`${call} needs a reduced word: [${word.join(', ')}] is not reduced`);
    [w[a - 1], w[a]] = [w[a], w[a - 1]];
  }
}
