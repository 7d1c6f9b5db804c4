import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { drawPermutation } from '../../../src/reports/pictures/permutation.js';
import { UNICODE } from '../../../src/reports/pictures/glyphs.js';

describe('permutation diagrams', () => {
  it('put one dot in row w(i) of column i, and nowhere else', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 25 }).chain((n) =>
          fc.shuffledSubarray(
            Array.from({ length: n }, (_, i) => i + 1),
            { minLength: n, maxLength: n },
          ),
        ),
        (a) => {
          const n = a.length;
          const lines = drawPermutation(a, UNICODE).split('\n');
          expect(lines[0]).toBe(`w = ${a.join(' ')}`);
          const rows = lines.slice(1, n + 1);
          rows.forEach((line, k) => {
            const v = n - k;
            const cells = line.split('│')[1].trim().split(/ +/);
            expect(Number(line.split('│')[0])).toBe(v);
            expect(cells.length).toBe(n);
            cells.forEach((c, i) => expect(c).toBe(a[i] === v ? '●' : '·'));
          });
          // Fits an 80-column terminal up to n = 25.
          for (const l of lines) expect([...l].length).toBeLessThanOrEqual(80);
        },
      ),
    );
  });
});
