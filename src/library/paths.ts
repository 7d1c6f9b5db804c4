// Constructors of Motzkin paths and parking functions (their families are motzkinPaths(n) and
// parkingFunctions(n)).

import { fail } from '../base/errors.js';
import { MotzkinPath } from '../families/motzkinPaths/motzkinPath.js';
import { ParkingFunction } from '../families/parkingFunctions/parkingFunction.js';
import { valueToText } from '../values/operations.js';
import { defineFunction } from './registry.js';
import { intList } from './partitions.js';

defineFunction({
  name: 'motzkinPath',
  topic: 'motzkin paths',
  params: [{ name: 'steps', type: 'string' }],
  returns: 'motzkin',
  description: 'the Motzkin path with the given steps U, F and D (never below the axis, ending at height 0)',
  example: 'motzkinPath("UFDF")',
  exampleValue: 'motzkinPath("UFDF")',
  source: 'definition; Motzkin numbers, OEIS A001006',
  impl: (s) => MotzkinPath.from(s as string),
});

defineFunction({
  name: 'parkingFunction',
  topic: 'parking functions',
  params: [{ name: 'values', type: 'list' }],
  returns: 'parkingFunction',
  description: 'the parking function with the given preferences a_1, ..., a_n (the increasing rearrangement b must have b_i <= i)',
  example: 'parkingFunction([3, 1, 1])',
  exampleValue: 'parkingFunction([3, 1, 1])',
  source: 'definition (Konheim and Weiss, SIAM J. Appl. Math. 14 (1966)); (n+1)^(n-1) of length n, OEIS A000272',
  impl: (v) => {
    if (!Array.isArray(v)) fail(`a parking function is a list of positive integers, got ${valueToText(v)}`);
    return ParkingFunction.from(intList(v, 'a parking function'));
  },
});
