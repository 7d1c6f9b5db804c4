// A scene as a TikZ picture. The y axis of the picture points down (y=-unit), as in the scene, so
// coordinates are written unchanged. Needs only \usepackage{tikz} (plus the colours defined by
// TIKZ_PREAMBLE, which the exported documents include).

import type { Item, Scene, Tone } from '../scenes/scene.js';
import { coord as c } from './numbers.js';
import { latexText } from '../latex/text.js';

/** Colour names used by the pictures; a document that inputs a snippet defines them once. */
export const TIKZ_PREAMBLE = [
  '\\colorlet{hunchink}{black}',
  '\\colorlet{hunchmuted}{black!25}',
  '\\colorlet{hunchaccent}{blue!70!black}',
  '\\colorlet{hunchpositive}{green!45!black}',
  '\\colorlet{hunchnegative}{red!75!black}',
  '\\colorlet{hunchpaper}{white}',
].join('\n');

const tone = (t: Tone | undefined, fallback: Tone = 'ink') => `hunch${t ?? fallback}`;

function style(t: Tone | undefined, thick?: boolean, dashed?: boolean): string {
  const s = [tone(t)];
  if (thick) s.push('line width=1.1pt');
  if (dashed) s.push('densely dotted');
  return s.join(', ');
}

function item(i: Item): string {
  switch (i.t) {
    case 'line':
      return `\\draw[${style(i.tone, i.thick, i.dashed)}] (${c(i.x1)},${c(i.y1)}) -- (${c(i.x2)},${c(i.y2)});`;
    case 'rect': {
      const box = `(${c(i.x)},${c(i.y)}) rectangle (${c(i.x + i.w)},${c(i.y + i.h)})`;
      if (i.fill) return `\\filldraw[fill=${tone(i.fill)}, draw=${tone(i.stroke)}] ${box};`;
      return `\\draw[${tone(i.stroke)}] ${box};`;
    }
    case 'dot':
      return i.open
        ? `\\draw[${tone(i.fill)}, line width=1.1pt] (${c(i.x)},${c(i.y)}) circle[radius=${c(i.r)}];`
        : `\\fill[${tone(i.fill)}] (${c(i.x)},${c(i.y)}) circle[radius=${c(i.r)}];`;
    case 'curve':
      return `\\draw[${style(i.tone, i.thick)}] (${c(i.x1)},${c(i.y1)}) .. controls (${c(i.c1x)},${c(i.c1y)}) and (${c(i.c2x)},${c(i.c2y)}) .. (${c(i.x2)},${c(i.y2)});`;
    case 'polyline':
      return `\\draw[${style(i.tone, i.thick)}] ${i.points.map(([x, y]) => `(${c(x)},${c(y)})`).join(' -- ')};`;
    case 'text': {
      const anchor = i.anchor === 'start' ? ', anchor=west' : i.anchor === 'end' ? ', anchor=east' : '';
      return `\\node[${tone(i.tone)}, font=${i.small ? '\\scriptsize' : '\\small'}${anchor}, inner sep=0pt] at (${c(i.x)},${c(i.y)}) {${latexText(i.s)}};`;
    }
  }
}

/** The picture alone: \begin{tikzpicture} ... \end{tikzpicture}. The cell size is `unit` cm. */
export function sceneToTikz(scene: Scene, unit = 0.5): string {
  const lines = [`\\begin{tikzpicture}[x=${c(unit)}cm, y=-${c(unit)}cm]`];
  for (const i of scene.items) lines.push('  ' + item(i));
  lines.push('\\end{tikzpicture}');
  return lines.join('\n');
}
