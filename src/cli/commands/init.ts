// hunch init [DIR]: start a conjecture folder with a config, an example conjecture and the
// .gitattributes line that lets coauthors' ledgers merge in git. Never overwrites a file.

import { existsSync, mkdirSync, readFileSync, realpathSync, writeFileSync } from 'node:fs';
import { isAbsolute, join, relative, resolve, sep } from 'node:path';
import { InputError } from '../../base/errors.js';
import { CONFIG_FILE, DEFAULT_LEDGER } from '../../records/project-root.js';
import { EXIT } from '../errors.js';
import type { AddCommand } from './index.js';

export const CONFIG_TEMPLATE = `# hunch project settings. Paths are relative to this file.

# Folders or files of conjectures that \`hunch check\` and \`hunch status\` use by default.
conjectures: conjectures

# Where coverage is recorded: one line per finished piece of work (keep it under version control).
ledger: ${DEFAULT_LEDGER}

# JavaScript modules (.js, .mjs) that add functions to the language. They are code: they are loaded
# only when listed here. Each exports its functions, for example
#   export const functions = [{ name: 'peakCount', params: [{ name: 'w', type: 'permutation' }],
#     returns: 'integer', description: 'The number of peaks of w.', impl: (w) => ... }];
plugins: []
`;

export const EXAMPLE_CONJECTURE = `# An example to start from: run \`hunch check\`, then \`hunch status\`.

conjecture: inverse-keeps-inversions
statement: A permutation and its inverse have the same number of inversions.
expect: holds
for:
  n: 1..7
  w: permutations(n)
claim: inv(w) == inv(inverse(w))
sample:
  n: 8..30
  count: 200
references:
  - "R. P. Stanley, Enumerative Combinatorics, vol. 1, 2nd ed., Prop. 1.3.14 and its proof"
---
conjecture: maj-bounded-by-inv
statement: The major index never exceeds the number of inversions (a guess that is false).
expect: fails
for:
  n: 1..6
  w: permutations(n)
let:
  a: maj(w)
  b: inv(w)
claim: a <= b
---
conjecture: inv-maj-equidistributed
statement: Inversions and the major index have the same distribution on S_n.
expect: holds
for:
  n: 1..7
# A comprehension puts its body first: distribution(BODY for VARIABLE in SOURCE).
claim: distribution(inv(w) for w in permutations(n)) == distribution(maj(w) for w in permutations(n))
references:
  - "P. A. MacMahon, Combinatory Analysis (1915), vol. I; OEIS A008302"
`;

export const GITATTRIBUTES_LINE = `${DEFAULT_LEDGER} merge=union`;

export interface InitReport {
  created: string[];
  kept: string[];
}

/** Create the project files in `dir`; existing files are kept as they are. */
export function initProject(dir: string): InitReport {
  const report: InitReport = { created: [], kept: [] };
  try {
    mkdirSync(dir, { recursive: true });
  } catch (e) {
    throw new InputError(`cannot create the folder ${dir}: ${(e as Error).message}`);
  }
  const put = (rel: string, content: string) => {
    const p = join(dir, rel);
    if (existsSync(p)) return void report.kept.push(p);
    mkdirSync(join(p, '..'), { recursive: true });
    writeFileSync(p, content, { flag: 'wx' });
    report.created.push(p);
  };
  put(CONFIG_FILE, CONFIG_TEMPLATE);
  const conj = join(dir, 'conjectures');
  const hasConjectures = existsSync(conj);
  if (!hasConjectures) put(join('conjectures', 'example.yaml'), EXAMPLE_CONJECTURE);
  else report.kept.push(conj);
  const ga = join(dir, '.gitattributes');
  const line = GITATTRIBUTES_LINE;
  if (!existsSync(ga)) {
    writeFileSync(ga, line + '\n', { flag: 'wx' });
    report.created.push(ga);
  } else {
    const text = readFileSync(ga, 'utf8');
    if (text.split('\n').some((l) => l.trim().replace(/\s+/g, ' ') === line)) report.kept.push(ga);
    else {
      writeFileSync(ga, (text.length && !text.endsWith('\n') ? '\n' : '') + line + '\n', { flag: 'a' });
      report.created.push(`${ga} (added: ${line})`);
    }
  }
  return report;
}

/**
 * How to run this hunch from the new folder: `npx hunch` when it is installed as a dependency (it
 * runs from a node_modules folder), else the path of the bin/hunch that is running.
 */
export function hunchInvocation(dir: string): string {
  const bin = process.argv[1] ?? '';
  let real = bin;
  try {
    real = realpathSync(bin);
  } catch {
    real = bin;
  }
  if (real.split(sep).includes('node_modules')) return 'npx hunch';
  const rel = relative(resolve(dir), real);
  // A short relative path reads best; one that climbs far up is clearer absolute.
  const climbs = rel.split(sep).filter((p) => p === '..').length;
  return shellWord(isAbsolute(rel) || climbs > 2 ? real : rel.startsWith('.') ? rel : `./${rel}`);
}

function shellWord(s: string): string {
  return /^[A-Za-z0-9_@%+=:,./-]+$/.test(s) ? s : `'${s.replace(/'/g, `'\\''`)}'`;
}

export const addInitCommand: AddCommand = (program, t, setExit) => {
  program
    .command('init')
    .description('start a conjecture folder: hunch.yaml, an example conjecture, and a .gitattributes line for the ledger')
    .argument('[dir]', 'the folder (default: the current one)', '.')
    .action((dir: string) => {
      const r = initProject(dir);
      const show = (p: string) => relative(process.cwd(), p) || p;
      for (const p of r.created) t.out(`${t.color.green('created')} ${show(p)}\n`);
      for (const p of r.kept) t.out(`${t.color.dim('kept   ')} ${show(p)} (already there)\n`);
      const h = hunchInvocation(dir);
      t.out(`\nNext: ${dir === '.' ? '' : `cd ${shellWord(dir)} && `}${h} check   (then: ${h} status)\n`);
      setExit(EXIT.ok);
    });
};
