// The headline benchmark of the exhaustive runner, in one run (after `npm run build`):
//   node test/bench/check-vs-loop.mjs [maxN=10]
// 1. `hunch check` (the exhaustive runner, one thread, in-process) on
//    "inv(w) == inv(inverse(w)) for every w in S_1..S_maxN", against a plain hand-written loop over
//    the same permutations (lexicographic next-permutation in place) doing the same arithmetic.
//    The figure reported is the ratio hunch / loop (the target is at most 3).
// 2. Start-up: wall time of `hunch check` on a one-line conjecture, as a separate process.
// Absolute times vary with the machine; only the ratio is meaningful, and nothing here gates CI.

import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import '../../dist/families/index.js';
import '../../dist/library/index.js';
import { loadConjectureFile } from '../../dist/language/conjecture/load-file.js';
import { compileConjecture } from '../../dist/language/conjecture/compile-conjecture.js';
import { checkConjecture } from '../../dist/runner/in-process-executor.js';

const N = Number(process.argv[2] ?? 10);
const ROOT = join(dirname(fileURLToPath(import.meta.url)), '..', '..');

// --- the plain loop a user would write ---
function nextPerm(a) {
  let i = a.length - 2;
  while (i >= 0 && a[i] >= a[i + 1]) i--;
  if (i < 0) return false;
  let j = a.length - 1;
  while (a[j] <= a[i]) j--;
  [a[i], a[j]] = [a[j], a[i]];
  for (let l = i + 1, r = a.length - 1; l < r; l++, r--) [a[l], a[r]] = [a[r], a[l]];
  return true;
}
function inversions(a) {
  let c = 0;
  for (let i = 0; i < a.length; i++) for (let j = i + 1; j < a.length; j++) if (a[i] > a[j]) c++;
  return c;
}
function plainLoop() {
  let holds = 0,
    cases = 0;
  for (let n = 1; n <= N; n++) {
    const a = Array.from({ length: n }, (_, i) => i + 1);
    do {
      const b = new Array(n);
      for (let i = 0; i < n; i++) b[a[i] - 1] = i + 1;
      cases++;
      if (inversions(a) === inversions(b)) holds++;
    } while (nextPerm(a));
  }
  return { holds, cases };
}

// --- hunch, the same conjecture through the whole runner ---
const yaml = `conjecture: inverse-keeps-inversions
for:
  n: 1..${N}
  w: permutations(n)
claim: inv(w) == inv(inverse(w))
`;
const cc = compileConjecture(loadConjectureFile('bench.yaml', yaml).conjectures[0]);
function viaHunch() {
  const r = checkConjecture(cc, {}, {});
  return { outcome: r.outcome, cases: r.checked.reduce((s, p) => s + p.cases, 0) };
}

function time(f) {
  const t = performance.now();
  const v = f();
  return [performance.now() - t, v];
}

const ratios = [];
for (let round = 0; round < 3; round++) {
  const [tl, l] = time(plainLoop);
  const [th, h] = time(viaHunch);
  if (l.cases !== h.cases || h.outcome !== 'holds') throw new Error(`mismatch: ${JSON.stringify({ l, h })}`);
  ratios.push(th / tl);
  console.log(
    `round ${round + 1}: plain loop ${tl.toFixed(0)} ms, hunch check ${th.toFixed(0)} ms, ratio ${(th / tl).toFixed(2)} (${h.cases} cases)`,
  );
}
ratios.sort((a, b) => a - b);
console.log(`check-vs-loop S_1..S_${N}: median ratio hunch/loop = ${ratios[1].toFixed(2)} (target <= 3)`);

// --- start-up of the command on a one-line conjecture ---
const dir = mkdtempSync(join(tmpdir(), 'hunch-bench-'));
writeFileSync(join(dir, 'one.yaml'), 'conjecture: one\nclaim: 1 + 1 == 2\n');
const starts = [];
for (let i = 0; i < 5; i++) {
  const t = performance.now();
  const r = spawnSync(process.execPath, [join(ROOT, 'bin', 'hunch'), 'check', 'one.yaml', '--no-ledger'], { cwd: dir });
  starts.push(performance.now() - t);
  if (r.status !== 0) throw new Error(`start-up run failed: ${r.stderr}`);
}
starts.sort((a, b) => a - b);
console.log(`start-up of hunch check on a one-line conjecture: median ${starts[2].toFixed(0)} ms (target < 500 ms)`);
