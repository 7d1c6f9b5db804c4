// A scene as a standalone SVG image (no external fonts, styles or links).

import type { Item, Scene, Tone } from '../scenes/scene.js';
import { coord } from './numbers.js';
import { xmlEscape } from '../markup/xml.js';

const COLOURS: Record<Tone, string> = {
  ink: '#222222',
  muted: '#b8b8b8',
  accent: '#1f5fa8',
  positive: '#2e7d32',
  negative: '#c62828',
  paper: '#ffffff',
};

/** Pixels per cell, and the margin around the picture in cells. */
const CELL = 24;
const MARGIN = 0.6;

const p = (x: number) => coord(x * CELL);
const colour = (t: Tone | undefined, fallback: Tone = 'ink') => COLOURS[t ?? fallback];
const width = (thick?: boolean) => (thick ? '2.4' : '1');

function item(i: Item): string {
  switch (i.t) {
    case 'line':
      return `<line x1="${p(i.x1)}" y1="${p(i.y1)}" x2="${p(i.x2)}" y2="${p(i.y2)}" stroke="${colour(i.tone)}" stroke-width="${width(i.thick)}"${i.dashed ? ' stroke-dasharray="2 3"' : ''}/>`;
    case 'rect':
      return `<rect x="${p(i.x)}" y="${p(i.y)}" width="${p(i.w)}" height="${p(i.h)}" fill="${i.fill ? colour(i.fill) : 'none'}" stroke="${colour(i.stroke)}" stroke-width="1"/>`;
    case 'dot':
      return i.open
        ? `<circle cx="${p(i.x)}" cy="${p(i.y)}" r="${p(i.r)}" fill="none" stroke="${colour(i.fill)}" stroke-width="2.4"/>`
        : `<circle cx="${p(i.x)}" cy="${p(i.y)}" r="${p(i.r)}" fill="${colour(i.fill)}"/>`;
    case 'curve':
      return `<path d="M ${p(i.x1)} ${p(i.y1)} C ${p(i.c1x)} ${p(i.c1y)}, ${p(i.c2x)} ${p(i.c2y)}, ${p(i.x2)} ${p(i.y2)}" fill="none" stroke="${colour(i.tone)}" stroke-width="${width(i.thick)}"/>`;
    case 'polyline':
      return `<polyline points="${i.points.map(([x, y]) => `${p(x)},${p(y)}`).join(' ')}" fill="none" stroke="${colour(i.tone)}" stroke-width="${width(i.thick)}" stroke-linejoin="round"/>`;
    case 'text': {
      const anchor = i.anchor === 'start' ? 'start' : i.anchor === 'end' ? 'end' : 'middle';
      return `<text x="${p(i.x)}" y="${p(i.y)}" font-size="${i.small ? 10 : 13}" text-anchor="${anchor}" dominant-baseline="central" fill="${colour(i.tone)}">${xmlEscape(i.s)}</text>`;
    }
  }
}

/** An <svg> element; its <title> is the scene's caption (read by screen readers and tooltips). */
export function sceneToSvg(scene: Scene): string {
  const x = scene.x0 - MARGIN,
    y = scene.y0 - MARGIN;
  const w = scene.width + 2 * MARGIN,
    h = scene.height + 2 * MARGIN;
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="${p(x)} ${p(y)} ${p(w)} ${p(h)}" width="${p(w)}" height="${p(h)}" font-family="sans-serif" role="img">`,
    `<title>${xmlEscape(scene.caption)}</title>`,
    ...scene.items.map(item),
    '</svg>',
  ].join('\n');
}
