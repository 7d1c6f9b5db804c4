// signedPermutations(n): the 2^n n! signed permutations of 1..n (OEIS A000165), listed by the
// permutation |w| in lexicographic order and, for each, the sign patterns in binary order (the
// sign of w(1) the most significant bit, + before -).

import { defineFamily } from '../registry.js';
import type { Family, Shrunk, Visit } from '../family.js';
import { factorialBig, sizeArg, unrankLex, type SizeParam } from '../permutations/permutations.js';
import { nextPermutation } from '../permutations/permutation.js';
import { clampRange } from '../common/ranges.js';
import { FamilyArbitrary, fisherYates, lexCompareArrays } from '../common/arbitrary.js';
import { SignedPermutation } from './signedPermutation.js';
import { lengthB } from './statistics.js';

export function signedCount(n: number): bigint {
  return factorialBig(n) << BigInt(n);
}

/** Simplicity: size, then the Coxeter length, then lexicographic. */
export function compareSigned(u: SignedPermutation, v: SignedPermutation): number {
  return u.n - v.n || lengthB(u.a) - lengthB(v.a) || lexCompareArrays(u.a, v.a);
}

/** The signs as n bits, bit n-1 for w(1) (a number: the enumerable sizes are far below 2^30 signs). */
function* walk(n: number, first: bigint, length: number): Generator<number[]> {
  const signs = 1n << BigInt(n);
  const perm = unrankLex(n, first / signs);
  const top = n <= 30 ? 2 ** n : Infinity;
  let bits = Number(first % signs);
  const out = new Array<number>(n);
  for (let left = length; left > 0; left--) {
    for (let i = 0; i < n; i++) out[i] = Math.floor(bits / 2 ** (n - 1 - i)) % 2 ? -perm[i] : perm[i];
    yield out;
    if (++bits === top) {
      bits = 0;
      nextPermutation(perm);
    }
  }
}

function visitRange(n: number, lo: bigint, hi: bigint, visit: Visit<SignedPermutation>): boolean {
  const range = clampRange(lo, hi, signedCount(n));
  if (!range) return false;
  const w = new SignedPermutation(new Array<number>(n));
  w.transient = true;
  for (const out of walk(n, range.first, range.length)) {
    for (let i = 0; i < n; i++) w.a[i] = out[i];
    if (visit(w)) return true;
  }
  return false;
}

/** Delete the entry of absolute value v and standardise the absolute values (keeping signs). */
function deleteValue(a: readonly number[], v: number): number[] {
  return a.filter((x) => Math.abs(x) !== v).map((x) => (Math.abs(x) > v ? x - Math.sign(x) : x));
}

export const signedPermutations: Family<SizeParam, SignedPermutation> = defineFamily<SizeParam, SignedPermutation>({
  name: 'signedPermutations',
  params: [{ name: 'n', type: 'integer' }],
  objectKind: 'signedPermutation',
  signature: 'signedPermutations(n: integer)',
  description:
    'the signed permutations of 1..n (the hyperoctahedral group B_n), by |w| in lexicographic order, then the signs in binary order (+ before -, w(1) first)',
  example: 'count(w in signedPermutations(3))',
  source: '2^n n!, OEIS A000165; length generating function prod [2i]_q, Björner and Brenti, Combinatorics of Coxeter Groups, ch. 8',
  prepare(args) {
    return { n: sizeArg(args[0], 'n', 100_000) };
  },
  count({ n }) {
    return signedCount(n);
  },
  enumerate({ n }, visit) {
    return visitRange(n, 0n, signedCount(n), visit);
  },
  enumerateRange({ n }, lo, hi, visit) {
    return visitRange(n, lo, hi, visit);
  },
  isMember({ n }, obj) {
    if (!(obj instanceof SignedPermutation) || obj.n !== n) return false;
    const seen = new Uint8Array(n + 1);
    for (const v of obj.a) {
      const m = Math.abs(v);
      if (m < 1 || m > n || seen[m]) return false;
      seen[m] = 1;
    }
    return true;
  },
  compare: compareSigned,
  arbitrary(p) {
    return new FamilyArbitrary(
      signedPermutations,
      p,
      (rng) => new SignedPermutation(fisherYates(rng, p.n).map((v) => (rng.nextInt(0, 1) ? -v : v))),
    );
  },
  *shrink({ n }, w): Generator<Shrunk<SizeParam, SignedPermutation>> {
    // Delete an entry and standardise (to B_{n-1}); then, at the same size, make a negative entry
    // positive or undo a descent (each lowers the length by at least one).
    for (let v = n; v >= 1; v--) yield { params: { n: n - 1 }, size: n - 1, obj: new SignedPermutation(deleteValue(w.a, v)) };
    const a = w.a;
    const seen = new Set<string>();
    const cand: number[][] = [];
    for (let i = 0; i < n; i++) if (a[i] < 0) cand.push(a.map((x, j) => (j === i ? -x : x)));
    for (let i = 0; i + 1 < n; i++) if (a[i] > a[i + 1]) cand.push(a.map((x, j) => (j === i ? a[i + 1] : j === i + 1 ? a[i] : x)));
    for (const b of cand) {
      const k = b.join(',');
      if (seen.has(k) || lengthB(b) >= lengthB(a)) continue;
      seen.add(k);
      yield { params: { n }, obj: new SignedPermutation(b) };
    }
  },
});
