// Building ledger records for tests.
import type { LedgerRecord } from '../../src/records/ledger.js';

export const H1 = '1'.repeat(64);
export const H2 = '2'.repeat(64);

let clock = Date.parse('2025-01-01T00:00:00Z');

export function rec(over: Partial<LedgerRecord> = {}): LedgerRecord {
  clock += 1000;
  const failures = over.failures ?? 0;
  return {
    v: 1,
    id: 'c1',
    hash: H1,
    tool: '0.1.0',
    phase: 'exhaustive',
    size: { n: 1 },
    cases: 1,
    failures,
    skipped: 0,
    ms: 0.1,
    at: new Date(clock).toISOString(),
    host: 'h',
    run: 'r1',
    outcome: failures > 0 ? 'fails' : over.partial ? 'incomplete' : 'holds',
    ...over,
  };
}
