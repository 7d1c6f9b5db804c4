// Young diagrams, compositions and tableaux in English notation: the first row on top.

import { type Scene, SceneBuilder } from './scene.js';

function boxes(b: SceneBuilder, lengths: readonly number[]): void {
  lengths.forEach((len, r) => {
    for (let c = 0; c < len; c++) b.add({ t: 'rect', x: c, y: r, w: 1, h: 1, stroke: 'ink' });
  });
}

export function partitionScene(parts: readonly number[]): Scene {
  const b = new SceneBuilder();
  boxes(b, parts);
  return b.build(parts.length ? `Young diagram of (${parts.join(', ')}), English notation` : 'the empty partition');
}

export function compositionScene(parts: readonly number[]): Scene {
  const b = new SceneBuilder();
  boxes(b, parts);
  return b.build(parts.length ? `composition (${parts.join(', ')}): one row per part, in order` : 'the empty composition');
}

export function tableauScene(rows: readonly (readonly number[])[]): Scene {
  const b = new SceneBuilder();
  boxes(
    b,
    rows.map((r) => r.length),
  );
  rows.forEach((row, r) => row.forEach((e, c) => b.add({ t: 'text', x: c + 0.5, y: r + 0.5, s: String(e) })));
  return b.build(`tableau of shape (${rows.map((r) => r.length).join(', ')}), English notation`);
}
