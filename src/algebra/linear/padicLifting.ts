// The kernel of the integer generator G (integerGenerator.ts) p-adically, from one factorisation
// modulo one prime (Dixon, "Exact solution of linear equations using p-adic expansions",
// Numerische Mathematik 40 (1982)). With the free state f of the factorisation (modularLU.ts) and
// y(f) = 1, the other unknowns solve a nonsingular system; its solution y is expanded as
// y = z_0 + z_1 p + z_2 p^2 + ... with residue vectors z_i:
//   z_0 = the kernel modulo p (z_0(f) = 1),     R_1 = -G z_0 / p,
//   z_i solves G z_i = R_i modulo p (z_i(f) = 0), R_{i+1} = (R_i - G z_i) / p,
// so that G (z_0 + ... + z_{i-1} p^{i-1}) + p^i R_i = 0 exactly, and the partial sums are y modulo
// p^i. Each digit costs one solve with the factorisation and one product with the sparse G; the
// divisions by p are exact. The residuals stay small: |R_{i+1}| <= |R_i| / p + max_t sum_s
// |G[t][s]|, so with that row sum below 2^29 (ROW_LIMIT) every number here is an integer below
// 2^52, exact in a double. (Row f is left out throughout: its equation follows from the others,
// since the columns of G sum to 0.)

import { reduce } from './modular.js';
import type { IntegerGenerator } from './integerGenerator.js';
import { factorModP, type FactorOptions, type ModularLU } from './modularLU.js';
import type { SparseChain } from './sparseChain.js';

export class PadicKernel {
  /** y modulo `modulus` (= p^digits), one entry per state, in 0..modulus-1. */
  readonly values: bigint[];
  modulus = 1n;
  digits = 0;
  private residual: Float64Array;
  private readonly P: bigint;

  private constructor(
    private readonly c: SparseChain,
    private readonly g: IntegerGenerator,
    readonly lu: ModularLU,
  ) {
    this.values = new Array<bigint>(c.size).fill(0n);
    this.residual = new Float64Array(c.size);
    this.P = BigInt(lu.p);
  }

  get length(): number {
    return this.c.size;
  }

  /** Factors G modulo p; null when p is unlucky for it (a pivot vanishes modulo p). */
  static start(c: SparseChain, g: IntegerGenerator, p: number, options: FactorOptions = {}): PadicKernel | null {
    const off = new Float64Array(g.weight.length);
    for (let k = 0; k < off.length; k++) off[k] = g.weight[k] % p;
    const diag = new Float64Array(c.size);
    for (let s = 0; s < c.size; s++) diag[s] = reduce(-g.total[s], p);
    const lu = factorModP(c, off, diag, p, options);
    return lu && new PadicKernel(c, g, lu);
  }

  /** Adds the next p-adic digit to `values`. */
  step(): void {
    const { c, g, lu } = this;
    const p = lu.p,
      n = c.size,
      f = lu.free;
    let z: Float64Array;
    if (this.digits === 0) z = lu.kernel();
    else {
      const rhs = new Float64Array(n);
      for (let t = 0; t < n; t++) rhs[t] = reduce(this.residual[t], p);
      z = lu.solve(rhs, 0);
    }
    // R <- (R - G z) / p.
    const acc = this.residual;
    for (let s = 0; s < n; s++) {
      const zs = z[s];
      if (zs === 0) continue;
      for (let k = c.rowStart[s]; k < c.rowStart[s + 1]; k++) acc[c.target[k]] -= g.weight[k] * zs;
      acc[s] += g.total[s] * zs;
    }
    for (let t = 0; t < n; t++) acc[t] /= p;
    acc[f] = 0;
    const scale = this.modulus;
    for (let s = 0; s < n; s++) if (z[s] !== 0) this.values[s] += BigInt(z[s]) * scale;
    this.modulus = scale * this.P;
    this.digits++;
  }
}
