// RSK on two-line arrays and matrices (through rsk), dual RSK, jeu de taquin rectification and
// Edelman–Greene insertion, registered under 'tableaux'.

import { fail } from '../base/errors.js';
import { Matrix } from '../algebra/matrix.js';
import { Tableau } from '../families/tableaux/tableau.js';
import { valueToText } from '../values/operations.js';
import type { Value } from '../values/value.js';
import { defineFunction } from './registry.js';
import { intList } from './partitions.js';
import { partitionArg } from '../families/tableaux/shapes.js';
import {
  checkReducedWord,
  edelmanGreeneInsert,
  insertTwoLine,
  isSkewSemistandard,
  rectifyRows,
  sortTwoLine,
  twoLineArrayOf,
} from './tableaux/insertion.js';
import { transposeRows } from './tableaux/descents.js';
import { heckeInsert } from './tableaux/hecke.js';

const topic = 'tableaux';

/** A matrix of nonnegative integers, or a two-line array as a list of pairs [i, j] (any order). */
export function twoLineArg(v: Value, call: string): [number, number][] {
  if (v instanceof Matrix) {
    const rows = v.rowList();
    for (const r of rows)
      for (const x of r)
        if (typeof x !== 'number' || !Number.isSafeInteger(x) || x < 0)
          fail(`${call} needs a matrix of nonnegative integers, got ${valueToText(v)}`);
    return twoLineArrayOf(rows as number[][]);
  }
  if (Array.isArray(v) && v.every((p) => Array.isArray(p) && p.length === 2)) {
    const pairs = v.map((p) => intList(p, `a column [i, j] of the two-line array of ${call}`) as [number, number]);
    for (const [i, j] of pairs) if (i < 1 || j < 1) fail(`${call} needs positive entries in a two-line array, got [${i}, ${j}]`);
    return sortTwoLine(pairs);
  }
  fail(`${call} takes a matrix of nonnegative integers or a two-line array [[i1, j1], [i2, j2], ...], got ${valueToText(v)}`);
}

defineFunction({
  name: 'rskArray',
  topic,
  params: [{ name: 'A', type: ['matrix', 'list'] }],
  returns: 'list',
  description:
    'RSK on a two-line array (a list of columns [i, j], sorted lexicographically) or a matrix of nonnegative integers (column [i, j] taken M[i, j] times): [P, Q], P from the bottom line, Q recording the top line',
  example: 'rskArray(matrix([[1, 0, 1], [0, 2, 0]]))',
  exampleValue: '[tableau([[1, 2, 2], [3]]), tableau([[1, 1, 2], [2]])]',
  source:
    'Knuth, Pacific J. Math. 34 (1970); Stanley, Enumerative Combinatorics 2, Thm 7.11.5 (and 7.13.1: transposing the matrix exchanges P and Q)',
  impl: (v) => {
    const { P, Q } = insertTwoLine(twoLineArg(v, 'rskArray(A)'), false);
    return [new Tableau(P), new Tableau(Q)];
  },
});

defineFunction({
  name: 'dualRsk',
  topic,
  params: [{ name: 'A', type: ['matrix', 'list'] }],
  returns: 'list',
  description:
    'dual RSK on a 0/1 matrix or a two-line array without repeated columns (x bumps the leftmost entry >= x): [transpose(P), Q], as P has strictly increasing rows and weakly increasing columns',
  example: 'dualRsk(matrix([[1, 1], [1, 0]]))',
  exampleValue: '[tableau([[1, 1], [2]]), tableau([[1, 1], [2]])]',
  source: 'Stanley, Enumerative Combinatorics 2, §7.14 (dual Cauchy identity); Knuth, Pacific J. Math. 34 (1970)',
  impl: (v) => {
    const pairs = twoLineArg(v, 'dualRsk(A)');
    for (let k = 1; k < pairs.length; k++)
      if (pairs[k][0] === pairs[k - 1][0] && pairs[k][1] === pairs[k - 1][1])
        fail(`dualRsk(A) needs a 0/1 matrix (no repeated column [${pairs[k].join(', ')}])`);
    const { P, Q } = insertTwoLine(pairs, true);
    return [new Tableau(transposeRows(P)), new Tableau(Q)];
  },
});

defineFunction({
  name: 'rectify',
  topic,
  params: [
    { name: 'rows', type: 'list' },
    { name: 'mu', type: ['partition', 'list'] },
  ],
  returns: 'tableau',
  description:
    'the jeu de taquin rectification of the skew tableau of shape lambda/mu whose row i holds the given entries right of the mu_i removed cells',
  example: 'rectify([[1], [2]], partition([1]))',
  exampleValue: 'tableau([[1], [2]])',
  source:
    'Schützenberger (1977); Fulton, Young Tableaux, ch. 1-3 (the result is the insertion tableau of the reading word, whatever the order of the slides)',
  impl: (r, m) => {
    if (!Array.isArray(r)) fail(`rectify(rows, mu) needs a list of rows, got ${valueToText(r)}`);
    const rows = r.map((x) => intList(x, 'a row of the skew tableau'));
    const mu = partitionArg(m, 'mu');
    if (mu.length > rows.length) fail(`rectify(rows, mu) needs a row (possibly empty) for each part of mu`);
    if (!isSkewSemistandard(rows, mu))
      fail(
        `rectify(rows, mu): ${valueToText(r)} outside ${valueToText(m)} is not a skew semistandard tableau (rows weakly, columns strictly increasing, lambda a partition)`,
      );
    return new Tableau(rectifyRows(rows, mu));
  },
});

defineFunction({
  name: 'edelmanGreene',
  topic,
  params: [{ name: 'a', type: 'list' }],
  returns: 'list',
  description:
    'Edelman–Greene insertion of a reduced word: [P, Q], P with strictly increasing rows and columns whose reading word is reduced for the same permutation, Q standard',
  example: 'edelmanGreene([2, 1, 2])',
  exampleValue: '[tableau([[1, 2], [2]]), tableau([[1, 3], [2]])]',
  source:
    'Edelman and Greene, "Balanced tableaux", Adv. Math. 63 (1987), §6; for w0 of S_n every P is the same, so f^staircase reduced words (OEIS A005118)',
  impl: (a) => {
    const word = intList(a, 'edelmanGreene(a)');
    checkReducedWord(word, 'edelmanGreene(a)');
    const { P, Q } = edelmanGreeneInsert(word);
    return [new Tableau(P), new Tableau(Q)];
  },
});

defineFunction({
  name: 'hecke',
  topic,
  params: [{ name: 'a', type: 'list' }],
  returns: 'list',
  description:
    'Hecke insertion of a word of positive integers: [P, Q], P an increasing tableau (its reading word has the same Demazure product as a), Q the set-valued recording tableau as rows of lists of labels',
  example: 'hecke([1, 2, 1, 1])',
  exampleValue: '[tableau([[1, 2], [2]]), [[[1], [2]], [[3, 4]]]]',
  source:
    'Buch, Kresch, Shimozono, Tamvakis and Yong, "Stable Grothendieck polynomials and K-theoretic factor sequences", Math. Ann. 340 (2008), §2; on reduced words it is Edelman–Greene insertion',
  impl: (a) => {
    const word = intList(a, 'hecke(a)');
    for (const x of word) if (x < 1) fail(`hecke(a) needs positive integers, got [${word.join(', ')}]`);
    const { P, Q } = heckeInsert(word);
    return [new Tableau(P), Q];
  },
});
