// Polynomial basics (LIBRARY.md §2): coefficients, terms, degrees, substitution, renaming.
// Every function accepts a number where a polynomial is expected (a constant polynomial).
// A bare indexed name (x for x[1], x[2], ...) arrives as the variable x; see polyArgs.ts.

import { fail } from '../base/errors.js';
import { isPolyLike, isPolynomial, polyText, type PolyLike } from '../algebra/polynomial.js';
import {
  asMonomial,
  coefficientOf,
  coefficientsOf,
  degreeIn,
  renameVariables,
  substitute,
  termsOf,
  totalDegree,
  univariateCoefficients,
} from '../algebra/polynomialOps.js';
import { indexedName, isBareVar, varBase, varId, varIndex, varIndices, varName } from '../algebra/variables.js';
import { isIdeal } from '../algebra/ideals/ideal.js';
import { idealDimensionData } from '../algebra/ideals/invariants.js';
import type { Value } from '../values/value.js';
import { variableArg } from './polyArgs.js';
import { defineFunction } from './registry.js';

const topic = 'polynomials';
const P = 'scalarOrPolynomial';

defineFunction({
  name: 'coeff',
  topic,
  params: [
    { name: 'p', type: P },
    { name: 'monomial', type: P },
  ],
  returns: 'number',
  description: 'the coefficient (a number) of a monomial such as q^2*x[1] in p; coeff(p, 1) is the constant term',
  example: 'coeff((1 + q)^4, q^2)',
  exampleValue: '6',
  source: 'definition',
  impl: (p, m) => {
    const mono = asMonomial(m as PolyLike);
    if (!mono) fail(`coeff(p, monomial) needs a monomial with coefficient 1 (such as q^2*x[1]), got ${polyText(m as PolyLike)}`);
    return coefficientOf(p as PolyLike, mono);
  },
});

defineFunction({
  name: 'coefficients',
  topic,
  params: [{ name: 'p', type: P }],
  returns: 'list',
  description: 'the nonzero coefficients of p, in the order p prints: highest total degree first, then lexicographic (so [] for 0)',
  example: 'coefficients(2*q^2 - q + 5)',
  exampleValue: '[2, -1, 5]',
  source: 'definition',
  impl: (p) => coefficientsOf(p as PolyLike),
});

defineFunction({
  name: 'terms',
  topic,
  params: [{ name: 'p', type: P }],
  returns: 'list',
  description: 'the terms of p (coefficient times monomial), in the order p prints; [] for 0',
  example: 'terms(2*q^2 - q + 5)',
  exampleValue: '[2*q^2, -q, 5]',
  source: 'definition',
  impl: (p) => termsOf(p as PolyLike),
});

defineFunction({
  name: 'degree',
  topic,
  params: [
    { name: 'p', type: [P, 'ideal'] },
    { name: 'var', type: 'polynomial', optional: true },
  ],
  returns: 'integer',
  description:
    'the total degree of p, or its degree in one variable; a nonzero number has degree 0 and 0 has none (an error); for an ideal I, the degree of S/I (of the affine variety V(I), with multiplicity, when I is not homogeneous; 0 for the whole ring)',
  example: 'degree(q^3*x[1] + q, q)',
  exampleValue: '3',
  source:
    "definition; for ideals, the leading coefficient of the Hilbert polynomial times (dim - 1)!, through the initial ideal (D. Cox, J. Little, D. O'Shea, Ideals, Varieties, and Algorithms, ch. 9 §3-§4); tested on the commuting variety (OEIS A029729) and determinantal varieties (W. Bruns, U. Vetter, Determinantal Rings, LNM 1327)",
  impl: (p, v) => {
    if (isIdeal(p)) {
      if (v !== undefined) fail('degree(I) of an ideal takes no variable');
      return idealDimensionData(p).degree;
    }
    if (v === undefined) return totalDegree(p as PolyLike);
    return degreeIn(p as PolyLike, variableArg('degree(p, var)', 'var', v));
  },
});

/** The variables of p whose base is `base` (x and every x[i]). */
function familyIn(p: PolyLike, base: string): number[] {
  return isPolynomial(p) ? Array.from(p.vars).filter((id) => varBase(id) === base) : [];
}

defineFunction({
  name: 'subs',
  topic,
  params: [
    { name: 'p', type: P },
    { name: 'var', type: 'polynomial' },
    { name: 'value', type: [P, 'list'] },
  ],
  returns: P,
  description:
    'substitute a value for a variable (subs(p, q, 1), subs(p, x[2], q)); for a bare indexed name, a list gives x[i] the i-th entry (subs(p, x, [1, 1, 1])) and a single value replaces every x[i]; substitutions are simultaneous',
  example: 'subs(x[1]^2 + x[1]*x[2], x, [2, 3])',
  exampleValue: '10',
  source: 'definition',
  impl: (p, v, value) => {
    const call = 'subs(p, var, value)';
    const poly = p as PolyLike;
    const id = variableArg(call, 'var', v);
    const values = new Map<number, PolyLike>();
    if (!isBareVar(id)) {
      if (Array.isArray(value)) fail(`${call}: a list of values needs a bare indexed name (x), not ${varName(id)}`);
      values.set(id, value as PolyLike);
      return substitute(poly, values);
    }
    const base = varBase(id);
    if (Array.isArray(value)) {
      const list = value as readonly Value[];
      for (const w of familyIn(poly, base)) {
        const i = varIndex(w);
        if (i === null) fail(`${call}: ${polyText(poly)} contains the plain variable ${base}, which a list of values cannot replace`);
        if (i < 1 || i > list.length)
          fail(`${call}: ${polyText(poly)} contains ${varName(w)} but the list gives values only for ${base}[1..${list.length}]`);
        values.set(w, list[i - 1] as PolyLike);
      }
      for (const x of list) if (!isPolyLike(x)) fail(`${call}: the values must be numbers or polynomials`);
    } else for (const w of familyIn(poly, base)) values.set(w, value as PolyLike);
    return substitute(poly, values);
  },
});

defineFunction({
  name: 'swapVars',
  topic,
  params: [
    { name: 'p', type: P },
    { name: 'a', type: 'polynomial' },
    { name: 'b', type: 'polynomial' },
  ],
  returns: P,
  description:
    'p with the variables a and b exchanged (swapVars(p, x[1], x[2])); two bare indexed names exchange whole families: x[i] with y[i] for every i',
  example: 'swapVars(x[1]^2 + x[2], x[1], x[2])',
  exampleValue: 'x[2]^2 + x[1]',
  source: 'definition',
  impl: (p, a, b) => {
    const call = 'swapVars(p, a, b)';
    const poly = p as PolyLike;
    const ia = variableArg(call, 'a', a),
      ib = variableArg(call, 'b', b);
    const rename = new Map<number, number>();
    if (isBareVar(ia) && isBareVar(ib) && ia !== ib) {
      const ba = varBase(ia),
        bb = varBase(ib);
      const partner = (id: number, to: string) => varId(indexedName(to, varIndices(id)));
      for (const id of familyIn(poly, ba)) rename.set(id, partner(id, bb));
      for (const id of familyIn(poly, bb)) rename.set(id, partner(id, ba));
    } else {
      rename.set(ia, ib);
      rename.set(ib, ia);
    }
    return renameVariables(poly, rename);
  },
});

defineFunction({
  name: 'coefficientList',
  topic,
  params: [
    { name: 'p', type: P },
    { name: 'q', type: 'polynomial' },
  ],
  returns: 'list',
  description: 'the coefficients [c_0, c_1, ..., c_d] of a polynomial in q alone, from degree 0 up, zeros included ([] for 0)',
  example: 'coefficientList((1 + q)^3, q)',
  exampleValue: '[1, 3, 3, 1]',
  source: 'definition',
  impl: (p, q) => univariateCoefficients(p as PolyLike, variableArg('coefficientList(p, q)', 'q', q)),
});
