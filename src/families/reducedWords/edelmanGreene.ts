// Reduced words of the longest element w0 of S_n from standard tableaux of the staircase shape
// (n-1, n-2, ..., 1), by the Edelman–Greene bijection (Edelman and Greene, Balanced tableaux, Adv.
// Math. 63 (1987); in the form of Angel, Holroyd, Romik and Virág, Random sorting networks, Adv.
// Math. 215 (2007), §4): repeatedly read the column of the cell holding the largest entry (a
// corner on the outer diagonal), delete it, slide the hole back to the top-left corner (the larger
// of the upper and left neighbours moves in), add one to every entry and put 1 in the corner.
// A bijection onto the reduced words of w0, so a uniform tableau gives a uniform word.

export function edelmanGreeneWord(rows: readonly (readonly number[])[]): number[] {
  const t = rows.map((r) => r.slice());
  let total = 0;
  for (const r of t) total += r.length;
  const word: number[] = [];
  for (let step = 0; step < total; step++) {
    // The largest entry sits at a corner.
    let i = 0,
      j = 0;
    for (let a = 0; a < t.length; a++) {
      const b = t[a].length - 1;
      if (t[a][b] === total) {
        i = a;
        j = b;
      }
    }
    word.push(j + 1);
    // Slide the hole at (i, j) to (0, 0).
    while (i > 0 || j > 0) {
      const up = i > 0 ? t[i - 1][j] : -1;
      const left = j > 0 ? t[i][j - 1] : -1;
      if (up > left) {
        t[i][j] = up;
        i--;
      } else {
        t[i][j] = left;
        j--;
      }
    }
    for (const r of t) for (let c = 0; c < r.length; c++) r[c]++;
    t[0][0] = 1;
  }
  return word;
}

/** Whether w (one-line) is the longest element n n-1 ... 1 of S_n. */
export function isLongest(w: readonly number[]): boolean {
  for (let i = 0; i < w.length; i++) if (w[i] !== w.length - i) return false;
  return true;
}
