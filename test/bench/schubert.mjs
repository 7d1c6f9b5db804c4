// Benchmark: every Schubert polynomial of S_8, checking that all coefficients are
// nonnegative, computed by hunch's `schubert` (through the registry, cold memo) and by a plain
// hand-written divided-difference implementation on exponent maps (Map<string, bigint>), in the
// same run and by the same strategy (one divided difference per permutation, from w0 down).
// Prints the ratio baseline / hunch; the target is at least 2. Run after `npm run build`:
//   node test/bench/schubert.mjs [n]

import '../../dist/library/schubert.js';
import { getFunction } from '../../dist/library/registry.js';
import { Permutation } from '../../dist/families/permutations/permutation.js';
import { variable } from '../../dist/algebra/polynomial.js';
import { clearSchubertMemo } from '../../dist/algebra/schubertPolynomials.js';

const n = Number(process.argv[2] ?? 8);

function allPermutations(n) {
  const out = [];
  const a = Array.from({ length: n }, (_, i) => i + 1);
  const rec = (k) => {
    if (k === n) return void out.push(a.slice());
    for (let i = k; i < n; i++) {
      [a[k], a[i]] = [a[i], a[k]];
      rec(k + 1);
      [a[k], a[i]] = [a[i], a[k]];
    }
  };
  rec(0);
  return out;
}

// --- the plain implementation ---
function plainDividedDifference(p, i, nv) {
  const out = new Map();
  for (const [key, c] of p) {
    const e = key.split(',').map(Number);
    const a = e[i - 1],
      b = e[i];
    if (a === b) continue;
    const hi = Math.max(a, b),
      lo = Math.min(a, b),
      sign = a > b ? c : -c;
    for (let k = 0; k < hi - lo; k++) {
      e[i - 1] = hi - 1 - k;
      e[i] = lo + k;
      const k2 = e.join(',');
      const v = (out.get(k2) ?? 0n) + sign;
      if (v === 0n) out.delete(k2);
      else out.set(k2, v);
    }
  }
  return out;
}

function plainAll(n) {
  const nv = n; // x[1..n] (x[n] never occurs, kept for uniform keys)
  const w0 = Array.from({ length: n }, (_, i) => n - i);
  const top = new Map([[Array.from({ length: nv }, (_, i) => Math.max(0, n - 1 - i)).join(','), 1n]]);
  const memo = new Map([[w0.join(','), top]]);
  const byLength = [[w0]];
  let ok = true;
  for (let len = (n * (n - 1)) / 2; len > 0; len--) {
    const next = [];
    for (const w of byLength[byLength.length - 1]) {
      const p = memo.get(w.join(','));
      for (let i = 1; i < n; i++)
        if (w[i - 1] > w[i]) {
          const v = w.slice();
          [v[i - 1], v[i]] = [v[i], v[i - 1]];
          const k = v.join(',');
          if (memo.has(k)) continue;
          const d = plainDividedDifference(p, i, nv);
          memo.set(k, d);
          next.push(v);
        }
    }
    byLength.push(next);
  }
  for (const p of memo.values()) for (const c of p.values()) if (c < 0n) ok = false;
  return { count: memo.size, ok };
}

// --- hunch ---
function hunchAll(n) {
  const schubert = getFunction('schubert').impl;
  const x = variable('x');
  let ok = true,
    count = 0;
  for (const a of allPermutations(n)) {
    const p = schubert(new Permutation(a), x);
    count++;
    if (typeof p === 'object' && 'coefs' in p) {
      for (const c of p.coefs) if (c < 0) ok = false;
    } else if (p < 0) ok = false;
  }
  return { count, ok };
}

function time(f) {
  const t = performance.now();
  const r = f();
  return { ...r, ms: performance.now() - t };
}

// Warm up both on a smaller size, then measure.
plainAll(6);
hunchAll(6);
clearSchubertMemo();
const h = time(() => hunchAll(n));
const b = time(() => plainAll(n));
clearSchubertMemo();
console.log(
  `Schubert polynomials of S_${n}: hunch ${h.count} in ${h.ms.toFixed(0)} ms (claim ${h.ok ? 'holds' : 'FAILS'}); plain ${b.count} in ${b.ms.toFixed(0)} ms (claim ${b.ok ? 'holds' : 'FAILS'})`,
);
console.log(`ratio plain / hunch = ${(b.ms / h.ms).toFixed(2)} (target >= 2)`);
if (h.count !== b.count || h.ok !== b.ok) {
  console.error('the two computations disagree');
  process.exit(1);
}
