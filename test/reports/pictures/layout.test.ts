import { describe, expect, it } from 'vitest';
import { finish, sideBySide, width } from '../../../src/reports/pictures/layout.js';

describe('layout helpers', () => {
  it('measure width in terminal columns, one per glyph', () => {
    expect(width('┌─●·')).toBe(4);
  });
  it('trim trailing spaces', () => {
    expect(finish(['a  ', ' b', '   '])).toBe('a\n b\n');
  });
  it('align pictures of different heights at the top, padding the shorter', () => {
    expect(sideBySide(['ab\nc', 'x\ny\nz'], 2)).toBe('ab  x\nc   y\n    z');
  });
});
