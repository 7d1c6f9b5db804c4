// The hostile corpus: inputs a careless user or a hostile coauthor could give hunch, each with the
// exit code and the message it must produce. Every one must end without a stack trace or an
// internal error, and write nothing it should not.

import { chmodSync, mkdirSync, symlinkSync } from 'node:fs';
import { join } from 'node:path';
import { forgedFile, TRUE_BOUND } from './forge.js';

/** A conjecture that fails at n = 3 (the major index of 132 is 2, its inversions 1). */
const FAILS = 'conjecture: maj-bounded\nexpect: fails\nfor:\n  n: 1..4\n  w: permutations(n)\nclaim: maj(w) <= inv(w)\n';
const HOLDS = 'conjecture: trivial\nexpect: holds\nfor:\n  n: 1..3\nclaim: n == n\n';
/** A folder outside the test's folder, made fresh for one case (the test removes only its own folder). */
const outside = (dir: string) => `${dir}-outside`;

export interface HostileCase {
  name: string;
  /** Files to create in a fresh folder (relative paths). */
  files?: Record<string, string>;
  /** Further preparation in the folder (links, FIFOs, permissions). */
  setup?: (dir: string) => void;
  args: string[];
  code: number;
  /** Fragments standard error must contain. */
  stderr?: Array<string | RegExp>;
  stdout?: Array<string | RegExp>;
  /** Paths (relative to the folder, or absolute) that must not exist afterwards. */
  absent?: string[] | ((dir: string) => string[]);
  env?: Record<string, string>;
  /** Files (relative) that must exist afterwards and hold no raw control byte. */
  clean?: string[];
  /** Skip when the test runs as root (permissions do not bind it). */
  notAsRoot?: boolean;
}

export const corpus: HostileCase[] = [
  // --- replay proves the case is a case ---------------------------------------------------------
  {
    name: 'replay: a forged file with the genuine hash of a true statement and w = 321 at n = 2',
    files: { 'x.yaml': forgedFile(TRUE_BOUND, { n: 2, w: { permutation: [3, 2, 1] } }) },
    args: ['replay', 'x.yaml'],
    code: 2,
    stderr: ['not a case of this conjecture', 'w = perm([3, 2, 1]) is not in permutations(2)'],
  },
  {
    name: 'replay: the size below its range',
    files: { 'x.yaml': forgedFile(TRUE_BOUND, { n: 0, w: { permutation: [] } }) },
    args: ['replay', 'x.yaml'],
    code: 2,
    stderr: ['not a case of this conjecture', 'n = 0 is outside its range 1..6'],
  },
  {
    name: 'replay: a binding of the wrong kind (an integer for a permutation)',
    files: { 'x.yaml': forgedFile(TRUE_BOUND, { n: 2, w: 5 }) },
    args: ['replay', 'x.yaml'],
    code: 2,
    stderr: ['not a case of this conjecture', 'w = 5 is not a permutation'],
  },
  {
    name: 'replay: a binding of the wrong object kind (a partition for a permutation)',
    files: { 'x.yaml': forgedFile(TRUE_BOUND, { n: 2, w: { partition: [2] } }) },
    args: ['replay', 'x.yaml'],
    code: 2,
    stderr: ['not a case of this conjecture', 'is not a permutation'],
  },
  {
    name: 'replay: a size that is not an integer',
    files: { 'x.yaml': forgedFile(TRUE_BOUND, { n: '1/2', w: { permutation: [1] } }) },
    args: ['replay', 'x.yaml'],
    code: 2,
    stderr: ['not a case of this conjecture', 'n = 1/2 is not an integer'],
  },
  {
    name: 'replay: a case that "where" excludes',
    files: {
      'x.yaml': forgedFile(TRUE_BOUND.replace('claim:', 'where: n >= 3\nclaim:'), { n: 2, w: { permutation: [2, 1] } }),
    },
    args: ['replay', 'x.yaml'],
    code: 2,
    stderr: ['not a case of this conjecture', '"where" excludes it'],
  },
  {
    name: 'replay: a second range binding above its range',
    files: {
      'x.yaml': forgedFile('conjecture: pairs\nexpect: holds\nfor:\n  n: 1..4\n  k: 0..n\nclaim: k <= n\n', { n: 2, k: 7 }),
    },
    args: ['replay', 'x.yaml'],
    code: 2,
    stderr: ['not a case of this conjecture', 'k = 7 is outside its range 0..2'],
  },
  {
    name: 'replay: a value not in its list binding',
    files: {
      'x.yaml': forgedFile('conjecture: listed\nexpect: holds\nfor:\n  k: "[1, 2, 3]"\nclaim: k < 4\n', { k: 9 }),
    },
    args: ['replay', 'x.yaml'],
    code: 2,
    stderr: ['not a case of this conjecture', 'k = 9 is not in its list'],
  },

  // --- no writes outside the project --------------------------------------------------------------
  {
    name: 'hunch.yaml: a ledger path that leaves the project',
    files: { 'hunch.yaml': 'ledger: ../stolen.jsonl\n', 'a.yaml': HOLDS },
    args: ['check', 'a.yaml'],
    code: 2,
    stderr: ['hunch.yaml:1:9', 'lies outside the project', '--ledger PATH'],
    absent: ['../stolen.jsonl', 'hunch-ledger.jsonl'],
  },
  {
    name: 'hunch.yaml: an absolute ledger path elsewhere',
    files: { 'hunch.yaml': 'ledger: /tmp/hunch-stolen-ledger.jsonl\n', 'a.yaml': HOLDS },
    args: ['check', 'a.yaml'],
    code: 2,
    stderr: ['lies outside the project'],
    absent: ['/tmp/hunch-stolen-ledger.jsonl'],
  },
  {
    name: 'hunch.yaml: a ledger inside a linked folder that points out of the project',
    files: { 'hunch.yaml': 'ledger: records/ledger.jsonl\n', 'a.yaml': HOLDS },
    setup: (d) => {
      mkdirSync(outside(d));
      symlinkSync(outside(d), join(d, 'records'));
    },
    args: ['check', 'a.yaml'],
    code: 2,
    stderr: ['outside the project'],
    absent: (d) => [join(outside(d), 'ledger.jsonl')],
  },
  {
    name: 'a ledger that is a symbolic link',
    files: { 'a.yaml': HOLDS },
    setup: (d) => symlinkSync(join(d, 'target.jsonl'), join(d, 'hunch-ledger.jsonl')),
    args: ['check', 'a.yaml'],
    code: 2,
    stderr: ['symbolic link', 'never writes through a link'],
    absent: ['target.jsonl'],
  },
  {
    name: '--ledger naming a symbolic link',
    files: { 'a.yaml': HOLDS },
    setup: (d) => symlinkSync(join(d, 'target.jsonl'), join(d, 'mine.jsonl')),
    args: ['check', 'a.yaml', '--ledger', 'mine.jsonl'],
    code: 2,
    stderr: ['symbolic link'],
    absent: ['target.jsonl'],
  },
  {
    name: 'counterexamples/<id>.yaml is a symbolic link out of the project',
    files: { 'a.yaml': FAILS },
    setup: (d) => {
      mkdirSync(join(d, 'counterexamples'));
      mkdirSync(outside(d));
      symlinkSync(join(outside(d), 'planted.yaml'), join(d, 'counterexamples', 'maj-bounded.yaml'));
    },
    args: ['check', 'a.yaml'],
    code: 2,
    stderr: ['refusing to write the counterexample file', 'symbolic link'],
    absent: (d) => [join(outside(d), 'planted.yaml'), 'hunch-ledger.jsonl'],
  },
  {
    name: 'counterexamples/ is a link to a folder out of the project',
    files: { 'a.yaml': FAILS },
    setup: (d) => {
      mkdirSync(outside(d));
      symlinkSync(outside(d), join(d, 'counterexamples'));
    },
    args: ['check', 'a.yaml'],
    code: 2,
    stderr: ['would land outside the project'],
    absent: (d) => [join(outside(d), 'maj-bounded.yaml')],
  },
  // --- records that cannot be written ----------------------------------------------------------
  {
    name: 'the ledger is a folder',
    files: { 'a.yaml': HOLDS },
    setup: (d) => mkdirSync(join(d, 'hunch-ledger.jsonl')),
    args: ['check', 'a.yaml', '--workers', '1'],
    code: 2,
    stderr: ['the ledger', 'not a regular file'],
  },
  {
    name: '--ledger /dev/full',
    files: { 'a.yaml': HOLDS },
    args: ['check', 'a.yaml', '--ledger', '/dev/full', '--workers', '1'],
    code: 2,
    stderr: ['/dev/full', 'not a regular file'],
  },
  {
    name: 'a read-only project folder',
    files: { 'a.yaml': HOLDS },
    setup: (d) => chmodSync(d, 0o555),
    args: ['check', 'a.yaml', '--workers', '1'],
    code: 2,
    stderr: ['cannot open the ledger'],
    notAsRoot: true,
  },

  // --- no raw control bytes reach the terminal or a written file ------------------------------
  {
    name: 'a statement with terminal escape sequences and a carriage return',
    files: { 'a.yaml': FAILS.replace('expect: fails', 'statement: "clear \\e[2J\\rhidden \\e]0;title\\a and a\\nnew: line"\nexpect: fails') },
    args: ['check', 'a.yaml'],
    code: 0,
    clean: ['counterexamples/maj-bounded.yaml'],
  },
  {
    name: 'an escape sequence inside a claim',
    files: { 'a.yaml': 'conjecture: esc\nexpect: holds\nclaim: "1 == \\e[2J1"\n' },
    args: ['check', 'a.yaml'],
    code: 2,
    stderr: ['a.yaml:3:', '\\x1b'],
  },
  {
    name: 'a file name with control bytes',
    args: ['check', 'no\u001b[2Jsuch\r.yaml'],
    code: 2,
    stderr: ['no\\x1b[2Jsuch\\x0d.yaml'],
  },
  {
    name: 'replay: a conjecture id with control bytes',
    files: { 'x.yaml': forgedFile(TRUE_BOUND, { n: 2, w: { permutation: [2, 1] } }).replace(/inv-bounded/g, '"inv\\e[2Jbounded"') },
    args: ['replay', 'x.yaml'],
    code: 2,
    stderr: ['\\x1b[2J'],
  },
  {
    name: 'a --junit report of a statement and a message with control bytes',
    files: { 'a.yaml': FAILS.replace('expect: fails', 'statement: "bell \\a here"\nexpect: holds') },
    args: ['check', 'a.yaml', '--junit', 'report.xml'],
    code: 1,
    clean: ['report.xml', 'counterexamples/maj-bounded.yaml'],
  },
];
