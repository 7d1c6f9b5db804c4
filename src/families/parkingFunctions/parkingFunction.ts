// A parking function of length n: a sequence (a_1, ..., a_n) of positive integers whose
// increasing rearrangement b satisfies b_i <= i — equivalently, cars arriving in order, car i
// preferring spot a_i and taking the first free spot from there, all park in spots 1..n.
// Text form parkingFunction([1, 1, 3]).

import { fail } from '../../base/errors.js';
import { registerDecoder } from '../../values/decode.js';
import { IntegerSequence } from '../common/integer-sequence.js';

/** Whether #{i : a_i <= j} >= j for every j = 1..n. */
export function isParkingFunction(a: readonly number[]): boolean {
  const n = a.length;
  const count = new Array<number>(n + 2).fill(0);
  for (const v of a) {
    if (!Number.isSafeInteger(v) || v < 1 || v > n) return false;
    count[v]++;
  }
  let c = 0;
  for (let j = 1; j <= n; j++) if ((c += count[j]) < j) return false;
  return true;
}

export class ParkingFunction extends IntegerSequence {
  readonly kind = 'parkingFunction';

  /** Trusts that `values` is a parking function; use ParkingFunction.from for user data. */
  constructor(readonly values: number[]) {
    super();
  }

  protected sequence(): readonly number[] {
    return this.values;
  }

  protected rebuild(values: number[]): ParkingFunction {
    return new ParkingFunction(values);
  }

  get n(): number {
    return this.values.length;
  }

  get length(): number {
    return this.values.length;
  }

  at(i: number): number {
    return this.values[i - 1];
  }

  static from(values: readonly number[]): ParkingFunction {
    if (!isParkingFunction(values))
      fail(`[${values.join(', ')}] is not a parking function: its increasing rearrangement b must have b_i <= i for every i`);
    return new ParkingFunction(values.slice());
  }
}

registerDecoder('parkingFunction', (x) => {
  if (!Array.isArray(x) || !x.every((v) => typeof v === 'number')) fail('a parking function is a list of positive integers');
  return ParkingFunction.from(x as number[]);
});
