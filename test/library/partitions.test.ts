import { describe, expect, it } from 'vitest';
import * as fc from 'fast-check';
import { getFunction } from '../../src/library/registry.js';
import '../../src/library/partitions.js';
import { Partition } from '../../src/families/partitions/partition.js';
import { Tableau } from '../../src/families/tableaux/tableau.js';
import { partitions } from '../../src/families/partitions/partitions.js';
import { standardTableaux } from '../../src/families/tableaux/standardTableaux.js';
import { semistandardTableaux } from '../../src/families/tableaux/semistandardTableaux.js';
import { listAll } from '../families/partitions/uniformity.js';
import type { Value } from '../../src/values/value.js';

const call = (name: string, ...args: Value[]) => getFunction(name)!.impl(...args);
const P = (...parts: number[]) => new Partition(parts);

describe('partition functions', () => {
  it('size and length', () => {
    expect(call('size', P(3, 2, 1))).toBe(6);
    expect(call('size', Tableau.from([[1, 2], [3]]))).toBe(3);
    expect(call('length', P(3, 2, 2))).toBe(3);
    expect(call('length', P())).toBe(0);
  });
  it('conjugate is an involution and transposes (Macdonald I.1)', () => {
    expect((call('conjugate', P(4, 2, 1)) as Partition).parts).toEqual([3, 2, 1, 1]);
    for (let n = 0; n <= 10; n++)
      for (const l of listAll(partitions, { n })) {
        const c = call('conjugate', l) as Partition;
        expect(Partition.from(c.parts).size).toBe(n);
        expect((call('conjugate', c) as Partition).parts).toEqual(l.parts);
      }
  });
  it("hooks and contents (Macdonald I.1 Examples 1 and 3: sum of hooks = n(lambda) + n(lambda') + |lambda|)", () => {
    expect(call('hooks', P(4, 2, 1))).toEqual([6, 4, 2, 1, 3, 1, 1]);
    expect(call('contents', P(2, 2))).toEqual([0, 1, -1, 0]);
    const nOf = (parts: number[]) => parts.reduce((s, p, i) => s + i * p, 0);
    for (let n = 0; n <= 9; n++)
      for (const l of listAll(partitions, { n })) {
        const h = call('hooks', l) as number[];
        const c = (call('conjugate', l) as Partition).parts;
        expect(h.reduce((s, x) => s + x, 0)).toBe(nOf(l.parts) + nOf(c) + n);
        // Sum of contents = n(lambda') - n(lambda) (Macdonald I.1 Ex. 3).
        expect((call('contents', l) as number[]).reduce((s, x) => s + x, 0)).toBe(nOf(c) - nOf(l.parts));
      }
  });
  it('syt agrees with enumeration and sums to OEIS A000085; ssytCount with enumeration', () => {
    const A000085 = [1, 1, 2, 4, 10, 26, 76, 232, 764, 2620];
    for (let n = 0; n < A000085.length; n++) {
      let s = 0;
      for (const l of listAll(partitions, { n })) {
        const f = call('syt', l) as number;
        if (n <= 7) expect(BigInt(f)).toBe(BigInt(listAll(standardTableaux, { parts: l.parts, n }).length));
        s += f;
        if (n <= 5)
          for (let m = 0; m <= 3; m++) expect(call('ssytCount', l, m)).toBe(listAll(semistandardTableaux, { parts: l.parts, m, n }).length);
      }
      expect(s).toBe(A000085[n]);
    }
    // Sum of (f^lambda)^2 = n! (Frobenius; Stanley EC2 Cor. 7.13.11).
    let sq = 0;
    for (const l of listAll(partitions, { n: 8 })) sq += (call('syt', l) as number) ** 2;
    expect(sq).toBe(40320);
    expect(call('syt', [3, 1])).toBe(3);
    expect(() => call('syt', [1, 3])).toThrow(/partition/);
  });
  it('dominance: a partial order refined by reverse lexicographic order (Macdonald I.1)', () => {
    expect(call('dominates', P(3, 1), P(2, 2))).toBe(true);
    expect(call('dominates', P(3, 1, 1, 1), P(2, 2, 2))).toBe(false);
    expect(call('dominates', P(2, 2, 2), P(3, 1, 1, 1))).toBe(false); // incomparable (smallest example, n = 6)
    expect(() => call('dominates', P(2), P(1))).toThrow(/same size/);
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 9 }), fc.nat(), fc.nat(), (n, i, j) => {
        const all = listAll(partitions, { n });
        const a = all[i % all.length],
          b = all[j % all.length];
        // Reverse lexicographic enumeration: if a dominates b then a comes first (or a = b).
        if (call('dominates', a, b) && !a.equals(b)) expect(all.indexOf(a)).toBeLessThan(all.indexOf(b));
        if (call('dominates', a, b) && call('dominates', b, a)) expect(a.equals(b)).toBe(true);
      }),
    );
  });
  it('staircase', () => {
    expect((call('staircase', 4) as Partition).parts).toEqual([4, 3, 2, 1]);
    expect((call('staircase', 0) as Partition).parts).toEqual([]);
  });
  it('constructors reject bad input with the value in the message', () => {
    expect(() => call('partition', [2, 3])).toThrow(/\[2, 3\]/);
    expect(() => call('setPartition', [[1], [3]])).toThrow(/out of range/);
    expect(() => call('dyck', 'UDD')).toThrow(/below/);
  });
});
