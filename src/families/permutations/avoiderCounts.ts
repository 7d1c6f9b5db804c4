// Closed forms for the number of permutations avoiding one pattern, where a published one exists;
// used by avoiders(n, p).count so that planning a size does not require generating the class.
// Counting by generation remains the reference (the tests compare both).

import { bigGcd } from '../../numbers/integer.js';

function catalan(n: number): bigint {
  let c = 1n;
  for (let i = 0; i < n; i++) c = (c * 2n * BigInt(2 * i + 1)) / BigInt(i + 2);
  return c;
}

function factorial(n: number): bigint {
  let r = 1n;
  for (let i = 2; i <= n; i++) r *= BigInt(i);
  return r;
}

const reverse = (p: readonly number[]) => p.slice().reverse();
const complement = (p: readonly number[]) => p.map((x) => p.length + 1 - x);
const inverse = (p: readonly number[]) => {
  const q = new Array<number>(p.length);
  p.forEach((v, i) => (q[v - 1] = i + 1));
  return q;
};

/** The patterns obtained from p by reverse, complement and inverse (its symmetry class, at most 8). */
export function symmetryClass(p: readonly number[]): Set<string> {
  const seen = new Set<string>();
  const todo = [p.slice()];
  while (todo.length) {
    const q = todo.pop()!;
    const k = q.join('');
    if (seen.has(k)) continue;
    seen.add(k);
    todo.push(reverse(q), complement(q), inverse(q));
  }
  return seen;
}

/**
 * Bóna's formula for 1342-avoiders (M. Bóna, "Exact enumeration of 1342-avoiding permutations: a
 * close link with labeled trees and planar maps", J. Combin. Theory A 80 (1997) 257-272; OEIS A022558):
 * a(n) = (7n^2-3n-2)/2 (-1)^(n-1) + 3 sum_{i=2..n} 2^(i+1) (2i-4)! / (i! (i-2)!) C(n-i+2, 2) (-1)^(n-i).
 * Summed exactly as a fraction.
 */
export function bona1342(n: number): bigint {
  if (n === 0) return 1n;
  let num = 0n,
    den = 1n;
  for (let i = 2; i <= n; i++) {
    const m = BigInt(n - i + 2);
    let tNum = (1n << BigInt(i + 1)) * factorial(2 * i - 4) * ((m * (m - 1n)) / 2n);
    const tDen = factorial(i) * factorial(i - 2);
    if ((n - i) % 2) tNum = -tNum;
    num = num * tDen + tNum * den;
    den *= tDen;
    const g = bigGcd(num < 0n ? -num : num, den);
    if (g > 1n) {
      num /= g;
      den /= g;
    }
  }
  const N = BigInt(n);
  let head = (7n * N * N - 3n * N - 2n) / 2n;
  if ((n - 1) % 2) head = -head;
  const total = head * den + 3n * num;
  if (total % den !== 0n) throw new Error(`Bóna's formula gave a non-integer at n = ${n}`);
  return total / den;
}

const CLASS_1342 = symmetryClass([1, 3, 4, 2]);

/** The number of avoiders of a single pattern by a closed form, or undefined when none is known here. */
export function closedFormCount(n: number, p: readonly number[]): bigint | undefined {
  // Every pattern of length 3: Catalan numbers (Knuth, The Art of Computer Programming vol. 1,
  // §2.2.1 ex. 5; Simion and Schmidt, "Restricted permutations", European J. Combin. 6 (1985)); OEIS A000108.
  if (p.length === 3) return catalan(n);
  if (p.length === 4 && CLASS_1342.has(p.join(''))) return bona1342(n);
  if (p.length === 1) return n === 0 ? 1n : 0n;
  if (p.length === 2) return 1n;
  if (p.length > n) return factorial(n);
  return undefined;
}
