// Functions on tableaux (LIBRARY.md §2): shape, content, readingWord, promotion and evacuation
// (Schützenberger, by jeu de taquin), and the constructors tableau, asm and pipeDream.

import { fail } from '../base/errors.js';
import { defineFunction } from './registry.js';
import { Partition } from '../families/partitions/partition.js';
import { Tableau } from '../families/tableaux/tableau.js';
import { Asm } from '../families/asms/asm.js';
import { PipeDream } from '../families/pipeDreams/pipeDream.js';
import { readingWordOf } from '../families/tableaux/tableauOrder.js';
import { valueToText } from '../values/operations.js';
import type { Value } from '../values/value.js';
import { intList } from './partitions.js';
import { evacuationBK, promotionBK } from './tableaux/benderKnuth.js';
import { smallIntArg } from './integerArgs.js';

/** The alphabet 1..m of a semistandard promotion or evacuation: m given, else the largest entry. */
function alphabetArg(t: Tableau, m: Value | undefined, call: string): number {
  let max = 0;
  for (const r of t.rows) for (const v of r) if (v > max) max = v;
  if (m === undefined) return max;
  const k = smallIntArg(call, 'm', m, 0, 100_000);
  if (k < max) fail(`${call} needs m >= the largest entry ${max}, got m = ${k}`);
  return k;
}

const topic = 'tableaux';

function rowsArg(v: Value, what: string): number[][] {
  if (!Array.isArray(v)) fail(`${what} must be a list of rows, got ${valueToText(v)}`);
  return v.map((r) => intList(r, `a row of ${what}`));
}

/**
 * Remove the entry at the top-left cell of a standard straight-shape filling and slide the hole out
 * by jeu de taquin (the smaller of the right and lower neighbours moves in). Mutates rows; returns
 * the row of the outer corner where the hole ended (that cell is removed).
 */
export function slideOut(rows: number[][]): number {
  let i = 0,
    j = 0;
  for (;;) {
    const right = j + 1 < rows[i].length ? rows[i][j + 1] : Infinity;
    const below = i + 1 < rows.length && j < rows[i + 1].length ? rows[i + 1][j] : Infinity;
    if (right === Infinity && below === Infinity) break;
    if (right < below) {
      rows[i][j] = right;
      j++;
    } else {
      rows[i][j] = below;
      i++;
    }
  }
  rows[i].pop();
  if (rows[i].length === 0) rows.pop();
  return i;
}

/** Promotion: delete 1, slide, subtract 1 from every entry, put n in the vacated cell. */
export function promotionRows(t: readonly (readonly number[])[]): number[][] {
  const n = t.reduce((s, r) => s + r.length, 0);
  if (n === 0) return []; // the empty tableau is its own promotion
  const rows = t.map((r) => r.slice());
  const i = slideOut(rows);
  for (const r of rows) for (let j = 0; j < r.length; j++) r[j]--;
  while (rows.length <= i) rows.push([]);
  rows[i].push(n);
  return rows;
}

/** Evacuation: repeatedly delete the smallest entry and slide; the k-th vacated cell gets n + 1 - k. */
export function evacuationRows(t: readonly (readonly number[])[]): number[][] {
  const n = t.reduce((s, r) => s + r.length, 0);
  const out = t.map((r) => r.slice());
  const cur = t.map((r) => r.slice());
  for (let k = 1; k <= n; k++) {
    const i = slideOut(cur);
    const j = cur[i] ? cur[i].length : 0; // the removed cell was (i, old length - 1) = (i, new length)
    out[i][j] = n + 1 - k;
  }
  return out;
}

defineFunction({
  name: 'tableau',
  topic,
  params: [{ name: 'rows', type: 'list' }],
  returns: 'tableau',
  description: 'the tableau with the given rows (English notation: rows weakly, columns strictly increase)',
  example: 'tableau([[1, 2], [3]])',
  exampleValue: 'tableau([[1, 2], [3]])',
  source: 'definition',
  impl: (rows) => Tableau.from(rowsArg(rows, 'a tableau')),
});

defineFunction({
  name: 'asm',
  topic: 'alternating sign matrices',
  params: [{ name: 'rows', type: 'list' }],
  returns: 'asm',
  description: 'the alternating sign matrix with the given rows (entries 0, 1, -1; nonzero entries alternate, starting and ending with 1)',
  example: 'asm([[0, 1, 0], [1, -1, 1], [0, 1, 0]])',
  exampleValue: 'asm([[0, 1, 0], [1, -1, 1], [0, 1, 0]])',
  source: 'definition; Mills, Robbins and Rumsey, J. Combin. Theory A 34 (1983)',
  impl: (rows) => Asm.from(rowsArg(rows, 'an alternating sign matrix')),
});

defineFunction({
  name: 'pipeDream',
  topic: 'pipe dreams',
  params: [{ name: 'crosses', type: 'list' }],
  returns: 'pipeDream',
  description:
    'the pipe dream with crosses at the given cells [row, column] (elbows elsewhere); the pipe entering at the left of row i exits at the top of column w(i)',
  example: 'pipeDream([[1, 2], [1, 1]])',
  exampleValue: 'pipeDream([[1, 1], [1, 2]])',
  source: 'definition; "Gröbner geometry of Schubert polynomials", Ann. of Math. 161 (2005), §1.4',
  impl: (cs) => {
    if (!Array.isArray(cs)) fail(`a pipe dream is a list of crosses [row, column], got ${valueToText(cs)}`);
    return PipeDream.from(cs.map((c) => intList(c, 'a cross of a pipe dream')));
  },
});

defineFunction({
  name: 'shape',
  topic,
  params: [{ name: 'T', type: 'tableau' }],
  returns: 'partition',
  description: 'the shape of a tableau, as a partition (row lengths)',
  example: 'shape(tableau([[1, 2, 4], [3]]))',
  exampleValue: 'partition([3, 1])',
  source: 'definition',
  impl: (t) => new Partition((t as Tableau).shapeParts()),
});

defineFunction({
  name: 'content',
  topic,
  params: [{ name: 'T', type: 'tableau' }],
  returns: 'list',
  description: 'the content (weight) of a tableau: [number of 1s, number of 2s, ..., number of m] for m its largest entry',
  example: 'content(tableau([[1, 1, 2], [2]]))',
  exampleValue: '[2, 2]',
  source: 'Macdonald, Symmetric Functions and Hall Polynomials, I.5 (the weight of a tableau)',
  impl: (t) => {
    const c: number[] = [];
    for (const r of (t as Tableau).rows)
      for (const v of r) {
        while (c.length < v) c.push(0);
        c[v - 1]++;
      }
    return c;
  },
});

defineFunction({
  name: 'readingWord',
  topic,
  params: [{ name: 'T', type: 'tableau' }],
  returns: 'list',
  description: 'the row reading word: the rows from the bottom one up, each read left to right',
  example: 'readingWord(tableau([[1, 2, 4], [3]]))',
  exampleValue: '[3, 1, 2, 4]',
  source: 'Fulton, Young Tableaux, §2.1 (the row word)',
  impl: (t) => readingWordOf((t as Tableau).rows),
});

defineFunction({
  name: 'promotion',
  topic,
  params: [
    { name: 'T', type: 'tableau' },
    { name: 'm', type: 'integer', optional: true },
  ],
  returns: 'tableau',
  description:
    'Schützenberger promotion: of a standard tableau, delete 1, slide by jeu de taquin, subtract 1, put n in the vacated cell; of a semistandard tableau with entries in 1..m (m defaults to the largest entry), the Bender–Knuth product t_{m-1} ... t_1',
  example: 'promotion(tableau([[1, 2], [3, 4]]))',
  exampleValue: 'tableau([[1, 3], [2, 4]])',
  source:
    'Schützenberger, Discrete Math. 2 (1972); Stanley, "Promotion and evacuation", Electron. J. Combin. 16(2) (2009); order m on rectangles: Rhoades, J. Combin. Theory A 117 (2010)',
  impl: (t, m) => {
    const T = t as Tableau;
    if (m === undefined && T.isStandard()) return new Tableau(promotionRows(T.rows));
    return new Tableau(promotionBK(T.rows, alphabetArg(T, m, 'promotion(T, m)')));
  },
});

defineFunction({
  name: 'evacuation',
  topic,
  params: [
    { name: 'T', type: 'tableau' },
    { name: 'm', type: 'integer', optional: true },
  ],
  returns: 'tableau',
  description:
    'Schützenberger evacuation (an involution preserving the shape): of a standard tableau by jeu de taquin; of a semistandard tableau with entries in 1..m (m defaults to the largest entry) by Bender–Knuth involutions',
  example: 'evacuation(tableau([[1, 2, 3], [4]]))',
  exampleValue: 'tableau([[1, 3, 4], [2]])',
  source:
    'Schützenberger, Math. Scand. 12 (1963); Stanley, Enumerative Combinatorics 2, A1.2, and "Promotion and evacuation", Electron. J. Combin. 16(2) (2009)',
  impl: (t, m) => {
    const T = t as Tableau;
    if (m === undefined && T.isStandard()) return new Tableau(evacuationRows(T.rows));
    return new Tableau(evacuationBK(T.rows, alphabetArg(T, m, 'evacuation(T, m)')));
  },
});
