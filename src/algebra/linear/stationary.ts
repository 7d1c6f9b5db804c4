// The exact stationary measure of a finite chain:
//   1. the closed communicating classes (there must be exactly one; transient states get 0);
//   2. the closed class lumped by its coarsest equitable partition (lumping.ts);
//   3. the stationary vector of that system as rationals: normally from one sparse factorisation
//      modulo one prime and p-adic lifting (padicLifting.ts), for chains with huge weights from
//      solves modulo primes p_0, p_1, ... (modularKernel.ts) folded by Chinese remaindering; either
//      way turned into rationals by rational reconstruction, and as soon as a reconstruction
//      exists it is
//   4. verified exactly against the original chain (verifyStationary.ts) and returned; if it
//      fails, more digits or primes are added (a reconstruction that is stable over an extra one
//      and still fails means the system was wrong: see lumping.ts).
// Nothing is returned that has not passed step 4.

import { fail } from '../../base/errors.js';
import { bigGcd } from '../../numbers/integer.js';
import { makeRat, type Scalar } from '../../numbers/rational.js';
import { closedClasses } from './closedClasses.js';
import { equitablePartition, lumpedChain } from './lumping.js';
import { modPrime } from './modular.js';
import { integerGenerator, type IntegerGenerator } from './integerGenerator.js';
import { stationaryModP, type PivotPlan } from './modularKernel.js';
import { PadicKernel } from './padicLifting.js';
import { agreesModP, CrtVector, reconstructVector, type CommonFraction } from './reconstruction.js';
import { describeByNumber, restrictChain, type Describe, type SparseChain } from './sparseChain.js';
import { isStationary } from './verifyStationary.js';

export interface StationaryOptions {
  /** Prints a state in error messages (default: "state 3", 1-based). */
  describe?: Describe;
  /** Called now and then with the fraction of the work done (0..1, nondecreasing). */
  onProgress?: (fraction: number) => void;
  /** Use the equitable partition to shrink the system (default true). */
  lump?: boolean;
  /** Give up (an internal error) after this many primes or p-adic digits (default 400: about 9000 bits). */
  maxPrimes?: number;
}

/** What the last solve did, for benchmarks and tests. */
export interface SolveStats {
  states: number;
  closedClassSize: number;
  /** Size of the system actually solved (blocks of the equitable partition, or the class). */
  systemSize: number;
  /** 'lifting': one prime and p-adic digits; 'primes': one solve per prime, Chinese remaindering. */
  method: 'lifting' | 'primes';
  /** Primes factored (for 'lifting', unlucky ones included). */
  primes: number;
  /** p-adic digits computed ('lifting' only). */
  digits: number;
  denseSize: number;
  lumped: boolean;
}

export let lastSolveStats: SolveStats | null = null;

const SHOWN_STATES = 3;

function classesMessage(classes: number[][], describe: Describe): string {
  const shown = classes.slice(0, 5).map((cls) => {
    const some = cls.slice(0, SHOWN_STATES).map(describe).join(', ');
    const more = cls.length > SHOWN_STATES ? `, ... (${cls.length} states)` : cls.length === 1 ? ' (1 state)' : ` (${cls.length} states)`;
    return `{${some}${more}}`;
  });
  const rest = classes.length > 5 ? ` and ${classes.length - 5} more` : '';
  return (
    `the chain has ${classes.length} closed classes, so its stationary measure is not unique: ` +
    `${shown.join('; ')}${rest}. Every closed class carries its own stationary measure; ` +
    `restrict the chain to one of them or add moves between them`
  );
}

/**
 * The stationary vector of an irreducible chain as a common fraction (pi(s) = nums[s] / den);
 * `accept` is the exact test a candidate must pass. Null when a candidate is stable yet fails the
 * test (the system is not the chain's: a wrong lumping).
 */
function solveIrreducible(
  c: SparseChain,
  accept: (f: CommonFraction) => boolean,
  opts: StationaryOptions,
  stats: SolveStats,
): CommonFraction | null {
  const g = integerGenerator(c);
  return g ? solveByLifting(c, g, accept, opts, stats) : solveByPrimes(c, accept, opts, stats);
}

/** Share of the progress bar given to the factorisation in solveByLifting (the digits are cheap). */
const FACTOR_SHARE = 0.8;

/**
 * One factorisation modulo one prime, then p-adic digits of the kernel (padicLifting.ts) until a
 * rational reconstruction passes the exact test. Needs the integer form of the chain.
 */
function solveByLifting(
  c: SparseChain,
  g: IntegerGenerator,
  accept: (f: CommonFraction) => boolean,
  opts: StationaryOptions,
  stats: SolveStats,
): CommonFraction | null {
  const maxDigits = opts.maxPrimes ?? 400;
  stats.method = 'lifting';
  const progress = opts.onProgress;
  let kernel: PadicKernel | null = null;
  for (let k = 0; !kernel; k++) {
    // An unlucky prime divides a pivot (chance about 1/p each); twenty in a row cannot happen
    // for a nonsingular system, so that is an internal error.
    if (k >= 20) throw new Error('no prime is usable for this chain');
    stats.primes = k + 1;
    kernel = PadicKernel.start(c, g, modPrime(k), {
      onProgress: progress ? (f) => progress(FACTOR_SHARE * f) : undefined,
    });
  }
  stats.denseSize = kernel.lu.plan.denseOrder.length;
  let previous: CommonFraction | null = null;
  let rejected = 0;
  let expected = 3;
  while (kernel.digits < maxDigits) {
    kernel.step();
    stats.digits = kernel.digits;
    if (kernel.digits >= expected) expected = kernel.digits + 1;
    progress?.(Math.min(0.99, FACTOR_SHARE + ((1 - FACTOR_SHARE) * kernel.digits) / expected));
    const y = reconstructVector(kernel);
    if (!y) continue;
    if (previous && sameFraction(previous, y)) {
      // Stable over an extra digit, yet it failed the exact test when it was made: either a
      // coincidence (chance about 1/p; more digits fix it) or a system that is not the chain's.
      if (++rejected >= 2) return null;
    }
    previous = y;
    // pi(s) is proportional to T'_s y(s) (integerGenerator.ts).
    const nums = y.nums.map((a, s) => a * BigInt(g.total[s]));
    let den = 0n;
    for (const a of nums) den += a;
    if (accept({ nums, den })) return { nums, den };
  }
  throw new Error(`the stationary measure did not stabilise within ${maxDigits} p-adic digits`);
}

function sameFraction(a: CommonFraction, b: CommonFraction): boolean {
  return a.den === b.den && a.nums.every((x, i) => x === b.nums[i]);
}

/**
 * The stationary vector from its residues modulo successive primes (modularKernel.ts), folded by
 * Chinese remaindering; for chains whose weights are too large for solveByLifting.
 */
function solveByPrimes(
  c: SparseChain,
  accept: (f: CommonFraction) => boolean,
  opts: StationaryOptions,
  stats: SolveStats,
): CommonFraction | null {
  const maxPrimes = opts.maxPrimes ?? 400;
  stats.method = 'primes';
  const crt = new CrtVector(c.size);
  let plan: PivotPlan | undefined;
  let candidate: CommonFraction | null = null;
  let used = 0;
  let rejected = 0;
  let expected = 3;
  for (let k = 0; k < maxPrimes; k++) {
    const p = modPrime(k);
    const onProgress = opts.onProgress ? (f: number) => opts.onProgress!(Math.min(0.99, (used + f) / expected)) : undefined;
    const r = stationaryModP(c, p, { plan, onProgress });
    if (!r) continue; // an unlucky prime
    plan = r.plan;
    stats.denseSize = r.plan.denseOrder.length;
    used++;
    stats.primes = used;
    if (candidate && agreesModP(candidate, r.x, p)) {
      // Stable across an extra prime, yet it failed the exact test when it was made: either a
      // coincidence (chance about 1/p; more primes fix it) or a system that is not the chain's
      // (a wrong lumping, which the caller then drops).
      if (++rejected >= 2) return null;
    }
    crt.add(r.x, p);
    candidate = reconstructVector(crt);
    // The exact test costs less than one more prime and proves more than agreement with it, so
    // every reconstruction is tested at once.
    if (candidate && accept(candidate)) return candidate;
    if (used >= expected) expected = used + 1;
  }
  throw new Error(`the stationary measure did not stabilise within ${maxPrimes} primes`);
}

function toScalars(f: CommonFraction): Scalar[] {
  return f.nums.map((a) => makeRat(a, f.den));
}

/**
 * The exact stationary measure, pi(s) = nums[s] / den with the fraction in lowest terms overall.
 * Fails (naming the closed classes) when it is not unique.
 */
export function stationaryFraction(c: SparseChain, opts: StationaryOptions = {}): CommonFraction {
  const describe = opts.describe ?? describeByNumber;
  const classes = closedClasses(c);
  if (classes.length !== 1) fail(classesMessage(classes, describe));
  const cls = classes[0];
  const sub = cls.length === c.size ? c : restrictChain(c, cls);
  const stats: SolveStats = {
    states: c.size,
    closedClassSize: cls.length,
    systemSize: cls.length,
    method: 'lifting',
    primes: 0,
    digits: 0,
    denseSize: 0,
    lumped: false,
  };
  lastSolveStats = stats;

  // Spread a measure on the class to the whole chain (transient states get 0) and test it.
  const spread = (local: CommonFraction): CommonFraction => {
    const nums = new Array<bigint>(c.size).fill(0n);
    cls.forEach((s, i) => (nums[s] = local.nums[i]));
    return { nums, den: local.den };
  };
  const acceptFull = (f: CommonFraction) => isStationary(c, f);

  let result: CommonFraction | null = null;
  if (opts.lump !== false && sub.size > 1) {
    const part = equitablePartition(sub);
    if (part && part.count < sub.size) {
      const lumped = lumpedChain(sub, part);
      const sizes = new Array<bigint>(part.count).fill(0n);
      for (let s = 0; s < sub.size; s++) sizes[part.block[s]]++;
      let L = 1n;
      for (const z of new Set(sizes)) L = (L / bigGcd(L, z)) * z;
      // pi(s) = rho(B)/|B| = rho_num(B) (L/|B|) / (rho_den L).
      const expand = (rho: CommonFraction): CommonFraction =>
        spread({
          nums: Array.from({ length: sub.size }, (_, s) => rho.nums[part.block[s]] * (L / sizes[part.block[s]])),
          den: rho.den * L,
        });
      stats.systemSize = part.count;
      stats.lumped = true;
      const rho = solveIrreducible(lumped, (f) => acceptFull(expand(f)), opts, stats);
      if (rho) result = expand(rho);
    }
  }
  if (!result) {
    stats.systemSize = sub.size;
    stats.lumped = false;
    result = solveIrreducible(sub, (f) => acceptFull(spread(f)), opts, stats);
    if (!result) throw new Error('the stationary measure failed its exact verification');
    result = spread(result);
  }
  // Lowest terms for the whole vector.
  let g = result.den;
  for (const a of result.nums) {
    if (g === 1n) break;
    g = bigGcd(g, a);
  }
  if (g > 1n) result = { nums: result.nums.map((a) => a / g), den: result.den / g };
  opts.onProgress?.(1);
  return result;
}

/** The exact stationary measure as one Scalar per state. */
export function stationaryMeasure(c: SparseChain, opts: StationaryOptions = {}): Scalar[] {
  return toScalars(stationaryFraction(c, opts));
}
