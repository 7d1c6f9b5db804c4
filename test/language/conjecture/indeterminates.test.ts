// Indeterminates: declared in a define document for the whole file, passed to a definition and
// indexed there (y[i] given x is x[i]), and an unknown name that looks like one says how to declare it.

import { describe, expect, test } from 'vitest';
import { check } from '../../runner/helpers.js';
import { loadConjectureFile } from '../../../src/language/conjecture/load-file.js';
import { compileConjecture } from '../../../src/language/conjecture/compile-conjecture.js';
import { evaluate } from '../../../src/language/expr/index.js';
import { errorOf } from '../expr/helpers.js';

// e_2(x_1..x_n) as a sum over 2-subsets equals the sum over pairs i < j (the definition of the
// elementary symmetric polynomial, I. G. Macdonald, Symmetric Functions and Hall Polynomials, I.2).
const FILE = `
indeterminates: [x]
define:
  elem(k, n, y): sum(product(y[i] for i in S) for S in subsets(n, k))
---
conjecture: e2
for:
  n: 1..5
claim: elem(2, n, x) == sum(x[i]*x[j] for i in 1..n, j in i+1..n)
`;

describe('indeterminates', () => {
  test('a define document declares them for every conjecture of the file; a parameter given x indexes as x', () => {
    const [spec] = loadConjectureFile('f.yaml', FILE).conjectures;
    expect(spec.indeterminates).toEqual(['x']);
    expect(check(FILE).outcome).toBe('holds');
  });

  test("a conjecture adds its own after the file's", () => {
    const [spec] = loadConjectureFile('f.yaml', FILE.replace('conjecture: e2', 'conjecture: e2\nindeterminates: [q, x]')).conjectures;
    expect(spec.indeterminates).toEqual(['x', 'q']);
  });

  test('only a bare indeterminate can be indexed', () => {
    expect(errorOf(() => evaluate('(x + 1)[2]', [], ['x'])).message).toMatch(/only an indeterminate such as x can/);
    expect(errorOf(() => evaluate('(2*x)[2]', [], ['x'])).message).toMatch(/cannot be indexed/);
  });

  test('an unknown name that looks like an indeterminate says how to declare it', () => {
    const file = 'conjecture: c\nindeterminates: [x]\nfor:\n  n: 1..2\nclaim: t^n != 0\n';
    const e = errorOf(() => compileConjecture(loadConjectureFile('f.yaml', file).conjectures[0]));
    expect(e.suggestion).toBe('if t is a polynomial variable, declare it: indeterminates: [x, t]');
    expect(errorOf(() => evaluate('q + 1')).suggestion).toBe('if q is a polynomial variable, pass --indeterminates q');
    expect(errorOf(() => evaluate('alpha[2]')).suggestion).toMatch(/--indeterminates alpha/);
    // a longer unknown name is not taken for one
    expect(errorOf(() => evaluate('foo + 1')).message).not.toMatch(/indeterminates/);
  });
});
