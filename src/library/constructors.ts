// The constructors of FORMAT.md §2 for the objects of the permutation, matching, composition,
// word and subset families: perm([...]), matching([[a, b], ...]), composition([...]), word([...]),
// subset([...]). Each validates its argument and says plainly what is wrong.

import { fail } from '../base/errors.js';
import { Composition } from '../families/compositions/composition.js';
import { Matching } from '../families/matchings/matching.js';
import { Permutation } from '../families/permutations/permutation.js';
import { Subset } from '../families/subsets/subset.js';
import { Word } from '../families/words/word.js';
import { valueToText } from '../values/operations.js';
import type { Value } from '../values/value.js';
import { defineFunction } from './registry.js';

/** A list of safe integers, or a clear error naming the argument. */
function smallInts(v: Value, what: string): number[] {
  if (!Array.isArray(v)) fail(`${what} must be a list of integers, got ${valueToText(v)}`);
  for (const x of v) {
    if (typeof x !== 'number' || !Number.isSafeInteger(x)) fail(`${what} must be a list of integers, got ${valueToText(v)}`);
  }
  return v as number[];
}

defineFunction({
  name: 'perm',
  topic: 'permutations',
  params: [{ name: 'values', type: 'list' }],
  returns: 'permutation',
  description: 'the permutation with the given one-line notation w[1], ..., w[n] (a bijection of 1..n)',
  example: 'perm([2, 4, 1, 3])',
  exampleValue: 'perm([2, 4, 1, 3])',
  source: 'definition',
  impl: (values) => Permutation.from(smallInts(values, 'the one-line notation of a permutation')),
});

defineFunction({
  name: 'matching',
  topic: 'matchings',
  params: [{ name: 'arcs', type: 'list' }],
  returns: 'matching',
  description: 'the perfect matching of 1..2n with the given arcs [a, b] (in any order)',
  example: 'matching([[2, 4], [3, 1]])',
  exampleValue: 'matching([[1, 3], [2, 4]])',
  source: 'definition',
  impl: (arcs) => {
    if (!Array.isArray(arcs)) fail(`a matching is a list of arcs [a, b], got ${valueToText(arcs)}`);
    return Matching.fromArcs(arcs.map((a) => smallInts(a, 'an arc of a matching')));
  },
});

defineFunction({
  name: 'composition',
  topic: 'compositions',
  params: [{ name: 'parts', type: 'list' }],
  returns: 'composition',
  description: 'the composition with the given positive parts, in order',
  example: 'composition([1, 3, 1])',
  exampleValue: 'composition([1, 3, 1])',
  source: 'definition',
  impl: (parts) => Composition.from(smallInts(parts, 'the parts of a composition')),
});

defineFunction({
  name: 'word',
  topic: 'words',
  params: [{ name: 'letters', type: ['list', 'string'] }],
  returns: 'word',
  description: 'the word with the given letters (positive integers; a digit string such as "112" also works)',
  example: 'word("1123")',
  exampleValue: 'word([1, 1, 2, 3])',
  source: 'definition',
  impl: (letters) => {
    if (typeof letters === 'string') {
      if (!/^[1-9]*$/.test(letters)) fail(`the word "${letters}" must be a string of digits 1-9, or a list of positive integers`);
      return new Word([...letters].map(Number));
    }
    return Word.from(smallInts(letters, 'the letters of a word'));
  },
});

defineFunction({
  name: 'subset',
  topic: 'subsets',
  params: [{ name: 'elements', type: 'list' }],
  returns: 'subset',
  description: 'the set of the given positive integers (listed in any order, each once)',
  example: 'subset([3, 1])',
  exampleValue: 'subset([1, 3])',
  source: 'definition',
  impl: (elements) => Subset.from(smallInts(elements, 'the elements of a subset')),
});
