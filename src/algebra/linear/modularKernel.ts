// The stationary vector of an irreducible chain modulo one prime p: the kernel of A = P^T - I,
// normalised to sum 1, by Gaussian elimination with diagonal pivots.
//
// Why diagonal pivots suffice: for an irreducible chain, I - P^T is a singular irreducible
// M-matrix, every proper principal submatrix of it is nonsingular and every Schur complement is
// again of that kind, so eliminating the states one at a time in any order meets a nonzero pivot
// until the very last one, which is 0 (Grassmann, Taksar and Heyman, "Regenerative analysis and
// steady state distributions for Markov chains", Operations Research 33 (1985)). Modulo p a pivot
// can vanish by accident (chance about 1/p each); that prime is then skipped.
//
// Phase 1 eliminates sparsely, choosing the next state by the Markowitz cost (r-1)(c-1) (Markowitz,
// "The elimination form of the inverse and its application to linear programming", Management
// Science 3 (1957)); structural entries are kept even when they vanish mod p, so the pivot order
// depends only on the support and can be replayed for every further prime. Once the remaining
// block is dense enough, phase 2 finishes it as a dense array, adding up to DELAY products before
// reducing (residues < 2^23, so 64 products of two residues stay below 2^52).

import { invMod, mulMod, reduce } from './modular.js';
import { transitionResidues } from './residues.js';
import type { SparseChain } from './sparseChain.js';

/** The elimination order found for the first prime, replayed for the others. */
export interface PivotPlan {
  /** States eliminated sparsely, in order. */
  readonly sparseOrder: Int32Array;
  /** The remaining states, eliminated densely in this order; the last one is the free variable. */
  readonly denseOrder: Int32Array;
}

/** Switch to the dense phase when the remaining block has this fraction of nonzero entries. */
const DENSE_FILL = 0.3;
/** ... or when this few states remain. */
const DENSE_MIN = 48;
/** Products added before a dense row has to be reduced again. */
const DELAY = 63;

export interface KernelOptions {
  plan?: PivotPlan;
  /** Called now and then with the fraction of this prime's elimination that is done. */
  onProgress?: (fraction: number) => void;
}

export interface KernelResult {
  /** x[s] mod p, summing to 1 mod p. */
  x: Float64Array;
  plan: PivotPlan;
}

/** A min-heap of packed numbers cost * 2^21 + state (states < 2^21, costs < 2^31). */
class PackedHeap {
  private a: number[] = [];
  get size(): number {
    return this.a.length;
  }
  push(v: number): void {
    const a = this.a;
    let i = a.length;
    a.push(v);
    while (i > 0) {
      const j = (i - 1) >> 1;
      if (a[j] <= v) break;
      a[i] = a[j];
      i = j;
    }
    a[i] = v;
  }
  pop(): number {
    const a = this.a;
    const top = a[0];
    const last = a.pop()!;
    if (a.length > 0) {
      let i = 0;
      const n = a.length;
      for (;;) {
        let j = 2 * i + 1;
        if (j >= n) break;
        if (j + 1 < n && a[j + 1] < a[j]) j++;
        if (a[j] >= last) break;
        a[i] = a[j];
        i = j;
      }
      a[i] = last;
    }
    return top;
  }
}

const SHIFT = 2 ** 21;

/**
 * The stationary vector of the irreducible chain c modulo p, or null when p is unlucky for it (a
 * denominator or a pivot vanishes mod p, or the normalising sum does).
 */
export function stationaryModP(c: SparseChain, p: number, options: KernelOptions = {}): KernelResult | null {
  const m = c.size;
  if (m >= SHIFT) throw new Error('stationaryModP: too many states for the pivot heap');
  const res = transitionResidues(c, p);
  if (!res) return null;
  if (m === 1) return { x: Float64Array.of(1), plan: { sparseOrder: new Int32Array(0), denseOrder: Int32Array.of(0) } };

  // rows[t]: column s -> A[t][s] = P(s, t) - [s = t]; cols[s]: the rows t with an entry in column s.
  const rows: Map<number, number>[] = Array.from({ length: m }, () => new Map());
  const cols: Set<number>[] = Array.from({ length: m }, () => new Set());
  for (let s = 0; s < m; s++) {
    rows[s].set(s, p - 1);
    cols[s].add(s);
  }
  for (let s = 0; s < m; s++) {
    for (let k = c.rowStart[s]; k < c.rowStart[s + 1]; k++) {
      const t = c.target[k];
      const row = rows[t];
      const old = row.get(s);
      if (old === undefined) {
        row.set(s, res[k]);
        cols[s].add(t);
      } else row.set(s, reduce(old + res[k], p));
    }
  }
  let nnz = 0;
  for (const r of rows) nnz += r.size;

  const active = new Uint8Array(m).fill(1);
  const pivCols: Int32Array[] = new Array(m);
  const pivVals: Float64Array[] = new Array(m);
  const pivInv = new Float64Array(m);
  const cost = (k: number) => (rows[k].size - 1) * (cols[k].size - 1);

  const plan = options.plan;
  const sparseOrder: number[] = [];
  let heap: PackedHeap | null = null;
  if (!plan) {
    heap = new PackedHeap();
    for (let k = 0; k < m; k++) heap.push(cost(k) * SHIFT + k);
  }
  const progressEvery = Math.max(1, Math.floor(m / 100));

  let step = 0;
  for (;;) {
    const remaining = m - step;
    let k: number;
    if (plan) {
      if (step >= plan.sparseOrder.length) break;
      k = plan.sparseOrder[step];
    } else {
      if (remaining <= DENSE_MIN || nnz > DENSE_FILL * remaining * remaining) break;
      // Lazy deletion: an entry is current only if its cost is still the state's cost.
      for (;;) {
        const v = heap!.pop();
        const s = v % SHIFT;
        if (active[s] && (v - s) / SHIFT === cost(s)) {
          k = s;
          break;
        }
      }
      sparseOrder.push(k!);
    }
    k = k!;
    const rowK = rows[k];
    const d = rowK.get(k)!;
    if (d === 0) return null;
    const inv = invMod(d, p);
    pivInv[k] = inv;
    const rc = new Int32Array(rowK.size - 1);
    const rv = new Float64Array(rowK.size - 1);
    let q = 0;
    for (const [j, v] of rowK) {
      if (j === k) continue;
      rc[q] = j;
      rv[q++] = v;
    }
    pivCols[k] = rc;
    pivVals[k] = rv;
    active[k] = 0;
    const touched: number[] = [];
    for (const i of cols[k]) {
      if (i === k) continue;
      const rowI = rows[i];
      const aik = rowI.get(k)!;
      rowI.delete(k);
      nnz--;
      touched.push(i);
      if (aik === 0) continue;
      const f = p - mulMod(aik, inv, p); // -a_ik / d
      for (let e = 0; e < rc.length; e++) {
        const j = rc[e];
        const old = rowI.get(j);
        const add = mulMod(f, rv[e], p);
        if (old === undefined) {
          rowI.set(j, add);
          cols[j].add(i);
          nnz++;
        } else {
          const s = old + add;
          rowI.set(j, s >= p ? s - p : s);
        }
      }
    }
    for (let e = 0; e < rc.length; e++) cols[rc[e]].delete(k);
    nnz -= rowK.size;
    rows[k] = new Map();
    cols[k] = new Set();
    if (heap) {
      for (const i of touched) heap.push(cost(i) * SHIFT + i);
      for (let e = 0; e < rc.length; e++) if (rows[rc[e]].size) heap.push(cost(rc[e]) * SHIFT + rc[e]);
    }
    step++;
    if (options.onProgress && step % progressEvery === 0) options.onProgress(step / m);
  }

  // Phase 2: the remaining states, densely.
  let denseOrder: Int32Array;
  if (plan) denseOrder = plan.denseOrder;
  else {
    const rest: number[] = [];
    for (let s = 0; s < m; s++) if (active[s]) rest.push(s);
    denseOrder = Int32Array.from(rest);
  }
  const r = denseOrder.length;
  const pos = new Int32Array(m).fill(-1);
  for (let i = 0; i < r; i++) pos[denseOrder[i]] = i;
  const a = new Float64Array(r * r);
  for (let i = 0; i < r; i++) {
    for (const [j, v] of rows[denseOrder[i]]) a[i * r + pos[j]] = v;
  }
  const dinv = new Float64Array(r);
  let sinceReduce = 0;
  for (let k = 0; k < r - 1; k++) {
    const rk = k * r;
    for (let j = k; j < r; j++) a[rk + j] = reduce(a[rk + j], p);
    const d = a[rk + k];
    if (d === 0) return null;
    const inv = invMod(d, p);
    dinv[k] = inv;
    if (sinceReduce >= DELAY) {
      for (let i = k + 1; i < r; i++) {
        const ri = i * r;
        for (let j = k; j < r; j++) a[ri + j] = reduce(a[ri + j], p);
      }
      sinceReduce = 0;
    }
    for (let i = k + 1; i < r; i++) {
      const ri = i * r;
      const aik = reduce(a[ri + k], p);
      if (aik === 0) continue;
      const f = p - mulMod(aik, inv, p);
      for (let j = k + 1; j < r; j++) a[ri + j] += f * a[rk + j];
    }
    sinceReduce++;
    if (options.onProgress && (k & 31) === 0) options.onProgress((m - r + k) / m);
  }
  if (reduce(a[(r - 1) * r + r - 1], p) !== 0) {
    throw new Error('stationaryModP: the last pivot is not zero, so the chain is not irreducible');
  }

  // Back substitution: the last dense state is free (x = 1).
  const x = new Float64Array(m);
  x[denseOrder[r - 1]] = 1;
  for (let k = r - 2; k >= 0; k--) {
    const rk = k * r;
    let s = 0;
    for (let j = k + 1; j < r; j++) s = reduce(s + mulMod(a[rk + j], x[denseOrder[j]], p), p);
    x[denseOrder[k]] = s === 0 ? 0 : mulMod(p - s, dinv[k], p);
  }
  const order = plan ? plan.sparseOrder : Int32Array.from(sparseOrder);
  for (let e = order.length - 1; e >= 0; e--) {
    const k = order[e];
    const rc = pivCols[k], rv = pivVals[k];
    let s = 0;
    for (let q = 0; q < rc.length; q++) {
      s += mulMod(rv[q], x[rc[q]], p);
      if (s >= p) s -= p;
    }
    x[k] = s === 0 ? 0 : mulMod(p - s, pivInv[k], p);
  }
  let sum = 0;
  for (let s = 0; s < m; s++) {
    sum += x[s];
    if (sum >= p) sum -= p;
  }
  if (sum === 0) return null;
  const norm = invMod(sum, p);
  for (let s = 0; s < m; s++) x[s] = mulMod(x[s], norm, p);
  return { x, plan: plan ?? { sparseOrder: order, denseOrder } };
}
