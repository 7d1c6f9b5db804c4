// len(x) counts exactly the indices x[i] runs over, for every kind with indexing; out-of-range
// indices name that count and its unit (blocks, steps, rows, crosses, ...). Values by hand from
// the definitions (R. P. Stanley, Enumerative Combinatorics, vol. 1, 2nd ed., Sections 1.9 and 7).

import { describe, expect, test } from 'vitest';
import '../../src/families/index.js';
import '../../src/library/index.js';
import { evaluate } from '../../src/language/expr/index.js';
import { valueToText } from '../../src/values/operations.js';
import { errorOf } from '../language/expr/helpers.js';

const ev = (s: string) => valueToText(evaluate(s));

describe('indexing and len agree on every kind', () => {
  test.each([
    ['setPartition([[1, 3], [2]])', '[1, 3]', '2', 'blocks'],
    ['dyck("UUDD")', '"U"', '4', 'steps'],
    ['tableau([[1, 2], [3]])', '[1, 2]', '2', 'rows'],
    ['asm([[0, 1, 0], [1, -1, 1], [0, 1, 0]])', '[0, 1, 0]', '3', 'rows'],
    ['pipeDream([[1, 1], [1, 2]])', '[1, 1]', '2', 'crosses'],
    ['composition([2, 1])', '2', '2', 'parts'],
    ['subset([4, 2])', '2', '2', 'elements'],
    ['word([3, 1, 2])', '3', '3', 'letters'],
    ['perm([2, 3, 1])', '2', '3', 'entries'],
    ['matrix([[1, 2], [3, 4], [5, 6]])', '[1, 2]', '3', 'rows'],
  ])('%s: x[1] = %s, len = %s %s', (x, first, len, unit) => {
    expect(ev(`${x}[1]`)).toBe(first);
    expect(ev(`len(${x})`)).toBe(len);
    if (!x.startsWith('dyck') && !x.startsWith('perm') && !x.startsWith('word') && !x.startsWith('matrix')) {
      expect(errorOf(() => ev(`${x}[${Number(len) + 1}]`)).message).toMatch(new RegExp(`has ${len} ${unit}: indices 1..${len}`));
    }
  });

  test('blocks(s) lists the blocks by least element; s[i] is blocks(s)[i]', () => {
    expect(ev('blocks(setPartition([[2, 3], [1, 4], [5]]))')).toBe('[[1, 4], [2, 3], [5]]');
    expect(ev('all(s[i] == blocks(s)[i] for s in setPartitions(4), i in 1..len(s))')).toBe('true');
    // the number of blocks is distributed by the Stirling numbers of the second kind: S(4, k) = 1, 7, 6, 1 (OEIS A008277)
    expect(ev('list(count(s in setPartitions(4) where len(s) == k) for k in 1..4)')).toBe('[1, 7, 6, 1]');
    expect(errorOf(() => ev('setPartition([[1, 2]])[2]')).message).toBe(
      'index 2 is out of range: setPartition([[1, 2]]) has 1 block: indices 1..1',
    );
  });

  test('a matching has no single length', () => {
    expect(errorOf(() => ev('len(matching([[1, 2]]))')).message).toMatch(/len\(arcs\(m\)\)/);
  });
});
