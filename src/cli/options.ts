// Parsing the values of command-line options; a bad value is an InputError (exit 2).

import { InputError } from '../base/errors.js';

/** "n=1..6" or "n=5" -> [name, lo, hi]. */
export function parseRangeOption(text: string, option: string): [string, number, number] {
  const m = /^\s*([A-Za-z_][A-Za-z0-9_]*)\s*=\s*(-?\d+)\s*(?:\.\.\s*(-?\d+))?\s*$/.exec(text);
  if (!m) throw new InputError(`${option} takes NAME=A..B (for example ${option} n=1..6), not "${text}"`);
  const lo = Number(m[2]),
    hi = m[3] === undefined ? lo : Number(m[3]);
  if (!Number.isSafeInteger(lo) || !Number.isSafeInteger(hi)) throw new InputError(`${option}: the bounds must be integers`);
  if (hi < lo) throw new InputError(`${option} ${text}: the range is empty`);
  return [m[1], lo, hi];
}

/** "30s", "5m", "2h", "1500ms", "90" (seconds) -> milliseconds. */
export function parseDuration(text: string, option = '--budget'): number {
  const m = /^\s*(\d+)\s*(ms|s|m|min|h)?\s*$/.exec(text);
  if (!m) throw new InputError(`${option} takes a duration such as 30s, 5m or 2h, not "${text}"`);
  const n = Number(m[1]);
  const unit = m[2] ?? 's';
  return n * (unit === 'ms' ? 1 : unit === 's' ? 1000 : unit === 'h' ? 3_600_000 : 60_000);
}

export function parseCount(text: string, option: string): number {
  if (!/^\s*\d+\s*$/.test(text)) throw new InputError(`${option} takes a nonnegative whole number, not "${text}"`);
  return Number(text);
}

/** "--let NAME=EXPR" -> [name, expression text]. */
export function parseLetOption(text: string): [string, string] {
  const m = /^\s*([A-Za-z_][A-Za-z0-9_]*)\s*=(.*)$/s.exec(text);
  if (!m) throw new InputError(`--let takes NAME=EXPR (for example --let m=n+1), not "${text}"`);
  return [m[1], m[2]];
}

export function collect(value: string, previous: string[] = []): string[] {
  return [...previous, value];
}
