// Functions on perfect matchings of 1..2n (LIBRARY.md §2). The points sit around a circle, so
// partner() takes positions mod 2n (2n+1 means 1, 0 means 2n). Crossings and nestings are counted
// in the linear order 1 < 2 < ... < 2n: arcs (a, b) and (c, d) with a < c cross when a < c < b < d
// and nest when a < c < d < b.

import { fail } from '../base/errors.js';
import { Matching, matchingCrossings, matchingNestings } from '../families/matchings/matching.js';
import { imod, type Int } from '../numbers/integer.js';
import { defineFunction } from './registry.js';

const topic = 'matchings';
const M = [{ name: 'm', type: 'matching' }];

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
  params: M,
  returns: 'integer',
  description: 'the number of pairs of arcs (a, b), (c, d) with a < c < b < d',
  example: 'crossings(matching([[1, 3], [2, 4]]))',
  exampleValue: '1',
  source: 'Touchard–Riordan formula (Riordan, Math. Comp. 29 (1975)); equidistributed with nestings (de Sainte-Catherine 1983)',
  impl: (m) => matchingCrossings((m as Matching).p),
});

defineFunction({
  name: 'nestings',
  topic,
  params: M,
  returns: 'integer',
  description: 'the number of pairs of arcs (a, b), (c, d) with a < c < d < b',
  example: 'nestings(matching([[1, 4], [2, 3]]))',
  exampleValue: '1',
  source: 'equidistributed with crossings (de Sainte-Catherine 1983); nonnesting matchings: OEIS A000108',
  impl: (m) => matchingNestings((m as Matching).p),
});
