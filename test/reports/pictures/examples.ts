// Small objects of every kind with a picture, shared by the picture tests.

import { Matrix } from '../../../src/algebra/matrix.js';
import { Asm } from '../../../src/families/asms/asm.js';
import { Composition } from '../../../src/families/compositions/composition.js';
import { DyckPath } from '../../../src/families/dyckPaths/dyckPath.js';
import { Matching } from '../../../src/families/matchings/matching.js';
import { Partition } from '../../../src/families/partitions/partition.js';
import { Permutation } from '../../../src/families/permutations/permutation.js';
import { PipeDream } from '../../../src/families/pipeDreams/pipeDream.js';
import { SetPartition } from '../../../src/families/setPartitions/setPartition.js';
import { Subset } from '../../../src/families/subsets/subset.js';
import { Tableau } from '../../../src/families/tableaux/tableau.js';
import { Word } from '../../../src/families/words/word.js';
import { SignedPermutation } from '../../../src/families/signedPermutations/signedPermutation.js';
import { MotzkinPath } from '../../../src/families/motzkinPaths/motzkinPath.js';
import { ParkingFunction } from '../../../src/families/parkingFunctions/parkingFunction.js';
import { makeRat } from '../../../src/numbers/rational.js';
import type { Value } from '../../../src/values/value.js';

export const EXAMPLES: Record<string, readonly Value[]> = {
  permutation: [
    Permutation.from([3, 1, 4, 2]),
    Permutation.from([1]),
    Permutation.from([]),
    Permutation.from([10, 1, 2, 3, 4, 5, 6, 7, 8, 9]),
  ],
  partition: [Partition.from([4, 2, 2, 1]), Partition.from([1]), Partition.from([]), Partition.from([18, 1])],
  tableau: [
    Tableau.from([
      [1, 2, 5, 11],
      [3, 4],
      [6, 12],
    ]),
    Tableau.from([
      [1, 1, 2],
      [2, 3],
    ]),
    Tableau.from([]),
  ],
  composition: [Composition.from([2, 3, 1]), Composition.from([1, 1]), Composition.from([])],
  matching: [
    Matching.fromArcs([
      [1, 3],
      [2, 4],
    ]),
    Matching.fromArcs([
      [1, 2],
      [3, 4],
    ]),
    Matching.fromArcs([
      [1, 6],
      [2, 4],
      [3, 5],
    ]),
    Matching.fromArcs([
      [1, 4],
      [2, 8],
      [3, 5],
      [6, 10],
      [7, 9],
      [11, 12],
    ]),
    Matching.fromArcs([]),
  ],
  dyck: [DyckPath.from('UUDUDDUD'), DyckPath.from('UD'), DyckPath.from('')],
  signedPermutation: [SignedPermutation.from([-2, 3, 1]), SignedPermutation.from([-1]), SignedPermutation.from([])],
  motzkin: [MotzkinPath.from('UFUDDF'), MotzkinPath.from('F'), MotzkinPath.from('UUFDD'), MotzkinPath.from('')],
  parkingFunction: [ParkingFunction.from([3, 1, 1, 2]), ParkingFunction.from([1]), ParkingFunction.from([])],
  setPartition: [SetPartition.fromBlocks([[1, 3], [2], [4, 5]]), SetPartition.fromBlocks([[1, 2, 3]]), SetPartition.fromBlocks([])],
  word: [Word.from([2, 1, 3, 1]), Word.from([10, 2]), Word.from([])],
  subset: [Subset.from([1, 3, 5]), Subset.from([2, 11]), Subset.from([])],
  asm: [
    Asm.from([
      [0, 1, 0],
      [1, -1, 1],
      [0, 1, 0],
    ]),
    Asm.from([[1]]),
    Asm.from([]),
  ],
  pipeDream: [
    PipeDream.from([[1, 2]]),
    PipeDream.from([[2, 1]]),
    PipeDream.from([
      [1, 1],
      [2, 2],
      [1, 4],
    ]),
    PipeDream.from([]),
  ],
  matrix: [
    Matrix.from([
      [1, makeRat(1n, 2n)],
      [-3, 10],
    ]),
    Matrix.from([
      [0, 1, 0],
      [0, 0, 0],
    ]), // a partial permutation
    Matrix.from([
      [1, -1],
      [0, 1],
    ]),
    Matrix.from([[7]]),
    Matrix.from([]),
  ],
  list: [
    [Tableau.from([[1, 2], [3]]), Tableau.from([[1, 3], [2]])],
    [Permutation.from([2, 1]), Partition.from([2])],
  ],
};

export function range(k: number): number[] {
  return Array.from({ length: k }, (_, i) => i + 1);
}

/** The matching pairing order[0] with order[1], order[2] with order[3], ... (a last odd point dropped). */
export function matchingFromOrder(order: readonly number[]): Matching {
  const arcs: number[][] = [];
  const m = order.length & ~1;
  const kept = order.slice(0, m);
  // Rename the kept points to 1..m keeping their order.
  const rank = new Map([...kept].sort((a, b) => a - b).map((x, i) => [x, i + 1]));
  for (let k = 0; k < m; k += 2) arcs.push([rank.get(kept[k])!, rank.get(kept[k + 1])!]);
  return Matching.fromArcs(arcs);
}
