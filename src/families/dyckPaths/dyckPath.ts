// A Dyck path of semilength n: 2n steps U = (1, 1) and D = (1, -1) from height 0 to height 0, never
// below the axis. steps[i] is +1 for U and -1 for D. Text form dyck("UUDD").

import { fail } from '../../base/errors.js';
import { registerDecoder } from '../../values/decode.js';
import type { Structured } from '../../values/structured.js';

export class DyckPath implements Structured {
  readonly kind = 'dyck';
  transient = false;

  /** Trusts that `steps` is a Dyck path; use DyckPath.from for user data. */
  constructor(readonly steps: number[]) {}

  /** The semilength. */
  get n(): number {
    return this.steps.length >> 1;
  }

  /** The i-th step (1-based) as a letter. */
  at(i: number): string {
    if (!(i >= 1 && i <= this.steps.length)) fail(`step ${i} of a Dyck path with ${this.steps.length} steps does not exist`);
    return this.steps[i - 1] > 0 ? 'U' : 'D';
  }

  word(): string {
    let s = '';
    for (const x of this.steps) s += x > 0 ? 'U' : 'D';
    return s;
  }

  /** Sum over up steps of the height they start at: the unit squares above the path UDUD...UD. */
  area(): number {
    let h = 0,
      a = 0;
    for (const x of this.steps) {
      if (x > 0) a += h;
      h += x;
    }
    return a;
  }

  static from(word: string): DyckPath {
    const steps: number[] = [];
    let h = 0;
    for (const c of word) {
      if (c !== 'U' && c !== 'D') fail(`"${word}" is not a Dyck path: use only the letters U and D`);
      h += c === 'U' ? 1 : -1;
      if (h < 0) fail(`"${word}" is not a Dyck path: it goes below the axis`);
      steps.push(c === 'U' ? 1 : -1);
    }
    if (h !== 0) fail(`"${word}" is not a Dyck path: it ends at height ${h}, not 0`);
    return new DyckPath(steps);
  }

  equals(other: Structured): boolean {
    const b = (other as DyckPath).steps,
      a = this.steps;
    if (a.length !== b.length) return false;
    for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
    return true;
  }

  key(): string {
    return this.word();
  }

  toText(): string {
    return `dyck("${this.word()}")`;
  }

  encode(): unknown {
    return { dyck: this.word() };
  }

  copy(): DyckPath {
    return new DyckPath(this.steps.slice());
  }
}

registerDecoder('dyck', (x) => {
  if (typeof x !== 'string') fail('a Dyck path is a string of U and D');
  return DyckPath.from(x);
});
