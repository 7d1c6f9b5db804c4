// Decoding CLI.md's record encoding back into values (counterexample files, replay). Each object
// kind registers its decoder next to its class; a one-key map {"permutation": [...]} is decoded by
// the decoder registered under that key.

import { fail } from '../base/errors.js';
import { parseScalar } from '../numbers/rational.js';
import { normBig } from '../numbers/integer.js';
import type { Value } from './value.js';

type Decoder = (payload: unknown) => Value;
const decoders = new Map<string, Decoder>();

export function registerDecoder(key: string, d: Decoder): void {
  decoders.set(key, d);
}

/**
 * Decode a record value. Strings that look like exact numbers are numbers (CLI.md encodes big
 * integers and rationals as strings); `asString` lists binding names known to be strings.
 */
export function decodeValue(x: unknown): Value {
  if (typeof x === 'number') {
    if (!Number.isSafeInteger(x)) fail(`not an exact integer in a record: ${x}`);
    return x;
  }
  if (typeof x === 'boolean') return x;
  if (typeof x === 'string') {
    if (/^-?\d+(\/\d+)?$/.test(x)) return x.includes('/') ? parseScalar(x) : normBig(BigInt(x));
    return x;
  }
  if (Array.isArray(x)) return x.map(decodeValue);
  if (x && typeof x === 'object') {
    const keys = Object.keys(x);
    if (keys.length === 1 && decoders.has(keys[0])) return decoders.get(keys[0])!((x as Record<string, unknown>)[keys[0]]);
    fail(`cannot read the value ${JSON.stringify(x).slice(0, 80)}: expected a one-key map such as {"permutation": [...]}`);
  }
  fail(`cannot read the value ${JSON.stringify(x)}`);
}

export function knownEncodings(): string[] {
  return [...decoders.keys()];
}
