// Lattice paths drawn on their grid: steps are height changes (+1 up, -1 down, 0 level).

import { type Scene, SceneBuilder } from './scene.js';

export function latticePathScene(steps: readonly number[], caption: string): Scene {
  const heights = [0];
  for (const s of steps) heights.push(heights[heights.length - 1] + s);
  const top = Math.max(1, ...heights);
  const b = new SceneBuilder();
  for (let x = 0; x <= steps.length; x++) b.add({ t: 'line', x1: x, y1: 0, x2: x, y2: top, tone: 'muted', dashed: true });
  for (let y = 0; y <= top; y++) b.add({ t: 'line', x1: 0, y1: y, x2: steps.length, y2: y, tone: 'muted', dashed: true });
  b.add({ t: 'line', x1: 0, y1: top, x2: steps.length, y2: top, tone: 'ink' });
  b.add({ t: 'polyline', points: heights.map((h, x) => [x, top - h] as [number, number]), tone: 'accent', thick: true });
  return b.build(caption);
}

export function dyckPathScene(steps: readonly number[]): Scene {
  const word = steps.map((s) => (s > 0 ? 'U' : 'D')).join('');
  return latticePathScene(steps, `Dyck path ${word}`);
}

export function motzkinPathScene(steps: readonly number[]): Scene {
  const word = steps.map((s) => (s > 0 ? 'U' : s < 0 ? 'D' : 'F')).join('');
  return latticePathScene(steps, `Motzkin path ${word}`);
}
