// Random conjecture documents for fuzzing the loader: a valid skeleton (FORMAT.md §1) whose keys
// and values are then mutated: wrong types for every key (lists where mappings belong, mappings
// where expressions belong, numbers, empty values), misspelt keys, broken indentation, huge and
// reversed ranges, odd sample counts, bad define headers, aliases, several documents per file.
// Sizes stay small so that what does load checks quickly.

import { gen } from './expression-texts.js';
import { chance, pick, type Rand } from './random-source.js';

/** Values of the wrong shape for any key: YAML flow collections, numbers, nothing at all. */
const WRONG = [
  '',
  '[]',
  '{}',
  '[1, 2]',
  '{a: 1}',
  '[n: 1..3]',
  '- 1\n  - 2',
  '3',
  '-1',
  '1.5',
  'null',
  '~',
  'true',
  '"quoted"',
  "'single'",
  '123456789012345678901234567890',
  '&a 1',
  '*a',
  '!!binary aGk=',
  '|\n    block text',
  '>-\n    folded\n    text',
  '[[[]]]',
  '"\\u0000"',
];

const FAMILIES = [
  'permutations(n)',
  'involutions(n)',
  'partitions(n)',
  'dyckPaths(n)',
  'matchings(n)',
  'subsets(n)',
  'compositions(n)',
  'setPartitions(n)',
  'standardTableaux(partition([2, 1]))',
  'avoiders(n, "132")',
  'words(n, 2)',
];
const RANGES = [
  '1..4',
  '0..3',
  '2..5',
  '1..n',
  '4..1',
  '-3..2',
  '1..10^9',
  '1..123456789012345678901234567890',
  '1..2^70',
  '"1..3"',
  '1..3/2',
  '1..',
  '..4',
  '3',
  'n..4',
  '1..q',
  '1..1000000',
];

type Entry = [key: string, value: string];

/** Quote a value so that YAML keeps it as one plain string (a comprehension's ": " otherwise opens a mapping). */
function scalar(r: Rand, text: string): string {
  switch (r.int(0, 4)) {
    case 0:
      return `'${text.replace(/'/g, "''")}'`;
    case 1:
      return JSON.stringify(text);
    case 2:
      return `>-\n    ${text}`;
    default:
      return /: |#|^[[{&*!|>'"%@`-]/.test(text) ? `'${text.replace(/'/g, "''")}'` : text;
  }
}

function mapping(entries: Entry[], indent = '  '): string {
  return entries.map(([k, v]) => `\n${indent}${k}: ${v.replace(/\n/g, `\n${indent}`)}`).join('');
}

/** One document: most keys valid, some of them mutated. */
export function conjectureDocument(r: Rand, index = 0): string {
  const env: Array<[string, string]> = [['n', 'integer']];
  const bindings: Entry[] = [['n', pick(r, RANGES.slice(0, 3))]];
  if (chance(r, 70)) {
    bindings.push(['w', pick(r, FAMILIES)]);
    env.push(['w', 'any']);
  }
  if (chance(r, 15)) bindings.push(['k', pick(r, ['1..n', '1..2', '[1, 2]', 'partitions(n)'])]);
  const lets: Entry[] = chance(r, 40) ? [['a', scalar(r, gen(r, 'integer', 2, env))]] : [];
  if (lets.length) env.push(['a', 'integer']);
  const claim = chance(r, 60)
    ? pick(r, ['inv(w) >= 0', 'n >= 1', 'len(w) == n', 'a == a', 'maj(w) <= inv(w)', 'true'])
    : gen(r, 'boolean', 3, env);
  const entries: Entry[] = [
    ['conjecture', `fuzz-${index}`],
    ['statement', 'A statement.'],
    ['expect', pick(r, ['holds', 'fails', 'open'])],
    ['for', mapping(bindings)],
    ['claim', scalar(r, claim)],
  ];
  if (chance(r, 30)) entries.push(['indeterminates', pick(r, ['[q, x]', 'q', '[q]'])]);
  if (chance(r, 30)) entries.push(['where', scalar(r, pick(r, ['n >= 2', 'n > 0', gen(r, 'boolean', 2, env)]))]);
  if (lets.length) entries.push(['let', mapping(lets)]);
  if (chance(r, 40))
    entries.push([
      'sample',
      mapping([
        ['n', pick(r, ['5..7', '5..6', '1..10^30'])],
        ['count', pick(r, ['3', '0', '5'])],
      ]),
    ]);
  if (chance(r, 20)) entries.push(['references', pick(r, ['["A000142"]', '\n  - folklore', '"one"'])]);
  if (chance(r, 20))
    entries.push([
      'define',
      mapping([
        [
          pick(r, ['peaks(w)', 'f(a, b)', 'c']),
          scalar(r, pick(r, ['count(i in 2..len(w)-1 where w[i-1] < w[i] and w[i] > w[i+1])', 'a + b', '3'])),
        ],
      ]),
    ]);

  // Mutations: each applied with some probability, several may combine.
  const set = (key: string, value: string, add = false) => {
    const e = entries.find(([k]) => k === key);
    if (e) e[1] = value;
    else if (add) entries.push([key, value]);
  };
  for (let m = chance(r, 50) ? 0 : r.int(1, 2); m > 0; m--) {
    const i = r.int(0, entries.length - 1);
    switch (r.int(0, 9)) {
      case 0: // a wrong value for a key
        entries[i][1] = pick(r, WRONG);
        break;
      case 1: // a misspelt or unknown key
        entries[i][0] = pick(r, [
          entries[i][0] + 's',
          entries[i][0].slice(1),
          entries[i][0].toUpperCase(),
          'lets',
          'four',
          'sampel',
          '? complex',
          '"quoted key"',
          '1',
        ]);
        break;
      case 2: // an odd range for a binding
        set('for', mapping([['n', pick(r, RANGES)], ...bindings.slice(1)]));
        break;
      case 3: // a binding with a bad name, no value, or given twice
        set(
          'for',
          mapping([
            ...bindings,
            pick(r, [
              ['1n', '1..3'],
              ['n', '1..2'],
              ['m', ''],
              ['w w', '1..2'],
              ['m', '[1, 2]'],
              ['m', '{a: 1}'],
            ] as Entry[]),
          ]),
        );
        break;
      case 4: // a sample with odd values
        set(
          'sample',
          mapping([
            [
              pick(r, ['n', 'w', 'm', 'count']),
              pick(r, ['5..4', '-1', '1.5', '10^30', '"x"', '[1, 2]', '', '2^70..2^71', '99999999999999999999']),
            ],
            ['count', pick(r, ['3', '-3', '1e3', '0x10', '', '[3]'])],
          ]),
          true,
        );
        break;
      case 5: // a damaged define
        set(
          'define',
          mapping([
            [
              pick(r, ['f(a', 'f(a, a)', '(a)', 'f()', 'g(x)', '"f(a)"', 'inv(w)', 'f(1)']),
              pick(r, ['a', '', 'g(x)', 'f(a)', '[1]', '{a: 1}']),
            ],
          ]),
          true,
        );
        break;
      case 6: // the claim replaced by a random (possibly ill-typed) expression
        set('claim', scalar(r, gen(r, pick(r, ['boolean', 'integer', 'any']), 3, env)));
        break;
      case 7: // indentation broken on one line
        entries[i][1] = entries[i][1].replace(/\n {2}/, pick(r, ['\n', '\n   ', '\n\t', '\n      ']));
        break;
      case 8: // a key dropped
        if (i > 0) entries.splice(i, 1);
        break;
      default: // a key given twice
        entries.push([entries[i][0], entries[i][1]]);
    }
  }
  return entries.map(([k, v]) => `${k}:${v.startsWith('\n') ? '' : ' '}${v}`).join('\n') + '\n';
}

/** A file: usually one document, sometimes a define document or several conjectures, sometimes not YAML at all. */
export function conjectureFile(r: Rand): string {
  const docs: string[] = [];
  if (chance(r, 15)) docs.push(`define:${mapping([[pick(r, ['twice(a)', 'one', 'h(a']), pick(r, ['2*a', '1', ''])]])}\n`);
  for (let d = chance(r, 20) ? 2 : 1; d > 0; d--) docs.push(conjectureDocument(r, d));
  let text = docs.join('---\n');
  if (chance(r, 8)) text = text.slice(0, r.int(0, text.length)); // cut off mid-file
  if (chance(r, 4))
    text = pick(r, [
      '',
      '---\n---\n',
      '- a\n- b\n',
      'just words',
      '{',
      'conjecture: [',
      '\t\tconjecture: x\n',
      '%YAML 9.9\n---\na: 1\n',
      'a: &x [1]\nb: *x\n',
    ]);
  return text;
}
