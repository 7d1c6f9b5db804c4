// hunch status [PATH...]: what the ledger says is verified for each conjecture as it stands now.

import '../../families/index.js';
import '../../library/index.js';
import { loadConjectures } from '../../language/conjecture/load-conjectures.js';
import { conjectureHash } from '../../language/conjecture/conjecture-hash.js';
import { readLedger } from '../../records/ledger.js';
import { ALLOW_PLUGINS_HELP, openCommandProject } from '../project.js';
import { pluginHashes } from '../../records/plugins.js';
import { computeStatus } from '../../records/status.js';
import { formatStatus } from '../../reports/status-table.js';
import { TOOL_VERSION } from '../../version.js';
import { EXIT } from '../errors.js';
import type { AddCommand } from './index.js';

interface StatusFlags {
  json?: boolean;
  ledger?: string;
  allowPlugins?: boolean;
}

export const addStatusCommand: AddCommand = (program, t, setExit) => {
  program
    .command('status')
    .description('show what the ledger says is verified for each conjecture, as a table')
    .argument('[paths...]', 'files or folders of conjectures (default: conjectures/)')
    .option('--json', 'print the status as JSON')
    .option('--ledger <PATH>', 'the ledger to read (default: hunch-ledger.jsonl in the project root)')
    .option('--allow-plugins', ALLOW_PLUGINS_HELP)
    .action(async (paths: string[], flags: StatusFlags) => {
      const project = await openCommandProject(t, paths[0], { allowPlugins: flags.allowPlugins });
      const specs = loadConjectures(paths.length ? paths : project.config.conjectures);
      const hashes = pluginHashes();
      const infos = specs.map((s) => ({ id: s.id, file: s.file, expect: s.expect, hash: conjectureHash(s, { pluginHashes: hashes }) }));
      const ledgerPath = flags.ledger ?? project.config.ledger;
      const ledger = readLedger(ledgerPath);
      const report = computeStatus(infos, ledger.records);
      if (flags.json) {
        for (const w of ledger.warnings) t.err(`${t.color.yellow('warning:')} ${w}\n`);
        t.out(
          JSON.stringify({ tool: 'hunch', version: TOOL_VERSION, ledger: ledgerPath, ...report, warnings: ledger.warnings }, null, 2) +
            '\n',
        );
      } else t.out(formatStatus(report, t.color, ledger.warnings));
      setExit(EXIT.ok);
    });
};
