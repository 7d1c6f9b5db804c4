// Guesses as conjecture files (`expect: open`) that `hunch check` can verify on more terms than the
// guess was made from: the sequence becomes a definition a(n) of the file, and each guess a claim
// about it over a range of n (a closed form, a recurrence relating a(n), a(n+1), ..., or the
// coefficients of an algebraic equation for the generating function).

import { stringify } from 'yaml';
import type { Guess } from '../algebra/guessing/index.js';
import type { Scalar } from '../numbers/rational.js';

export interface GuessOrigin {
  /** The expression the terms came from, in the variable `variable`; absent for a list of terms. */
  expr?: string;
  variable: string;
  /** Index of the first and the last term used for guessing. */
  lo: number;
  hi: number;
  /** The terms themselves, for a list (then the conjecture can only restate those terms). */
  terms?: readonly Scalar[];
  /** A column the sequence was divided by (another expression in the same variable). */
  divisor?: string;
}

export interface WriteOptions {
  /** The last index the conjecture checks (for an expression; at least hi + 1). */
  to: number;
  idPrefix: string;
}

/** The function name of the sequence in the file: `a`, unless the expression uses that name itself. */
export function sequenceName(origin: GuessOrigin): string {
  const uses = (s: string | undefined, n: string) => s !== undefined && new RegExp(`\\b${n}\\b`).test(s);
  for (const n of ['a', 'seqA', 'seqTerm']) if (!uses(origin.expr, n) && !uses(origin.divisor, n) && n !== origin.variable) return n;
  return 'seqTerm';
}

export function evidenceText(g: Guess): string {
  const e = g.evidence;
  const conf = e.confirmedTo - e.determinedTo;
  return `found from the terms n = ${e.from}..${e.determinedTo}, confirmed by n = ${e.determinedTo + 1}..${e.confirmedTo} (${conf} term${conf === 1 ? '' : 's'})`;
}

function sourceText(o: GuessOrigin): string {
  return o.expr !== undefined
    ? `a(${o.variable}) = ${o.expr} for ${o.variable} = ${o.lo}..${o.hi}`
    : `the terms given for n = ${o.lo}..${o.hi}`;
}

/** The YAML text of a file with one conjecture per picked guess (ranks are 1-based positions in the ranking). */
export function guessConjectureFile(picked: Array<{ rank: number; guess: Guess }>, origin: GuessOrigin, opts: WriteOptions): string {
  const f = sequenceName(origin);
  const top = origin.expr !== undefined ? opts.to : origin.hi;
  const defines: Record<string, string> = {};
  if (origin.expr !== undefined) defines[`${f}(${origin.variable})`] = origin.expr;
  else {
    const list = `[${(origin.terms ?? []).map(String).join(', ')}]`;
    defines[`${f}(n)`] = `${list}[n${origin.lo === 1 ? '' : origin.lo > 1 ? ` - ${origin.lo - 1}` : ` + ${1 - origin.lo}`}]`;
  }
  if (origin.divisor !== undefined) defines[`c(${origin.variable})`] = origin.divisor;
  const docs: string[] = [stringify({ define: defines }, { lineWidth: 0 })];
  for (const { rank, guess } of picked) {
    const plan = guess.plan(f);
    const last = plan.lastFor(top);
    if (last < plan.first) continue;
    const checked =
      origin.expr !== undefined
        ? `To be checked for n up to ${top}, beyond the ${origin.hi - origin.lo + 1} terms it was guessed from.`
        : 'The terms were given as a list, so checking this restates only those terms; state the sequence as an expression to check it further.';
    const doc: Record<string, unknown> = {
      conjecture: `${opts.idPrefix}-${rank}`,
      statement: `Guessed by hunch guess from ${sourceText(origin)}: ${guess.title}, ${guess.formula} (${evidenceText(guess)}). ${checked}`,
      expect: 'open',
    };
    if (plan.indeterminates.length) doc.indeterminates = plan.indeterminates;
    if (plan.defines.length) doc.define = Object.fromEntries(plan.defines);
    doc.for = { [plan.variable]: `${plan.first}..${last}` };
    if (plan.lets.length) doc.let = Object.fromEntries(plan.lets);
    doc.claim = plan.claim;
    doc.references = [
      `hunch guess, ${guess.title}: ${evidenceText(guess)}, of ${sourceText(origin)}`,
      ...guess.notes.map((n) => `with the guess: ${n}`),
    ];
    docs.push(stringify(doc, { lineWidth: 0 }));
  }
  return (
    `# Conjectures guessed by hunch guess from ${sourceText(origin)}.\n# They agree with every term they were guessed from; that proves nothing beyond those terms.\n` +
    docs.join('---\n')
  );
}
