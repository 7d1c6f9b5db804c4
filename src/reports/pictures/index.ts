// Terminal pictures of values, for counterexample reports and `hunch eval`. Dispatches on the
// value's kind and reads the fields each object class exposes (named beside each case below), so
// this module imports no object class. Pictures are deterministic, have no trailing spaces and,
// with `unicode: false`, use printable ASCII only.

import { isStructured } from '../../values/structured.js';
import type { Value } from '../../values/value.js';
import { drawDyckPath } from './dyckPath.js';
import { glyphsFor, type Glyphs } from './glyphs.js';
import { drawAsm, drawMatrix } from './grids.js';
import { drawIdeal } from './ideal.js';
import { sideBySide, width } from './layout.js';
import { drawMatching } from './matching.js';
import { drawPermutation } from './permutation.js';
import { drawPipeDream } from './pipeDream.js';
import { drawSetPartition } from './setPartition.js';
import { drawSignedPermutation } from './signedPermutation.js';
import { drawMotzkinPath } from './motzkinPath.js';
import { drawParkingFunction } from './parkingFunction.js';
import { drawSubset, drawWord } from './strips.js';
import { drawSymmetric } from './symmetric.js';
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

/** A value read by field name; the fields each kind relies on are named beside its case in draw(). */
type Fields = Record<string, any>;

/**
 * Past this many points, steps or rows along one side a picture no longer fits a terminal and
 * helps nobody; such values get null (their text form is printed anyway).
 */
export const MAX_SIDE = 40;

/** Lists side by side while the row of pictures fits this width, stacked beyond it. */
const MAX_ROW_WIDTH = 120;

function draw(v: Value, g: Glyphs): string | null {
  if (Array.isArray(v)) {
    if (v.length === 0) return null;
    const pictures: string[] = [];
    for (const x of v as readonly Value[]) {
      const p = draw(x, g);
      if (p === null) return null;
      pictures.push(p);
    }
    const row = sideBySide(pictures);
    return Math.max(...row.split('\n').map(width)) <= MAX_ROW_WIDTH ? row : pictures.join('\n\n');
  }
  if (!isStructured(v)) return null;
  const o = v as unknown as Fields;
  if (tooBig(v.kind, o)) return null;
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
    case 'signedPermutation':
      return drawSignedPermutation(o.a, g); // a: the window w(1), ..., w(n)
    case 'motzkin':
      return drawMotzkinPath(o.steps, g); // steps: +1 (U) / 0 (F) / -1 (D)
    case 'parkingFunction':
      return drawParkingFunction(o.values, g); // values: a_1, ..., a_n
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
    case 'matrix':
      return drawMatrix(o.rows, o.cols, o.entries, g); // rows, cols: numbers; entries: row-major scalars (partialPermutations are matrices)
    case 'ideal':
      return drawIdeal(o.gens, o.ring.length, o.prime, () => o.leadingTerms(), g); // gens, ring (ids), prime, leadingTerms()
    case 'symmetric':
      return drawSymmetric(o.terms, g); // terms: { parts, coef }[] in the Schur basis
    default:
      return null;
  }
}

/** Whether the picture of a value of this kind would be larger than MAX_SIDE along a side. */
function tooBig(kind: string, o: Fields): boolean {
  const big = (x: number) => x > MAX_SIDE;
  switch (kind) {
    case 'permutation':
    case 'signedPermutation':
      return big(o.a.length);
    case 'motzkin':
    case 'parkingFunction':
      return big((o.steps ?? o.values).length);
    case 'partition':
    case 'composition':
      return big(o.parts.length) || o.parts.some(big);
    case 'tableau':
    case 'asm':
      return big(o.rows.length) || o.rows.some((r: unknown[]) => big(r.length));
    case 'matching':
    case 'setPartition':
      return big((o.p ?? o.rgs).length);
    case 'dyck':
      return big(o.steps.length / 2);
    case 'word':
      return big(o.letters.length);
    case 'subset':
      return o.elems.some(big);
    case 'pipeDream':
      return o.crosses.some(([i, j]: [number, number]) => big(i + j));
    case 'matrix':
      return big(o.rows) || big(o.cols);
    default:
      return false;
  }
}
