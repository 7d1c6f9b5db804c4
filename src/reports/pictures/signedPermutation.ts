// A signed permutation as a plot: position i across, value w(i) up, the values n..1 above the
// axis and -1..-n below it, one dot per column (negative entries drawn hollow).

import type { Glyphs } from './glyphs.js';
import { digits, finish, padLeft } from './layout.js';

/** Relies on SignedPermutation.a: the window, a[i-1] = w(i). */
export function drawSignedPermutation(a: readonly number[], g: Glyphs): string {
  const n = a.length;
  if (n === 0) return '(the empty signed permutation)';
  const d = digits(n) + 1;
  const cell = (s: string) => ' ' + padLeft(s, d);
  const lines = [`w = ${a.join(' ')}`];
  const row = (v: number) => {
    let line = padLeft(String(v), d) + ' ' + g.vertical;
    for (let i = 0; i < n; i++) line += cell(a[i] === v ? (v > 0 ? g.dot : g.minus) : g.empty);
    lines.push(line);
  };
  for (let v = n; v >= 1; v--) row(v);
  lines.push(' '.repeat(d + 1) + g.vertical + g.horizontal.repeat(n * (d + 1) + 1));
  for (let v = -1; v >= -n; v--) row(v);
  let labels = ' '.repeat(d + 2);
  for (let i = 1; i <= n; i++) labels += cell(String(i));
  lines.push(labels);
  lines.push('dots at (i, w(i)): i across, w(i) up; negative values below the line');
  return finish(lines);
}
