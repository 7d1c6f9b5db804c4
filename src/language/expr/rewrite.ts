// Rewriting an expression's text with every binder-first comprehension `sum(v in S: body)` turned
// body first, `sum(body for v in S)`, keeping everything else exactly as written (spacing,
// parentheses). Used by the hints that show how to write an expression YAML accepts unquoted.

import type { Expr } from './ast.js';
import { children } from './parser.js';

/** The text of [start, end) of `text` with the given nodes (lying inside it) rewritten. */
function splice(text: string, start: number, end: number, kids: Expr[]): string {
  const inside = kids.filter((k) => k.start >= start && k.end <= end).sort((a, b) => a.start - b.start);
  let out = '';
  let at = start;
  for (const k of inside) {
    out += text.slice(at, k.start) + rewrite(text, k);
    at = k.end;
  }
  return out + text.slice(at, end);
}

function rewrite(text: string, e: Expr): string {
  if (e.type === 'comprehension' && e.body && e.body.start > e.generators[0].start) {
    // Node spans leave out parentheses around them, so the parts are cut at the comprehension's
    // own delimiters: the opening parenthesis, the ":" and the closing parenthesis.
    const last = e.generators[e.generators.length - 1];
    let colon = last.end;
    while (colon < e.end && text[colon] !== ':') colon++;
    const open = text.indexOf('(', e.start);
    const sources = e.generators.flatMap((g) => (g.where ? [g.source, g.where] : [g.source]));
    const gens = splice(text, open + 1, colon, sources).trim();
    const body = splice(text, colon + 1, e.end - 1, [e.body]).trim();
    return `${e.reducer}(${body} for ${gens})`;
  }
  return splice(text, e.start, e.end, children(e));
}

/** `text` (which parsed to `e`) with its binder-first comprehensions written body first. */
export function bodyFirstText(text: string, e: Expr): string {
  return text.slice(0, e.start) + rewrite(text, e) + text.slice(e.end);
}
