// A picture as geometry, independent of how it is written out: the TikZ and SVG writers
// (src/reports/render/) turn one scene into either form, so both show the same drawing.
// Coordinates are in cells, x to the right and y downwards (as on a page); the TikZ writer flips y.

/** Colours by role, so each writer maps them to its own palette. */
export type Tone = 'ink' | 'muted' | 'accent' | 'positive' | 'negative' | 'paper';

export type Item =
  | { t: 'line'; x1: number; y1: number; x2: number; y2: number; tone?: Tone; thick?: boolean; dashed?: boolean }
  | { t: 'rect'; x: number; y: number; w: number; h: number; fill?: Tone; stroke?: Tone }
  | { t: 'dot'; x: number; y: number; r: number; fill?: Tone; open?: boolean }
  /** A cubic curve from (x1, y1) to (x2, y2) with control points (c1x, c1y), (c2x, c2y). */
  | {
      t: 'curve';
      x1: number;
      y1: number;
      c1x: number;
      c1y: number;
      c2x: number;
      c2y: number;
      x2: number;
      y2: number;
      tone?: Tone;
      thick?: boolean;
    }
  | { t: 'polyline'; points: Array<[number, number]>; tone?: Tone; thick?: boolean }
  /** Text centred at (x, y) unless anchored at its start or end. */
  | { t: 'text'; x: number; y: number; s: string; small?: boolean; anchor?: 'start' | 'end'; tone?: Tone };

export interface Scene {
  /** Bounding box, in cells: every item lies within [x0, x0 + width] × [y0, y0 + height]. */
  x0: number;
  y0: number;
  width: number;
  height: number;
  items: Item[];
  /** One line said under the picture (what it shows, how to read it). */
  caption: string;
}

/** Collects items and keeps track of the box around them. */
export class SceneBuilder {
  readonly items: Item[] = [];
  private minX = Infinity;
  private minY = Infinity;
  private maxX = -Infinity;
  private maxY = -Infinity;

  private cover(x: number, y: number, pad = 0): void {
    this.minX = Math.min(this.minX, x - pad);
    this.maxX = Math.max(this.maxX, x + pad);
    this.minY = Math.min(this.minY, y - pad);
    this.maxY = Math.max(this.maxY, y + pad);
  }

  add(item: Item): this {
    switch (item.t) {
      case 'line':
        this.cover(item.x1, item.y1);
        this.cover(item.x2, item.y2);
        break;
      case 'rect':
        this.cover(item.x, item.y);
        this.cover(item.x + item.w, item.y + item.h);
        break;
      case 'dot':
        this.cover(item.x, item.y, item.r);
        break;
      case 'curve':
        for (const [x, y] of [
          [item.x1, item.y1],
          [item.c1x, item.c1y],
          [item.c2x, item.c2y],
          [item.x2, item.y2],
        ])
          this.cover(x, y);
        break;
      case 'polyline':
        for (const [x, y] of item.points) this.cover(x, y);
        break;
      case 'text':
        this.cover(item.x, item.y, 0.4);
        break;
    }
    this.items.push(item);
    return this;
  }

  /** A semicircle-like arc above the baseline y from x1 to x2 (x1 < x2), as drawn in arc diagrams. */
  arc(x1: number, x2: number, y: number, tone?: Tone): this {
    const h = Math.max(0.5, (x2 - x1) * 0.6);
    return this.add({ t: 'curve', x1, y1: y, c1x: x1, c1y: y - h, c2x: x2, c2y: y - h, x2, y2: y, tone, thick: true });
  }

  build(caption: string): Scene {
    if (this.items.length === 0) return { x0: 0, y0: 0, width: 1, height: 1, items: [], caption };
    return { x0: this.minX, y0: this.minY, width: this.maxX - this.minX, height: this.maxY - this.minY, items: this.items, caption };
  }
}
