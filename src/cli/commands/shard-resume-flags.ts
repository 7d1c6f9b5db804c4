// The options of `hunch check` for shards and resumed runs: --shard I/K and --resume.

import { InputError } from '../../base/errors.js';
import type { CompiledConjecture } from '../../language/conjecture/compiled.js';
import { readLedger } from '../../records/ledger.js';
import type { HeldRecord } from '../../runner/work/resume.js';
import { parseShardOption, type Shard } from '../../runner/work/slicing.js';

export function shardFlag(text: string | undefined): Shard | null {
  if (text === undefined) return null;
  const s = parseShardOption(text);
  if (!s) throw new InputError(`--shard must be I/K with 1 <= I <= K (for example --shard 3/8), got ${text}`);
  return s;
}

/** The ledger's records of the conjectures about to run, for --resume (the runner keeps those of the current hash). */
export function heldRecordsForResume(ledgerFlag: string | boolean, defaultLedger: string, compiled: CompiledConjecture[]): HeldRecord[] {
  if (ledgerFlag === false) throw new InputError('--resume continues from the ledger, so it cannot be used with --no-ledger');
  const path = typeof ledgerFlag === 'string' ? ledgerFlag : defaultLedger;
  const ids = new Set(compiled.map((cc) => cc.spec.id));
  return readLedger(path).records.filter((r) => ids.has(r.id));
}
