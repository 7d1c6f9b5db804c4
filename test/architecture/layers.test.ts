// The layer rule of DEVELOPERS.md, read from the imports themselves: every file of src/ belongs to
// the layer of its top folder (a new subfolder joins its folder's layer), and imports only go down
// (or stay within a layer). Type-only imports count too. The runtime imports have no circle.

import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const SRC = resolve(dirname(fileURLToPath(import.meta.url)), '../../src');

/** Bottom first. `version.ts` at the top of src/ is part of the bottom layer. */
const LAYERS = [
  'base',
  'numbers',
  'protocol',
  'algebra',
  'values',
  'families',
  'library',
  'language',
  'runner',
  'records',
  'reports',
  'api',
  'cli',
];

/** The only imports that go up, and why. */
const ALLOWED_UPWARD: Array<{ from: string; to: string; why: string }> = [
  {
    from: 'runner/transport/worker-entry.ts',
    to: 'records/open-project.ts',
    why: 'a worker thread is the composition root of its thread, like the CLI of the main one: it opens the project (its plugins) before compiling',
  },
];

interface Edge {
  from: string;
  to: string;
  typeOnly: boolean;
}

function sourceFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? sourceFiles(join(dir, e.name)) : e.name.endsWith('.ts') ? [join(dir, e.name)] : [],
  );
}

/** Relative imports and re-exports of a file (static, type-only and `import('...')` types). */
function importsOf(file: string): Edge[] {
  const text = readFileSync(file, 'utf8');
  const out: Edge[] = [];
  const from = relative(SRC, file);
  const add = (spec: string, typeOnly: boolean) => {
    if (!spec.startsWith('.')) return;
    const to = relative(SRC, resolve(dirname(file), spec.replace(/\.js$/, '.ts')));
    out.push({ from, to, typeOnly });
  };
  const statement = /^\s*(import|export)\s+(type\s+)?(?:([^'";]*?)\s+from\s+)?['"]([^'"]+)['"]/gm;
  for (const m of text.matchAll(statement)) {
    // `import { type A, type B } from` is type-only too.
    const names = (m[3] ?? '').trim();
    const braced = /^\{([^}]*)\}$/.exec(names);
    const allTypes =
      braced !== null &&
      braced[1]
        .split(',')
        .map((x) => x.trim())
        .filter(Boolean)
        .every((x) => x.startsWith('type '));
    add(m[4], Boolean(m[2]) || allTypes);
  }
  // `import('...')`: at run time after `await`, else in a type position (`import('./x.js').T`).
  for (const m of text.matchAll(/(await\s+)?import\(\s*['"]([^'"]+)['"]\s*\)/g)) add(m[2], !m[1]);
  return out;
}

function layerOf(path: string): number {
  const top = path.includes('/') ? path.split('/')[0] : 'base';
  return LAYERS.indexOf(top);
}

const files = sourceFiles(SRC);
const edges = files.flatMap(importsOf);

describe('layers', () => {
  it('every top folder of src/ is a layer', () => {
    const tops = [
      ...new Set(
        files
          .map((f) => relative(SRC, f))
          .filter((p) => p.includes('/'))
          .map((p) => p.split('/')[0]),
      ),
    ];
    expect(tops.filter((t) => !LAYERS.includes(t))).toEqual([]);
  });

  it('imports only go down', () => {
    const upward = edges
      .filter((e) => layerOf(e.to) > layerOf(e.from))
      .filter((e) => !ALLOWED_UPWARD.some((a) => a.from === e.from && a.to === e.to))
      .map((e) => `${e.from} -> ${e.to}`);
    expect(upward).toEqual([]);
  });

  it('the allowed upward imports still exist (else drop them from the list)', () => {
    for (const a of ALLOWED_UPWARD)
      expect(
        edges.some((e) => e.from === a.from && e.to === a.to),
        a.from,
      ).toBe(true);
  });

  it('runtime imports have no circle', () => {
    const graph = new Map<string, string[]>();
    for (const e of edges) if (!e.typeOnly) (graph.get(e.from) ?? graph.set(e.from, []).get(e.from)!).push(e.to);
    const state = new Map<string, 'open' | 'done'>();
    const circles: string[] = [];
    const visit = (n: string, path: string[]) => {
      if (state.get(n) === 'done') return;
      if (state.get(n) === 'open') {
        circles.push([...path.slice(path.indexOf(n)), n].join(' -> '));
        return;
      }
      state.set(n, 'open');
      for (const m of graph.get(n) ?? []) visit(m, [...path, n]);
      state.set(n, 'done');
    };
    for (const n of graph.keys()) visit(n, []);
    expect(circles).toEqual([]);
  });
});
