// hunch sample FAMILY(ARGS) [--count K] [--seed S] [--json]: random objects of a family, drawn by
// the family's exactly uniform sampler (the one the checks use), each with its text and picture.

import '../../families/index.js';
import '../../library/index.js';
import { InputError } from '../../base/errors.js';
import { nearest } from '../../base/suggest.js';
import { allFamilies, getFamily } from '../../families/registry.js';
import { evaluate, parseExpression, textOrigin } from '../../language/expr/index.js';
import { drawValue } from '../../reports/pictures/index.js';
import { DEFAULT_SEED, randomFor } from '../../runner/seeds.js';
import { encodeValue, valueToText } from '../../values/operations.js';
import type { Structured } from '../../values/structured.js';
import type { Value } from '../../values/value.js';
import { EXIT } from '../errors.js';
import type { AddCommand } from './index.js';

const MAX_COUNT = 10_000;

function countOption(text: string | undefined): number {
  if (text === undefined) return 1;
  const k = /^\d+$/.test(text) ? Number(text) : NaN;
  if (!Number.isSafeInteger(k) || k < 1 || k > MAX_COUNT)
    throw new InputError(`--count must be a whole number from 1 to ${MAX_COUNT}, got "${text}"`, undefined, text);
  return k;
}

export const addSampleCommand: AddCommand = (program, t, setExit) => {
  program
    .command('sample')
    .description("print random objects of a family, drawn by the family's exactly uniform sampler, with pictures")
    .argument('<family>', 'the family with its arguments, e.g. "permutations(30)" or "standardTableaux(partition([4, 2]))"')
    .option('--count <K>', 'how many objects (default 1)')
    .option('--seed <S>', `the seed (default ${DEFAULT_SEED}: the same objects every time)`)
    .option('--json', 'one line per object in the record encoding')
    .option('--ascii', 'plain ASCII pictures')
    .action((text: string, flags: { count?: string; seed?: string; json?: boolean }) => {
      const count = countOption(flags.count);
      const seed = flags.seed ?? DEFAULT_SEED;
      const e = parseExpression(text, textOrigin('<family>', text));
      if (e.type !== 'call')
        throw new InputError(`expected a family with its arguments, such as permutations(5), got "${text}"`, undefined, text);
      const family = getFamily(e.callee);
      if (!family) {
        const s = nearest(
          e.callee,
          allFamilies().map((f) => f.name),
        );
        throw new InputError(`there is no family "${e.callee}"${s ? `; did you mean ${s}?` : ''}`, undefined, text, s);
      }
      const args: Value[] = e.args.map((a) => evaluate(text.slice(a.start, a.end)));
      const p = family.prepare(args);
      if (!family.arbitrary) throw new InputError(`the family ${family.name} has no sampler`, undefined, text);
      const arb = family.arbitrary(p);
      const rng = randomFor(seed, 'sample', text.replace(/\s+/g, ''));
      const objects: Structured[] = [];
      for (let i = 0; i < count; i++) objects.push(arb.generate(rng, undefined).value as Structured);
      if (flags.json) {
        for (const o of objects) t.out(JSON.stringify(encodeValue(o)) + '\n');
      } else {
        t.out(
          t.color.dim(
            `${count} uniform random ${count === 1 ? 'object' : 'objects'} of ${text} (seed ${seed}; ${family.count(p)} in all)`,
          ) + '\n',
        );
        objects.forEach((o, i) => {
          t.out(`\n${count > 1 ? `${i + 1}. ` : ''}${valueToText(o)}\n`);
          const pic = drawValue(o, { unicode: t.unicode });
          t.out(pic ? pic + '\n' : t.color.dim('(too large for a picture)') + '\n');
        });
      }
      setExit(EXIT.ok);
    });
};
