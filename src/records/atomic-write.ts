// Writing a whole file so that readers see the old content or the new, never half of it: write a
// temporary file in the same folder, flush it, then rename it over the target.

import { closeSync, fsyncSync, mkdirSync, openSync, renameSync, rmSync, writeSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { randomBytes } from 'node:crypto';
import { InputError } from '../base/errors.js';

export function writeFileAtomic(path: string, content: string): void {
  const dir = dirname(path);
  const tmp = join(dir, `.${basename(path)}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`);
  try {
    mkdirSync(dir, { recursive: true });
    const fd = openSync(tmp, 'wx');
    try {
      writeSync(fd, content);
      fsyncSync(fd);
    } finally {
      closeSync(fd);
    }
    renameSync(tmp, path);
  } catch (e) {
    rmSync(tmp, { force: true });
    throw new InputError(`cannot write ${path}: ${(e as Error).message}`);
  }
}
