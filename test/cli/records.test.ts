// The ledger, status, merge, replay and init end to end through the built command line:
// status after a run, an interrupted run (SIGKILL in the middle of a size), a changed conjecture and
// a merge shows exactly the truth; concurrent writers lose and interleave nothing; damaged ledgers.

import { spawn } from 'node:child_process';
import { appendFileSync, existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { BIN, runCli, tempDir } from './run-cli.js';

// inv(w) = inv(w^-1): Stanley, Enumerative Combinatorics vol. 1 (2nd ed.), Prop. 1.3.14 context.
// Case counts are n! summed: 1 + 2 + 6 + 24 + 120 = 153 (OEIS A007489 gives sum_{k<=n} k!).
const INVERSE = (range = '1..5') => `
conjecture: inverse-keeps-inversions
expect: holds
for:
  n: ${range}
  w: permutations(n)
claim: inv(w) == inv(inverse(w))
`;

// The smallest w with maj(w) > inv(w) is 132 in S_3 (maj 2, inv 1).
const MAJ = `
conjecture: maj-bounded-by-inv
expect: fails
for:
  n: 1..6
  w: permutations(n)
let:
  a: maj(w)
  b: inv(w)
claim: a <= b
`;

function project(files: Record<string, string>): string {
  const d = tempDir('hunch-records-');
  writeFileSync(join(d, 'hunch.yaml'), '');
  for (const [p, text] of Object.entries(files)) {
    mkdirSync(join(d, p, '..'), { recursive: true });
    writeFileSync(join(d, p), text);
  }
  return d;
}

const ledgerLines = (d: string, name = 'hunch-ledger.jsonl') =>
  readFileSync(join(d, name), 'utf8')
    .split('\n')
    .filter((l) => l.trim() !== '');
const status = (d: string, ...args: string[]) => {
  const r = runCli(['status', '--json', ...args], { cwd: d });
  expect(r.code, r.stderr).toBe(0);
  return JSON.parse(r.stdout);
};

describe('status after runs', { timeout: 120_000 }, () => {
  test('after a run: sizes with case counts; a failing conjecture agrees with expect: fails', () => {
    const d = project({ 'conjectures/a.yaml': INVERSE() + '---\n' + MAJ });
    expect(runCli(['check'], { cwd: d }).code).toBe(0);
    const s = status(d);
    const inv = s.conjectures.find((c: any) => c.id === 'inverse-keeps-inversions');
    expect(inv.exhaustive.map((e: any) => [e.size.n, e.cases])).toEqual([
      [1, 1],
      [2, 2],
      [3, 6],
      [4, 24],
      [5, 120],
    ]);
    expect(inv.latest.outcome).toBe('holds');
    const maj = s.conjectures.find((c: any) => c.id === 'maj-bounded-by-inv');
    expect(maj.latest.outcome).toBe('fails');
    expect(maj.agrees).toBe(true);
    const text = runCli(['status'], { cwd: d });
    expect(text.stdout).toContain('n = 1..5 exhaustive (153 cases)');
    expect(text.stdout).toContain('n = 3 exhaustive (6 cases, 1 failing)');
  });

  test('a changed conjecture: old records are stale and not counted', () => {
    const d = project({ 'conjectures/a.yaml': INVERSE() });
    runCli(['check'], { cwd: d });
    writeFileSync(join(d, 'conjectures/a.yaml'), INVERSE().replace('inv(w) == inv(inverse(w))', 'inv(inverse(w)) == inv(w)'));
    let s = status(d);
    expect(s.conjectures[0].exhaustive).toEqual([]);
    expect(s.conjectures[0].stale.records).toBe(5);
    expect(s.conjectures[0].latest).toBeNull();
    // Layout and comments alone do not make it stale.
    writeFileSync(
      join(d, 'conjectures/a.yaml'),
      '# a comment\n' + INVERSE().replace('claim: inv(w) == inv(inverse(w))', 'claim: "inv(w)==inv(inverse(w))"'),
    );
    s = status(d);
    expect(s.conjectures[0].exhaustive).toHaveLength(5);
    expect(s.conjectures[0].stale).toBeNull();
  });

  test('SIGKILL in the middle of a size leaves only finished work; the next run completes it', async () => {
    // inv of a thrice-inverted permutation: slow enough that n = 10 (3,628,800 cases) takes a while.
    const d = project({ 'conjectures/a.yaml': INVERSE('1..10').replace('inv(inverse(w))', 'inv(inverse(inverse(inverse(w))))') });
    const child = spawn(process.execPath, [BIN, 'check'], { cwd: d, stdio: 'ignore' });
    const ledger = join(d, 'hunch-ledger.jsonl');
    await new Promise<void>((resolve, reject) => {
      const started = Date.now();
      const poll = setInterval(() => {
        const text = existsSync(ledger) ? readFileSync(ledger, 'utf8') : '';
        if (text.includes('"size":{"n":9}')) {
          clearInterval(poll);
          child.kill('SIGKILL');
          resolve();
        } else if (Date.now() - started > 150_000) {
          clearInterval(poll);
          child.kill('SIGKILL');
          reject(new Error('the check never reached n = 9'));
        }
      }, 5);
    });
    await new Promise((r) => child.on('exit', r));
    let s = status(d);
    expect(s.warnings).toEqual([]);
    expect(s.conjectures[0].exhaustive.map((e: any) => e.size.n)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9]);
    expect(s.conjectures[0].exhaustive[8].cases).toBe(362880); // 9!
    expect(runCli(['check'], { cwd: d }).code).toBe(0);
    s = status(d);
    expect(s.conjectures[0].exhaustive.map((e: any) => e.size.n)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
    expect(s.conjectures[0].exhaustive[9].cases).toBe(3628800); // 10!
  }, 180_000);

  test('an interrupted run (Ctrl-C) exits 3 and records only the sizes it finished', async () => {
    const d = project({ 'conjectures/a.yaml': INVERSE('1..10').replace('inv(inverse(w))', 'inv(inverse(inverse(inverse(w))))') });
    const child = spawn(process.execPath, [BIN, 'check'], { cwd: d, stdio: 'ignore' });
    const ledger = join(d, 'hunch-ledger.jsonl');
    await new Promise<void>((resolve) => {
      const poll = setInterval(() => {
        if (existsSync(ledger) && readFileSync(ledger, 'utf8').includes('"size":{"n":9}')) {
          clearInterval(poll);
          child.kill('SIGINT');
          resolve();
        }
      }, 5);
    });
    const code = await new Promise((r) => child.on('exit', r));
    expect(code).toBe(3);
    const s = status(d).conjectures[0];
    expect(s.exhaustive.map((e: any) => e.size.n)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9]);
    // Slices of n = 10 finished before the stop may be recorded (for --resume): they show as
    // unfinished, never as verified.
    expect(s.unfinished.every((u: any) => u.size.n === 10)).toBe(true);
  }, 180_000);

  test('two concurrent checks on one ledger lose and interleave nothing', async () => {
    const many = (id: string) => `
conjecture: ${id}
expect: holds
for:
  n: 1..6
  w: permutations(n)
claim: inv(w) == inv(inverse(w))
sample:
  n: 7..300
  count: 1
`;
    const d = project({ 'conjectures/a.yaml': many('first'), 'conjectures/b.yaml': many('second') });
    const run = (file: string) =>
      new Promise<number | null>((resolve) => {
        const c = spawn(process.execPath, [BIN, 'check', file], { cwd: d, stdio: 'ignore', env: { ...process.env, NO_COLOR: '1' } });
        c.on('exit', (code) => resolve(code));
      });
    const codes = await Promise.all([run('conjectures/a.yaml'), run('conjectures/b.yaml'), run('conjectures/a.yaml')]);
    expect(codes).toEqual([0, 0, 0]);
    const lines = ledgerLines(d);
    for (const l of lines) expect(() => JSON.parse(l)).not.toThrow();
    const per = (id: string) => lines.filter((l) => JSON.parse(l).id === id).length;
    expect(per('first')).toBe(2 * (6 + 294));
    expect(per('second')).toBe(6 + 294);
  }, 180_000);
});

describe('damaged ledgers', { timeout: 120_000 }, () => {
  function checked(): { d: string; line: string } {
    const d = project({ 'conjectures/a.yaml': INVERSE('1..3') });
    runCli(['check'], { cwd: d });
    return { d, line: ledgerLines(d)[0] };
  }

  test('a torn last line is reported and ignored, never fatal', () => {
    const { d, line } = checked();
    appendFileSync(join(d, 'hunch-ledger.jsonl'), line.slice(0, 50));
    const r = runCli(['status'], { cwd: d });
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/warning: .*hunch-ledger\.jsonl:4: ignoring an unfinished record/);
    expect(r.stdout).toContain('n = 1..3 exhaustive (9 cases)');
    // and the next check appends after it cleanly
    expect(runCli(['check'], { cwd: d }).code).toBe(0);
    expect(status(d).conjectures[0].exhaustive).toHaveLength(3);
  });

  test('a record from a future version is reported and skipped', () => {
    const { d, line } = checked();
    appendFileSync(join(d, 'hunch-ledger.jsonl'), JSON.stringify({ ...JSON.parse(line), v: 9, size: { n: 4 } }) + '\n');
    const s = status(d);
    expect(s.warnings[0]).toMatch(/format 9/);
    expect(s.conjectures[0].exhaustive).toHaveLength(3);
  });

  test('a hand-edited hash makes that record stale; a garbled line is an error naming it', () => {
    const { d } = checked();
    const lines = ledgerLines(d);
    const edited = JSON.parse(lines[2]);
    edited.hash = 'e'.repeat(64);
    writeFileSync(join(d, 'hunch-ledger.jsonl'), [lines[0], lines[1], JSON.stringify(edited)].join('\n') + '\n');
    const s = status(d);
    expect(s.conjectures[0].exhaustive.map((e: any) => e.size.n)).toEqual([1, 2]);
    expect(s.conjectures[0].stale.records).toBe(1);
    const garbled = [lines[0], '{"v":1,"id":"inverse-keeps-inversions","hash":"zz"}', lines[1]].join('\n') + '\n';
    writeFileSync(join(d, 'hunch-ledger.jsonl'), garbled);
    const r = runCli(['status'], { cwd: d });
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/hunch-ledger\.jsonl:2.*line 2 of the ledger is not a valid record: the hash/);
    expect(readFileSync(join(d, 'hunch-ledger.jsonl'), 'utf8')).toBe(garbled);
  });
});

describe('merge', { timeout: 120_000 }, () => {
  test('ledgers of separate runs merge; duplicates go; status over the merge shows the union', () => {
    const d = project({ 'conjectures/a.yaml': INVERSE('1..6') });
    expect(runCli(['check', '--sizes', 'n=1..3', '--ledger', 'a.jsonl'], { cwd: d }).code).toBe(0);
    expect(runCli(['check', '--sizes', 'n=4..6', '--ledger', 'b.jsonl'], { cwd: d }).code).toBe(0);
    // a coauthor's copy holding one of the same records
    writeFileSync(join(d, 'c.jsonl'), ledgerLines(d, 'a.jsonl')[0] + '\n');
    const r = runCli(['merge', 'a.jsonl', 'b.jsonl', 'c.jsonl', '-o', 'merged.jsonl'], { cwd: d });
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toMatch(/6 records, 1 exact duplicate removed/);
    expect(ledgerLines(d, 'merged.jsonl')).toHaveLength(6);
    const s = status(d, '--ledger', 'merged.jsonl');
    expect(s.conjectures[0].exhaustive.map((e: any) => e.size.n)).toEqual([1, 2, 3, 4, 5, 6]);
  });

  test('slices: a size counts only when every slice i/K is present with the same hash', () => {
    const d = project({ 'conjectures/a.yaml': INVERSE('1..2') });
    runCli(['check'], { cwd: d });
    const base = JSON.parse(ledgerLines(d)[0]);
    const slice = (i: number, hash = base.hash) =>
      JSON.stringify({ ...base, size: { n: 7 }, shard: `${i}/3`, cases: 1680, hash, run: `r${i}` });
    writeFileSync(join(d, 's1.jsonl'), slice(1) + '\n');
    writeFileSync(join(d, 's2.jsonl'), slice(2) + '\n' + slice(3, 'f'.repeat(64)) + '\n');
    let r = runCli(['merge', 's1.jsonl', 's2.jsonl', '-o', 'm.jsonl'], { cwd: d });
    expect(r.stdout).toMatch(/n = 7: slices 3 of 3 are missing/);
    expect(status(d, '--ledger', 'm.jsonl').conjectures[0].exhaustive.map((e: any) => e.size.n)).toEqual([]);
    writeFileSync(join(d, 's3.jsonl'), slice(3) + '\n');
    r = runCli(['merge', 's3.jsonl', '-o', 'm.jsonl'], { cwd: d });
    expect(r.stdout).toMatch(/complete {2}n = 7: 5,040 cases from 3 slices/);
    const s = status(d, '--ledger', 'm.jsonl').conjectures[0];
    expect(s.exhaustive).toMatchObject([{ size: { n: 7 }, cases: 5040, slices: 3 }]); // 7! = 5040
    expect(s.stale.records).toBe(1);
  });
});

describe('counterexample files and replay', { timeout: 120_000 }, () => {
  test('a failure writes counterexamples/<id>.yaml; replay exits 0 while it refutes, 1 when it no longer does, 2 when unreadable', () => {
    const d = project({ 'conjectures/a.yaml': MAJ });
    const r = runCli(['check'], { cwd: d });
    expect(r.stdout).toContain('hunch replay counterexamples/maj-bounded-by-inv.yaml');
    const file = join(d, 'counterexamples', 'maj-bounded-by-inv.yaml');
    const text = readFileSync(file, 'utf8');
    expect(text).toMatch(/^# A counterexample to the conjecture "maj-bounded-by-inv"/);
    expect(text).toContain('permutation: [1, 3, 2]');
    let rp = runCli(['replay', 'counterexamples/maj-bounded-by-inv.yaml'], { cwd: d });
    expect(rp.code, rp.stderr).toBe(0);
    expect(rp.stdout).toMatch(/still refutes/);

    // Replayed from elsewhere, with nothing else around: the file is self-contained.
    const elsewhere = tempDir('hunch-mail-');
    writeFileSync(join(elsewhere, 'cx.yaml'), text);
    expect(runCli(['replay', 'cx.yaml'], { cwd: elsewhere }).code).toBe(0);

    // The local conjecture changed: the file still refutes what it holds, and the change is explained.
    writeFileSync(join(d, 'conjectures/a.yaml'), MAJ.replace('claim: a <= b', 'claim: a <= b + 10'));
    rp = runCli(['replay', 'counterexamples/maj-bounded-by-inv.yaml'], { cwd: d });
    expect(rp.code).toBe(0);
    expect(rp.stderr).toMatch(/has changed since this counterexample was found[\s\S]*the claim: was "a <= b", now "a <= b \+ 10"/);

    // The file's own conjecture edited so the case no longer refutes it.
    writeFileSync(join(elsewhere, 'edited.yaml'), text.replace(/claim: a <= b$/m, 'claim: a <= b + 1'));
    rp = runCli(['replay', 'edited.yaml'], { cwd: elsewhere });
    expect(rp.code).toBe(1);
    expect(rp.stdout).toMatch(/no longer refutes/);
    expect(rp.stderr).toMatch(/edited after the file was written/);

    writeFileSync(join(elsewhere, 'bad.yaml'), 'hello: [');
    expect(runCli(['replay', 'bad.yaml'], { cwd: elsewhere }).code).toBe(2);
    expect(runCli(['replay', 'missing.yaml'], { cwd: elsewhere }).code).toBe(2);
  });

  test('check tries the saved counterexample first', () => {
    const d = project({ 'conjectures/a.yaml': MAJ });
    runCli(['check'], { cwd: d });
    const r = runCli(['check', '--json'], { cwd: d });
    const res = JSON.parse(r.stdout).results[0];
    expect(res.counterexample.phase).toBe('regression');
    expect(res.counterexample.bindings).toEqual({ n: 3, w: { permutation: [1, 3, 2] } });
  });

  test('a file needing a plugin the local project lacks says which, and runs nothing', () => {
    const d = project({ 'conjectures/a.yaml': MAJ });
    runCli(['check'], { cwd: d });
    const text = readFileSync(join(d, 'counterexamples', 'maj-bounded-by-inv.yaml'), 'utf8').replace(
      'plugins: []',
      'plugins:\n  - { file: plugins/stats.mjs, sha256: "' + 'a'.repeat(64) + '", functions: [secretStat] }',
    );
    const elsewhere = tempDir('hunch-mail-');
    writeFileSync(join(elsewhere, 'cx.yaml'), text);
    const r = runCli(['replay', 'cx.yaml'], { cwd: elsewhere });
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/plugins\/stats\.mjs .*secretStat/);
  });
});

describe('init and junit', { timeout: 120_000 }, () => {
  test('init writes hunch.yaml, an example and the union merge line; never overwrites', () => {
    const d = tempDir('hunch-init-');
    writeFileSync(join(d, '.gitattributes'), '*.png binary');
    const r = runCli(['init', 'proj'], { cwd: d });
    expect(r.code).toBe(0);
    expect(readFileSync(join(d, 'proj', '.gitattributes'), 'utf8')).toBe('hunch-ledger.jsonl merge=union\n');
    expect(existsSync(join(d, 'proj', 'hunch.yaml'))).toBe(true);
    expect(runCli(['check'], { cwd: join(d, 'proj') }).code).toBe(0);
    expect(runCli(['init', '.'], { cwd: d }).code).toBe(0);
    expect(readFileSync(join(d, '.gitattributes'), 'utf8')).toBe('*.png binary\nhunch-ledger.jsonl merge=union\n');
    const again = runCli(['init', 'proj'], { cwd: d });
    expect(again.stdout).toMatch(/kept +proj\/hunch\.yaml/);
  });

  test('--junit writes one testcase per conjecture, failing on a contradicted expect', () => {
    const d = project({ 'conjectures/a.yaml': INVERSE('1..4') + '---\n' + MAJ.replace('expect: fails', 'expect: holds') });
    const r = runCli(['check', '--junit', 'report.xml'], { cwd: d });
    expect(r.code).toBe(1);
    const xml = readFileSync(join(d, 'report.xml'), 'utf8');
    expect(xml).toMatch(/<testsuites name="hunch" tests="2" failures="1" errors="0"/);
    expect(xml).toMatch(/<testcase classname="conjectures\/a.yaml" name="inverse-keeps-inversions"/);
    expect(xml).toMatch(/<failure type="contradicts-expect"[^>]*>counterexample \(exhaustive, n = 3\):\n {2}n = 3/);
  });
});
