import { readFileSync, writeFileSync } from 'node:fs';
import { tempDir } from '../helpers/temp-dirs.js';
import { join } from 'node:path';
import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { InputError } from '../../src/base/errors.js';
import { appendRecords, LedgerWriter, parseLedger, pieceRecord, readLedger, recordLine } from '../../src/records/ledger.js';
import { parseShard } from '../../src/runner/work/slicing.js';
import { H1, rec } from './fixtures.js';

const tmp = () => tempDir('hunch-ledger-');

describe('ledger records', () => {
  test('a piece becomes a record with its outcome', () => {
    const ctx = { tool: '0.1.0', host: 'h', run: 'r' };
    const r = pieceRecord(
      'c1',
      H1,
      { phase: 'exhaustive', size: { n: 3 }, cases: 6, failures: 1, skipped: 0, ms: 1.234 },
      ctx,
      new Date(0),
    );
    expect(r).toMatchObject({ v: 1, id: 'c1', outcome: 'fails', ms: 1.2, at: '1970-01-01T00:00:00.000Z' });
    expect(
      pieceRecord('c1', H1, { phase: 'sample', size: { n: 9 }, cases: 6, failures: 0, skipped: 0, ms: 1, seed: 's', shard: '2/4' }, ctx),
    ).toMatchObject({ outcome: 'holds', seed: 's', shard: '2/4' });
    expect(
      pieceRecord('c1', H1, { phase: 'sample', size: { n: 9 }, cases: 6, failures: 0, skipped: 0, ms: 1, partial: true }, ctx).outcome,
    ).toBe('incomplete');
  });

  test('shards parse', () => {
    expect(parseShard('3/8')).toEqual({ index: 3, of: 8 });
    expect(parseShard('9/8')).toBeNull();
    expect(parseShard('0/8')).toBeNull();
    expect(parseShard('x')).toBeNull();
  });

  test('records round-trip through a line (property)', () => {
    fc.assert(
      fc.property(
        fc.record({
          cases: fc.nat(),
          skipped: fc.nat(),
          n: fc.integer({ min: -5, max: 50 }),
          shard: fc.option(fc.integer({ min: 1, max: 9 })),
          seed: fc.option(fc.string()),
          host: fc.string(),
          ms: fc.double({ min: 0, max: 1e9, noNaN: true }),
        }),
        (x) => {
          const r = rec({
            cases: x.cases,
            skipped: x.skipped,
            size: { n: x.n },
            host: x.host,
            ms: x.ms,
            ...(x.shard ? { shard: `${x.shard}/9` } : {}),
            ...(x.seed !== null ? { seed: x.seed } : {}),
          });
          const back = parseLedger(recordLine(r) + '\n', 'l').records[0];
          expect(back).toEqual(r);
          expect(recordLine(back)).toBe(recordLine(r));
        },
      ),
    );
  });

  test('appends and reads back; a missing ledger is empty', () => {
    const p = join(tmp(), 'l.jsonl');
    expect(readLedger(p)).toEqual({ records: [], lines: [], warnings: [] });
    const a = rec(),
      b = rec({ size: { n: 2 } });
    appendRecords(p, [a]);
    appendRecords(p, [b]);
    expect(readLedger(p).records).toEqual([a, b]);
    expect(readFileSync(p, 'utf8').split('\n')).toHaveLength(3);
  });

  test('a torn last line is reported and ignored; the next append starts a fresh line', () => {
    const p = join(tmp(), 'l.jsonl');
    const a = rec();
    writeFileSync(p, recordLine(a) + '\n' + recordLine(rec()).slice(0, 40));
    const r1 = readLedger(p);
    expect(r1.records).toEqual([a]);
    expect(r1.warnings[0]).toMatch(/l\.jsonl:2: ignoring an unfinished record/);
    const b = rec({ size: { n: 7 } });
    new LedgerWriter(p).append(b);
    const r2 = readLedger(p);
    expect(r2.records).toEqual([a, b]);
    expect(r2.warnings).toHaveLength(1); // the torn fragment is still recognised, now in the middle
  });

  test('a record of a future format is reported and skipped', () => {
    const a = rec();
    const text = recordLine(a) + '\n' + JSON.stringify({ v: 2, id: 'c1', whatever: true }) + '\n';
    const r = parseLedger(text, 'l');
    expect(r.records).toEqual([a]);
    expect(r.warnings[0]).toMatch(/format 2.*newer hunch/);
  });

  test('a garbled line in the middle is an error naming the line, and the file is left alone', () => {
    const p = join(tmp(), 'l.jsonl');
    const text = recordLine(rec()) + '\nthis is not json\n' + recordLine(rec()) + '\n';
    writeFileSync(p, text);
    expect(() => readLedger(p)).toThrow(InputError);
    try {
      readLedger(p);
    } catch (e) {
      expect((e as InputError).pos).toMatchObject({ file: p, line: 2 });
      expect((e as Error).message).toMatch(/line 2 of the ledger is not a valid record: it is not JSON/);
    }
    expect(readFileSync(p, 'utf8')).toBe(text);
  });

  test.each([
    ['a hand-edited hash that is not a hash', { hash: 'abc' }, /hash/],
    ['an outcome contradicting its counts', { outcome: 'holds', failures: 2, cases: 3 }, /contradicts/],
    ['failures above cases', { failures: 4, cases: 3, outcome: 'fails' }, /exceed/],
    ['a bad shard', { shard: '5/4' }, /shard/],
    ['no version', { v: undefined }, /version/],
  ])('%s is an error', (_w, over, msg) => {
    const line = JSON.stringify({ ...rec(), ...over });
    expect(() => parseLedger(recordLine(rec()) + '\n' + line + '\n' + recordLine(rec()) + '\n', 'l')).toThrow(msg);
  });

  test('a hand-edited but well-formed hash reads fine (status then shows it as stale)', () => {
    const r = rec({ hash: 'f'.repeat(64) });
    expect(parseLedger(recordLine(r) + '\n', 'l').records[0].hash).toBe('f'.repeat(64));
  });

  test('a last line without newline that is complete is kept', () => {
    const a = rec();
    expect(parseLedger(recordLine(a), 'l').records).toEqual([a]);
  });

  test('blank lines (from a repaired torn tail) are skipped', () => {
    const a = rec();
    expect(parseLedger('\n' + recordLine(a) + '\n\n', 'l').records).toEqual([a]);
  });
});
