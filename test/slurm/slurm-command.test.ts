// `hunch slurm` writes an array script, a merge job, a submit script and an ssh variant; they are
// valid shell, and name the shards, the ledgers and the dependency. (.ci/slurm-test.sh runs them on
// a real single-node cluster.)

import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { copyFileSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { ROOT, runCli, tempDir } from '../cli/run-cli.js';

describe('hunch slurm', () => {
  it('writes the job array, the merge job after it, and the ssh flow', () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'hunch.yaml'), '');
    copyFileSync(join(ROOT, 'test/slurm/permutations.yaml'), join(dir, 'perms.yaml'));
    const r = runCli(
      ['slurm', 'perms.yaml', '--shards', '6', '--cpus', '4', '--partition', 'short', '--time', '1:00:00', '-o', 'jobs/x.sbatch'],
      { cwd: dir },
    );
    expect(r.code, r.stderr).toBe(0);
    const array = readFileSync(join(dir, 'jobs/x.sbatch'), 'utf8');
    expect(array).toContain('#SBATCH --array=1-6');
    expect(array).toContain('#SBATCH --partition=short');
    expect(array).toContain('#SBATCH --time=1:00:00');
    expect(array).toContain('#SBATCH --cpus-per-task=4');
    expect(array).toContain('--shard "$i/6"');
    expect(array).toContain(`--ledger ${join(dir, 'ledgers')}/shard-$i.jsonl`);
    const submit = readFileSync(join(dir, 'jobs/x-submit.sh'), 'utf8');
    expect(submit).toContain('--dependency=afterany:"$array"');
    expect(readFileSync(join(dir, 'jobs/x-merge.sbatch'), 'utf8')).toContain(
      `merge ${join(dir, 'ledgers')}/shard-*.jsonl -o ${join(dir, 'hunch-ledger.jsonl')}`,
    );
    expect(readFileSync(join(dir, 'jobs/x-ssh.sh'), 'utf8')).toContain('parallel --sshlogin "$HOSTS"');
    for (const f of ['x.sbatch', 'x-merge.sbatch', 'x-submit.sh', 'x-ssh.sh']) {
      expect(spawnSync('bash', ['-n', join(dir, 'jobs', f)]).status).toBe(0);
    }
  });

  it('refuses bad options with exit 2', () => {
    const dir = tempDir();
    expect(runCli(['slurm', '--shards', '0'], { cwd: dir }).code).toBe(2);
    expect(runCli(['slurm', '--shards', '3', '--time', 'soon'], { cwd: dir }).code).toBe(2);
  });
});
