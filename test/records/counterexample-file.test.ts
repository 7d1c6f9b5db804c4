import { mkdirSync, writeFileSync, readFileSync } from 'node:fs';
import { tempDir } from '../helpers/temp-dirs.js';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import '../../src/families/index.js';
import { loadConjectureFile } from '../../src/language/conjecture/load-file.js';
import type { ConjectureResult } from '../../src/runner/result.js';
import {
  conjectureText,
  counterexampleRecord,
  counterexampleText,
  parseCounterexampleFile,
  readRegressionCase,
  readRegressionEncoded,
  writeCounterexampleFile,
} from '../../src/records/counterexample-file.js';
import { conjectureHash } from '../../src/language/conjecture/conjecture-hash.js';

const TEXT = `
define:
  peaks(w): count(i in 2..len(w)-1 where w[i-1] < w[i] and w[i] > w[i+1])
  unused(x): x
---
conjecture: peaks-small
statement: "A made-up bound: peaks(w) stays below a huge constant, and n is at most 3."
expect: fails
for:
  n: 1..4
  w: permutations(n)
let:
  p: peaks(w)
  big: 123456789012345678901234567890
claim: p < big and n <= 3
sample:
  n: 5..9
  count: 10
define:
  own(x): x + 1
`;

const spec = loadConjectureFile('conjectures/p.yaml', TEXT).conjectures[0];
const hash = conjectureHash(spec);

function result(): ConjectureResult {
  return {
    id: spec.id,
    file: spec.file,
    hash,
    expect: 'fails',
    outcome: 'fails',
    checked: [],
    error: null,
    ms: 1,
    counterexample: {
      phase: 'sample',
      size: { n: 4 },
      bindings: { n: 4, w: { permutation: [1, 2, 3, 4] } },
      values: { p: 0, big: '123456789012345678901234567890' },
      sides: null,
      failuresAtSize: null,
      shrinkSteps: 7,
      seed: 'abc',
      shrunkFrom: { n: 9 },
    },
  };
}

describe('counterexample files', () => {
  test('the embedded conjecture reads back exactly (same hash), big integers and defines included', () => {
    const f = counterexampleRecord(spec, hash, result().counterexample!, 'counterexamples/peaks-small.yaml');
    const back = parseCounterexampleFile(counterexampleText(f), 'x.yaml');
    expect(back.bindings).toEqual({ n: 4, w: { permutation: [1, 2, 3, 4] } });
    expect(back.values.big).toBe('123456789012345678901234567890');
    expect(back.found).toMatchObject({ phase: 'sample', seed: 'abc', shrinkSteps: 7, shrunkFrom: { n: 9 } });
    const again = loadConjectureFile('embedded', conjectureText(back.defines, back.document)).conjectures[0];
    expect(conjectureHash(again)).toBe(hash);
    expect(again.lets[1].expr.text).toBe('123456789012345678901234567890');
  });

  test('written atomically under counterexamples/ with a readable header; regression case read back', () => {
    const root = tempDir('hunch-cx-');
    const shown = writeCounterexampleFile(root, spec, result());
    expect(shown).toMatch(/counterexamples\/peaks-small\.yaml$/);
    const text = readFileSync(join(root, 'counterexamples', 'peaks-small.yaml'), 'utf8');
    expect(text).toMatch(/^# A counterexample to the conjecture "peaks-small"/);
    expect(text).toMatch(/# Found at random \(seed abc\), then shrunk in 7 steps from n = 9 to n = 4\./);
    expect(text).toContain('hunch replay ');
    expect(readRegressionEncoded(root, spec)).toEqual([4, { permutation: [1, 2, 3, 4] }]);
    expect(readRegressionCase(root, spec)?.[0]).toBe(4);
    // bindings renamed since: not a case of this conjecture any more
    const renamed = loadConjectureFile('c.yaml', TEXT.replace(/\bw\b/g, 'v')).conjectures[0];
    expect(readRegressionEncoded(root, renamed)).toBeNull();
  });

  test('a damaged saved counterexample is reported and skipped; a missing one is silent', () => {
    const root = tempDir('hunch-cx-');
    const warnings: string[] = [];
    expect(readRegressionEncoded(root, spec, (m) => warnings.push(m))).toBeNull();
    expect(warnings).toEqual([]);
    mkdirSync(join(root, 'counterexamples'));
    writeFileSync(join(root, 'counterexamples', 'peaks-small.yaml'), 'format: 1\nconjecture: peaks-small\n');
    expect(readRegressionEncoded(root, spec, (m) => warnings.push(m))).toBeNull();
    expect(warnings[0]).toMatch(/not a readable counterexample file: the "hash" is missing/);
  });

  test.each([
    ['not YAML', 'a: [', /YAML syntax/],
    ['a future format', 'format: 7\n', /format 7, written by a newer hunch/],
    ['no document', `format: 1\nconjecture: x\nhash: "${'a'.repeat(64)}"\nbindings: {}\n`, /"document"/],
  ])('unreadable: %s', (_w, text, msg) => {
    expect(() => parseCounterexampleFile(text, 'f.yaml')).toThrow(msg);
  });
});
