// YAML hazards (FORMAT.md §3.1): every value YAML would misread is named at its line and column
// with its cause and fix, all of a file at once; values that use YAML on purpose are left alone.

import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { InputError, InputErrors } from '../../../src/base/errors.js';
import { loadConjectureFile } from '../../../src/language/conjecture/load-file.js';
import { yamlHazards } from '../../../src/language/conjecture/yaml-hazards.js';
import { errorOf } from '../expr/helpers.js';

const ROOT = join(import.meta.dirname, '..', '..', '..');
const at = (e: InputError) => `${e.pos!.line}:${e.pos!.column}`;

describe('hazards', () => {
  test('five hazards of one file are reported in one run, in line order', () => {
    const text = readFileSync(join(ROOT, 'test/cli/malformed/hazard-five.yaml'), 'utf8');
    const e = errorOf(() => loadConjectureFile('five.yaml', text));
    expect(e).toBeInstanceOf(InputErrors);
    const all = (e as InputErrors).errors;
    expect(all.map(at)).toEqual(['3:16', '6:6', '7:19', '10:6', '11:32']);
    expect(all[0].message).toMatch(/^the statement is prose/);
    expect(all[1].suggestion).toBe("put the expression in quotes: k: '[1, 2]'");
    expect(all[2].message).toMatch(/stops here: n >= 1 and$/);
    expect(all[3].message).toMatch(/backquote/);
    expect(all[4].suggestion).toBe(
      'write the comprehension body first, which needs no quotes: claim: all(inv(w) <= a for w in permutations(n))',
    );
    // every message is in the combined message, each after the first with its position
    expect(e.message.split('\n')).toHaveLength(5);
    expect(e.message).toContain('five.yaml:11:32: claim is an expression');
  });

  test('the body-first fix keeps the rest of the expression as written', () => {
    const [h] = yamlHazards('f.yaml', 'claim: sum(w in permutations(n) where des(w)==1: q^maj(w))   ==  1 # note\n');
    expect(h.suggestion).toBe(
      'write the comprehension body first, which needs no quotes: claim: sum(q^maj(w) for w in permutations(n) where des(w)==1)   ==  1',
    );
  });

  test('a quoted fix doubles single quotes', () => {
    const [h] = yamlHazards('f.yaml', "statement: Wilf's question: is it true?\n");
    expect(h.suggestion).toBe("put the text in quotes: statement: 'Wilf''s question: is it true?'");
  });

  test('references are prose too', () => {
    const [h] = yamlHazards('f.yaml', 'conjecture: a\nreferences:\n  - Enumerative Combinatorics 1: Prop. 1.3.14\n');
    expect(h.message).toMatch(/^a reference is prose/);
    expect(at(h)).toBe('3:32');
  });
});

describe('no hazard where YAML is used on purpose or the value is safe', () => {
  test.each([
    ['an anchor and its alias', 'let:\n  a: &stat inv(w)\n  b: *stat\nclaim: a == b\n'],
    ['a tag', 'claim: !!str a <= b\n'],
    ['block scalars', 'claim: >-\n  sum(i in 1..n: i)\n  >= 0\nwhere: |\n  n: 2 # not special here\n'],
    ['a trailing comment', 'claim: a <= b   # fails first at n = 3: 2 against 1\n'],
    ['quoted values', "claim: 'sum(i in 1..n: i) >= 0'   # ok\nwhere: \"n: 2\"\nlet:\n  a: 'it''s: fine'\n"],
    ['a multi-line quoted value', "claim: 'sum(i in 1..n:\n  i) >= 0'\n"],
    ['flow mappings and lists', 'for: { n: 1..3, w: permutations(n) }\nindeterminates: [q, x]\nreferences: [folklore]\n'],
    ['negative and other safe starts', 'claim: -inv(w) <= 0\nwhere: (n > 1)\nlet:\n  s: "1342"\n'],
    ['prose with a URL and a trailing #', 'statement: See https://oeis.org/A000108 #1\n'],
    ['an unclosed list, left to YAML', 'for:\n  n: [1, 2\n'],
    ['sample count', 'sample:\n  count: 500\n  n: 9..40\n'],
  ])('%s', (_what, text) => {
    expect(yamlHazards('f.yaml', text)).toEqual([]);
  });

  test('the bundled notebook, the example conjecture files and every valid test file have none', () => {
    const files = readdirSync(join(ROOT, 'conjectures'))
      .filter((f) => f.endsWith('.yaml'))
      .map((f) => join(ROOT, 'conjectures', f));
    for (const f of files) expect(yamlHazards(f, readFileSync(f, 'utf8')), f).toEqual([]);
    const readme = readFileSync(join(ROOT, 'README.md'), 'utf8');
    for (const m of readme.matchAll(/```yaml\n([\s\S]*?)```/g)) expect(yamlHazards('README.md', m[1])).toEqual([]);
  });
});
