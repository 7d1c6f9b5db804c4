import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { tracePipes } from '../../../src/families/pipeDreams/pipeDream.js';
import { drawPipeDream, pipeExits } from '../../../src/reports/pictures/pipeDream.js';
import { UNICODE } from '../../../src/reports/pictures/glyphs.js';

/** Random sets of cells of the staircase i + j <= n. */
const crossSets = fc.integer({ min: 1, max: 7 }).chain((n) => {
  const cells: [number, number][] = [];
  for (let i = 1; i < n; i++) for (let j = 1; i + j <= n; j++) cells.push([i, j]);
  return fc.subarray(cells).map((crosses) => ({ n, crosses }));
});

describe('pipe dream pictures', () => {
  it('trace the same exits as the family module (a second, independent tracing)', () => {
    fc.assert(
      fc.property(crossSets, ({ n, crosses }) => {
        expect(pipeExits(crosses, n)).toEqual(tracePipes(crosses, n).exits);
      }),
    );
  });

  it('name w = 132 for both reduced pipe dreams of 132 (S_132 = x1 + x2; from memory, a standard first example)', () => {
    for (const c of [[[1, 2]], [[2, 1]]] as [number, number][][]) {
      expect(drawPipeDream(c, UNICODE).split('\n').pop()).toMatch(/^w = \[1, 3, 2\]/);
    }
  });

  it('draw a cross or a pair of elbows on every staircase tile and a last elbow on each row', () => {
    fc.assert(
      fc.property(crossSets, ({ n, crosses }) => {
        const lines = drawPipeDream(crosses, UNICODE, n).split('\n');
        expect(lines.length).toBe(2 * n + 1);
        const body = lines.slice(1, 2 * n).join('\n');
        expect([...body].filter((c) => c === '┼').length).toBe(crosses.length);
        // Each row's first line: label, stub, then tiles ending in the row's last elbow.
        for (let i = 1; i <= n; i++) expect(lines[2 * i - 1].endsWith('╯')).toBe(true);
      }),
    );
  });
});
