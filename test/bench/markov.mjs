// Benchmark: the loop chain on perfect matchings of 2n points around a circle (uniform
// position i; joinAt(m, i) with weight 2, crossAt(m, i) with weight 1), built through the library
// (`chain` with the move functions), then its stationary measure
//   exact:  hunch's solver (closed classes, lumping by the equitable partition, one sparse
//           factorisation modulo a prime, p-adic lifting, rational reconstruction, exact
//           verification against the full chain);
//   exact without lumping: the same solver on the full system (n <= 5 only: the dense front of
//           the unlumped system grows with the state count);
//   float:  Gauss–Seidel sweeps in doubles on the same full system until the largest relative
//           change is below 1e-12 (floats are allowed here, in the benchmark only).
// All times in one run, first calls and then a second run of both; the ratio float / exact is
// what should be above 1. Run after
// `npm run build`:   node test/bench/markov.mjs [n ...]    (default: 5 6)

import '../../dist/library/markov.js';
import '../../dist/library/moves.js';
import { getFunction } from '../../dist/library/registry.js';
import { Matching } from '../../dist/families/matchings/matching.js';
import { Lambda } from '../../dist/values/lambda.js';
import { stationaryFraction, lastSolveStats } from '../../dist/algebra/linear/stationary.js';

const call = (name, ...args) => getFunction(name).impl(...args);
const sizes = process.argv.length > 2 ? process.argv.slice(2).map(Number) : [5, 6];
// A029729(n): the weight of the matching i <-> 2n+1-i over the smallest (OEIS A029729).
const A029729 = [1n, 3n, 31n, 1145n, 154881n, 77899563n, 147226330175n];

function allMatchings(n) {
  const out = [];
  const p = new Array(2 * n).fill(0);
  const rec = () => {
    const i = p.indexOf(0);
    if (i < 0) return void out.push(new Matching(p.slice()));
    for (let j = i + 1; j < 2 * n; j++) {
      if (p[j]) continue;
      p[i] = j + 1;
      p[j] = i + 1;
      rec();
      p[i] = p[j] = 0;
    }
  };
  rec();
  return out;
}

function gaussSeidel(c, tol) {
  const n = c.size;
  // Incoming transition probabilities, in doubles.
  const inStart = new Int32Array(n + 1);
  for (let k = 0; k < c.target.length; k++) inStart[c.target[k] + 1]++;
  for (let t = 0; t < n; t++) inStart[t + 1] += inStart[t];
  const src = new Int32Array(c.target.length),
    prob = new Float64Array(c.target.length);
  const fill = inStart.slice(0, n),
    self = new Float64Array(n);
  for (let s = 0; s < n; s++) {
    const total = Number(c.total[s].toString().split('/')[0]) / Number(c.total[s].toString().split('/')[1] ?? 1);
    for (let k = c.rowStart[s]; k < c.rowStart[s + 1]; k++) {
      const w = c.weight[k].toString().split('/');
      const pr = Number(w[0]) / Number(w[1] ?? 1) / total;
      const t = c.target[k];
      if (t === s) self[s] += pr;
      else {
        src[fill[t]] = s;
        prob[fill[t]++] = pr;
      }
    }
  }
  const x = new Float64Array(n).fill(1 / n);
  let sweeps = 0;
  for (;;) {
    sweeps++;
    let change = 0,
      sum = 0;
    for (let t = 0; t < n; t++) {
      let acc = 0;
      for (let e = inStart[t]; e < inStart[t + 1]; e++) acc += x[src[e]] * prob[e];
      const v = acc / (1 - self[t]);
      const d = Math.abs(v - x[t]) / v;
      if (d > change) change = d;
      x[t] = v;
      sum += v;
    }
    for (let t = 0; t < n; t++) x[t] /= sum;
    if (change < tol || sweeps > 100000) break;
  }
  return { x, sweeps };
}

const solvedBy = (st) => (st.method === 'lifting' ? `${st.primes} prime, ${st.digits} p-adic digits` : `${st.primes} primes`);
const ms = (t0) => (performance.now() - t0).toFixed(0);

for (const n of sizes) {
  const states = allMatchings(n);
  const moves = new Lambda(
    1,
    ([m]) => {
      const out = [];
      for (let i = 1; i <= 2 * n; i++) out.push([call('joinAt', m, i), 2], [call('crossAt', m, i), 1]);
      return out;
    },
    'm -> ...',
  );
  let t0 = performance.now();
  const ch = call('chain', states, moves);
  const build = ms(t0);
  const c = ch.sparse;
  const nested = ch.indexOf(Matching.fromArcs(Array.from({ length: n }, (_, i) => [i + 1, 2 * n - i])));

  t0 = performance.now();
  const exact = stationaryFraction(c);
  const tExact = performance.now() - t0;
  const stats = { ...lastSolveStats };
  const min = exact.nums.reduce((a, b) => (b < a ? b : a));
  const ok = exact.nums[nested] / min === A029729[n - 1] && exact.nums[nested] % min === 0n;

  let tPlain = null,
    plainStats = null;
  if (n <= 5) {
    t0 = performance.now();
    stationaryFraction(c, { lump: false });
    tPlain = performance.now() - t0;
    plainStats = { ...lastSolveStats };
  }

  t0 = performance.now();
  const gs = gaussSeidel(c, 1e-12);
  const tFloat = performance.now() - t0;
  // How close the float answer is to the exact one (relative, at the nested matching).
  const exactNested = Number(exact.nums[nested]) / Number(exact.den);
  const rel = Math.abs(gs.x[nested] - exactNested) / exactNested;

  console.log(`loop chain n = ${n}: ${c.size} states, built through chain(...) in ${build} ms`);
  console.log(
    `  exact (lumped to ${stats.systemSize} blocks, dense front ${stats.denseSize}, ${solvedBy(stats)}): ${tExact.toFixed(0)} ms; nested / smallest = ${exact.nums[nested] / min} (A029729(${n}) = ${A029729[n - 1]}: ${ok ? 'ok' : 'MISMATCH'})`,
  );
  if (tPlain !== null)
    console.log(`  exact without lumping (dense front ${plainStats.denseSize}, ${solvedBy(plainStats)}): ${tPlain.toFixed(0)} ms`);
  console.log(`  float Gauss–Seidel to 1e-12: ${tFloat.toFixed(0)} ms (${gs.sweeps} sweeps, relative error ${rel.toExponential(1)})`);
  console.log(`  ratio float / exact: ${(tFloat / tExact).toFixed(2)}`);
  // Both again, now that the code is compiled (the first calls above include the JIT's warm-up).
  t0 = performance.now();
  stationaryFraction(c);
  const tExact2 = performance.now() - t0;
  t0 = performance.now();
  gaussSeidel(c, 1e-12);
  const tFloat2 = performance.now() - t0;
  console.log(
    `  second run: exact ${tExact2.toFixed(0)} ms, float ${tFloat2.toFixed(0)} ms, ratio float / exact: ${(tFloat2 / tExact2).toFixed(2)}`,
  );
}
