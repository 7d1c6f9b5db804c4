// Gaussian elimination with diagonal pivots modulo one prime p, kept as a factorisation so that
// it can be solved against many right-hand sides (p-adic lifting, padicLifting.ts) and not only
// for the kernel.
//
// The matrix is given by a chain's support: A[t][s] = off[k] for the entry k of row s of the
// chain with target t, plus diag[s] on the diagonal (so A = P^T - I, or the column-scaled
// integer generator of integerGenerator.ts).
//
// Why diagonal pivots suffice: for an irreducible chain, I - P^T is a singular irreducible
// M-matrix, every proper principal submatrix of it is nonsingular and every Schur complement is
// again of that kind, so eliminating the states one at a time in any order meets a nonzero pivot
// until the very last one, which is 0 (Grassmann, Taksar and Heyman, "Regenerative analysis and
// steady state distributions for Markov chains", Operations Research 33 (1985)); scaling the
// columns by positive numbers changes none of this. Modulo p a pivot can vanish by accident
// (chance about 1/p each); that prime is then skipped.
//
// Phase 1 eliminates sparsely, choosing the next state by the Markowitz cost (r-1)(c-1) (Markowitz,
// "The elimination form of the inverse and its application to linear programming", Management
// Science 3 (1957)); structural entries are kept even when they vanish mod p, so the pivot order
// depends only on the support and can be replayed for every further prime. Once the remaining
// block is dense enough, phase 2 finishes it as a dense array, adding up to DELAY products before
// reducing (residues < 2^23, so 64 products of two residues stay below 2^52).
//
// The last state of the dense order is left free: the factorisation solves the system without
// its row and column (nonsingular, by the fact above), with the free unknown set to a given value.

import { invMod, mulMod, reduce } from './modular.js';
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

/** A min-heap of packed numbers cost * 2^21 + state (states < 2^21, costs < 2^31). */
class PackedHeap {
  private a: number[] = [];
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

/** The factorisation of one matrix modulo p (see the top of the file). */
export class ModularLU {
  constructor(
    readonly p: number,
    readonly size: number,
    readonly plan: PivotPlan,
    /** Per sparse step e: the pivot row's other columns and values (the row of U). */
    private readonly uCols: Int32Array[],
    private readonly uVals: Float64Array[],
    /** Per sparse step e: the rows below the pivot and their multipliers -a_ik / a_kk. */
    private readonly lRows: Int32Array[],
    private readonly lVals: Float64Array[],
    /** 1 / a_kk per state eliminated sparsely. */
    private readonly pivInv: Float64Array,
    /** The dense block: U on and above the diagonal, the multipliers below it (r x r, row-major). */
    private readonly dense: Float64Array,
    private readonly denseInv: Float64Array,
  ) {}

  /** The free state (its unknown is given, its equation is left out). */
  get free(): number {
    const d = this.plan.denseOrder;
    return d[d.length - 1];
  }

  /**
   * The x with x[free] = freeValue solving the equations of all other states:
   * sum_s A[t][s] x[s] = rhs[t] (mod p) for t != free. rhs holds residues and is overwritten.
   */
  solve(rhs: Float64Array, freeValue: number): Float64Array {
    const p = this.p;
    const { sparseOrder, denseOrder } = this.plan;
    // Forward: apply the sparse multipliers, then the dense ones.
    for (let e = 0; e < sparseOrder.length; e++) {
      const v = rhs[sparseOrder[e]];
      if (v === 0) continue;
      const rows = this.lRows[e],
        vals = this.lVals[e];
      for (let q = 0; q < rows.length; q++) {
        const s = rhs[rows[q]] + mulMod(vals[q], v, p);
        rhs[rows[q]] = s >= p ? s - p : s;
      }
    }
    const r = denseOrder.length;
    const a = this.dense;
    const y = new Float64Array(r);
    for (let i = 0; i < r; i++) y[i] = rhs[denseOrder[i]];
    for (let i = 1; i < r - 1; i++) {
      const ri = i * r;
      let s = y[i];
      for (let k = 0; k < i; k++) {
        s += a[ri + k] * y[k];
        if ((k & DELAY) === DELAY) s = reduce(s, p);
      }
      y[i] = reduce(s, p);
    }
    // Backward: the dense block (free unknown last), then the sparse steps in reverse.
    const x = new Float64Array(this.size);
    const xd = new Float64Array(r);
    xd[r - 1] = freeValue;
    for (let k = r - 2; k >= 0; k--) {
      const rk = k * r;
      let s = 0;
      for (let j = k + 1; j < r; j++) {
        s += a[rk + j] * xd[j];
        if ((j & DELAY) === DELAY) s = reduce(s, p);
      }
      s = reduce(y[k] - reduce(s, p), p);
      xd[k] = s === 0 ? 0 : mulMod(s, this.denseInv[k], p);
    }
    for (let i = 0; i < r; i++) x[denseOrder[i]] = xd[i];
    for (let e = sparseOrder.length - 1; e >= 0; e--) {
      const k = sparseOrder[e];
      const rc = this.uCols[e],
        rv = this.uVals[e];
      let s = 0;
      for (let q = 0; q < rc.length; q++) {
        s += rv[q] * x[rc[q]];
        if ((q & DELAY) === DELAY) s = reduce(s, p);
      }
      s = reduce(rhs[k] - reduce(s, p), p);
      x[k] = s === 0 ? 0 : mulMod(s, this.pivInv[k], p);
    }
    return x;
  }

  /** The kernel vector with x[free] = 1 (all other equations homogeneous). */
  kernel(): Float64Array {
    return this.solve(new Float64Array(this.size), 1);
  }
}

export interface FactorOptions {
  /** Replay this elimination order instead of choosing one. */
  plan?: PivotPlan;
  /** Called now and then with the fraction of the elimination that is done. */
  onProgress?: (fraction: number) => void;
}

/**
 * Factors A (see the top of the file) modulo p; null when p is unlucky (a pivot vanishes mod p
 * before the last one). Throws when the last pivot does not vanish: then the matrix is not the
 * singular one of an irreducible chain.
 */
export function factorModP(
  c: SparseChain,
  off: Float64Array,
  diag: Float64Array,
  p: number,
  options: FactorOptions = {},
): ModularLU | null {
  const m = c.size;
  if (m >= SHIFT) throw new Error('factorModP: too many states for the pivot heap');
  if (m === 1) {
    const plan = { sparseOrder: new Int32Array(0), denseOrder: Int32Array.of(0) };
    return new ModularLU(p, 1, plan, [], [], [], [], new Float64Array(1), new Float64Array(1), new Float64Array(1));
  }

  // rows[t]: column s -> A[t][s]; cols[s]: the rows t with an entry in column s.
  const rows: Map<number, number>[] = Array.from({ length: m }, () => new Map());
  const cols: Set<number>[] = Array.from({ length: m }, () => new Set());
  for (let s = 0; s < m; s++) {
    rows[s].set(s, diag[s]);
    cols[s].add(s);
  }
  for (let s = 0; s < m; s++) {
    for (let k = c.rowStart[s]; k < c.rowStart[s + 1]; k++) {
      const t = c.target[k];
      const row = rows[t];
      const old = row.get(s);
      if (old === undefined) {
        row.set(s, off[k]);
        cols[s].add(t);
      } else row.set(s, reduce(old + off[k], p));
    }
  }
  let nnz = 0;
  for (const r of rows) nnz += r.size;

  const active = new Uint8Array(m).fill(1);
  const uCols: Int32Array[] = [],
    uVals: Float64Array[] = [];
  const lRows: Int32Array[] = [],
    lVals: Float64Array[] = [];
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
    uCols.push(rc);
    uVals.push(rv);
    active[k] = 0;
    const lr = new Int32Array(cols[k].size - 1);
    const lv = new Float64Array(cols[k].size - 1);
    let nl = 0;
    for (const i of cols[k]) {
      if (i === k) continue;
      const rowI = rows[i];
      const aik = rowI.get(k)!;
      rowI.delete(k);
      nnz--;
      const f = aik === 0 ? 0 : p - mulMod(aik, inv, p); // -a_ik / d
      lr[nl] = i;
      lv[nl++] = f;
      if (f === 0) continue;
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
    lRows.push(lr);
    lVals.push(lv);
    for (let e = 0; e < rc.length; e++) cols[rc[e]].delete(k);
    nnz -= rowK.size;
    rows[k] = new Map();
    cols[k] = new Set();
    if (heap) {
      for (let e = 0; e < nl; e++) heap.push(cost(lr[e]) * SHIFT + lr[e]);
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
    eliminateDense(a, r, k, inv, p);
    sinceReduce++;
    if (options.onProgress && (k & 31) === 0) options.onProgress((m - r + k) / m);
  }
  const last = (r - 1) * r + r - 1;
  a[last] = reduce(a[last], p);
  if (a[last] !== 0) {
    throw new Error('factorModP: the last pivot is not zero, so the chain is not irreducible');
  }
  const finalPlan = plan ?? { sparseOrder: Int32Array.from(sparseOrder), denseOrder };
  return new ModularLU(p, m, finalPlan, uCols, uVals, lRows, lVals, pivInv, a, dinv);
}

/**
 * One dense elimination step at pivot k: rows below k get row k times -a_ik / a_kk added (left
 * unreduced), and the multiplier is stored in place of a_ik. Two rows at a time, so that every
 * load of the pivot row serves two updates.
 */
function eliminateDense(a: Float64Array, r: number, k: number, inv: number, p: number): void {
  const rk = k * r;
  let i = k + 1;
  for (; i + 1 < r; i += 2) {
    const ri = i * r,
      ri2 = ri + r;
    const a1 = reduce(a[ri + k], p),
      a2 = reduce(a[ri2 + k], p);
    const f1 = a1 === 0 ? 0 : p - mulMod(a1, inv, p);
    const f2 = a2 === 0 ? 0 : p - mulMod(a2, inv, p);
    a[ri + k] = f1;
    a[ri2 + k] = f2;
    if (f1 === 0 && f2 === 0) continue;
    for (let j = k + 1; j < r; j++) {
      const v = a[rk + j];
      a[ri + j] += f1 * v;
      a[ri2 + j] += f2 * v;
    }
  }
  if (i < r) {
    const ri = i * r;
    const a1 = reduce(a[ri + k], p);
    const f = a1 === 0 ? 0 : p - mulMod(a1, inv, p);
    a[ri + k] = f;
    if (f !== 0) for (let j = k + 1; j < r; j++) a[ri + j] += f * a[rk + j];
  }
}
