// Text-layout helpers shared by the pictures: display width, padding, a mutable character canvas,
// and placing pictures side by side. Every glyph the pictures use occupies one terminal column.

/** The number of terminal columns a line takes (one per code point for the glyphs we use). */
export function width(s: string): number {
  let w = 0;
  for (const _ of s) w++;
  return w;
}

export function padLeft(s: string, w: number): string {
  const k = w - width(s);
  return k > 0 ? ' '.repeat(k) + s : s;
}

export function padRight(s: string, w: number): string {
  const k = w - width(s);
  return k > 0 ? s + ' '.repeat(k) : s;
}

/** Lines joined with newlines, each without trailing spaces. */
export function finish(lines: readonly string[]): string {
  return lines.map((l) => l.replace(/ +$/, '')).join('\n');
}

/** The number of decimal digits of a nonnegative integer (1 for 0). */
export function digits(n: number): number {
  return String(n).length;
}

/** A grid of single-column glyphs, blank until written; rows and columns 0-based. */
export class Canvas {
  private readonly cells: string[][];

  constructor(
    readonly height: number,
    readonly widthInColumns: number,
  ) {
    this.cells = Array.from({ length: height }, () => new Array<string>(widthInColumns).fill(' '));
  }

  get(r: number, c: number): string {
    return this.cells[r][c];
  }

  set(r: number, c: number, glyph: string): void {
    this.cells[r][c] = glyph;
  }

  /** Write a string starting at (r, c), one glyph per column. */
  text(r: number, c: number, s: string): void {
    let k = c;
    for (const ch of s) this.cells[r][k++] = ch;
  }

  lines(): string[] {
    return this.cells.map((row) => row.join(''));
  }
}

/** Pictures next to each other, tops aligned, separated by `gap` spaces. */
export function sideBySide(pictures: readonly string[], gap = 4): string {
  const blocks = pictures.map((p) => p.split('\n'));
  const widths = blocks.map((b) => Math.max(0, ...b.map(width)));
  const height = Math.max(0, ...blocks.map((b) => b.length));
  const out: string[] = [];
  for (let r = 0; r < height; r++) {
    out.push(blocks.map((b, k) => padRight(b[r] ?? '', widths[k])).join(' '.repeat(gap)));
  }
  return finish(out);
}
