// Arc diagrams: points 1..N on a line, arcs above it.

import { type Scene, SceneBuilder } from './scene.js';

function points(b: SceneBuilder, n: number): void {
  b.add({ t: 'line', x1: 0.5, y1: 0, x2: n + 0.5, y2: 0, tone: 'muted' });
  for (let i = 1; i <= n; i++) {
    b.add({ t: 'dot', x: i, y: 0, r: 0.12, fill: 'ink' });
    b.add({ t: 'text', x: i, y: 0.5, s: String(i), small: true });
  }
}

/** p[i-1] is the partner of point i. */
export function matchingScene(p: readonly number[]): Scene {
  const b = new SceneBuilder();
  points(b, p.length);
  const arcs: string[] = [];
  p.forEach((q, k) => {
    const i = k + 1;
    if (i < q) {
      b.arc(i, q, 0, 'accent');
      arcs.push(`(${i},${q})`);
    }
  });
  return b.build(`perfect matching ${arcs.join(' ')}`);
}

/** rgs: restricted growth string, rgs[i-1] the block of i. Consecutive elements of a block are joined. */
export function setPartitionScene(rgs: readonly number[]): Scene {
  const b = new SceneBuilder();
  points(b, rgs.length);
  const blocks = new Map<number, number[]>();
  rgs.forEach((blk, k) => blocks.set(blk, [...(blocks.get(blk) ?? []), k + 1]));
  const text: string[] = [];
  for (const els of blocks.values()) {
    for (let k = 0; k + 1 < els.length; k++) b.arc(els[k], els[k + 1], 0, 'accent');
    text.push(`{${els.join(',')}}`);
  }
  return b.build(`set partition ${text.join(' ')}: consecutive elements of a block joined by arcs`);
}
