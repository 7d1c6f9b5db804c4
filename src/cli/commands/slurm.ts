// hunch slurm PATH... --shards K: write the scripts that check conjectures as a Slurm job array (one
// shard per task, a ledger per shard, a merge job after the array), and the same flow for a few
// machines over ssh. Nothing is submitted: the command prints how.

import { mkdirSync, writeFileSync, chmodSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { InputError } from '../../base/errors.js';
import { openProject } from '../../records/open-project.js';
import { EXIT } from '../errors.js';
import { collect, parseCount, parseRangeOption } from '../options.js';
import type { AddCommand } from './index.js';
import { arrayScript, mergeScript, q, sshScript, submitScript, type ClusterPlan } from './slurm-scripts.js';

interface SlurmFlags {
  shards: string;
  partition?: string;
  time?: string;
  cpus?: string;
  output?: string;
  ledger?: string;
  id?: string[];
  sizes?: string[];
  sample?: string[];
  count?: string;
  seed?: string;
  exhaustive: boolean;
  name?: string;
}

/** How this very installation of hunch is started, for the job scripts (node and bin/hunch, absolute). */
function hunchCommand(): string {
  const bin = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..', '..', 'bin', 'hunch');
  return `${process.execPath} ${bin}`;
}

const TIME = /^(\d+-)?\d{1,2}(:\d{2}){0,2}$|^\d+$/;

export const addSlurmCommand: AddCommand = (program, t, setExit) => {
  program
    .command('slurm')
    .description('write a Slurm job array that checks conjectures in K shards and merges their ledgers (and the same over ssh)')
    .argument('[paths...]', "files or folders of conjectures (default: the project's conjectures/)")
    .requiredOption('--shards <K>', 'number of shards (array tasks)')
    .option('--partition <P>', 'the Slurm partition')
    .option('--time <T>', 'time limit of each task (Slurm syntax: 30, 2:00:00, 1-00:00:00)')
    .option('--cpus <C>', 'cores per task; each task runs that many worker threads', '1')
    .option('-o, --output <FILE>', 'the array script to write (the other scripts go beside it)', 'hunch-slurm.sbatch')
    .option('--ledger <PATH>', "the project ledger the merge writes into (default: the project's)")
    .option('--name <NAME>', 'the job name', 'hunch')
    .option('--id <ID>', 'only the conjecture with this id (repeatable)', collect)
    .option('--sizes <NAME=A..B>', 'passed to hunch check (repeatable)', collect)
    .option('--sample <NAME=A..B>', 'passed to hunch check (repeatable)', collect)
    .option('--count <K>', 'passed to hunch check')
    .option('--seed <S>', 'passed to hunch check')
    .option('--no-exhaustive', 'passed to hunch check')
    .action(async (paths: string[], f: SlurmFlags) => {
      const shards = parseCount(f.shards, '--shards');
      if (shards < 1) throw new InputError(`--shards must be at least 1, got ${f.shards}`);
      const cpus = parseCount(f.cpus ?? '1', '--cpus');
      if (cpus < 1) throw new InputError(`--cpus must be at least 1, got ${f.cpus}`);
      if (f.time !== undefined && !TIME.test(f.time))
        throw new InputError(`--time must be a Slurm time such as 30, 2:00:00 or 1-00:00:00, got ${f.time}`);
      if (f.name !== undefined && !/^[A-Za-z0-9_.-]+$/.test(f.name))
        throw new InputError(`--name may use letters, digits, "_", "." and "-", got ${f.name}`);
      for (const s of f.sizes ?? []) parseRangeOption(s, '--sizes');
      for (const s of f.sample ?? []) parseRangeOption(s, '--sample');
      if (f.count !== undefined) parseCount(f.count, '--count');

      const project = await openProject(paths[0], { plugins: false }); // only the root and config are needed
      const absPaths = paths.length ? paths.map((p) => resolve(p)) : project.config.conjectures;
      const opts: string[] = [];
      for (const id of f.id ?? []) opts.push('--id', q(id));
      for (const s of f.sizes ?? []) opts.push('--sizes', q(s));
      for (const s of f.sample ?? []) opts.push('--sample', q(s));
      if (f.count !== undefined) opts.push('--count', q(f.count));
      if (f.seed !== undefined) opts.push('--seed', q(f.seed));
      if (f.exhaustive === false) opts.push('--no-exhaustive');
      const arrayPath = resolve(f.output ?? 'hunch-slurm.sbatch');
      const stem = join(dirname(arrayPath), basename(arrayPath).replace(/\.(sbatch|sh)$/, ''));
      const pathWords = absPaths.map(q).join(' ');
      const plan: ClusterPlan = {
        hunch: hunchCommand(),
        workdir: project.root,
        paths: pathWords,
        checkArgs: [pathWords, ...opts].join(' '),
        shards,
        ledgerDir: join(project.root, 'ledgers'),
        ledger: f.ledger ? resolve(f.ledger) : project.config.ledger,
        jobName: f.name ?? 'hunch',
        partition: f.partition ?? null,
        time: f.time ?? null,
        cpus,
        arrayScript: arrayPath,
        mergeScript: `${stem}-merge.sbatch`,
        submitScript: `${stem}-submit.sh`,
        sshScript: `${stem}-ssh.sh`,
      };
      // A newline or control byte in a path would end a line of the script and start a command.
      for (const s of [plan.hunch, plan.workdir, plan.ledgerDir, plan.ledger, plan.arrayScript, ...absPaths])
        if (/[\u0000-\u001f\u007f]/.test(s))
          throw new InputError(
            `the path ${JSON.stringify(s)} holds a newline or control character and cannot be written into a job script safely; rename it`,
          );
      mkdirSync(dirname(arrayPath), { recursive: true });
      const files: Array<[string, string]> = [
        [plan.arrayScript, arrayScript(plan)],
        [plan.mergeScript, mergeScript(plan)],
        [plan.submitScript, submitScript(plan)],
        [plan.sshScript, sshScript(plan)],
      ];
      for (const [path, text] of files) {
        writeFileSync(path, text);
        chmodSync(path, 0o755);
      }
      t.out(
        `Wrote ${files.map(([p]) => p).join(', ')}.\n\n` +
          `On the cluster:   sh ${q(plan.submitScript)}\n` +
          `  submits the array of ${shards} shard${shards === 1 ? '' : 's'} (ledgers in ${plan.ledgerDir}/) and a merge job after it\n` +
          `  (--dependency=afterany) that writes ${plan.ledger}. A killed task can be resubmitted: it resumes.\n` +
          `On a few machines over ssh (GNU parallel):   HOSTS=box1,box2 sh ${q(plan.sshScript)}\n` +
          `Then:   hunch status --ledger ${q(plan.ledger)}\n`,
      );
      setExit(EXIT.ok);
    });
};
