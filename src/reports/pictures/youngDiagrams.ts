// Young diagrams and tableaux in English notation (row 1 on top, rows left-justified), and
// compositions drawn the same way: one left-justified row of boxes per part, parts in order.

import { drawBoxes, type BoxRow } from './boxGrid.js';
import type { Glyphs } from './glyphs.js';
import { digits, finish, padLeft } from './layout.js';

/** Boxes 3 columns wide look square in a terminal; longer rows fall back to 1 to stay narrow. */
function emptyCellWidth(longestRow: number): number {
  return longestRow <= 16 ? 3 : 1;
}

function blankRows(lengths: readonly number[], cellWidth: number): BoxRow[] {
  return lengths.map((k) => ({ start: 0, cells: new Array<string>(k).fill(' '.repeat(cellWidth)) }));
}

/** Relies on Partition.parts: the parts, weakly decreasing. */
export function drawPartition(parts: readonly number[], g: Glyphs): string {
  if (parts.length === 0) return '(the empty partition)';
  const size = parts.reduce((a, b) => a + b, 0);
  const header = `(${parts.join(', ')}), ${size} cell${size === 1 ? '' : 's'}`;
  return finish([header, ...drawBoxes(blankRows(parts, emptyCellWidth(parts[0])), emptyCellWidth(parts[0]), g)]);
}

/** Relies on Tableau.rows: the rows top to bottom. Entries right-aligned in equal-width boxes. */
export function drawTableau(rows: readonly (readonly number[])[], g: Glyphs): string {
  if (rows.every((r) => r.length === 0)) return '(the empty tableau)';
  const d = Math.max(...rows.flatMap((r) => r.map((x) => digits(x))));
  const boxRows = rows.map((r) => ({ start: 0, cells: r.map((x) => ' ' + padLeft(String(x), d) + ' ') }));
  return finish(drawBoxes(boxRows, d + 2, g));
}

/** Relies on Composition.parts: the parts in order. */
export function drawComposition(parts: readonly number[], g: Glyphs): string {
  if (parts.length === 0) return '(the empty composition)';
  const size = parts.reduce((a, b) => a + b, 0);
  const w = emptyCellWidth(Math.max(...parts));
  return finish([`${parts.join(' + ')} = ${size}`, ...drawBoxes(blankRows(parts, w), w, g)]);
}
