import { Chalk } from 'chalk';
import { describe, expect, test } from 'vitest';
import { computeStatus, conjectureStatus } from '../../src/records/status.js';
import { formatStatus } from '../../src/reports/status-table.js';
import { H1, H2, rec } from './fixtures.js';

const C = { id: 'c1', file: 'c.yaml', hash: H1, expect: 'holds' as const };
const plain = new Chalk({ level: 0 });

describe('status', () => {
  test('consecutive exhaustive sizes are compressed with their case total', () => {
    const rs = [1, 2, 3, 4].map((n) => rec({ size: { n }, cases: [1, 2, 6, 24][n - 1] }));
    const s = conjectureStatus(C, rs);
    expect(s.exhaustive.map((e) => e.size.n)).toEqual([1, 2, 3, 4]);
    expect(s.latest?.outcome).toBe('holds');
    expect(s.agrees).toBe(true);
    const text = formatStatus(computeStatus([C], rs), plain);
    expect(text).toContain('n = 1..4 exhaustive (33 cases)');
  });

  test('a size split in slices counts only when every slice is there, with the same hash', () => {
    const some = [rec({ size: { n: 5 }, shard: '1/3', cases: 40 }), rec({ size: { n: 5 }, shard: '3/3', cases: 40 })];
    let s = conjectureStatus(C, some);
    expect(s.exhaustive).toEqual([]);
    expect(s.unfinished).toEqual([{ size: { n: 5 }, slices: { 3: [1, 3] }, stopped: 0 }]);
    s = conjectureStatus(C, [...some, rec({ size: { n: 5 }, shard: '2/3', cases: 40, hash: H2 })]);
    expect(s.exhaustive).toEqual([]);
    expect(s.stale?.records).toBe(1);
    s = conjectureStatus(C, [...some, rec({ size: { n: 5 }, shard: '2/3', cases: 40, run: 'r2' })]);
    expect(s.exhaustive).toMatchObject([{ size: { n: 5 }, cases: 120, slices: 3 }]);
    expect(formatStatus(computeStatus([C], some), plain)).toMatch(/n = 5 is not verified: only slices 1, 3 of 3 present/);
  });

  test('slices of different K do not combine', () => {
    const s = conjectureStatus(C, [
      rec({ size: { n: 5 }, shard: '1/2' }),
      rec({ size: { n: 5 }, shard: '2/3' }),
      rec({ size: { n: 5 }, shard: '3/3' }),
    ]);
    expect(s.exhaustive).toEqual([]);
  });

  test('partial (stopped) pieces never count', () => {
    const s = conjectureStatus(C, [rec({ size: { n: 1 } }), rec({ size: { n: 2 }, partial: true, cases: 1, run: 'r2' })]);
    expect(s.exhaustive.map((e) => e.size.n)).toEqual([1]);
    expect(s.unfinished).toEqual([{ size: { n: 2 }, slices: {}, stopped: 1 }]);
    expect(s.latest?.outcome).toBe('incomplete');
    expect(s.agrees).toBeNull();
  });

  test('stale records are shown apart and never counted', () => {
    const rs = [rec({ size: { n: 1 }, hash: H2 }), rec({ size: { n: 2 }, hash: H2 }), rec({ size: { n: 1 } })];
    const s = conjectureStatus(C, rs);
    expect(s.exhaustive.map((e) => e.size.n)).toEqual([1]);
    expect(s.stale).toMatchObject({ records: 2, versions: 1 });
    expect(formatStatus(computeStatus([C], rs), plain)).toMatch(/2 stale records of 1 earlier version/);
  });

  test('a failing size is shown apart and the latest run decides the outcome', () => {
    const rs = [rec({ size: { n: 1 } }), rec({ size: { n: 2 } }), rec({ size: { n: 3 }, cases: 6, failures: 1 })];
    const fails = { ...C, expect: 'fails' as const };
    const s = conjectureStatus(fails, rs);
    expect(s.latest?.outcome).toBe('fails');
    expect(s.agrees).toBe(true);
    expect(formatStatus(computeStatus([fails], rs), plain)).toContain(
      'n = 1..2 exhaustive (2 cases); n = 3 exhaustive (6 cases, 1 failing)',
    );
    expect(conjectureStatus(C, rs).agrees).toBe(false);
  });

  test('sampled cases: the same seed is not counted twice, other seeds add up', () => {
    const rs = [
      rec({ phase: 'sample', size: { n: 9 }, cases: 100, seed: 'a' }),
      rec({ phase: 'sample', size: { n: 9 }, cases: 100, seed: 'a', run: 'r2' }),
      rec({ phase: 'sample', size: { n: 9 }, cases: 50, seed: 'b', run: 'r3' }),
      rec({ phase: 'sample', size: { n: 10 }, cases: 100, seed: 'a' }),
    ];
    const s = conjectureStatus(C, rs);
    expect(s.sampled).toMatchObject([
      { size: { n: 9 }, cases: 150, seeds: ['a', 'b'] },
      { size: { n: 10 }, cases: 100 },
    ]);
    expect(formatStatus(computeStatus([C], rs), plain)).toContain('n = 9..10 sampled (250 cases)');
  });

  test('never checked, and records of unknown conjectures', () => {
    const r = computeStatus([C], [rec({ id: 'gone' })]);
    expect(r.conjectures[0].latest).toBeNull();
    expect(r.unknown).toMatchObject([{ id: 'gone', records: 1 }]);
    const text = formatStatus(r, plain);
    expect(text).toContain('never checked');
    expect(text).toMatch(/gone: 1 record for a conjecture not among these files/);
  });

  test('no colour escapes with a level-0 chalk', () => {
    expect(formatStatus(computeStatus([C], [rec()]), plain)).not.toMatch(/\x1b\[/);
  });
});
