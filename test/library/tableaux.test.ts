import { describe, expect, it } from 'vitest';
import { getFunction } from '../../src/library/registry.js';
import { promotionRows, evacuationRows } from '../../src/library/tableaux.js';
import { standardTableaux } from '../../src/families/tableaux/standardTableaux.js';
import { partitions } from '../../src/families/partitions/partitions.js';
import { Tableau } from '../../src/families/tableaux/tableau.js';
import { Partition } from '../../src/families/partitions/partition.js';
import { listAll } from '../families/partitions/uniformity.js';

const key = (rows: number[][]) => rows.map((r) => r.join(',')).join('/');
const syt = (parts: number[]) => listAll(standardTableaux, { parts, n: parts.reduce((a, b) => a + b, 0) });

describe('tableau functions', () => {
  it('shape, content and the row reading word (Fulton, Young Tableaux, §2.1)', () => {
    const T = Tableau.from([[1, 1, 2, 4], [2, 3], [4]]);
    expect((getFunction('shape')!.impl(T) as Partition).parts).toEqual([4, 2, 1]);
    expect(getFunction('content')!.impl(T)).toEqual([2, 2, 1, 2]);
    expect(getFunction('readingWord')!.impl(T)).toEqual([4, 2, 3, 1, 1, 2, 4]);
  });
  it('promotion has order n on rectangular standard tableaux (Haiman, Discrete Math. 99 (1992); Rhoades, J. Combin. Theory A 117 (2010))', () => {
    for (const parts of [
      [2, 2],
      [3, 3],
      [2, 2, 2],
      [4, 4],
      [3, 3, 3],
      [4, 4, 4],
    ]) {
      const n = parts.reduce((a, b) => a + b, 0);
      for (const t of syt(parts)) {
        let r = t.rows;
        let order = 0;
        do {
          r = promotionRows(r);
          order++;
        } while (key(r) !== key(t.rows) && order <= n);
        expect(n % order).toBe(0); // the orbit size divides n
        for (let k = order; k < n; k++) r = promotionRows(r);
        expect(key(r)).toBe(key(t.rows));
      }
    }
  });
  it('promotion permutes SYT(lambda); evacuation is a shape-preserving involution with evac pro evac = pro^-1 (Stanley, Promotion and evacuation, Electron. J. Combin. (2009), §2)', () => {
    for (let n = 1; n <= 7; n++)
      for (const l of listAll(partitions, { n })) {
        const all = syt(l.parts);
        const keys = new Set(all.map((t) => t.key()));
        const images = new Set<string>();
        for (const t of all) {
          const p = Tableau.from(promotionRows(t.rows));
          expect(keys.has(p.key())).toBe(true);
          images.add(p.key());
          const e = Tableau.from(evacuationRows(t.rows));
          expect(keys.has(e.key())).toBe(true);
          expect(key(evacuationRows(e.rows))).toBe(key(t.rows));
          // evac(pro(evac(pro(T)))) = T
          expect(key(evacuationRows(promotionRows(evacuationRows(p.rows))))).toBe(key(t.rows));
        }
        expect(images.size).toBe(all.length);
      }
  });
  it('promotion fixes a single row and a single column', () => {
    expect(key(promotionRows([[1, 2, 3]]))).toBe('1,2,3');
    expect(key(promotionRows([[1], [2], [3]]))).toBe('1/2/3');
  });
  it('takes semistandard tableaux too, through Bender–Knuth involutions (tested in tableauxCatalogue.test.ts)', () => {
    // t_1 on [[1, 1], [2]]: only the 1 in column 2 is free, and it becomes a 2 (worked by hand)
    expect((getFunction('promotion')!.impl(Tableau.from([[1, 1], [2]])) as Tableau).rows).toEqual([[1, 2], [2]]);
    expect((getFunction('evacuation')!.impl(Tableau.from([[1, 3]])) as Tableau).rows).toEqual([[1, 3]]);
  });
  it('constructors: tableau, asm and pipeDream', () => {
    expect(() => getFunction('tableau')!.impl([[1, 2], [1]])).toThrow(/column 1/);
    expect(() =>
      getFunction('asm')!.impl([
        [1, 0],
        [1, 0],
      ]),
    ).toThrow(/alternat/);
    expect(() =>
      getFunction('pipeDream')!.impl([
        [1, 1],
        [1, 1],
      ]),
    ).toThrow(/twice/);
  });
});
