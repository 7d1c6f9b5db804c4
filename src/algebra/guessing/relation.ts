// The engine under every guesser: a linear relation among the columns of a matrix whose rows come
// one by one from the terms of a sequence (row k uses the terms up to some index). A guess is a
// one-dimensional kernel. Found modulo a word-size prime by incremental elimination (so a system
// with no relation stops as soon as its rank is full), then lifted to the integers by Chinese
// remaindering and rational reconstruction over further primes, and verified exactly on every row.
// The row at which the rank first reaches cols - 1 is where the guess became determined; the rows
// after it are the confirmations.

import { bigGcd } from '../../numbers/integer.js';
import { intMod, invMod, modPrime, mulMod } from '../linear/modular.js';
import { CrtVector, reconstructVector } from '../linear/reconstruction.js';

/** A system of rows over the integers, produced on demand. */
export interface RowSource {
  rows: number;
  cols: number;
  /** Row k, an integer vector of length cols (denominators already cleared). */
  row(k: number): readonly bigint[];
}

export interface Relation {
  /** The kernel vector: integers with content 1. */
  vector: bigint[];
  /** Rows 0..determinedAt determine it (up to a factor); the rows after confirm it. */
  determinedAt: number;
}

class Echelon {
  readonly pivotRows: Float64Array[] = [];
  readonly pivotCols: number[] = [];
  constructor(
    readonly cols: number,
    readonly p: number,
  ) {}

  /** Reduces the row against the pivots and adds it when it is independent; returns whether it was. */
  add(r: Float64Array): boolean {
    const p = this.p;
    for (let i = 0; i < this.pivotRows.length; i++) {
      const c = this.pivotCols[i];
      const f = r[c];
      if (f === 0) continue;
      const pr = this.pivotRows[i];
      for (let j = 0; j < this.cols; j++) {
        if (pr[j] === 0) continue;
        let v = r[j] - mulMod(f, pr[j], p);
        if (v < 0) v += p;
        r[j] = v;
      }
    }
    let c = -1;
    for (let j = 0; j < this.cols; j++)
      if (r[j] !== 0) {
        c = j;
        break;
      }
    if (c < 0) return false;
    const inv = invMod(r[c], p);
    for (let j = 0; j < this.cols; j++) if (r[j] !== 0) r[j] = mulMod(r[j], inv, p);
    this.pivotRows.push(r);
    this.pivotCols.push(c);
    return true;
  }

  /** With rank cols - 1: the kernel vector with 1 at the free column. */
  kernel(): { free: number; x: Float64Array } {
    const p = this.p;
    const isPivot = new Uint8Array(this.cols);
    for (const c of this.pivotCols) isPivot[c] = 1;
    const free = isPivot.indexOf(0);
    const x = new Float64Array(this.cols);
    x[free] = 1;
    for (let i = this.pivotRows.length - 1; i >= 0; i--) {
      const r = this.pivotRows[i];
      const c = this.pivotCols[i];
      let s = 0;
      for (let j = 0; j < this.cols; j++) if (j !== c && r[j] !== 0 && x[j] !== 0) s = (s + mulMod(r[j], x[j], p)) % p;
      x[c] = s === 0 ? 0 : p - s;
    }
    return { free, x };
  }
}

function rowMod(row: readonly bigint[], p: number): Float64Array {
  const out = new Float64Array(row.length);
  for (let j = 0; j < row.length; j++) out[j] = intMod(row[j], p);
  return out;
}

/**
 * The one-dimensional kernel of the system, if its rank is exactly cols - 1 and at least
 * `minConfirm` rows come after the row that made it so. Null otherwise (no relation, or too few
 * rows to tell). `cache` keeps rows already computed.
 */
export function findRelation(src: RowSource, minConfirm: number): Relation | null {
  const { rows, cols } = src;
  if (rows < cols - 1 + minConfirm) return null;
  const cache: (readonly bigint[])[] = [];
  const get = (k: number) => (cache[k] ??= src.row(k));
  const p0 = modPrime(0);
  const ech = new Echelon(cols, p0);
  let determinedAt = -1;
  for (let k = 0; k < rows; k++) {
    if (ech.add(rowMod(get(k), p0))) {
      if (ech.pivotRows.length === cols) return null; // full rank: no relation
      if (ech.pivotRows.length === cols - 1) determinedAt = k;
    }
    // Not enough rows left to reach the confirmations: give up early.
    if (determinedAt < 0 && rows - 1 - k < cols - 1 - ech.pivotRows.length + minConfirm) return null;
  }
  if (determinedAt < 0 || rows - 1 - determinedAt < minConfirm) return null;
  const first = ech.kernel();
  const vector = liftKernel(src, get, first.free, first.x, p0);
  return vector ? { vector, determinedAt } : null;
}

/** From the kernel modulo p0 to an integer vector verified on every row (null if none is found). */
function liftKernel(src: RowSource, get: (k: number) => readonly bigint[], free: number, x0: Float64Array, p0: number): bigint[] | null {
  const crt = new CrtVector(src.cols);
  crt.add(x0, p0);
  let previous: string | null = null;
  for (let i = 1; i < 400; i++) {
    const rec = reconstructVector(crt);
    if (rec) {
      const key = rec.nums.join(',') + '/' + rec.den;
      if (key === previous || i % 4 === 0) {
        const v = primitive(rec.nums);
        if (verifies(src, get, v)) return v;
      }
      previous = key;
    }
    const p = modPrime(i);
    const ech = new Echelon(src.cols, p);
    for (let k = 0; k < src.rows && ech.pivotRows.length < src.cols - 1; k++) ech.add(rowMod(get(k), p));
    if (ech.pivotRows.length !== src.cols - 1) continue; // an unlucky prime
    const kp = ech.kernel();
    if (kp.free !== free) continue;
    crt.add(kp.x, p);
  }
  return null;
}

function primitive(v: bigint[]): bigint[] {
  let g = 0n;
  for (const x of v) g = bigGcd(g, x);
  return g <= 1n ? v.slice() : v.map((x) => x / g);
}

function verifies(src: RowSource, get: (k: number) => readonly bigint[], v: bigint[]): boolean {
  for (let k = 0; k < src.rows; k++) {
    const r = get(k);
    let s = 0n;
    for (let j = 0; j < v.length; j++) if (v[j] !== 0n) s += r[j] * v[j];
    if (s !== 0n) return false;
  }
  return true;
}
