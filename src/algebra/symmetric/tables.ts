// The integer tables behind the ring of symmetric functions, per degree n and cached: Kostka
// numbers K_{lambda mu} (s_lambda = sum_mu K_{lambda mu} m_mu; semistandard tableaux counted by
// peeling horizontal strips), their inverse (K is unitriangular for dominance, hence upper
// unitriangular in the order of partitionsOf), and the characters chi^lambda(rho) of S_n by the
// Murnaghan–Nakayama rule (p_rho = sum_lambda chi^lambda(rho) s_lambda).
// Sources: Macdonald, Symmetric Functions and Hall Polynomials, 2nd ed., I.6 (Kostka numbers, the
// transition matrices of I.6 and the tables of the appendix to ch. I) and I.7 (characters).

import { fail } from '../../base/errors.js';
import { iadd, imul, ineg, normBig, type Int } from '../../numbers/integer.js';
import { partitionsOf, sizeOfParts, type Parts } from './partitions.js';

/** Beyond this degree the tables (p(n)^2 entries, p(n)^3 work for the inverse) are refused. */
export const MAX_SYM_DEGREE = 12;

export function checkDegree(n: number, what: string): void {
  if (n > MAX_SYM_DEGREE) fail(`${what} has degree ${n}; symmetric functions are limited to degree ${MAX_SYM_DEGREE}`);
}

const kostkaMemo = new Map<string, bigint>();

function* stripsOfSize(lam: readonly number[], size: number): Generator<number[]> {
  const nu = lam.slice();
  const go = function* (i: number, left: number): Generator<number[]> {
    if (i === lam.length) {
      if (left === 0) {
        const out = nu.slice();
        while (out.length && out[out.length - 1] === 0) out.pop();
        yield out;
      }
      return;
    }
    const low = i + 1 < lam.length ? lam[i + 1] : 0;
    for (let v = lam[i]; v >= low && lam[i] - v <= left; v--) {
      nu[i] = v;
      yield* go(i + 1, left - (lam[i] - v));
    }
    nu[i] = lam[i];
  };
  yield* go(0, size);
}

/** K_{lambda, mu} for a partition lambda and a weak composition mu. */
export function kostka(lam: Parts, mu: Parts): bigint {
  if (sizeOfParts(lam) !== sizeOfParts(mu)) return 0n;
  return peel(lam, mu, mu.length);
}

function peel(lam: Parts, mu: Parts, k: number): bigint {
  if (k === 0) return lam.length === 0 ? 1n : 0n;
  if (lam.length > k) return 0n;
  const key = lam.join(',') + '|' + mu.slice(0, k).join(',');
  const hit = kostkaMemo.get(key);
  if (hit !== undefined) return hit;
  let s = 0n;
  for (const nu of stripsOfSize(lam as number[], mu[k - 1])) s += peel(nu, mu, k - 1);
  kostkaMemo.set(key, s);
  return s;
}

const charMemo = new Map<string, bigint>();

/** chi^lambda(rho) by the Murnaghan–Nakayama rule on beta-sets. */
export function character(lam: Parts, rho: Parts): bigint {
  return chi(lam, rho, 0);
}

function chi(lam: Parts, mu: Parts, k: number): bigint {
  if (k === mu.length) return lam.length === 0 ? 1n : 0n;
  const key = lam.join(',') + '|' + mu.slice(k).join(',');
  const hit = charMemo.get(key);
  if (hit !== undefined) return hit;
  const r = mu[k];
  const len = lam.length;
  const beta = lam.map((p, i) => p + (len - 1 - i));
  const has = new Set(beta);
  let s = 0n;
  for (let i = 0; i < len; i++) {
    const b = beta[i] - r;
    if (b < 0 || has.has(b)) continue;
    let between = 0;
    for (const c of beta) if (c > b && c < beta[i]) between++;
    const next = beta.slice();
    next[i] = b;
    next.sort((x, y) => y - x);
    const parts: number[] = [];
    for (let j = 0; j < len; j++) {
      const p = next[j] - (len - 1 - j);
      if (p > 0) parts.push(p);
    }
    const v = chi(parts, mu, k + 1);
    s += between % 2 === 0 ? v : -v;
  }
  charMemo.set(key, s);
  return s;
}

export interface DegreeTables {
  readonly n: number;
  readonly parts: readonly (readonly number[])[];
  /** K[i][j] = K_{parts[i], parts[j]}: upper unitriangular. */
  readonly K: readonly (readonly Int[])[];
  /** The inverse of K, upper unitriangular. */
  readonly Kinv: readonly (readonly Int[])[];
  /** X[i][j] = chi^{parts[i]}(parts[j]). */
  readonly X: readonly (readonly Int[])[];
}

/** Each table of a degree is computed on first use (characters are not needed for Kostka work). */
class LazyTables implements DegreeTables {
  private k?: Int[][];
  private kinv?: Int[][];
  private x?: Int[][];
  readonly parts: readonly (readonly number[])[];

  constructor(readonly n: number) {
    this.parts = partitionsOf(n);
  }

  get K(): readonly (readonly Int[])[] {
    if (!this.k) this.k = this.parts.map((l) => this.parts.map((m) => normBig(kostka(l, m))));
    return this.k;
  }

  get Kinv(): readonly (readonly Int[])[] {
    if (!this.kinv) {
      const K = this.K,
        N = this.parts.length;
      const inv: Int[][] = this.parts.map(() => new Array<Int>(N).fill(0));
      for (let i = 0; i < N; i++) {
        inv[i][i] = 1;
        for (let j = i + 1; j < N; j++) {
          let s: Int = 0;
          for (let k = i; k < j; k++) {
            const a = inv[i][k],
              b = K[k][j];
            if (a !== 0 && b !== 0) s = iadd(s, imul(a, b));
          }
          inv[i][j] = ineg(s);
        }
      }
      this.kinv = inv;
    }
    return this.kinv;
  }

  get X(): readonly (readonly Int[])[] {
    if (!this.x) this.x = this.parts.map((l) => this.parts.map((r) => normBig(character(l, r))));
    return this.x;
  }
}

const tables: DegreeTables[] = [];

export function tablesOf(n: number): DegreeTables {
  const known = tables[n];
  if (known) return known;
  checkDegree(n, 'a symmetric function');
  const t = new LazyTables(n);
  tables[n] = t;
  return t;
}
