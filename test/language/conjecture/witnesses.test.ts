// Witnesses (CLI.md `witnesses`): for each failing all/any/min/max on the path to false, the
// simplest deciding element; for connectives and comparisons at the top, each side's value.

import { describe, expect, test } from 'vitest';
import { check, compileOne } from '../../runner/helpers.js';
import { traceWitnesses, witnessesOfBindings, type Witness } from '../../../src/language/conjecture/witnesses.js';
import { frameFor } from '../../../src/runner/case-report.js';

const witnesses = (yaml: string): Witness[] => {
  const r = check(yaml);
  expect(r.outcome).toBe('fails');
  return r.counterexample!.witnesses!;
};

describe('quantifiers', () => {
  test('a failing all: the simplest failing permutation by inversions (Fink–Mészáros–St. Dizier, Math. Z. 297 (2021))', () => {
    // The Schubert polynomials of S_5 with a coefficient above 1 are those of 12543, 13254,
    // 13524, 13542, 21543 (op. cit.); the simplest by inversions is 13254 (two inversions), where
    // S_w = (x1 + x2)(x1 + x2 + x3 + x4) has the coefficient 2 on x1*x2 (Monk's rule).
    const [w] = witnesses(`
conjecture: z
indeterminates: [x]
for:
  n: 1..6
claim: all(max(coefficients(schubert(w, x))) <= 1 for w in permutations(n))
`);
    expect(w).toMatchObject({ kind: 'element', reducer: 'all', line: 6, column: 8, value: false, sides: [2, 1] });
    expect(w.bindings).toEqual({ w: { permutation: [1, 3, 2, 5, 4] } });
    expect(w.at).toBe('all(max(coefficients(schubert(w, x))) <= 1 for w in permutations(n))');
  });

  test('the simplest, not the first met: family order (size, inversions, then lexicographic)', () => {
    // The permutations of S_3 with w(1) = 3 are 312 (2 inversions) and 321 (3 inversions).
    const [w] = witnesses('conjecture: s\nfor:\n  n: 3..3\nclaim: all(w[1] != 3 for w in permutations(n))\n');
    expect(w.bindings).toEqual({ w: { permutation: [3, 1, 2] } });
  });

  test('ranges and lists: the first failing element, by value or position', () => {
    expect(witnesses('conjecture: r\nfor:\n  n: 5..5\nclaim: all(i * i < 10 for i in 1..n)\n')[0]).toMatchObject({
      bindings: { i: 4 },
      sides: [16, 10],
    });
    expect(witnesses('conjecture: l\nfor:\n  n: 1..1\nclaim: "all(c < 5 for c in [1, 9, 7])"\n')[0].bindings).toEqual({ c: 9 });
  });

  test('several generators: the simplest pair, outer first', () => {
    const [w] = witnesses('conjecture: p\nfor:\n  n: 4..4\nclaim: all(i + j < 6 for i in 1..n, j in i..n)\n');
    expect(w.bindings).toEqual({ i: 2, j: 4 });
  });

  test('nested: the inner witness carries the outer one', () => {
    const ws = witnesses('conjecture: n\nfor:\n  n: 3..3\nclaim: all(all(w[i] <= i + 1 for i in 1..n) for w in permutations(n))\n');
    expect(ws.map((w) => w.bindings)).toEqual([{ w: { permutation: [3, 1, 2] } }, { w: { permutation: [3, 1, 2] }, i: 1 }]);
  });

  test('any is witnessed where it is true on the path: the left side of a false implies', () => {
    const ws = witnesses('conjecture: i\nfor:\n  n: 3..3\nclaim: any(des(w) == 2 for w in permutations(n)) implies n > 3\n');
    expect(ws.find((w) => w.kind === 'element')).toMatchObject({
      reducer: 'any',
      bindings: { w: { permutation: [3, 2, 1] } },
      value: true,
    });
  });

  test('a false any has no single deciding element', () => {
    expect(witnesses('conjecture: a\nfor:\n  n: 3..3\nclaim: any(des(w) == 3 for w in permutations(n))\n')).toEqual([]);
  });

  test('max in a comparison: the simplest element reaching it', () => {
    const ws = witnesses('conjecture: m\nfor:\n  n: 4..4\nclaim: max(des(w) for w in permutations(n)) <= 2\n');
    expect(ws).toEqual([
      expect.objectContaining({ kind: 'element', reducer: 'max', value: 3, bindings: { w: { permutation: [4, 3, 2, 1] } } }),
    ]);
    const mins = witnesses('conjecture: m\nfor:\n  n: 3..3\nclaim: min(inv(w) - des(w) for w in permutations(n) where des(w) == 1) >= 1\n');
    // des 1 in S_3: 132, 213 (inv 1), 231, 312 (inv 2); the minimum 0 is reached by 132 and 213, simplest 132
    expect(mins[0]).toMatchObject({ reducer: 'min', value: 0, bindings: { w: { permutation: [1, 3, 2] } } });
  });
});

describe('the top of the claim', () => {
  test('A == B and C: each side, comparisons with their own sides', () => {
    const ws = witnesses('conjecture: t\nfor:\n  n: 3..3\nlet:\n  a: count(w in permutations(n))\nclaim: a == 6 and a < 5\n');
    expect(ws).toEqual([
      expect.objectContaining({ kind: 'value', at: 'a == 6', value: true, sides: [6, 6] }),
      expect.objectContaining({ kind: 'value', at: 'a < 5', value: false, sides: [6, 5] }),
    ]);
  });

  test('iff and or: every side; a let is followed to its quantifier', () => {
    const ws = witnesses(`
conjecture: t
for:
  n: 3..3
let:
  ok: all(des(w) <= 1 for w in permutations(n))
claim: ok iff n == 3
`);
    expect(ws.map((w) => [w.kind, w.at, w.value])).toEqual([
      ['value', 'ok', false],
      ['value', 'n == 3', true],
      ['element', 'all(des(w) <= 1 for w in permutations(n))', false],
    ]);
    expect(ws[2].bindings).toEqual({ w: { permutation: [3, 2, 1] } });
  });

  test("a plain comparison claim has no extra witnesses (its sides are the counterexample's sides)", () => {
    expect(witnesses('conjecture: c\nfor:\n  n: 3..3\n  w: permutations(n)\nclaim: maj(w) <= inv(w)\n')).toEqual([]);
  });
});

describe('robustness', () => {
  test('a part that cannot be evaluated is left out, never an error', () => {
    const cc = compileOne('conjecture: e\nfor:\n  n: 0..0\nclaim: all(1 / i > 0 for i in n..1)\n');
    expect(traceWitnesses(cc, frameFor(cc, [0]))).toEqual([]);
    expect(witnessesOfBindings(cc, { n: 'not a value' })).toEqual([]);
  });

  test('witnesses from encoded bindings equal those of the run', () => {
    const yaml = 'conjecture: s\nfor:\n  n: 3..3\nclaim: all(w[1] != 3 for w in permutations(n))\n';
    const r = check(yaml);
    expect(witnessesOfBindings(compileOne(yaml), r.counterexample!.bindings)).toEqual(r.counterexample!.witnesses);
  });
});
