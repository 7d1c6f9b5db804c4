// An alternating sign matrix: a square matrix of 0, 1, -1 whose nonzero entries alternate in sign
// along every row and column, starting and ending with 1 (so each row and column sums to 1).

import { fail } from '../../base/errors.js';
import { registerDecoder } from '../../values/decode.js';
import type { Structured } from '../../values/structured.js';

export class Asm implements Structured {
  readonly kind = 'asm';
  transient = false;

  /** Trusts that `rows` is an alternating sign matrix; use Asm.from for user data. */
  constructor(readonly rows: number[][]) {}

  get n(): number {
    return this.rows.length;
  }

  /** Row i (1-based). */
  at(i: number): number[] | undefined {
    return i >= 1 && i <= this.rows.length ? this.rows[i - 1].slice() : undefined;
  }

  /** The number of -1 entries. */
  negatives(): number {
    let c = 0;
    for (const r of this.rows) for (const v of r) if (v < 0) c++;
    return c;
  }

  static from(rows: readonly unknown[]): Asm {
    const n = rows.length;
    const text = () => JSON.stringify(rows);
    for (const r of rows) {
      if (!Array.isArray(r) || r.length !== n) fail(`${text()} is not an alternating sign matrix: it must be square`);
      for (const v of r)
        if (v !== 0 && v !== 1 && v !== -1) fail(`${text()} is not an alternating sign matrix: its entries must be 0, 1 or -1`);
    }
    const m = rows as number[][];
    const alternates = (get: (k: number) => number) => {
      let s = 0;
      for (let k = 0; k < n; k++) {
        s += get(k);
        if (s !== 0 && s !== 1) return false;
      }
      return s === 1;
    };
    for (let i = 0; i < n; i++) {
      if (!alternates((k) => m[i][k])) fail(`${text()} is not an alternating sign matrix: row ${i + 1} does not alternate 1, -1, ..., 1`);
      if (!alternates((k) => m[k][i]))
        fail(`${text()} is not an alternating sign matrix: column ${i + 1} does not alternate 1, -1, ..., 1`);
    }
    return new Asm(m.map((r) => r.slice()));
  }

  equals(other: Structured): boolean {
    return this.key() === other.key();
  }

  key(): string {
    return this.rows.map((r) => r.join(',')).join('/');
  }

  toText(): string {
    return `asm([${this.rows.map((r) => `[${r.join(', ')}]`).join(', ')}])`;
  }

  encode(): unknown {
    return { asm: this.rows.map((r) => r.slice()) };
  }

  copy(): Asm {
    return new Asm(this.rows.map((r) => r.slice()));
  }
}

registerDecoder('asm', (x) => {
  if (!Array.isArray(x)) fail('an alternating sign matrix is a list of rows');
  return Asm.from(x);
});
