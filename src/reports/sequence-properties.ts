// What `hunch table` notices about a tabulated sequence: properties that hold at every tabulated
// value. They are observations on finitely many values — hints for a conjecture, never theorems —
// and the table says so.

import { getFunction } from '../library/registry.js';
import { isPolynomial, type Polynomial } from '../algebra/polynomial.js';
import { variable } from '../algebra/polynomial.js';
import { isScalar } from '../numbers/rational.js';
import { sdiv, scmp, sIsInteger, ssub, seq, sisZero } from '../numbers/scalar.js';
import type { Scalar } from '../numbers/rational.js';
import type { Value } from '../values/value.js';

function call(name: string, ...args: Value[]): Value | null {
  const f = getFunction(name);
  if (!f) return null;
  try {
    return f.impl(...args);
  } catch {
    return null;
  }
}

function scalarSequenceProperties(v: Scalar[]): string[] {
  const out: string[] = [];
  if (v.every(sIsInteger)) out.push('integers');
  if (v.every((x) => scmp(x, 0) > 0)) out.push('positive');
  else if (v.every((x) => scmp(x, 0) >= 0)) out.push('nonnegative');
  if (v.length >= 2) {
    const pairs = v.slice(1).map((x, i) => scmp(x, v[i]));
    if (pairs.every((c) => c > 0)) out.push('strictly increasing');
    else if (pairs.every((c) => c >= 0)) out.push('weakly increasing');
    else if (pairs.every((c) => c < 0)) out.push('strictly decreasing');
    else if (pairs.every((c) => c <= 0)) out.push('weakly decreasing');
  }
  if (v.length >= 3) {
    const d = v.slice(1).map((x, i) => ssub(x, v[i]));
    if (d.every((x) => seq(x, d[0]))) out.push(`arithmetic (difference ${d[0]})`);
    if (v.every((x) => !sisZero(x))) {
      const r = v.slice(1).map((x, i) => sdiv(x, v[i]));
      if (r.every((x) => seq(x, r[0]))) out.push(`geometric (ratio ${r[0]})`);
      else if (r.every(sIsInteger) && v.every(sIsInteger)) out.push('each term divides the next');
    }
    if (call('isUnimodal', v) === true && !out.some((p) => p.includes('increasing') || p.includes('decreasing'))) out.push('unimodal');
    if (call('isLogConcave', v) === true) out.push('log-concave');
  }
  return out;
}

function listProperties(rows: Value[][]): string[] {
  const checks: Array<[string, string]> = [
    ['isUnimodal', 'unimodal'],
    ['isLogConcave', 'log-concave'],
    ['isPalindromic', 'palindromic'],
  ];
  return checks.filter(([f]) => rows.every((r) => call(f, r) === true)).map(([, name]) => `each row ${name}`);
}

function polynomialProperties(ps: Value[]): string[] {
  const polys = ps.filter(isPolynomial) as Polynomial[];
  if (polys.length === 0) return [];
  const vars = new Set(polys.flatMap((p) => p.variableNames()));
  const out: string[] = [];
  const coefs = ps.map((p) => (call('coefficients', p) as Value[] | null) ?? []);
  if (coefs.every((c) => c.every((x) => isScalar(x) && scmp(x, 0) >= 0))) out.push('nonnegative coefficients');
  if (coefs.every((c) => c.every((x) => x === 1))) out.push('0/1 coefficients');
  if (vars.size === 1) {
    const q = variable([...vars][0]);
    const lists = ps.map((p) => call('coefficientList', p, q) as Value[] | null);
    if (lists.every((l) => l !== null)) out.push(...listProperties(lists as Value[][]).map((s) => s.replace('each row', 'coefficients')));
    if (ps.every((p) => call('isRealRooted', p, q) === true)) out.push('real-rooted');
  }
  return out;
}

export function detectProperties(values: Value[]): string[] {
  if (values.length === 0) return [];
  if (values.every(isScalar)) return scalarSequenceProperties(values as Scalar[]);
  if (values.every((v) => Array.isArray(v) && v.every(isScalar))) return listProperties(values as Value[][]);
  if (values.every((v) => isScalar(v) || isPolynomial(v))) return polynomialProperties(values);
  return [];
}
