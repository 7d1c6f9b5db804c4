// A Young tableau in English notation: rows top to bottom, row i has lambda_i entries, rows weakly
// increase left to right and columns strictly increase top to bottom (a semistandard tableau;
// standard when the entries are 1..n once each). T[i] in the language is row i.

import { fail } from '../../base/errors.js';
import { registerDecoder } from '../../values/decode.js';
import type { Structured } from '../../values/structured.js';

export class Tableau implements Structured {
  readonly kind = 'tableau';
  transient = false;

  /** Trusts that `rows` is a semistandard tableau; use Tableau.from for user data. */
  constructor(readonly rows: number[][]) {}

  /** The shape, as a list of row lengths. */
  shapeParts(): number[] {
    return this.rows.map((r) => r.length);
  }

  /** The number of cells. */
  get size(): number {
    let s = 0;
    for (const r of this.rows) s += r.length;
    return s;
  }

  /** The number of rows (what T[i] ranges over). */
  get length(): number {
    return this.rows.length;
  }

  /** Row i (1-based) as a fresh list (the tableau may be transient); undefined out of range. */
  at(i: number): number[] | undefined {
    return i >= 1 && i <= this.rows.length ? this.rows[i - 1].slice() : undefined;
  }

  /** Whether the entries are 1..n, each once (rows and columns then increase strictly). */
  isStandard(): boolean {
    const n = this.size;
    const seen = new Uint8Array(n + 1);
    for (const r of this.rows)
      for (const v of r) {
        if (v < 1 || v > n || seen[v]) return false;
        seen[v] = 1;
      }
    return true;
  }

  static from(rows: readonly unknown[]): Tableau {
    const text = () => JSON.stringify(rows);
    const out: number[][] = [];
    for (let i = 0; i < rows.length; i++) {
      const r = rows[i];
      if (!Array.isArray(r) || r.length === 0) fail(`${text()} is not a tableau: every row must be a nonempty list`);
      for (const v of r) {
        if (typeof v !== 'number' || !Number.isSafeInteger(v) || v < 1) {
          fail(`${text()} is not a tableau: its entries must be positive integers`);
        }
      }
      if (i > 0 && r.length > out[i - 1].length) fail(`${text()} is not a tableau: row lengths must weakly decrease`);
      for (let j = 1; j < r.length; j++) {
        if (r[j] < r[j - 1]) fail(`${text()} is not a tableau: row ${i + 1} must weakly increase`);
      }
      if (i > 0) {
        for (let j = 0; j < r.length; j++) {
          if (r[j] <= out[i - 1][j]) fail(`${text()} is not a tableau: column ${j + 1} must strictly increase`);
        }
      }
      out.push((r as number[]).slice());
    }
    return new Tableau(out);
  }

  equals(other: Structured): boolean {
    const b = (other as Tableau).rows,
      a = this.rows;
    if (a.length !== b.length) return false;
    for (let i = 0; i < a.length; i++) {
      const x = a[i],
        y = b[i];
      if (x.length !== y.length) return false;
      for (let j = 0; j < x.length; j++) if (x[j] !== y[j]) return false;
    }
    return true;
  }

  key(): string {
    return this.rows.map((r) => r.join(',')).join('/');
  }

  toText(): string {
    return `tableau([${this.rows.map((r) => `[${r.join(', ')}]`).join(', ')}])`;
  }

  encode(): unknown {
    return { tableau: this.rows.map((r) => r.slice()) };
  }

  copy(): Tableau {
    return new Tableau(this.rows.map((r) => r.slice()));
  }
}

registerDecoder('tableau', (x) => {
  if (!Array.isArray(x)) fail('a tableau is a list of rows');
  return Tableau.from(x);
});
