// The hostile corpus: inputs a careless user or a hostile coauthor could give hunch, each with the
// exit code and the message it must produce. Every one must end without a stack trace or an
// internal error, and write nothing it should not.

import { forgedFile, TRUE_BOUND } from './forge.js';

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
];
