// Symmetry for free: the coarsest partition of the states that is equitable in both directions,
// i.e. for blocks B, B' the sums  sum_{t in B'} P(s, t)  (s in B)  and  sum_{s in B'} P(s, t)
// (t in B) do not depend on the chosen s or t. Then the chain is lumpable (Kemeny and Snell,
// Finite Markov Chains, 1960, Theorem 6.3.2), and if rho is the stationary measure of the lumped
// chain, pi(s) = rho(B)/|B| is stationary for the original one:
//   sum_s pi(s) P(s,t) = sum_B' rho(B')/|B'| c(B,B') = (1/|B|) sum_B' rho(B') r(B',B) = rho(B)/|B|,
// using |B| c(B,B') = |B'| r(B',B) (both count the weight between B' and B). Chains on
// combinatorial objects usually commute with a symmetry group (rotations and reflections of a
// circle), whose orbits refine this partition, so the linear system shrinks by about the group's
// order.
//
// The partition is found by colour refinement, comparing the sums through their residues modulo
// two primes (with pseudo-random multipliers per colour, so a whole profile is one number below
// 2^46; Schwartz–Zippel: two different profiles collide with chance about 2^-46). Equal profiles
// always get equal fingerprints, so every split is genuine; a false merge is caught by the exact
// verification of the final measure, after which the caller solves without lumping.

import { transitionResidues } from './residues.js';
import { buildChain, type SparseChain } from './sparseChain.js';
import { sadd } from '../../numbers/scalar.js';
import type { Scalar } from '../../numbers/rational.js';

const Q1 = 8388593; // primes below 2^23
const Q2 = 8388587;

export interface Partition {
  /** block[s] = the block of state s, blocks numbered 0..count-1 by their smallest state. */
  block: Int32Array;
  count: number;
}

/** A deterministic pseudo-random residue for colour c (a multiplicative hash, no floats). */
function colourWeight(c: number, salt: number, q: number): number {
  let h = Math.imul(c + 1, 0x9e3779b1) ^ Math.imul(salt, 0x85ebca6b);
  h = Math.imul(h ^ (h >>> 15), 0x2c1b3c6d);
  h ^= h >>> 12;
  return ((h >>> 0) % (q - 1)) + 1;
}

/** Sums of products of two residues below 2^23 are reduced before they could pass 2^53. */
const BIG = 2 ** 52;

export function equitablePartition(c: SparseChain): Partition | null {
  const n = c.size;
  const r1 = transitionResidues(c, Q1),
    r2 = transitionResidues(c, Q2);
  if (!r1 || !r2) return null;
  // Incoming edges (transpose), with their residues copied so the rounds read them in order.
  const inStart = new Int32Array(n + 1);
  for (let k = 0; k < c.target.length; k++) inStart[c.target[k] + 1]++;
  for (let t = 0; t < n; t++) inStart[t + 1] += inStart[t];
  const inSource = new Int32Array(c.target.length);
  const in1 = new Float64Array(c.target.length),
    in2 = new Float64Array(c.target.length);
  const fillPos = inStart.slice(0, n);
  for (let s = 0; s < n; s++) {
    for (let k = c.rowStart[s]; k < c.rowStart[s + 1]; k++) {
      const e = fillPos[c.target[k]]++;
      inSource[e] = s;
      in1[e] = r1[k];
      in2[e] = r2[k];
    }
  }
  const { rowStart, target } = c;
  const table = new FingerprintTable(n);
  let colour = new Int32Array(n);
  let next = new Int32Array(n);
  let count = 1;
  for (let round = 0; ; round++) {
    // Per colour, pseudo-random residues for outgoing mass, incoming mass and the colour itself:
    // w1[3k], w1[3k+1], w1[3k+2] modulo Q1, the same in w2 modulo Q2.
    const w1 = new Float64Array(3 * count),
      w2 = new Float64Array(3 * count);
    for (let k = 0; k < count; k++) {
      for (let e = 0; e < 3; e++) {
        w1[3 * k + e] = colourWeight(k, 6 * round + 2 * e, Q1);
        w2[3 * k + e] = colourWeight(k, 6 * round + 2 * e + 1, Q2);
      }
    }
    // Fingerprint of s: own colour + outgoing and incoming mass per colour, each colour with its
    // own random multiplier, modulo Q1 and Q2; the pair is one exact number below 2^46.
    table.clear();
    for (let s = 0; s < n; s++) {
      const cs = 3 * colour[s];
      let h1 = w1[cs + 2],
        h2 = w2[cs + 2];
      for (let k = rowStart[s]; k < rowStart[s + 1]; k++) {
        const col = 3 * colour[target[k]];
        h1 += r1[k] * w1[col];
        h2 += r2[k] * w2[col];
        if (h1 >= BIG) h1 %= Q1;
        if (h2 >= BIG) h2 %= Q2;
      }
      for (let e = inStart[s]; e < inStart[s + 1]; e++) {
        const col = 3 * colour[inSource[e]] + 1;
        h1 += in1[e] * w1[col];
        h2 += in2[e] * w2[col];
        if (h1 >= BIG) h1 %= Q1;
        if (h2 >= BIG) h2 %= Q2;
      }
      next[s] = table.id(h1 % Q1, h2 % Q2);
    }
    const found = table.size;
    // A merge of two colours would be a fingerprint collision; keep the old split then.
    if (found < count) return null;
    [colour, next] = [next, colour];
    if (found === count) break;
    count = found;
  }
  return { block: colour, count };
}

/** Numbers the distinct pairs (a, b) of residues below 2^23 in order of first appearance. */
class FingerprintTable {
  private readonly keys: Float64Array;
  private readonly ids: Int32Array;
  private readonly mask: number;
  size = 0;

  constructor(capacity: number) {
    let len = 16;
    while (len < 2 * capacity) len *= 2;
    this.keys = new Float64Array(len);
    this.ids = new Int32Array(len);
    this.mask = len - 1;
  }

  clear(): void {
    this.keys.fill(-1);
    this.size = 0;
  }

  id(a: number, b: number): number {
    const key = a * 8388608 + b;
    let i = (Math.imul(a ^ Math.imul(b, 0x85ebca6b), 0x9e3779b1) >>> 7) & this.mask;
    for (;;) {
      const k = this.keys[i];
      if (k === key) return this.ids[i];
      if (k < 0) {
        this.keys[i] = key;
        return (this.ids[i] = this.size++);
      }
      i = (i + 1) & this.mask;
    }
  }
}

/**
 * The lumped chain on the blocks: from block B, the weight to block B' is the sum of w(s, t)
 * over t in B' for the first state s of B, out of the same total as s.
 */
export function lumpedChain(c: SparseChain, part: Partition): SparseChain {
  const rep = new Int32Array(part.count).fill(-1);
  for (let s = 0; s < c.size; s++) if (rep[part.block[s]] < 0) rep[part.block[s]] = s;
  const chain = buildChain(part.count, (b) => {
    const s = rep[b];
    const sums = new Map<number, Scalar>();
    for (let k = c.rowStart[s]; k < c.rowStart[s + 1]; k++) {
      const t = part.block[c.target[k]];
      const old = sums.get(t);
      sums.set(t, old === undefined ? c.weight[k] : sadd(old, c.weight[k]));
    }
    return sums.entries();
  });
  return chain;
}
