// hunch report [PATH...]: one self-contained HTML page of the notebook's state.

import '../../families/index.js';
import '../../library/index.js';
import { writeFileAtomic } from '../../records/atomic-write.js';
import { ALLOW_PLUGINS_HELP, openCommandProject } from '../project.js';
import { loadNotebook } from '../../reports/export/load-notebook.js';
import { reportPage } from '../../reports/html/report-page.js';
import { EXIT } from '../errors.js';
import type { AddCommand } from './index.js';

export const addReportCommand: AddCommand = (program, t, setExit) => {
  program
    .command('report')
    .description('one self-contained HTML page of the notebook: outcomes, verified and sampled ranges, counterexamples drawn')
    .argument('[paths...]', "files or folders of conjectures (default: the project's conjectures)")
    .option('-o, --output <FILE>', 'write the page to this file (default: standard output)')
    .option('--allow-plugins', ALLOW_PLUGINS_HELP)
    .option('--ledger <PATH>', "the ledger to read (default: the project's)")
    .option('--title <TEXT>', 'the page\'s title (default: "Notebook" and the project folder\'s name)')
    .action(async (paths: string[], flags: { output?: string; ledger?: string; title?: string; allowPlugins?: boolean }) => {
      const project = await openCommandProject(t, paths[0], { allowPlugins: flags.allowPlugins });
      const { model, warnings } = loadNotebook(project, paths, { ledger: flags.ledger, title: flags.title });
      for (const w of warnings) t.err(`${t.color.yellow('warning:')} ${w}\n`);
      const page = reportPage(model);
      if (flags.output) {
        writeFileAtomic(flags.output, page);
        t.err(
          `wrote ${flags.output}: ${model.entries.length} conjectures, ${model.entries.filter((e) => e.counterexample).length} counterexamples\n`,
        );
      } else t.out(page);
      setExit(EXIT.ok);
    });
};
