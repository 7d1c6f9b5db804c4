// hunch guess EXPR --over NAME=A..B | --terms 1,2,7,...: guess a formula, recurrence or generating
// function for a column of numbers, show the evidence, and write chosen guesses as conjectures.

import { existsSync } from 'node:fs';
import { InputError } from '../../base/errors.js';
import '../../families/index.js';
import '../../library/index.js';
import { guessSequence, MAX_GUESS_TERMS, type GuessReport } from '../../algebra/guessing/index.js';
import { parseScalar, type Scalar } from '../../numbers/rational.js';
import { openProject } from '../../records/open-project.js';
import { writeFileAtomic } from '../../records/atomic-write.js';
import { guessConjectureFile, type GuessOrigin } from '../../reports/guess-conjecture.js';
import { formatGuesses, guessReportJson } from '../../reports/guesses.js';
import { scalarColumn, tabulate } from '../../reports/tabulate.js';
import { EXIT } from '../errors.js';
import { encodeValue } from '../../values/operations.js';
import { collect, parseLetOption, parseRangeOption } from '../options.js';
import type { AddCommand } from './index.js';

interface GuessFlags {
  over?: string;
  terms?: string;
  offset?: string;
  let?: string[];
  divideBy?: string;
  write?: string;
  pick?: string;
  to?: string;
  id?: string;
  force?: boolean;
  json?: boolean;
}

function parseTerms(text: string): Scalar[] {
  const parts = text
    .split(',')
    .map((s) => s.trim())
    .filter((s) => s !== '');
  if (parts.length === 0) throw new InputError('--terms takes a comma-separated list of numbers, e.g. --terms 1,2,7,42');
  return parts.map((p) => {
    try {
      return parseScalar(p);
    } catch {
      throw new InputError(`--terms: "${p}" is not an exact number (integers or fractions like 3/2)`);
    }
  });
}

function parseInteger(text: string, option: string): number {
  if (!/^\s*-?\d+\s*$/.test(text) || !Number.isSafeInteger(Number(text))) throw new InputError(`${option} takes an integer, not "${text}"`);
  return Number(text);
}

function parsePick(text: string, count: number): number[] {
  const out = text.split(',').map((s) => parseInteger(s, '--pick'));
  for (const k of out)
    if (k < 1 || k > count)
      throw new InputError(`--pick ${k}: there ${count === 1 ? 'is 1 guess' : `are ${count} guesses`}; pick among 1..${count}`);
  return [...new Set(out)];
}

export const addGuessCommand: AddCommand = (program, t, setExit) => {
  program
    .command('guess')
    .description('guess a formula, recurrence or generating function for a column of numbers, with its evidence')
    .argument('[expr]', 'the expression to tabulate, e.g. "count(w in avoiders(n, \\"2413\\", \\"3142\\"))"')
    .option('--over <NAME=A..B>', 'the range to tabulate EXPR over')
    .option('--terms <LIST>', 'the terms themselves instead of an expression, e.g. 1,2,7,42,429')
    .option('--offset <K>', 'the index of the first of --terms (default 0)')
    .option('--let <NAME=EXPR>', 'a named value the expression may use (repeatable)', collect)
    .option('--divide-by <EXPR>', 'also guess EXPR-divided columns: the sequence over this expression, in the same variable')
    .option('--write <FILE>', 'write the guesses as conjectures (expect: open) to FILE')
    .option('--pick <K,...>', 'with --write: only these guesses (by their rank)')
    .option('--to <B>', 'with --write: check the conjectures up to this index (default: one beyond --over)')
    .option('--id <PREFIX>', 'with --write: conjecture ids PREFIX-1, PREFIX-2, ... (default "guess")')
    .option('--force', 'with --write: replace FILE if it exists')
    .option('--json', 'as JSON')
    .action(async (expr: string | undefined, flags: GuessFlags) => {
      await openProject(); // the project's plugins are part of the language
      let origin: GuessOrigin;
      let terms: Scalar[];
      let divisorColumn: Scalar[] | undefined;
      if (flags.terms !== undefined) {
        if (expr !== undefined || flags.over !== undefined) throw new InputError('give either EXPR with --over, or --terms, not both');
        if (flags.divideBy !== undefined) throw new InputError('--divide-by needs EXPR with --over (it is evaluated over the same range)');
        terms = parseTerms(flags.terms);
        const offset = flags.offset === undefined ? 0 : parseInteger(flags.offset, '--offset');
        origin = { variable: 'n', lo: offset, hi: offset + terms.length - 1, terms };
      } else {
        if (expr === undefined) throw new InputError('give an expression with --over NAME=A..B, or the terms with --terms 1,2,7,...');
        if (flags.over === undefined) throw new InputError(`the expression needs a range: --over n=1..10`);
        if (flags.offset !== undefined)
          throw new InputError('--offset goes with --terms; with an expression the range of --over gives the indices');
        const [name, lo, hi] = parseRangeOption(flags.over, '--over');
        if (hi - lo + 1 > MAX_GUESS_TERMS)
          throw new InputError(
            `--over ${flags.over} has ${hi - lo + 1} terms; guessing takes at most ${MAX_GUESS_TERMS} (a guess needs far fewer)`,
          );
        const lets: Array<[string, string]> = (flags.let ?? []).map(parseLetOption);
        if (lets.some(([n]) => n === name))
          throw new InputError(`--let ${name}=... names the variable of --over ${flags.over}; give it another name`);
        if (lets.length && flags.write)
          throw new InputError('--write cannot carry --let values into the file: write them into the expression');
        terms = scalarColumn(tabulate(expr, name, lo, hi, lets), name, expr);
        if (flags.divideBy !== undefined) divisorColumn = scalarColumn(tabulate(flags.divideBy, name, lo, hi, lets), name, flags.divideBy);
        origin = { expr, variable: name, lo, hi, divisor: flags.divideBy };
      }
      if (terms.length > MAX_GUESS_TERMS)
        throw new InputError(
          `guessing takes at most ${MAX_GUESS_TERMS} terms; this is ${terms.length} (a guess needs far fewer: narrow --over)`,
        );
      const report: GuessReport = guessSequence(
        { offset: origin.lo, terms },
        divisorColumn ? { divisor: { name: 'c', column: { offset: origin.lo, terms: divisorColumn } } } : {},
      );
      let written: { file: string; ids: string[]; to: number } | null = null;
      if (flags.write !== undefined) {
        if (report.guesses.length === 0) throw new InputError('--write: there is no guess to write');
        const picks = flags.pick ? parsePick(flags.pick, report.guesses.length) : report.guesses.map((_, i) => i + 1);
        const to = flags.to === undefined ? origin.hi + 1 : parseInteger(flags.to, '--to');
        if (origin.expr !== undefined && to <= origin.hi)
          throw new InputError(`--to ${to} must lie beyond the terms guessed from (n = ${origin.lo}..${origin.hi})`);
        if (flags.to !== undefined && origin.expr === undefined)
          throw new InputError('--to needs an expression: a list of terms cannot be computed further');
        if (existsSync(flags.write) && !flags.force)
          throw new InputError(`${flags.write} exists; choose another file or add --force to replace it`);
        const prefix = flags.id ?? 'guess';
        if (!/^[a-z0-9][a-z0-9-]*$/.test(prefix)) throw new InputError(`--id ${prefix}: ids are lowercase letters, digits and '-'`);
        const text = guessConjectureFile(
          picks.map((k) => ({ rank: k, guess: report.guesses[k - 1] })),
          origin,
          { to, idPrefix: prefix },
        );
        writeFileAtomic(flags.write, text);
        written = { file: flags.write, ids: picks.map((k) => `${prefix}-${k}`), to: origin.expr !== undefined ? to : origin.hi };
      }
      if (flags.json) {
        const head =
          origin.expr !== undefined
            ? { expr: origin.expr, over: origin.variable, ...(origin.divisor !== undefined ? { divideBy: origin.divisor } : {}) }
            : {};
        t.out(
          JSON.stringify(
            { ...head, values: terms.map((x) => encodeValue(x)), ...guessReportJson(report), ...(written ? { written } : {}) },
            null,
            2,
          ) + '\n',
        );
      } else {
        const divisor = origin.divisor !== undefined ? `, c(${origin.variable}) = ${origin.divisor}` : '';
        const header =
          origin.expr !== undefined
            ? `a(${origin.variable}) = ${origin.expr}${divisor}, ${origin.variable} = ${origin.lo}..${origin.hi}`
            : 'the terms given';
        t.out(formatGuesses(report, header, t.color.dim));
        if (written)
          t.out(
            `\nWrote ${written.ids.length} conjecture${written.ids.length === 1 ? '' : 's'} (${written.ids.join(', ')}) to ${written.file}, to be checked up to n = ${written.to}: hunch check ${written.file}\n`,
          );
      }
      setExit(EXIT.ok);
    });
};
