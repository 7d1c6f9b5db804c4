// The exact check (src/algebra/linear/verifyStationary.ts): it accepts the measure found by dense
// rational elimination (denseRational.ts, an independent algorithm) and rejects every small
// perturbation of it, both on its multi-word path (small integer weights) and its BigInt path.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { closedClasses } from '../../../src/algebra/linear/closedClasses.js';
import { stationaryDense } from '../../../src/algebra/linear/denseRational.js';
import type { CommonFraction } from '../../../src/algebra/linear/reconstruction.js';
import { buildChain } from '../../../src/algebra/linear/sparseChain.js';
import { isStationary } from '../../../src/algebra/linear/verifyStationary.js';
import { bigGcd } from '../../../src/numbers/integer.js';
import { denOf, makeRat, numOf, type Scalar } from '../../../src/numbers/rational.js';

function commonFraction(xs: Scalar[], scale: bigint): CommonFraction {
  let den = 1n;
  for (const x of xs) den = (den / bigGcd(den, denOf(x))) * denOf(x);
  return { nums: xs.map((x) => (numOf(x) * den * scale) / denOf(x)), den: den * scale };
}

const weights = {
  'small integers (multi-word path)': fc.integer({ min: 1, max: 9 }),
  'huge integers and rationals (BigInt path)': fc.oneof(
    fc.bigInt({ min: 2n ** 54n, max: 2n ** 64n }),
    fc.tuple(fc.integer({ min: 1, max: 9 }), fc.integer({ min: 2, max: 9 })).map(([n, d]) => makeRat(BigInt(n), BigInt(d))),
  ),
};

describe('exact verification', () => {
  for (const [name, weight] of Object.entries(weights)) {
    it(`${name}: accepts the true measure (at any scale), rejects perturbations`, () => {
      const arb = fc.integer({ min: 1, max: 6 }).chain((size) =>
        fc
          .tuple(
            fc.array(fc.array(fc.tuple(fc.nat(size - 1), weight as fc.Arbitrary<Scalar>), { maxLength: 3 }), {
              minLength: size,
              maxLength: size,
            }),
            fc.nat(size - 1),
            fc.bigInt({ min: 1n, max: 2n ** 70n }),
          )
          .map(([extra, at, scale]) => ({ size, extra, at, scale })),
      );
      fc.assert(
        fc.property(arb, ({ size, extra, at, scale }) => {
          const c = buildChain(size, (s) => [[(s + 1) % size, 1] as [number, Scalar], ...extra[s]]);
          if (closedClasses(c).length !== 1) return;
          const f = commonFraction(stationaryDense(c), scale);
          expect(isStationary(c, f)).toBe(true);
          const nums = f.nums.slice();
          nums[at] += 1n;
          // Still summing to den, but no longer balanced (unless the chain has one state).
          expect(isStationary(c, { nums, den: f.den + 1n })).toBe(size === 1);
          expect(isStationary(c, { nums, den: f.den })).toBe(false);
        }),
        { numRuns: 150 },
      );
    });
  }
});
