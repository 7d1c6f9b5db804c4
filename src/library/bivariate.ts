// Building polynomials in two given values from integer coefficient tables: c[i][j] is the
// coefficient of a^i b^j. The values may be indeterminates, numbers or polynomials (as q-analogs
// take them), so a table is evaluated by Horner's rule in b with inner polynomials in a.

import { padd, pmul, type PolyLike } from '../algebra/polynomial.js';
import { evaluateCoefficients } from '../algebra/polynomialOps.js';
import type { Int } from '../numbers/integer.js';

/** sum over i, j of c[i][j] a^i b^j (rows of c may have different lengths). */
export function evaluateTable(c: readonly (readonly Int[])[], a: PolyLike, b: PolyLike): PolyLike {
  const width = c.reduce((m, row) => Math.max(m, row.length), 0);
  let r: PolyLike = 0;
  for (let j = width - 1; j >= 0; j--) {
    const column: Int[] = c.map((row) => row[j] ?? 0);
    r = padd(pmul(r, b), evaluateCoefficients(column, a));
  }
  return r;
}

/** Adds 1 to the coefficient at (i, j) of a growing table. */
export function bump(c: number[][], i: number, j: number): void {
  while (c.length <= i) c.push([]);
  const row = c[i];
  while (row.length <= j) row.push(0);
  row[j]++;
}
