// "What was covered", in words: consecutive sizes compressed into ranges, with case counts.
// Sampled coverage always says it is evidence, not proof.

import type { CheckedPiece } from '../runner/result.js';

export function formatCount(n: number): string {
  return n.toLocaleString('en-US');
}

/** "n = 1..8" from the sizes of pieces (one size binding). */
function sizeRanges(pieces: CheckedPiece[]): string {
  const name = Object.keys(pieces[0]?.size ?? {})[0];
  if (!name) return '';
  const vals = [...new Set(pieces.map((p) => p.size[name]))].sort((a, b) => a - b);
  const parts: string[] = [];
  for (let i = 0; i < vals.length; ) {
    let j = i;
    while (j + 1 < vals.length && vals[j + 1] === vals[j] + 1) j++;
    parts.push(i === j ? `${vals[i]}` : `${vals[i]}..${vals[j]}`);
    i = j + 1;
  }
  return `${name} = ${parts.join(', ')}`;
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
  const partial = (ps: CheckedPiece[]) => (ps.some((p) => p.partial) ? ' (the last size only in part)' : '');
  const excluded = (ps: CheckedPiece[]) => (skipped(ps) ? `, ${formatCount(skipped(ps))} excluded by where` : '');
  let exhaustive: string | null = null;
  if (ex.length) {
    const whole = ex.filter((p) => !p.partial);
    const rng = whole.length ? sizeRanges(whole) : '';
    const cases = formatCount(sum(ex));
    // An aggregate claim (no family binding) is one case per size: say what that means.
    const aggregate = ex.every((p) => p.cases + p.skipped <= 1) && ex.length > 1;
    exhaustive = rng && aggregate
      ? `${rng} exhaustive (one claim about the whole of each size)${partial(ex)}`
      : rng
      ? `${rng} exhaustive, ${cases} case${sum(ex) === 1 ? '' : 's'}${excluded(ex)}${partial(ex)}`
      : Object.keys(ex[0].size).length === 0
        ? `every case, ${cases} case${sum(ex) === 1 ? '' : 's'}${excluded(ex)}${partial(ex)}`
        : `${cases} cases of ${sizeRanges(ex)}, not finished`;
  }
  const sampled = sa.length
    ? `${sizeRanges(sa)} sampled, ${formatCount(sum(sa))} random case${sum(sa) === 1 ? '' : 's'}${excluded(sa)}${partial(sa)}`
    : null;
  return { exhaustive, sampled };
}

export function formatMs(ms: number): string {
  if (ms < 1000) return `${Math.round(ms)} ms`;
  if (ms < 60_000) return `${(Math.round(ms / 100) / 10).toString()} s`;
  const s = Math.round(ms / 1000);
  return `${Math.floor(s / 60)} min ${s % 60} s`;
}
