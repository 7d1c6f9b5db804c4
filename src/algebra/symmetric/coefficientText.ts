// Reading back the coefficient of a symmetric function from its record encoding: a number, or a
// polynomial in the expression syntax exactly as Polynomial.toText prints it
// (`-3/2*q^2*t + x[1] - 1`): terms joined by ' + ' or ' - ', each an optional number followed by
// factors `name` or `name^e` joined by '*'.

import { fail } from '../../base/errors.js';
import { parseScalar, type Scalar } from '../../numbers/rational.js';
import { sneg } from '../../numbers/scalar.js';
import { fromTerms, type PolyLike } from '../polynomial.js';
import { varId } from '../variables.js';

const FACTOR = /^([A-Za-z_][A-Za-z0-9_]*(?:\[-?\d+\])?)(?:\^(\d+))?$/;
const NUMBER = /^\d+(?:\/\d+)?$/;

export function parsePolynomialText(text: string): PolyLike {
  const bad = (): never => fail(`cannot read the coefficient ${JSON.stringify(text)}: expected a number or a polynomial such as 2*q^2 - t`);
  let s = text.trim();
  if (s === '') bad();
  let sign = 1;
  if (s.startsWith('-')) {
    sign = -1;
    s = s.slice(1).trimStart();
  }
  const pieces = s.split(/ ([+-]) /);
  const vars: number[] = [];
  const where = new Map<number, number>();
  const terms: [number[], Scalar][] = [];
  const raw: { coef: Scalar; exps: Map<number, number> }[] = [];
  for (let k = 0; k < pieces.length; k += 2) {
    const termSign = k === 0 ? sign : pieces[k - 1] === '-' ? -1 : 1;
    const factors = pieces[k].split('*');
    let coef: Scalar = 1;
    const exps = new Map<number, number>();
    factors.forEach((f, i) => {
      if (i === 0 && NUMBER.test(f)) {
        coef = parseScalar(f);
        return;
      }
      const m = FACTOR.exec(f);
      if (!m) bad();
      const id = varId(m![1]);
      exps.set(id, (exps.get(id) ?? 0) + (m![2] === undefined ? 1 : Number(m![2])));
      if (!where.has(id)) {
        where.set(id, vars.length);
        vars.push(id);
      }
    });
    raw.push({ coef: termSign < 0 ? sneg(coef) : coef, exps });
  }
  for (const { coef, exps } of raw) {
    const row = new Array<number>(vars.length).fill(0);
    for (const [id, e] of exps) row[where.get(id)!] = e;
    terms.push([row, coef]);
  }
  return fromTerms(vars, terms);
}
