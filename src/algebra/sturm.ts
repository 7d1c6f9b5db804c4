// Real-rootedness of a univariate rational polynomial, exactly, by Sturm's theorem: for a
// squarefree g, the number of distinct real roots is V(-inf) - V(+inf), V counting sign changes
// in the Sturm sequence g, g', -rem(g, g'), ... . A polynomial p is real-rooted (every complex
// root real, multiplicities allowed) iff its squarefree part g = p / gcd(p, p') has deg g distinct
// real roots. Polynomials are kept as primitive integer coefficient lists (lowest degree first);
// scaling by positive constants does not change any sign, so the sequence stays exact and small.

import { bigGcd } from '../numbers/integer.js';
import { denOf, numOf, type Scalar } from '../numbers/rational.js';

type IntPoly = bigint[]; // c[0] + c[1] t + ..., no trailing zeros

function trim(p: IntPoly): IntPoly {
  let d = p.length;
  while (d > 0 && p[d - 1] === 0n) d--;
  return p.slice(0, d);
}

/** Divide by the positive content. */
function primitive(p: IntPoly): IntPoly {
  let g = 0n;
  for (const c of p) g = bigGcd(g, c);
  return g > 1n ? p.map((c) => c / g) : p;
}

export function toIntPoly(c: readonly Scalar[]): IntPoly {
  let l = 1n;
  for (const x of c) {
    const d = denOf(x);
    l = (l / bigGcd(l, d)) * d;
  }
  return primitive(trim(c.map((x) => (numOf(x) * l) / denOf(x))));
}

function derivative(p: IntPoly): IntPoly {
  return trim(p.slice(1).map((c, i) => c * BigInt(i + 1)));
}

/** A positive multiple of the remainder of a by b (pseudo-division with positive factors). */
function positiveRemainder(a: IntPoly, b: IntPoly): IntPoly {
  let r = a.slice();
  const db = b.length - 1;
  const lb = b[db];
  const scale = lb < 0n ? -lb : lb;
  const sign = lb < 0n ? -1n : 1n;
  while (r.length - 1 >= db && r.length > 0) {
    const dr = r.length - 1;
    const lr = r[dr];
    // r := |lb| r - sign(lb) lr t^{dr-db} b  (kills the leading term, positive factor |lb|)
    const next = r.map((c) => c * scale);
    for (let i = 0; i <= db; i++) next[i + dr - db] -= sign * lr * b[i];
    r = primitive(trim(next));
  }
  return r;
}

function gcdPoly(a: IntPoly, b: IntPoly): IntPoly {
  while (b.length > 0) [a, b] = [b, positiveRemainder(a, b)];
  return primitive(a);
}

/** Exact quotient a / b when b divides a (over the rationals), up to a positive constant. */
function divideOut(a: IntPoly, b: IntPoly): IntPoly {
  const db = b.length - 1;
  const q: bigint[] = new Array(Math.max(0, a.length - db)).fill(0n);
  let r = a.slice();
  // Work over the rationals by scaling: multiply r by lb^k as needed (positive scaling if we use |lb|).
  const lb = b[db];
  for (let k = a.length - 1 - db; k >= 0; k--) {
    const lr = r[k + db];
    if (lr === 0n) continue;
    // make lr divisible by lb
    const g = bigGcd(lr, lb);
    let f = lb / g;
    if (f < 0n) f = -f;
    if (f !== 1n) {
      r = r.map((c) => c * f);
      for (let i = 0; i < q.length; i++) q[i] *= f;
    }
    const coef = r[k + db] / lb;
    q[k] = coef;
    for (let i = 0; i <= db; i++) r[k + i] -= coef * b[i];
  }
  return primitive(trim(q));
}

function signChanges(values: bigint[]): number {
  let changes = 0,
    last = 0n;
  for (const v of values) {
    if (v === 0n) continue;
    if (last !== 0n && v < 0n !== last < 0n) changes++;
    last = v;
  }
  return changes;
}

/** The squarefree part p / gcd(p, p') (up to a positive constant). */
export function squarefreePart(p: IntPoly): IntPoly {
  return divideOut(p, gcdPoly(p, derivative(p)));
}

/** Number of distinct real roots of a nonzero integer polynomial. */
export function distinctRealRoots(p: IntPoly): number {
  return sturmCount(squarefreePart(p));
}

/** Number of real roots of a squarefree polynomial, by its Sturm sequence. */
function sturmCount(g: IntPoly): number {
  if (g.length <= 1) return 0;
  const seq: IntPoly[] = [g, derivative(g)];
  for (;;) {
    const r = positiveRemainder(seq[seq.length - 2], seq[seq.length - 1]);
    if (r.length === 0) break;
    seq.push(r.map((c) => -c));
  }
  const atPlus = seq.map((s) => s[s.length - 1]);
  const atMinus = seq.map((s) => ((s.length - 1) % 2 === 0 ? s[s.length - 1] : -s[s.length - 1]));
  return signChanges(atMinus) - signChanges(atPlus);
}

/** Whether every complex root of the (nonzero) polynomial with these coefficients is real. */
export function isRealRootedCoefficients(c: readonly Scalar[]): boolean {
  const p = toIntPoly(c);
  if (p.length <= 2) return true; // constants and linear polynomials
  const g = squarefreePart(p);
  return sturmCount(g) === g.length - 1;
}
