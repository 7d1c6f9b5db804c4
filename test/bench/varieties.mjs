// Ideals and varieties (after `npm run build`):  node test/bench/varieties.mjs
// 1. `hunch check` (one thread, in-process) of multidegree(matrixSchubertIdeal(w, z), x) ==
//    schubert(w, x) for all 120 w in S_5 (the bar: at most 30 s), against a plain loop that only
//    computes the right-hand sides (the Schubert polynomials by divided differences, memo cleared).
//    The ratio says what the Gröbner basis, the initial ideal and the multigraded Hilbert series
//    cost on top of the polynomial the claim compares with.
// 2. The commuting variety n = 3: degree 31, exact over Q (the bar: at most 10 s), against the same
//    computation over F_32003 (one prime, no reconstruction or verification).
// Absolute times vary with the machine (and a shared machine is loaded); ratios are in one run.

import '../../dist/families/index.js';
import '../../dist/library/index.js';
import { loadConjectureFile } from '../../dist/language/conjecture/load-file.js';
import { compileConjecture } from '../../dist/language/conjecture/compile-conjecture.js';
import { checkConjecture } from '../../dist/runner/in-process-executor.js';
import { clearSchubertMemo, schubertPolynomial } from '../../dist/algebra/schubertPolynomials.js';
import { evaluate } from '../../dist/language/expr/index.js';

const yaml = `conjecture: matrix-schubert-multidegree
indeterminates: [x, z]
for:
  n: 5..5
  w: permutations(n)
claim: multidegree(matrixSchubertIdeal(w, z), x) == schubert(w, x)
`;
const cc = compileConjecture(loadConjectureFile('bench.yaml', yaml).conjectures[0]);

function permutationsOf(n) {
  if (n === 0) return [[]];
  const out = [];
  for (const p of permutationsOf(n - 1)) for (let k = 0; k <= p.length; k++) out.push([...p.slice(0, k), n, ...p.slice(k)]);
  return out;
}
const S5 = permutationsOf(5);

function time(f) {
  const t = performance.now();
  const v = f();
  return [performance.now() - t, v];
}
const median = (xs) => xs.slice().sort((a, b) => a - b)[Math.floor(xs.length / 2)];

const hunchTimes = [],
  ratios = [];
for (let round = 0; round < 3; round++) {
  const [tl] = time(() => {
    clearSchubertMemo();
    for (const w of S5) schubertPolynomial(w, 'x');
  });
  clearSchubertMemo();
  const [th, r] = time(() => checkConjecture(cc, {}, {}));
  if (r.outcome !== 'holds') throw new Error(`unexpected outcome ${r.outcome}`);
  hunchTimes.push(th);
  ratios.push(th / tl);
  console.log(
    `round ${round + 1}: Schubert polynomials alone ${tl.toFixed(0)} ms, hunch check ${th.toFixed(0)} ms, ratio ${(th / tl).toFixed(1)}`,
  );
}
console.log(
  `multidegree == Schubert for all 120 w in S_5: median ${(median(hunchTimes) / 1000).toFixed(2)} s (bar <= 30 s), median ratio to the Schubert polynomials alone ${median(ratios).toFixed(1)}`,
);

const expr = (p) =>
  `degree(ideal(entries(genericMatrix(a, 3, 3)*genericMatrix(b, 3, 3) - genericMatrix(b, 3, 3)*genericMatrix(a, 3, 3))${p}))`;
const q = [],
  fp = [];
for (let round = 0; round < 3; round++) {
  const [tq, dq] = time(() => evaluate(expr(''), [], ['a', 'b']));
  const [tp, dp] = time(() => evaluate(expr(', 32003'), [], ['a', 'b']));
  if (dq !== 31 || dp !== 31) throw new Error(`commuting variety degree ${dq}, ${dp}`);
  q.push(tq);
  fp.push(tp);
  console.log(`round ${round + 1}: commuting variety n = 3 over Q ${tq.toFixed(0)} ms, over F_32003 ${tp.toFixed(0)} ms`);
}
console.log(
  `commuting variety n = 3, degree 31: over Q median ${(median(q) / 1000).toFixed(2)} s (bar <= 10 s), ratio Q / F_32003 ${(median(q) / median(fp)).toFixed(1)}`,
);
