// p(n), the number of partitions of n, by Euler's pentagonal number recurrence
// p(n) = sum_{k>=1} (-1)^(k+1) [p(n - k(3k-1)/2) + p(n - k(3k+1)/2)]  (OEIS A000041).

const table: bigint[] = [1n];

export function partitionCount(n: number): bigint {
  if (n < 0) return 0n;
  for (let m = table.length; m <= n; m++) {
    let s = 0n;
    for (let k = 1; ; k++) {
      const g1 = (k * (3 * k - 1)) / 2;
      if (g1 > m) break;
      const g2 = (k * (3 * k + 1)) / 2;
      const t = table[m - g1] + (g2 <= m ? table[m - g2] : 0n);
      s += k % 2 === 1 ? t : -t;
    }
    table.push(s);
  }
  return table[n];
}
