// Benchmarks of the worker pool and shards, in one run (after `npm run build`): node test/bench/parallel.mjs
// 1. Parallel efficiency: `hunch check` of inv(w) == inv(inverse(w)) over S_1..S_10 with 2 workers
//    against 1 worker (the conjecture's own time from --json, so process start-up is left out);
//    target at most 0.6 on 2 cores.
// 2. Overhead of sharding: the sum of the 4 shards' times (each a separate process, 1 worker)
//    against the unsharded run; target within 10%.
// 3. Memory stays flat: peak resident memory of a whole check of S_1..S_11 against S_1..S_9
//    (a child process each, 2 workers, reading its own maximum resident set); target within 1.5x.
// Only the ratios are meaningful; absolute times vary with the machine and nothing here gates CI.

import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir, availableParallelism } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const ROOT = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
const BIN = join(ROOT, 'bin', 'hunch');

const conjecture = (maxN) => `conjecture: inverse-keeps-inversions-${maxN}
for:
  n: 1..${maxN}
  w: permutations(n)
claim: inv(w) == inv(inverse(w))
`;

if (process.argv[2] === '--child') {
  // Child mode: check S_1..S_N through the worker pool in this process, then print the peak RSS.
  const N = Number(process.argv[3]);
  await import('../../dist/families/index.js');
  await import('../../dist/library/index.js');
  const { prepareRun } = await import('../../dist/runner/run-request.js');
  const { startCheckRun } = await import('../../dist/runner/threaded-run.js');
  const file = join(mkdtempSync(join(tmpdir(), 'hunch-mem-')), 'c.yaml');
  writeFileSync(file, conjecture(N));
  const req = {
    paths: [file],
    ids: null,
    sizes: [],
    sampleRanges: [],
    exhaustive: true,
    count: null,
    seed: null,
    budgetMs: null,
    root: null,
    regression: {},
  };
  const compiled = prepareRun(req);
  let cases = 0;
  const run = startCheckRun(compiled, req, 2, new Int32Array(new SharedArrayBuffer(4)), {
    onPiece: () => {},
    onProgress: () => {},
    onResult: (r) => (cases = r.checked.reduce((s, p) => s + p.cases, 0)),
  });
  const crash = await run.finished;
  if (crash) throw new Error(crash);
  console.log(JSON.stringify({ cases, maxRssKb: process.resourceUsage().maxRSS }));
  process.exit(0);
}

const dir = mkdtempSync(join(tmpdir(), 'hunch-bench-parallel-'));
writeFileSync(join(dir, 's10.yaml'), conjecture(10));

function checkMs(args) {
  const r = spawnSync(process.execPath, [BIN, 'check', 's10.yaml', '--no-ledger', '--json', ...args], { cwd: dir, encoding: 'utf8' });
  if (r.status !== 0) throw new Error(`hunch check ${args.join(' ')} failed: ${r.stderr}`);
  const res = JSON.parse(r.stdout).results[0];
  if (res.outcome !== 'holds') throw new Error(`unexpected outcome ${res.outcome}`);
  return { ms: res.ms, cases: res.checked.reduce((s, p) => s + p.cases, 0) };
}
const median = (xs) => xs.slice().sort((a, b) => a - b)[Math.floor(xs.length / 2)];

// 1. parallel efficiency
const ratios = [];
for (let round = 0; round < 3; round++) {
  const one = checkMs(['--workers', '1']);
  const two = checkMs(['--workers', '2']);
  if (one.cases !== two.cases) throw new Error('case counts differ between 1 and 2 workers');
  ratios.push(two.ms / one.ms);
  console.log(
    `round ${round + 1}: 1 worker ${one.ms.toFixed(0)} ms, 2 workers ${two.ms.toFixed(0)} ms, ratio ${(two.ms / one.ms).toFixed(2)} (${one.cases} cases)`,
  );
}
console.log(
  `parallel S_1..S_10 (${availableParallelism()} cores): median ratio 2 workers / 1 worker = ${median(ratios).toFixed(2)} (target <= 0.6)`,
);

// 2. overhead of sharding
const overheads = [];
for (let round = 0; round < 3; round++) {
  const whole = checkMs(['--workers', '1']);
  let sum = 0,
    cases = 0;
  for (let i = 1; i <= 4; i++) {
    const s = checkMs(['--workers', '1', '--shard', `${i}/4`]);
    sum += s.ms;
    cases += s.cases;
  }
  if (cases !== whole.cases) throw new Error(`4 shards checked ${cases} cases, the whole run ${whole.cases}`);
  overheads.push(sum / whole.ms);
  console.log(
    `round ${round + 1}: unsharded ${whole.ms.toFixed(0)} ms, 4 shards together ${sum.toFixed(0)} ms, ratio ${(sum / whole.ms).toFixed(2)}`,
  );
}
console.log(`sharding S_1..S_10 in 4: median ratio sum of shards / unsharded = ${median(overheads).toFixed(2)} (target <= 1.10)`);

// 3. memory
function peak(n) {
  const r = spawnSync(process.execPath, [fileURLToPath(import.meta.url), '--child', String(n)], { encoding: 'utf8' });
  if (r.status !== 0) throw new Error(`memory child for S_${n} failed: ${r.stderr}`);
  return JSON.parse(r.stdout.trim().split('\n').pop());
}
const m9 = peak(9),
  m11 = peak(11);
console.log(
  `peak resident memory: S_1..S_9 ${(m9.maxRssKb / 1024).toFixed(0)} MB (${m9.cases} cases), S_1..S_11 ${(m11.maxRssKb / 1024).toFixed(0)} MB (${m11.cases} cases), ratio ${(m11.maxRssKb / m9.maxRssKb).toFixed(2)} (target <= 1.5)`,
);
