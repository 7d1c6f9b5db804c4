// The other commands on odd input, through the built command line (`npx tsc -p .` first):
// `hunch eval` and `hunch table` on random expressions, `hunch replay` on damaged counterexample
// files, `hunch merge` on garbage, `hunch status` with a damaged ledger. Each must end with
// exit 0, 1 or 2 and a plain message: no stack trace, no "internal error".

import fc from 'fast-check';
import { copyFileSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, expect, test } from 'vitest';
import '../../src/families/index.js';
import '../../src/library/index.js';
import { runCli, tempDir, type CliResult } from '../cli/run-cli.js';
import { expressionText } from './expression-texts.js';
import { fcRand } from './random-source.js';

const LEAK = /internal error|\n\s+at .*:\d+:\d+\)?\n|Maximum call stack|\[object |hunch could not start/;

function expectClean(r: CliResult, what: string, codes = [0, 1, 2]): void {
  const show = `\n--- ${what} ---\n--- stderr ---\n${r.stderr.slice(0, 3000)}\n--- stdout ---\n${r.stdout.slice(0, 1000)}`;
  expect(codes, show).toContain(r.code);
  expect(r.stderr + r.stdout, show).not.toMatch(LEAK);
  if (r.code === 2) expect(r.stderr, show).toMatch(/error:/);
}

describe('hunch eval and hunch table on random expressions', () => {
  test('eval: exit 0 or 2, never a stack trace', () => {
    fc.assert(
      fc.property(fc.gen(), (g) => {
        const text = expressionText(fcRand(g));
        // "--" so that a text starting with "-" is the expression, not an option.
        const r = runCli(['eval', '--indeterminates', 'q,x', '--let', 'n=3', '--let', 'k=2', '--let', 'w=perm([2,3,1])', '--', text], {
          timeout: 20_000,
        });
        expectClean(r, text, [0, 2]);
      }),
      { seed: 5, numRuns: 8 },
    );
  }, 60_000);

  test('table: odd ranges and lets are refused with a message', () => {
    for (const args of [
      ['n^2', '--over', 'n=1..1000000000'],
      ['n^2', '--over', 'n=5..1'],
      ['n^2', '--over', '1..3'],
      ['n^2', '--over', 'n=1..3', '--let', 'm'],
      ['n^2', '--over', 'n=1..3', '--let', 'x y=1'],
      ['n^2', '--over', 'n=1..3', '--let', 'n=4'],
      ['1/n', '--over', 'n=0..2'],
      ['perm([n])', '--over', 'n=1..3'],
      ['sum(i for i in 1..n', '--over', 'n=1..3'],
    ]) {
      const r = runCli(['table', ...args]);
      expectClean(r, args.join(' '), [2]);
    }
    expectClean(runCli(['table', 'n^2 + m', '--over', 'n=1..3', '--let', 'm=n']), 'table with a let', [0]);
  }, 60_000);
});

describe('records, damaged', () => {
  let project: string;
  let counterexample: string;
  let ledger: string;

  beforeAll(() => {
    project = tempDir('hunch-fuzz-records-');
    mkdirSync(join(project, 'conjectures'));
    writeFileSync(join(project, 'hunch.yaml'), 'conjectures: conjectures\nledger: hunch-ledger.jsonl\nplugins: []\n');
    writeFileSync(
      join(project, 'conjectures', 'maj.yaml'),
      'conjecture: maj-le-inv\nexpect: fails\nfor:\n  n: 1..4\n  w: permutations(n)\nlet:\n  a: maj(w)\n  b: inv(w)\nclaim: a <= b\n',
    );
    const r = runCli(['check'], { cwd: project });
    expect(r.code, r.stderr).toBe(0);
    counterexample = readFileSync(join(project, 'counterexamples', 'maj-le-inv.yaml'), 'utf8');
    ledger = readFileSync(join(project, 'hunch-ledger.jsonl'), 'utf8');
  }, 60_000);

  const WRONG = [
    '',
    '[]',
    '{}',
    'null',
    '-1',
    '"x"',
    '{permutation: [1, 1, 2]}',
    '{partition: [1, 2]}',
    '{foo: 1}',
    '[1, 2]',
    '123456789012345678901234567890',
    '*a',
  ];

  /** Damage a text line by line: drop, blank out a value, cut, indent, insert. */
  function damageLines(g: fc.GeneratorValue, text: string, extra: string[]): string {
    const lines = text.split('\n');
    for (let m = g(fc.integer, { min: 1, max: 3 }); m > 0; m--) {
      const i = g(fc.integer, { min: 0, max: Math.max(0, lines.length - 1) });
      const line = lines[i] ?? '';
      switch (g(fc.integer, { min: 0, max: 4 })) {
        case 0:
          lines.splice(i, 1);
          break;
        case 1:
          if (line.includes(':')) lines[i] = `${line.slice(0, line.indexOf(':'))}: ${g(fc.constantFrom, ...WRONG)}`;
          break;
        case 2:
          lines[i] = line.slice(0, g(fc.integer, { min: 0, max: line.length }));
          break;
        case 3:
          lines[i] = ' ' + line;
          break;
        default:
          lines.splice(i, 0, g(fc.constantFrom, ...extra));
      }
    }
    return lines.join('\n');
  }

  test('replay on a damaged counterexample file: 0, 1 or 2 with a message', () => {
    fc.assert(
      fc.property(fc.gen(), (g) => {
        const text = damageLines(g, counterexample, ['x: 1', 'bindings: []', '  w: 3', '---', '\t', 'document: 3']);
        writeFileSync(join(project, 'counterexamples', 'damaged.yaml'), text);
        expectClean(runCli(['replay', 'counterexamples/damaged.yaml'], { cwd: project }), text);
      }),
      { seed: 11, numRuns: 6 },
    );
  }, 60_000);

  test('status with a damaged ledger, and merge of damaged and garbage ledgers', () => {
    const good = join(project, 'good.jsonl');
    writeFileSync(good, ledger);
    fc.assert(
      fc.property(fc.gen(), (g) => {
        const text = damageLines(g, ledger, ['garbage', '{}', '[]', 'null', '{"v":1}', '"x"', '1e999', '{"v":1,"id":"maj-le-inv"}']);
        writeFileSync(join(project, 'hunch-ledger.jsonl'), text);
        expectClean(runCli(['status'], { cwd: project }), text);
        expectClean(runCli(['merge', 'hunch-ledger.jsonl', good, '-o', join(project, 'merged.jsonl')], { cwd: project }), text);
      }),
      { seed: 13, numRuns: 4 },
    );
    const garbage = join(project, 'garbage.bin');
    writeFileSync(garbage, Buffer.from(Array.from({ length: 600 }, (_, i) => (i * 7919) % 256)));
    writeFileSync(join(project, 'deep.jsonl'), '['.repeat(100_000) + ']'.repeat(100_000) + '\n');
    for (const args of [
      ['merge', garbage],
      ['merge', 'deep.jsonl'],
      ['merge', project],
      ['merge', good, '-o', garbage],
    ]) {
      expectClean(runCli(args, { cwd: project }), args.join(' '), [2]);
    }
    copyFileSync(garbage, join(project, 'hunch-ledger.jsonl'));
    expectClean(runCli(['status'], { cwd: project }), 'status over garbage', [2]);
  }, 60_000);
});
