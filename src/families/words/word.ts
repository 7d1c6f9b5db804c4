// A word: a finite sequence of letters, each a positive integer (words(n, k) uses 1..k).
// The alphabet size is not part of the value; the family words(n, k) decides membership.

import { fail } from '../../base/errors.js';
import { registerDecoder } from '../../values/decode.js';
import { IntegerSequence } from '../common/integer-sequence.js';

export class Word extends IntegerSequence {
  readonly kind = 'word';

  /** Trusts that every letter is a positive integer; use Word.from for user data. */
  constructor(readonly letters: number[]) {
    super();
  }

  protected sequence(): readonly number[] {
    return this.letters;
  }

  protected rebuild(values: number[]): Word {
    return new Word(values);
  }

  get length(): number {
    return this.letters.length;
  }

  /** The i-th letter, 1-based. */
  at(i: number): number {
    return this.letters[i - 1];
  }

  static from(letters: readonly number[]): Word {
    for (const x of letters) {
      if (!Number.isSafeInteger(x) || x < 1) fail(`[${letters.join(', ')}] is not a word: the letter ${x} is not a positive integer`);
    }
    return new Word(letters.slice());
  }
}

registerDecoder('word', (x) => {
  if (!Array.isArray(x) || !x.every((v) => typeof v === 'number')) fail('a word is a list of positive integers');
  return Word.from(x as number[]);
});
