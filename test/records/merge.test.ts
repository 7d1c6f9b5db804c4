import { readFileSync, writeFileSync } from 'node:fs';
import { tempDir } from '../helpers/temp-dirs.js';
import { join } from 'node:path';
import { Chalk } from 'chalk';
import { describe, expect, test } from 'vitest';
import { appendRecords, readLedger, recordLine } from '../../src/records/ledger.js';
import { coverageOf, mergeLedgers, mergeRecords } from '../../src/records/merge.js';
import { formatMerge } from '../../src/reports/merge-summary.js';
import { rec } from './fixtures.js';

const tmp = () => tempDir('hunch-merge-');

describe('merge', () => {
  test('exact duplicates are removed; different records kept, in time order', () => {
    const a = rec(),
      b = rec({ size: { n: 2 } }),
      c = rec({ size: { n: 3 } });
    const m = mergeRecords([
      [b, a],
      [a, c],
    ]);
    expect(m.records).toEqual([a, b, c]);
    expect(m.duplicates).toBe(1);
  });

  test('coverage per size: complete from slices or whole, missing slices named', () => {
    const rs = [
      rec({ size: { n: 4 } }),
      rec({ size: { n: 5 }, shard: '1/3', cases: 10 }),
      rec({ size: { n: 5 }, shard: '2/3', cases: 10 }),
      rec({ size: { n: 5 }, shard: '3/3', cases: 10 }),
      rec({ size: { n: 6 }, shard: '2/3', cases: 10 }),
    ];
    const cov = coverageOf(rs);
    expect(cov).toHaveLength(1);
    expect(cov[0].sizes).toEqual([
      { size: { n: 4 }, complete: true, slices: null, cases: 1 },
      { size: { n: 5 }, complete: true, slices: 3, cases: 30 },
      { size: { n: 6 }, complete: false, slices: null, of: 3, missing: [1, 3], cases: 10 },
    ]);
  });

  test('merging files keeps what OUT already holds and writes it atomically', () => {
    const d = tmp();
    const a = rec({ shard: '1/2' }),
      b = rec({ shard: '2/2' }),
      old = rec({ id: 'c2' });
    appendRecords(join(d, 'a.jsonl'), [a]);
    appendRecords(join(d, 'b.jsonl'), [b, a]);
    appendRecords(join(d, 'out.jsonl'), [old]);
    const m = mergeLedgers([join(d, 'a.jsonl'), join(d, 'b.jsonl')], join(d, 'out.jsonl'));
    expect(readLedger(join(d, 'out.jsonl')).records).toEqual([a, b, old].sort((x, y) => (x.at < y.at ? -1 : 1)));
    expect(m.duplicates).toBe(1);
    const text = formatMerge(m, join(d, 'out.jsonl'), new Chalk({ level: 0 }));
    expect(text).toMatch(/complete {2}n = 1: 2 cases from 2 slices/);
  });

  test('a damaged input stops the merge and writes nothing', () => {
    const d = tmp();
    writeFileSync(join(d, 'bad.jsonl'), 'garbage\n' + recordLine(rec()) + '\n');
    appendRecords(join(d, 'out.jsonl'), [rec()]);
    const before = readFileSync(join(d, 'out.jsonl'), 'utf8');
    expect(() => mergeLedgers([join(d, 'bad.jsonl')], join(d, 'out.jsonl'))).toThrow(/line 1 of the ledger/);
    expect(readFileSync(join(d, 'out.jsonl'), 'utf8')).toBe(before);
  });
});
