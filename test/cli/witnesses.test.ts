// Witnesses end to end: a bundled `expect: fails` conjecture whose all(...) fails shows the
// deciding permutation with its picture, in the report, the JSON document, the counterexample
// file and replay.

import { copyFileSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { expect, test } from 'vitest';
import { ROOT, runCli, tempDir } from './run-cli.js';

test('schubert-zero-one-per-size: the witness of all(...) is 13254, drawn', () => {
  const dir = tempDir();
  copyFileSync(join(ROOT, 'conjectures', 'schubert-and-tableaux.yaml'), join(dir, 'c.yaml'));
  const args = ['check', 'c.yaml', '--id', 'schubert-zero-one-per-size', '--no-ledger', '--counterexamples'];
  const human = runCli(args, { cwd: dir });
  expect(human.code, human.stderr).toBe(0);
  expect(human.stdout).toContain('witnesses (what decided the failure):');
  expect(human.stdout).toMatch(
    /all\(max\(coefficients\(schubert\(w, x\)\)\) <= 1 for w in permutations\(n\)\) is false at w = perm\(\[1, 3, 2, 5, 4\]\); there its two sides are 2 against 1/,
  );
  expect(human.stdout).toMatch(/w = 1 3 2 5 4\n.*5 │ · · · ● ·/);

  const json = JSON.parse(runCli([...args, '--json'], { cwd: dir }).stdout);
  const cx = json.results.find((r: { id: string }) => r.id === 'schubert-zero-one-per-size').counterexample;
  expect(cx.witnesses).toEqual([
    {
      kind: 'element',
      reducer: 'all',
      at: 'all(max(coefficients(schubert(w, x))) <= 1 for w in permutations(n))',
      line: 21,
      column: 8,
      bindings: { w: { permutation: [1, 3, 2, 5, 4] } },
      value: false,
      sides: [2, 1],
    },
  ]);

  const file = readFileSync(join(dir, 'counterexamples', 'schubert-zero-one-per-size.yaml'), 'utf8');
  expect(file).toContain(
    '# Witness: all(max(coefficients(schubert(w, x))) <= 1 for w in permutations(n)) is false at w = perm([1, 3, 2, 5, 4]).',
  );
  const replay = runCli(['replay', 'counterexamples/schubert-zero-one-per-size.yaml'], { cwd: dir });
  expect(replay.code, replay.stderr).toBe(0);
  expect(replay.stdout).toMatch(/is false at w = perm\(\[1, 3, 2, 5, 4\]\)/);
}, 120_000);
