// A symmetric function as a table of its Schur terms: one row per partition (highest degree first),
// the coefficient on the left, the partition on the right, under a header line.

import type { Value } from '../../values/value.js';
import { valueToText } from '../../values/operations.js';
import type { Glyphs } from './glyphs.js';

/** Past this many terms the table is cut, saying how many rows were left out. */
const MAX_ROWS = 40;

export function drawSymmetric(terms: readonly { parts: readonly number[]; coef: Value }[], g: Glyphs): string {
  const shown = terms.slice(0, MAX_ROWS);
  const coefs = shown.map((t) => valueToText(t.coef));
  const names = shown.map((t) => `s[${t.parts.join(',')}]`);
  const head = ['coefficient', 'Schur term'];
  const w = Math.max(head[0].length, ...coefs.map((c) => c.length));
  const lines = [
    `${head[0].padEnd(w)} ${g.vertical} ${head[1]}`,
    `${g.horizontal.repeat(w)}${g.horizontal}${g.cross}${g.horizontal}${g.horizontal.repeat(head[1].length)}`,
  ];
  shown.forEach((_, i) => lines.push(`${coefs[i].padEnd(w)} ${g.vertical} ${names[i]}`));
  if (terms.length > MAX_ROWS) lines.push(`(${terms.length - MAX_ROWS} more terms)`);
  return lines.join('\n');
}
