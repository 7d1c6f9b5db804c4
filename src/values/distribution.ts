// A distribution: a finite multiset of values (kind 'distribution'). Two distributions are equal
// when every value occurs the same number of times in both, which is how one states that two
// statistics are equidistributed: distribution(inv(w) for w in S) == distribution(maj(w) for w in S).

import { fail } from '../base/errors.js';
import { registerDecoder, decodeValue } from './decode.js';
import { encodeValue, own, valueKey, valueToText } from './operations.js';
import { compareValues } from './order.js';
import type { Structured } from './structured.js';
import type { Value } from './value.js';

interface Entry {
  value: Value;
  count: number;
}

export class Distribution implements Structured {
  readonly kind = 'distribution';
  private readonly entries = new Map<string, Entry>();
  private total = 0;
  private sorted: Entry[] | null = null;

  /** Add `times` occurrences of v (v is owned: a transient object is copied). */
  add(v: Value, times = 1): void {
    if (!Number.isSafeInteger(times) || times < 0) fail(`a multiplicity must be a nonnegative integer, got ${times}`);
    if (times === 0) return;
    const k = valueKey(v);
    const e = this.entries.get(k);
    if (e) e.count += times;
    else this.entries.set(k, { value: own(v), count: times });
    this.total += times;
    this.sorted = null;
  }

  static of(values: readonly Value[]): Distribution {
    const d = new Distribution();
    for (const v of values) d.add(v);
    return d;
  }

  /** Number of elements counted with multiplicity. */
  get size(): number {
    return this.total;
  }

  /** How often v occurs (0 when it does not). */
  countOf(v: Value): number {
    return this.entries.get(valueKey(v))?.count ?? 0;
  }

  /** The distinct values with their counts, values in increasing order (values/order.ts). */
  pairs(): ReadonlyArray<{ readonly value: Value; readonly count: number }> {
    if (!this.sorted) this.sorted = [...this.entries.values()].sort((a, b) => compareValues(a.value, b.value));
    return this.sorted;
  }

  /** The distinct values, increasing. */
  support(): Value[] {
    return this.pairs().map((e) => e.value);
  }

  equals(other: Structured): boolean {
    const o = other as Distribution;
    if (o.total !== this.total || o.entries.size !== this.entries.size) return false;
    for (const [k, e] of this.entries) if (o.entries.get(k)?.count !== e.count) return false;
    return true;
  }

  key(): string {
    return [...this.entries.entries()]
      .sort((a, b) => (a[0] < b[0] ? -1 : a[0] > b[0] ? 1 : 0))
      .map(([k, e]) => `${k}*${e.count}`)
      .join(';');
  }

  /** distributionOf([[0, 1], [1, 2], [2, 2], [3, 1]]): each value with its multiplicity, an expression that evaluates back to it. */
  toText(): string {
    return `distributionOf([${this.pairs()
      .map((e) => `[${valueToText(e.value)}, ${e.count}]`)
      .join(', ')}])`;
  }

  /** {"distribution": [[value, count], ...]} with values encoded as in CLI.md. */
  encode(): unknown {
    return { distribution: this.pairs().map((e) => [encodeValue(e.value), e.count]) };
  }
}

registerDecoder('distribution', (x) => {
  if (!Array.isArray(x)) fail('a distribution is recorded as a list of [value, count] pairs');
  const d = new Distribution();
  for (const pair of x) {
    if (!Array.isArray(pair) || pair.length !== 2 || typeof pair[1] !== 'number') {
      fail('a distribution is recorded as a list of [value, count] pairs');
    }
    d.add(decodeValue(pair[0]), pair[1] as number);
  }
  return d;
});

export function isDistribution(v: unknown): v is Distribution {
  return v instanceof Distribution;
}
