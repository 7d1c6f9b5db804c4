// Fuzzing conjecture files: random documents (valid skeletons with mutated keys, values and
// indentation, wrong types for every key, huge ranges, odd samples, damaged defines) are loaded,
// compiled and, when they compile, checked in-process for about 50 ms. Each step must succeed or
// fail with an InputError / EvalError with a clear message (InputErrors with file:line:column);
// the check reports errors in its result and never throws. Then a smaller end-to-end property runs
// the real command line on generated files: exit 0, 1 or 2, no stack trace, no "internal error",
// and nothing recorded when the exit code is 2.

import fc from 'fast-check';
import { existsSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import '../../src/families/index.js';
import '../../src/library/index.js';
import { InputError } from '../../src/base/errors.js';
import { compileConjecture, MAX_EXHAUSTIVE_SIZES } from '../../src/language/conjecture/compile-conjecture.js';
import { loadConjectureFile } from '../../src/language/conjecture/load-file.js';
import { checkConjecture } from '../../src/runner/in-process-executor.js';
import { runCli, tempDir } from '../cli/run-cli.js';
import { conjectureFile } from './conjecture-documents.js';
import { expectCleanError, timed } from './outcome.js';
import { fcRand, seededRand } from './random-source.js';

type Outcome = 'input' | 'eval' | 'checked';

/** Load, compile and check (briefly) every conjecture of a file. */
function outcome(text: string): Outcome {
  return timed(2500, text, () => {
    let compiled;
    try {
      compiled = loadConjectureFile('fuzz.yaml', text).conjectures.map(compileConjecture);
    } catch (e) {
      const kind = expectCleanError(e, text);
      if (e instanceof InputError) {
        // A load-time error in a file always says where.
        expect(e.pos, `${e.message}\n${text}`).toBeDefined();
        expect(e.pos!.file).toBe('fuzz.yaml');
      }
      return kind;
    }
    for (const cc of compiled) {
      const t0 = performance.now();
      const result = checkConjecture(cc, { count: 5 }, { shouldStop: () => (performance.now() - t0 > 50 ? 'budget' : null) });
      if (result.error) {
        expect(result.error.message, text).toBeTruthy();
        expect(result.error.message, text).not.toMatch(/internal error|\[object |Maximum call stack/);
      }
    }
    return 'checked';
  });
}

describe('random conjecture documents', () => {
  test('load, compile and check, or fail cleanly (fixed seed)', () => {
    const seen: Record<Outcome, number> = { input: 0, eval: 0, checked: 0 };
    fc.assert(
      fc.property(fc.gen(), (g) => {
        seen[outcome(conjectureFile(fcRand(g)))]++;
      }),
      { seed: 424_242, numRuns: 400 },
    );
    expect(seen.checked).toBeGreaterThan(40);
    expect(seen.input).toBeGreaterThan(100);
  });

  test('more documents from a seeded generator', () => {
    for (let s = 1; s <= 600; s++) outcome(conjectureFile(seededRand(s)));
  });
});

describe('found by fuzzing', () => {
  test('a huge exhaustive range is refused at load time with its position (it used to exhaust memory)', () => {
    for (const range of ['1..1000000000', '1..10^30', '-(2^60)..0']) {
      const text = `conjecture: big\nfor:\n  n: ${range}\nclaim: n >= 0\n`;
      let err: unknown;
      try {
        compileConjecture(loadConjectureFile('big.yaml', text).conjectures[0]);
      } catch (e) {
        err = e;
      }
      expect(err).toBeInstanceOf(InputError);
      expect((err as InputError).message).toContain(`at most ${MAX_EXHAUSTIVE_SIZES.toLocaleString('en-US')}`);
      expect((err as InputError).pos).toMatchObject({ file: 'big.yaml', line: 3, column: 6 });
    }
    // The limit itself is allowed, and so is a range whose bounds depend on another binding.
    expect(() =>
      compileConjecture(
        loadConjectureFile('ok.yaml', `conjecture: ok\nfor:\n  n: 1..${MAX_EXHAUSTIVE_SIZES}\nclaim: n >= 0\n`).conjectures[0],
      ),
    ).not.toThrow();
  });
});

// End to end through the built command line (`npx tsc -p .` first): about 30 generated files.
describe('the command line on random files', () => {
  test('exit 0, 1 or 2; no stack trace; nothing recorded on exit 2', () => {
    let twos = 0;
    fc.assert(
      fc.property(fc.gen(), (g) => {
        const text = conjectureFile(fcRand(g));
        const dir = tempDir('hunch-fuzz-');
        const ledger = join(dir, 'hunch-ledger.jsonl');
        writeFileSync(join(dir, 'case.yaml'), text);
        const r = runCli(['check', 'case.yaml', '--budget', '1s', '--workers', '1', '--count', '3'], { cwd: dir, timeout: 90_000 });
        const show = `\n--- file ---\n${text}\n--- stderr ---\n${r.stderr}\n--- stdout ---\n${r.stdout.slice(0, 2000)}`;
        expect([0, 1, 2], show).toContain(r.code);
        expect(r.stderr + r.stdout, show).not.toMatch(/internal error|\n\s+at .*:\d+:\d+\)?\n|Maximum call stack|\[object /);
        if (r.code === 2) {
          twos++;
          expect(r.stderr, show).toMatch(/case\.yaml:\d+:\d+: error: /);
          expect(existsSync(ledger), show).toBe(false);
          expect(existsSync(join(dir, 'counterexamples')), show).toBe(false);
        }
      }),
      { seed: 99, numRuns: 30 },
    );
    expect(twos).toBeGreaterThan(5);
  }, 900_000);
});
