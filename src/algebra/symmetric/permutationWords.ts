// One-line permutations (a[i-1] = w(i)) for the Schubert-side functions: Lehmer codes, the
// permutation with a given code, length, and the right weak order test used to walk reduced words
// (w = s_{a_1} s_{a_2} ... s_{a_l}, right multiplication by s_i exchanging positions i and i+1).

/** The Lehmer code c_i = #{j > i : w(j) < w(i)}. */
export function lehmerCode(a: readonly number[]): number[] {
  return a.map((v, i) => {
    let c = 0;
    for (let j = i + 1; j < a.length; j++) if (a[j] < v) c++;
    return c;
  });
}

/** The permutation whose Lehmer code is `code` (any sequence of nonnegative integers), trimmed. */
export function fromLehmerCode(code: readonly number[]): number[] {
  let n = code.length;
  code.forEach((c, i) => (n = Math.max(n, i + 1 + c)));
  const free = Array.from({ length: n }, (_, i) => i + 1);
  const out: number[] = [];
  for (let i = 0; i < n; i++) {
    const c = code[i] ?? 0;
    out.push(free.splice(c, 1)[0]);
  }
  let m = out.length;
  while (m > 0 && out[m - 1] === m) m--;
  return out.slice(0, m);
}

export function lengthOf(a: readonly number[]): number {
  let inv = 0;
  for (let i = 0; i < a.length; i++) for (let j = i + 1; j < a.length; j++) if (a[i] > a[j]) inv++;
  return inv;
}

/** w padded with fixed points to size n. */
export function padTo(a: readonly number[], n: number): number[] {
  const out = a.slice();
  for (let i = a.length + 1; i <= n; i++) out.push(i);
  return out;
}

/**
 * For walking reduced words of w from the left: `extends(u, i)` says whether u s_i is longer than u
 * and still a left factor of w (w = u s_i v with lengths adding up), i.e. the values u(i) < u(i+1)
 * appear in w in the other order.
 */
export function leftFactorTest(w: readonly number[]): (u: readonly number[], i: number) => boolean {
  const pos = new Int32Array(w.length + 2);
  w.forEach((v, k) => (pos[v] = k));
  return (u, i) => u[i - 1] < u[i] && pos[u[i]] < pos[u[i - 1]];
}
