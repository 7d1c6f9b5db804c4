// Monomials of one computation, each stored once and named by an integer id: the exponent row,
// total degree, a divisibility mask (bit v mod 32 set when variable v occurs, so a | b needs
// mask(a) ⊆ mask(b)) and an additive hash (hash(a*b) = hash(a) + hash(b) mod 2^32, so a product
// is looked up without building its row first). Open addressing with linear probing.

import type { TermOrder } from './termOrder.js';

export class MonomialTable {
  readonly nv: number;
  exps: Int32Array;
  deg: Int32Array;
  mask: Int32Array;
  hash: Int32Array;
  count = 0;
  private slots: Int32Array;
  private shift: number;
  private readonly rnd: Int32Array;
  private readonly tmp: Int32Array;
  readonly cmp: (a: number, b: number) => number;

  constructor(
    readonly order: TermOrder,
    capacity = 1 << 12,
  ) {
    const nv = (this.nv = order.nv);
    this.exps = new Int32Array(capacity * Math.max(nv, 1));
    this.deg = new Int32Array(capacity);
    this.mask = new Int32Array(capacity);
    this.hash = new Int32Array(capacity);
    this.slots = new Int32Array(capacity * 2).fill(-1);
    this.shift = 32 - (31 - Math.clz32(capacity * 2));
    this.rnd = new Int32Array(nv);
    // A fixed pseudo-random sequence (xorshift), so runs repeat exactly.
    let s = 0x9e3779b9 | 0;
    for (let v = 0; v < nv; v++) {
      s ^= s << 13;
      s ^= s >>> 17;
      s ^= s << 5;
      this.rnd[v] = s | 1;
    }
    this.tmp = new Int32Array(nv);
    // Comparisons by id: the stored degree decides first for the graded orders.
    const at = order.compareAt;
    if (order.kind === 'grevlex')
      this.cmp = (a, b) => {
        const d = this.deg[a] - this.deg[b];
        if (d !== 0) return d;
        const ex = this.exps,
          ia = a * nv,
          ib = b * nv;
        for (let v = nv - 1; v >= 0; v--) {
          const x = ex[ia + v] - ex[ib + v];
          if (x !== 0) return -x;
        }
        return 0;
      };
    else if (order.kind === 'deglex')
      this.cmp = (a, b) => {
        const d = this.deg[a] - this.deg[b];
        if (d !== 0) return d;
        const ex = this.exps,
          ia = a * nv,
          ib = b * nv;
        for (let v = 0; v < nv; v++) {
          const x = ex[ia + v] - ex[ib + v];
          if (x !== 0) return x;
        }
        return 0;
      };
    else this.cmp = (a, b) => at(this.exps, a * nv, this.exps, b * nv);
  }

  /** The first slot to probe: the top bits of a multiplicative scramble of the hash (the low
   * bits of the additive hash alone are poor: bit 0 is the parity of the degree). */
  private slotOf(h: number): number {
    return Math.imul(h, 0x9e3779b1) >>> this.shift;
  }

  private grow(): void {
    const cap = this.deg.length * 2,
      nv = this.nv;
    const e = new Int32Array(cap * Math.max(nv, 1));
    e.set(this.exps);
    this.exps = e;
    const widen = (a: Int32Array) => {
      const b = new Int32Array(cap);
      b.set(a);
      return b;
    };
    this.deg = widen(this.deg);
    this.mask = widen(this.mask);
    this.hash = widen(this.hash);
    this.slots = new Int32Array(cap * 2).fill(-1);
    this.shift = 32 - (31 - Math.clz32(cap * 2));
    const m = this.slots.length - 1;
    for (let id = 0; id < this.count; id++) {
      let s = this.slotOf(this.hash[id]);
      while (this.slots[s] !== -1) s = (s + 1) & m;
      this.slots[s] = id;
    }
  }

  private add(row: ArrayLike<number>, off: number, h: number): number {
    if (this.count === this.deg.length) this.grow();
    const id = this.count++,
      nv = this.nv;
    let d = 0,
      mask = 0;
    for (let v = 0; v < nv; v++) {
      const e = row[off + v];
      this.exps[id * nv + v] = e;
      d += e;
      if (e > 0) mask |= 1 << (v & 31);
    }
    this.deg[id] = d;
    this.mask[id] = mask;
    this.hash[id] = h;
    const m = this.slots.length - 1;
    let s = this.slotOf(h);
    while (this.slots[s] !== -1) s = (s + 1) & m;
    this.slots[s] = id;
    return id;
  }

  /** The id of the monomial row[off .. off+nv). */
  id(row: ArrayLike<number>, off = 0): number {
    const nv = this.nv;
    let h = 0;
    for (let v = 0; v < nv; v++) h = (h + Math.imul(row[off + v], this.rnd[v])) | 0;
    const m = this.slots.length - 1,
      ex = this.exps;
    for (let s = this.slotOf(h); ; s = (s + 1) & m) {
      const c = this.slots[s];
      if (c === -1) break;
      if (this.hash[c] !== h) continue;
      let same = true;
      for (let v = 0; v < nv; v++)
        if (ex[c * nv + v] !== row[off + v]) {
          same = false;
          break;
        }
      if (same) return c;
    }
    return this.add(row, off, h);
  }

  /** The id of a * b. */
  product(a: number, b: number): number {
    const nv = this.nv,
      ex = this.exps;
    const h = (this.hash[a] + this.hash[b]) | 0;
    const m = this.slots.length - 1;
    const ia = a * nv,
      ib = b * nv;
    for (let s = this.slotOf(h); ; s = (s + 1) & m) {
      const c = this.slots[s];
      if (c === -1) break;
      if (this.hash[c] !== h) continue;
      let same = true;
      const ic = c * nv;
      for (let v = 0; v < nv; v++)
        if (ex[ic + v] !== ex[ia + v] + ex[ib + v]) {
          same = false;
          break;
        }
      if (same) return c;
    }
    const t = this.tmp;
    for (let v = 0; v < nv; v++) t[v] = ex[ia + v] + ex[ib + v];
    return this.add(t, 0, h);
  }

  /** The id of a / b (b divides a). */
  quotient(a: number, b: number): number {
    const nv = this.nv,
      ex = this.exps,
      t = this.tmp;
    for (let v = 0; v < nv; v++) t[v] = ex[a * nv + v] - ex[b * nv + v];
    return this.id(t, 0);
  }

  /** The id of lcm(a, b). */
  lcm(a: number, b: number): number {
    const nv = this.nv,
      ex = this.exps,
      t = this.tmp;
    for (let v = 0; v < nv; v++) t[v] = Math.max(ex[a * nv + v], ex[b * nv + v]);
    return this.id(t, 0);
  }

  /** Whether a divides b. */
  divides(a: number, b: number): boolean {
    if ((this.mask[a] & ~this.mask[b]) !== 0) return false;
    const nv = this.nv,
      ex = this.exps,
      ia = a * nv,
      ib = b * nv;
    for (let v = 0; v < nv; v++) if (ex[ia + v] > ex[ib + v]) return false;
    return true;
  }

  /** Whether a and b share no variable. */
  coprime(a: number, b: number): boolean {
    const nv = this.nv,
      ex = this.exps,
      ia = a * nv,
      ib = b * nv;
    if (nv <= 32) return (this.mask[a] & this.mask[b]) === 0;
    for (let v = 0; v < nv; v++) if (ex[ia + v] > 0 && ex[ib + v] > 0) return false;
    return true;
  }

  /** The exponent row of a monomial (a view; copy before the table grows). */
  row(a: number): Int32Array {
    return this.exps.subarray(a * this.nv, (a + 1) * this.nv);
  }
}
