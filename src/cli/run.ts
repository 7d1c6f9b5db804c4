// The program's entry point (bin/hunch imports this): run the command line and set the exit code.

import { EXIT, formatError } from './errors.js';
import { main } from './main.js';
import { makeTerminal } from './terminal.js';

main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (e) => {
    process.stderr.write(formatError(makeTerminal(), e));
    process.exitCode = EXIT.invalid;
  },
);
