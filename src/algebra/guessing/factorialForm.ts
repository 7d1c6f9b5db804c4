// A hypergeometric term written with factorials: from a(k+1)/a(k) = c * prod (k + s_i)^(e_i) with
// rational s_i, to a(k) = K * c'^k * prod factorial(u_j k + v_j)^(m_j). A factorial(u k + v)
// contributes u^u (k + (v+1)/u) ... (k + (v+u)/u) to the ratio, so each root with denominator u is
// grouped with the others of its block {(v+1)/u, ..., (v+u)/u}; members of the block that are
// missing and have a smaller denominator are compensated by the opposite factor (as for the Catalan
// numbers, where (k + 1/2)/(k + 2) becomes (2k)! / (k! (k+1)!)).

import { denOf, makeRat, numOf, type Scalar } from '../../numbers/rational.js';
import { ipow } from '../../numbers/integer.js';
import { sdiv, seq as sEq, smul, spow } from '../../numbers/scalar.js';
import { factor, intPolyText } from './text.js';

export interface FactorialTerm {
  /** factorial(u k + v)^m */
  u: number;
  v: number;
  m: number;
}

export interface FactorialForm {
  constant: Scalar;
  base: Scalar;
  factorials: FactorialTerm[];
  /** (u k + v)^m: what is left of factorial(u k + v + j)/factorial(u k + v') for small j. */
  linear: FactorialTerm[];
}

/** factorial(x + j)/factorial(x) for 1 <= j <= 3 becomes (x + 1)...(x + j): fewer factorials to read. */
function simplifyAdjacent(facts: FactorialTerm[]): { factorials: FactorialTerm[]; linear: FactorialTerm[] } {
  const left = facts.map((f) => ({ ...f }));
  const linear: FactorialTerm[] = [];
  for (const up of left)
    for (const down of left) {
      if (up.m !== 1 || down.m !== -1 || up.u !== down.u) continue;
      const j = Math.abs(up.v - down.v);
      if (j < 1 || j > 3) continue;
      const lo = Math.min(up.v, down.v);
      const sign = up.v > down.v ? 1 : -1;
      for (let i = 1; i <= j; i++) linear.push({ u: up.u, v: lo + i, m: sign });
      up.m = 0;
      down.m = 0;
    }
  return { factorials: left.filter((f) => f.m !== 0), linear };
}

interface Root {
  s: Scalar;
  e: number;
}

/**
 * The factorial form of the ratio c * prod (k + s)^e, or null when a root with a denominator above 1
 * cannot be completed to a block (e.g. a lone k + 1/3).
 */
export function factorialRatio(c: Scalar, roots: Root[]): { base: Scalar; factorials: FactorialTerm[] } | null {
  const bag = new Map<string, Root>();
  const add = (s: Scalar, e: number) => {
    const k = s.toString();
    const r = bag.get(k);
    if (r) {
      r.e += e;
      if (r.e === 0) bag.delete(k);
    } else bag.set(k, { s, e });
  };
  for (const r of roots) add(r.s, r.e);
  let base = c;
  const facts = new Map<string, FactorialTerm>();
  const addFact = (u: number, v: number, m: number) => {
    const k = `${u},${v}`;
    const f = facts.get(k);
    if (f) {
      f.m += m;
      if (f.m === 0) facts.delete(k);
    } else facts.set(k, { u, v, m });
  };
  for (let guard = 0; guard < 200; guard++) {
    let pick: Root | null = null;
    for (const r of bag.values()) if (denOf(r.s) > 1n && (!pick || denOf(r.s) > denOf(pick.s))) pick = r;
    if (!pick) break;
    const u = Number(denOf(pick.s));
    const p = Number(numOf(pick.s));
    const e = Math.sign(pick.e);
    // Choose the block containing s whose members of denominator u are all present with sign e,
    // preferring the block with most members present.
    let best: { v: number; present: number } | null = null;
    for (let j = 1; j <= u; j++) {
      const v = p - j;
      let present = 0;
      let ok = true;
      for (let i = 1; i <= u; i++) {
        const t = makeRat(BigInt(v + i), BigInt(u));
        const r = bag.get(t.toString());
        const has = r !== undefined && Math.sign(r.e) === e;
        if (has) present++;
        else if (denOf(t) === BigInt(u)) ok = false;
      }
      if (ok && (!best || present > best.present)) best = { v, present };
    }
    if (!best) return null;
    for (let i = 1; i <= u; i++) add(makeRat(BigInt(best.v + i), BigInt(u)), -e);
    addFact(u, best.v, e);
    base = e > 0 ? sdiv(base, ipow(u, u)) : smul(base, ipow(u, u));
  }
  for (const r of bag.values()) {
    if (denOf(r.s) > 1n) return null;
    // k + b is factorial(k + b) / factorial(k + b - 1).
    addFact(1, Number(r.s) - 1, r.e);
  }
  return { base, factorials: [...facts.values()].sort((a, b) => a.u - b.u || a.v - b.v) };
}

export function factorialOf(n: number, cache: Map<number, bigint>): bigint {
  let v = cache.get(n);
  if (v !== undefined) return v;
  v = 1n;
  for (let i = 2; i <= n; i++) v *= BigInt(i);
  cache.set(n, v);
  return v;
}

/** base^k * prod factorial(u k + v)^m * prod (u k + v)^m, or null when some factorial argument is negative or a linear factor vanishes. */
export function factorialPart(
  base: Scalar,
  facts: readonly FactorialTerm[],
  k: number,
  cache: Map<number, bigint>,
  linear: readonly FactorialTerm[] = [],
): Scalar | null {
  let num = 1n,
    den = 1n;
  for (const f of linear) {
    const x = BigInt(f.u * k + f.v);
    if (x === 0n) return null;
    if (f.m > 0) num *= x ** BigInt(f.m);
    else den *= x ** BigInt(-f.m);
  }
  for (const f of facts) {
    const x = f.u * k + f.v;
    if (x < 0) return null;
    const F = factorialOf(x, cache) ** BigInt(Math.abs(f.m));
    if (f.m > 0) num *= F;
    else den *= F;
  }
  return smul(spow(base, k), makeRat(num, den));
}

/** The factorial form a(k) with a(k0) = a0, valid for k >= k0; null when a factorial argument is negative at k0. */
export function completeForm(a0: Scalar, k0: number, ratio: { base: Scalar; factorials: FactorialTerm[] }): FactorialForm | null {
  const cache = new Map<number, bigint>();
  const { factorials, linear } = simplifyAdjacent(ratio.factorials);
  // The factorials as found must make sense from k0 on (the simplified form is equal there).
  const at0 = factorialPart(ratio.base, ratio.factorials, k0, cache);
  if (at0 === null || sEq(at0, 0)) return null;
  return { constant: sdiv(a0, at0), base: ratio.base, factorials, linear };
}

export function evaluateForm(f: FactorialForm, k: number, cache: Map<number, bigint>): Scalar | null {
  const p = factorialPart(f.base, f.factorials, k, cache, f.linear);
  return p === null ? null : smul(f.constant, p);
}

/** "K * 2^n * factorial(2*n)/(factorial(n)*factorial(n + 1))" in the variable v. */
export function factorialFormText(f: FactorialForm, v: string): string {
  const num: string[] = [];
  const den: string[] = [];
  const K = f.constant;
  if (numOf(K) < 0n) num.push('-1');
  const kn = numOf(K) < 0n ? -numOf(K) : numOf(K);
  if (kn !== 1n) num.push(kn.toString());
  if (denOf(K) !== 1n) den.push(denOf(K).toString());
  const bn = numOf(f.base),
    bd = denOf(f.base);
  if (bn < 0n) num.push(`(-1)^${v}`);
  const abn = bn < 0n ? -bn : bn;
  if (abn !== 1n) num.push(`${abn}^${v}`);
  if (bd !== 1n) den.push(`${bd}^${v}`);
  for (const t of f.linear) {
    const arg = intPolyText([BigInt(t.v), BigInt(t.u)], v);
    const text = factor(arg);
    (t.m > 0 ? num : den).push(Math.abs(t.m) === 1 ? text : `${text}^${Math.abs(t.m)}`);
  }
  for (const t of f.factorials) {
    const arg = intPolyText([BigInt(t.v), BigInt(t.u)], v);
    const text = Math.abs(t.m) === 1 ? `factorial(${arg})` : `factorial(${arg})^${Math.abs(t.m)}`;
    (t.m > 0 ? num : den).push(text);
  }
  let n = num.length === 0 ? '1' : num.join('*');
  if (n.startsWith('-1*')) n = '-' + n.slice(3);
  if (den.length === 0) return n;
  return `${n}/${den.length === 1 ? den[0] : `(${den.join('*')})`}`;
}
