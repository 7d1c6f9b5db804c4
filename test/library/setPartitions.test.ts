// Set partition functions (src/library/setPartitions.ts; crossings and nestings in matchings.ts
// dispatch to the arc diagram), on worked examples and against the matching versions: a set
// partition whose blocks all have two elements is a perfect matching with the same arcs.

import { describe, expect, it } from 'vitest';
import '../../src/library/setPartitions.js';
import '../../src/library/matchings.js';
import { getFunction } from '../../src/library/registry.js';
import { SetPartition } from '../../src/families/setPartitions/setPartition.js';
import { matchings } from '../../src/families/matchings/matchings.js';
import type { Value } from '../../src/values/value.js';

const call = (name: string, ...args: Value[]): Value => getFunction(name)!.impl(...args);
const sp = (blocks: number[][]) => SetPartition.fromBlocks(blocks);

describe('set partition functions', () => {
  it('arcs, crossings and nestings of worked examples (Chen et al., Trans. AMS 359 (2007), §1)', () => {
    const s = sp([
      [1, 3, 4],
      [2, 5],
    ]);
    expect(call('partitionArcs', s)).toEqual([
      [1, 3],
      [2, 5],
      [3, 4],
    ]);
    expect(call('crossings', s)).toBe(1); // (1,3) and (2,5)
    expect(call('nestings', s)).toBe(1); // (3,4) inside (2,5)
    expect(call('isNoncrossing', s)).toBe(false);
    expect(call('isNoncrossing', sp([[1, 4], [2, 3], [5]]))).toBe(true);
  });

  it('agree with the matching functions on partitions into pairs (n <= 5 arcs)', () => {
    for (let n = 0; n <= 5; n++)
      matchings.enumerate({ n }, (m) => {
        const s = sp(m.arcs());
        expect(call('crossings', s)).toBe(call('crossings', m));
        expect(call('nestings', s)).toBe(call('nestings', m));
      });
  });
});
