// Benchmark: subs(p, x[1], -x[1]) on the double Schubert polynomial of the longest permutation of
// S_6 (15,944 terms), through the registry as a conjecture would call it, against a plain
// hand-written loop over the same terms held in a Map (exponent string -> bigint coefficient) that
// flips the sign of the terms odd in x[1], in the same run. Optionally (--previous) also the method
// subs used before: every term's product of powers added to a running sum, which re-merges the
// whole sum for each term (quadratic). Prints medians of 5 runs and the ratio hunch / loop.
// Run after `npm run build`:  node test/bench/subs.mjs [--previous]

import '../../dist/library/index.js';
import { getFunction } from '../../dist/library/registry.js';
import { Permutation } from '../../dist/families/permutations/permutation.js';
import { padd, pequals, pmul, pneg, ppow, makePolynomial, variable } from '../../dist/algebra/polynomial.js';

const subs = getFunction('subs').impl;
const p = getFunction('doubleSchubert').impl(new Permutation([6, 5, 4, 3, 2, 1]), variable('x'), variable('y'));
const x1 = variable('x[1]');
const minusX1 = pneg(x1);

const median = (xs) => xs.slice().sort((a, b) => a - b)[Math.floor(xs.length / 2)];
function time(f, runs = 5) {
  const ts = [];
  let out;
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    out = f();
    ts.push(performance.now() - t0);
  }
  return { ms: median(ts), out };
}

// The plain loop: terms as a Map from exponent strings to bigints; x[1] is the first variable.
const k = p.vars.indexOf(x1.vars[0]);
const plain = new Map();
for (let t = 0; t < p.length; t++) plain.set(Array.from(p.exps.subarray(t * p.nv, (t + 1) * p.nv)).join(','), BigInt(p.coefs[t]));
function plainNegate() {
  const out = new Map();
  for (const [key, c] of plain) {
    const e = Number(key.split(',')[k]);
    out.set(key, e % 2 === 1 ? -c : c);
  }
  return out;
}

function previousMethod() {
  let sum = 0;
  for (let t = 0; t < p.length; t++) {
    let term = p.coefs[t];
    const keep = new Int32Array(p.nv);
    for (let v = 0; v < p.nv; v++) {
      const e = p.exps[t * p.nv + v];
      if (v === k) term = pmul(term, ppow(minusX1, e));
      else keep[v] = e;
    }
    sum = padd(sum, pmul(term, makePolynomial(p.vars, keep, [1])));
  }
  return sum;
}

const h = time(() => subs(p, x1, minusX1));
const l = time(plainNegate);
const twice = subs(h.out, x1, minusX1);
console.log(
  `subs(p, x[1], -x[1]) on ${p.length} terms: hunch ${h.ms.toFixed(1)} ms, plain loop ${l.ms.toFixed(1)} ms, ratio ${(h.ms / l.ms).toFixed(2)} (median of 5; a loaded machine gives other absolute times)`,
);
console.log(`check: applying it twice gives p back: ${pequals(twice, p)}`);
if (process.argv.includes('--previous')) {
  const o = time(previousMethod, 1);
  console.log(
    `previous method (running sum): ${(o.ms / 1000).toFixed(1)} s, ${(o.ms / h.ms).toFixed(0)} times slower; same result: ${pequals(o.out, h.out)}`,
  );
}
