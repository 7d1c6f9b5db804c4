// A set partition of 1..n, stored as its restricted growth string: rgs[i-1] is the number of the
// block containing i, blocks numbered 1, 2, ... in order of their least elements (so rgs[0] = 1 and
// each entry is at most one more than the largest before it). Printed as its blocks.

import { fail } from '../../base/errors.js';
import { registerDecoder } from '../../values/decode.js';
import type { Structured } from '../../values/structured.js';

export class SetPartition implements Structured {
  readonly kind = 'setPartition';
  transient = false;

  /** Trusts that `rgs` is a restricted growth string; use SetPartition.fromBlocks for user data. */
  constructor(readonly rgs: number[]) {}

  get n(): number {
    return this.rgs.length;
  }

  /** The number of blocks. */
  get blockCount(): number {
    let m = 0;
    for (const v of this.rgs) if (v > m) m = v;
    return m;
  }

  /** The blocks, each increasing, ordered by least element. */
  blocks(): number[][] {
    const out: number[][] = [];
    for (let i = 0; i < this.rgs.length; i++) {
      const b = this.rgs[i] - 1;
      if (b === out.length) out.push([]);
      out[b].push(i + 1);
    }
    return out;
  }

  /** The i-th block (1-based, by least element). */
  at(i: number): number[] | undefined {
    const bs = this.blocks();
    return i >= 1 && i <= bs.length ? bs[i - 1] : undefined;
  }

  /** The number of blocks (what s[i] ranges over). */
  get length(): number {
    return this.blockCount;
  }

  static fromBlocks(blocks: readonly unknown[]): SetPartition {
    const text = () => JSON.stringify(blocks);
    let n = 0;
    for (const b of blocks) {
      if (!Array.isArray(b) || b.length === 0) fail(`${text()} is not a set partition: every block must be a nonempty list`);
      for (const v of b) {
        if (typeof v !== 'number' || !Number.isSafeInteger(v) || v < 1)
          fail(`${text()} is not a set partition: its elements must be positive integers`);
        n++;
      }
    }
    const label = new Array<number>(n).fill(0);
    blocks.forEach((b, k) => {
      for (const v of b as number[]) {
        if (v > n) fail(`${text()} is not a set partition of 1..${n}: ${v} is out of range`);
        if (label[v - 1]) fail(`${text()} is not a set partition: ${v} appears twice`);
        label[v - 1] = k + 1;
      }
    });
    // Renumber blocks by least element.
    const rename = new Map<number, number>();
    const rgs = label.map((b) => {
      if (!rename.has(b)) rename.set(b, rename.size + 1);
      return rename.get(b)!;
    });
    return new SetPartition(rgs);
  }

  equals(other: Structured): boolean {
    const b = (other as SetPartition).rgs,
      a = this.rgs;
    if (a.length !== b.length) return false;
    for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
    return true;
  }

  key(): string {
    return this.rgs.join(',');
  }

  toText(): string {
    return `setPartition([${this.blocks()
      .map((b) => `[${b.join(', ')}]`)
      .join(', ')}])`;
  }

  encode(): unknown {
    return { setPartition: this.blocks() };
  }

  copy(): SetPartition {
    return new SetPartition(this.rgs.slice());
  }
}

registerDecoder('setPartition', (x) => {
  if (!Array.isArray(x)) fail('a set partition is a list of blocks');
  return SetPartition.fromBlocks(x);
});
