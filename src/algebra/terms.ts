// Collecting terms of a polynomial under construction. Exponent vectors are packed into one
// JS number whose numeric order is the monomial order (total degree first, then lexicographic
// with the first variable most significant), so collecting is appending, and sorting and merging
// equal monomials is one native numeric sort (key and term index packed into one double). When the exponents are too large to pack into 53 bits, a string key and a
// comparator sort take over (same result, slower).

import { iadd, imul } from '../numbers/integer.js';
import { Rat, type Scalar } from '../numbers/rational.js';
import { sadd, sisZero, smul } from '../numbers/scalar.js';

function bitLength(n: number): number {
  let b = 0;
  while (n > 0) {
    b++;
    n = Math.floor(n / 2);
  }
  return b;
}

/** Graded lexicographic comparison of two exponent vectors: positive when (ea, ia) comes first. */
export function compareMonomials(ea: Int32Array, ia: number, eb: Int32Array, ib: number, nv: number): number {
  let da = 0,
    db = 0;
  for (let v = 0; v < nv; v++) {
    da += ea[ia + v];
    db += eb[ib + v];
  }
  if (da !== db) return da - db;
  for (let v = 0; v < nv; v++) {
    const d = ea[ia + v] - eb[ib + v];
    if (d !== 0) return d;
  }
  return 0;
}

/** Scalar addition with the small-integer case inline (the hot path of every operation). */
export function addScalars(a: Scalar, b: Scalar): Scalar {
  if (typeof a === 'number' && typeof b === 'number') {
    const s = a + b;
    if (Number.isSafeInteger(s)) return s === 0 ? 0 : s;
    return iadd(a, b);
  }
  return sadd(a, b);
}

export function mulScalars(a: Scalar, b: Scalar): Scalar {
  if (!(a instanceof Rat) && !(b instanceof Rat)) return imul(a, b);
  return smul(a, b);
}

/**
 * Terms over a fixed list of `nv` variables. `maxExp[v]` bounds the exponent of variable v in every
 * term that will be added (used only to choose the packing).
 */
export class TermCollector {
  readonly nv: number;
  // Packed keys need nonnegative exponents: the first negative one switches to string keys.
  private packed: boolean;
  private readonly mult: number[] = [];
  private readonly degMult: number = 0;
  private readonly keyBits: number = 0;
  private readonly strIndex = new Map<string, number>();
  private readonly keys: number[] = [];
  exps: Int32Array;
  readonly coefs: Scalar[] = [];
  count = 0;

  constructor(nv: number, maxExp: ArrayLike<number>, capacity = 16) {
    this.nv = nv;
    let bits = 0,
      maxDeg = 0;
    const widths: number[] = [];
    for (let v = 0; v < nv; v++) {
      const w = bitLength(maxExp[v]);
      widths.push(w);
      bits += w;
      maxDeg += maxExp[v];
    }
    const degBits = bitLength(maxDeg);
    this.keyBits = bits + degBits;
    this.packed = this.keyBits <= 52;
    if (this.packed) {
      // Last variable least significant; the total degree above all of them.
      let m = 1;
      for (let v = nv - 1; v >= 0; v--) {
        this.mult[v] = m;
        m *= 2 ** widths[v];
      }
      this.degMult = m;
    }
    this.exps = new Int32Array(Math.max(1, capacity) * Math.max(1, nv));
  }

  /** Add coef times the monomial whose exponents are src[off .. off+nv). */
  add(src: ArrayLike<number>, off: number, coef: Scalar): void {
    const nv = this.nv;
    if (this.packed) {
      for (let v = 0; v < nv; v++)
        if (src[off + v] < 0) {
          this.unpack();
          break;
        }
    }
    if (this.packed) {
      // Packed keys are merged only when sorting (no hashing per term).
      let key = 0,
        deg = 0;
      for (let v = 0; v < nv; v++) {
        const e = src[off + v];
        deg += e;
        key += e * this.mult[v];
      }
      this.keys.push(key + deg * this.degMult);
    } else {
      let skey = '';
      for (let v = 0; v < nv; v++) skey += src[off + v] + ',';
      const known = this.strIndex.get(skey);
      if (known !== undefined) {
        this.coefs[known] = addScalars(this.coefs[known], coef);
        return;
      }
      this.strIndex.set(skey, this.count);
    }
    const idx = this.count++;
    this.coefs.push(coef);
    if ((idx + 1) * nv > this.exps.length) {
      const grown = new Int32Array(this.exps.length * 2 + nv);
      grown.set(this.exps);
      this.exps = grown;
    }
    const base = idx * nv;
    for (let v = 0; v < nv; v++) this.exps[base + v] = src[off + v];
  }

  /** Switch to string keys (a Laurent monomial arrived), re-adding the terms collected so far. */
  private unpack(): void {
    this.packed = false;
    const nv = this.nv,
      n = this.count,
      ex = this.exps,
      co = this.coefs.slice();
    this.count = 0;
    this.coefs.length = 0;
    this.keys.length = 0;
    this.strIndex.clear();
    this.exps = new Int32Array(ex.length);
    for (let i = 0; i < n; i++) this.add(ex, i * nv, co[i]);
  }

  /** The nonzero terms in descending monomial order: [exps (flat), coefs]. */
  sorted(): { exps: Int32Array; coefs: Scalar[] } {
    if (!this.packed) return this.sortedByComparator();
    const n = this.count,
      nv = this.nv,
      ex = this.exps,
      keys = this.keys;
    const idxBits = bitLength(n);
    let order: Int32Array, groupKeys: Float64Array;
    if (this.keyBits + idxBits <= 52) {
      // Key and index in one double: a native numeric sort orders by key, ties by index.
      const shift = 2 ** idxBits;
      const comp = new Float64Array(n);
      for (let i = 0; i < n; i++) comp[i] = keys[i] * shift + i;
      comp.sort();
      order = new Int32Array(n);
      groupKeys = new Float64Array(n);
      for (let k = 0; k < n; k++) {
        const c = comp[n - 1 - k];
        const key = Math.floor(c / shift);
        order[k] = c - key * shift;
        groupKeys[k] = key;
      }
    } else {
      const idx = Array.from({ length: n }, (_, i) => i).sort((a, b) => keys[b] - keys[a]);
      order = Int32Array.from(idx);
      groupKeys = Float64Array.from(idx, (i) => keys[i]);
    }
    // Merge runs of equal keys, dropping zero sums.
    const outExps = new Int32Array(n * nv);
    const coefs: Scalar[] = [];
    for (let k = 0; k < n; ) {
      const first = order[k];
      let c = this.coefs[first];
      let j = k + 1;
      while (j < n && groupKeys[j] === groupKeys[k]) c = addScalars(c, this.coefs[order[j++]]);
      if (!sisZero(c)) {
        const base = coefs.length * nv;
        for (let v = 0; v < nv; v++) outExps[base + v] = ex[first * nv + v];
        coefs.push(c);
      }
      k = j;
    }
    return { exps: outExps.subarray(0, coefs.length * nv), coefs };
  }

  private sortedByComparator(): { exps: Int32Array; coefs: Scalar[] } {
    const nv = this.nv,
      ex = this.exps;
    const order: number[] = [];
    for (let i = 0; i < this.count; i++) if (!sisZero(this.coefs[i])) order.push(i);
    order.sort((a, b) => compareMonomials(ex, b * nv, ex, a * nv, nv));
    const exps = new Int32Array(order.length * nv);
    const coefs: Scalar[] = new Array(order.length);
    for (let k = 0; k < order.length; k++) {
      const i = order[k];
      coefs[k] = this.coefs[i];
      for (let v = 0; v < nv; v++) exps[k * nv + v] = ex[i * nv + v];
    }
    return { exps, coefs };
  }
}
