// Terminal pictures of values, for counterexample reports and `hunch eval`. Dispatches on the
// value's kind and reads the fields each object class exposes (named beside each case below), so
// this module imports no object class. Pictures are deterministic, have no trailing spaces and,
// with `unicode: false`, use printable ASCII only.

import { isStructured } from '../../values/structured.js';
import type { Value } from '../../values/value.js';
import { drawDyckPath } from './dyckPath.js';
import { glyphsFor, type Glyphs } from './glyphs.js';
import { drawAsm, drawMatrix, drawSignGrid } from './grids.js';
import { sideBySide } from './layout.js';
import { drawMatching } from './matching.js';
import { drawPermutation } from './permutation.js';
import { drawPipeDream } from './pipeDream.js';
import { drawSetPartition } from './setPartition.js';
import { drawSubset, drawWord } from './strips.js';
import { drawComposition, drawPartition, drawTableau } from './youngDiagrams.js';

export interface PictureOptions {
  /** false: plain printable ASCII only. */
  unicode: boolean;
}

/**
 * A multi-line picture of v (no trailing newline), or null for values without one (numbers,
 * booleans, strings, polynomials, ...). A nonempty list whose elements all have pictures is drawn
 * as those pictures side by side.
 */
export function drawValue(v: Value, opts: PictureOptions): string | null {
  return draw(v, glyphsFor(opts.unicode));
}

/** The fields read from each kind's class (see src/families/ and src/algebra/matrix.ts). */
type Fields = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any

function draw(v: Value, g: Glyphs): string | null {
  if (Array.isArray(v)) {
    if (v.length === 0) return null;
    const pictures: string[] = [];
    for (const x of v as readonly Value[]) {
      const p = draw(x, g);
      if (p === null) return null;
      pictures.push(p);
    }
    return sideBySide(pictures);
  }
  if (!isStructured(v)) return null;
  const o = v as unknown as Fields;
  switch (v.kind) {
    case 'permutation':
      return drawPermutation(o.a, g); // a: one-line notation
    case 'partition':
      return drawPartition(o.parts, g); // parts: weakly decreasing
    case 'tableau':
      return drawTableau(o.rows, g); // rows: number[][], top row first
    case 'composition':
      return drawComposition(o.parts, g); // parts in order
    case 'matching':
      return drawMatching(o.p, g); // p[i-1]: partner of point i
    case 'dyck':
      return drawDyckPath(o.steps, g); // steps: +1 (U) / -1 (D)
    case 'setPartition':
      return drawSetPartition(o.rgs, g); // rgs: restricted growth string
    case 'word':
      return drawWord(o.letters, g); // letters in order
    case 'subset':
      return drawSubset(o.elems, g); // elements, increasing
    case 'asm':
      return drawAsm(o.rows, g); // rows: number[][] of 0, 1, -1
    case 'pipeDream':
      return drawPipeDream(o.crosses, g, typeof o.n === 'number' ? o.n : 0); // crosses: [row, column][]
    case 'partialPermutation':
      return drawPartialPermutation(o, g);
    case 'matrix':
      return drawMatrix(o.rows, o.cols, o.entries, g); // rows, cols: numbers; entries: row-major scalars
    default:
      return null;
  }
}

/** A k x n 0/1 matrix with at most one 1 per row and column; see the note on the fields. */
function drawPartialPermutation(o: Fields, g: Glyphs): string | null {
  const rows = partialPermutationRows(o);
  if (rows === null) return null;
  if (rows.length === 0 || rows[0].length === 0) return `(the empty ${rows.length} by ${rows[0]?.length ?? 0} partial permutation)`;
  return drawSignGrid(rows, g, false);
}

/** Its rows, from `rows: number[][]` if present, else from its record encoding. */
function partialPermutationRows(o: Fields): number[][] | null {
  const isRows = (x: unknown): x is number[][] => Array.isArray(x) && x.every((r) => Array.isArray(r));
  if (isRows(o.rows)) return o.rows;
  const enc = typeof o.encode === 'function' ? (o.encode() as Fields | null)?.partialPermutation : undefined;
  return isRows(enc) ? enc : null;
}
