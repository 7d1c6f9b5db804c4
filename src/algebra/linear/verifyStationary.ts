// The exact check every stationary measure passes before it is returned: with pi(s) = nums[s]/den,
// all nums >= 0, sum nums = den, and for every state t, sum_s nums[s] P(s, t) = nums[t], computed
// over the integers after clearing every denominator (no rounding anywhere).
//
// With L the least common multiple of the numerators of the row totals, C_s = nums[s] L / total(s)
// is an integer, and (for integer weights) the balance at t reads  sum_s C_s w(s, t) = nums[t] L.
// When the weights are integers whose sum into every state is below 2^29, the left side is formed
// in exact multi-word arithmetic: C_s is cut into 24-bit limbs, and limb j of the sum is a sum of
// products limb * weight below 2^24 * 2^29, exact in a double; only the final comparison per state
// is done in BigInt. Other chains use BigInt throughout.

import { bigGcd } from '../../numbers/integer.js';
import { denOf, numOf } from '../../numbers/rational.js';
import type { CommonFraction } from './reconstruction.js';
import type { SparseChain } from './sparseChain.js';

function lcmOf(values: Iterable<bigint>): bigint {
  let l = 1n;
  for (const v of new Set(values)) l = (l / bigGcd(l, v)) * v;
  return l;
}

/** Largest sum of weights into one state for the multi-word path. */
const IN_LIMIT = 2 ** 29;
const LIMB = 2 ** 24;
const LIMB_BITS = 24n;

export function isStationary(c: SparseChain, pi: CommonFraction): boolean {
  const n = c.size;
  if (pi.nums.length !== n || pi.den <= 0n) return false;
  let sum = 0n;
  for (const a of pi.nums) {
    if (a < 0n) return false;
    sum += a;
  }
  if (sum !== pi.den) return false;
  // C_s = nums[s] den(total) (L / num(total)).
  const totalNum = c.total.map(numOf);
  const L = lcmOf(totalNum);
  const C: bigint[] = new Array(n);
  let maxC = 0n;
  for (let s = 0; s < n; s++) {
    const t = c.total[s];
    const factor = typeof t === 'number' ? L / BigInt(t) : (L / totalNum[s]) * denOf(t);
    C[s] = pi.nums[s] * factor;
    if (C[s] > maxC) maxC = C[s];
  }
  return smallWeights(c) ? balancesByLimbs(c, pi, C, maxC, L) : balancesBig(c, pi, C, L);
}

/** Whether every weight is a number and the weights into every state sum to below IN_LIMIT. */
function smallWeights(c: SparseChain): boolean {
  const into = new Float64Array(c.size);
  for (let k = 0; k < c.target.length; k++) {
    const w = c.weight[k];
    if (typeof w !== 'number') return false;
    into[c.target[k]] += w;
  }
  for (let t = 0; t < c.size; t++) if (into[t] >= IN_LIMIT) return false;
  return true;
}

function balancesByLimbs(c: SparseChain, pi: CommonFraction, C: bigint[], maxC: bigint, L: bigint): boolean {
  const n = c.size;
  let J = 1;
  while (maxC >> (LIMB_BITS * BigInt(J)) > 0n) J++;
  const limbs = new Float64Array(n * J);
  for (let s = 0; s < n; s++) {
    let x = C[s];
    if (x <= BigInt(Number.MAX_SAFE_INTEGER)) {
      let v = Number(x);
      for (let j = 0; j < J && v > 0; j++) {
        const q = Math.floor(v / LIMB);
        limbs[s * J + j] = v - q * LIMB;
        v = q;
      }
    } else {
      for (let j = 0; j < J; j++) {
        limbs[s * J + j] = Number(x & BigInt(LIMB - 1));
        x >>= LIMB_BITS;
      }
    }
  }
  const acc = new Float64Array(n * J);
  const { rowStart, target } = c;
  const weight = c.weight as readonly number[];
  for (let s = 0; s < n; s++) {
    const base = s * J;
    for (let k = rowStart[s]; k < rowStart[s + 1]; k++) {
      const w = weight[k],
        t = target[k] * J;
      for (let j = 0; j < J; j++) acc[t + j] += limbs[base + j] * w;
    }
  }
  for (let t = 0; t < n; t++) {
    let total = 0n;
    for (let j = J - 1; j >= 0; j--) total = (total << LIMB_BITS) + BigInt(acc[t * J + j]);
    if (total !== pi.nums[t] * L) return false;
  }
  return true;
}

function balancesBig(c: SparseChain, pi: CommonFraction, C: bigint[], L: bigint): boolean {
  const n = c.size;
  // Integer weights W = w Lw.
  const Lw = lcmOf(c.weight.map(denOf));
  const acc = new Array<bigint>(n).fill(0n);
  for (let s = 0; s < n; s++) {
    if (C[s] === 0n) continue;
    for (let k = c.rowStart[s]; k < c.rowStart[s + 1]; k++) {
      const w = c.weight[k];
      const W = numOf(w) * (Lw / denOf(w));
      acc[c.target[k]] += C[s] * W;
    }
  }
  const scale = L * Lw;
  for (let t = 0; t < n; t++) if (acc[t] !== pi.nums[t] * scale) return false;
  return true;
}
