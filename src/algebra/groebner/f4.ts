// Reduced Gröbner bases over F_p by an F4-style algorithm (Faugère, "A new efficient algorithm
// for computing Gröbner bases (F4)", J. Pure Appl. Algebra 139 (1999)): all S-pairs of least
// sugar are reduced together as rows of one sparse coefficient matrix. Symbolic preprocessing adds
// a reducer row (m / lm(g)) * g for every monomial m of the matrix divisible by a leading
// monomial, so a single elimination pass leaves each new row reduced by the whole basis. Pairs
// are pruned by the Gebauer–Möller criteria (see buchberger.ts for the references).
//
// Rows are kept with their coefficients in 0..p-1. Reduction adds multiples of pivot rows into a
// dense row of doubles and reduces an entry only when it is read, or every K additions, where
// K (p-1)^2 + p < 2^53 keeps every partial sum exact; above p ≈ 9.4·10^7 no sum is safe and each
// addition is reduced through the split multiplication of primeField.ts.

import { fail } from '../../base/errors.js';
import type { Limits } from './bounds.js';
import { MonomialTable } from './monomialTable.js';
import { invModP, mulModP } from './primeField.js';
import type { Sparse } from './sparse.js';
import type { TermOrder } from './termOrder.js';

interface Poly {
  mons: Int32Array; // monomial ids, descending
  coefs: Float64Array; // residues, leading coefficient 1
  sugar: number;
}

interface Pair {
  i: number;
  j: number;
  lcm: number;
  sugar: number;
}

interface Row {
  cols: Int32Array;
  coefs: Float64Array;
}

export interface F4Stats {
  steps: number;
  pairs: number;
  zeroRows: number;
  maxColumns: number;
}

export let lastF4Stats: F4Stats = { steps: 0, pairs: 0, zeroRows: 0, maxColumns: 0 };

const TWO53 = 2 ** 53;
const TRACE = typeof process !== 'undefined' && process.env.HUNCH_GB_TRACE === '1';

class F4 {
  readonly T: MonomialTable;
  polys: Poly[] = [];
  active: boolean[] = [];
  activeList: number[] = [];
  pairs: Pair[] = [];
  // Per-monomial scratch, indexed by id (grown with the table).
  private seen = new Int32Array(0);
  private pivotRow = new Int32Array(0);
  private colOf = new Int32Array(0);
  private divisor = new Int32Array(0); // 1 + the remembered reducer of a monomial, 0 if none
  private checkedUpTo = new Int32Array(0); // basis elements already known not to divide it
  private stamp = 0;
  readonly lazyK: number;
  stats: F4Stats = { steps: 0, pairs: 0, zeroRows: 0, maxColumns: 0 };
  lastShape = '';

  constructor(
    readonly p: number,
    order: TermOrder,
    readonly limits: Limits,
  ) {
    this.T = new MonomialTable(order);
    const q = p - 1;
    this.lazyK = Math.floor((TWO53 - p) / (q * q));
  }

  private scratch(): void {
    const n = this.T.count;
    if (this.seen.length >= n) return;
    const cap = Math.max(n, this.seen.length * 2, 1024);
    const grow = (a: Int32Array) => {
      const b = new Int32Array(cap);
      b.set(a);
      return b;
    };
    this.seen = grow(this.seen);
    this.pivotRow = grow(this.pivotRow);
    this.colOf = grow(this.colOf);
    this.divisor = grow(this.divisor);
    this.checkedUpTo = grow(this.checkedUpTo);
  }

  fromSparse(f: Sparse<number>): Poly {
    const n = f.coefs.length,
      nv = this.T.nv;
    const mons = new Int32Array(n);
    for (let t = 0; t < n; t++) mons[t] = this.T.id(f.exps, t * nv);
    const inv = invModP(f.coefs[0], this.p);
    const coefs = new Float64Array(n);
    for (let t = 0; t < n; t++) coefs[t] = mulModP(f.coefs[t], inv, this.p);
    let sugar = 0;
    for (let t = 0; t < n; t++) sugar = Math.max(sugar, this.T.deg[mons[t]]);
    return { mons, coefs, sugar };
  }

  toSparse(f: Poly): Sparse<number> {
    const nv = this.T.nv,
      n = f.mons.length;
    const exps = new Int32Array(n * nv);
    for (let t = 0; t < n; t++) exps.set(this.T.row(f.mons[t]), t * nv);
    return { exps, coefs: Array.from(f.coefs) };
  }

  /** Add h to the basis and update the pairs (Gebauer–Möller). */
  insert(h: Poly): void {
    const T = this.T;
    const k = this.polys.length;
    const lh = h.mons[0];
    this.polys.push(h);
    this.active.push(true);
    const degH = T.deg[lh];
    const cand: Pair[] = [];
    const coprimeC: boolean[] = [];
    for (const i of this.activeList) {
      const li = this.polys[i].mons[0];
      const l = T.lcm(li, lh);
      const d = T.deg[l];
      cand.push({ i, j: k, lcm: l, sugar: Math.max(this.polys[i].sugar + d - T.deg[li], h.sugar + d - degH) });
      coprimeC.push(T.coprime(li, lh));
    }
    const keep = cand.map(() => true);
    for (let a = 0; a < cand.length; a++) {
      const la = cand[a].lcm;
      for (let b = 0; b < cand.length; b++) {
        if (a === b || !keep[b]) continue;
        const lb = cand[b].lcm;
        if (!T.divides(lb, la)) continue;
        if (lb !== la || (coprimeC[b] && !coprimeC[a]) || (coprimeC[b] === coprimeC[a] && b < a)) {
          keep[a] = false;
          break;
        }
      }
    }
    const polys = this.polys;
    this.pairs = this.pairs.filter((pr) => {
      if (!T.divides(lh, pr.lcm)) return true;
      const li = T.lcm(polys[pr.i].mons[0], lh),
        lj = T.lcm(polys[pr.j].mons[0], lh);
      return li === pr.lcm || lj === pr.lcm;
    });
    for (let a = 0; a < cand.length; a++) if (keep[a] && !coprimeC[a]) this.pairs.push(cand[a]);
    const still: number[] = [];
    for (const i of this.activeList) {
      if (T.divides(lh, polys[i].mons[0])) this.active[i] = false;
      else still.push(i);
    }
    still.push(k);
    this.activeList = still;
  }

  /**
   * A basis element whose leading monomial divides m (the shortest), or -1. Remembered per
   * monomial: a found reducer is reused while it stays active, and a monomial without one is
   * re-tested only against the elements added since.
   */
  private reducerFor(m: number): number {
    const T = this.T,
      polys = this.polys;
    this.scratch();
    const cached = this.divisor[m] - 1;
    if (cached >= 0 && this.active[cached]) return cached;
    const from = cached === -1 ? this.checkedUpTo[m] : 0;
    let best = -1,
      bestLen = Infinity;
    const list = this.activeList;
    for (let k = 0; k < list.length; k++) {
      const i = list[k];
      if (i < from) continue;
      const g = polys[i];
      if (g.mons.length < bestLen && T.divides(g.mons[0], m)) {
        best = i;
        bestLen = g.mons.length;
      }
    }
    this.divisor[m] = best + 1;
    if (best < 0) this.checkedUpTo[m] = polys.length;
    return best;
  }

  /**
   * One matrix: the rows `(mult, poly)` to reduce (with their leading monomials as preferred
   * pivots where free), completed by symbolic preprocessing, reduced. Returns the new rows
   * (nonzero, monic) with their leading monomial ids. With `tailOnly`, each start row keeps its
   * own leading term and only its tail is reduced (the final interreduction).
   */
  reduceRows(start: { mult: number; poly: number }[], tailOnly: boolean): Poly[] {
    const T = this.T;
    this.stamp++;
    const stamp = this.stamp;
    const rowsMult: number[] = [],
      rowsPoly: number[] = [];
    const rowsMons: Int32Array[] = [];
    const toReduce: number[] = [];
    const allMons: number[] = [];
    const addRowMons = (r: number) => {
      const g = this.polys[rowsPoly[r]],
        mult = rowsMult[r];
      const mons = new Int32Array(g.mons.length);
      rowsMons[r] = mons;
      for (let t = 0; t < g.mons.length; t++) {
        const m = T.product(mult, g.mons[t]);
        mons[t] = m;
        this.scratch();
        if (this.seen[m] !== stamp) {
          this.seen[m] = stamp;
          this.pivotRow[m] = -1;
          allMons.push(m);
        }
      }
    };
    // A row is (basis element, multiplier): one number key, exact while poly < 2^21.
    const rowKeys = new Map<number, number>();
    for (const s of start) {
      const key = s.poly * 4294967296 + s.mult;
      if (rowKeys.has(key)) continue;
      const r = rowsMult.length;
      rowKeys.set(key, r);
      rowsMult.push(s.mult);
      rowsPoly.push(s.poly);
      addRowMons(r);
      const lead = T.product(s.mult, this.polys[s.poly].mons[0]);
      if (!tailOnly && this.pivotRow[lead] === -1) this.pivotRow[lead] = r;
      else toReduce.push(r);
    }
    // Symbolic preprocessing.
    for (let k = 0; k < allMons.length; k++) {
      this.limits.tick();
      const m = allMons[k];
      if (this.pivotRow[m] !== -1) continue;
      const g = this.reducerFor(m);
      if (g < 0) continue;
      const mult = T.quotient(m, this.polys[g].mons[0]);
      const key = g * 4294967296 + mult;
      let r = rowKeys.get(key);
      if (r === undefined) {
        r = rowsMult.length;
        rowKeys.set(key, r);
        rowsMult.push(mult);
        rowsPoly.push(g);
        addRowMons(r);
      }
      this.scratch();
      this.pivotRow[m] = r;
    }
    // Columns: every monomial, descending.
    const cols = Int32Array.from(allMons);
    const cmp = T.cmp;
    cols.sort((a, b) => cmp(b, a));
    const ncols = cols.length;
    this.scratch();
    for (let c = 0; c < ncols; c++) this.colOf[cols[c]] = c;
    if (ncols > this.stats.maxColumns) this.stats.maxColumns = ncols;
    this.lastShape = `rows ${rowsMult.length} (reduce ${toReduce.length}) cols ${ncols}`;
    const makeRow = (r: number): Row => {
      const g = this.polys[rowsPoly[r]],
        mons = rowsMons[r],
        n = mons.length;
      const rc = new Int32Array(n);
      for (let t = 0; t < n; t++) rc[t] = this.colOf[mons[t]];
      return { cols: rc, coefs: g.coefs };
    };
    const pivots: (Row | undefined)[] = new Array(ncols);
    for (let c = 0; c < ncols; c++) {
      const r = this.pivotRow[cols[c]];
      if (r !== -1) pivots[c] = makeRow(r);
    }
    // Reduce, largest leading column first (a new pivot then helps the rows after it).
    const work = toReduce.map(makeRow);
    work.sort((a, b) => a.cols[0] - b.cols[0]);
    const p = this.p,
      K = this.lazyK;
    const dense = new Float64Array(ncols);
    const out: Poly[] = [];
    for (const row of work) {
      this.limits.tick();
      const n = row.cols.length;
      for (let t = 0; t < n; t++) dense[row.cols[t]] = row.coefs[t];
      const first = row.cols[0];
      let adds = 0;
      let lead = -1;
      const from = tailOnly ? first + 1 : first;
      if (tailOnly) lead = first;
      for (let c = from; c < ncols; c++) {
        let v = dense[c];
        if (v === 0) continue;
        if (v >= p) {
          v %= p;
          dense[c] = v;
          if (v === 0) continue;
        }
        const piv = pivots[c];
        if (piv === undefined) {
          if (lead < 0) lead = c;
          continue;
        }
        dense[c] = 0;
        const mult = p - v;
        const pc = piv.cols,
          pk = piv.coefs,
          pn = pc.length;
        if (K >= 1) {
          for (let t = 1; t < pn; t++) dense[pc[t]] += mult * pk[t];
          if (++adds >= K) {
            for (let j = c + 1; j < ncols; j++) if (dense[j] >= p) dense[j] %= p;
            adds = 0;
          }
        } else {
          for (let t = 1; t < pn; t++) {
            const s = dense[pc[t]] + mulModP(mult, pk[t], p);
            dense[pc[t]] = s >= p ? s - p : s;
          }
        }
      }
      if (lead < 0) {
        this.stats.zeroRows++;
        continue;
      }
      // Collect, normalise (leading coefficient 1) and keep as a new pivot.
      let cnt = 0;
      for (let c = lead; c < ncols; c++) if (dense[c] !== 0) cnt++;
      const rc = new Int32Array(cnt),
        rk = new Float64Array(cnt);
      let w = 0;
      for (let c = lead; c < ncols; c++) {
        const v = dense[c];
        if (v !== 0) {
          rc[w] = c;
          rk[w++] = v;
          dense[c] = 0;
        }
      }
      const inv = invModP(rk[0], p);
      if (inv !== 1) for (let t = 0; t < w; t++) rk[t] = mulModP(rk[t], inv, p);
      const nr: Row = { cols: rc, coefs: rk };
      if (!tailOnly) pivots[lead] = nr;
      const mons = new Int32Array(w);
      for (let t = 0; t < w; t++) mons[t] = cols[rc[t]];
      out.push({ mons, coefs: rk, sugar: 0 });
    }
    return out;
  }

  run(F: readonly Sparse<number>[]): Sparse<number>[] {
    const T = this.T;
    const gens = F.filter((f) => f.coefs.length > 0).map((f) => this.fromSparse(f));
    if (gens.some((g) => T.deg[g.mons[0]] === 0)) return [unitBasis(T.nv)];
    gens.sort((a, b) => T.cmp(a.mons[0], b.mons[0]));
    for (const g of gens) this.insert(g);
    while (this.pairs.length > 0) {
      this.limits.poll();
      let sugar = Infinity;
      for (const pr of this.pairs) if (pr.sugar < sugar) sugar = pr.sugar;
      this.limits.degree(sugar);
      const chosen = this.pairs.filter((pr) => pr.sugar === sugar);
      this.pairs = this.pairs.filter((pr) => pr.sugar !== sugar);
      this.stats.steps++;
      this.stats.pairs += chosen.length;
      const start: { mult: number; poly: number }[] = [];
      for (const pr of chosen) {
        start.push({ mult: T.quotient(pr.lcm, this.polys[pr.i].mons[0]), poly: pr.i });
        start.push({ mult: T.quotient(pr.lcm, this.polys[pr.j].mons[0]), poly: pr.j });
      }
      const t0 = TRACE ? performance.now() : 0,
        c0 = TRACE ? process.cpuUsage().user : 0;
      const fresh = this.reduceRows(start, false);
      if (TRACE)
        console.error(
          `step ${this.stats.steps} sugar ${sugar} pairs ${chosen.length} new ${fresh.length} basis ${this.activeList.length} monomials ${T.count} ${this.lastShape} ${(performance.now() - t0).toFixed(0)} ms (${((process.cpuUsage().user - c0) / 1000).toFixed(0)} ms CPU)`,
        );
      if (fresh.some((f) => T.deg[f.mons[0]] === 0)) return [unitBasis(T.nv)];
      fresh.sort((a, b) => T.cmp(a.mons[0], b.mons[0]));
      for (const f of fresh) {
        f.sugar = sugar;
        this.insert(f);
      }
      this.limits.size(this.activeList.length);
      if (this.polys.length >= 2 ** 21) fail('the Gröbner basis computation produced more than 2^21 polynomials');
    }
    return this.finish();
  }

  /** Minimal basis from the active elements, tails reduced by one more matrix. */
  private finish(): Sparse<number>[] {
    const T = this.T;
    const act = this.activeList.slice();
    const minimal: number[] = [];
    for (const a of act) {
      let redundant = false;
      for (const b of act) {
        if (a === b) continue;
        const la = this.polys[a].mons[0],
          lb = this.polys[b].mons[0];
        if (T.divides(lb, la) && (la !== lb || b < a)) {
          redundant = true;
          break;
        }
      }
      if (!redundant) minimal.push(a);
      else this.active[a] = false;
    }
    this.activeList = minimal;
    const one = T.id(new Int32Array(T.nv));
    const reduced = this.reduceRows(
      minimal.map((poly) => ({ mult: one, poly })),
      true,
    );
    reduced.sort((a, b) => T.cmp(a.mons[0], b.mons[0]));
    lastF4Stats = this.stats;
    return reduced.map((f) => this.toSparse(f));
  }
}

function unitBasis(nv: number): Sparse<number> {
  return { exps: new Int32Array(nv), coefs: [1] };
}

/** The reduced Gröbner basis over F_p of the polynomials F (coefficients in 0..p-1). */
export function f4(p: number, order: TermOrder, F: readonly Sparse<number>[], limits: Limits): Sparse<number>[] {
  return new F4(p, order, limits).run(F);
}
