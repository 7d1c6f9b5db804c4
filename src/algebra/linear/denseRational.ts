// The stationary measure by plain Gaussian elimination over the rationals on the dense system
// pi (P - I) = 0, sum pi = 1 (the last balance equation replaced by the normalisation). Cubic and
// with growing numbers, so only for small chains: it is the independent second algorithm the
// modular solver is tested against, and needs the chain irreducible (or with one closed class).

import { fail } from '../../base/errors.js';
import type { Scalar } from '../../numbers/rational.js';
import { sdiv, smul, ssub, sisZero, sadd } from '../../numbers/scalar.js';
import type { SparseChain } from './sparseChain.js';

export function stationaryDense(c: SparseChain): Scalar[] {
  const n = c.size;
  // Row t of the system: sum_s pi(s) (P(s,t) - [s=t]) = 0; row n-1: sum_s pi(s) = 1.
  const a: Scalar[][] = Array.from({ length: n }, () => new Array<Scalar>(n + 1).fill(0));
  for (let s = 0; s < n; s++) {
    a[s][s] = -1;
    for (let k = c.rowStart[s]; k < c.rowStart[s + 1]; k++) {
      const t = c.target[k];
      a[t][s] = sadd(a[t][s], sdiv(c.weight[k], c.total[s]));
    }
  }
  a[n - 1] = new Array<Scalar>(n + 1).fill(1);
  for (let col = 0; col < n; col++) {
    let piv = col;
    while (piv < n && sisZero(a[piv][col])) piv++;
    if (piv === n) fail('the stationary measure is not unique');
    [a[col], a[piv]] = [a[piv], a[col]];
    const rowC = a[col];
    for (let i = 0; i < n; i++) {
      if (i === col || sisZero(a[i][col])) continue;
      const f = sdiv(a[i][col], rowC[col]);
      const rowI = a[i];
      for (let j = col; j <= n; j++) if (!sisZero(rowC[j])) rowI[j] = ssub(rowI[j], smul(f, rowC[j]));
    }
  }
  return a.map((row, i) => sdiv(row[n], row[i]));
}
