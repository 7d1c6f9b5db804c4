// Matrices as aligned grids. Alternating sign matrices, and matrices whose entries are all 0, 1 or
// -1 (permutation and partial permutation matrices among them), get one glyph per entry and a
// legend; other matrices show their exact entries, columns right-aligned, in brackets.

import type { Scalar } from '../../numbers/rational.js';
import { valueToText } from '../../values/operations.js';
import type { Glyphs } from './glyphs.js';
import { finish, padLeft, width } from './layout.js';

/** Entries 0, 1, -1 as glyphs, a space between columns, then a legend for the glyphs used. */
export function drawSignGrid(rows: readonly (readonly number[])[], g: Glyphs, withMinus: boolean): string {
  const glyph = (v: number) => (v > 0 ? g.plus : v < 0 ? g.minus : g.empty);
  const legend = [`${g.plus} = 1`, ...(withMinus ? [`${g.minus} = -1`] : []), `${g.empty} = 0`].join(', ');
  return finish([...rows.map((r) => r.map(glyph).join(' ')), legend]);
}

/** Relies on Asm.rows: the rows of the matrix, entries 0, 1, -1. */
export function drawAsm(rows: readonly (readonly number[])[], g: Glyphs): string {
  if (rows.length === 0) return '(the empty alternating sign matrix)';
  return drawSignGrid(rows, g, true);
}

/** Relies on Matrix.rows, .cols and .entries (row-major exact scalars). */
export function drawMatrix(rows: number, cols: number, entries: readonly Scalar[], g: Glyphs): string {
  if (rows === 0 || cols === 0) return `(the empty ${rows} by ${cols} matrix)`;
  if (entries.every((e) => e === 0 || e === 1 || e === -1)) {
    const grid = Array.from({ length: rows }, (_, i) => entries.slice(i * cols, (i + 1) * cols) as number[]);
    return drawSignGrid(
      grid,
      g,
      entries.some((e) => e === -1),
    );
  }
  const text = entries.map((e) => valueToText(e));
  const colWidth = Array.from({ length: cols }, (_, j) => Math.max(...Array.from({ length: rows }, (_, i) => width(text[i * cols + j]))));
  const lines: string[] = [];
  for (let i = 0; i < rows; i++) {
    const [l, r] = g.bracket(i, rows);
    const cells = Array.from({ length: cols }, (_, j) => padLeft(text[i * cols + j], colWidth[j]));
    lines.push(`${l} ${cells.join('  ')} ${r}`);
  }
  return finish(lines);
}
