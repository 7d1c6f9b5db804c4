// A saved counterexample does not freeze a worse one: when the regression case still fails, it is
// shrunk too, and the file is replaced by the simpler case.

import { mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { expect, test } from 'vitest';
import { forgedFile } from './hostile/forge.js';
import { runCli, tempDir } from './run-cli.js';

// maj(132) = 2 > inv(132) = 1: the simplest failing case is n = 3, w = 132 (checked exhaustively).
const MAJ = 'conjecture: maj-bounded\nexpect: fails\nfor:\n  n: 1..5\n  w: permutations(n)\nclaim: maj(w) <= inv(w)\n';

test('a non-minimal saved case is shrunk and the file replaced', () => {
  const d = tempDir('hunch-regshrink-');
  try {
    writeFileSync(join(d, 'a.yaml'), MAJ);
    mkdirSync(join(d, 'counterexamples'));
    // maj(1243) = 3 > inv(1243) = 1: a failing case, but not the simplest.
    writeFileSync(join(d, 'counterexamples', 'maj-bounded.yaml'), forgedFile(MAJ, { n: 4, w: { permutation: [1, 2, 4, 3] } }));
    const r = runCli(['check', 'a.yaml', '--json'], { cwd: d, timeout: 120_000 });
    expect(r.code, r.stderr).toBe(0);
    const cx = JSON.parse(r.stdout).results[0].counterexample;
    expect(cx.phase).toBe('regression');
    expect(cx.bindings).toEqual({ n: 3, w: { permutation: [1, 3, 2] } });
    const saved = readFileSync(join(d, 'counterexamples', 'maj-bounded.yaml'), 'utf8');
    expect(saved).toContain('permutation: [1, 3, 2]');
    const again = runCli(['replay', 'counterexamples/maj-bounded.yaml'], { cwd: d });
    expect(again.code, again.stderr).toBe(0);
  } finally {
    rmSync(d, { recursive: true, force: true });
  }
}, 120_000);
