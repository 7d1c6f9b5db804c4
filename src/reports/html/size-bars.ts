// One small bar per conjecture: a cell per size, coloured by what the ledger holds for it.

import { xmlEscape } from '../markup/xml.js';
import type { SizeCell, SizeState } from '../export/notebook-model.js';
import { formatCount } from '../../base/format-count.js';

export const STATE_COLOURS: Record<SizeState, string> = {
  verified: '#2e7d32',
  failed: '#c62828',
  sampled: '#e0a030',
  'sample-failed': '#c62828',
  unfinished: '#b8b8b8',
};

export const STATE_WORDS: Record<SizeState, string> = {
  verified: 'verified exhaustively',
  failed: 'exhaustive, with failures',
  sampled: 'sampled (evidence, not proof)',
  'sample-failed': 'sampled, with failures',
  unfinished: 'started, not finished (does not count)',
};

const CELL = 7,
  GAP = 1,
  HEIGHT = 14;

/** The widest a bar may be, in pixels: long runs of sizes get narrower cells. */
const MAX_WIDTH = 240;

function cellRect(c: SizeCell, x: number, CELL: number): string {
  const dashed = c.state === 'sampled' || c.state === 'sample-failed' ? ' stroke="#8a5a00" stroke-dasharray="2 2"' : '';
  const tip = `${c.label}: ${STATE_WORDS[c.state]}${c.cases ? `, ${formatCount(c.cases)} cases` : ''}`;
  return `<rect x="${x}" y="0" width="${CELL}" height="${HEIGHT}" fill="${STATE_COLOURS[c.state]}"${dashed}><title>${xmlEscape(tip)}</title></rect>`;
}

export function sizeBar(cells: readonly SizeCell[]): string {
  if (cells.length === 0) return '<span class="unknown">nothing recorded</span>';
  const cell = Math.max(1, Math.min(7, Math.floor(MAX_WIDTH / cells.length) - GAP));
  const w = cells.length * (cell + GAP);
  const parts = cells.map((c, k) => cellRect(c, k * (cell + GAP), cell));
  const first = cells[0].label,
    last = cells[cells.length - 1].label;
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${w}" height="${HEIGHT}" viewBox="0 0 ${w} ${HEIGHT}" role="img" aria-label="${xmlEscape(`sizes ${first} to ${last}`)}">${parts.join('')}</svg>`;
}

export function legend(): string {
  const states: SizeState[] = ['verified', 'sampled', 'failed', 'unfinished'];
  return states
    .map((s) => `<span>${sizeBar([{ size: null, label: STATE_WORDS[s], state: s, cases: 0 }])} ${xmlEscape(STATE_WORDS[s])}</span>`)
    .join('');
}
