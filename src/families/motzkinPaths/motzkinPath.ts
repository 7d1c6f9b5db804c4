// A Motzkin path of length n: steps U = (1, 1), F = (1, 0), D = (1, -1) from height 0 to height 0,
// never below the axis. steps[i] is +1, 0 or -1. Text form motzkinPath("UFD").

import { fail } from '../../base/errors.js';
import { registerDecoder } from '../../values/decode.js';
import type { Structured } from '../../values/structured.js';

const LETTER = (s: number) => (s > 0 ? 'U' : s < 0 ? 'D' : 'F');

export class MotzkinPath implements Structured {
  readonly kind = 'motzkin';
  transient = false;

  /** Trusts that `steps` is a Motzkin path; use MotzkinPath.from for user data. */
  constructor(readonly steps: number[]) {}

  get n(): number {
    return this.steps.length;
  }

  get length(): number {
    return this.steps.length;
  }

  /** The i-th step (1-based) as a letter. */
  at(i: number): string {
    if (!(i >= 1 && i <= this.steps.length)) fail(`step ${i} of a Motzkin path with ${this.steps.length} steps does not exist`);
    return LETTER(this.steps[i - 1]);
  }

  word(): string {
    let s = '';
    for (const x of this.steps) s += LETTER(x);
    return s;
  }

  static from(word: string): MotzkinPath {
    const steps: number[] = [];
    let h = 0;
    for (const c of word) {
      if (c !== 'U' && c !== 'D' && c !== 'F') fail(`"${word}" is not a Motzkin path: use only the letters U, F and D`);
      const s = c === 'U' ? 1 : c === 'D' ? -1 : 0;
      h += s;
      if (h < 0) fail(`"${word}" is not a Motzkin path: it goes below the axis`);
      steps.push(s);
    }
    if (h !== 0) fail(`"${word}" is not a Motzkin path: it ends at height ${h}, not 0`);
    return new MotzkinPath(steps);
  }

  equals(other: Structured): boolean {
    const b = (other as MotzkinPath).steps,
      a = this.steps;
    if (a.length !== b.length) return false;
    for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
    return true;
  }

  key(): string {
    return this.word();
  }

  toText(): string {
    return `motzkinPath("${this.word()}")`;
  }

  encode(): unknown {
    return { motzkin: this.word() };
  }

  copy(): MotzkinPath {
    return new MotzkinPath(this.steps.slice());
  }
}

registerDecoder('motzkin', (x) => {
  if (typeof x !== 'string') fail('a Motzkin path is a string of U, F and D');
  return MotzkinPath.from(x);
});
