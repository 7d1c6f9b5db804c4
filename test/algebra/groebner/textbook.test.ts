// Reduced Gröbner bases of textbook examples, against the bases printed in Cox, Little and
// O'Shea, *Ideals, Varieties, and Algorithms* (the chapter and section beside each check), and
// every basis re-checked by the independent plain implementation (S-pair criterion).
import { describe, expect, it } from 'vitest';
import { padd, pmul, polyText, ppow, psub, variable, type PolyLike } from '../../../src/algebra/polynomial.js';
import { varId } from '../../../src/algebra/variables.js';
import { makeRat } from '../../../src/numbers/rational.js';
import { eliminate, groebnerBasis, idealEquals, termOrder, type OrderSpec } from '../../../src/algebra/groebner/index.js';
import { plainIsGroebner, plainIsReduced, plainOrders, Q, toPlain } from './independent.js';

const [t, x, y, z] = ['t', 'x', 'y', 'z'].map((n) => variable(n));
const id = (n: string) => varId(n);
const sum = (...ps: PolyLike[]) => ps.reduce((a, b) => padd(a, b), 0);
const texts = (G: PolyLike[]) => G.map(polyText);

function checked(gens: PolyLike[], spec: 'lex' | 'deglex' | 'grevlex', names: string[]): PolyLike[] {
  const ids = names.map(id);
  const G = groebnerBasis(gens, termOrder(spec as OrderSpec, ids));
  const plain = G.map((g) => toPlain(Q, g, ids, plainOrders[spec]));
  expect(plainIsGroebner(Q, plain, plainOrders[spec])).toBe(true);
  expect(plainIsReduced(Q, plain)).toBe(true);
  return G;
}

describe("textbook bases over Q (Cox, Little and O'Shea)", () => {
  it('Chapter 2, Section 7: x^3 - 2xy, x^2 y - 2y^2 + x in grlex has reduced basis x^2, xy, y^2 - x/2', () => {
    const G = checked([psub(ppow(x, 3), pmul(2, pmul(x, y))), sum(pmul(ppow(x, 2), y), pmul(-2, ppow(y, 2)), x)], 'deglex', ['x', 'y']);
    // ascending leading terms: y^2 < xy < x^2
    expect(texts(G)).toEqual(['y^2 - 1/2*x', 'x*y', 'x^2']);
  });

  it('Chapter 2, Section 8: x^2+y+z-1, x+y^2+z-1, x+y+z^2-1 in lex x > y > z', () => {
    const G = checked([sum(ppow(x, 2), y, z, -1), sum(x, ppow(y, 2), z, -1), sum(x, y, ppow(z, 2), -1)], 'lex', ['x', 'y', 'z']);
    // printed: g1 = x + y + z^2 - 1, g2 = y^2 - y - z^2 + z, g3 = 2yz^2 + z^4 - z^2,
    // g4 = z^6 - 4z^4 + 4z^3 - z^2 (g3 made monic here).
    expect(texts(G)).toEqual(['z^6 - 4*z^4 + 4*z^3 - z^2', '1/2*z^4 + y*z^2 - 1/2*z^2', 'y^2 - z^2 - y + z', 'z^2 + x + y - 1']);
  });

  it('Chapter 2, Section 8 / Chapter 3, Section 1: eliminating x, then x and y, from the system above', () => {
    const gens = [sum(ppow(x, 2), y, z, -1), sum(x, ppow(y, 2), z, -1), sum(x, y, ppow(z, 2), -1)];
    const I1 = eliminate(gens, [id('x')], { order: termOrder('lex', [id('y'), id('z')]) });
    expect(texts(I1)).toEqual(['z^6 - 4*z^4 + 4*z^3 - z^2', '1/2*z^4 + y*z^2 - 1/2*z^2', 'y^2 - z^2 - y + z']);
    const I2 = eliminate(gens, [id('x'), id('y')]);
    expect(texts(I2)).toEqual(['z^6 - 4*z^4 + 4*z^3 - z^2']);
  });

  it('Chapter 3, Section 1: xy = 4, y^2 = x^3 - 1 in lex x > y gives 16x - y^2 - y^4, y^5 + y^3 - 64', () => {
    const G = checked([psub(pmul(x, y), 4), sum(ppow(y, 2), pmul(-1, ppow(x, 3)), 1)], 'lex', ['x', 'y']);
    expect(texts(G)).toEqual(['y^5 + y^3 - 64', '-1/16*y^4 - 1/16*y^2 + x']);
  });

  it('Chapter 3, Section 3: implicitisation of the twisted cubic (t, t^2, t^3), lex t > x > y > z', () => {
    const gens = [psub(x, t), psub(y, ppow(t, 2)), psub(z, ppow(t, 3))];
    const G = checked(gens, 'lex', ['t', 'x', 'y', 'z']);
    // printed: t - x, x^2 - y, xy - z, xz - y^2, y^3 - z^2 (lex leading terms t, x^2, xy, xz, y^3)
    expect(texts(G)).toEqual(['y^3 - z^2', 'x*z - y^2', 'x*y - z', 'x^2 - y', 't - x']);
    const cubic = eliminate(gens, [id('t')], { order: termOrder('lex', ['x', 'y', 'z'].map(id)) });
    expect(texts(cubic)).toEqual(['y^3 - z^2', 'x*z - y^2', 'x*y - z', 'x^2 - y']);
  });

  it('Chapter 1, Section 4: the twisted cubic ideal <y - x^2, z - x^3> in grevlex x > y > z', () => {
    // I(V) of the twisted cubic; its grevlex basis: x^2 - y, xy - z, y^2 - xz (re-derived by the
    // independent S-pair check; not printed in this order in the book).
    const G = checked([psub(y, ppow(x, 2)), psub(z, ppow(x, 3))], 'grevlex', ['x', 'y', 'z']);
    expect(texts(G)).toEqual(['-x*z + y^2', 'x*y - z', 'x^2 - y']);
    expect(idealEquals(G, [psub(y, ppow(x, 2)), psub(z, ppow(x, 3))])).toBe(true);
  });

  it('rational input coefficients and the unit ideal', () => {
    const G = checked([sum(pmul(makeRat(2n, 3n), ppow(x, 2)), y), sum(pmul(makeRat(-1n, 5n), x), 1)], 'grevlex', ['x', 'y']);
    expect(texts(G)).toEqual(['y + 50/3', 'x - 5']);
    expect(groebnerBasis([x, psub(x, 1)], termOrder('grevlex', [id('x')]))).toEqual([1]);
    expect(groebnerBasis([x, psub(x, 1)], termOrder('grevlex', [id('x')]), { prime: 7 })).toEqual([1]);
    expect(groebnerBasis([0, 0], termOrder('grevlex', [id('x')]))).toEqual([]);
    expect(groebnerBasis([3], termOrder('grevlex', [id('x')]))).toEqual([1]);
  });
});
