// The picture of an ideal: a header (field, number of variables and generators) and one line per
// generator with its leading term for grevlex marked and written first. Relies on Ideal.gens,
// .ring, .prime and .leadingTerms() (src/algebra/ideals/ideal.ts).

import type { Glyphs } from './glyphs.js';

/** At most this many generators are listed; the rest are counted. */
const MAX_LINES = 40;

export function drawIdeal(
  gens: readonly unknown[],
  nv: number,
  prime: number | undefined,
  leadingTerms: () => { leading: string; rest: string }[],
  g: Glyphs,
): string {
  const field = prime === undefined ? 'Q' : `F_${prime}`;
  // The Unicode set's dot is not ASCII: mark with angle brackets there, with < > otherwise.
  const [open, close] = g.dot.charCodeAt(0) > 127 ? ['⟨', '⟩'] : ['<', '>'];
  const plural = (k: number, w: string) => `${k} ${w}${k === 1 ? '' : 's'}`;
  const header = `ideal over ${field} in ${plural(nv, 'variable')}, ${plural(gens.length, 'generator')}; leading terms (grevlex) in ${open} ${close}`;
  if (gens.length === 0) return `${header}\n  (the zero ideal)`;
  const lines = leadingTerms()
    .slice(0, MAX_LINES)
    .map(({ leading, rest }) => `  ${open}${leading}${close}${rest ? ' ' + rest : ''}`);
  if (gens.length > MAX_LINES) lines.push(`  ... and ${gens.length - MAX_LINES} more`);
  return [header, ...lines].join('\n');
}
