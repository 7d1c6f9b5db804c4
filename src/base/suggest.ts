// "Did you mean" suggestions: the nearest valid name by edit distance.

/** Edit distance where swapping two neighbouring letters counts as one edit (optimal string alignment). */
export function editDistance(a: string, b: string): number {
  const m = a.length,
    n = b.length;
  const d: number[][] = Array.from({ length: m + 1 }, (_, i) => {
    const row = new Array<number>(n + 1).fill(0);
    row[0] = i;
    return row;
  });
  for (let j = 0; j <= n; j++) d[0][j] = j;
  for (let i = 1; i <= m; i++) {
    for (let j = 1; j <= n; j++) {
      const cost = a.charCodeAt(i - 1) === b.charCodeAt(j - 1) ? 0 : 1;
      d[i][j] = Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1, d[i - 1][j - 1] + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) d[i][j] = Math.min(d[i][j], d[i - 2][j - 2] + 1);
    }
  }
  return d[m][n];
}

/** The closest candidate, if it is close enough to be a plausible typo (case-insensitive). */
export function nearest(name: string, candidates: Iterable<string>): string | undefined {
  let best: string | undefined;
  let bestD = Infinity;
  const lower = name.toLowerCase();
  for (const c of candidates) {
    const d = c.toLowerCase() === lower ? 0 : editDistance(lower, c.toLowerCase());
    if (d < bestD || (d === bestD && best !== undefined && c < best)) {
      best = c;
      bestD = d;
    }
  }
  if (best === undefined) return undefined;
  const limit = Math.max(1, Math.floor(Math.max(name.length, 3) / 3));
  return bestD <= limit || best.toLowerCase().startsWith(lower) ? best : undefined;
}
