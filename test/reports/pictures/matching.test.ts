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

  it('draw every arc with its two corners above its own two points, joined to them by legs', () => {
    fc.assert(
      fc.property(
        randomMatching.filter((m) => m.n > 0),
        (m) => {
          const lines = drawMatching(m.p, UNICODE).split('\n');
          expect(count(lines.join(''), '╭')).toBe(m.n);
          expect(count(lines.join(''), '╮')).toBe(m.n);
          // Going up from a point's label: its leg (crossing bars on the way), then its corner.
          const d = String(2 * m.n).length;
          for (let i = 1; i <= 2 * m.n; i++) {
            const col = (i - 1) * (d + 1) + d - 1;
            expect(
              [...lines[lines.length - 1]]
                .slice(col - d + 1, col + 1)
                .join('')
                .trim(),
            ).toBe(String(i));
            let r = lines.length - 2;
            while (r >= 0 && ['│', '┼'].includes([...lines[r]][col])) r--;
            expect([...lines[r]][col]).toBe(i < m.partner(i) ? '╭' : '╮');
          }
        },
      ),
    );
  });

  it('puts an arc above every arc nested in it and crossing arcs at different heights', () => {
    const arcs: [number, number][] = [
      [1, 6],
      [2, 4],
      [3, 5],
    ];
    const h = arcHeights(arcs);
    expect(h[0]).toBeGreaterThan(Math.max(h[1], h[2]));
    expect(h[1]).not.toBe(h[2]);
  });
});
