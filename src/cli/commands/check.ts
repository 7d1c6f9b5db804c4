// hunch check [PATH...]: run the conjectures, print the report, record coverage and counterexamples.

import { formatCount } from '../../base/format-count.js';
import type { Command } from 'commander';
import { availableParallelism } from 'node:os';
import { statSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { InputError } from '../../base/errors.js';
import { MAX_EXHAUSTIVE_SIZES } from '../../language/conjecture/compile-conjecture.js';
import '../../families/index.js';
import '../../library/index.js';
import { prepareRun, type RunRequest } from '../../runner/run-request.js';
import { agreesWithExpectation, type ConjectureResult } from '../../runner/result.js';
// The worker pool, shards and resumed runs.
import { startCheckRun, workerCount } from '../../runner/threaded-run.js';
import { heldRecordsForResume, shardFlag } from './shard-resume-flags.js';
import { checkedNothing, refuseNothingToCheck } from './check-nothing.js';
import { formatResult, formatSummary } from '../../reports/human.js';
import { resultDocument } from '../../reports/json.js';
import { ProgressLine } from '../../reports/progress.js';
import { EXIT, formatError } from '../errors.js';
import { collect, parseCount, parseDuration, parseRangeOption } from '../options.js';
import type { Terminal } from '../terminal.js';
import type { AddCommand } from './index.js';
import { createCheckRecorder, type CheckRecorder } from '../../records/check-recorder.js';
import { approvedPlugins, explainSkippedPlugins } from '../../records/open-project.js';
import { writeFileAtomic } from '../../records/atomic-write.js';
import { junitXml } from '../../reports/junit.js';
import { ALLOW_PLUGINS_HELP, openCommandProject } from '../project.js';

interface CheckFlags {
  sizes?: string[];
  exhaustive: boolean;
  sample?: string[];
  count?: string;
  seed?: string;
  budget?: string;
  workers?: string;
  shard?: string;
  json?: boolean;
  ledger: string | boolean;
  id?: string[];
  junit?: string;
  ascii?: boolean;
  resume?: boolean;
  allowPlugins?: boolean;
  counterexamples?: boolean;
}

export const addCheckCommand: AddCommand = (program: Command, t, setExit) => {
  program
    .command('check')
    .description('check conjecture files: small sizes exhaustively, larger ones at random')
    .argument('[paths...]', 'files or folders of conjectures (default: conjectures/)')
    .option('--sizes <NAME=A..B>', "replace a range binding's exhaustive range (repeatable)", collect)
    .option('--no-exhaustive', 'skip the exhaustive phase')
    .option('--sample <NAME=A..B>', 'replace a sample range (repeatable)', collect)
    .option('--count <K>', 'random cases per size (0 skips sampling)')
    .option('--seed <S>', 'the random seed (default: fixed, so runs repeat)')
    .option('--budget <TIME>', 'stop each conjecture after this long (30s, 5m, 2h)')
    .option('--workers <K>', 'worker threads (default: the number of cores)')
    .option('--shard <I/K>', 'check only slice I of K of every size (1-based), deterministically')
    .option('--resume', 'skip the sizes and slices the ledger already holds for the conjecture as it is now')
    .option('--json', 'print the result document instead of the report')
    .option('--ledger <PATH>', 'where coverage is recorded (default: hunch-ledger.jsonl in the project root)')
    .option('--no-ledger', 'record nothing (no ledger lines, no counterexample files unless --counterexamples)')
    .option('--counterexamples', 'write counterexample files even with --no-ledger')
    .option('--junit <FILE>', 'also write a JUnit XML report')
    .option('--id <ID>', 'only the conjecture with this id (repeatable)', collect)
    .option('--ascii', 'plain ASCII pictures')
    .option('--allow-plugins', ALLOW_PLUGINS_HELP)
    .action(async (paths: string[], flags: CheckFlags) => setExit(await runCheck(paths, flags, t)));
};

/** An exhaustive range of more sizes than a file may give is refused here too (it would exhaust memory). */
function limitSizes(r: [string, number, number]): [string, number, number] {
  if (r[2] - r[1] + 1 > MAX_EXHAUSTIVE_SIZES)
    throw new InputError(
      `--sizes ${r[0]}=${r[1]}..${r[2]} has ${formatCount(r[2] - r[1] + 1)} sizes; an exhaustive range may have at most ` +
        `${formatCount(MAX_EXHAUSTIVE_SIZES)}. Check large sizes with --sample instead`,
    );
  return r;
}

/** The most random cases per size a run may ask for (a slip of a few zeros would otherwise run for days). */
export const MAX_SAMPLE_COUNT = 10_000_000;

function limitCount(n: number): number {
  if (n > MAX_SAMPLE_COUNT)
    throw new InputError(
      `--count ${n.toLocaleString('en-US')} is more than the ${MAX_SAMPLE_COUNT.toLocaleString('en-US')} random cases per size a run may draw`,
    );
  return n;
}

/** An output file's folder must exist: a typo in a path is reported before the run, not after it. */
function refuseMissingFolder(file: string, option: string): void {
  const dir = dirname(resolve(file));
  let ok = false;
  try {
    ok = statSync(dir).isDirectory();
  } catch {
    ok = false;
  }
  if (!ok) throw new InputError(`${option} ${file}: the folder ${dir} does not exist`);
}

function buildRequest(paths: string[], f: CheckFlags): RunRequest {
  return {
    paths,
    ids: f.id ?? null,
    sizes: (f.sizes ?? []).map((s) => limitSizes(parseRangeOption(s, '--sizes'))),
    sampleRanges: (f.sample ?? []).map((s) => parseRangeOption(s, '--sample')),
    exhaustive: f.exhaustive,
    count: f.count === undefined ? null : limitCount(parseCount(f.count, '--count')),
    seed: f.seed ?? null,
    budgetMs: f.budget === undefined ? null : parseDuration(f.budget),
    root: null,
    regression: {},
  };
}

export async function runCheck(paths: string[], flags: CheckFlags, t: Terminal): Promise<number> {
  const req = buildRequest(paths, flags);
  // --workers K (default HUNCH_WORKERS, else every core), --shard I/K.
  let workers = workerCount(flags.workers === undefined ? undefined : parseCount(flags.workers, '--workers'));
  // More threads than cores only adds memory and switching: use every core, and say so.
  const cores = Math.max(1, availableParallelism());
  if (workers > cores) {
    t.err(
      `${t.color.yellow('note:')} --workers ${workers} is more than the ${cores} core${cores === 1 ? '' : 's'} of this machine; using ${cores}.\n`,
    );
    workers = cores;
  }
  req.shard = shardFlag(flags.shard);
  // The project (hunch.yaml, its plugins, the canonical hash) is opened in this thread and again in
  // the worker. Everything is loaded and validated here first: a bad file exits 2 before anything
  // is recorded.
  if (flags.junit !== undefined) refuseMissingFolder(flags.junit, '--junit');
  const project = await openCommandProject(t, req.paths[0], { allowPlugins: flags.allowPlugins, quiet: flags.json });
  req.root = project.root;
  req.plugins = approvedPlugins(project);
  if (req.paths.length === 0) req.paths = project.config.conjectures;
  let compiled;
  try {
    compiled = prepareRun(req);
  } catch (e) {
    throw explainSkippedPlugins(e, project);
  }
  refuseNothingToCheck(compiled, req, paths);
  // --no-ledger records nothing: no counterexample file either, unless asked for.
  const recorder: CheckRecorder = createCheckRecorder(project, compiled, {
    ledger: flags.ledger,
    counterexamples: flags.ledger !== false || flags.counterexamples === true,
  });
  req.regression = recorder.regressionCases(compiled);
  if (flags.resume) req.resume = heldRecordsForResume(flags.ledger, project.config.ledger, compiled);

  const started = performance.now();
  const style = { color: t.color, unicode: t.unicode };
  const progress = new ProgressLine(t.err, t.errIsTTY && !flags.json);
  const results: ConjectureResult[] = [];
  const flag = new Int32Array(new SharedArrayBuffer(4));
  let interrupts = 0;

  // One worker (--workers 1) or a pool sharing every size; either way off this thread.
  // A record that cannot be written (a full disk, a file size limit) stops the run: what was
  // recorded before stays, and the command ends with the reason (exit 2), never a crash.
  let recordFailure: unknown = null;
  const recording = <T>(f: () => T): T | null => {
    if (recordFailure) return null;
    try {
      return f();
    } catch (e) {
      recordFailure = e;
      Atomics.store(flag, 0, 1);
      return null;
    }
  };
  const run = startCheckRun(compiled, req, workers, flag, {
    onProgress: (done, total, label) => progress.update(done, total, label),
    onPiece: (id, piece) => void recording(() => recorder.piece(id, piece)),
    onResult: (r) => {
      results.push(r);
      const replay = recording(() => recorder.result(r));
      progress.clear();
      if (!flags.json) t.out(formatResult(r, style, replay));
    },
  });
  const onSigint = () => {
    interrupts++;
    Atomics.store(flag, 0, 1);
    if (interrupts === 1) {
      progress.clear();
      t.err('\nStopping after the current case; finished work is kept (Ctrl-C again to stop at once).\n');
    } else run.kill();
  };
  process.on('SIGINT', onSigint);
  process.on('SIGTERM', onSigint);

  const crash = await run.finished;
  process.off('SIGINT', onSigint);
  process.off('SIGTERM', onSigint);
  progress.clear();

  if (crash) {
    t.err(`${t.color.red('internal error:')} ${crash}\nThis is a bug in hunch; finished work was recorded.\n`);
    return EXIT.invalid;
  }
  if (recordFailure) {
    recorder.close();
    t.err(formatError(t, recordFailure));
    t.err('Stopped: the records above could not be written; what was recorded before is kept.\n');
    return EXIT.invalid;
  }
  const interrupted = interrupts > 0;
  if (flags.junit) writeFileAtomic(flags.junit, junitXml(results), { what: 'the JUnit report', makeFolder: false });
  for (const w of recorder.warnings) t.err(`${t.color.yellow('warning:')} ${w}\n`);
  recorder.close();
  if (flags.json) t.out(JSON.stringify(resultDocument(results), null, 2) + '\n');
  else {
    t.out(formatSummary(results, performance.now() - started, style));
    if (interrupted) {
      const left = compiled.length - results.length;
      t.out(
        t.color.yellow(
          `Interrupted${left ? `: ${left} conjecture${left === 1 ? '' : 's'} not started` : ''}; what was finished is recorded.\n`,
        ),
      );
    }
  }
  // A "holds" over no case at all (a family found empty only while running) is no pass.
  const nothing = results.filter(checkedNothing);
  for (const r of nothing)
    t.err(`${t.color.red('nothing checked:')} ${r.id} had no case at any size it was checked at; it is not counted as holding.\n`);
  if (interrupted) return EXIT.interrupted;
  if (nothing.length) return EXIT.contradicted;
  return results.every((r) => agreesWithExpectation(r) || (r.outcome === 'incomplete' && r.expect !== 'fails'))
    ? EXIT.ok
    : EXIT.contradicted;
}
