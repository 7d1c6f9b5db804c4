// Functions on set partitions: crossings and nestings of the arc diagram (also taken by the
// matching functions of the same names, which dispatch here), and noncrossing tests.

import { SetPartition } from '../families/setPartitions/setPartition.js';
import { isNoncrossing, partitionArcs } from '../families/setPartitions/arcs.js';
import { defineFunction, type ParamDecl } from './registry.js';

const topic = 'set partitions';
const S: ParamDecl[] = [{ name: 's', type: 'setPartition' }];

defineFunction({
  name: 'partitionArcs',
  topic,
  params: S,
  returns: 'list',
  description: 'the arcs [i, j] of the arc diagram: consecutive elements i < j of a block, sorted by i',
  example: 'partitionArcs(setPartition([[1, 3, 4], [2, 5]]))',
  exampleValue: '[[1, 3], [2, 5], [3, 4]]',
  source: 'Chen, Deng, Du, Stanley and Yan, "Crossings and nestings of matchings and partitions", Trans. Amer. Math. Soc. 359 (2007)',
  impl: (s) => partitionArcs((s as SetPartition).rgs),
});

defineFunction({
  name: 'isNoncrossing',
  topic,
  params: S,
  returns: 'boolean',
  description: 'whether no two blocks cross (no a < b < c < d with a, c in one block and b, d in another)',
  example: 'isNoncrossing(setPartition([[1, 4], [2, 3]]))',
  exampleValue: 'true',
  source: 'Kreweras, Discrete Math. 1 (1972); counted by the Catalan numbers, OEIS A000108',
  impl: (s) => isNoncrossing((s as SetPartition).rgs),
});

defineFunction({
  name: 'blocks',
  topic,
  params: S,
  returns: 'list',
  description: 'the blocks of a set partition, each increasing, ordered by least element: blocks(s)[i] == s[i], and len(s) counts them',
  example: 'blocks(setPartition([[2, 3], [1, 4]]))',
  exampleValue: '[[1, 4], [2, 3]]',
  source: 'definition (R. P. Stanley, Enumerative Combinatorics, vol. 1, 2nd ed., Section 1.9)',
  impl: (s) => (s as SetPartition).blocks().map((b) => b.slice()),
});
