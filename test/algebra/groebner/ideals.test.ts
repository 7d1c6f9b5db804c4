// Ideal operations on the engine: membership, equality, Gröbner basis test, intersection,
// quotient, saturation, radical membership, and the bounds. Sources beside each check; the small
// ones marked "by hand" were worked out by hand (their answers are immediate from the
// definitions).
import { describe, expect, it } from 'vitest';
import { padd, pmul, polyText, ppow, psub, variable, type PolyLike } from '../../../src/algebra/polynomial.js';
import { varId } from '../../../src/algebra/variables.js';
import { EvalError } from '../../../src/base/errors.js';
import { makeRat } from '../../../src/numbers/rational.js';
import {
  groebnerBasis,
  idealEquals,
  inIdeal,
  inRadical,
  intersect,
  isGroebnerBasis,
  leadingTerm,
  normalForm,
  quotient,
  saturation,
  termOrder,
} from '../../../src/algebra/groebner/index.js';
import { cyclic } from './systems.js';

const [x, y, z] = ['x', 'y', 'z'].map((n) => variable(n));
const [ix, iy, iz] = ['x', 'y', 'z'].map((n) => varId(n));
const sum = (...ps: PolyLike[]) => ps.reduce((a, b) => padd(a, b), 0);
const texts = (G: PolyLike[]) => G.map(polyText);

describe('membership, equality, the basis test', () => {
  it("Cox, Little and O'Shea, Chapter 2, Section 8: -4x^2y^2z^2 + y^6 + 3z^5 lies in <xz - y^2, x^3 - z^2>", () => {
    const I = [psub(pmul(x, z), ppow(y, 2)), psub(ppow(x, 3), ppow(z, 2))];
    const f = sum(pmul(-4, pmul(ppow(x, 2), pmul(ppow(y, 2), ppow(z, 2)))), ppow(y, 6), pmul(3, ppow(z, 5)));
    const o = termOrder('deglex', [ix, iy, iz]);
    expect(inIdeal(f, I, { order: o })).toBe(true);
    expect(inIdeal(f, I)).toBe(true);
    expect(inIdeal(pmul(x, y), I)).toBe(false);
    expect(normalForm(f, I, o)).toBe(0);
  });

  it('Chapter 2, Section 5: {x + z, y - z} is a lex basis; {y - x^2, z - x^3} is one for y > z > x, not for x > y > z', () => {
    expect(isGroebnerBasis([padd(x, z), psub(y, z)], termOrder('lex', [ix, iy, iz]))).toBe(true);
    const G = [psub(y, ppow(x, 2)), psub(z, ppow(x, 3))];
    expect(isGroebnerBasis(G, termOrder('lex', [iy, iz, ix]))).toBe(true);
    expect(isGroebnerBasis(G, termOrder('lex', [ix, iy, iz]))).toBe(false);
    expect(isGroebnerBasis(G, termOrder('lex', [ix, iy, iz]), { prime: 5 })).toBe(false);
  });

  it('ideal equality depends on the characteristic (by hand: x + y, x - y generate <x, y> unless 2 = 0)', () => {
    expect(idealEquals([padd(x, y), psub(x, y)], [x, y])).toBe(true);
    expect(idealEquals([padd(x, y), psub(x, y)], [x, y], { prime: 2 })).toBe(false);
    expect(idealEquals([padd(x, y), psub(x, y)], [padd(x, y)], { prime: 2 })).toBe(true);
  });

  it('normal form against a given basis, and the leading term', () => {
    const o = termOrder('grevlex', [ix, iy]);
    expect(polyText(normalForm(pmul(x, x), [psub(pmul(x, x), y)], o, { assumeBasis: true }))).toBe('y');
    expect(leadingTerm(sum(pmul(3, pmul(x, y)), ppow(y, 2), x), o)).toEqual({ exps: [1, 1], coef: 3 });
    expect(leadingTerm(0, o)).toBe(null);
  });
});

describe('intersection, quotient, saturation, radical (by hand unless named)', () => {
  it('intersections', () => {
    expect(texts(intersect([x], [y]))).toEqual(['x*y']);
    expect(texts(intersect([ppow(x, 2), y], [x, ppow(y, 2)]))).toEqual(['y^2', 'x*y', 'x^2']);
  });
  it('quotients: <xz, yz> : <z> = <x, y>; <x^2, xy> : <x> = <x, y>; I : 0 is the ring', () => {
    expect(texts(quotient([pmul(x, z), pmul(y, z)], [z]))).toEqual(['y', 'x']);
    expect(texts(quotient([ppow(x, 2), pmul(x, y)], [x]))).toEqual(['y', 'x']);
    expect(quotient([x], [0])).toEqual([1]);
  });
  it('saturation: <xy, x^2> : y^inf = <x>, : x^inf = <1>', () => {
    expect(texts(saturation([pmul(x, y), ppow(x, 2)], y))).toEqual(['x']);
    expect(saturation([pmul(x, y), ppow(x, 2)], x)).toEqual([1]);
  });
  it('radical membership by the Rabinowitsch trick', () => {
    expect(inRadical(padd(x, y), [ppow(x, 2), ppow(y, 2)])).toBe(true);
    expect(inRadical(x, [pmul(x, y)])).toBe(false);
    expect(inRadical(x, [pmul(x, y)], { prime: 3 })).toBe(false);
    expect(inRadical(psub(x, y), [psub(ppow(x, 3), ppow(y, 3)), psub(x, 1)], { prime: 3 })).toBe(true); // x^3 - y^3 = (x - y)^3 mod 3
    expect(inRadical(psub(x, y), [psub(ppow(x, 3), ppow(y, 3)), psub(x, 1)])).toBe(false); // y = 1 is not forced over Q
  });
});

describe('bad input and bounds', () => {
  it('rejects a composite or too large characteristic, variables outside the order, bad denominators', () => {
    const o = termOrder('grevlex', [ix, iy]);
    expect(() => groebnerBasis([x], o, { prime: 32004 })).toThrow(/prime below 2\^31/);
    expect(() => groebnerBasis([x], o, { prime: 2 ** 31 + 11 })).toThrow(EvalError);
    expect(() => groebnerBasis([z], o)).toThrow(/the variable z of z is not among/);
    expect(() => groebnerBasis([padd(x, makeRat(1n, 7n))], o, { prime: 7 })).toThrow(/denominator is divisible by 7/);
  });
  it('stops at the degree bound, the size bound and on request, naming the bound', () => {
    const { gens, ids } = cyclic(6, 'cb');
    const o = termOrder('grevlex', ids);
    expect(() => groebnerBasis(gens, o, { prime: 32003, maxDegree: 5 })).toThrow(/maxDegree = 5/);
    expect(() => groebnerBasis(gens, o, { prime: 32003, maxBasisSize: 10 })).toThrow(/maxBasisSize = 10/);
    expect(() => groebnerBasis(gens, o, { maxBasisSize: 10 })).toThrow(/maxBasisSize = 10/);
    let polls = 0;
    expect(() => groebnerBasis(gens, o, { prime: 32003, shouldStop: () => ++polls > 50 })).toThrow(/stopped/);
    expect(() => groebnerBasis(gens, o, { shouldStop: () => true })).toThrow(EvalError);
  });
});

describe('shapes the fast paths must handle', () => {
  it("univariate ideals are generated by the gcd (Cox, Little and O'Shea, Chapter 1, Section 5), also with large exponents", () => {
    const o = termOrder('grevlex', [ix]);
    expect(texts(groebnerBasis([psub(ppow(x, 6), 1), psub(ppow(x, 4), 1)], o))).toEqual(['x^2 - 1']);
    expect(texts(groebnerBasis([psub(ppow(x, 300), 1), psub(ppow(x, 200), 1)], o))).toEqual(['x^100 - 1']);
    expect(texts(groebnerBasis([psub(ppow(x, 300), 1), psub(ppow(x, 200), 1)], o, { prime: 32003 }))).toEqual(['x^100 + 32002']);
  });
  it('more than 32 variables (the divisibility masks fold): x[i] - x[i+1] and x[1]^2 in 40 variables', () => {
    const xs = Array.from({ length: 40 }, (_, i) => variable(`lv[${i + 1}]`));
    const ids = Array.from({ length: 40 }, (_, i) => varId(`lv[${i + 1}]`));
    const gens = [...xs.slice(0, 39).map((v, i) => psub(v, xs[i + 1])), ppow(xs[0], 2)];
    for (const prime of [undefined, 32003]) {
      const G = groebnerBasis(gens, termOrder('grevlex', ids), { prime });
      // ascending leading terms: lv[39] < lv[38] < ... < lv[1] < lv[40]^2
      const lin = ids
        .slice(0, 39)
        .map((_, i) => (prime ? `lv[${i + 1}] + 32002*lv[40]` : `lv[${i + 1}] - lv[40]`))
        .reverse();
      const want = [...lin, 'lv[40]^2'];
      expect(texts(G)).toEqual(want);
    }
  });
});
