// Reading a file given as input (a conjecture file, a counterexample file): only a regular file,
// and only up to a size limit, checked before anything is read, so that a FIFO, a device
// (/dev/zero) or a huge file is refused at once instead of blocking or filling memory.

import { closeSync, fstatSync, openSync, readFileSync, constants } from 'node:fs';
import { InputError } from './errors.js';

/** The largest input file read: far above any conjecture or counterexample file (a few KB). */
export const MAX_INPUT_BYTES = 16 * 1024 * 1024;

export function readInputFile(path: string, what: string, limit = MAX_INPUT_BYTES): string {
  let fd: number;
  try {
    // O_NONBLOCK: opening a FIFO must not wait for a writer.
    fd = openSync(path, constants.O_RDONLY | constants.O_NONBLOCK);
  } catch (e) {
    throw new InputError(`cannot read ${what} ${path}: ${(e as Error).message}`);
  }
  try {
    const st = fstatSync(fd);
    if (st.isDirectory()) throw new InputError(`cannot read ${what} ${path}: it is a folder`);
    if (!st.isFile()) throw new InputError(`refusing to read ${what} ${path}: it is not a regular file (a FIFO, device or socket)`);
    if (st.size > limit)
      throw new InputError(
        `refusing to read ${what} ${path}: it has ${st.size.toLocaleString('en-US')} bytes, more than the ${limit.toLocaleString('en-US')} an input may have`,
      );
    return readFileSync(fd, 'utf8');
  } finally {
    closeSync(fd);
  }
}
