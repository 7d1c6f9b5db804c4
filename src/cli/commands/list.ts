// hunch list [families|functions|TOPIC]: the registry, with signatures, descriptions, examples and sources.

import { InputError } from '../../base/errors.js';
import { nearest } from '../../base/suggest.js';
import '../../families/index.js';
import { allFamilies } from '../../families/registry.js';
import '../../library/index.js';
import { allFunctions, signatureOf } from '../../library/registry.js';
import { EXIT } from '../errors.js';
import type { AddCommand } from './index.js';
import { REDUCERS } from '../../language/expr/index.js';
import { ALLOW_PLUGINS_HELP, openCommandProject } from '../project.js';

export const addListCommand: AddCommand = (program, t, setExit) => {
  program
    .command('list')
    .description('list the built-in families and functions with their signatures and sources')
    .argument('[what]', 'families, functions, a topic (permutations, polynomials, ...) or a name')
    .option('--json', 'as JSON')
    .option('--allow-plugins', ALLOW_PLUGINS_HELP)
    .action(async (what: string | undefined, flags: { json?: boolean; allowPlugins?: boolean }) => {
      await openCommandProject(t, undefined, { allowPlugins: flags.allowPlugins }); // the project's plugins are listed too
      const fams = allFamilies();
      const fns = allFunctions();
      const topics = [...new Set(fns.map((f) => f.topic))].sort();
      let showF = true,
        showFn = true;
      let fnFilter = (_: (typeof fns)[number]) => true;
      let famFilter = (_: (typeof fams)[number]) => true;
      const showForms = what === undefined || what === 'forms';
      if (what === 'forms') {
        showF = false;
        showFn = false;
      } else if (what === 'families') showFn = false;
      else if (what === 'functions') showF = false;
      else if (what) {
        if (topics.includes(what)) {
          showF = false;
          fnFilter = (f) => f.topic === what;
        } else if (mentions(what, fns, fams)) {
          // A word of the descriptions (and names): hunch list blocks, hunch list Catalan.
          const hit = wordMatcher(what);
          fnFilter = (f) => hit(`${f.name} ${f.topic} ${f.description}`);
          famFilter = (f) => hit(`${f.name} ${f.description}`);
        } else {
          const s = nearest(what, ['families', 'functions', 'forms', ...topics, ...fns.map((f) => f.name), ...fams.map((f) => f.name)]);
          throw new InputError(
            `nothing is listed under "${what}"${s ? `; did you mean ${s}?` : ''} (topics: ${topics.join(', ')})`,
            undefined,
            what,
            s,
          );
        }
      }
      const selF = showF ? fams.filter(famFilter) : [];
      const selFn = showFn ? fns.filter(fnFilter) : [];
      if (flags.json) {
        t.out(
          JSON.stringify(
            {
              families: selF.map((f) => ({
                name: f.name,
                signature: f.signature,
                description: f.description,
                example: f.example,
                source: f.source,
                sampler: Boolean(f.arbitrary),
              })),
              functions: selFn.map((f) => ({
                name: f.name,
                topic: f.topic,
                signature: signatureOf(f),
                description: f.description,
                example: f.example,
                value: f.exampleValue,
                source: f.source,
              })),
            },
            null,
            2,
          ) + '\n',
        );
        setExit(EXIT.ok);
        return;
      }
      const c = t.color;
      if (showForms) {
        t.out(c.bold('Language forms') + ' (comprehensions; each also reduces a plain list: sum([1,2,3]))\n');
        t.out(`  ${REDUCERS.join(', ')}\n`);
        t.out('    e.g. sum(i^2 for i in 1..n), count(w in permutations(n) where des(w) == 1), all(x > 0 for x in L)\n\n');
      }
      if (selF.length) {
        t.out(c.bold('Families') + '\n');
        for (const f of selF) {
          t.out(`  ${c.cyan(f.signature)}\n    ${f.description}\n    example: ${f.example}\n    source: ${c.dim(f.source)}\n`);
        }
      }
      if (selFn.length) {
        let topic = '';
        for (const f of [...selFn].sort((a, b) => a.topic.localeCompare(b.topic) || a.name.localeCompare(b.name))) {
          if (f.topic !== topic) {
            topic = f.topic;
            t.out(`\n${c.bold(`Functions: ${topic}`)}\n`);
          }
          const example = f.example ? `    example: ${f.example}${f.exampleValue ? `  ${c.dim('=')} ${f.exampleValue}` : ''}\n` : '';
          t.out(`  ${c.cyan(signatureOf(f))}\n    ${f.description}\n${example}    source: ${c.dim(f.source)}\n`);
        }
      }
      setExit(EXIT.ok);
    });
};

/** Whether `text` holds a word starting with `word` (case-insensitive): "block" finds "blocks". */
function wordMatcher(word: string): (text: string) => boolean {
  const re = new RegExp(`(^|[^\\p{L}\\p{N}])${word.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}`, 'iu');
  return (text) => re.test(text);
}

function mentions(word: string, fns: ReturnType<typeof allFunctions>, fams: ReturnType<typeof allFamilies>): boolean {
  if (word.trim().length < 3) return false;
  const hit = wordMatcher(word);
  return fns.some((f) => hit(`${f.name} ${f.topic} ${f.description}`)) || fams.some((f) => hit(`${f.name} ${f.description}`));
}
