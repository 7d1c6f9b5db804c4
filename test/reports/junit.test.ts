import { describe, expect, test } from 'vitest';
import type { ConjectureResult } from '../../src/runner/result.js';
import { junitXml, xmlEscape } from '../../src/reports/junit.js';

const base = (over: Partial<ConjectureResult>): ConjectureResult => ({
  id: 'c',
  file: 'f.yaml',
  hash: 'h',
  expect: 'holds',
  outcome: 'holds',
  checked: [],
  counterexample: null,
  error: null,
  ms: 12,
  ...over,
});

describe('junit', () => {
  test('escapes XML', () => {
    // Control characters are shown as \xNN (src/base/escape.ts), never passed through.
    expect(xmlEscape(`a<b & "c" 'd'\u0001`)).toBe('a&lt;b &amp; &quot;c&quot; &apos;d&apos;\\x01');
  });

  test('one testcase per conjecture; failures, errors and skips follow the exit-code rule', () => {
    const xml = junitXml([
      base({ id: 'ok' }),
      base({ id: 'expected-fail', expect: 'fails', outcome: 'holds' }),
      base({ id: 'err', outcome: 'error', error: { message: 'division by zero', file: 'f.yaml', line: 3, column: 8, bindings: { n: 0 } } }),
      base({ id: 'budget', outcome: 'incomplete', stoppedBy: 'budget' }),
      base({
        id: 'as-expected',
        expect: 'fails',
        outcome: 'fails',
        counterexample: {
          phase: 'exhaustive',
          size: { n: 3 },
          bindings: { n: 3 },
          values: {},
          sides: null,
          failuresAtSize: 1,
          shrinkSteps: 0,
          seed: null,
        },
      }),
    ]);
    expect(xml).toMatch(/<testsuites name="hunch" tests="5" failures="1" errors="1" skipped="1"/);
    expect(xml).toMatch(/name="expected-fail"[^]*?<failure type="contradicts-expect" message="expected to fail, but no counterexample/);
    expect(xml).toMatch(
      /name="err"[^]*?<error type="evaluation-error" message="division by zero">f.yaml:3:8: division by zero\nin the case n = 0<\/error>/,
    );
    expect(xml).toMatch(/name="budget"[^]*?<skipped message="incomplete \(budget reached\)/);
    expect(xml).toMatch(/name="as-expected" time="0.012">\n {6}<system-out>/);
  });
});
