// Running the built command line (dist/, made by `npm test`'s tsc step) as a user would.

import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll } from 'vitest';

export const ROOT = resolve(__dirname, '../..');
export const BIN = join(ROOT, 'bin', 'hunch');

export interface CliResult {
  code: number | null;
  stdout: string;
  stderr: string;
}

// The per-user allow list of trusted projects (hunch trust) lives in a temporary folder for the
// tests, never in the real home; it is removed when the test process exits.
export const TEST_CONFIG_DIR = mkdtempSync(join(tmpdir(), 'hunch-config-'));
process.env.HUNCH_CONFIG_DIR = TEST_CONFIG_DIR; // in-process code of the tests too
const removeConfigDir = () => rmSync(TEST_CONFIG_DIR, { recursive: true, force: true });
// Each test file evaluates this module anew; its folder goes when the file ends (worker threads
// are not always given an exit event).
afterAll(removeConfigDir);
process.on('exit', removeConfigDir);

export function runCli(args: string[], opts: { cwd?: string; env?: Record<string, string>; timeout?: number } = {}): CliResult {
  const r = spawnSync(process.execPath, [BIN, ...args], {
    cwd: opts.cwd ?? ROOT,
    encoding: 'utf8',
    env: { ...process.env, NO_COLOR: '1', HUNCH_CONFIG_DIR: TEST_CONFIG_DIR, ...opts.env },
    // Generous: on a loaded machine one run can take a minute or more; a timeout ends it with SIGTERM.
    timeout: opts.timeout ?? 240_000,
  });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

export { tempDir } from '../helpers/temp-dirs.js';
