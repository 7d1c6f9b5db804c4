// Modified Macdonald polynomials by the combinatorial formula of J. Haglund, M. Haiman and
// N. Loehr, "A combinatorial formula for Macdonald polynomials", J. Amer. Math. Soc. 18 (2005):
//   H~_mu(x; q, t) = sum over fillings sigma of the diagram of mu of q^inv(sigma) t^maj(sigma) x^sigma.
// The diagram is drawn with its longest row at the bottom; cells are read row by row from the top
// row down, left to right. A descent is a cell whose entry is larger than that of the cell just
// below it; maj = sum over descents of (leg + 1); two cells attack when they lie in the same row, or
// in adjacent rows with the upper one strictly to the right; an inversion is an attacking pair
// (u before v in reading order) with sigma(u) > sigma(v), and inv = #inversions - sum over descents
// of arm. Only fillings of content lambda (a partition) are visited: they give the coefficient of
// m_lambda, and the Schur coefficients follow by the unitriangular Kostka matrix.

import { iadd, isub, imul, type Int } from '../../numbers/integer.js';
import { partitionIndex, partitionsOf, sizeOfParts, type Parts } from './partitions.js';
import { checkDegree, tablesOf } from './tables.js';
import type { Bi } from './qtTables.js';

/** Fillings of more cells than this take too long per case. */
export const MACDONALD_MAX = 9;

interface Cell {
  above: number; // index in reading order of the cell just above, or -1
  leg: number;
  arm: number;
  attackers: number[]; // earlier cells (reading order) attacking this one
}

function cellsOf(mu: Parts): Cell[] {
  const rows = mu.length;
  // Reading order: row rows-1 (top) down to row 0, left to right.
  const idx: number[][] = mu.map(() => []);
  let k = 0;
  for (let r = rows - 1; r >= 0; r--) for (let c = 0; c < mu[r]; c++) idx[r][c] = k++;
  const cells: Cell[] = [];
  for (let r = rows - 1; r >= 0; r--)
    for (let c = 0; c < mu[r]; c++) {
      let leg = 0;
      for (let r2 = r + 1; r2 < rows && mu[r2] > c; r2++) leg++;
      const attackers: number[] = [];
      for (let c2 = 0; c2 < c; c2++) attackers.push(idx[r][c2]);
      if (r + 1 < rows) for (let c2 = c + 1; c2 < mu[r + 1]; c2++) attackers.push(idx[r + 1][c2]);
      cells.push({ above: r + 1 < rows && mu[r + 1] > c ? idx[r + 1][c] : -1, leg, arm: mu[r] - c - 1, attackers });
    }
  return cells;
}

/** The coefficient of m_lambda in H~_mu as a table c[inv][maj]. */
function monomialCoefficient(cells: Cell[], lam: Parts, dim: number): Int[] {
  const n = cells.length;
  const table: Int[] = new Array(dim * dim).fill(0);
  const left = lam.slice();
  const sigma = new Int32Array(n);
  const armOf = cells.map((c) => c.arm);
  const go = (k: number, inv: number, maj: number) => {
    if (k === n) {
      table[inv * dim + maj] = iadd(table[inv * dim + maj], 1);
      return;
    }
    const cell = cells[k];
    for (let v = 1; v <= left.length; v++) {
      if (left[v - 1] === 0) continue;
      let di = 0,
        dm = 0;
      for (const u of cell.attackers) if (sigma[u] > v) di++;
      if (cell.above >= 0 && sigma[cell.above] > v) {
        dm += cells[cell.above].leg + 1;
        di -= armOf[cell.above];
      }
      left[v - 1]--;
      sigma[k] = v;
      go(k + 1, inv + di, maj + dm);
      left[v - 1]++;
    }
    sigma[k] = 0;
  };
  go(0, 0, 0);
  return table;
}

const memo = new Map<string, [readonly number[], Bi][]>();

/** H~_mu as [lambda, table c[i][j] of q^i t^j] pairs of its Schur expansion (q,t-Kostka numbers). */
export function macdonaldHTable(mu: Parts): [readonly number[], Bi][] {
  const key = mu.join(',');
  const hit = memo.get(key);
  if (hit) return hit;
  const n = sizeOfParts(mu);
  checkDegree(n, 'a Macdonald polynomial');
  const cells = cellsOf(mu);
  const dim = (n * (n - 1)) / 2 + 1;
  const parts = partitionsOf(n);
  const T = tablesOf(n);
  // Monomial coefficients, then Schur coefficients by solving with K from the top down.
  const residual = parts.map((lam) => monomialCoefficient(cells, lam, dim));
  const out: [readonly number[], Bi][] = [];
  for (let a = 0; a < parts.length; a++) {
    const c = residual[a];
    if (c.every((x) => x === 0)) continue;
    const i = partitionIndex(parts[a]);
    for (let b = a + 1; b < parts.length; b++) {
      const k = T.K[i][b];
      if (k === 0) continue;
      const r = residual[b];
      for (let z = 0; z < c.length; z++) if (c[z] !== 0) r[z] = isub(r[z], imul(k, c[z]));
    }
    const bi: Bi = [];
    for (let qi = 0; qi < dim; qi++) bi.push(c.slice(qi * dim, (qi + 1) * dim));
    out.push([parts[a], bi]);
  }
  memo.set(key, out);
  return out;
}
