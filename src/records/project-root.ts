// The project a command works in: the nearest folder upward holding hunch.yaml, else the current
// folder. The ledger and counterexamples/ live at its root.

import { existsSync, statSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';

export const CONFIG_FILE = 'hunch.yaml';
export const DEFAULT_LEDGER = 'hunch-ledger.jsonl';
export const COUNTEREXAMPLE_DIR = 'counterexamples';

function isDir(p: string): boolean {
  try {
    return statSync(p).isDirectory();
  } catch {
    return false;
  }
}

/** The nearest folder at or above `start` (a file or folder) that holds hunch.yaml, else the current folder. */
export function findProjectRoot(start: string = process.cwd()): string {
  let dir = resolve(start);
  if (!isDir(dir)) dir = dirname(dir);
  for (;;) {
    if (existsSync(join(dir, CONFIG_FILE))) return dir;
    const up = dirname(dir);
    if (up === dir) return process.cwd();
    dir = up;
  }
}

/** The project root for a command given conjecture paths: the root of the first path, else of the current folder. */
export function projectRootFor(paths: readonly string[]): string {
  return findProjectRoot(paths[0] ?? process.cwd());
}
