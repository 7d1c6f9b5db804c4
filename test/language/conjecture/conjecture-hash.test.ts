import { describe, expect, test } from 'vitest';
import { loadConjectureFile } from '../../../src/language/conjecture/load-file.js';
import { canonicalForm, conjectureHash, namesUsed } from '../../../src/language/conjecture/conjecture-hash.js';

const BASE = `
conjecture: maj-vs-inv
statement: The major index never exceeds the number of inversions.
expect: fails
for:
  n: 1..6
  w: permutations(n)
let:
  a: maj(w)
  b: inv(w)
claim: a <= b
sample:
  n: 7..12
  count: 50
references: [folklore]
`;

const one = (text: string, file = 'c.yaml') => loadConjectureFile(file, text).conjectures[0];
const hashOf = (text: string, extra = {}) => conjectureHash(one(text), extra);

describe('conjectureHash', () => {
  test('is sha256 hex and stable', () => {
    const h = hashOf(BASE);
    expect(h).toMatch(/^[0-9a-f]{64}$/);
    expect(hashOf(BASE)).toBe(h);
  });

  test('key order, whitespace, comments and the file name do not change it', () => {
    const reordered = `
# a comment
claim: "a<=b"        # same claim, other spelling
let: { a: "maj( w )", b: inv(w) }
for: { n: "1 .. 6", w: permutations(n) }
conjecture: maj-vs-inv
sample: { count: 50, n: 7..12 }
`;
    expect(conjectureHash(one(reordered, 'other.yaml'))).toBe(hashOf(BASE));
  });

  test('statement, references, expect, id and sample count do not enter it', () => {
    const changed = BASE.replace('never exceeds', 'is at most')
      .replace('[folklore]', '[A000001]')
      .replace('expect: fails', 'expect: open')
      .replace('maj-vs-inv', 'renamed')
      .replace('count: 50', 'count: 5000');
    expect(hashOf(changed)).toBe(hashOf(BASE));
  });

  test.each([
    ['a range', BASE.replace('1..6', '1..7')],
    ['a family', BASE.replace('permutations(n)', 'involutions(n)')],
    ['a let', BASE.replace('maj(w)', 'maj(w) + 0')],
    ['the claim', BASE.replace('a <= b', 'a < b')],
    ['the sample range', BASE.replace('7..12', '7..13')],
    ['a where', BASE.replace('claim:', 'where: n >= 2\nclaim:')],
    ['the indeterminates', BASE.replace('for:', 'indeterminates: [q]\nfor:')],
    ['the let names', BASE.replace(/\ba\b/g, 'c')],
  ])('changing %s changes it', (_what, text) => {
    expect(hashOf(text)).not.toBe(hashOf(BASE));
  });

  test('only the definitions it uses enter it, transitively', () => {
    const withDefs = (peaks: string, unused: string) => `
define:
  peaks(w): ${peaks}
  twice(x): 2 * helper(x)
  helper(x): x + 0
  unused(x): ${unused}
---
conjecture: uses-peaks
for:
  n: 1..5
  w: permutations(n)
claim: peaks(w) <= twice(n)
`;
    const h = conjectureHash(one(withDefs('count(i in 2..len(w)-1 where w[i-1] < w[i] and w[i] > w[i+1])', 'x')));
    expect(conjectureHash(one(withDefs('count(i in 2..len(w)-1 where w[i-1] < w[i] and w[i] > w[i+1])', 'x * 7')))).toBe(h);
    expect(conjectureHash(one(withDefs('count(i in 2..len(w) where w[i-1] < w[i])', 'x')))).not.toBe(h);
    const spec = one(withDefs('0', 'x'));
    expect([...namesUsed(spec)]).toEqual(expect.arrayContaining(['peaks', 'twice', 'helper']));
    expect(namesUsed(spec).has('unused')).toBe(false);
    // the transitive definition `helper` is in the canonical form
    expect(JSON.stringify(canonicalForm(spec).define)).toContain('helper(x)');
  });

  test('a used plugin file enters it; an unused one does not', () => {
    const text = BASE.replace('maj(w)', 'myStat(w)');
    const h0 = hashOf(text);
    expect(hashOf(text, { pluginHashes: { myStat: 'a'.repeat(64) } })).not.toBe(h0);
    expect(hashOf(text, { pluginHashes: { myStat: 'a'.repeat(64) } })).not.toBe(hashOf(text, { pluginHashes: { myStat: 'b'.repeat(64) } }));
    expect(hashOf(text, { pluginHashes: { otherStat: 'a'.repeat(64) } })).toBe(h0);
  });

  test('the two comprehension spellings give one hash, the hash recorded before body-first existed', () => {
    // The pinned value was computed with the binder-first printer, before the body-first form was
    // added: records in users' ledgers must stay valid.
    const head = 'conjecture: q-factorial\nindeterminates: [q]\ndefine:\n  peaks(w): PEAKS\nfor:\n  n: 1..5\nclaim: CLAIM\n';
    const make = (peaks: string, claim: string) => head.replace('PEAKS', peaks).replace('CLAIM', claim);
    const binderFirst = make(
      '"count(i in 2..len(w)-1 where w[i-1] < w[i] and w[i] > w[i+1])"',
      "'sum(w in permutations(n): q^inv(w)) == product(i in 1..n: sum(j in 0..i-1: q^j)) and " +
        "sum(i in 1..n, j in i..n where gcd(i, j) == 1: i*j) >= 0 and all(w in permutations(n): peaks(w) >= 0)'",
    );
    const bodyFirst = make(
      'count(i in 2..len(w)-1 where w[i-1] < w[i] and w[i] > w[i+1])',
      'sum(q^inv(w) for w in permutations(n)) == product(sum(q^j for j in 0..i-1) for i in 1..n) and ' +
        'sum(i*j for i in 1..n, j in i..n where gcd(i, j) == 1) >= 0 and all(peaks(w) >= 0 for w in permutations(n))',
    );
    const pinned = '637ee180d6949e6853f6801a5c27109ea857c129a6b6cb3ee17991b70f31e19a';
    expect(hashOf(binderFirst)).toBe(pinned);
    expect(hashOf(bodyFirst)).toBe(pinned);
  });
});
