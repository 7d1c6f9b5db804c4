// The hostile corpus: inputs a careless user or a hostile coauthor could give hunch, each with the
// exit code and the message it must produce. Every one must end without a stack trace or an
// internal error, and write nothing it should not.

import { execFileSync } from 'node:child_process';
import { chmodSync, mkdirSync, symlinkSync, writeFileSync } from 'node:fs';
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
    files: {
      'a.yaml': FAILS.replace('expect: fails', 'statement: "clear \\e[2J\\rhidden \\e]0;title\\a and a\\nnew: line"\nexpect: fails'),
    },
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

  // --- no stack trace, no internal error --------------------------------------------------------
  {
    name: 'an id of more than 200 characters is refused at load',
    files: { 'a.yaml': `conjecture: ${'a'.repeat(250)}\nexpect: holds\nclaim: true\n` },
    args: ['check', 'a.yaml'],
    code: 2,
    stderr: ['a.yaml:1:13', 'an id may have at most 200'],
    absent: ['hunch-ledger.jsonl', 'counterexamples'],
  },
  {
    name: 'eval 2^(2^40)',
    args: ['eval', '2^(2^40)'],
    code: 2,
    stderr: ['<expression>:1:', 'would have about', 'digits'],
  },
  {
    name: 'a claim computing 2^(2^40) is a located error of the case',
    files: { 'a.yaml': 'conjecture: big\nexpect: holds\nfor:\n  n: 1..3\nclaim: 2^(2^40) > n\n' },
    args: ['check', 'a.yaml'],
    code: 1,
    stdout: ['a.yaml:5:8', 'would have about'],
  },
  {
    name: 'a range bound of 10^(10^10)',
    files: { 'a.yaml': 'conjecture: big-range\nexpect: holds\nfor:\n  n: 1..10^(10^10)\nclaim: n > 0\n' },
    args: ['check', 'a.yaml'],
    code: 2,
    stderr: ['a.yaml:4:'],
  },
  {
    name: 'replay: a file whose bindings are of an unknown object kind',
    files: { 'x.yaml': forgedFile(TRUE_BOUND, { n: 2, w: { gadget: [1, 2] } }) },
    args: ['replay', 'x.yaml'],
    code: 2,
    stderr: ['x.yaml'],
  },
  {
    name: 'replay: a file that is a YAML list, not a counterexample',
    files: { 'x.yaml': '- 1\n- 2\n' },
    args: ['replay', 'x.yaml'],
    code: 2,
    stderr: ['not a readable counterexample file'],
  },
  {
    name: 'replay: a folder instead of a file',
    setup: (d) => mkdirSync(join(d, 'x.yaml')),
    args: ['replay', 'x.yaml'],
    code: 2,
    stderr: ['x.yaml'],
  },
  // --- no silent pass -------------------------------------------------------------------------------
  {
    name: 'an empty size range n: 5..1',
    files: { 'a.yaml': 'conjecture: empty-range\nexpect: holds\nfor:\n  n: 5..1\n  w: permutations(n)\nclaim: inv(w) >= 0\n' },
    args: ['check', 'a.yaml'],
    code: 2,
    stderr: ['a.yaml:4:3', 'the range of n is empty'],
    absent: ['hunch-ledger.jsonl'],
  },
  {
    name: '--sizes n=5..1 (the same rule on the command line)',
    files: { 'a.yaml': HOLDS },
    args: ['check', 'a.yaml', '--sizes', 'n=5..1'],
    code: 2,
    stderr: ['the range is empty'],
  },
  {
    name: 'a family empty at every size',
    files: { 'a.yaml': 'conjecture: empty-family\nexpect: holds\nfor:\n  n: 1..5\n  w: avoiders(n, [1])\nclaim: inv(w) < 0\n' },
    args: ['check', 'a.yaml'],
    code: 2,
    stderr: ['a.yaml:4:3', 'no size n = 1..5 has any case'],
    absent: ['hunch-ledger.jsonl'],
  },
  {
    name: 'an inner range empty at every size',
    files: { 'a.yaml': 'conjecture: inner-empty\nexpect: holds\nfor:\n  n: 1..5\n  k: n+1..n\nclaim: false\n' },
    args: ['check', 'a.yaml'],
    code: 2,
    stderr: ['no size n = 1..5 has any case'],
  },
  {
    name: 'an empty file',
    files: { 'a.yaml': '' },
    args: ['check', 'a.yaml'],
    code: 2,
    stderr: ['nothing to check: a.yaml holds no conjecture'],
  },
  {
    name: 'a file of comments only',
    files: { 'a.yaml': '# nothing here yet\n' },
    args: ['check', 'a.yaml'],
    code: 2,
    stderr: ['nothing to check'],
  },
  {
    name: 'a folder with no conjecture file',
    setup: (d) => mkdirSync(join(d, 'empty')),
    args: ['check', 'empty'],
    code: 2,
    stderr: ['nothing to check: empty holds no conjecture'],
  },
  {
    name: '--sizes naming no binding',
    files: { 'a.yaml': HOLDS },
    args: ['check', 'a.yaml', '--sizes', 'm=1..3'],
    code: 2,
    stderr: ['--sizes m=1..3 names no range binding', 'did you mean n?'],
  },
  {
    name: '--sample naming no binding',
    files: { 'a.yaml': HOLDS },
    args: ['check', 'a.yaml', '--sample', 'k=5..9'],
    code: 2,
    stderr: ['--sample k=5..9 names no range binding'],
  },
  {
    name: 'every case excluded by where: nothing checked, not holds',
    files: { 'a.yaml': 'conjecture: all-excluded\nexpect: holds\nfor:\n  n: 1..4\n  w: permutations(n)\nwhere: n > 10\nclaim: false\n' },
    args: ['check', 'a.yaml', '--no-ledger'],
    code: 1,
    stderr: ['nothing checked: all-excluded'],
  },

  // --- bounded resources ---------------------------------------------------------------------------
  {
    name: 'a conjecture path that is a FIFO',
    setup: (d) => execFileSync('mkfifo', [join(d, 'a.yaml')]),
    args: ['check', 'a.yaml'],
    code: 2,
    stderr: ['not a regular file'],
  },
  {
    name: 'a conjecture path that is a device',
    setup: (d) => symlinkSync('/dev/zero', join(d, 'a.yaml')),
    args: ['check', 'a.yaml'],
    code: 2,
    stderr: ['not a regular file'],
  },
  {
    name: 'a replay file that is a device',
    setup: (d) => symlinkSync('/dev/zero', join(d, 'x.yaml')),
    args: ['replay', 'x.yaml'],
    code: 2,
    stderr: ['not a regular file'],
  },
  {
    name: 'a conjecture file over the size limit is refused before it is read',
    setup: (d) => writeFileSync(join(d, 'a.yaml'), Buffer.alloc(17 * 1024 * 1024, 0x20)),
    args: ['check', 'a.yaml'],
    code: 2,
    stderr: ['more than the 16,777,216 an input may have'],
  },
  {
    name: '--count beyond the limit',
    files: { 'a.yaml': HOLDS },
    args: ['check', 'a.yaml', '--count', '1000000000000'],
    code: 2,
    stderr: ['random cases per size a run may draw'],
  },
  {
    name: 'a sample count beyond the limit in the file',
    files: { 'a.yaml': 'conjecture: many\nexpect: holds\nfor:\n  n: 1..3\nclaim: n > 0\nsample:\n  n: 4..9\n  count: 100000000000\n' },
    args: ['check', 'a.yaml'],
    code: 2,
    stderr: ['a file may ask for'],
  },
  {
    name: '--workers beyond the core count is capped, with a note',
    files: { 'a.yaml': HOLDS },
    args: ['check', 'a.yaml', '--workers', '512', '--no-ledger'],
    code: 0,
    stderr: ['--workers 512 is more than the', 'using'],
  },
  {
    name: 'replay honours --budget inside a long case',
    files: {
      'x.yaml': forgedFile('conjecture: slow\nexpect: holds\nfor:\n  n: 1..2\nclaim: count(i in 1..10^12 where i > 0) < 0\n', { n: 1 }),
    },
    args: ['replay', 'x.yaml', '--budget', '1s'],
    code: 3,
    stderr: ['the budget was reached'],
  },

  // --- small ones -------------------------------------------------------------------------------
  {
    name: '--junit into a missing folder is an error before the run',
    files: { 'a.yaml': FAILS },
    args: ['check', 'a.yaml', '--junit', 'no/such/folder/report.xml'],
    code: 2,
    stderr: ['--junit no/such/folder/report.xml: the folder', 'does not exist'],
    absent: ['hunch-ledger.jsonl', 'counterexamples', 'no'],
  },
  {
    name: '--no-ledger writes no counterexample file',
    files: { 'a.yaml': FAILS },
    args: ['check', 'a.yaml', '--no-ledger'],
    code: 0,
    absent: ['hunch-ledger.jsonl', 'counterexamples'],
  },
  {
    name: 'a ledger whose first line starts with a byte-order mark',
    files: {
      'a.yaml': HOLDS,
      'hunch-ledger.jsonl':
        '\ufeff{"v":1,"id":"trivial","hash":"' +
        'a'.repeat(64) +
        '","tool":"0.1.0","phase":"exhaustive","size":{"n":1},"cases":1,"failures":0,"skipped":0,"ms":0.1,"at":"2026-01-01T00:00:00.000Z","host":"h","run":"r","outcome":"holds"}\n',
    },
    args: ['status', 'a.yaml'],
    code: 0,
  },
];
