// Term orders on exponent vectors over a fixed list of variables (first = largest variable).
// Every order is kept as a matrix order: the rows are weight vectors, and a > b when the first
// row on which their weights differ gives a the larger weight. lex, deglex and grevlex on all
// variables in list order get hand-written comparisons (the hot path); weight vectors, block
// orders and orders on part of the variables use the rows.

import { fail } from '../../base/errors.js';
import { varName } from '../variables.js';

export type OrderSpec =
  | 'lex'
  | 'deglex'
  | 'grevlex'
  | { weights: number[]; then?: OrderSpec }
  | { blocks: { vars: number[]; order: OrderSpec }[] };

type Kind = 'lex' | 'deglex' | 'grevlex' | 'matrix';

/** Compares the exponent rows ea[ia ..] and eb[ib ..]: positive when the first is larger. */
export type RowCompare = (ea: ArrayLike<number>, ia: number, eb: ArrayLike<number>, ib: number) => number;

export class TermOrder {
  readonly nv: number;
  /** Positive when exponent vector a is larger than b (vectors indexed like varIds). */
  readonly compare: (a: ArrayLike<number>, b: ArrayLike<number>) => number;
  readonly compareAt: RowCompare;

  constructor(
    readonly spec: OrderSpec,
    readonly varIds: readonly number[],
    readonly kind: Kind,
    /** The weight rows of the matrix order (always filled, also for the fast kinds). */
    readonly rows: readonly Float64Array[],
  ) {
    this.nv = varIds.length;
    this.compareAt = makeCompare(kind, this.nv, rows);
    const at = this.compareAt;
    this.compare = (a, b) => at(a, 0, b, 0);
  }

  /** True when the first row is the total degree (every variable weight 1). */
  get degreeFirst(): boolean {
    const r = this.rows[0];
    return r !== undefined && r.every((w) => w === 1);
  }

  /** The position of a variable id in varIds, or -1. */
  indexOf(id: number): number {
    return this.varIds.indexOf(id);
  }

  describe(): string {
    return `${specText(this.spec)} on ${this.varIds.map(varName).join(' > ')}`;
  }
}

function specText(s: OrderSpec): string {
  if (typeof s === 'string') return s;
  if ('weights' in s) return `weights [${s.weights.join(', ')}]${s.then ? ` then ${specText(s.then)}` : ''}`;
  return `blocks (${s.blocks.map((b) => `${b.vars.map(varName).join(', ')}: ${specText(b.order)}`).join('; ')})`;
}

/** The order `spec` on the variables varIds (first = largest). */
export function termOrder(spec: OrderSpec, varIds: readonly number[]): TermOrder {
  const ids = Array.from(varIds);
  if (new Set(ids).size !== ids.length) fail('a term order lists each variable once');
  const nv = ids.length;
  const all = ids.map((_, i) => i);
  const rows = specRows(spec, all, ids, nv);
  const kind: Kind = typeof spec === 'string' ? spec : 'matrix';
  return new TermOrder(spec, ids, kind, rows);
}

/** A matrix order given directly by its rows (used for orders built from others). */
export function matrixOrder(spec: OrderSpec, varIds: readonly number[], rows: Float64Array[]): TermOrder {
  return new TermOrder(spec, Array.from(varIds), 'matrix', rows);
}

function unit(nv: number, pos: number, sign: number): Float64Array {
  const r = new Float64Array(nv);
  r[pos] = sign;
  return r;
}

function specRows(spec: OrderSpec, pos: number[], ids: number[], nv: number): Float64Array[] {
  const k = pos.length;
  if (spec === 'lex') return pos.map((p) => unit(nv, p, 1));
  if (spec === 'deglex' || spec === 'grevlex') {
    const deg = new Float64Array(nv);
    for (const p of pos) deg[p] = 1;
    const rows: Float64Array[] = [deg];
    if (spec === 'deglex') for (let i = 0; i < k - 1; i++) rows.push(unit(nv, pos[i], 1));
    else for (let i = k - 1; i >= 1; i--) rows.push(unit(nv, pos[i], -1));
    return rows;
  }
  if (typeof spec === 'object' && spec !== null && 'weights' in spec) {
    const w = spec.weights;
    if (!Array.isArray(w) || w.length !== k)
      fail(`a weight vector needs one weight per variable (${k}), not ${Array.isArray(w) ? w.length : 'none'}`);
    const row = new Float64Array(nv);
    w.forEach((x, i) => {
      if (!Number.isSafeInteger(x) || x < 0) fail(`weights must be nonnegative integers, not ${x}`);
      row[pos[i]] = x;
    });
    return [row, ...specRows(spec.then ?? 'grevlex', pos, ids, nv)];
  }
  if (typeof spec === 'object' && spec !== null && 'blocks' in spec) {
    const seen = new Set<number>();
    const rows: Float64Array[] = [];
    for (const b of spec.blocks) {
      const bp = b.vars.map((id) => {
        const p = ids.indexOf(id);
        if (p < 0 || !pos.includes(p)) fail(`the block variable ${varName(id) ?? id} is not one of the ring's variables`);
        if (seen.has(p)) fail(`the variable ${varName(id)} is in two blocks`);
        seen.add(p);
        return p;
      });
      rows.push(...specRows(b.order, bp, ids, nv));
    }
    if (seen.size !== k) {
      const missing = pos.filter((p) => !seen.has(p)).map((p) => varName(ids[p]));
      fail(`the blocks of a block order must cover every variable; missing ${missing.join(', ')}`);
    }
    return rows;
  }
  return fail(`unknown term order ${JSON.stringify(spec)} (use "lex", "deglex", "grevlex", weights or blocks)`);
}

function makeCompare(kind: Kind, nv: number, rows: readonly Float64Array[]): RowCompare {
  if (kind === 'lex')
    return (ea, ia, eb, ib) => {
      for (let v = 0; v < nv; v++) {
        const d = ea[ia + v] - eb[ib + v];
        if (d !== 0) return d;
      }
      return 0;
    };
  if (kind === 'deglex')
    return (ea, ia, eb, ib) => {
      let d = 0;
      for (let v = 0; v < nv; v++) d += ea[ia + v] - eb[ib + v];
      if (d !== 0) return d;
      for (let v = 0; v < nv; v++) {
        const x = ea[ia + v] - eb[ib + v];
        if (x !== 0) return x;
      }
      return 0;
    };
  if (kind === 'grevlex')
    return (ea, ia, eb, ib) => {
      let d = 0;
      for (let v = 0; v < nv; v++) d += ea[ia + v] - eb[ib + v];
      if (d !== 0) return d;
      for (let v = nv - 1; v >= 0; v--) {
        const x = ea[ia + v] - eb[ib + v];
        if (x !== 0) return -x;
      }
      return 0;
    };
  const nr = rows.length;
  return (ea, ia, eb, ib) => {
    for (let r = 0; r < nr; r++) {
      const w = rows[r];
      let d = 0;
      for (let v = 0; v < nv; v++) if (w[v] !== 0) d += w[v] * (ea[ia + v] - eb[ib + v]);
      if (d !== 0) return d;
    }
    return 0;
  };
}
