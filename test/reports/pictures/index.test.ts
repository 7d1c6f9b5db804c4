import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { Distribution } from '../../../src/values/distribution.js';
import { Permutation } from '../../../src/families/permutations/permutation.js';
import { drawValue, MAX_SIDE } from '../../../src/reports/pictures/index.js';
import { EXAMPLES, matchingFromOrder, range } from './examples.js';

const MODES = [
  { name: 'unicode', opts: { unicode: true } },
  { name: 'ascii', opts: { unicode: false } },
] as const;

describe.each(MODES)('pictures in $name', ({ opts }) => {
  for (const [kind, values] of Object.entries(EXAMPLES)) {
    it(`draws every ${kind} example`, () => {
      for (const v of values) expect(drawValue(v, opts)).toMatchSnapshot();
    });
  }
});

const allExamples = Object.values(EXAMPLES).flat();

describe('every picture', () => {
  it('exists for every example, is deterministic and has no trailing spaces or newline', () => {
    for (const { opts } of MODES) {
      for (const v of allExamples) {
        const p = drawValue(v, opts);
        expect(p).not.toBeNull();
        expect(drawValue(v, opts)).toBe(p);
        for (const line of p!.split('\n')) expect(line).not.toMatch(/ $/);
        expect(p!.endsWith('\n')).toBe(false);
      }
    }
  });

  it('uses only printable ASCII in ASCII mode', () => {
    for (const v of allExamples) expect(drawValue(v, { unicode: false })).toMatch(/^[\x20-\x7e\n]*$/);
    // Random permutations and matchings too: every glyph of those pictures gets exercised.
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 14 }).chain((k) => fc.shuffledSubarray(range(k), { minLength: k, maxLength: k })),
        (order) => {
          const w = Permutation.from(order);
          expect(drawValue(w, { unicode: false })).toMatch(/^[\x20-\x7e\n]*$/);
          const m = matchingFromOrder(order);
          expect(drawValue(m, { unicode: false })).toMatch(/^[\x20-\x7e\n]*$/);
        },
      ),
    );
  });
});

describe('values without a picture', () => {
  it('gives null for numbers, booleans, strings, empty lists, distributions and mixed lists', () => {
    for (const v of [3, 5n, true, 'text', [], [1, 2], [Permutation.from([1]), 2], Distribution.of([1, 1, 2])]) {
      expect(drawValue(v, { unicode: true })).toBeNull();
    }
  });

  it('gives null for objects too large to draw', () => {
    const n = MAX_SIDE + 1;
    expect(drawValue(Permutation.identity(n), { unicode: true })).toBeNull();
    expect(drawValue(Permutation.identity(MAX_SIDE), { unicode: true })).not.toBeNull();
  });
});

describe('lists of objects', () => {
  it('puts the pictures side by side, tops aligned', () => {
    const [pq] = EXAMPLES.list;
    const [p, q] = (pq as readonly unknown[]).map((t) => drawValue(t as never, { unicode: true })!.split('\n'));
    const both = drawValue(pq, { unicode: true })!.split('\n');
    expect(both.length).toBe(Math.max(p.length, q.length));
    expect(both[0].startsWith(p[0])).toBe(true);
    expect(both[0].endsWith(q[0])).toBe(true);
  });

  it('stacks them when side by side would be too wide', () => {
    const w = Permutation.identity(30);
    const pic = drawValue([w, w], { unicode: true })!;
    const one = drawValue(w, { unicode: true })!;
    expect(pic).toBe(one + '\n\n' + one);
  });
});
