// A checked copy of the bundled notebook in a temporary folder (ledger and counterexample files
// written by a real `hunch check`), for the export and report tests. Removed by `dispose`.

import { cpSync, readdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { ROOT, runCli, tempDir } from '../cli/run-cli.js';

export interface CheckedNotebook {
  dir: string;
  counterexamples: string[];
  dispose: () => void;
}

export function checkedNotebook(): CheckedNotebook {
  const dir = tempDir('hunch-export-');
  cpSync(join(ROOT, 'conjectures'), join(dir, 'conjectures'), { recursive: true });
  cpSync(join(ROOT, 'hunch.yaml'), join(dir, 'hunch.yaml'));
  const r = runCli(['check', '--allow-plugins'], { cwd: dir, timeout: 180_000 });
  if (r.code !== 0) throw new Error(`checking the notebook copy failed (exit ${r.code}):\n${r.stderr}\n${r.stdout.slice(-2000)}`);
  const counterexamples = readdirSync(join(dir, 'counterexamples'))
    .filter((f) => f.endsWith('.yaml'))
    .sort();
  return { dir, counterexamples, dispose: () => rmSync(dir, { recursive: true, force: true }) };
}

/** Whether a command is on the PATH. */
export function onPath(cmd: string): boolean {
  return (process.env.PATH ?? '').split(':').some((d) => {
    try {
      return readdirSync(d).includes(cmd);
    } catch {
      return false;
    }
  });
}
