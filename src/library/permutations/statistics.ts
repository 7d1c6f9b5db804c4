// Statistics of permutations (LIBRARY.md §2): inversions, major index, descents, excedances,
// fixed points, cycles, sign, longest monotone subsequences, Lehmer code. Each works on the
// one-line notation a (a[i-1] = w(i)) and allocates nothing unless it returns a list.

import { inversions, Permutation } from '../../families/permutations/permutation.js';
import { Partition } from '../../families/partitions/partition.js';
import { defineFunction, type ParamDecl } from '../registry.js';
import type { Value } from '../../values/value.js';
import { Scratch } from './scratch.js';
import { Word } from '../../families/words/word.js';
import { Tableau } from '../../families/tableaux/tableau.js';
import { tableauDescents } from '../tableaux/descents.js';

const topic = 'permutations';
const P: ParamDecl[] = [{ name: 'w', type: 'permutation' }];
/** inv, maj, des and descents also take words (sequences with repeated letters). */
const PW: ParamDecl[] = [{ name: 'w', type: ['permutation', 'word'] }];
/** maj, des and descents also take standard tableaux (i + 1 in a lower row than i). */
const PWT: ParamDecl[] = [{ name: 'w', type: ['permutation', 'word', 'tableau'] }];
const arr = (w: Value): number[] => (w instanceof Word ? w.letters : (w as Permutation).a);

/** Fenwick-tree counts for long permutations, where the quadratic loop would be slow. */
const fenwickBuf = new Scratch();
const LONG = 64;

/** Number of pairs i < j with a[i] > a[j]. */
export function inv(a: readonly number[]): number {
  const n = a.length;
  if (n <= LONG) return inversions(a);
  // a word's letters may exceed its length: the tree spans the largest value
  let m = n;
  for (const v of a) if (v > m) m = v;
  if (m > 4 * n + 1024) return inversions(a);
  const t = fenwickBuf.get(m + 1);
  let c = 0;
  for (let i = n - 1; i >= 0; i--) {
    // values smaller than a[i] already seen to the right
    for (let x = a[i] - 1; x > 0; x -= x & -x) c += t[x];
    for (let x = a[i]; x <= m; x += x & -x) t[x]++;
  }
  return c;
}

/** c[i] = #{j > i : a[j] < a[i]} (the code of Macdonald's Notes on Schubert polynomials, (1.1)). */
export function lehmerCode(a: readonly number[]): number[] {
  const n = a.length;
  const code = a.slice();
  if (n <= LONG) {
    for (let i = 0; i < n; i++) {
      let c = 0;
      const ai = a[i];
      for (let j = i + 1; j < n; j++) if (a[j] < ai) c++;
      code[i] = c;
    }
    return code;
  }
  const t = fenwickBuf.get(n + 1);
  for (let i = n - 1; i >= 0; i--) {
    let c = 0;
    for (let x = a[i] - 1; x > 0; x -= x & -x) c += t[x];
    for (let x = a[i]; x <= n; x += x & -x) t[x]++;
    code[i] = c;
  }
  return code;
}

/** Sum of the descent positions i (1-based) with a(i) > a(i+1). */
export function maj(a: readonly number[]): number {
  let s = 0;
  for (let i = 1; i < a.length; i++) if (a[i - 1] > a[i]) s += i;
  return s;
}

export function des(a: readonly number[]): number {
  let s = 0;
  for (let i = 1; i < a.length; i++) if (a[i - 1] > a[i]) s++;
  return s;
}

export function descents(a: readonly number[]): number[] {
  const out: number[] = [];
  for (let i = 1; i < a.length; i++) if (a[i - 1] > a[i]) out.push(i);
  return out;
}

/** #{i : w(i) > i}. */
export function exc(a: readonly number[]): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) if (a[i] > i + 1) s++;
  return s;
}

export function fixedPoints(a: readonly number[]): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) if (a[i] === i + 1) s++;
  return s;
}

const seenBuf = new Scratch();

/** Number of cycles, fixed points included. */
export function cycles(a: readonly number[]): number {
  const n = a.length;
  const seen = seenBuf.get(n);
  let c = 0;
  for (let i = 0; i < n; i++) {
    if (seen[i]) continue;
    c++;
    for (let j = i; !seen[j]; j = a[j] - 1) seen[j] = 1;
  }
  return c;
}

/** The cycle lengths in weakly decreasing order. */
export function cycleLengths(a: readonly number[]): number[] {
  const n = a.length;
  const seen = seenBuf.get(n);
  const out: number[] = [];
  for (let i = 0; i < n; i++) {
    if (seen[i]) continue;
    let len = 0;
    for (let j = i; !seen[j]; j = a[j] - 1) {
      seen[j] = 1;
      len++;
    }
    out.push(len);
  }
  return out.sort((x, y) => y - x);
}

/** (-1)^(n - number of cycles). */
export function sign(a: readonly number[]): number {
  return (a.length - cycles(a)) % 2 === 0 ? 1 : -1;
}

const tailsBuf = new Scratch();

/**
 * Length of a longest increasing (dir = 1) or decreasing (dir = -1) subsequence by patience
 * sorting: tails[l] is the least possible last entry of an increasing subsequence of length l+1.
 */
function longestMonotone(a: readonly number[], dir: 1 | -1): number {
  const n = a.length;
  const tails = tailsBuf.get(n);
  let len = 0;
  for (let i = 0; i < n; i++) {
    const x = dir * a[i];
    let lo = 0,
      hi = len; // first l with tails[l] >= x
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (tails[mid] < x) lo = mid + 1;
      else hi = mid;
    }
    tails[lo] = x;
    if (lo === len) len++;
  }
  return len;
}

export const lis = (a: readonly number[]): number => longestMonotone(a, 1);
export const lds = (a: readonly number[]): number => longestMonotone(a, -1);

// ---- registration ----

defineFunction({
  name: 'inv',
  topic,
  params: PW,
  returns: 'integer',
  description: 'the number of inversions: pairs i < j with w[i] > w[j] (of a permutation or a word)',
  example: 'inv(perm([3, 1, 4, 2]))',
  exampleValue: '3',
  source:
    'OEIS A008302 (Mahonian numbers: the distribution of inv over S_n); on words, the q-multinomial coefficient (MacMahon; Andrews, The Theory of Partitions, Thm 3.6)',
  impl: (w) => inv(arr(w)),
});

defineFunction({
  name: 'maj',
  topic,
  params: PWT,
  returns: 'integer',
  description:
    'the major index: the sum of the descent positions i, where w[i] > w[i+1] (of a permutation or a word); of a standard tableau, the sum of its descents i (i + 1 in a lower row)',
  example: 'maj(perm([3, 1, 4, 2]))',
  exampleValue: '4',
  source:
    'OEIS A008302 (MacMahon: maj and inv are equidistributed, on permutations and on the rearrangements of a word); on standard tableaux, q^n(lambda) [n]_q! / prod [h]_q (Stanley, Enumerative Combinatorics 2, Cor. 7.21.5)',
  impl: (w) => (w instanceof Tableau ? tableauDescents(w, 'maj(T)').reduce((a, b) => a + b, 0) : maj(arr(w))),
});

defineFunction({
  name: 'des',
  topic,
  params: PWT,
  returns: 'integer',
  description:
    'the number of descents: positions i with w[i] > w[i+1] (of a permutation or a word); of a standard tableau, the i with i + 1 in a lower row',
  example: 'des(perm([3, 1, 4, 2]))',
  exampleValue: '2',
  source: 'OEIS A008292 (Eulerian numbers)',
  impl: (w) => (w instanceof Tableau ? tableauDescents(w, 'des(T)').length : des(arr(w))),
});

defineFunction({
  name: 'descents',
  topic,
  params: PWT,
  returns: 'list',
  description:
    'the list of descent positions i (w[i] > w[i+1]), increasing (of a permutation or a word); of a standard tableau, the i with i + 1 in a lower row than i',
  example: 'descents(perm([3, 1, 4, 2]))',
  exampleValue: '[1, 3]',
  source: 'definition; OEIS A008292 (Eulerian numbers) for their number',
  impl: (w) => (w instanceof Tableau ? tableauDescents(w, 'descents(T)') : descents(arr(w))),
});

defineFunction({
  name: 'exc',
  topic,
  params: P,
  returns: 'integer',
  description: 'the number of excedances: positions i with w[i] > i',
  example: 'exc(perm([3, 1, 4, 2]))',
  exampleValue: '2',
  source: 'OEIS A008292 (Eulerian numbers: exc and des are equidistributed)',
  impl: (w) => exc(arr(w)),
});

defineFunction({
  name: 'fixedPoints',
  topic,
  params: P,
  returns: 'integer',
  description: 'the number of fixed points: positions i with w[i] = i',
  example: 'fixedPoints(perm([1, 3, 2, 4]))',
  exampleValue: '2',
  source: 'OEIS A008290 (rencontres numbers); A000166 (none: derangements)',
  impl: (w) => fixedPoints(arr(w)),
});

defineFunction({
  name: 'cycles',
  topic,
  params: P,
  returns: 'integer',
  description: 'the number of cycles, fixed points included',
  example: 'cycles(perm([2, 1, 4, 5, 3]))',
  exampleValue: '2',
  source: 'OEIS A132393 (unsigned Stirling numbers of the first kind)',
  impl: (w) => cycles(arr(w)),
});

defineFunction({
  name: 'sign',
  topic,
  params: P,
  returns: 'integer',
  description: 'the sign (-1)^inv(w) = (-1)^(n - cycles(w)), 1 or -1',
  example: 'sign(perm([2, 3, 1]))',
  exampleValue: '1',
  source: 'definition; a homomorphism S_n -> {1, -1}',
  impl: (w) => sign(arr(w)),
});

defineFunction({
  name: 'lis',
  topic,
  params: P,
  returns: 'integer',
  description: 'the length of a longest increasing subsequence (patience sorting)',
  example: 'lis(perm([3, 1, 4, 2, 5]))',
  exampleValue: '3',
  source: 'Schensted 1961 (the first row of the RSK shape); lis <= 2 exactly on 123-avoiders, OEIS A000108; lis <= 3: A005802',
  impl: (w) => lis(arr(w)),
});

defineFunction({
  name: 'lds',
  topic,
  params: P,
  returns: 'integer',
  description: 'the length of a longest decreasing subsequence (patience sorting)',
  example: 'lds(perm([3, 1, 4, 2, 5]))',
  exampleValue: '2',
  source: 'Schensted 1961 (the first column of the RSK shape); lds <= 2 exactly on 321-avoiders, OEIS A000108',
  impl: (w) => lds(arr(w)),
});

defineFunction({
  name: 'lehmerCode',
  topic,
  params: P,
  returns: 'list',
  description: 'the code [c_1, ..., c_n] with c_i = #{j > i : w[j] < w[i]}; its sum is inv(w)',
  example: 'lehmerCode(perm([3, 1, 4, 2]))',
  exampleValue: '[2, 0, 1, 0]',
  source: 'Macdonald, Notes on Schubert Polynomials (1991), (1.1); Lehmer 1960',
  impl: (w) => lehmerCode(arr(w)),
});

defineFunction({
  name: 'cycleType',
  topic,
  params: P,
  returns: 'partition',
  description: 'the cycle type: the partition of n formed by the cycle lengths, fixed points included',
  example: 'cycleType(perm([2, 1, 4, 5, 3]))',
  exampleValue: 'partition([3, 2])',
  source: 'definition; n!/z_lambda permutations have cycle type lambda (Stanley, EC1, Prop. 1.3.2)',
  impl: (w) => new Partition(cycleLengths(arr(w))),
});
