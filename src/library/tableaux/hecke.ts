// Hecke insertion (A. S. Buch, A. Kresch, M. Shimozono, H. Tamvakis and A. Yong, "Stable
// Grothendieck polynomials and K-theoretic factor sequences", Math. Ann. 340 (2008), §2).
// Inserting x into an increasing tableau (rows and columns strictly increase), row by row:
// - if x >= every entry of the row: when x can be added at the end of the row (the result stays
//   increasing), it is, and the insertion ends at that new cell (a new cell of the recording
//   tableau); otherwise nothing changes and the insertion ends at the bottom cell of the column
//   of the row's last cell (the label joins that cell's set in the recording tableau);
// - else let y be the least entry > x; y is replaced by x when the result stays increasing, and in
//   either case y goes on to the next row.
// The recording tableau Q is set-valued: each cell holds a set of labels.

/** Whether cell (r, c) may hold v in an increasing tableau (left, up < v < right, down). */
function fits(t: number[][], r: number, c: number, v: number): boolean {
  if (c > 0 && t[r][c - 1] >= v) return false;
  if (r > 0 && c < t[r - 1].length && t[r - 1][c] >= v) return false;
  if (r > 0 && c >= t[r - 1].length) return false;
  if (c + 1 < t[r].length && t[r][c + 1] <= v) return false;
  if (r + 1 < t.length && c < t[r + 1].length && t[r + 1][c] <= v) return false;
  return true;
}

export function heckeInsert(word: readonly number[]): { P: number[][]; Q: number[][][] } {
  const P: number[][] = [],
    Q: number[][][] = [];
  word.forEach((letter, step) => {
    const label = step + 1;
    let x = letter;
    for (let r = 0; ; r++) {
      if (r === P.length) {
        P.push([x]);
        Q.push([[label]]);
        return;
      }
      const row = P[r];
      if (x >= row[row.length - 1]) {
        const c = row.length;
        if (x > row[c - 1] && (r === 0 || (c < P[r - 1].length && P[r - 1][c] < x))) {
          row.push(x);
          Q[r].push([label]);
        } else {
          // the bottom cell of the column of the row's last cell
          let b = r;
          while (b + 1 < P.length && P[b + 1].length >= c) b++;
          Q[b][c - 1].push(label);
        }
        return;
      }
      let k = 0;
      while (row[k] <= x) k++;
      const y = row[k];
      if (fits(P, r, k, x)) row[k] = x;
      x = y;
    }
  });
  return { P, Q };
}
