// Every example of the permutations, numbers, lists and matchings topics evaluates, through the
// language, to the text its registration states.

import { expect, it } from 'vitest';
import { evaluate } from '../../src/language/expr/index.js';
import { valueToText } from '../../src/values/operations.js';
import { allFunctions } from '../../src/library/registry.js';
import '../../src/library/constructors.js';
import '../../src/library/numbers.js';
import '../../src/library/permutations.js';
import '../../src/library/lists.js';
import '../../src/library/matchings.js';

const mine = [
  'inv',
  'maj',
  'des',
  'descents',
  'exc',
  'fixedPoints',
  'cycles',
  'cycleType',
  'sign',
  'lis',
  'lds',
  'lehmerCode',
  'inverse',
  'longest',
  'simple',
  'reducedWord',
  'permMatrix',
  'contains',
  'avoids',
  'patternCount',
  'bruhatLeq',
  'weakLeq',
  'factorial',
  'doubleFactorial',
  'binomial',
  'catalan',
  'stirling1',
  'stirling2',
  'bell',
  'fibonacci',
  'gcd',
  'lcm',
  'quo',
  'mod',
  'divides',
  'isInteger',
  'numerator',
  'denominator',
  'floor',
  'ceil',
  'abs',
  'isPrime',
  'len',
  'reverse',
  'sort',
  'map',
  'first',
  'last',
  'take',
  'drop',
  'isUnimodal',
  'isLogConcave',
  'isPalindromic',
  'arcs',
  'partner',
  'crossings',
  'nestings',
];

it('every example of these topics evaluates to its stated value', () => {
  const registered = new Set(allFunctions().map((f) => f.name));
  expect(mine.filter((n) => !registered.has(n))).toEqual([]);
  const bad: string[] = [];
  for (const f of allFunctions()) {
    if (!mine.includes(f.name)) continue;
    expect(f.description.length > 0 && f.source.length > 0).toBe(true);
    try {
      const v = valueToText(evaluate(f.example));
      if (v !== f.exampleValue) bad.push(`${f.name}: ${f.example} gives ${v}, not ${f.exampleValue}`);
    } catch (e) {
      bad.push(`${f.name}: ${f.example} fails: ${(e as Error).message}`);
    }
  }
  expect(bad).toEqual([]);
});
