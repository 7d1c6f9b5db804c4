// The ledger (CLI.md): an append-only file of JSON lines, one record per finished piece of work.
//
// Safety with several writers: every record is ONE write() of one complete line on a descriptor
// opened with O_APPEND. On a local Linux filesystem such a write lands whole at the end of the file
// (the kernel positions and writes it under the inode lock), so concurrent `hunch check` processes
// neither lose nor interleave records; our lines are a few hundred bytes, far below a page. A process
// killed between records leaves only whole lines; a torn line (a crash inside the kernel write, a
// full disk, a network filesystem) is recognised when reading, reported and ignored.

import { parseShard } from '../runner/work/slicing.js';
import { closeSync, constants, fstatSync, openSync, readFileSync, readSync, writeSync } from 'node:fs';
import { checkWritablePath } from './atomic-write.js';
import { hostname } from 'node:os';
import { randomBytes } from 'node:crypto';
import { InputError } from '../base/errors.js';
import type { CheckedPiece, ConjectureResult, Phase } from '../runner/result.js';
import { TOOL_VERSION } from '../version.js';

/** The format version of a ledger record. A reader skips (and reports) records from a later version. */
export const LEDGER_VERSION = 1;

export type PieceOutcome = 'holds' | 'fails' | 'incomplete';

export interface LedgerRecord {
  v: number;
  id: string;
  /** The conjecture hash (src/language/conjecture/conjecture-hash.ts) when the piece was checked. */
  hash: string;
  /** The tool version that checked it. */
  tool: string;
  phase: Phase;
  /** The size: the first range binding's value, { n: 5 } (empty for a conjecture without one). */
  size: Record<string, number>;
  cases: number;
  failures: number;
  skipped: number;
  /** The slice, "3/8"; absent for the whole size. */
  shard?: string;
  /** The seed of a sampled piece. */
  seed?: string;
  /** Present (true) when a budget or interrupt stopped the piece: it then never counts as verified. */
  partial?: true;
  ms: number;
  /** ISO 8601 time the piece was finished. */
  at: string;
  host: string;
  /** One id per `hunch check` process, to tell runs apart. */
  run: string;
  /** holds: no failure; fails: at least one; incomplete: partial without a failure. */
  outcome: PieceOutcome;
}

const PHASES: readonly string[] = ['exhaustive', 'sample', 'regression'];
const OUTCOMES: readonly string[] = ['holds', 'fails', 'incomplete'];
const ID = /^[a-z0-9][a-z0-9-]*$/;
const HASH = /^[0-9a-f]{64}$/;

/** A record as one line, keys in a fixed order (so identical records are identical lines). */
export function recordLine(r: LedgerRecord): string {
  const o: Record<string, unknown> = {
    v: r.v,
    id: r.id,
    hash: r.hash,
    tool: r.tool,
    phase: r.phase,
    size: sortedSize(r.size),
    cases: r.cases,
    failures: r.failures,
    skipped: r.skipped,
  };
  if (r.shard !== undefined) o.shard = r.shard;
  if (r.seed !== undefined) o.seed = r.seed;
  if (r.partial) o.partial = true;
  Object.assign(o, { ms: r.ms, at: r.at, host: r.host, run: r.run, outcome: r.outcome });
  return JSON.stringify(o);
}

function sortedSize(s: Record<string, number>): Record<string, number> {
  const out: Record<string, number> = {};
  for (const k of Object.keys(s).sort()) out[k] = s[k];
  return out;
}

export interface RunContext {
  tool: string;
  host: string;
  run: string;
}

export function newRunContext(): RunContext {
  return { tool: TOOL_VERSION, host: hostname(), run: randomBytes(6).toString('hex') };
}

export function pieceOutcome(p: Pick<CheckedPiece, 'failures' | 'partial'>): PieceOutcome {
  return p.failures > 0 ? 'fails' : p.partial ? 'incomplete' : 'holds';
}

/** The ledger record of a finished piece. */
export function pieceRecord(id: string, hash: string, piece: CheckedPiece, ctx: RunContext, at: Date = new Date()): LedgerRecord {
  const r: LedgerRecord = {
    v: LEDGER_VERSION,
    id,
    hash,
    tool: ctx.tool,
    phase: piece.phase,
    size: { ...piece.size },
    cases: piece.cases,
    failures: piece.failures,
    skipped: piece.skipped,
    ms: Math.round(piece.ms * 10) / 10,
    at: at.toISOString(),
    host: ctx.host,
    run: ctx.run,
    outcome: pieceOutcome(piece),
  };
  if (piece.shard !== undefined) r.shard = piece.shard;
  if (piece.seed !== undefined) r.seed = piece.seed;
  if (piece.partial) r.partial = true;
  return r;
}

// ---------------------------------------------------------------------------------------------
// Writing

/** An open ledger for one process: every append is one write of one whole line. */
export class LedgerWriter {
  private fd: number | null = null;
  readonly ctx: RunContext;

  constructor(
    readonly path: string,
    ctx?: RunContext,
    /** The project root the ledger must lie in (links resolved), when it comes from hunch.yaml. */
    readonly within?: string,
  ) {
    this.ctx = ctx ?? newRunContext();
  }

  /**
   * Open (creating) the ledger now, so that a ledger hunch cannot write is reported before any work
   * is done. A link is never followed: the ledger is appended to only as the file it names.
   */
  open(): number {
    if (this.fd !== null) return this.fd;
    checkWritablePath(this.path, { within: this.within, what: 'the ledger' });
    try {
      // O_APPEND | O_CREAT, readable for the tail check below; O_NOFOLLOW: a link is refused.
      this.fd = openSync(this.path, constants.O_APPEND | constants.O_CREAT | constants.O_RDWR | constants.O_NOFOLLOW, 0o644);
    } catch (e) {
      const code = (e as NodeJS.ErrnoException).code;
      const why =
        code === 'ELOOP'
          ? 'it is a symbolic link, and hunch never writes through a link'
          : code === 'EISDIR'
            ? 'it is a folder'
            : (e as Error).message;
      throw new InputError(`cannot open the ledger ${this.path} for writing: ${why}`);
    }
    if (!fstatSync(this.fd).isFile()) {
      closeSync(this.fd);
      this.fd = null;
      throw new InputError(`cannot use ${this.path} as the ledger: it is not a regular file`);
    }
    return this.fd;
  }

  /** True when the file is non-empty and its last byte is not a newline (a torn line from a killed writer). */
  private tornTail(fd: number): boolean {
    const size = fstatSync(fd).size;
    if (size === 0) return false;
    const b = Buffer.alloc(1);
    readSync(fd, b, 0, 1, size - 1);
    return b[0] !== 0x0a;
  }

  append(record: LedgerRecord): void {
    const fd = this.open();
    // After a torn line, start ours on a fresh line (a race between two repairers yields a blank line, which readers skip).
    const line = (this.tornTail(fd) ? '\n' : '') + recordLine(record) + '\n';
    const buf = Buffer.from(line, 'utf8');
    let n: number;
    try {
      n = writeSync(fd, buf);
    } catch (e) {
      throw new InputError(`cannot write to the ledger ${this.path}: ${(e as Error).message}`);
    }
    if (n !== buf.length) throw new InputError(`the ledger ${this.path} took only ${n} of ${buf.length} bytes (is the disk full?)`);
  }

  /** Record a finished piece of a conjecture (the runner's onPiece hook). */
  piece(id: string, hash: string, piece: CheckedPiece): void {
    this.append(pieceRecord(id, hash, piece, this.ctx));
  }

  /**
   * Record what a finished result adds beyond its pieces: a counterexample found by the regression
   * case (counterexamples/<id>.yaml tried first) is one case that fails.
   */
  result(r: ConjectureResult): void {
    const c = r.counterexample;
    if (c && c.phase === 'regression') {
      this.piece(r.id, r.hash, { phase: 'regression', size: c.size, cases: 1, failures: 1, skipped: 0, ms: 0 });
    }
  }

  close(): void {
    if (this.fd !== null) closeSync(this.fd);
    this.fd = null;
  }
}

/** Append records to a ledger file, one write per line. */
export function appendRecords(path: string, records: readonly LedgerRecord[]): void {
  const w = new LedgerWriter(path);
  try {
    for (const r of records) w.append(r);
  } finally {
    w.close();
  }
}

// ---------------------------------------------------------------------------------------------
// Reading

export interface LedgerContents {
  records: LedgerRecord[];
  /** The 1-based line of each record, parallel to records. */
  lines: number[];
  /** Torn lines and records from later versions: reported, skipped. */
  warnings: string[];
}

function bad(file: string, line: number, what: string, text: string): InputError {
  return new InputError(
    `line ${line} of the ledger is not a valid record: ${what}. The ledger was damaged or edited by hand; ` +
      'correct or delete that line (hunch never rewrites a ledger it cannot read).',
    { file, line, column: 1 },
    printable(text.length > 120 ? text.slice(0, 117) + '...' : text),
  );
}

/** A damaged line as it may be shown on a terminal: control and undecodable bytes escaped. */
function printable(text: string): string {
  return text.replace(/[\u0000-\u001f\u007f-\u009f\ufffd]/g, (c) =>
    c === '\ufffd' ? '?' : `\\x${c.charCodeAt(0).toString(16).padStart(2, '0')}`,
  );
}

const isCount = (x: unknown) => typeof x === 'number' && Number.isSafeInteger(x) && x >= 0;

/** Validate a parsed version-1 record; returns the reason it is invalid, or null. */
function invalidReason(o: Record<string, unknown>): string | null {
  if (typeof o.id !== 'string' || !ID.test(o.id)) return 'the id is missing or not a conjecture id';
  if (typeof o.hash !== 'string' || !HASH.test(o.hash)) return 'the hash is not 64 hexadecimal digits';
  if (typeof o.tool !== 'string') return 'the tool version is missing';
  if (typeof o.phase !== 'string' || !PHASES.includes(o.phase)) return `the phase must be one of ${PHASES.join(', ')}`;
  if (!o.size || typeof o.size !== 'object' || Array.isArray(o.size)) return 'the size must be a map such as {"n": 5}';
  for (const v of Object.values(o.size)) if (typeof v !== 'number' || !Number.isSafeInteger(v)) return 'a size value is not a whole number';
  for (const k of ['cases', 'failures', 'skipped']) if (!isCount(o[k])) return `${k} must be a nonnegative whole number`;
  if ((o.failures as number) > (o.cases as number)) return 'failures exceed cases';
  if (o.shard !== undefined && (typeof o.shard !== 'string' || !parseShard(o.shard))) return 'the shard must look like "3/8"';
  if (o.seed !== undefined && typeof o.seed !== 'string') return 'the seed must be a string';
  if (o.partial !== undefined && o.partial !== true) return 'partial must be true when present';
  if (typeof o.ms !== 'number' || !(o.ms >= 0)) return 'ms must be a nonnegative number';
  if (typeof o.at !== 'string' || Number.isNaN(Date.parse(o.at))) return 'the time is not an ISO date';
  if (typeof o.host !== 'string') return 'the host is missing';
  if (typeof o.run !== 'string') return 'the run id is missing';
  if (typeof o.outcome !== 'string' || !OUTCOMES.includes(o.outcome)) return `the outcome must be one of ${OUTCOMES.join(', ')}`;
  const expected = pieceOutcome({ failures: o.failures as number, partial: o.partial as true | undefined });
  if (o.outcome !== expected) return `the outcome ${o.outcome} contradicts its counts (expected ${expected})`;
  return null;
}

/** Looks like the beginning of one of our records, cut short (we always write `{"v":` first). */
function looksTorn(text: string): boolean {
  return text.startsWith('{"v":') && !text.trimEnd().endsWith('}');
}

/** Parse ledger text. Throws InputError for a damaged line; torn lines and future versions become warnings. */
export function parseLedger(text: string, file: string): LedgerContents {
  const out: LedgerContents = { records: [], lines: [], warnings: [] };
  const lines = text.split('\n');
  const endsWithNewline = text.endsWith('\n');
  for (let i = 0; i < lines.length; i++) {
    // A byte-order mark (an editor that saved the file as "UTF-8 with BOM") is not part of the record.
    const raw = lines[i].replace(/\r$/, '').replace(/^\ufeff/, '');
    if (raw.trim() === '') continue;
    const lineNo = i + 1;
    const isLast = i === lines.length - 1 && !endsWithNewline;
    let o: unknown;
    try {
      o = JSON.parse(raw);
    } catch {
      if (isLast || looksTorn(raw)) {
        out.warnings.push(
          `${file}:${lineNo}: ignoring an unfinished record (a process was stopped while writing it); the work it described is not counted`,
        );
        continue;
      }
      throw bad(file, lineNo, 'it is not JSON', raw);
    }
    if (!o || typeof o !== 'object' || Array.isArray(o)) throw bad(file, lineNo, 'it is not a JSON object', raw);
    const rec = o as Record<string, unknown>;
    if (typeof rec.v !== 'number' || !Number.isSafeInteger(rec.v) || rec.v < 1)
      throw bad(file, lineNo, 'the format version "v" is missing', raw);
    if (rec.v > LEDGER_VERSION) {
      out.warnings.push(
        `${file}:${lineNo}: skipping a record of ledger format ${rec.v}, written by a newer hunch (this one reads format ${LEDGER_VERSION}); upgrade hunch to count it`,
      );
      continue;
    }
    const why = invalidReason(rec);
    if (why) throw bad(file, lineNo, why, raw);
    out.records.push(rec as unknown as LedgerRecord);
    out.lines.push(lineNo);
  }
  return out;
}

/** Read a ledger file; a missing file is an empty ledger. */
export function readLedger(path: string): LedgerContents {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === 'ENOENT') return { records: [], lines: [], warnings: [] };
    throw new InputError(`cannot read the ledger ${path}: ${(e as Error).message}`);
  }
  return parseLedger(text, path);
}
