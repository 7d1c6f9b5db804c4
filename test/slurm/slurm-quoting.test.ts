// The scripts `hunch slurm` writes quote every path: a project folder named `p$(touch X)` (or with
// quotes and spaces) runs nothing when the scripts run. GNU parallel and sbatch are replaced by
// stubs that do what they do with a command: hand it to a shell.

import { spawnSync } from 'node:child_process';
import { chmodSync, copyFileSync, existsSync, mkdirSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ROOT, runCli, tempDir } from '../cli/run-cli.js';

// parallel --sshlogin H --workdir D COMMAND < args: for each line i, COMMAND with {} = i, run by a shell in D.
const PARALLEL_STUB = `#!/bin/sh
while [ $# -gt 0 ]; do
  case "$1" in --sshlogin|--workdir) [ "$1" = --workdir ] && wd="$2"; shift 2 ;; *) cmd="$1"; shift ;; esac
done
status=0
while read -r i; do
  c=$(printf '%s' "$cmd" | sed "s/{}/$i/g")
  (cd "$wd" && sh -c "$c") || status=1
done
exit $status
`;

describe('hunch slurm quotes every path', { timeout: 180_000 }, () => {
  for (const name of ['p$(touch X)', "it's `touch X` here"]) {
    it(`a project folder named ${name} runs nothing it should not`, () => {
      const parent = tempDir('hunch-slurm-q-');
      try {
        const dir = join(parent, name);
        mkdirSync(dir);
        writeFileSync(join(dir, 'hunch.yaml'), '');
        copyFileSync(join(ROOT, 'test/slurm/permutations.yaml'), join(dir, 'perms.yaml'));
        const r = runCli(['slurm', 'perms.yaml', '--shards', '2', '--sizes', 'n=1..4', '--count', '0'], { cwd: dir });
        expect(r.code, r.stderr).toBe(0);
        const bin = join(parent, 'stubs');
        mkdirSync(bin);
        writeFileSync(join(bin, 'parallel'), PARALLEL_STUB);
        chmodSync(join(bin, 'parallel'), 0o755);
        const env = { ...process.env, PATH: `${bin}:${process.env.PATH}`, NO_COLOR: '1', HOSTS: ':' };

        // The ssh flow, from the parent folder.
        const ssh = spawnSync('sh', [join(dir, 'hunch-slurm-ssh.sh')], { cwd: parent, env, encoding: 'utf8' });
        expect(ssh.status, ssh.stderr).toBe(0);
        // One array task and the merge job, run by bash as sbatch would.
        const task = spawnSync('bash', [join(dir, 'hunch-slurm.sbatch')], {
          cwd: dir,
          env: { ...env, SLURM_ARRAY_TASK_ID: '1' },
          encoding: 'utf8',
        });
        expect(task.status, task.stderr).toBe(0);
        const merge = spawnSync('bash', [join(dir, 'hunch-slurm-merge.sbatch')], { cwd: dir, env, encoding: 'utf8' });
        expect(merge.status, merge.stderr).toBe(0);

        for (const where of [parent, dir, join(dir, 'ledgers'), ROOT]) expect(existsSync(join(where, 'X')), `X in ${where}`).toBe(false);
        expect(
          readdirSync(join(dir, 'ledgers'))
            .filter((f) => f.endsWith('.jsonl'))
            .sort(),
        ).toEqual(['shard-1.jsonl', 'shard-2.jsonl']);
        expect(existsSync(join(dir, 'hunch-ledger.jsonl'))).toBe(true);
      } finally {
        rmSync(parent, { recursive: true, force: true });
      }
    });
  }

  it('refuses a path with a newline (it would start a command in the script)', () => {
    const parent = tempDir('hunch-slurm-nl-');
    try {
      const dir = join(parent, 'a\ntouch X');
      mkdirSync(dir);
      writeFileSync(join(dir, 'hunch.yaml'), '');
      copyFileSync(join(ROOT, 'test/slurm/permutations.yaml'), join(dir, 'perms.yaml'));
      const r = runCli(['slurm', 'perms.yaml', '--shards', '2'], { cwd: dir });
      expect(r.code).toBe(2);
      expect(r.stderr).toContain('cannot be written into a job script safely');
      expect(existsSync(join(dir, 'hunch-slurm.sbatch'))).toBe(false);
    } finally {
      rmSync(parent, { recursive: true, force: true });
    }
  });
});
