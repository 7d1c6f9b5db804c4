// The scripts `hunch slurm` writes: a job array with one shard per task, a merge job that runs after
// the whole array, a submit script tying the two together, and the same flow over ssh for a few
// machines without a scheduler. Every path inside them is absolute, so they run from anywhere.

export interface ClusterPlan {
  /** How to run hunch on the nodes (quoted shell words). */
  hunch: string;
  /** The folder the jobs run in (the project root). */
  workdir: string;
  /** The conjecture paths and extra `hunch check` options, as shell words. */
  checkArgs: string;
  /** Only the conjecture paths, as shell words. */
  paths: string;
  shards: number;
  /** Folder of the per-shard ledgers (absolute). */
  ledgerDir: string;
  /** The project ledger the merge writes into (absolute). */
  ledger: string;
  jobName: string;
  partition: string | null;
  time: string | null;
  cpus: number;
  /** Absolute paths of the files. */
  arrayScript: string;
  mergeScript: string;
  submitScript: string;
  sshScript: string;
}

/** One shell word: left as it is when it holds only safe characters, else single-quoted. */
export const q = (s: string) => (/^[A-Za-z0-9_@%+=:,./-]+$/.test(s) ? s : sq(s));
/** Always single-quoted: the shell expands nothing inside. */
export const sq = (s: string) => `'${s.replace(/'/g, `'\\''`)}'`;

function sbatchHeader(p: ClusterPlan, name: string, extra: string[]): string {
  const lines = ['#!/bin/bash', `#SBATCH --job-name=${name}`, `#SBATCH --chdir=${p.workdir}`];
  if (p.partition) lines.push(`#SBATCH --partition=${p.partition}`);
  if (p.time) lines.push(`#SBATCH --time=${p.time}`);
  lines.push(...extra);
  return lines.join('\n') + '\n';
}

export function arrayScript(p: ClusterPlan): string {
  return (
    sbatchHeader(p, p.jobName, [
      `#SBATCH --array=1-${p.shards}`,
      '#SBATCH --ntasks=1',
      `#SBATCH --cpus-per-task=${p.cpus}`,
      `#SBATCH --output=${p.ledgerDir}/slurm-%A_%a.out`,
    ]) +
    `# Task i of the array checks shard i/${p.shards} of every size and writes a ledger of its own.\n` +
    '# --resume: a task that was killed and resubmitted continues from the slices its ledger holds.\n' +
    'set -u\n' +
    `HUNCH=\${HUNCH:-${q(p.hunch)}}\n` +
    `i=$((SLURM_ARRAY_TASK_ID))\n` +
    `$HUNCH check ${p.checkArgs} --shard "$i/${p.shards}" --workers "\${SLURM_CPUS_PER_TASK:-${p.cpus}}" --resume \\\n` +
    `  --ledger ${q(p.ledgerDir)}/shard-$i.jsonl\n` +
    'code=$?\n' +
    '# 1 means a result contradicted its expectation (a counterexample): the shard did its work.\n' +
    '[ "$code" -le 1 ] && exit 0\n' +
    'exit "$code"\n'
  );
}

export function mergeScript(p: ClusterPlan): string {
  return (
    sbatchHeader(p, `${p.jobName}-merge`, [
      '#SBATCH --ntasks=1',
      '#SBATCH --cpus-per-task=1',
      `#SBATCH --output=${p.ledgerDir}/slurm-merge-%j.out`,
    ]) +
    `# Runs after every task of the array (afterany): merge the shard ledgers into the project ledger\n` +
    '# and report, per conjecture and size, whether the slices present cover the whole.\n' +
    `HUNCH=\${HUNCH:-${q(p.hunch)}}\n` +
    `$HUNCH merge ${q(p.ledgerDir)}/shard-*.jsonl -o ${q(p.ledger)}\n` +
    `$HUNCH status ${p.paths} --ledger ${q(p.ledger)}\n`
  );
}

export function submitScript(p: ClusterPlan): string {
  return (
    '#!/bin/sh\n' +
    `# Submit the ${p.shards}-task array, then the merge job that waits for all of it.\n` +
    'set -eu\n' +
    `mkdir -p ${q(p.ledgerDir)}\n` +
    `array=$(sbatch --parsable ${q(p.arrayScript)})\n` +
    'array=${array%%;*}\n' +
    `merge=$(sbatch --parsable --dependency=afterany:"$array" ${q(p.mergeScript)})\n` +
    'merge=${merge%%;*}\n' +
    'echo "array job $array, merge job $merge"\n'
  );
}

export function sshScript(p: ClusterPlan): string {
  return (
    '#!/bin/sh\n' +
    `# The same ${p.shards} shards on a few machines over ssh, with GNU parallel. Every host must see\n` +
    `# ${p.workdir} at the same path (a shared folder) and have node installed.\n` +
    '#   HOSTS="4/alice@box1,4/box2" sh this-script   (n/host: at most n shards at once on that host; ":" is this machine)\n' +
    'set -eu\n' +
    'HOSTS=${HOSTS:-:}\n' +
    `HUNCH=\${HUNCH:-${q(p.hunch)}}\n` +
    `cd ${q(p.workdir)}\n` +
    `mkdir -p ${q(p.ledgerDir)}\n` +
    // The command GNU parallel hands to the remote shell, quoted for that shell, then as a whole
    // single-quoted for this one: nothing in a path is expanded on either side.
    `seq 1 ${p.shards} | parallel --sshlogin "$HOSTS" --workdir ${q(p.workdir)} \\\n` +
    `  "$HUNCH "${sq(`check ${p.checkArgs} --shard {}/${p.shards} --workers ${p.cpus} --resume --ledger ${q(p.ledgerDir)}/shard-{}.jsonl; test $? -le 1`)} \\\n` +
    '  || echo "some shards failed; run this script again to resume them" >&2\n' +
    `$HUNCH merge ${q(p.ledgerDir)}/shard-*.jsonl -o ${q(p.ledger)}\n`
  );
}
