import { describe, expect, it } from 'vitest';
import { words, compareWords } from '../../../src/families/words/words.js';
import { Word } from '../../../src/families/words/word.js';
import { decodeValue } from '../../../src/values/decode.js';
import { checkEarlyStop, checkEnumeration } from '../familyChecks.js';

describe('words', () => {
  it('the class prints and decodes', () => {
    const w = Word.from([1, 1, 2]);
    expect(w.toText()).toBe('word([1, 1, 2])');
    expect(w.encode()).toEqual({ word: [1, 1, 2] });
    expect((decodeValue({ word: [1, 1, 2] }) as Word).equals(w)).toBe(true);
    expect(() => Word.from([0])).toThrow(/positive/);
  });
  it('counts k^n (OEIS A000244 for k = 3: 1, 3, 9, 27, 81, 243)', () => {
    [1, 3, 9, 27, 81, 243].forEach((v, n) => expect(words.count(words.prepare([n, 3]))).toBe(BigInt(v)));
    expect(words.count(words.prepare([0, 0]))).toBe(1n);
    expect(words.count(words.prepare([2, 0]))).toBe(0n);
  });
  it('enumerates lexicographically, each word once', () => {
    for (let n = 0; n <= 5; n++) for (let k = 0; k <= 3; k++) checkEnumeration(words, [n, k], compareWords);
    checkEarlyStop(words, [3, 3], 11);
  });
});
