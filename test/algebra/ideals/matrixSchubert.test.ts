// Matrix Schubert ideals against "Gröbner geometry of Schubert polynomials" (Ann. of Math. 161
// (2005)): for every w in S_4 and S_5,
//   Thm B: the essential minors are a Gröbner basis for an antidiagonal order, the initial ideal
//          is squarefree and its minimal primes are (z[i,j] : (i,j) a cross of P) for the reduced
//          pipe dreams P of w (so the facets of its complex are the complements of pipe dreams);
//   Thm A: codim = inv(w) (also Fulton, Duke Math. J. 65 (1992)), multidegree = S_w(x) for
//          deg z[i,j] = x[i], and the K-polynomial in 1 - x is the Grothendieck polynomial G_w(x)
//          of this code base (β = -1: G_{w0} = x[1]^(n-1)...x[n-1], π_i f = d_i((1 - x[i+1]) f)).
//          Exact identity: K(S/I_w; t) with t[i] = 1 - x[i] equals grothendieck(w, x).
// Pipe dreams come from test/algebra/pipeDreamExpansion.ts (an independent tracer).

import { describe, expect, it } from 'vitest';
import { termOrder } from '../../../src/algebra/groebner/index.js';
import { isGroebnerBasis } from '../../../src/algebra/groebner/ideals.js';
import { Ideal } from '../../../src/algebra/ideals/ideal.js';
import { idealDimensionData, idealKPolynomial, idealMultidegree, initialIdealOf } from '../../../src/algebra/ideals/invariants.js';
import { antidiagonalVariableOrder, essentialSet, matrixSchubertGenerators } from '../../../src/algebra/ideals/matrixSchubert.js';
import { facetsOf } from '../../../src/algebra/monomialIdeals/stanleyReisner.js';
import { pequals, polyText } from '../../../src/algebra/polynomial.js';
import { grothendieckPolynomial, schubertPolynomial } from '../../../src/algebra/schubertPolynomials.js';
import { varIndices } from '../../../src/algebra/variables.js';
import { inversions, pipeDreamsIn } from '../pipeDreamExpansion.js';

function permutationsOf(n: number): number[][] {
  if (n === 0) return [[]];
  const out: number[][] = [];
  for (const p of permutationsOf(n - 1)) for (let k = 0; k <= p.length; k++) out.push([...p.slice(0, k), n, ...p.slice(k)]);
  return out;
}

describe('essential set', () => {
  it("matches Fulton's examples", () => {
    // w = 1432: D(w) = {(2,2),(2,3),(3,2)}, Ess = {(2,3),(3,2)} (Fulton 1992, §3 by definition)
    expect(essentialSet([1, 4, 3, 2])).toEqual([
      [2, 3],
      [3, 2],
    ]);
    // w0 of S_3 = 321: D = {(1,1),(1,2),(2,1)}, Ess = {(1,2),(2,1)}
    expect(essentialSet([3, 2, 1])).toEqual([
      [1, 2],
      [2, 1],
    ]);
    expect(essentialSet([1, 2, 3])).toEqual([]);
  });
});

for (const n of [3, 4, 5]) {
  describe(`matrix Schubert ideals of S_${n}`, () => {
    const reduced = new Map<string, string[]>();
    for (const d of pipeDreamsIn(n)) {
      if (d.cells.length !== inversions(d.traced)) continue;
      const key = d.traced.join(',');
      if (!reduced.has(key)) reduced.set(key, []);
      reduced.get(key)!.push(
        d.cells
          .map(([i, j]) => `${i},${j}`)
          .sort()
          .join(' '),
      );
    }
    it('Gröbner basis, squarefree initial ideal, codim, multidegree, K-polynomial, facets', () => {
      for (const w of permutationsOf(n)) {
        const { gens, ring } = matrixSchubertGenerators(w, 'z');
        const I = Ideal.of(gens, ring);
        const order = termOrder('lex', antidiagonalVariableOrder(ring));
        expect(isGroebnerBasis(gens, order), `GB for ${w}`).toBe(true);
        const init = initialIdealOf(I, order);
        expect(init.isSquarefree()).toBe(true);
        expect(idealDimensionData(I).codim).toBe(inversions(w));
        const md = idealMultidegree(I, 'x');
        expect(pequals(md, schubertPolynomial(w, 'x')), `${w}: ${polyText(md)}`).toBe(true);
        const K = idealKPolynomial(I, 'x');
        expect(pequals(K, grothendieckPolynomial(w, 'x')), `${w}: ${polyText(K)}`).toBe(true);
        // Facets of the initial complex <-> complements of the reduced pipe dreams of w.
        const crosses = facetsOf(init).map((f) => {
          const inFacet = new Set(f);
          return ring
            .filter((_, v) => !inFacet.has(v))
            .map((id) => varIndices(id).join(','))
            .sort()
            .join(' ');
        });
        expect(crosses.sort()).toEqual((reduced.get(w.join(',')) ?? []).slice().sort());
      }
    }, 120_000);
  });
}
