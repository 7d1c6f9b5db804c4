// A signed permutation of 1..n (an element of the hyperoctahedral group B_n, type B): the window
// [w(1), ..., w(n)], a permutation of 1..n with some entries negated; w(-i) = -w(i). Text form
// signedPermutation([-2, 1, 3]).

import { fail } from '../../base/errors.js';
import { registerDecoder } from '../../values/decode.js';
import { IntegerSequence } from '../common/integer-sequence.js';

export class SignedPermutation extends IntegerSequence {
  readonly kind = 'signedPermutation';

  /** Trusts that |a| is a permutation of 1..n; use SignedPermutation.from for user data. */
  constructor(readonly a: number[]) {
    super();
  }

  protected sequence(): readonly number[] {
    return this.a;
  }

  protected rebuild(values: number[]): SignedPermutation {
    return new SignedPermutation(values);
  }

  get n(): number {
    return this.a.length;
  }

  get length(): number {
    return this.a.length;
  }

  /** w(i), 1-based. */
  at(i: number): number {
    return this.a[i - 1];
  }

  static from(values: readonly number[]): SignedPermutation {
    const n = values.length;
    const seen = new Uint8Array(n + 1);
    for (const v of values) {
      const m = Math.abs(v);
      if (!Number.isSafeInteger(v) || m < 1 || m > n || seen[m])
        fail(`[${values.join(', ')}] is not a signed permutation: the absolute values must be 1..${n}, each once`);
      seen[m] = 1;
    }
    return new SignedPermutation(values.slice());
  }
}

registerDecoder('signedPermutation', (x) => {
  if (!Array.isArray(x) || !x.every((v) => typeof v === 'number')) fail('a signed permutation is a list of nonzero integers');
  return SignedPermutation.from(x as number[]);
});
