// hunch eval EXPR [--let NAME=EXPR ...]: evaluate one expression, print its value and a picture.

import '../../families/index.js';
import '../../library/index.js';
import { evaluate } from '../../language/expr/index.js';
import { drawValue } from '../../reports/pictures/index.js';
import { encodeValue, valueToText } from '../../values/operations.js';
import { EXIT } from '../errors.js';
import { ALLOW_PLUGINS_HELP, openCommandProject } from '../project.js';
import { explainSkippedPlugins } from '../../records/open-project.js';
import { collect, parseLetOption } from '../options.js';
import type { AddCommand } from './index.js';

export const addEvalCommand: AddCommand = (program, t, setExit) => {
  program
    .command('eval')
    .description('evaluate one expression and print its value (with a picture for objects)')
    .argument('<expr>', 'the expression, e.g. "inv(perm([3,1,2]))"')
    .option('--let <NAME=EXPR>', 'a named value the expression may use (repeatable, in order)', collect)
    .option('--indeterminates <NAMES>', 'polynomial variables, comma-separated (e.g. q,x)')
    .option('--json', 'print the value in the record encoding')
    .option('--ascii', 'plain ASCII pictures')
    .option('--allow-plugins', ALLOW_PLUGINS_HELP)
    .action(async (expr: string, flags: { let?: string[]; indeterminates?: string; json?: boolean; allowPlugins?: boolean }) => {
      const project = await openCommandProject(t, undefined, { allowPlugins: flags.allowPlugins }); // plugins are part of the language
      const lets: Array<[string, string]> = (flags.let ?? []).map(parseLetOption);
      const vars = flags.indeterminates
        ? flags.indeterminates
            .split(',')
            .map((s) => s.trim())
            .filter(Boolean)
        : [];
      let v;
      try {
        v = evaluate(expr, lets, vars);
      } catch (e) {
        throw explainSkippedPlugins(e, project);
      }
      if (flags.json) t.out(JSON.stringify(encodeValue(v)) + '\n');
      else {
        t.out(valueToText(v) + '\n');
        const pic = drawValue(v, { unicode: t.unicode });
        if (pic) t.out(pic + '\n');
      }
      setExit(EXIT.ok);
    });
};
