// A pipe dream drawn as pipes. The staircase has the tiles (i, j) with i + j <= n, each a cross or
// a pair of elbows, and a final elbow at i + j = n + 1 turning the pipe of row i upwards. A tile
// is two lines high and W columns wide; every pipe enters and leaves a tile through its first line
// (sideways) and its first column (vertically), so the pipes join up from tile to tile:
//
//   cross  ┼─     elbows  ╯╭     the pipe from the left turns up at ╯;
//          │              ╭╯     the pipe from below runs along the second line and turns right.
//
// n is the smallest staircase holding the crosses (a pipe dream does not record its permutation's
// size); the pipes are traced to name the permutation in the caption.

import type { Glyphs } from './glyphs.js';
import { Canvas, digits, finish, padLeft } from './layout.js';

/** Column (1-based) at the top where the pipe entering row p from the left leaves, for each p. */
export function pipeExits(crosses: readonly (readonly [number, number])[], n: number): number[] {
  const cross = new Set(crosses.map(([i, j]) => `${i},${j}`));
  const exits: number[] = [];
  for (let p = 1; p <= n; p++) {
    let i = p,
      j = 1,
      fromLeft = true;
    while (i >= 1) {
      const isCross = i + j <= n && cross.has(`${i},${j}`);
      if (isCross === fromLeft)
        j++; // straight through sideways, or an elbow turning right
      else i--; // straight up, or an elbow turning up
      if (!isCross) fromLeft = !fromLeft;
    }
    exits.push(j);
  }
  return exits;
}

/** Relies on PipeDream.crosses: [row, column] pairs; an optional numeric `n` enlarges the staircase. */
export function drawPipeDream(crosses: readonly (readonly [number, number])[], g: Glyphs, sizeHint = 0): string {
  const n = Math.max(1, sizeHint, ...crosses.map(([i, j]) => i + j));
  const cross = new Set(crosses.map(([i, j]) => `${i},${j}`));
  const d = digits(n);
  const W = Math.max(2, d + 1);
  const left = d + 2; // row label, a space, the stub where the pipe comes in
  const canvas = new Canvas(2 * n + 1, left + W * n);
  for (let j = 1; j <= n; j++) canvas.text(0, left + W * (j - 1), String(j));
  for (let i = 1; i <= n; i++) {
    const r = 2 * i - 1;
    canvas.text(r, 0, padLeft(String(i), d));
    canvas.set(r, d + 1, g.horizontal);
    for (let j = 1; j <= n + 1 - i; j++) {
      const c = left + W * (j - 1);
      if (i + j === n + 1) canvas.set(r, c, g.elbowLeftUp);
      else if (cross.has(`${i},${j}`)) {
        canvas.text(r, c, g.cross + g.horizontal.repeat(W - 1));
        canvas.set(r + 1, c, g.vertical);
      } else {
        canvas.text(r, c, g.elbowLeftUp + ' '.repeat(W - 2) + g.elbowDownRight);
        canvas.text(r + 1, c, g.elbowDownRight + g.horizontal.repeat(W - 2) + g.elbowLeftUp);
      }
    }
  }
  const lines = canvas.lines().slice(0, 2 * n); // the last line is always blank
  const w = pipeExits(crosses, n);
  lines.push(`w = [${w.join(', ')}]: the pipe from row i exits at column w(i)`);
  return finish(lines);
}
