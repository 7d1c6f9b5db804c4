// Temporary folders for tests, removed when the test file is done (and, as a fallback, when its
// process exits), so a run of the suite leaves nothing behind in the system's temporary folder.

import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll } from 'vitest';

const made: string[] = [];

function removeAll(): void {
  for (const d of made.splice(0)) rmSync(d, { recursive: true, force: true });
}

// This module is imported while a test file is being collected: its folders go when that file ends.
afterAll(removeAll);
process.on('exit', removeAll);

/** A new empty folder under the system's temporary folder, removed after the test file. */
export function tempDir(prefix = 'hunch-test-'): string {
  const d = mkdtempSync(join(tmpdir(), prefix));
  made.push(d);
  return d;
}
