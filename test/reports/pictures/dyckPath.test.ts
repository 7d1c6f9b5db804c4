import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { drawDyckPath } from '../../../src/reports/pictures/dyckPath.js';
import { ASCII } from '../../../src/reports/pictures/glyphs.js';

/** Dyck words from a random walk reflected at the axis and closed at the end. */
const dyckWord = fc.array(fc.boolean(), { maxLength: 30 }).map((bits) => {
  let h = 0,
    w = '';
  for (const up of bits) {
    if (up || h === 0) (w += 'U'), h++;
    else (w += 'D'), h--;
  }
  return w + 'D'.repeat(h);
});

describe('Dyck path pictures', () => {
  it('have one step glyph per column, at the height the path passes, above the word', () => {
    fc.assert(
      fc.property(
        dyckWord.filter((w) => w.length > 0),
        (word) => {
          const steps = [...word].map((c) => (c === 'U' ? 1 : -1));
          const lines = drawDyckPath(steps, ASCII).split('\n');
          expect(lines[lines.length - 1]).toBe(word);
          const top = lines.length - 1;
          let h = 0;
          steps.forEach((s, k) => {
            const band = s > 0 ? h + 1 : h;
            for (let r = 0; r < top; r++) expect(lines[r][k] ?? ' ').toBe(r === top - band ? (s > 0 ? '/' : '\\') : ' ');
            h += s;
          });
        },
      ),
    );
  });
});
