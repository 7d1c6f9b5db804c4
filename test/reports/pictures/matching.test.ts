import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { matchingCrossings } from '../../../src/families/matchings/matching.js';
import { arcHeights, drawMatching } from '../../../src/reports/pictures/matching.js';
import { ASCII, UNICODE } from '../../../src/reports/pictures/glyphs.js';
import { matchingFromOrder, range } from './examples.js';

const count = (s: string, glyph: string) => [...s].filter((c) => c === glyph).length;
const randomMatching = fc
  .integer({ min: 0, max: 9 })
  .chain((k) => fc.shuffledSubarray(range(2 * k), { minLength: 2 * k, maxLength: 2 * k }))
  .map(matchingFromOrder);

describe('arc diagrams of matchings', () => {
  it('show one crossing glyph per crossing pair of arcs, and nothing else crossing (crossings by definition)', () => {
    fc.assert(
      fc.property(randomMatching, (m) => {
        for (const g of [UNICODE, ASCII]) {
          const pic = m.n ? drawMatching(m.p, g) : '';
          expect(count(pic, g.cross)).toBe(matchingCrossings(m.p));
        }
      }),
    );
  });

  it('draw every arc with its two corners above its own two points', () => {
    fc.assert(
      fc.property(randomMatching.filter((m) => m.n > 0), (m) => {
        const lines = drawMatching(m.p, UNICODE).split('\n');
        expect(count(lines.join(''), '╭')).toBe(m.n);
        expect(count(lines.join(''), '╮')).toBe(m.n);
        // Reading each point's column from the labels down to its corner finds only legs.
        const labels = lines[lines.length - 1];
        for (let i = 1; i <= 2 * m.n; i++) {
          const col = labels.search(new RegExp(`(^| )${i}( |$)`)) + (labels.match(new RegExp(`(^| )${i}( |$)`))![0].startsWith(' ') ? 1 : 0) + String(i).length - 1;
          let r = lines.length - 2;
          while (r >= 0 && [...lines[r]][col] === '│') r--;
          expect([...lines[r]][col]).toBe(i < m.partner(i) ? '╭' : '╮');
        }
      }),
    );
  });

  it('puts an arc above every arc nested in it and crossing arcs at different heights', () => {
    const arcs: [number, number][] = [[1, 6], [2, 4], [3, 5]];
    const h = arcHeights(arcs);
    expect(h[0]).toBeGreaterThan(Math.max(h[1], h[2]));
    expect(h[1]).not.toBe(h[2]);
  });
});
