// Descents of a standard tableau: i is a descent when i + 1 lies in a strictly lower row than i
// (Stanley, Enumerative Combinatorics 2, §7.19). maj(T) is their sum.

import { fail } from '../../base/errors.js';
import { Tableau } from '../../families/tableaux/tableau.js';

export function tableauDescents(t: Tableau, call: string): number[] {
  if (!t.isStandard()) fail(`${call} needs a standard tableau (entries 1..n once each), got ${t.toText()}`);
  const rowOf: number[] = [];
  t.rows.forEach((r, i) => r.forEach((v) => (rowOf[v] = i)));
  const out: number[] = [];
  for (let i = 1; i < t.size; i++) if (rowOf[i + 1] > rowOf[i]) out.push(i);
  return out;
}

/** The transpose of a standard tableau (standard again): row i of the result is column i. */
export function transposeRows(rows: readonly (readonly number[])[]): number[][] {
  const out: number[][] = [];
  rows.forEach((r) => r.forEach((v, j) => (out[j] ??= []).push(v)));
  return out;
}
