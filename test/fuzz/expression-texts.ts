// Random expression texts for fuzzing: mostly well-formed expressions built from the registry's
// functions and families (with argument types usually right and sometimes wrong), small and huge
// numbers, operators, comprehensions, lambdas and strings; then, often, damaged: truncated, with
// tokens shuffled, dropped, doubled or misspelt, or nested and chained past the language's limits.
// Sizes stay small so that whatever does evaluate finishes quickly.

import { allFamilies } from '../../src/families/registry.js';
import { REDUCERS } from '../../src/language/expr/ast.js';
import { allFunctions, type FunctionSpec } from '../../src/library/registry.js';
import { chance, pick, type Rand } from './random-source.js';

/** The names an expression may use: bound integers n, k and a permutation w, and the indeterminates q, x. */
export const LETS: Array<[string, string]> = [
  ['n', '3'],
  ['k', '2'],
  ['w', 'perm([2, 3, 1])'],
];
export const INDETERMINATES = ['q', 'x'];

type Env = Array<[string, string]>; // [name, type]

export const HUGE = ['9007199254740993', '123456789012345678901234567890', '10^30', '2^64', '-(10^20)', '-9007199254740993'];
const SMALL_TYPES = ['integer', 'boolean', 'list', 'string', 'polynomial', 'permutation', 'partition', 'function'];

/** Literal and constructor leaves for each kind of value. */
export const LEAVES: Record<string, string[]> = {
  integer: ['0', '1', '2', '3', '4', '-1', '-3', '5'],
  boolean: ['true', 'false'],
  string: ['"1342"', '"UUDD"', '""', '"21"', '"\\u0041b"', '"a\\"b"'],
  rational: ['1/2', '-3/7', '4/2'],
  number: ['1/2', '3', '-2/3'],
  polynomial: ['q', 'x[1]', 'x[2]', 'q^2 + 1', '(q - 1)*(q + 1)', 'x[1]*x[2] - q'],
  scalarOrPolynomial: ['q', '1 + q', '3', 'x[1]'],
  permutation: ['perm([2, 1, 3])', 'perm([1])', 'perm([])', 'longest(3)', 'simple(1, 3)', 'perm([3, 1, 2, 4])'],
  partition: ['partition([3, 1])', 'partition([])', 'partition([2, 2, 1])', 'staircase(2)'],
  tableau: ['tableau([[1, 2], [3]])', 'tableau([[1, 1, 2], [2]])', 'tableau([])'],
  matching: ['matching([[1, 3], [2, 4]])', 'matching([])', 'matching([[1, 2]])'],
  composition: ['composition([1, 2])', 'composition([])'],
  setPartition: ['setPartition([[1, 3], [2]])', 'setPartition([])'],
  dyck: ['dyck("UUDD")', 'dyck("")', 'dyck("UDUD")'],
  word: ['word([1, 1, 2])', 'word("121")', 'word([])'],
  subset: ['subset([1, 3])', 'subset([])'],
  asm: ['asm([[0, 1, 0], [1, -1, 1], [0, 1, 0]])', 'asm([[1]])'],
  matrix: ['matrix([[1, 2], [3, 4]])', 'matrix([])', 'matrix([[1]])', 'matrix([[0, 1], [1, 0]])'],
  pipeDream: ['pipeDream([[1, 1]])', 'pipeDream([])'],
  list: ['[1, 2, 3]', '[]', '1..4', '[[1, 3], [2, 4]]', '[3, 1]', '["a", 1]', '[q, 1]', '[perm([1]), perm([2, 1])]'],
  function: ['v -> v + 1', 'v -> [[v, 1]]', '(a, b) -> a * b', 'inv', 'v -> v', '() -> 1'],
  chain: ['chain([1, 2], s -> [[3 - s, 1]])', 'chain(permutations(2), w -> [[w, 1]])'],
  measure: ['stationary(chain([1, 2], s -> [[3 - s, 1], [s, 1]]))'],
  distribution: ['distribution(mod(i, 2) for i in 1..3)', 'distribution(i in 1..3: mod(i, 2))', 'distribution([1, 1, 2])'],
};

const TOKENS = [
  '(',
  ')',
  '[',
  ']',
  ',',
  ':',
  '..',
  '->',
  '+',
  '-',
  '*',
  '/',
  '^',
  '==',
  '!=',
  '<',
  '<=',
  '>',
  '>=',
  'if',
  'then',
  'else',
  'and',
  'or',
  'not',
  'implies',
  'in',
  'for',
  'where',
  'true',
  'false',
  'n',
  'k',
  'w',
  'q',
  'x',
  'i',
  'v',
  '0',
  '1',
  '3',
  '"ab"',
  '"',
  "'",
  '.',
  '=',
  '%',
  '{',
  '}',
  '&&',
  '**',
  '!',
  '#',
  '@',
  '\t',
  '\n',
  '3.5',
  '2x',
  'é',
  '\u0000',
];

function familyCall(r: Rand, env: Env, depth: number, huge = 5): string {
  const fam = pick(r, allFamilies());
  const args: string[] = [];
  for (const p of fam.params) {
    if (p.optional && chance(r, 50)) continue;
    if (p.rest) {
      args.push(pick(r, ['"132"', 'perm([2, 1])', '[1, 2]']));
      continue;
    }
    if (p.name === 'w') args.push(pick(r, ['perm([2, 1, 3])', 'perm([3, 1, 2])', 'w', 'perm([])', '3']));
    else if (p.name === 'lambda') args.push(pick(r, ['partition([2, 1])', 'partition([])', '[3, 1]', '[1, 3]', '2']));
    else if (chance(r, huge)) args.push(pick(r, [...HUGE, '-1', '1/2', 'q', '"a"']));
    else args.push(pick(r, ['0', '1', '2', '3', '4', ...env.filter((e) => e[1] === 'integer' && e[0] !== 'i').map((e) => e[0])]));
  }
  void depth;
  return `${fam.name}(${args.join(', ')})`;
}

function source(r: Rand, env: Env, depth: number): [string, string] {
  switch (r.int(0, 4)) {
    case 0:
      return [`1..${pick(r, ['0', '1', '3', '4', 'n', '-2', ...(chance(r, 10) ? HUGE : [])])}`, 'integer'];
    case 1:
      return [familyCall(r, env, depth), 'any'];
    case 2:
      return [gen(r, 'list', depth - 1, env), 'any'];
    case 3:
      return ['permutations(3)', 'permutation'];
    default:
      return [pick(r, ['partitions(4)', 'dyckPaths(2)', 'matchings(2)', LEAVES.measure[0], LEAVES.distribution[0]]), 'any'];
  }
}

function comprehension(r: Rand, type: string, depth: number, env: Env): string {
  const reducer =
    type === 'boolean'
      ? pick(r, ['all', 'any'])
      : type === 'integer'
        ? pick(r, ['sum', 'count', 'min', 'max', 'product'])
        : pick(r, REDUCERS);
  const gens: string[] = [];
  const inner: Env = [...env];
  const count = chance(r, 20) ? 2 : 1;
  for (let g = 0; g < count; g++) {
    const v = pick(r, ['i', 'j', 'v', 'p']);
    const [src, t] = source(r, inner, depth);
    inner.push([v, t]);
    const where = chance(r, 30) ? ` where ${gen(r, 'boolean', depth - 1, inner)}` : '';
    gens.push(`${v} in ${src}${where}`);
  }
  const bodyType =
    reducer === 'all' || reducer === 'any' || reducer === 'count'
      ? 'boolean'
      : reducer === 'concat'
        ? 'list'
        : pick(r, ['integer', 'integer', 'polynomial', 'any']);
  if (reducer === 'count' && chance(r, 40)) return `${reducer}(${gens.join(', ')})`;
  const body = gen(r, bodyType, depth - 1, inner);
  // Both spellings: body first (canonical) and binder first.
  return chance(r, 70) ? `${reducer}(${body} for ${gens.join(', ')})` : `${reducer}(${gens.join(', ')}: ${body})`;
}

function libraryCall(r: Rand, type: string, depth: number, env: Env): string {
  const fns = allFunctions().filter((f) => f.topic !== 'test');
  let candidates: FunctionSpec[] = fns.filter((f) => f.returns === type);
  if (candidates.length === 0 || chance(r, 15)) candidates = fns;
  const f = pick(r, candidates);
  const args: string[] = [];
  for (const p of f.params) {
    if (p.optional && chance(r, 50)) continue;
    const t = Array.isArray(p.type) ? pick(r, p.type) : p.type;
    // Usually the declared type; sometimes something else, to exercise the type checks.
    const want = chance(r, 8) ? pick(r, SMALL_TYPES) : t === 'any' ? pick(r, SMALL_TYPES) : t;
    args.push(gen(r, want, depth - 1, env));
    if (p.rest && chance(r, 30)) args.push(gen(r, want, depth - 1, env));
  }
  if (chance(r, 4)) args.push('1'); // one too many
  if (chance(r, 4)) args.pop(); // one too few
  return `${f.name}(${args.join(', ')})`;
}

/** An expression that usually has the given type (not always: wrong types are part of the test). */
export function gen(r: Rand, type: string, depth: number, env: Env = []): string {
  const names = env.filter(([, t]) => t === type || type === 'any').map(([n]) => n);
  if (depth <= 0 || chance(r, 25)) {
    if (type === 'integer' && chance(r, 6)) return pick(r, HUGE);
    if (names.length && chance(r, 50)) return pick(r, names);
    const leaves = LEAVES[type] ?? LEAVES[pick(r, SMALL_TYPES)];
    return pick(r, leaves);
  }
  const d = depth - 1;
  switch (r.int(0, 9)) {
    case 0:
    case 1:
    case 2:
      return libraryCall(r, type, depth, env);
    case 3:
      return comprehension(r, type, depth, env);
    case 4:
      if (type === 'boolean')
        return `${gen(r, 'integer', d, env)} ${pick(r, ['<', '<=', '>', '>=', '==', '!='])} ${gen(r, 'integer', d, env)}`;
      if (type === 'list') return `${gen(r, 'integer', d, env)}..${gen(r, 'integer', d, env)}`;
      return `${gen(r, type, d, env)} ${pick(r, ['+', '-', '*', '/', '^'])} ${gen(r, pick(r, [type, 'integer']), d, env)}`;
    case 5:
      if (type === 'boolean')
        return `${pick(r, ['not ', ''])}${gen(r, 'boolean', d, env)} ${pick(r, ['and', 'or', 'implies'])} ${gen(r, 'boolean', d, env)}`;
      return `if ${gen(r, 'boolean', d, env)} then ${gen(r, type, d, env)} else ${gen(r, type, d, env)}`;
    case 6:
      if (type === 'function') return `${pick(r, ['v', 'm'])} -> ${gen(r, 'any', d, [...env, ['v', 'any'], ['m', 'any']])}`;
      return `(${gen(r, type, d, env)})`;
    case 7:
      return `${gen(r, pick(r, ['list', 'permutation', 'string', 'partition', 'matrix', 'tableau']), d, env)}[${gen(r, 'integer', d, env)}]`;
    case 8:
      if (type === 'list') return `[${Array.from({ length: r.int(0, 3) }, () => gen(r, pick(r, ['integer', 'any']), d, env)).join(', ')}]`;
      return `map(${gen(r, 'list', d, env)}, ${gen(r, 'function', d, env)})`;
    default:
      return `${gen(r, type, d, env)} ${pick(r, ['==', '!='])} ${gen(r, pick(r, [type, 'any']), d, env)}`;
  }
}

/** The tokens of a text, roughly (for shuffling and dropping; not the language's lexer). */
function roughTokens(text: string): string[] {
  return text.match(/"(?:[^"\\]|\\.)*"|[A-Za-z_][A-Za-z0-9_]*|\d+|\.\.|->|[=!<>]=|\s+|./g) ?? [];
}

/** Damage a text in one of several ways a person (or a bad paste) might. */
export function damage(r: Rand, text: string): string {
  const toks = roughTokens(text);
  switch (r.int(0, 11)) {
    case 0:
      return text.slice(0, r.int(0, text.length));
    case 1: {
      const i = r.int(0, Math.max(0, toks.length - 1));
      toks.splice(i, 1);
      return toks.join('');
    }
    case 2: {
      const i = r.int(0, Math.max(0, toks.length - 1)),
        j = r.int(0, Math.max(0, toks.length - 1));
      [toks[i], toks[j]] = [toks[j], toks[i]];
      return toks.join('');
    }
    case 3: {
      const i = r.int(0, toks.length);
      toks.splice(i, 0, pick(r, TOKENS));
      return toks.join('');
    }
    case 4: {
      const i = r.int(0, Math.max(0, toks.length - 1));
      toks.splice(i, 0, toks[i] ?? '');
      return toks.join('');
    }
    case 5: {
      // A misspelt name: one letter changed, dropped or doubled.
      const names = toks.map((t, i) => [t, i] as const).filter(([t]) => /^[A-Za-z]{3,}$/.test(t));
      if (!names.length) return text + ')';
      const [t, i] = pick(r, names);
      const at = r.int(0, t.length - 1);
      toks[i] = pick(r, [
        t.slice(0, at) + t.slice(at + 1),
        t.slice(0, at) + t[at] + t.slice(at),
        t.slice(0, at) + 'z' + t.slice(at + 1),
        t.toUpperCase(),
      ]);
      return toks.join('');
    }
    case 6: {
      const depth = pick(r, [150, 199, 200, 201, 260]);
      return '('.repeat(depth) + text + ')'.repeat(depth);
    }
    case 7: {
      const n = pick(r, [500, 1500, 4000]);
      return Array.from({ length: n }, () => pick(r, ['1', 'q', 'n'])).join(pick(r, [' + ', ' * ', ' - ']));
    }
    case 8: {
      const n = pick(r, [400, 1200, 5000]);
      return pick(r, ['[1]', 'w', '"ab"']) + '[1]'.repeat(n);
    }
    case 9: {
      const n = pick(r, [300, 1100, 5000]);
      return Array.from({ length: n }, () => pick(r, ['true', 'n > 1'])).join(pick(r, [' and ', ' or ', ' implies ']));
    }
    case 10: {
      for (let k = r.int(1, 4); k > 0; k--) {
        const i = r.int(0, Math.max(0, toks.length - 1)),
          j = r.int(0, Math.max(0, toks.length - 1));
        [toks[i], toks[j]] = [toks[j], toks[i]];
      }
      return toks.join('');
    }
    default:
      return Array.from({ length: r.int(1, 12) }, () => pick(r, TOKENS)).join(pick(r, ['', ' ']));
  }
}

/** One expression text: well-formed (about half the time), or damaged. */
export function expressionText(r: Rand): string {
  const e = gen(r, pick(r, ['integer', 'boolean', 'list', 'polynomial', 'permutation', 'any']), r.int(1, 4));
  return chance(r, 50) ? e : damage(r, e);
}
