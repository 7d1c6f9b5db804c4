// prepareRun (src/runner/run-request.ts): load, compile and refuse, before anything runs, an exhaustive
// size whose enumeration would take years, suggesting `sample`.

import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import '../../src/families/index.js';
import '../../src/library/index.js';
import { InputError } from '../../src/base/errors.js';
import { prepareRun, type RunRequest } from '../../src/runner/run-request.js';

const dir = mkdtempSync(join(tmpdir(), 'hunch-session-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function request(file: string, over: Partial<RunRequest> = {}): RunRequest {
  // `root` is null: no project (the test files live in a temporary folder). Cast, because the request
  // is gaining fields while the runner moves to worker threads.
  return {
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
    ...over,
  } as RunRequest;
}

function write(name: string, text: string): string {
  const f = join(dir, name);
  writeFileSync(f, text);
  return f;
}

const s20 = write('s20.yaml', 'conjecture: big\nfor:\n  n: 1..20\n  w: permutations(n)\nclaim: inv(w) >= 0\n');

describe('the planned-case refusal', () => {
  it('refuses S_20 with the count and a suggestion to sample', () => {
    let err: unknown;
    try {
      prepareRun(request(s20));
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(InputError);
    const e = err as InputError;
    expect(e.message).toMatch(/sample/);
    expect(e.message).toContain('2,432,902,008,176,640,000'); // 20! (OEIS A000142)
    expect(e.pos?.line).toBe(3); // at the binding n
  });

  it('accepts it when --sizes lowers the range, or the exhaustive phase is off', () => {
    expect(prepareRun(request(s20, { sizes: [['n', 1, 8]] }))).toHaveLength(1);
    expect(prepareRun(request(s20, { exhaustive: false }))).toHaveLength(1);
  });

  it('refuses a --sizes override that is itself too large', () => {
    const f = write('s8.yaml', 'conjecture: small\nfor:\n  n: 1..8\n  w: permutations(n)\nclaim: inv(w) >= 0\n');
    expect(prepareRun(request(f))).toHaveLength(1);
    expect(() => prepareRun(request(f, { sizes: [['n', 1, 25]] }))).toThrow(/sample/);
  });

  it('counts products of families (S_10 x S_10 is 13,168,189,440,000 cases: refused)', () => {
    const f = write(
      'pair.yaml',
      'conjecture: pair\nfor:\n  n: 10..10\n  u: permutations(n)\n  v: permutations(n)\nclaim: inv(u * v) >= 0\n',
    );
    expect(() => prepareRun(request(f))).toThrow(/13,168,189,440,000/);
  });

  it('an unknown --id is refused with the nearest id', () => {
    expect(() => prepareRun(request(s20, { ids: ['bog'] }))).toThrow(/did you mean big/);
  });
});
