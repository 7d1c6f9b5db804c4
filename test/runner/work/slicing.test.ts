// The slice split depends only on the number of cases and on K, and shards partition the slices.

import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  chunkCount,
  chunkQuota,
  chunksOfShard,
  parseShardOption,
  sliceBounds,
  sliceCount,
  slicesOfShard,
} from '../../../src/runner/work/slicing.js';

describe('slices and shards', () => {
  it('slices cover 0..n-1 without overlap', () => {
    fc.assert(
      fc.property(fc.bigInt({ min: 0n, max: 10n ** 12n }), fc.integer({ min: 1, max: 300 }), (n, s) => {
        let at = 0n;
        for (let j = 0; j < s; j++) {
          const [lo, hi] = sliceBounds(n, s, j);
          expect(lo).toBe(at);
          expect(hi >= lo).toBe(true);
          at = hi;
        }
        expect(at).toBe(n);
      }),
    );
  });

  it('K shards own every slice exactly once', () => {
    fc.assert(
      fc.property(fc.bigInt({ min: 0n, max: 10n ** 9n }), fc.integer({ min: 1, max: 40 }), fc.boolean(), (n, k, cheap) => {
        const s = sliceCount(n, k, cheap);
        expect(s % k).toBe(0);
        const owned = Array.from({ length: k }, (_, i) => slicesOfShard(s, { index: i + 1, of: k }))
          .flat()
          .sort((a, b) => a - b);
        expect(owned).toEqual(Array.from({ length: s }, (_, j) => j));
        // A record "a/b" means the same cases whether b counted shards or slices.
        expect(sliceCount(n, s, cheap)).toBe(s);
      }),
    );
  });

  it('sample chunks share out the count exactly', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 100000 }), (count) => {
        const m = chunkCount(count);
        let sum = 0;
        for (let c = 0; c < m; c++) sum += chunkQuota(count, m, c);
        expect(sum).toBe(count);
        expect(chunksOfShard(m, { index: 1, of: 1 }).length).toBe(m);
      }),
    );
  });

  it('reads --shard I/K', () => {
    expect(parseShardOption('3/8')).toEqual({ index: 3, of: 8 });
    expect(parseShardOption('0/8')).toBeNull();
    expect(parseShardOption('9/8')).toBeNull();
    expect(parseShardOption('x')).toBeNull();
  });
});
