// Transpose, descents and maj of standard tableaux, and promotion and evacuation of semistandard
// tableaux by Bender–Knuth involutions, against published identities.

import { describe, expect, it } from 'vitest';
import '../../src/library/index.js';
import { getFunction } from '../../src/library/registry.js';
import { Partition, conjugateParts } from '../../src/families/partitions/partition.js';
import { Tableau } from '../../src/families/tableaux/tableau.js';
import { standardTableaux } from '../../src/families/tableaux/standardTableaux.js';
import { semistandardTableaux } from '../../src/families/tableaux/semistandardTableaux.js';
import { partitions } from '../../src/families/partitions/partitions.js';
import { hookLengths } from '../../src/families/tableaux/shapes.js';
import { qfactorialCoefficients } from '../../src/library/qanalogs.js';
import { promotionRows, evacuationRows } from '../../src/library/tableaux.js';
import { evacuationBK, promotionBK } from '../../src/library/tableaux/benderKnuth.js';
import { nOf } from '../../src/library/words/charge.js';
import type { Value } from '../../src/values/value.js';

const call = (name: string, ...args: Value[]): Value => getFunction(name)!.impl(...args);
const syts = (shape: number[]) => {
  const out: Tableau[] = [];
  standardTableaux.enumerate(
    standardTableaux.prepare([new Partition(shape)] as never),
    (t: Tableau) => void out.push(new Tableau(t.rows.map((r) => r.slice()))),
  );
  return out;
};
const ssyts = (shape: number[], m: number) => {
  const out: Tableau[] = [];
  semistandardTableaux.enumerate(
    semistandardTableaux.prepare([new Partition(shape), m] as never),
    (t: Tableau) => void out.push(new Tableau(t.rows.map((r) => r.slice()))),
  );
  return out;
};
const shapes = (n: number) => {
  const out: number[][] = [];
  partitions.enumerate({ n }, (l) => void out.push(l.parts.slice()));
  return out;
};
const key = (t: number[][]) => JSON.stringify(t);

describe('descents, maj and transpose of standard tableaux', () => {
  it('sum of q^maj(T) = q^n(lambda) [n]_q! / prod [h]_q (Stanley, EC2, Cor. 7.21.5), n <= 7', () => {
    for (let n = 1; n <= 7; n++)
      for (const sh of shapes(n)) {
        const dist: number[] = [];
        for (const t of syts(sh)) {
          const m = call('maj', t) as number;
          while (dist.length <= m) dist.push(0);
          dist[m]++;
        }
        // dist * prod [h]_q == q^n(lambda) [n]_q!
        let prod = dist;
        for (const h of hookLengths(sh).flat()) {
          const out = new Array(prod.length + h - 1).fill(0);
          prod.forEach((c, d) => {
            for (let e = 0; e < h; e++) out[d + e] += c;
          });
          prod = out;
        }
        while (prod.length && prod[prod.length - 1] === 0) prod.pop();
        expect(prod, `shape ${sh}`).toEqual([...new Array(nOf(sh)).fill(0), ...qfactorialCoefficients(n).map(Number)]);
      }
  });

  it('the descents of T are the non-descents of its transpose, and des + des(transpose) = n - 1 (n <= 6)', () => {
    for (let n = 1; n <= 6; n++)
      for (const sh of shapes(n))
        for (const t of syts(sh)) {
          const tt = call('transpose', t) as Tableau;
          expect(tt.shapeParts()).toEqual(conjugateParts(sh));
          expect(tt.isStandard()).toBe(true);
          const d = call('descents', t) as number[],
            dt = call('descents', tt) as number[];
          expect([...d, ...dt].sort((a, b) => a - b)).toEqual(Array.from({ length: n - 1 }, (_, i) => i + 1));
          expect((call('des', t) as number) + (call('des', tt) as number)).toBe(n - 1);
        }
  });

  it('worked example and refusals', () => {
    const t = Tableau.from([[1, 2, 4], [3]]);
    expect(call('descents', t)).toEqual([2]);
    expect(call('maj', t)).toBe(2);
    expect(() => call('transpose', Tableau.from([[1, 1]]))).toThrow(/standard tableau/);
    expect(() => call('maj', Tableau.from([[1, 1]]))).toThrow(/standard tableau/);
  });
});

describe('promotion and evacuation by Bender–Knuth involutions', () => {
  it('agree with the jeu de taquin definitions on standard tableaux (m = n), n <= 7', () => {
    for (let n = 1; n <= 7; n++)
      for (const sh of shapes(n))
        for (const t of syts(sh)) {
          expect(key(promotionBK(t.rows, n))).toBe(key(promotionRows(t.rows)));
          expect(key(evacuationBK(t.rows, n))).toBe(key(evacuationRows(t.rows)));
        }
  });

  it('on semistandard tableaux: evacuation is an involution, evacuation o promotion = promotion^-1 o evacuation (Stanley, EJC 16(2) (2009), §2), each a bijection of SSYT(lambda, m)', () => {
    for (const [sh, m] of [
      [[2, 1], 3],
      [[3, 1], 4],
      [[2, 2], 4],
      [[3, 2, 1], 4],
      [[2, 1, 1], 5],
    ] as [number[], number][]) {
      const all = ssyts(sh, m);
      const keys = new Set(all.map((t) => key(t.rows)));
      const promoted = new Set<string>();
      for (const t of all) {
        const p = promotionBK(t.rows, m),
          e = evacuationBK(t.rows, m);
        expect(keys.has(key(p))).toBe(true);
        promoted.add(key(p));
        expect(key(evacuationBK(e, m))).toBe(key(t.rows));
        // epsilon(partial(T)) = partial^-1(epsilon(T)), i.e. partial(epsilon(partial(T))) = epsilon(T)
        expect(key(promotionBK(evacuationBK(p, m), m))).toBe(key(e));
      }
      expect(promoted.size).toBe(all.length);
    }
  });

  it('promotion^m = id on semistandard tableaux of rectangular shape with entries in 1..m (Rhoades, J. Combin. Theory A 117 (2010))', () => {
    for (const [sh, m] of [
      [[2, 2], 3],
      [[2, 2], 4],
      [[3, 3], 4],
      [[2, 2, 2], 4],
    ] as [number[], number][]) {
      for (const t of ssyts(sh, m)) {
        let rows = t.rows;
        for (let k = 0; k < m; k++) rows = promotionBK(rows, m);
        expect(key(rows)).toBe(key(t.rows));
      }
    }
  });

  it('the library functions: m defaults to the largest entry and must cover it', () => {
    const t = Tableau.from([[1, 1, 2], [2]]);
    expect((call('promotion', t) as Tableau).rows).toEqual(promotionBK(t.rows, 2));
    expect((call('evacuation', t, 3) as Tableau).rows).toEqual(evacuationBK(t.rows, 3));
    expect(() => call('promotion', t, 1)).toThrow(/m >= the largest entry 2/);
  });
});
