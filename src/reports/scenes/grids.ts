// Scenes on a square grid: permutation diagrams, alternating sign matrices, matrices and pipe dreams.

import { type Scene, SceneBuilder } from './scene.js';

function gridLines(b: SceneBuilder, cols: number, rows: number): void {
  for (let i = 0; i <= cols; i++) b.add({ t: 'line', x1: i, y1: 0, x2: i, y2: rows, tone: 'muted' });
  for (let j = 0; j <= rows; j++) b.add({ t: 'line', x1: 0, y1: j, x2: cols, y2: j, tone: 'muted' });
}

/** Dots at (i, w(i)): position i across, value w(i) up; a[i-1] = w(i). */
export function permutationScene(a: readonly number[]): Scene {
  const n = a.length;
  const b = new SceneBuilder();
  gridLines(b, n, n);
  for (let i = 1; i <= n; i++) {
    b.add({ t: 'dot', x: i - 0.5, y: n - a[i - 1] + 0.5, r: 0.28, fill: 'accent' });
    b.add({ t: 'text', x: i - 0.5, y: n + 0.55, s: String(i), small: true });
    b.add({ t: 'text', x: -0.45, y: n - i + 0.5, s: String(i), small: true });
  }
  return b.build(`w = ${a.join(' ')}: a dot at (i, w(i)), i across, w(i) up`);
}

/** A signed permutation in its window w(1), ..., w(n): a dot at (i, |w(i)|), open where w(i) < 0. */
export function signedPermutationScene(a: readonly number[]): Scene {
  const n = a.length;
  const b = new SceneBuilder();
  gridLines(b, n, n);
  for (let i = 1; i <= n; i++) {
    const v = a[i - 1];
    b.add({ t: 'dot', x: i - 0.5, y: n - Math.abs(v) + 0.5, r: 0.28, fill: v < 0 ? 'negative' : 'accent', open: v < 0 });
    b.add({ t: 'text', x: i - 0.5, y: n + 0.55, s: String(i), small: true });
    b.add({ t: 'text', x: -0.45, y: n - i + 0.5, s: String(i), small: true });
  }
  return b.build(`w = ${a.join(' ')}: a dot at (i, |w(i)|), open where w(i) is negative`);
}

/** Entries 1 as filled dots and -1 as open ones; rows top to bottom. */
export function asmScene(rows: readonly (readonly number[])[]): Scene {
  const n = rows.length;
  const b = new SceneBuilder();
  gridLines(b, n, n);
  rows.forEach((row, i) =>
    row.forEach((e, j) => {
      if (e === 1) b.add({ t: 'dot', x: j + 0.5, y: i + 0.5, r: 0.28, fill: 'positive' });
      else if (e === -1) b.add({ t: 'dot', x: j + 0.5, y: i + 0.5, r: 0.28, fill: 'negative', open: true });
    }),
  );
  return b.build('alternating sign matrix: filled dot 1, open dot -1, blank 0');
}

/** Entries as text, row-major. */
export function matrixScene(rows: number, cols: number, entries: readonly string[]): Scene {
  const b = new SceneBuilder();
  gridLines(b, cols, rows);
  for (let i = 0; i < rows; i++)
    for (let j = 0; j < cols; j++) {
      const s = entries[i * cols + j];
      b.add({ t: 'text', x: j + 0.5, y: i + 0.5, s, small: s.length > 2 });
    }
  return b.build(`a ${rows} × ${cols} matrix`);
}

/**
 * The staircase of tiles (i, j), i + j <= n: a cross is two straight pipes, any other tile two
 * elbows. Pipes enter each row from the left; `exits[p-1]` is the column where the pipe of row p
 * leaves at the top.
 */
export function pipeDreamScene(crosses: readonly (readonly [number, number])[], n: number, exits: readonly number[]): Scene {
  const cross = new Set(crosses.map(([i, j]) => `${i},${j}`));
  const b = new SceneBuilder();
  const k = 0.55; // control-point pull of a quarter circle drawn as a cubic curve
  for (let i = 1; i <= n; i++) {
    b.add({ t: 'text', x: -0.5, y: i - 0.5, s: String(i), small: true });
    for (let j = 1; j <= n + 1 - i; j++) {
      const x = j - 1,
        y = i - 1;
      b.add({ t: 'rect', x, y, w: 1, h: 1, stroke: 'muted' });
      if (i + j <= n && cross.has(`${i},${j}`)) {
        b.add({ t: 'line', x1: x, y1: y + 0.5, x2: x + 1, y2: y + 0.5, tone: 'accent', thick: true });
        b.add({ t: 'line', x1: x + 0.5, y1: y, x2: x + 0.5, y2: y + 1, tone: 'accent', thick: true });
      } else {
        // from the left edge up to the top edge, and (except on the last diagonal) from the bottom edge to the right edge
        b.add({
          t: 'curve',
          x1: x,
          y1: y + 0.5,
          c1x: x + 0.5 * k,
          c1y: y + 0.5,
          c2x: x + 0.5,
          c2y: y + 0.5 - 0.5 * k,
          x2: x + 0.5,
          y2: y,
          tone: 'accent',
          thick: true,
        });
        if (i + j <= n)
          b.add({
            t: 'curve',
            x1: x + 0.5,
            y1: y + 1,
            c1x: x + 0.5,
            c1y: y + 1 - 0.5 * k,
            c2x: x + 1 - 0.5 * k,
            c2y: y + 0.5,
            x2: x + 1,
            y2: y + 0.5,
            tone: 'accent',
            thick: true,
          });
      }
    }
  }
  for (let j = 1; j <= n; j++) b.add({ t: 'text', x: j - 0.5, y: -0.45, s: String(j), small: true });
  return b.build(`pipe dream of w = ${exits.join(' ')}: the pipe entering row i exits at column w(i)`);
}
