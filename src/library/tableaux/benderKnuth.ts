// Bender–Knuth involutions on semistandard tableaux, and promotion and evacuation built from them
// for entries in 1..m (Bender and Knuth, J. Combin. Theory A 13 (1972); R. P. Stanley, "Promotion
// and evacuation", Electron. J. Combin. 16(2) (2009), §2 and §5):
//   promotion = t_{m-1} ... t_2 t_1 (t_1 applied first),
//   evacuation = (t_1) (t_2 t_1) ... (t_{m-1} ... t_1) (the rightmost factor applied first).
// On standard tableaux with m = n they agree with the jeu de taquin definitions (tested).

/**
 * t_i: in each row, the entries i and i+1 that do not share a column with an i+1 below or an i
 * above ("free" ones) form a run of a i's followed by b (i+1)'s; it becomes b i's and a (i+1)'s.
 */
export function benderKnuth(rows: number[][], i: number): void {
  for (let r = 0; r < rows.length; r++) {
    const row = rows[r];
    const below = rows[r + 1],
      above = rows[r - 1];
    let start = -1,
      a = 0,
      b = 0;
    for (let j = 0; j < row.length; j++) {
      const v = row[j];
      if (v === i && !(below && j < below.length && below[j] === i + 1)) {
        if (start < 0) start = j;
        a++;
      } else if (v === i + 1 && !(above && above[j] === i)) {
        if (start < 0) start = j;
        b++;
      }
    }
    if (start < 0) continue;
    for (let k = 0; k < a + b; k++) row[start + k] = k < b ? i : i + 1;
  }
}

export function promotionBK(t: readonly (readonly number[])[], m: number): number[][] {
  const rows = t.map((r) => r.slice());
  for (let i = 1; i < m; i++) benderKnuth(rows, i);
  return rows;
}

export function evacuationBK(t: readonly (readonly number[])[], m: number): number[][] {
  const rows = t.map((r) => r.slice());
  // apply (t_{m-1} ... t_1) first, then (t_{m-2} ... t_1), ..., then t_1
  for (let k = m - 1; k >= 1; k--) for (let i = 1; i <= k; i++) benderKnuth(rows, i);
  return rows;
}
