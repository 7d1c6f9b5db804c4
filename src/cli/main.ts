// The command line: a thin shell over the library. Each command lives in src/cli/commands/ and
// returns its exit code; everything a user can get wrong ends here as a message and exit code 2.

import { Command, CommanderError } from 'commander';
import { InputError } from '../base/errors.js';
import { TOOL_VERSION } from '../version.js';
import { EXIT, ExitRequest, formatError } from './errors.js';
import { makeTerminal } from './terminal.js';
import { commands } from './commands/index.js';

export async function main(argv: string[]): Promise<number> {
  const t = makeTerminal({ ascii: argv.includes('--ascii') });
  const program = new Command('hunch')
    .description(
      'Check conjectures in algebraic combinatorics: every small case exhaustively, large ones at random, with the smallest counterexample and a ledger of what was checked.',
    )
    .version(TOOL_VERSION, '--version', 'print the version')
    .exitOverride()
    .configureOutput({
      writeOut: (s) => t.out(s),
      writeErr: (s) => t.err(s),
      outputError: (s, write) => write(`${t.color.red('error:')} ${s.replace(/^error: /, '')}`),
    })
    .showSuggestionAfterError(true);
  let code: number = EXIT.ok;
  for (const add of commands) add(program, t, (c) => (code = c));
  try {
    await program.parseAsync(argv, { from: 'user' });
    return code;
  } catch (e) {
    if (e instanceof CommanderError) {
      if (e.code === 'commander.helpDisplayed' || e.code === 'commander.version' || e.code === 'commander.help') return EXIT.ok;
      return EXIT.invalid;
    }
    if (e instanceof ExitRequest) return e.code;
    t.err(formatError(t, e));
    return e instanceof InputError ? EXIT.invalid : EXIT.invalid;
  }
}
