// A grid of boxes drawn with shared borders: the common renderer of Young diagrams, tableaux,
// compositions and word strips. Rows are listed top to bottom (English notation); a row may start
// to the right of column 0, so any set of cells whose rows are intervals can be drawn.

import { Canvas } from './layout.js';
import type { Glyphs } from './glyphs.js';

export interface BoxRow {
  /** The column (0-based, in cells) of the first box. */
  start: number;
  /** The contents of the boxes, each at most `cellWidth` columns (padded on the right). */
  cells: readonly string[];
}

/**
 * The lines of the drawing. Each box is `cellWidth` columns inside plus a shared border, and one
 * line high plus a shared border; a border vertex gets the junction glyph for the edges meeting there.
 */
export function drawBoxes(rows: readonly BoxRow[], cellWidth: number, g: Glyphs): string[] {
  const h = rows.length;
  const w = Math.max(0, ...rows.map((r) => r.start + r.cells.length));
  const has = (r: number, c: number) => r >= 0 && r < h && c >= rows[r].start && c < rows[r].start + rows[r].cells.length;
  // Edges of the lattice: the horizontal edge above cell (r, c) and the vertical edge left of it.
  const hEdge = (r: number, c: number) => has(r - 1, c) || has(r, c);
  const vEdge = (r: number, c: number) => has(r, c - 1) || has(r, c);
  const step = cellWidth + 1;
  const canvas = new Canvas(2 * h + 1, step * w + 1);
  for (let r = 0; r <= h; r++) {
    for (let c = 0; c <= w; c++) {
      const up = r > 0 && vEdge(r - 1, c);
      const down = r < h && vEdge(r, c);
      const left = c > 0 && hEdge(r, c - 1);
      const right = c < w && hEdge(r, c);
      canvas.set(2 * r, step * c, g.junction(up, down, left, right));
      if (right) for (let k = 1; k <= cellWidth; k++) canvas.set(2 * r, step * c + k, g.horizontal);
      if (down) canvas.set(2 * r + 1, step * c, g.vertical);
    }
  }
  rows.forEach((row, r) => row.cells.forEach((s, k) => canvas.text(2 * r + 1, step * (row.start + k) + 1, s)));
  return canvas.lines();
}
