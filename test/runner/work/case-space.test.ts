// Cutting a size into index ranges: every slice split visits each case exactly once, in the order of
// the plain enumeration, for conjectures with independent and dependent bindings.

import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { compileOne, doc } from '../helpers.js';
import { enumerateCases } from '../../../src/runner/enumerate-cases.js';
import { countCases, enumerateCaseRange, independentLevels } from '../../../src/runner/work/case-space.js';
import { sliceBounds, sliceCount } from '../../../src/runner/work/slicing.js';
import { sizeFixing } from '../../../src/runner/work/units.js';
import { permutations, unrankLex } from '../../../src/families/permutations/permutations.js';
import { encodeValue } from '../../../src/values/operations.js';
import type { CompiledConjecture } from '../../../src/language/conjecture/compiled.js';

function allCases(cc: CompiledConjecture, size: number): string[] {
  const frame = new Array(cc.frameSize);
  const out: string[] = [];
  enumerateCases(cc, frame, sizeFixing(cc, size), () => {
    out.push(JSON.stringify(cc.bindings.map((b) => encodeValue(frame[b.slot]))));
    return false;
  });
  return out;
}

function rangeCases(cc: CompiledConjecture, size: number, lo: bigint, hi: bigint): string[] {
  const frame = new Array(cc.frameSize);
  const out: string[] = [];
  enumerateCaseRange(cc, frame, sizeFixing(cc, size), lo, hi, () => {
    out.push(JSON.stringify(cc.bindings.map((b) => encodeValue(frame[b.slot]))));
    return false;
  });
  return out;
}

const conjectures = {
  permutations: doc({ for: ['n: 1..6', 'w: permutations(n)'], claim: 'inv(w) >= 0' }),
  twoIndependent: doc({ for: ['n: 1..4', 'u: permutations(n)', 'v: permutations(n)'], claim: 'inv(u) >= 0' }),
  rangeThenFamily: doc({ for: ['n: 1..5', 'k: 0..n', 'w: permutations(n)'], claim: 'inv(w) >= 0' }),
  dependentTableaux: doc({ for: ['n: 1..6', 'lam: partitions(n)', 'T: standardTableaux(lam)'], claim: 'n >= 0' }),
};

describe('counting and index ranges of a size', () => {
  for (const [name, yaml] of Object.entries(conjectures)) {
    it(`${name}: the count is the number of enumerated cases, and slices union to the enumeration`, () => {
      const cc = compileOne(yaml);
      for (const size of [0, 1, 3, 4]) {
        if (name === 'permutations' && size === 0) continue;
        const all = allCases(cc, size);
        const n = countCases(cc, sizeFixing(cc, size));
        expect(n).toBe(BigInt(all.length));
        for (const s of [1, 2, 3, 7, sliceCount(n, 1, true), all.length + 2]) {
          const pieces: string[] = [];
          for (let j = 0; j < s; j++) pieces.push(...rangeCases(cc, size, ...sliceBounds(n, s, j)));
          expect(pieces).toEqual(all);
        }
      }
    });
  }

  it('finds the dependence of standardTableaux(lam) on lam', () => {
    const cc = compileOne(conjectures.dependentTableaux);
    expect(independentLevels(cc)).toEqual([false, false, true]);
  });

  it('arbitrary ranges of S_5 give exactly the cases with those indices', () => {
    const cc = compileOne(conjectures.permutations);
    const all = allCases(cc, 5);
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 120 }), fc.integer({ min: 0, max: 120 }), (a, b) => {
        const [lo, hi] = a <= b ? [a, b] : [b, a];
        expect(rangeCases(cc, 5, BigInt(lo), BigInt(hi))).toEqual(all.slice(lo, hi));
      }),
    );
  });
});

describe('permutations: unranking in lexicographic order', () => {
  it('rank r of S_n is the r-th permutation of the lexicographic enumeration (n <= 6)', () => {
    for (let n = 0; n <= 6; n++) {
      let r = 0n;
      permutations.enumerate({ n }, (w) => {
        expect(unrankLex(n, r)).toEqual(w.a);
        r++;
      });
    }
  });

  it('enumerateRange visits the range and stops when asked', () => {
    const seen: string[] = [];
    permutations.enumerateRange!({ n: 4 }, 5n, 9n, (w) => void seen.push(w.a.join('')));
    expect(seen).toEqual(['1432', '2134', '2143', '2314']);
    let k = 0;
    expect(permutations.enumerateRange!({ n: 4 }, 0n, 24n, () => ++k === 3)).toBe(true);
    expect(k).toBe(3);
  });
});
