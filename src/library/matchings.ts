// Functions on perfect matchings of 1..2n (LIBRARY.md §2). The points sit around a circle, so
// partner() takes positions mod 2n (2n+1 means 1, 0 means 2n). Crossings and nestings are counted
// in the linear order 1 < 2 < ... < 2n: arcs (a, b) and (c, d) with a < c cross when a < c < b < d
// and nest when a < c < d < b.

import { fail } from '../base/errors.js';
import { Matching, matchingCrossings, matchingNestings } from '../families/matchings/matching.js';
import { imod, type Int } from '../numbers/integer.js';
import { defineFunction, type ParamDecl } from './registry.js';
import { SetPartition } from '../families/setPartitions/setPartition.js';
import { partitionCrossings, partitionNestings } from '../families/setPartitions/arcs.js';
import type { Value } from '../values/value.js';

/** crossings and nestings also take set partitions, through their arc diagrams. */
const MS: ParamDecl[] = [{ name: 'm', type: ['matching', 'setPartition'] }];

const topic = 'matchings';
const M: ParamDecl[] = [{ name: 'm', type: 'matching' }];

/** The point i taken mod 2n into 1..2n. */
export function circlePoint(i: Int, points: number): number {
  return (imod(typeof i === 'number' ? i - 1 : i - 1n, points) as number) + 1;
}

defineFunction({
  name: 'arcs',
  topic,
  params: M,
  returns: 'list',
  description: 'the arcs [a, b] of the matching, with a < b, sorted by a',
  example: 'arcs(matching([[2, 3], [1, 4]]))',
  exampleValue: '[[1, 4], [2, 3]]',
  source: 'definition',
  impl: (m) => (m as Matching).arcs(),
});

defineFunction({
  name: 'partner',
  topic,
  params: [
    { name: 'm', type: 'matching' },
    { name: 'i', type: 'integer' },
  ],
  returns: 'integer',
  description: 'the point joined to i, with points taken mod 2n around the circle (2n+1 means 1, 0 means 2n)',
  example: 'partner(matching([[1, 4], [2, 3]]), 5)',
  exampleValue: '4',
  source: 'definition',
  impl: (m, i) => {
    const p = (m as Matching).p;
    if (p.length === 0) fail(`partner(m, i): the empty matching has no points (i = ${i})`);
    return p[circlePoint(i as Int, p.length) - 1];
  },
});

defineFunction({
  name: 'crossings',
  topic,
  params: MS,
  returns: 'integer',
  description:
    'the number of pairs of arcs (a, b), (c, d) with a < c < b < d (of a set partition: of its arc diagram, consecutive elements of each block)',
  example: 'crossings(matching([[1, 3], [2, 4]]))',
  exampleValue: '1',
  source:
    'Touchard–Riordan formula (Riordan, Math. Comp. 29 (1975)); equidistributed with nestings (de Sainte-Catherine 1983), on set partitions too (Chen, Deng, Du, Stanley and Yan, Trans. Amer. Math. Soc. 359 (2007))',
  impl: (m: Value) => (m instanceof SetPartition ? partitionCrossings(m.rgs) : matchingCrossings((m as Matching).p)),
});

defineFunction({
  name: 'nestings',
  topic,
  params: MS,
  returns: 'integer',
  description: 'the number of pairs of arcs (a, b), (c, d) with a < c < d < b (of a set partition: of its arc diagram)',
  example: 'nestings(matching([[1, 4], [2, 3]]))',
  exampleValue: '1',
  source: 'equidistributed with crossings (de Sainte-Catherine 1983); nonnesting matchings: OEIS A000108',
  impl: (m: Value) => (m instanceof SetPartition ? partitionNestings(m.rgs) : matchingNestings((m as Matching).p)),
});
