// A Motzkin path as a mountain range: an up step rises through the band above its height, a down
// step falls through the band below it, a flat step lies along the bottom of the band above its
// height; the word of steps underneath.

import { Canvas, finish } from './layout.js';
import type { Glyphs } from './glyphs.js';

/** Relies on MotzkinPath.steps: +1 (U), 0 (F), -1 (D). */
export function drawMotzkinPath(steps: readonly number[], g: Glyphs): string {
  if (steps.length === 0) return '(the empty Motzkin path)';
  // Band b lies between heights b - 1 and b; U and F at height h use band h + 1, D from h uses band h.
  let h = 0,
    bands = 1;
  for (const s of steps) {
    bands = Math.max(bands, s < 0 ? h : h + 1);
    h += s;
  }
  const canvas = new Canvas(bands, steps.length);
  h = 0;
  steps.forEach((s, k) => {
    if (s > 0) canvas.set(bands - (h + 1), k, g.up);
    else if (s < 0) canvas.set(bands - h, k, g.down);
    else canvas.set(bands - (h + 1), k, '_');
    h += s;
  });
  return finish([...canvas.lines(), steps.map((s) => (s > 0 ? 'U' : s < 0 ? 'D' : 'F')).join('')]);
}
