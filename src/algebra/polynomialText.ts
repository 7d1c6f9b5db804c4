// Reading back the text a polynomial prints (Polynomial.toText): a sum of terms
// `c*v1^e1*v2*...` separated by ` + ` and ` - `, with coefficients exact integers or fractions.
// Used by record decoders (the value layer cannot call the language's parser). Anything else is
// refused with the offending text.

import { fail } from '../base/errors.js';
import { parseScalar, type Scalar } from '../numbers/rational.js';
import { sneg } from '../numbers/scalar.js';
import { fromTerms, type PolyLike } from './polynomial.js';
import { varId } from './variables.js';

const FACTOR = /^([A-Za-z_][A-Za-z0-9_]*(?:\[\s*-?\d+(?:\s*,\s*-?\d+)*\s*\])?)(?:\^(-?\d+))?$/;

/** The polynomial or number written as `text` in the printed form of polynomials. */
export function parsePolynomialText(text: string): PolyLike {
  const src = text.trim();
  if (src === '') fail('an empty text is not a polynomial');
  // Split into signed terms at + and - outside brackets.
  const terms: { sign: 1 | -1; body: string }[] = [];
  let depth = 0,
    start = 0,
    sign: 1 | -1 = 1;
  let i = 0;
  if (src[0] === '-') {
    sign = -1;
    i = start = 1;
  }
  for (; i < src.length; i++) {
    const ch = src[i];
    if (ch === '[') depth++;
    else if (ch === ']') depth--;
    else if (depth === 0 && (ch === '+' || ch === '-') && i > start && src[i - 1] !== '^' && src[i - 1] !== '/') {
      terms.push({ sign, body: src.slice(start, i).trim() });
      sign = ch === '-' ? -1 : 1;
      start = i + 1;
    }
  }
  terms.push({ sign, body: src.slice(start).trim() });
  const vars: number[] = [];
  const where = new Map<number, number>();
  const parsed: [Map<number, number>, Scalar][] = [];
  for (const { sign: s, body } of terms) {
    if (body === '') fail(`cannot read ${JSON.stringify(text)} as a polynomial: an empty term`);
    let coef: Scalar = 1;
    const mono = new Map<number, number>();
    for (const [k, f] of body
      .split('*')
      .map((x) => x.trim())
      .entries()) {
      if (/^\d+(\/\d+)?$/.test(f)) {
        if (k !== 0) fail(`cannot read ${JSON.stringify(text)} as a polynomial: a coefficient must come first in its term`);
        coef = parseScalar(f);
        continue;
      }
      const m = FACTOR.exec(f);
      if (!m) fail(`cannot read ${JSON.stringify(text)} as a polynomial: ${JSON.stringify(f)} is not a variable or a power of one`);
      const id = varId(m[1]);
      if (!where.has(id)) {
        where.set(id, vars.length);
        vars.push(id);
      }
      mono.set(id, (mono.get(id) ?? 0) + (m[2] === undefined ? 1 : Number(m[2])));
    }
    parsed.push([mono, s < 0 ? sneg(coef) : coef]);
  }
  return fromTerms(
    vars,
    parsed.map(([mono, c]) => {
      const row = new Array<number>(vars.length).fill(0);
      for (const [id, e] of mono) row[where.get(id)!] = e;
      return [row, c] as [number[], Scalar];
    }),
  );
}
