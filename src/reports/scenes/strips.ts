// One-row scenes: words, subsets, and a reduced word as a wiring diagram.

import { type Scene, SceneBuilder } from './scene.js';

export function wordScene(letters: readonly number[]): Scene {
  const b = new SceneBuilder();
  letters.forEach((l, k) => {
    b.add({ t: 'rect', x: k, y: 0, w: 1, h: 1, stroke: 'ink' });
    b.add({ t: 'text', x: k + 0.5, y: 0.5, s: String(l) });
  });
  return b.build(`word ${letters.join(' ')}`);
}

/** A parking function: car i prefers spot a_i; one box per car, its preferred spot inside. */
export function parkingFunctionScene(values: readonly number[]): Scene {
  const b = new SceneBuilder();
  values.forEach((v, k) => {
    b.add({ t: 'rect', x: k, y: 0, w: 1, h: 1, stroke: 'ink' });
    b.add({ t: 'text', x: k + 0.5, y: 0.5, s: String(v) });
    b.add({ t: 'text', x: k + 0.5, y: 1.5, s: String(k + 1), small: true, tone: 'muted' });
  });
  return b.build(`parking function (${values.join(', ')}): car i (below) prefers spot a_i (in its box)`);
}

/** The points 1..n, members filled. */
export function subsetScene(elems: readonly number[], n: number): Scene {
  const b = new SceneBuilder();
  const member = new Set(elems);
  for (let i = 1; i <= n; i++) {
    b.add({ t: 'dot', x: i, y: 0, r: 0.22, fill: member.has(i) ? 'accent' : 'muted', open: !member.has(i) });
    b.add({ t: 'text', x: i, y: 0.6, s: String(i), small: true });
  }
  return b.build(`subset {${elems.join(', ')}} of 1..${n}`);
}

/**
 * The wiring diagram of a word a_1 ... a_l in the simple transpositions: wires 1..n run left to
 * right, wire positions counted from the top; the k-th letter a crosses the wires at positions a
 * and a+1 between columns k-1 and k.
 */
export function wiringScene(letters: readonly number[]): Scene {
  const n = Math.max(1, ...letters) + 1;
  const b = new SceneBuilder();
  const l = letters.length;
  for (let p = 1; p <= n; p++) b.add({ t: 'text', x: -0.4, y: p - 1, s: String(p), small: true });
  for (let k = 0; k <= l; k++) {
    const a = k < l ? letters[k] : 0;
    for (let p = 1; p <= n; p++) {
      const y = p - 1;
      if (k === l) continue;
      if (p === a) b.add({ t: 'line', x1: k, y1: y, x2: k + 1, y2: y + 1, tone: 'accent', thick: true });
      else if (p === a + 1) b.add({ t: 'line', x1: k, y1: y, x2: k + 1, y2: y - 1, tone: 'accent', thick: true });
      else b.add({ t: 'line', x1: k, y1: y, x2: k + 1, y2: y, tone: 'accent', thick: true });
    }
    if (k < l) b.add({ t: 'text', x: k + 0.5, y: n - 0.3, s: String(letters[k]), small: true, tone: 'muted' });
  }
  return b.build(`wiring diagram of the word ${letters.join(' ')}: letter a crosses the wires at heights a and a+1 (from the top)`);
}
