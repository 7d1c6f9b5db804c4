// Words and subsets as one-line strips: a word as a row of boxes holding its letters, a subset as
// the points 1..max with its elements marked (the ground set is not part of a subset's value).

import { drawBoxes } from './boxGrid.js';
import type { Glyphs } from './glyphs.js';
import { digits, finish, padLeft } from './layout.js';

/** Relies on Word.letters: the letters in order. */
export function drawWord(letters: readonly number[], g: Glyphs): string {
  if (letters.length === 0) return '(the empty word)';
  const d = Math.max(...letters.map(digits));
  return finish(drawBoxes([{ start: 0, cells: letters.map((x) => padLeft(String(x), d)) }], d, g));
}

/** Relies on Subset.elems: the elements, increasing. */
export function drawSubset(elems: readonly number[], g: Glyphs): string {
  if (elems.length === 0) return `${g.emptySet} (the empty set)`;
  const max = elems[elems.length - 1];
  const d = digits(max);
  const member = new Set(elems);
  const labels: string[] = [],
    marks: string[] = [];
  for (let i = 1; i <= max; i++) {
    labels.push(padLeft(String(i), d));
    marks.push(padLeft(member.has(i) ? g.dot : g.empty, d));
  }
  return finish([labels.join(' '), marks.join(' ')]);
}
