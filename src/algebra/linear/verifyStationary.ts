// The exact check every stationary measure passes before it is returned: with pi(s) = nums[s]/den,
// all nums >= 0, sum nums = den, and for every state t, sum_s nums[s] P(s, t) = nums[t], computed
// over the integers after clearing every denominator (BigInt, no rounding anywhere).

import { bigGcd } from '../../numbers/integer.js';
import { denOf, numOf } from '../../numbers/rational.js';
import type { CommonFraction } from './reconstruction.js';
import type { SparseChain } from './sparseChain.js';

function lcmOf(values: Iterable<bigint>): bigint {
  let l = 1n;
  for (const v of new Set(values)) l = (l / bigGcd(l, v)) * v;
  return l;
}

export function isStationary(c: SparseChain, pi: CommonFraction): boolean {
  const n = c.size;
  if (pi.nums.length !== n || pi.den <= 0n) return false;
  let sum = 0n;
  for (const a of pi.nums) {
    if (a < 0n) return false;
    sum += a;
  }
  if (sum !== pi.den) return false;
  // Integer weights W = w * Lw; coefficient C_s = nums[s] / total(s) * L, an integer.
  const Lw = lcmOf(c.weight.map(denOf));
  // nums[s] / total(s) = nums[s] * den(total) / num(total); reduce, and clear the denominators.
  const cNum: bigint[] = new Array(n), cDen: bigint[] = new Array(n);
  for (let s = 0; s < n; s++) {
    let num = pi.nums[s] * denOf(c.total[s]);
    let den = numOf(c.total[s]);
    const g = bigGcd(num, den);
    if (g > 1n) {
      num /= g;
      den /= g;
    }
    cNum[s] = num;
    cDen[s] = den;
  }
  const L = lcmOf(cDen);
  const acc = new Array<bigint>(n).fill(0n);
  for (let s = 0; s < n; s++) {
    if (cNum[s] === 0n) continue;
    const C = cNum[s] * (L / cDen[s]);
    for (let k = c.rowStart[s]; k < c.rowStart[s + 1]; k++) {
      const w = c.weight[k];
      const W = numOf(w) * (Lw / denOf(w));
      acc[c.target[k]] += C * W;
    }
  }
  const scale = L * Lw;
  for (let t = 0; t < n; t++) if (acc[t] !== pi.nums[t] * scale) return false;
  return true;
}
