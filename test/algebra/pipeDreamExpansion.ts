// An independent second algorithm for Schubert-type polynomials: the pipe dream expansions.
// Written from the definitions, sharing nothing with the divided-difference code:
// - S_w = sum over reduced pipe dreams P of w of prod_{(i,j) in P} x_i
//   (Billey–Jockusch–Stanley 1993, Bergeron–Billey 1993);
// - S_w(x; y) = sum over the same P of prod (x_i - y_j) (Fomin–Kirillov 1996; BJS Thm 1.1 form);
// - G_w = sum over all pipe dreams P whose Demazure product is w of (-1)^{|P| - inv(w)} prod x_i
//   (Fomin–Kirillov 1994; "Gröbner geometry of Schubert polynomials", Ann. of Math. 2005, §1.4).
// Exponent vectors are plain string keys here, deliberately unlike the library.

export type Expansion = Map<string, bigint>; // "e1,e2,..." (x exponents, then y exponents) -> coefficient

export function inversions(w: number[]): number {
  let c = 0;
  for (let i = 0; i < w.length; i++) for (let j = i + 1; j < w.length; j++) if (w[i] > w[j]) c++;
  return c;
}

/** Trace the pipes: the pipe entering row i from the left leaves at the top of column w(i). */
export function tracePipes(n: number, crosses: Set<string>): number[] {
  const w: number[] = [];
  for (let start = 1; start <= n; start++) {
    let i = start,
      j = 1,
      dir: 'right' | 'up' = 'right';
    // Entering tile (i, j) moving `dir`; elbows join left-top and bottom-right.
    while (i >= 1) {
      const cross = crosses.has(`${i},${j}`);
      if (dir === 'right') {
        if (cross) j++;
        else {
          dir = 'up';
          i--;
        }
      } else {
        if (cross) i--;
        else {
          dir = 'right';
          j++;
        }
      }
    }
    w.push(j);
  }
  return w;
}

/** Reading word: rows top to bottom, each right to left, cross (i, j) gives the letter i + j - 1. */
function readingWord(cells: [number, number][]): number[] {
  const sorted = cells.slice().sort((a, b) => a[0] - b[0] || b[1] - a[1]);
  return sorted.map(([i, j]) => i + j - 1);
}

/** Demazure product of a word: multiply by s_a on the right only when that lengthens. */
function demazure(n: number, word: number[]): number[] {
  const w = Array.from({ length: n }, (_, i) => i + 1);
  for (const a of word) if (w[a - 1] < w[a]) [w[a - 1], w[a]] = [w[a], w[a - 1]];
  return w;
}

function addTo(m: Expansion, key: string, c: bigint) {
  const v = (m.get(key) ?? 0n) + c;
  if (v === 0n) m.delete(key);
  else m.set(key, v);
}

/** Every subset of the staircase {(i, j): i + j <= n}, with its traced and Demazure permutations. */
export function* pipeDreamsIn(n: number): Generator<{ cells: [number, number][]; traced: number[]; demazure: number[] }> {
  const stair: [number, number][] = [];
  for (let i = 1; i < n; i++) for (let j = 1; i + j <= n; j++) stair.push([i, j]);
  for (let mask = 0; mask < 1 << stair.length; mask++) {
    const cells = stair.filter((_, k) => mask & (1 << k));
    const set = new Set(cells.map(([i, j]) => `${i},${j}`));
    yield { cells, traced: tracePipes(n, set), demazure: demazure(n, readingWord(cells)) };
  }
}

const same = (a: number[], b: number[]) => a.length === b.length && a.every((v, i) => v === b[i]);

/** Schubert polynomials of all of S_n by reduced pipe dreams: key w.join(',') -> x-exponent expansion. */
export function schubertByPipeDreams(n: number): Map<string, Expansion> {
  const out = new Map<string, Expansion>();
  for (const { cells, traced } of pipeDreamsIn(n)) {
    if (cells.length !== inversions(traced)) continue; // reduced: no two pipes cross twice
    const e = new Array(n - 1).fill(0);
    for (const [i] of cells) e[i - 1]++;
    const k = traced.join(',');
    if (!out.has(k)) out.set(k, new Map());
    addTo(out.get(k)!, e.join(','), 1n);
  }
  return out;
}

/** Grothendieck polynomials of all of S_n by all pipe dreams (Demazure product), with signs. */
export function grothendieckByPipeDreams(n: number): Map<string, Expansion> {
  const out = new Map<string, Expansion>();
  for (const { cells, demazure: w } of pipeDreamsIn(n)) {
    const e = new Array(n - 1).fill(0);
    for (const [i] of cells) e[i - 1]++;
    const k = w.join(',');
    if (!out.has(k)) out.set(k, new Map());
    const sign = (cells.length - inversions(w)) % 2 === 0 ? 1n : -1n;
    addTo(out.get(k)!, e.join(','), sign);
  }
  return out;
}

/** Double Schubert polynomials by reduced pipe dreams, expanded: keys "x exps|y exps". */
export function doubleSchubertByPipeDreams(n: number): Map<string, Expansion> {
  const out = new Map<string, Expansion>();
  for (const { cells, traced } of pipeDreamsIn(n)) {
    if (cells.length !== inversions(traced)) continue;
    // Expand prod (x_i - y_j): choose x_i or -y_j from each factor.
    const k = traced.join(',');
    if (!out.has(k)) out.set(k, new Map());
    const m = out.get(k)!;
    for (let mask = 0; mask < 1 << cells.length; mask++) {
      const ex = new Array(n).fill(0),
        ey = new Array(n).fill(0);
      let sign = 1n;
      cells.forEach(([i, j], t) => {
        if (mask & (1 << t)) {
          ey[j - 1]++;
          sign = -sign;
        } else ex[i - 1]++;
      });
      addTo(m, `${ex.join(',')}|${ey.join(',')}`, sign);
    }
  }
  return out;
}

export { same as sameArray };
