// "What was covered", in words: consecutive sizes compressed into ranges, with case counts.
// Sampled coverage always says it is evidence, not proof.

import { formatCount } from '../base/format-count.js';
import type { CheckedPiece } from '../runner/result.js';
import { compressedRanges } from './size-ranges.js';

/** "n = 1..8" from the sizes of pieces (one size binding). */
function sizeRanges(pieces: CheckedPiece[]): string {
  const name = Object.keys(pieces[0]?.size ?? {})[0];
  if (!name) return '';
  return `${name} = ${compressedRanges(pieces.map((p) => p.size[name]))}`;
}

export interface CoverageText {
  exhaustive: string | null;
  sampled: string | null;
}

export function describeCoverage(checked: CheckedPiece[]): CoverageText {
  const ex = checked.filter((p) => p.phase === 'exhaustive');
  const sa = checked.filter((p) => p.phase === 'sample');
  const sum = (ps: CheckedPiece[]) => ps.reduce((a, p) => a + p.cases, 0);
  const skipped = (ps: CheckedPiece[]) => ps.reduce((a, p) => a + p.skipped, 0);
  const excluded = (ps: CheckedPiece[]) => (skipped(ps) ? `, ${formatCount(skipped(ps))} excluded by where` : '');
  // Finished sizes are named as ranges; a size stopped part-way is named apart with what it did.
  const unfinished = (ps: CheckedPiece[], what: string) =>
    ps
      .filter((p) => p.partial)
      .map((p) => `${sizeRanges([p])} stopped part-way, after ${formatCount(p.cases)} ${what}`)
      .join('; ');
  let exhaustive: string | null = null;
  if (ex.length) {
    const whole = ex.filter((p) => !p.partial);
    const rng = whole.length ? sizeRanges(whole) : '';
    const n = sum(whole);
    // An aggregate claim (no family binding) is one case per size: say what that means.
    const aggregate = whole.length > 1 && whole.every((p) => p.cases + p.skipped <= 1);
    const parts: string[] = [];
    if (rng && aggregate) parts.push(`${rng} exhaustive (one claim about the whole of each size)`);
    else if (rng) parts.push(`${rng} exhaustive, ${formatCount(n)} case${n === 1 ? '' : 's'}${excluded(whole)}`);
    else if (whole.length) parts.push(`every case, ${formatCount(n)} case${n === 1 ? '' : 's'}${excluded(whole)}`);
    const u = unfinished(ex, 'cases');
    if (u) parts.push(u);
    exhaustive = parts.join('; ') || null;
  }
  let sampled: string | null = null;
  if (sa.length) {
    const whole = sa.filter((p) => !p.partial);
    const n = sum(whole);
    const parts: string[] = [];
    if (whole.length) parts.push(`${sizeRanges(whole)} sampled, ${formatCount(n)} random case${n === 1 ? '' : 's'}${excluded(whole)}`);
    const u = unfinished(sa, 'random cases');
    if (u) parts.push(u);
    sampled = parts.join('; ') || null;
  }
  return { exhaustive, sampled };
}

export function formatMs(ms: number): string {
  if (ms < 1000) return `${Math.round(ms)} ms`;
  if (ms < 60_000) return `${(Math.round(ms / 100) / 10).toString()} s`;
  const s = Math.round(ms / 1000);
  return `${Math.floor(s / 60)} min ${s % 60} s`;
}
