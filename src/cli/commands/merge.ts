// hunch merge LEDGER... [-o OUT]: combine ledgers from shards or coauthors, checking coverage.

import { InputError } from '../../base/errors.js';
import { mergeLedgers } from '../../records/merge.js';
import { formatMerge } from '../../reports/merge-summary.js';
import { EXIT } from '../errors.js';
import type { AddCommand } from './index.js';

export const addMergeCommand: AddCommand = (program, t, setExit) => {
  program
    .command('merge')
    .description('merge ledgers from shards or coauthors into one, checking that the slices cover each size')
    .argument('<ledgers...>', 'ledger files to merge')
    .option('-o, --output <OUT>', 'write the merged ledger here (records already in it are kept)')
    .option('--json', 'print the coverage report as JSON')
    .action((ledgers: string[], flags: { output?: string; json?: boolean }) => {
      if (ledgers.length === 0) throw new InputError('hunch merge needs at least one ledger file');
      const out = flags.output ?? null;
      const m = mergeLedgers(ledgers, out);
      if (flags.json) {
        for (const w of m.warnings) t.err(`${t.color.yellow('warning:')} ${w}\n`);
        const { records, ...rest } = m;
        t.out(JSON.stringify({ ...rest, records: records.length, output: out }, null, 2) + '\n');
      } else t.out(formatMerge(m, out, t.color));
      setExit(EXIT.ok);
    });
};
