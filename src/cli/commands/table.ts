// hunch table EXPR --over NAME=A..B: tabulate an expression and say what it notices.

import { formatCount } from '../../base/format-count.js';
import { InputError } from '../../base/errors.js';
import '../../families/index.js';
import '../../library/index.js';
import { evaluate } from '../../language/expr/index.js';
import { detectProperties } from '../../reports/sequence-properties.js';
import { guessSequence, MAX_GUESS_TERMS } from '../../algebra/guessing/index.js';
import { bestGuessLine, guessJson } from '../../reports/guesses.js';
import { isScalar, type Scalar } from '../../numbers/rational.js';
import { encodeValue, valueToText } from '../../values/operations.js';
import type { Value } from '../../values/value.js';
import { EXIT } from '../errors.js';
import { ALLOW_PLUGINS_HELP, openCommandProject } from '../project.js';
import { explainSkippedPlugins } from '../../records/open-project.js';
import { collect, parseLetOption, parseRangeOption } from '../options.js';
import type { AddCommand } from './index.js';

/** More rows than this is a slip in --over (a table of millions of lines helps nobody, and would fill memory). */
export const MAX_TABLE_ROWS = 10_000;

export const addTableCommand: AddCommand = (program, t, setExit) => {
  program
    .command('table')
    .description('tabulate an expression over a range and list the properties every value shares')
    .argument('<expr>', 'the expression, e.g. "count(w in involutions(n))"')
    .requiredOption('--over <NAME=A..B>', 'the range to tabulate over')
    .option('--let <NAME=EXPR>', 'a named value the expression may use (repeatable; may use NAME)', collect)
    .option('--indeterminates <NAMES>', 'polynomial variables, comma-separated (e.g. q,x)')
    .option('--json', 'as JSON')
    .option('--allow-plugins', ALLOW_PLUGINS_HELP)
    .action(
      async (expr: string, flags: { over: string; let?: string[]; indeterminates?: string; json?: boolean; allowPlugins?: boolean }) => {
        const project = await openCommandProject(t, undefined, { allowPlugins: flags.allowPlugins }); // plugins are part of the language
        const [name, lo, hi] = parseRangeOption(flags.over, '--over');
        const vars = flags.indeterminates
          ? flags.indeterminates
              .split(',')
              .map((s) => s.trim())
              .filter(Boolean)
          : [];
        const extra: Array<[string, string]> = (flags.let ?? []).map(parseLetOption);
        if (hi - lo + 1 > MAX_TABLE_ROWS)
          throw new InputError(
            `--over ${flags.over} has ${formatCount(hi - lo + 1)} rows; a table may have at most ${formatCount(MAX_TABLE_ROWS)}`,
          );
        const clash = extra.find(([n]) => n === name);
        if (clash) throw new InputError(`--let ${name}=... names the variable of --over ${flags.over}; give it another name`);
        const rows: Array<[number, Value]> = [];
        try {
          for (let v = lo; v <= hi; v++) rows.push([v, evaluate(expr, [[name, String(v)], ...extra], vars)]);
        } catch (e) {
          throw explainSkippedPlugins(e, project);
        }
        const props = detectProperties(rows.map((r) => r[1]));
        // The simplest guess for a column of numbers (hunch guess shows them all, with --write).
        const best =
          rows.length <= MAX_GUESS_TERMS && rows.every((r) => isScalar(r[1]))
            ? guessSequence({ offset: lo, terms: rows.map((r) => r[1] as Scalar) }).guesses[0]
            : undefined;
        if (flags.json) {
          t.out(
            JSON.stringify(
              {
                over: name,
                rows: rows.map(([v, x]) => ({ [name]: v, value: encodeValue(x) })),
                properties: props,
                ...(best ? { bestGuess: guessJson(best, 1) } : {}),
              },
              null,
              2,
            ) + '\n',
          );
        } else {
          const w = Math.max(name.length, String(hi).length, String(lo).length);
          t.out(`${t.color.bold(name.padStart(w))}  ${t.color.bold(expr)}\n`);
          for (const [v, x] of rows) t.out(`${String(v).padStart(w)}  ${valueToText(x)}\n`);
          if (props.length) {
            t.out(`\nAt every ${name} in ${lo}..${hi}: ${props.join(', ')}.\n`);
            t.out(t.color.dim('(Observed on these values only: a hint for a conjecture, not a theorem.)\n'));
          }
          if (best) {
            t.out(`\n${bestGuessLine(best, name)}\n`);
            t.out(
              t.color.dim(
                `(A guess from these values only; hunch guess '${expr}' --over ${flags.over} lists every guess and --write makes them conjectures.)\n`,
              ),
            );
          }
        }
        setExit(EXIT.ok);
      },
    );
};
