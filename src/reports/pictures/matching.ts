// Arc diagram of a perfect matching: the points 1..2n on a line, each arc a horizontal bar at
// some height joined to its two points by vertical legs. An arc is drawn higher than every arc
// nested inside it, and two crossing arcs at different heights, so a leg passes through a bar
// exactly where two arcs cross: every crossing glyph is a crossing of the matching, and each pair
// of crossing arcs shows exactly one.

import { Canvas, digits, finish, padLeft } from './layout.js';
import type { Glyphs } from './glyphs.js';

/** Heights 1, 2, ... for the arcs: shortest arcs first, each at the lowest allowed height. */
export function arcHeights(arcs: readonly (readonly [number, number])[]): number[] {
  const order = arcs.map((_, k) => k).sort((x, y) => arcs[x][1] - arcs[x][0] - (arcs[y][1] - arcs[y][0]) || arcs[x][0] - arcs[y][0]);
  const height = new Array<number>(arcs.length).fill(0);
  for (const k of order) {
    const [a, b] = arcs[k];
    let floor = 1;
    const taken = new Set<number>();
    for (let l = 0; l < arcs.length; l++) {
      if (height[l] === 0) continue;
      const [c, e] = arcs[l];
      if (a < c && e < b)
        floor = Math.max(floor, height[l] + 1); // nested inside
      else if ((a < c && c < b && b < e) || (c < a && a < e && e < b)) taken.add(height[l]); // crossing
    }
    let h = floor;
    while (taken.has(h)) h++;
    height[k] = h;
  }
  return height;
}

/** Relies on Matching.p: p[i-1] is the partner of point i. */
export function drawMatching(p: readonly number[], g: Glyphs): string {
  const m = p.length;
  if (m === 0) return '(the empty matching)';
  const arcs: [number, number][] = [];
  for (let i = 1; i <= m; i++) if (i < p[i - 1]) arcs.push([i, p[i - 1]]);
  const heights = arcHeights(arcs);
  const top = Math.max(...heights);
  const d = digits(m);
  const step = d + 1;
  const x = (i: number) => (i - 1) * step + d - 1; // under the last digit of the label
  const canvas = new Canvas(top, x(m) + 1);
  const row = (h: number) => top - h; // height h is drawn on canvas row top - h
  // Bars first, then legs, so a leg meeting a bar turns it into a crossing.
  arcs.forEach(([a, b], k) => {
    const r = row(heights[k]);
    canvas.set(r, x(a), g.arcLeft);
    for (let c = x(a) + 1; c < x(b); c++) canvas.set(r, c, g.horizontal);
    canvas.set(r, x(b), g.arcRight);
  });
  arcs.forEach(([a, b], k) => {
    for (let h = heights[k] - 1; h >= 1; h--) {
      for (const c of [x(a), x(b)]) canvas.set(row(h), c, canvas.get(row(h), c) === g.horizontal ? g.cross : g.vertical);
    }
  });
  const lines = canvas.lines();
  let labels = '';
  for (let i = 1; i <= m; i++) labels += (i > 1 ? ' ' : '') + padLeft(String(i), d);
  lines.push(labels);
  return finish(lines);
}
