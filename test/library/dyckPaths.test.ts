// Dyck path statistics (src/library/dyckPaths.ts) against published tables, and the q,t-Catalan
// recursion against the sums over all paths.

import { describe, expect, it } from 'vitest';
import '../../src/library/dyckPaths.js';
import { dyckPaths } from '../../src/families/dyckPaths/dyckPaths.js';
import { DyckPath } from '../../src/families/dyckPaths/dyckPath.js';
import * as S from '../../src/library/dyckPaths/statistics.js';
import { qtCatalanTable } from '../../src/library/dyckPaths/qtCatalan.js';
import { qbinomialCoefficients } from '../../src/library/qanalogs.js';
import { getFunction } from '../../src/library/registry.js';
import { variable, polyText } from '../../src/algebra/polynomial.js';
import type { Value } from '../../src/values/value.js';

const call = (name: string, ...args: Value[]): Value => getFunction(name)!.impl(...args);

function allPaths(n: number): number[][] {
  const out: number[][] = [];
  dyckPaths.enumerate({ n }, (d) => void out.push(d.steps.slice()));
  return out;
}

/** The table of x^f y^g over the paths of semilength n. */
function jointTable(n: number, f: (s: number[]) => number, g: (s: number[]) => number): number[][] {
  const t: number[][] = [];
  for (const s of allPaths(n)) {
    const i = f(s),
      j = g(s);
    while (t.length <= i) t.push([]);
    while (t[i].length <= j) t[i].push(0);
    t[i][j]++;
  }
  return t;
}

/** The table as a map "i,j" -> coefficient without zeros, to compare tables of any padding. */
function entries(t: readonly (readonly (number | bigint)[])[]): Map<string, number> {
  const m = new Map<string, number>();
  t.forEach((row, i) =>
    row.forEach((c, j) => {
      if (Number(c) !== 0) m.set(`${i},${j}`, Number(c));
    }),
  );
  return m;
}

function distribution(n: number, f: (s: number[]) => number): number[] {
  const out: number[] = [];
  for (const s of allPaths(n)) {
    const k = f(s);
    while (out.length <= k) out.push(0);
    out[k]++;
  }
  return out;
}

const binom = (n: number, k: number): number => {
  if (k < 0 || k > n) return 0;
  let r = 1;
  for (let i = 1; i <= k; i++) r = (r * (n - k + i)) / i;
  return Math.round(r);
};

describe('q,t-Catalan numbers', () => {
  it('the Garsia–Haglund recursion equals the sum of q^area t^bounce over all paths, n <= 8', () => {
    for (let n = 0; n <= 8; n++) expect(entries(qtCatalanTable(n))).toEqual(entries(jointTable(n, S.area, S.bounce)));
  });

  it('are symmetric in q and t for n <= 8 (Garsia and Haglund, Discrete Math. 256 (2002))', () => {
    for (let n = 0; n <= 8; n++) {
      const t = entries(jointTable(n, S.area, S.bounce));
      for (const [k, c] of t) {
        const [i, j] = k.split(',');
        expect(t.get(`${j},${i}`), `n = ${n}, q^${i} t^${j}`).toBe(c);
      }
    }
  });

  it('(dinv, area) has the joint distribution of (area, bounce), n <= 8 (Haglund, The q,t-Catalan Numbers, ch. 3)', () => {
    for (let n = 0; n <= 8; n++) expect(entries(jointTable(n, S.dinv, S.area))).toEqual(entries(jointTable(n, S.area, S.bounce)));
  });

  it('q^C(n,2) C_n(q, 1/q) is the q-Catalan number [2n choose n]_q / [n+1]_q (MacMahon; Haglund, ch. 1), n <= 8', () => {
    for (let n = 0; n <= 8; n++) {
      const shift = (n * (n - 1)) / 2;
      const spec: number[] = [];
      qtCatalanTable(n).forEach((row, i) =>
        row.forEach((c, j) => {
          const d = i - j + shift;
          while (spec.length <= d) spec.push(0);
          spec[d] += Number(c);
        }),
      );
      // spec * [n+1]_q == [2n choose n]_q
      const prod = new Array(spec.length + n).fill(0);
      spec.forEach((c, d) => {
        for (let e = 0; e <= n; e++) prod[d + e] += c;
      });
      expect(prod).toEqual(qbinomialCoefficients(2 * n, n).map(Number));
    }
  });

  it('the library function evaluates the table at q and t, and at numbers', () => {
    const q = variable('q'),
      t = variable('t');
    expect(polyText(call('qtCatalan', 2, q, t) as never)).toBe('q + t');
    expect(call('qtCatalan', 6, 1, 1)).toBe(132); // OEIS A000108
    expect(call('qtCatalan', 0, q, t)).toBe(1);
  });
});

describe('Dyck path statistics', () => {
  it('area: OEIS A129182 (geometric area n + 2*area), rows n = 0..5', () => {
    // A129182 rows read at k = n, n+2, ..., n^2
    const rows = [[1], [1], [1, 1], [1, 2, 1, 1], [1, 3, 3, 3, 2, 1, 1], [1, 4, 6, 7, 7, 5, 5, 3, 2, 1, 1]];
    rows.forEach((row, n) => expect(distribution(n, S.area)).toEqual(row));
  });

  it('area sequence: the worked example and sum equal to area', () => {
    expect(S.areaSequence(DyckPath.from('UUDUDD').steps)).toEqual([0, 1, 1]);
    for (const s of allPaths(6)) expect(S.areaSequence(s).reduce((a, b) => a + b, 0)).toBe(S.area(s));
  });

  it('bounce: the worked values of Haglund (UDUD...UD has bounce C(n,2), U^n D^n has 0)', () => {
    for (let n = 1; n <= 6; n++) {
      expect(S.bounce(DyckPath.from('UD'.repeat(n)).steps)).toBe((n * (n - 1)) / 2);
      expect(S.bounce(DyckPath.from('U'.repeat(n) + 'D'.repeat(n)).steps)).toBe(0);
    }
    // bounce path of UDUUDD: (0,0) -> (0,1) -> (1,1) -> (1,3): touches j = 1, bounce = 3 - 1
    expect(S.bounce(DyckPath.from('UDUUDD').steps)).toBe(2);
  });

  it('returns: the ballot numbers k/(2n-k) C(2n-k, n), OEIS A033184, n <= 8', () => {
    for (let n = 1; n <= 8; n++) {
      const want = [0];
      for (let k = 1; k <= n; k++) want.push((k * binom(2 * n - k, n)) / (2 * n - k));
      expect(distribution(n, S.returns)).toEqual(want);
    }
  });

  it('peaks: the Narayana numbers C(n,k) C(n,k-1)/n, OEIS A001263; valleys = peaks - 1', () => {
    expect(distribution(5, S.peaks)).toEqual([0, 1, 10, 20, 10, 1]); // A001263 row 5
    for (let n = 1; n <= 8; n++) {
      const want = [0];
      for (let k = 1; k <= n; k++) want.push((binom(n, k) * binom(n, k - 1)) / n);
      expect(distribution(n, S.peaks)).toEqual(want);
      for (const s of allPaths(n)) expect(S.valleys(s)).toBe(S.peaks(s) - 1);
    }
  });

  it('height: 2^(n-1) paths of height <= 2 and F(2n-1) of height <= 3 (de Bruijn, Knuth and Rice 1972; OEIS A080936)', () => {
    const fib = [0, 1];
    for (let i = 2; i < 20; i++) fib.push(fib[i - 1] + fib[i - 2]);
    expect(distribution(5, S.height)).toEqual([0, 1, 15, 18, 7, 1]); // A080936 row 5
    for (let n = 1; n <= 9; n++) {
      const d = distribution(n, S.height);
      const upTo = (h: number) => d.slice(0, h + 1).reduce((a, b) => a + b, 0);
      expect(upTo(2)).toBe(2 ** (n - 1));
      expect(upTo(3)).toBe(fib[2 * n - 1]);
    }
  });

  it('dinv is equidistributed with bounce (Haglund, ch. 3), n <= 8', () => {
    for (let n = 0; n <= 8; n++) expect(distribution(n, S.dinv)).toEqual(distribution(n, S.bounce));
  });
});
