// Statistics of signed permutations (Björner and Brenti, Combinatorics of Coxeter Groups, ch. 8):
// the Coxeter length for the generators s_0 (negate w(1)) and s_i (exchange w(i), w(i+1)), the
// type B descents with w(0) = 0, and the flag major index of Adin and Roichman.

/** inv(w) + neg(w) + nsp(w) (Björner and Brenti, Prop. 8.1.1). */
export function lengthB(a: readonly number[]): number {
  const n = a.length;
  let l = 0;
  for (let i = 0; i < n; i++) {
    if (a[i] < 0) l++;
    for (let j = i + 1; j < n; j++) {
      if (a[i] > a[j]) l++;
      if (a[i] + a[j] < 0) l++;
    }
  }
  return l;
}

/** #{i in 0..n-1 : w(i) > w(i+1)} with w(0) = 0 (Björner and Brenti, Prop. 8.1.2). */
export function desB(a: readonly number[]): number {
  let d = 0,
    prev = 0;
  for (const v of a) {
    if (prev > v) d++;
    prev = v;
  }
  return d;
}

export function negatives(a: readonly number[]): number {
  let c = 0;
  for (const v of a) if (v < 0) c++;
  return c;
}

/**
 * fmaj(w) = 2 maj(w) + neg(w), maj the sum of the i in 1..n-1 with w(i) > w(i+1) in the usual
 * order of the integers (Adin and Roichman, "The flag major index and group actions on polynomial
 * rings", European J. Combin. 22 (2001)); equidistributed with the length.
 */
export function fmaj(a: readonly number[]): number {
  let m = 0;
  for (let i = 1; i < a.length; i++) if (a[i - 1] > a[i]) m += i;
  return 2 * m + negatives(a);
}
