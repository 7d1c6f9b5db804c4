// The two glyph sets: Unicode (box drawing, dots) and plain printable ASCII. Each picture takes
// its characters from here so that the ASCII set is guaranteed to stay ASCII.

export interface Glyphs {
  /** A marked point (a permutation's dot, a block member, an element of a subset, a 1). */
  dot: string;
  /** An unmarked grid point. */
  empty: string;
  /** A 1 in a sign matrix. */
  plus: string;
  /** A -1 in a sign matrix. */
  minus: string;
  horizontal: string;
  vertical: string;
  /** Where a horizontal and a vertical line cross. */
  cross: string;
  /** Arc corners: rising into a horizontal on the left / on the right. */
  arcLeft: string;
  arcRight: string;
  /** Elbows joining the left side to the top, and the bottom to the right. */
  elbowLeftUp: string;
  elbowDownRight: string;
  /** Axis corner of a plot (bottom left). */
  axisCorner: string;
  up: string;
  down: string;
  /** Junction for a vertex of a grid of boxes, by which of its four edges are drawn. */
  junction(up: boolean, down: boolean, left: boolean, right: boolean): string;
  /** Bracket pieces for a matrix of `rows` rows: [left, right] at row r. */
  bracket(r: number, rows: number): [string, string];
  emptySet: string;
}

// Index: up*8 + down*4 + left*2 + right.
const BOX_JUNCTIONS = [' ', '╶', '╴', '─', '╷', '┌', '┐', '┬', '╵', '└', '┘', '┴', '│', '├', '┤', '┼'];

export const UNICODE: Glyphs = {
  dot: '●',
  empty: '·',
  plus: '●',
  minus: '○',
  horizontal: '─',
  vertical: '│',
  cross: '┼',
  arcLeft: '╭',
  arcRight: '╮',
  elbowLeftUp: '╯',
  elbowDownRight: '╭',
  axisCorner: '└',
  up: '╱',
  down: '╲',
  junction: (u, d, l, r) => BOX_JUNCTIONS[(u ? 8 : 0) + (d ? 4 : 0) + (l ? 2 : 0) + (r ? 1 : 0)],
  bracket: (r, rows) => {
    if (rows === 1) return ['[', ']'];
    if (r === 0) return ['⎡', '⎤'];
    if (r === rows - 1) return ['⎣', '⎦'];
    return ['⎢', '⎥'];
  },
  emptySet: '∅',
};

export const ASCII: Glyphs = {
  dot: 'o',
  empty: '.',
  plus: '+',
  minus: '-',
  horizontal: '-',
  vertical: '|',
  cross: '+',
  arcLeft: '.',
  arcRight: '.',
  elbowLeftUp: "'",
  elbowDownRight: '.',
  axisCorner: '+',
  up: '/',
  down: '\\',
  junction: (u, d, l, r) => {
    const n = (u ? 1 : 0) + (d ? 1 : 0) + (l ? 1 : 0) + (r ? 1 : 0);
    if (n === 0) return ' ';
    if (n === 2 && u && d) return '|';
    if (n === 2 && l && r) return '-';
    return '+';
  },
  bracket: () => ['[', ']'],
  emptySet: '{}',
};

export function glyphsFor(unicode: boolean): Glyphs {
  return unicode ? UNICODE : ASCII;
}
