// hunch replay FILE: re-evaluate a counterexample file from the file alone.
// Exit 0 it still refutes its conjecture, 1 it no longer does, 2 the file cannot be read (or needs
// plugins this project does not have).

import { dirname } from 'node:path';
import '../../families/index.js';
import '../../library/index.js';
import { decodeValue } from '../../values/decode.js';
import { valueToText } from '../../values/operations.js';
import { openCommandProject } from '../project.js';
import { replayCounterexample } from '../../records/replay.js';
import { EXIT } from '../errors.js';
import { witnessLines } from '../../reports/witnesses.js';
import { parseDuration } from '../options.js';
import type { AddCommand } from './index.js';

function text(x: unknown): string {
  try {
    return valueToText(decodeValue(x));
  } catch {
    return JSON.stringify(x);
  }
}

export const addReplayCommand: AddCommand = (program, t, setExit) => {
  program
    .command('replay')
    .description('re-evaluate a counterexample file: exit 0 if it still refutes its conjecture, 1 if not')
    .argument('<file>', 'a counterexample file (counterexamples/<id>.yaml)')
    .option('--json', 'print the replay as JSON')
    .option('--budget <TIME>', 'stop evaluating after this long (default 5m)')
    .option('--allow-plugins', "load the local project's plugins (replay never runs code otherwise)")
    .action(async (file: string, flags: { json?: boolean; allowPlugins?: boolean; budget?: string }) => {
      const c = t.color;
      // The local project: the one holding the file, else the current folder's. Only its own
      // hunch.yaml can bring plugins in.
      const project = await openCommandProject(t, dirname(file), { plugins: false, allowPlugins: flags.allowPlugins, quiet: true });
      const budgetMs = flags.budget === undefined ? undefined : parseDuration(flags.budget);
      // The evaluation runs on this thread: Ctrl-C ends the process at once (nothing is written).
      const r = replayCounterexample(file, project, { budgetMs });
      const code =
        r.verdict === 'stopped'
          ? EXIT.interrupted
          : r.verdict === 'refutes'
            ? EXIT.ok
            : r.verdict === 'needs-plugins' || r.verdict === 'not-a-case'
              ? EXIT.invalid
              : EXIT.contradicted;
      if (flags.json) {
        t.out(JSON.stringify({ ...r, file: undefined, conjecture: r.file.conjecture, hash: r.file.hash }, null, 2) + '\n');
        setExit(code);
        return;
      }
      const id = c.bold(r.file.conjecture);
      if (r.verdict === 'needs-plugins') {
        t.err(
          `${c.red('error:')} ${file} uses functions from plugins this project does not load, so it was not run:\n` +
            r.missingPlugins.map((p) => `    ${p.file} (sha256 ${p.sha256.slice(0, 12)}…): ${p.functions.join(', ')}\n`).join('') +
            (project.skipped
              ? `The project's plugins (${project.skipped.files.join(', ')}) were not loaded: replay runs no code unless given --allow-plugins.\n` +
                'If you trust them, replay again with --allow-plugins.\n'
              : 'Plugins are code and are loaded only from your own hunch.yaml: if you trust them, get the plugin files from\n' +
                'whoever sent this file, list them under "plugins:" in hunch.yaml, and replay with --allow-plugins.\n'),
        );
        setExit(code);
        return;
      }
      for (const p of r.changedPlugins)
        t.err(
          `${c.yellow('warning:')} the plugin providing ${p.functions.join(', ')} differs from the one the case was found with (${p.file}).\n`,
        );
      if (!r.embeddedHashMatches)
        t.err(
          `${c.yellow('warning:')} the conjecture inside ${file} was edited after the file was written (its hash no longer matches); replaying it as it is now.\n`,
        );
      if (r.local)
        t.err(
          `${c.yellow('note:')} ${r.file.conjecture} in ${r.local.file} has changed since this counterexample was found, so it is replayed against the conjecture as written in the file. What changed:\n` +
            r.local.differences.map((d) => `    ${d}\n`).join(''),
        );
      const caseText = Object.entries(r.bindings)
        .map(([k, v]) => `    ${k} = ${v}`)
        .join('\n');
      switch (r.verdict) {
        case 'refutes':
          t.out(`${c.green('still refutes')} ${id}\n${caseText}\n`);
          for (const [k, v] of Object.entries(r.values)) t.out(`    ${c.cyan(k)} = ${text(v)}\n`);
          if (r.sides) t.out(`    the two sides: ${text(r.sides[0])} and ${text(r.sides[1])}\n`);
          for (const l of witnessLines(r.witnesses, t)) t.out(`    ${l}\n`);
          break;
        case 'holds':
          t.out(`${c.red('no longer refutes')} ${id}: the claim holds for this case\n${caseText}\n`);
          break;
        case 'stopped':
          t.err(
            `${c.yellow('stopped:')} ${file}: ${r.error === 'budget' ? 'the budget was reached' : 'interrupted'} before the case was evaluated; nothing is known yet (give more time with --budget)\n`,
          );
          break;
        case 'not-a-case':
          t.err(`${c.red('error:')} ${file}: not a case of this conjecture (${r.error}), so it refutes nothing\n${caseText}\n`);
          break;
        case 'error':
          t.out(`${c.red('no longer refutes')} ${id}: the case cannot be evaluated: ${r.error}\n${caseText}\n`);
          break;
      }
      setExit(code);
    });
};
