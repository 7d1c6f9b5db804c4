// The witnesses of a counterexample as report lines: each all/any/min/max on the path to false
// with the element that decided it (drawn when it has a picture), and the values of the sides at
// the top of the claim. Shared by `hunch check` and `hunch replay`.

import { decodeValue } from '../values/decode.js';
import { valueToText } from '../values/operations.js';
import type { Witness } from '../language/conjecture/witnesses.js';
import { drawValue } from './pictures/index.js';

const MAX_TEXT = 300;

function text(x: unknown): string {
  let s: string;
  try {
    s = valueToText(decodeValue(x));
  } catch {
    s = JSON.stringify(x);
  }
  return s.length <= MAX_TEXT ? s : `${s.slice(0, MAX_TEXT)}... (${s.length - MAX_TEXT} more characters)`;
}

function picture(x: unknown, unicode: boolean): string | null {
  try {
    return drawValue(decodeValue(x), { unicode });
  } catch {
    return null;
  }
}

function indent(s: string, by: string): string {
  return s
    .split('\n')
    .map((l) => (l ? by + l : l))
    .join('\n');
}

/** What an element witness says about its quantifier. */
function verdict(w: Witness, at: string): string {
  switch (w.reducer) {
    case 'all':
      return `${at} is false at`;
    case 'any':
      return `${at} is true at`;
    case 'min':
    case 'max':
      return `${at} = ${text(w.value)} at`;
    default:
      return `${at} at`;
  }
}

/**
 * Lines (without a leading indent) for the witnesses; bindings are drawn the first time they
 * appear. Empty when there are none.
 */
export function witnessLines(witnesses: readonly Witness[] | undefined, style: { unicode: boolean }): string[] {
  if (!witnesses?.length) return [];
  const lines = ['witnesses (what decided the failure):'];
  const drawn = new Set<string>();
  for (const w of witnesses) {
    const at = w.at || '(expression)';
    const where = w.line ? ` [${w.line}:${w.column}]` : '';
    if (w.kind === 'value') {
      const given = Object.entries(w.bindings)
        .map(([k, v]) => `${k} = ${text(v)}`)
        .join(', ');
      const sides = w.sides ? `: ${text(w.sides[0])} against ${text(w.sides[1])}` : '';
      lines.push(`  ${at} is ${text(w.value)}${sides}${given ? ` when ${given}` : ''}${where}`);
      continue;
    }
    const entries = Object.entries(w.bindings);
    const fresh = entries.filter(([k, v]) => !drawn.has(`${k}=${JSON.stringify(v)}`));
    const shown = entries.map(([k, v]) => `${k} = ${text(v)}`).join(', ');
    const sides = w.sides ? `; there its two sides are ${text(w.sides[0])} against ${text(w.sides[1])}` : '';
    lines.push(
      `  ${verdict(w, at)} ${shown || 'its first element'}${sides}${w.partial ? ' (the simplest among the elements scanned: the source is very large)' : ''}${where}`,
    );
    for (const [k, v] of fresh) {
      drawn.add(`${k}=${JSON.stringify(v)}`);
      const pic = picture(v, style.unicode);
      if (pic) lines.push(...indent(pic, '      ').split('\n'));
    }
  }
  return lines;
}
