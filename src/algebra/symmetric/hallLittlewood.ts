// Hall–Littlewood functions through Kostka–Foulkes polynomials (Macdonald, Symmetric Functions and
// Hall Polynomials, 2nd ed., III.6): K_{lambda mu}(t) = sum over semistandard tableaux T of shape
// lambda and content mu of t^charge(T) (Lascoux–Schützenberger; III (6.5)), and
//   s_lambda = sum_mu K_{lambda mu}(t) P_mu(x; t)     (III (6.5)),
// so P = K(t)^-1 s, the matrix being unitriangular for dominance. Q_lambda = b_lambda(t) P_lambda
// with b_lambda(t) = prod_i phi_{m_i(lambda)}(t), phi_m(t) = (1 - t)(1 - t^2)...(1 - t^m) (III (2.11)).
//
// The charge of a word with partition content: split off standard subwords (from the right end,
// take the first 1 to the left, then cyclically leftwards the first 2, ...); in a standard subword
// the letter 1 has index 0 and r + 1 has the index of r, plus one when r + 1 lies to the right of r;
// the charge is the sum of the indices (III.6). A tableau's word is read row by row from the
// bottom row up, each row left to right.

import { partitionIndex, partitionsOf, multiplicities, sizeOfParts, type Parts } from './partitions.js';
import { checkDegree } from './tables.js';
import { uniAdd, uniMul, uniNeg, type Uni } from './qtTables.js';

export function charge(word: readonly number[]): number {
  const n = word.length;
  const used = new Uint8Array(n);
  let left = n,
    total = 0;
  while (left > 0) {
    let pos = n,
      index = 0;
    for (let r = 1; ; r++) {
      // Search leftwards from pos - 1, wrapping around once.
      let found = -1,
        wrapped = false;
      for (let step = 1; step <= n; step++) {
        let q = pos - step;
        if (q < 0) {
          q += n;
          wrapped = true;
        }
        if (!used[q] && word[q] === r) {
          found = q;
          break;
        }
      }
      if (found < 0) break;
      if (r > 1 && (wrapped || found > pos)) index++;
      total += index;
      used[found] = 1;
      left--;
      pos = found;
    }
  }
  return total;
}

/** Every semistandard tableau of shape lam and content mu, as its rows. */
export function* tableauxOf(lam: Parts, mu: Parts): Generator<number[][]> {
  if (sizeOfParts(lam) !== sizeOfParts(mu)) return;
  const rows: number[][] = lam.map(() => []);
  const shape = lam.map(() => 0);
  const go = function* (r: number): Generator<number[][]> {
    if (r === mu.length) {
      yield rows.map((x) => x.slice());
      return;
    }
    // Add a horizontal strip of mu[r] cells labelled r + 1: row i grows to at most
    // min(lam[i], previous length of row i - 1).
    const before = shape.slice();
    const fill = function* (i: number, left: number): Generator<number[][]> {
      if (i === lam.length) {
        if (left === 0) yield* go(r + 1);
        return;
      }
      const cap = Math.min(lam[i], i === 0 ? lam[0] : before[i - 1]);
      for (let add = Math.min(left, cap - before[i]); add >= 0; add--) {
        for (let k = 0; k < add; k++) rows[i].push(r + 1);
        shape[i] = before[i] + add;
        yield* fill(i + 1, left - add);
        for (let k = 0; k < add; k++) rows[i].pop();
        shape[i] = before[i];
      }
    };
    yield* fill(0, mu[r]);
  };
  yield* go(0);
}

export function tableauWord(rows: readonly (readonly number[])[]): number[] {
  const w: number[] = [];
  for (let i = rows.length - 1; i >= 0; i--) w.push(...rows[i]);
  return w;
}

const kfMemo = new Map<string, Uni>();

/** K_{lambda mu}(t) as coefficients c_0, c_1, ... */
export function kostkaFoulkes(lam: Parts, mu: Parts): Uni {
  const key = `${lam.join(',')}|${mu.join(',')}`;
  const hit = kfMemo.get(key);
  if (hit) return hit;
  const c: Uni = [];
  for (const T of tableauxOf(lam, mu)) {
    const ch = charge(tableauWord(T));
    while (c.length <= ch) c.push(0);
    c[ch] = (c[ch] as number) + 1;
  }
  kfMemo.set(key, c);
  return c;
}

const inverseMemo: Uni[][][] = [];

/** (K(t)^-1)[i][j] over partitionsOf(n): P_{parts[i]} = sum_j inv[i][j] s_{parts[j]}. */
function inverseKF(n: number): Uni[][] {
  const known = inverseMemo[n];
  if (known) return known;
  checkDegree(n, 'a Hall–Littlewood function');
  const parts = partitionsOf(n);
  const N = parts.length;
  const K = parts.map((l) => parts.map((m) => kostkaFoulkes(l, m)));
  const inv: Uni[][] = parts.map(() => new Array<Uni>(N).fill([]));
  for (let i = 0; i < N; i++) {
    inv[i][i] = [1];
    for (let j = i + 1; j < N; j++) {
      let s: Uni = [];
      for (let k = i; k < j; k++) if (inv[i][k].length && K[k][j].length) s = uniAdd(s, uniMul(inv[i][k], K[k][j]));
      inv[i][j] = uniNeg(s);
    }
  }
  inverseMemo[n] = inv;
  return inv;
}

/** P_mu(x; t) as [lambda, coefficient in t] pairs of its Schur expansion. */
export function hallLittlewoodPTable(mu: Parts): [readonly number[], Uni][] {
  const n = sizeOfParts(mu);
  const inv = inverseKF(n);
  const i = partitionIndex(mu);
  const out: [readonly number[], Uni][] = [];
  partitionsOf(n).forEach((lam, j) => {
    if (inv[i][j].length) out.push([lam, inv[i][j]]);
  });
  return out;
}

/** b_lambda(t) = prod_i phi_{m_i}(t). */
export function bOf(lam: Parts): Uni {
  let b: Uni = [1];
  for (const m of multiplicities(lam).values())
    for (let k = 1; k <= m; k++) {
      const f: Uni = new Array(k + 1).fill(0);
      f[0] = 1;
      f[k] = -1;
      b = uniMul(b, f);
    }
  return b;
}
