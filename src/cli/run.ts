// The program's entry point (bin/hunch imports this): run the command line and set the exit code.

import { EXIT, formatError } from './errors.js';
import { main } from './main.js';
import { makeTerminal } from './terminal.js';

// Beyond a file size limit (ulimit -f) a write then fails with a message instead of killing the process.
process.on('SIGXFSZ', () => {});

main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (e) => {
    process.stderr.write(formatError(makeTerminal(), e));
    process.exitCode = EXIT.invalid;
  },
);
