// Bijections from Dyck paths of semilength n onto the permutations of 1..n avoiding one pattern of
// length 3. Pushed through a uniform Dyck path they give exactly uniform avoiders at any size.
//
// - 312: read the path as stack operations on the input 1, 2, ..., n (U pushes the next value, D
//   pops the top to the output). The outputs are exactly the 312-avoiders and distinct words give
//   distinct outputs (Knuth, The Art of Computer Programming vol. 1, §2.2.1 ex. 2-5).
// - 321: the path U^{a1} D^{b1} ... U^{ak} D^{bk} places the left-to-right maxima
//   m_j = a1 + ... + aj at positions 1 + b1 + ... + b(j-1), and the other values fill the other
//   positions in increasing order (Krattenthaler, "Permutations with restricted patterns and Dyck
//   paths", Adv. Appl. Math. 27 (2001) 510-530). The path staying above the axis is exactly what
//   keeps the filled values below the maximum before them.
// - The other four by symmetries: w avoids p iff reverse(w) avoids reverse(p), complement(w)
//   avoids complement(p), inverse(w) avoids inverse(p). So 231 = inverse of 312, 213 = reverse of
//   312, 132 = complement of 312, 123 = reverse of 321.

/** Stack word: the 312-avoider whose path is `steps` (+1 = U, -1 = D). */
export function stackOutput(steps: readonly number[]): number[] {
  const out: number[] = [];
  const stack: number[] = [];
  let next = 1;
  for (const s of steps) {
    if (s > 0) stack.push(next++);
    else out.push(stack.pop()!);
  }
  return out;
}

/** The 321-avoider with left-to-right maxima read off the runs of `steps`. */
export function maximaFilling(steps: readonly number[]): number[] {
  const n = steps.length >> 1;
  const a = new Array<number>(n).fill(0);
  const isMax = new Uint8Array(n + 1);
  let ups = 0,
    downs = 0;
  for (let i = 0; i < steps.length; i++) {
    if (steps[i] > 0) {
      ups++;
      // the last U of a run: the maximum m = ups sits at position `downs` (0-based)
      if (i + 1 < steps.length && steps[i + 1] < 0) {
        a[downs] = ups;
        isMax[ups] = 1;
      }
    } else downs++;
  }
  let v = 1;
  for (let i = 0; i < n; i++) {
    if (a[i] !== 0) continue;
    while (isMax[v]) v++;
    a[i] = v++;
  }
  return a;
}

const reversed = (a: number[]): number[] => a.reverse();
const complemented = (a: number[]): number[] => a.map((x) => a.length + 1 - x);
const inverted = (a: number[]): number[] => {
  const q = new Array<number>(a.length);
  for (let i = 0; i < a.length; i++) q[a[i] - 1] = i + 1;
  return q;
};

/** The bijection from Dyck paths onto the avoiders of each pattern of length 3. */
export const DYCK_TO_AVOIDER: Readonly<Record<string, (steps: readonly number[]) => number[]>> = {
  '312': stackOutput,
  '231': (s) => inverted(stackOutput(s)),
  '213': (s) => reversed(stackOutput(s)),
  '132': (s) => complemented(stackOutput(s)),
  '321': maximaFilling,
  '123': (s) => reversed(maximaFilling(s)),
};

/** The bijection for a single pattern, or undefined when there is none here. */
export function dyckBijectionFor(pats: readonly (readonly number[])[]): ((steps: readonly number[]) => number[]) | undefined {
  if (pats.length !== 1 || pats[0].length !== 3) return undefined;
  return DYCK_TO_AVOIDER[pats[0].join('')];
}
