// Writing a whole file so that readers see the old content or the new, never half of it. The
// well-kept write-file-atomic does the work (a temporary file in the same folder, flushed, renamed
// over the target, and removed again if the process is killed mid-write); this wrapper makes the
// folder and turns a failure into a clear message.

import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import writeFileAtomicLib from 'write-file-atomic';
import { InputError } from '../base/errors.js';

export function writeFileAtomic(path: string, content: string): void {
  try {
    mkdirSync(dirname(path), { recursive: true });
    writeFileAtomicLib.sync(path, content, { encoding: 'utf8', fsync: true });
  } catch (e) {
    throw new InputError(`cannot write ${path}: ${(e as Error).message}`);
  }
}
