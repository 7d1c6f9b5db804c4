// Matrices (LIBRARY.md §2): construction, determinant, rank, transpose, characteristic
// polynomial. Products and sums are the operators * + - (src/library/operators.ts).

import { charpoly, matrixDeterminant, Matrix, rank, transpose } from '../algebra/matrix.js';
import { isPolynomial, type PolyLike } from '../algebra/polynomial.js';
import { fail } from '../base/errors.js';
import { isScalar } from '../numbers/rational.js';
import { valueToText } from '../values/operations.js';
import type { Value } from '../values/value.js';
import { defineFunction } from './registry.js';
import { Tableau } from '../families/tableaux/tableau.js';
import { transposeRows } from './tableaux/descents.js';

/** The rows, after naming the first entry that is not a number in the language's own notation. */
function matrixRows(rows: Value): unknown[][] {
  if (Array.isArray(rows))
    for (const row of rows)
      if (Array.isArray(row))
        for (const x of row)
          if (!isScalar(x) && !isPolynomial(x)) fail(`a matrix entry must be a number or a polynomial, not ${valueToText(x)}`);
  return rows as unknown[][];
}

const topic = 'matrices';

defineFunction({
  name: 'matrix',
  topic,
  params: [{ name: 'rows', type: 'list' }],
  returns: 'matrix',
  description: 'the matrix with these rows (lists of equal length of exact numbers or polynomials)',
  example: 'matrix([[1, 2], [3, 4]])',
  exampleValue: 'matrix([[1, 2], [3, 4]])',
  source: 'definition',
  impl: (rows) => Matrix.from(matrixRows(rows)),
});

defineFunction({
  name: 'det',
  topic,
  params: [{ name: 'M', type: 'matrix' }],
  returns: 'scalarOrPolynomial',
  description:
    'the determinant of a square matrix, exactly (fraction-free Bareiss elimination for numbers, expansion along rows for polynomial entries)',
  example: 'det(matrix([[2, 1, 0], [1, 2, 1], [0, 1, 2]]))',
  exampleValue: '4',
  source:
    "E. H. Bareiss, Sylvester's identity and multistep integer-preserving Gaussian elimination, Math. Comp. 22 (1968); tested on Hilbert (OEIS A005249) and Vandermonde matrices",
  impl: (m) => matrixDeterminant(m as Matrix),
});

defineFunction({
  name: 'rank',
  topic,
  params: [{ name: 'M', type: 'matrix' }],
  returns: 'integer',
  description: 'the rank over the rationals',
  example: 'rank(matrix([[1, 2, 3], [2, 4, 6]]))',
  exampleValue: '1',
  source: 'definition (Gaussian elimination)',
  impl: (m) => rank(m as Matrix),
});

defineFunction({
  name: 'transpose',
  topic,
  params: [{ name: 'M', type: ['matrix', 'tableau'] }],
  returns: 'any',
  description: 'the transposed matrix; of a standard tableau, the standard tableau of the conjugate shape whose rows are its columns',
  example: 'transpose(matrix([[1, 2, 3], [4, 5, 6]]))',
  exampleValue: 'matrix([[1, 4], [2, 5], [3, 6]])',
  source:
    'definition; on standard tableaux, RSK(w reversed) gives [transpose(P), evacuation(transpose(Q))] (Schützenberger; Stanley, Enumerative Combinatorics 2, Appendix A1.2)',
  impl: (m) => {
    if (m instanceof Tableau) {
      if (!m.isStandard())
        fail(`transpose(T) needs a standard tableau (the transpose of a semistandard one is not semistandard), got ${m.toText()}`);
      return new Tableau(transposeRows(m.rows));
    }
    return transpose(m as Matrix);
  },
});

defineFunction({
  name: 'charpoly',
  topic,
  params: [
    { name: 'M', type: 'matrix' },
    { name: 't', type: 'scalarOrPolynomial' },
  ],
  returns: 'scalarOrPolynomial',
  description: 'the characteristic polynomial det(t*I - M) (monic); t may be an indeterminate or a value',
  example: 'charpoly(matrix([[2, 1], [1, 2]]), t)',
  exampleValue: 't^2 - 4*t + 3',
  source:
    'Faddeev–LeVerrier recurrence (D. K. Faddeev, V. N. Faddeeva, Computational Methods of Linear Algebra, §24); tested on companion matrices (Horn–Johnson, Matrix Analysis, Thm 3.3.14)',
  impl: (m, t) => charpoly(m as Matrix, t as PolyLike),
});
