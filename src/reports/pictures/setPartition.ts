// A set partition as one line per block over the points 1..n: the block's points marked and
// joined by a line from its least to its largest element, the block written out on the right.

import type { Glyphs } from './glyphs.js';
import { digits, finish, padLeft, padRight, width } from './layout.js';

/** Relies on SetPartition.rgs: rgs[i-1] is the block (numbered by least element) containing i. */
export function drawSetPartition(rgs: readonly number[], g: Glyphs): string {
  const n = rgs.length;
  if (n === 0) return '(the empty set partition)';
  const blocks: number[][] = [];
  rgs.forEach((b, i) => (blocks[b - 1] ??= []).push(i + 1));
  const d = digits(n);
  const x = (i: number) => (i - 1) * (d + 1) + d - 1; // under the last digit of the label
  let labels = '';
  for (let i = 1; i <= n; i++) labels += (i > 1 ? ' ' : '') + padLeft(String(i), d);
  const rows = blocks.map((b) => {
    const line = new Array<string>(x(b[b.length - 1]) + 1).fill(' ');
    for (let c = x(b[0]); c < line.length; c++) line[c] = g.horizontal;
    for (const i of b) line[x(i)] = g.dot;
    return line.join('');
  });
  const w = width(labels) + 3;
  return finish([labels, ...rows.map((r, k) => padRight(r, w) + `{${blocks[k].join(', ')}}`)]);
}
