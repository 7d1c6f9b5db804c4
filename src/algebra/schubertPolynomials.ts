// Schubert, double Schubert and Grothendieck polynomials by divided differences from the top
// class (Lascoux–Schützenberger): for w0 in S_n the top class is given, and
//   F_{w s_i} = D_i F_w  whenever w(i) > w(i+1)  (so inv(w s_i) = inv(w) - 1),
// with D_i the divided difference in x[i], x[i+1] (isobaric for Grothendieck polynomials).
//
// Speed through structure: results are memoised per permutation and shared by every
// case. All three families are stable under S_n ⊂ S_{n+1} (F_w = F_{w×1}), so a permutation
// is trimmed of trailing fixed points for the memo key and computed in the smallest S_m that
// holds it. To reach w we climb from w by its first ascent (w -> w s_i with w(i) < w(i+1)) until
// w0; every permutation on the way is memoised too, so computing all of S_n costs one divided
// difference per permutation.
//
// This module works on one-line arrays (a[i-1] = w(i)); the library wraps Permutation objects.

import { dividedDifference, isobaricDividedDifference } from './divided.js';
import { fromTerms, pmul, psub, type PolyLike, variable } from './polynomial.js';
import { indexedVarId } from './variables.js';

export type SchubertKind = 'schubert' | 'grothendieck' | 'double';

const memo = new Map<string, PolyLike>();

/** w with trailing fixed points removed (stability), as a fresh array. */
export function trimFixedTail(a: readonly number[]): number[] {
  let m = a.length;
  while (m > 0 && a[m - 1] === m) m--;
  return a.slice(0, m);
}

function topClass(kind: SchubertKind, m: number, x: string, y: string): PolyLike {
  if (kind === 'double') {
    let p: PolyLike = 1;
    for (let i = 1; i < m; i++) for (let j = 1; i + j <= m; j++) p = pmul(p, psub(variable(`${x}[${i}]`), variable(`${y}[${j}]`)));
    return p;
  }
  // x[1]^{m-1} x[2]^{m-2} ... x[m-1]
  const ids: number[] = [],
    e: number[] = [];
  for (let i = 1; i < m; i++) {
    ids.push(indexedVarId(x, i));
    e.push(m - i);
  }
  return fromTerms(ids, [[e, 1]]);
}

function memoKey(kind: SchubertKind, x: string, y: string, w: readonly number[]): string {
  return `${kind}:${x}:${kind === 'double' ? y : ''}:${w.join(',')}`;
}

/**
 * The polynomial of the given kind for the permutation with one-line notation `a`, in the
 * variables x[1], x[2], ... (and y[1], y[2], ... for double Schubert polynomials).
 */
export function schubertFamily(kind: SchubertKind, a: readonly number[], x: string, y = ''): PolyLike {
  const w = trimFixedTail(a);
  const m = w.length;
  if (m <= 1) return 1;
  const key = memoKey(kind, x, y, w);
  const known = memo.get(key);
  if (known !== undefined) return known;

  // Climb to w0 along first ascents, then come back down applying D_i.
  const path: { key: string; i: number }[] = [];
  const cur = w.slice();
  let start: PolyLike | undefined;
  for (;;) {
    let i = 0;
    while (i < m - 1 && cur[i] > cur[i + 1]) i++;
    if (i === m - 1) {
      start = topClass(kind, m, x, y);
      memo.set(memoKey(kind, x, y, cur), start);
      break;
    }
    path.push({ key: memoKey(kind, x, y, cur), i: i + 1 });
    [cur[i], cur[i + 1]] = [cur[i + 1], cur[i]];
    const k = memoKey(kind, x, y, cur);
    const hit = memo.get(k);
    if (hit !== undefined) {
      start = hit;
      break;
    }
  }
  let p: PolyLike = start;
  for (let s = path.length - 1; s >= 0; s--) {
    const { key: k, i } = path[s];
    const a1 = indexedVarId(x, i),
      a2 = indexedVarId(x, i + 1);
    p = kind === 'grothendieck' ? isobaricDividedDifference(p, a1, a2, variable(`${x}[${i + 1}]`)) : dividedDifference(p, a1, a2);
    memo.set(k, p);
  }
  return p;
}

export function schubertPolynomial(a: readonly number[], x: string): PolyLike {
  return schubertFamily('schubert', a, x);
}

export function doubleSchubertPolynomial(a: readonly number[], x: string, y: string): PolyLike {
  return schubertFamily('double', a, x, y);
}

export function grothendieckPolynomial(a: readonly number[], x: string): PolyLike {
  return schubertFamily('grothendieck', a, x);
}

/** Forget every memoised polynomial (tests and benchmarks use it to time cold computations). */
export function clearSchubertMemo(): void {
  memo.clear();
}

export function schubertMemoSize(): number {
  return memo.size;
}
