// The permutation diagram as a plot: position i runs left to right, value w(i) bottom to top, one
// dot per column. Cells are as wide as the largest label so that n up to about 25 fits 80 columns.

import type { Glyphs } from './glyphs.js';
import { digits, finish, padLeft } from './layout.js';

/** Relies on Permutation.a: the one-line notation, a[i-1] = w(i). */
export function drawPermutation(a: readonly number[], g: Glyphs): string {
  const n = a.length;
  if (n === 0) return '(the empty permutation)';
  const d = digits(n);
  const cell = (s: string) => ' ' + padLeft(s, d);
  const lines = [`w = ${a.join(' ')}`]; // one-line notation
  for (let v = n; v >= 1; v--) {
    let line = padLeft(String(v), d) + ' ' + g.vertical;
    for (let i = 0; i < n; i++) line += cell(a[i] === v ? g.dot : g.empty);
    lines.push(line);
  }
  lines.push(' '.repeat(d + 1) + g.axisCorner + g.horizontal.repeat(n * (d + 1) + 1));
  let labels = ' '.repeat(d + 2);
  for (let i = 1; i <= n; i++) labels += cell(String(i));
  lines.push(labels);
  lines.push('dots at (i, w(i)): i across, w(i) up');
  return finish(lines);
}
