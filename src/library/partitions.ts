// Functions on partitions (LIBRARY.md §2 "Partitions and tableaux") and the constructors
// partition, setPartition and dyck.

import { fail } from '../base/errors.js';
import { defineFunction } from './registry.js';
import { Partition, conjugateParts } from '../families/partitions/partition.js';
import { SetPartition } from '../families/setPartitions/setPartition.js';
import { DyckPath } from '../families/dyckPaths/dyckPath.js';
import { Tableau } from '../families/tableaux/tableau.js';
import { contentsOf, hookContentCount, hookLengthCount, hookLengths, partitionArg, sizeOf } from '../families/tableaux/shapes.js';
import { normBig } from '../numbers/integer.js';
import { valueToText } from '../values/operations.js';
import type { Value } from '../values/value.js';
import { smallIntArg } from './integerArgs.js';

const topic = 'partitions';

/** Reads a list of small integers for a constructor. */
export function intList(v: Value, what: string): number[] {
  if (!Array.isArray(v)) fail(`${what} must be a list of integers, got ${valueToText(v)}`);
  for (const x of v)
    if (typeof x !== 'number' || !Number.isSafeInteger(x)) fail(`${what} must be a list of integers, got ${valueToText(v)}`);
  return v as number[];
}

/** lambda dominates mu: equal sizes and every partial sum of lambda is at least mu's. */
export function dominatesParts(lambda: readonly number[], mu: readonly number[]): boolean {
  let a = 0,
    b = 0;
  const m = Math.max(lambda.length, mu.length);
  for (let i = 0; i < m; i++) {
    a += lambda[i] ?? 0;
    b += mu[i] ?? 0;
    if (a < b) return false;
  }
  return a === b;
}

defineFunction({
  name: 'partition',
  topic,
  params: [{ name: 'parts', type: 'list' }],
  returns: 'partition',
  description: 'the partition with the given weakly decreasing positive parts',
  example: 'partition([3, 1, 1])',
  exampleValue: 'partition([3, 1, 1])',
  source: 'definition',
  impl: (parts) => Partition.from(intList(parts, 'the parts of a partition')),
});

defineFunction({
  name: 'setPartition',
  topic: 'set partitions',
  params: [{ name: 'blocks', type: 'list' }],
  returns: 'setPartition',
  description: 'the set partition of 1..n with the given blocks (in any order)',
  example: 'setPartition([[2, 4], [1, 3]])',
  exampleValue: 'setPartition([[1, 3], [2, 4]])',
  source: 'definition',
  impl: (blocks) => {
    if (!Array.isArray(blocks)) fail(`a set partition is a list of blocks, got ${valueToText(blocks)}`);
    return SetPartition.fromBlocks(blocks.map((b) => intList(b, 'a block of a set partition')));
  },
});

defineFunction({
  name: 'dyck',
  topic: 'dyck paths',
  params: [{ name: 'steps', type: 'string' }],
  returns: 'dyck',
  description: 'the Dyck path with the given steps U and D (never below the axis, ending at height 0)',
  example: 'dyck("UUDUDD")',
  exampleValue: 'dyck("UUDUDD")',
  source: 'definition',
  impl: (s) => DyckPath.from(s as string),
});

defineFunction({
  name: 'size',
  topic,
  params: [{ name: 'x', type: ['partition', 'tableau'] }],
  returns: 'integer',
  description: 'the number of cells: |lambda| for a partition, the number of entries of a tableau',
  example: 'size(partition([3, 2, 1]))',
  exampleValue: '6',
  source: 'definition',
  impl: (x) => {
    if (x instanceof Partition || x instanceof Tableau) return x.size;
    fail(`size takes a partition or a tableau, got ${valueToText(x)}`);
  },
});

defineFunction({
  name: 'length',
  topic,
  params: [{ name: 'lambda', type: 'partition' }],
  returns: 'integer',
  description: 'the number of (nonzero) parts of a partition',
  example: 'length(partition([3, 2, 2]))',
  exampleValue: '3',
  source: 'definition',
  impl: (x) => {
    if (x instanceof Partition) return x.length;
    fail(`length takes a partition, got ${valueToText(x)} (for lists and permutations use len)`);
  },
});

defineFunction({
  name: 'conjugate',
  topic,
  params: [{ name: 'lambda', type: ['partition', 'list'] }],
  returns: 'partition',
  description: "the conjugate partition lambda' (the transposed Young diagram)",
  example: 'conjugate(partition([3, 1]))',
  exampleValue: 'partition([2, 1, 1])',
  source: 'Macdonald, Symmetric Functions and Hall Polynomials, I.1',
  impl: (l) => new Partition(conjugateParts(partitionArg(l))),
});

defineFunction({
  name: 'hooks',
  topic,
  params: [{ name: 'lambda', type: ['partition', 'list'] }],
  returns: 'list',
  description: 'the hook lengths of the cells of lambda, as one list read row by row',
  example: 'hooks(partition([3, 1]))',
  exampleValue: '[4, 2, 1, 1]',
  source: 'Macdonald, Symmetric Functions and Hall Polynomials, I.1 Example 1; hook length formula (Frame, Robinson and Thrall 1954)',
  impl: (l) => hookLengths(partitionArg(l)).flat(),
});

defineFunction({
  name: 'contents',
  topic,
  params: [{ name: 'lambda', type: ['partition', 'list'] }],
  returns: 'list',
  description: 'the contents j - i of the cells (i, j) of lambda, as one list read row by row',
  example: 'contents(partition([3, 1]))',
  exampleValue: '[0, 1, 2, -1]',
  source: 'Macdonald, Symmetric Functions and Hall Polynomials, I.1 Example 3',
  impl: (l) => contentsOf(partitionArg(l)).flat(),
});

defineFunction({
  name: 'syt',
  topic,
  params: [{ name: 'lambda', type: ['partition', 'list'] }],
  returns: 'integer',
  description: 'f^lambda, the number of standard tableaux of shape lambda (hook length formula)',
  example: 'syt(partition([3, 2]))',
  exampleValue: '5',
  source: 'hook length formula (Frame, Robinson and Thrall 1954); OEIS A000085 summed over shapes',
  impl: (l) => normBig(hookLengthCount(partitionArg(l))),
});

defineFunction({
  name: 'ssytCount',
  topic,
  params: [
    { name: 'lambda', type: ['partition', 'list'] },
    { name: 'm', type: 'integer' },
  ],
  returns: 'integer',
  description: 's_lambda(1^m), the number of semistandard tableaux of shape lambda with entries in 1..m (hook-content formula)',
  example: 'ssytCount(partition([2, 1]), 3)',
  exampleValue: '8',
  source: 'hook-content formula, Stanley, Enumerative Combinatorics 2, Cor. 7.21.4',
  impl: (l, m) => normBig(hookContentCount(partitionArg(l), smallIntArg('ssytCount(lambda, m)', 'm', m, 0, 1_000_000))),
});

defineFunction({
  name: 'dominates',
  topic,
  params: [
    { name: 'lambda', type: ['partition', 'list'] },
    { name: 'mu', type: ['partition', 'list'] },
  ],
  returns: 'boolean',
  description: 'whether lambda >= mu in dominance order (same size, every partial sum of lambda at least that of mu)',
  example: 'dominates(partition([3, 1]), partition([2, 2]))',
  exampleValue: 'true',
  source: 'Macdonald, Symmetric Functions and Hall Polynomials, I.1',
  impl: (l, m) => {
    const a = partitionArg(l, 'lambda'),
      b = partitionArg(m, 'mu');
    if (sizeOf(a) !== sizeOf(b))
      fail(`dominance compares partitions of the same size, got |lambda| = ${sizeOf(a)} and |mu| = ${sizeOf(b)}`);
    return dominatesParts(a, b);
  },
});

defineFunction({
  name: 'staircase',
  topic,
  params: [{ name: 'k', type: 'integer' }],
  returns: 'partition',
  description: 'the staircase partition [k, k-1, ..., 1]',
  example: 'staircase(3)',
  exampleValue: 'partition([3, 2, 1])',
  source: 'definition',
  impl: (k) => {
    const m = smallIntArg('staircase(k)', 'k', k, 0, 100_000);
    return new Partition(Array.from({ length: m }, (_, i) => m - i));
  },
});
