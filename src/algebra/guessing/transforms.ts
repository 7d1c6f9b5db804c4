// Transforms tried before guessing: a closed form may appear only after taking first differences,
// the binomial transform, or dividing by n!, by the Catalan number or by another column. Each
// transform keeps the index of the sequence and says how to define the new sequence in the language.

import { binomialInt, factorialInt } from '../../numbers/integer.js';
import { type Scalar } from '../../numbers/rational.js';
import { sadd, sdiv, sisZero, smul, ssub } from '../../numbers/scalar.js';
import { comprehension } from './text.js';
import type { Sequence } from './types.js';

export interface Transform {
  /** How the new sequence b is made from a, e.g. "a(n)/factorial(n)". */
  label: string;
  /** b as a sequence, or null when the transform does not apply (an index below 0, a zero divisor). */
  apply(seq: Sequence): Sequence | null;
  /** b(n) defined in the language from the function f of the original sequence. */
  body(f: string, seq: Sequence): string;
  /** b(n) uses a up to n + shift. */
  shift: number;
}

function catalanInt(n: number): Scalar {
  return sdiv(binomialInt(2 * n, n), n + 1);
}

export const differences: Transform = {
  label: 'a(n + 1) - a(n)',
  apply: (s) => (s.terms.length < 2 ? null : { offset: s.offset, terms: s.terms.slice(1).map((x, i) => ssub(x, s.terms[i])) }),
  body: (f) => `${f}(n + 1) - ${f}(n)`,
  shift: 1,
};

export const binomialTransform: Transform = {
  label: 'the binomial transform of a',
  apply: (s) => ({
    offset: s.offset,
    terms: s.terms.map((_, m) => {
      let t: Scalar = 0;
      for (let k = 0; k <= m; k++) t = sadd(t, smul(binomialInt(m, k), s.terms[k]));
      return t;
    }),
  }),
  body: (f, s) => {
    const m = s.offset === 0 ? 'n' : `n - ${s.offset}`;
    const arg = s.offset === 0 ? 'k' : `k + ${s.offset}`;
    return comprehension('sum', `binomial(${m}, k)*${f}(${arg})`, 'k', `0..${m}`);
  },
  shift: 0,
};

function divideBy(label: string, name: string, value: (n: number) => Scalar): Transform {
  return {
    label: `a(n)/${name}(n)`,
    apply: (s) => {
      if (s.offset < 0) return null;
      const out: Scalar[] = [];
      for (let i = 0; i < s.terms.length; i++) {
        const d = value(s.offset + i);
        if (sisZero(d)) return null;
        out.push(sdiv(s.terms[i], d));
      }
      return { offset: s.offset, terms: out };
    },
    body: (f) => `${f}(n)/${name}(n)`,
    shift: 0,
  };
}

export const byFactorial = divideBy('n!', 'factorial', (n) => factorialInt(n));
export const byCatalan = divideBy('the Catalan number', 'catalan', catalanInt);

/** Division by another column c(n), given by its terms over the same indices and the name of its function. */
export function byColumn(name: string, column: Sequence): Transform {
  return {
    label: `a(n)/${name}(n)`,
    apply: (s) => {
      if (column.offset !== s.offset || column.terms.length < s.terms.length) return null;
      if (column.terms.slice(0, s.terms.length).some(sisZero)) return null;
      return { offset: s.offset, terms: s.terms.map((t, i) => sdiv(t, column.terms[i])) };
    },
    body: (f) => `${f}(n)/${name}(n)`,
    shift: 0,
  };
}

export const STANDARD_TRANSFORMS: readonly Transform[] = [differences, binomialTransform, byFactorial, byCatalan];
