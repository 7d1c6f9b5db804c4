// Round trips of this group's objects, with fast-check over the families' own uniform samplers:
// the record encoding decodes back to an equal value, and the text form, read back by the
// language, gives an equal value with the same key.

import { describe, expect, it } from 'vitest';
import * as fc from 'fast-check';
import type { Family } from '../../../src/families/family.js';
import type { Structured } from '../../../src/values/structured.js';
import { decodeValue } from '../../../src/values/decode.js';
import { valueEquals } from '../../../src/values/operations.js';
import { evaluate } from '../../../src/language/expr/index.js';
import '../../../src/library/index.js';
import { partitions } from '../../../src/families/partitions/partitions.js';
import { setPartitions } from '../../../src/families/setPartitions/setPartitions.js';
import { dyckPaths } from '../../../src/families/dyckPaths/dyckPaths.js';
import { asms } from '../../../src/families/asms/asms.js';
import { standardTableaux } from '../../../src/families/tableaux/standardTableaux.js';
import { semistandardTableaux } from '../../../src/families/tableaux/semistandardTableaux.js';
import { pipeDreams } from '../../../src/families/pipeDreams/pipeDreams.js';
import { partialPermutations } from '../../../src/families/partialPermutations/partialPermutations.js';
import { reducedWords } from '../../../src/families/reducedWords/reducedWords.js';
import { Permutation } from '../../../src/families/permutations/permutation.js';
import { noncrossingPartitions } from '../../../src/families/setPartitions/noncrossingPartitions.js';
import { signedPermutations } from '../../../src/families/signedPermutations/signedPermutations.js';
import { motzkinPaths } from '../../../src/families/motzkinPaths/motzkinPaths.js';
import { parkingFunctions } from '../../../src/families/parkingFunctions/parkingFunctions.js';

const cases: [Family<any, Structured>, unknown[]][] = [
  [partitions, [30]],
  [setPartitions, [12]],
  [dyckPaths, [12]],
  [asms, [7]],
  [standardTableaux, [[5, 3, 3, 1]]],
  [semistandardTableaux, [[4, 2, 1], 5]],
  [pipeDreams, [new Permutation([2, 5, 1, 6, 4, 3])]],
  [partialPermutations, [4, 5]],
  [reducedWords, [new Permutation([5, 3, 6, 1, 4, 2])]],
  [noncrossingPartitions, [12]],
  [signedPermutations, [9]],
  [motzkinPaths, [20]],
  [parkingFunctions, [10]],
];

describe('round trips', () => {
  for (const [f, args] of cases) {
    it(`${f.name}: decode(encode(x)) = x and the text form reads back`, () => {
      const p = f.prepare(args as never);
      fc.assert(
        fc.property(f.arbitrary!(p), (x) => {
          const back = decodeValue(JSON.parse(JSON.stringify(x.encode())));
          expect(valueEquals(back, x)).toBe(true);
          const read = evaluate(x.toText(), [], ['q', 'x']) as Structured;
          expect(read.key()).toBe(x.key());
          expect(valueEquals(read, x)).toBe(true);
          expect(f.isMember(p, read)).toBe(true);
        }),
        { numRuns: 40, seed: 11 },
      );
    });
  }
});
