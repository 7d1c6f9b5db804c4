// Guessing on 60 terms (after `npm run build`): node test/bench/guess.mjs [repeats=3]
// 1. The whole search (every class, every transform) on 60 terms: the Apéry numbers (found at
//    order 2, degree 3) and 60 terms with no relation, where every (r, d) with up to 55 unknowns
//    (r·d up to 40 and beyond) is tried. Wall time, median of the repeats.
// 2. The recurrence search alone against a plain hand-written baseline: the same candidate systems
//    solved by fraction-free (Bareiss) elimination over the integers. The ratio baseline / ours is
//    what is meaningful; absolute times depend on the machine (and on its load).

import { fitRecurrence, guessSequence, recurrenceCandidates } from '../../dist/algebra/guessing/index.js';

const repeats = Number(process.argv[2] ?? 3);
const binom = (n, k) => {
  if (k < 0 || k > n) return 0n;
  let r = 1n;
  for (let i = 1; i <= k; i++) r = (r * BigInt(n - k + i)) / BigInt(i);
  return r;
};
const norm = (b) => (b <= BigInt(Number.MAX_SAFE_INTEGER) && b >= -BigInt(Number.MAX_SAFE_INTEGER) ? Number(b) : b);
const range = (n) => Array.from({ length: n }, (_, i) => i);
const apery = range(60).map((n) => {
  let s = 0n;
  for (let k = 0; k <= n; k++) s += (binom(n, k) * binom(n + k, k)) ** 2n;
  return norm(s);
});
let x = 12345n;
const noise = range(60).map(() => {
  x = (x * 6364136223846793005n + 1442695040888963407n) % (1n << 64n);
  return norm((x >> 20n) % 10n ** 12n);
});

const median = (xs) => [...xs].sort((a, b) => a - b)[xs.length >> 1];
function time(f) {
  const ts = [];
  let out;
  for (let i = 0; i < repeats; i++) {
    const t0 = performance.now();
    out = f();
    ts.push(performance.now() - t0);
  }
  return [median(ts), out];
}

// The plain baseline: the rank of the exact integer matrix of one (r, d), by Bareiss elimination.
function bareissRank(terms, r, d) {
  const cols = (r + 1) * (d + 1);
  const M = [];
  for (let k = 0; k + r < terms.length; k++) {
    const n = BigInt(k);
    const row = [];
    for (let i = 0; i <= r; i++) {
      let v = BigInt(terms[k + i]);
      for (let j = 0; j <= d; j++) {
        row.push(v);
        v *= n;
      }
    }
    M.push(row);
  }
  let rank = 0,
    prev = 1n;
  for (let c = 0; c < cols && rank < M.length; c++) {
    let p = rank;
    while (p < M.length && M[p][c] === 0n) p++;
    if (p === M.length) continue;
    [M[rank], M[p]] = [M[p], M[rank]];
    for (let i = rank + 1; i < M.length; i++) {
      for (let j = c + 1; j < cols; j++) M[i][j] = (M[i][j] * M[rank][c] - M[i][c] * M[rank][j]) / prev;
      M[i][c] = 0n;
    }
    prev = M[rank][c];
    rank++;
  }
  return rank;
}

for (const [name, terms] of [
  ['Apéry numbers (OEIS A005259)', apery],
  ['60 terms with no relation', noise],
]) {
  const [t, rep] = time(() => guessSequence({ offset: 0, terms }));
  console.log(`${name}: whole search ${t.toFixed(0)} ms (median of ${repeats}); ${rep.guesses.length ? rep.guesses[0].title : 'no guess'}`);
}

// Same candidate systems, both ways: the first 40 candidates in the search order on the no-relation terms.
const cands = recurrenceCandidates(60).slice(0, 40);
const [ours] = time(() => cands.map(([r, d]) => fitRecurrence({ offset: 0, terms: noise }, r, d)));
const [base] = time(() => cands.map(([r, d]) => bareissRank(noise, r, d)));
const maxU = Math.max(...cands.map(([r, d]) => (r + 1) * (d + 1)));
console.log(
  `recurrence search, ${cands.length} candidate (r, d) up to ${maxU} columns on 60 terms: ours ${ours.toFixed(0)} ms, plain Bareiss ${base.toFixed(0)} ms, ratio baseline/ours ${(base / ours).toFixed(1)} (median of ${repeats}; machine possibly loaded)`,
);
