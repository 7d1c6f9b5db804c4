// The q,t-Catalan number C_n(q, t) = sum over Dyck paths of q^area t^bounce, by the recursion of
// A. M. Garsia and J. Haglund, "A proof of the q,t-Catalan positivity conjecture", Discrete Math.
// 256 (2002), with k the length of the first vertical run (the first bounce):
//   C_{n,n} = q^C(n,2),  C_{n,k} = t^(n-k) q^C(k,2) sum_{r=1..n-k} [r+k-1 choose r]_q C_{n-k,r},
//   C_n = sum_k C_{n,k}.
// Tables: c[i][j] is the coefficient of q^i t^j.

import { iadd, imul, type Int } from '../../numbers/integer.js';
import { qbinomialCoefficients } from '../qanalogs.js';

type Table = Int[][];

function addInto(acc: Table, x: Table, qShift: number, tShift: number): void {
  for (let i = 0; i < x.length; i++) {
    const row = x[i];
    for (let j = 0; j < row.length; j++) {
      if (row[j] === 0) continue;
      const ii = i + qShift,
        jj = j + tShift;
      while (acc.length <= ii) acc.push([]);
      const r = acc[ii];
      while (r.length <= jj) r.push(0);
      r[jj] = iadd(r[jj], row[j]);
    }
  }
}

/** (univariate in q) times a table. */
function timesQ(poly: readonly Int[], x: Table): Table {
  const out: Table = [];
  poly.forEach((c, d) => {
    if (c === 0) return;
    addInto(out, c === 1 ? x : x.map((row) => row.map((v) => imul(v, c))), d, 0);
  });
  return out;
}

/** The coefficient tables of C_n(q, t), for the recursion above. */
export function qtCatalanTable(n: number): Table {
  // parts[m][k] = C_{m,k} for 1 <= k <= m
  const parts: Table[][] = [[]];
  for (let m = 1; m <= n; m++) {
    const row: Table[] = [];
    for (let k = 1; k <= m; k++) {
      const ck: Table = [];
      if (k === m) addInto(ck, [[1]], (k * (k - 1)) / 2, 0);
      else {
        const sum: Table = [];
        for (let r = 1; r <= m - k; r++) addInto(sum, timesQ(qbinomialCoefficients(r + k - 1, r), parts[m - k][r]), 0, 0);
        addInto(ck, sum, (k * (k - 1)) / 2, m - k);
      }
      row[k] = ck;
    }
    parts.push(row);
  }
  if (n === 0) return [[1]];
  const total: Table = [];
  for (let k = 1; k <= n; k++) addInto(total, parts[n][k], 0, 0);
  return total;
}
