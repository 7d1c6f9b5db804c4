// Statistics of Dyck paths, on the step list (+1 for U, -1 for D). In the north/east picture of
// a path above the diagonal (U = north, D = east) these are the conventions of J. Haglund, The
// q,t-Catalan Numbers and the Space of Diagonal Harmonics (AMS University Lecture Series 41,
// 2008), ch. 1 and 3.

/** a_i = the height at which the i-th up step starts: the full cells in row i between the path and the diagonal. */
export function areaSequence(steps: readonly number[]): number[] {
  const out: number[] = [];
  let h = 0;
  for (const s of steps) {
    if (s > 0) out.push(h);
    h += s;
  }
  return out;
}

/** The sum of the area sequence (0 for UDUD...UD, n(n-1)/2 for U^n D^n). */
export function area(steps: readonly number[]): number {
  let h = 0,
    a = 0;
  for (const s of steps) {
    if (s > 0) a += h;
    h += s;
  }
  return a;
}

/**
 * Haglund's bounce statistic. The bounce path starts at (0, 0), goes north until it meets the start
 * of an east step of the path, then east to the diagonal, and so on; if it touches the diagonal at
 * (j_1, j_1), ..., (j_b, j_b) = (n, n), bounce = sum over the touches before (n, n) of n - j_i.
 * From the diagonal point (k, k) the bounce path goes north to the number of up steps before the
 * (k+1)-th down step.
 */
export function bounce(steps: readonly number[]): number {
  const n = steps.length >> 1;
  // upsBefore[k] = number of U steps before the (k+1)-th D step
  const upsBefore: number[] = [];
  let ups = 0;
  for (const s of steps) {
    if (s > 0) ups++;
    else upsBefore.push(ups);
  }
  let k = 0,
    b = 0;
  while (k < n) {
    k = upsBefore[k];
    if (k < n) b += n - k;
  }
  return b;
}

/** The largest height reached. */
export function height(steps: readonly number[]): number {
  let h = 0,
    m = 0;
  for (const s of steps) if ((h += s) > m) m = h;
  return m;
}

/** The number of down steps that end on the axis. */
export function returns(steps: readonly number[]): number {
  let h = 0,
    r = 0;
  for (const s of steps) if ((h += s) === 0) r++;
  return r;
}

/** The number of factors UD. */
export function peaks(steps: readonly number[]): number {
  let c = 0;
  for (let i = 0; i + 1 < steps.length; i++) if (steps[i] > 0 && steps[i + 1] < 0) c++;
  return c;
}

/** The number of factors DU. */
export function valleys(steps: readonly number[]): number {
  let c = 0;
  for (let i = 0; i + 1 < steps.length; i++) if (steps[i] < 0 && steps[i + 1] > 0) c++;
  return c;
}

/**
 * Haglund's dinv on the area sequence: pairs i < j with a_i = a_j, plus pairs i < j with
 * a_i = a_j + 1 (Haglund, The q,t-Catalan Numbers, Cor. 3.4 and its surrounding definition).
 */
export function dinv(steps: readonly number[]): number {
  const a = areaSequence(steps);
  let d = 0;
  for (let i = 0; i < a.length; i++) for (let j = i + 1; j < a.length; j++) if (a[i] === a[j] || a[i] === a[j] + 1) d++;
  return d;
}
