// A word: a finite sequence of letters, each a positive integer (words(n, k) uses 1..k).
// The alphabet size is not part of the value; the family words(n, k) decides membership.

import { fail } from '../../base/errors.js';
import { registerDecoder } from '../../values/decode.js';
import type { Structured } from '../../values/structured.js';

export class Word implements Structured {
  readonly kind = 'word';
  transient = false;

  /** Trusts that every letter is a positive integer; use Word.from for user data. */
  constructor(readonly letters: number[]) {}

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

  /** The letters in order: a word is a source after `in`. */
  elements(): readonly number[] {
    return this.letters;
  }

  equals(other: Structured): boolean {
    const b = (other as Word).letters, a = this.letters;
    if (a.length !== b.length) return false;
    for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
    return true;
  }

  key(): string {
    return this.letters.join(',');
  }

  toText(): string {
    return `word([${this.letters.join(', ')}])`;
  }

  encode(): unknown {
    return { word: this.letters.slice() };
  }

  copy(): Word {
    return new Word(this.letters.slice());
  }
}

registerDecoder('word', (x) => {
  if (!Array.isArray(x) || !x.every((v) => typeof v === 'number')) fail('a word is a list of positive integers');
  return Word.from(x as number[]);
});
