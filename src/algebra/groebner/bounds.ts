// The limits every Gröbner basis computation honours: a degree bound, a basis-size bound and a
// stop callback polled often. Exceeding one throws an EvalError naming it.

import { fail } from '../../base/errors.js';

export interface GroebnerOptions {
  /** Compute over F_p for this prime (< 2^31); over Q when absent. */
  prime?: number;
  /** Largest degree (sugar) of an S-pair that may be treated. */
  maxDegree?: number;
  /** Largest number of polynomials the basis may reach while it is computed. */
  maxBasisSize?: number;
  /** Polled often; returning true stops the computation with an error. */
  shouldStop?: () => boolean;
}

export class Limits {
  readonly maxDegree: number;
  readonly maxBasisSize: number;
  private readonly stop?: () => boolean;
  private ticks = 0;

  constructor(opts: GroebnerOptions = {}) {
    this.maxDegree = opts.maxDegree ?? Infinity;
    this.maxBasisSize = opts.maxBasisSize ?? Infinity;
    this.stop = opts.shouldStop;
  }

  /** Call in inner loops: polls the stop callback every 64 calls. */
  tick(): void {
    if (this.stop && (++this.ticks & 63) === 0 && this.stop()) this.stopped();
  }

  /** Poll now. */
  poll(): void {
    if (this.stop && this.stop()) this.stopped();
  }

  degree(d: number): void {
    if (d > this.maxDegree)
      fail(`the Gröbner basis computation reached an S-pair of degree ${d}, above the degree bound maxDegree = ${this.maxDegree}`);
  }

  size(n: number): void {
    if (n > this.maxBasisSize)
      fail(`the Gröbner basis computation reached ${n} polynomials, above the basis-size bound maxBasisSize = ${this.maxBasisSize}`);
  }

  private stopped(): never {
    return fail('the Gröbner basis computation was stopped (budget exhausted or interrupted)');
  }
}
