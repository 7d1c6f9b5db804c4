// Every example of this group's functions and families evaluates to its stated value.
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/language/expr/index.js';
import { valueToText } from '../../src/values/operations.js';
import { allFunctions } from '../../src/library/registry.js';
import '../../src/library/constructors.js';
import '../../src/library/partitions.js';
import '../../src/library/tableaux.js';
import '../../src/library/kostka.js';
import '../../src/library/littlewoodRichardson.js';
import '../../src/library/characters.js';
import '../../src/library/rsk.js';
import { partitions } from '../../src/families/partitions/partitions.js';
import { setPartitions } from '../../src/families/setPartitions/setPartitions.js';
import { dyckPaths } from '../../src/families/dyckPaths/dyckPaths.js';
import { asms } from '../../src/families/asms/asms.js';
import { standardTableaux } from '../../src/families/tableaux/standardTableaux.js';
import { semistandardTableaux } from '../../src/families/tableaux/semistandardTableaux.js';
import { reducedWords } from '../../src/families/reducedWords/reducedWords.js';
import { pipeDreams } from '../../src/families/pipeDreams/pipeDreams.js';
import { partialPermutations } from '../../src/families/partialPermutations/partialPermutations.js';

const ev = (s: string) => valueToText(evaluate(s, [], ['q', 'x']));

describe('examples', () => {
  it('every function example of the partitions and tableaux topics', () => {
    const bad: string[] = [];
    for (const f of allFunctions()) {
      if (f.topic !== 'partitions' && f.topic !== 'tableaux') continue;
      try {
        const v = ev(f.example);
        if (v !== f.exampleValue) bad.push(`${f.name}: ${v} != ${f.exampleValue}`);
      } catch (e) {
        bad.push(`${f.name}: ${(e as Error).message}`);
      }
    }
    expect(bad).toEqual([]);
  });
  it('family examples count what the family counts', () => {
    // p(5) = 7 (A000041), B(4) = 15 (A000110), C(4) = 14 (A000108), A(4) = 42 (A005130),
    // f^(3,2) = 5, s_(2,1)(1,1,1) = 8, R(321) = 2, S_1432(1,1,1,1) = 5, partial perms 2x2 = 7 (A002720).
    const expected: [{ example: string }, string][] = [
      [partitions, '7'],
      [setPartitions, '15'],
      [dyckPaths, '14'],
      [asms, '42'],
      [standardTableaux, '5'],
      [semistandardTableaux, '8'],
      [reducedWords, '2'],
      [pipeDreams, '5'],
      [partialPermutations, '7'],
    ];
    for (const [f, v] of expected) expect(ev(f.example)).toBe(v);
  });
  it('indexing: lambda[i] is 0 past the length, T[i] is a row, kept rows do not change under enumeration', () => {
    expect(ev('partition([3, 1])[2]')).toBe('1');
    expect(ev('partition([3, 1])[5]')).toBe('0');
    expect(ev('tableau([[1, 2], [3]])[2]')).toBe('[3]');
    expect(ev('list(T[1] for T in standardTableaux(partition([2, 1])))')).toBe('[[1, 2], [1, 3]]');
    expect(ev('list(T for T in standardTableaux(partition([2, 1])))')).toBe('[tableau([[1, 2], [3]]), tableau([[1, 3], [2]])]');
    expect(ev('setPartition([[1, 3], [2]])[2]')).toBe('[2]');
    expect(ev('sum(syt(l)^2 for l in partitions(6))')).toBe('720');
    expect(ev('count(T in standardTableaux([3, 2]))')).toBe('5');
    expect(() => ev('tableau([[1, 2], [3]])[3]')).toThrow(/out of range/);
  });
});
