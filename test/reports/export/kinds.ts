// One small value of every kind that has a picture, built through the language as a user would
// write it (the reduced word is drawn as a wiring diagram, the other word as a strip).

import '../../../src/families/index.js';
import '../../../src/library/index.js';
import { evaluate } from '../../../src/language/expr/index.js';
import type { Value } from '../../../src/values/value.js';
import type { SceneHint } from '../../../src/reports/scenes/index.js';

export const KIND_EXAMPLES: Array<{ name: string; text: string; hint?: SceneHint }> = [
  { name: 'permutation', text: 'perm([2, 4, 1, 3])' },
  { name: 'partition', text: 'partition([4, 2, 1])' },
  { name: 'composition', text: 'composition([1, 3, 2])' },
  { name: 'tableau', text: 'tableau([[1, 2, 5], [3, 4], [6]])' },
  { name: 'matching', text: 'matching([[1, 4], [2, 6], [3, 5]])' },
  { name: 'setPartition', text: 'setPartition([[1, 3, 4], [2, 5]])' },
  { name: 'dyck', text: 'dyck("UUDUDDUD")' },
  { name: 'word', text: 'word([2, 1, 3, 1])' },
  { name: 'reducedWord', text: 'word([1, 2, 1, 3])', hint: { reducedWord: true } },
  { name: 'subset', text: 'subset([1, 3, 4])', hint: { groundSet: 5 } },
  { name: 'asm', text: 'asm([[0, 1, 0], [1, -1, 1], [0, 1, 0]])' },
  { name: 'pipeDream', text: 'pipeDream([[1, 2], [2, 1]])' },
  { name: 'matrix', text: 'matrix([[1, -2], [3/4, 0]])' },
  { name: 'signedPermutation', text: 'signedPermutation([2, -1, 3])' },
  { name: 'motzkin', text: 'motzkinPath("UFDUD")' },
  { name: 'parkingFunction', text: 'parkingFunction([1, 1, 3, 2])' },
];

export function exampleValue(text: string): Value {
  return evaluate(text);
}
