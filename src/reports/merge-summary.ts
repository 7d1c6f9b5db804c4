// What `hunch merge` prints: the ledgers merged, their record counts and duplicates, and per
// conjecture version and size whether the slices present make the size whole (src/records/merge.ts
// decides; this only presents it).

import type { ChalkInstance } from 'chalk';
import { formatCount } from '../base/format-count.js';
import type { MergeResult } from '../records/merge.js';

type Styler = Pick<ChalkInstance, 'bold' | 'red' | 'green' | 'yellow' | 'dim'>;

export function formatMerge(m: MergeResult, out: string | null, color: Styler): string {
  let s = '';
  for (const w of m.warnings) s += `${color.yellow('warning:')} ${w}\n`;
  s += `Merged ${m.inputs.length} ledger${m.inputs.length === 1 ? '' : 's'} (${m.inputs.map((i) => `${i.path}: ${formatCount(i.records)}`).join(', ')}): `;
  s += `${formatCount(m.records.length)} records, ${formatCount(m.duplicates)} exact duplicate${m.duplicates === 1 ? '' : 's'} removed`;
  s += out ? `, written to ${out}.\n` : ' (nothing written: give -o FILE).\n';
  const multi = new Map<string, number>();
  for (const v of m.coverage) multi.set(v.id, (multi.get(v.id) ?? 0) + 1);
  for (const v of m.coverage) {
    s += `\n${color.bold(v.id)}${(multi.get(v.id) ?? 0) > 1 ? color.dim(` (version ${v.hash.slice(0, 12)})`) : ''}\n`;
    for (const z of v.sizes) {
      const label =
        Object.entries(z.size)
          .map(([k, x]) => `${k} = ${x}`)
          .join(', ') || 'the whole';
      if (z.complete)
        s += `  ${color.green('complete')}  ${label}: ${formatCount(z.cases)} cases${z.slices ? ` from ${z.slices} slices` : ''}\n`;
      else if (z.of === 0) s += `  ${color.red('missing ')}  ${label}: only pieces stopped before their end are present\n`;
      else
        s += `  ${color.red('missing ')}  ${label}: slices ${z.missing!.join(', ')} of ${z.of} are missing (${formatCount(z.cases)} cases present)\n`;
    }
  }
  return s;
}
