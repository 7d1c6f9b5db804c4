// A Dyck path as a mountain range: one column per step, an up step rising through the band above
// its starting height, a down step falling through the band below it; the word of steps underneath.

import { Canvas, finish } from './layout.js';
import type { Glyphs } from './glyphs.js';

/** Relies on DyckPath.steps: +1 for an up step U, -1 for a down step D. */
export function drawDyckPath(steps: readonly number[], g: Glyphs): string {
  if (steps.length === 0) return '(the empty Dyck path)';
  let h = 0,
    top = 0;
  for (const s of steps) top = Math.max(top, (h += s));
  const canvas = new Canvas(top, steps.length);
  h = 0;
  steps.forEach((s, k) => {
    // Band b (1-based, from the axis up) lies between heights b - 1 and b; canvas row top - b.
    if (s > 0) canvas.set(top - (h + 1), k, g.up);
    else canvas.set(top - h, k, g.down);
    h += s;
  });
  return finish([...canvas.lines(), steps.map((s) => (s > 0 ? 'U' : 'D')).join('')]);
}
