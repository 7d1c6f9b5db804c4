// Turning one YAML file into conjecture specs, with every structural mistake reported at its line
// and column before anything runs.

import { isAlias, isMap, isScalar, type Document, type Node } from 'yaml';
import { InputError } from '../../base/errors.js';
import { nearest } from '../../base/suggest.js';
import { CONJECTURE_KEYS, ConjectureSpec, DefineSpec, EXPECTATIONS, SampleSpec } from './conjecture.js';
import { mapEntries, scalarString, seqItems, YamlFile } from './yaml-reader.js';
import type { Expectation } from './conjecture.js';

const ID = /^[a-z0-9][a-z0-9-]*$/;
const NAME = /^[A-Za-z_][A-Za-z0-9_]*$/;

function unknownKey(y: YamlFile, key: string, node: Node, known: readonly string[], where: string): never {
  const s = nearest(key, known);
  throw new InputError(
    `unknown key "${key}" in ${where}${s ? `; did you mean "${s}"?` : ''} (known keys: ${known.join(', ')})`,
    y.nodePos(node),
    key,
    s,
  );
}

/** Aliases are allowed for single values only: expanding collections is how alias bombs work. */
function noAliases(y: YamlFile, doc: Document.Parsed): void {
  const visit = (n: unknown, depth: number): void => {
    if (depth > 64) throw new InputError('the YAML is nested too deeply (more than 64 levels)', y.nodePos(n as Node));
    if (isAlias(n)) {
      const target = n.resolve(doc);
      if (!isScalar(target))
        throw new InputError(`YAML aliases (*${n.source}) may only stand for single values in conjecture files`, y.nodePos(n));
      return;
    }
    if (n && typeof n === 'object' && 'items' in n) {
      for (const it of (n as { items: unknown[] }).items) {
        if (it && typeof it === 'object' && 'key' in it) {
          visit((it as { key: unknown }).key, depth + 1);
          visit((it as unknown as { value: unknown }).value, depth + 1);
        } else visit(it, depth + 1);
      }
    }
  };
  visit(doc.contents, 0);
}

/** The document as plain data; integers stay exact (numbers when safe, else decimal strings). */
function plain(doc: Document.Parsed): Record<string, unknown> {
  const exact = (v: unknown): unknown => {
    if (typeof v === 'bigint')
      return v >= BigInt(Number.MIN_SAFE_INTEGER) && v <= BigInt(Number.MAX_SAFE_INTEGER) ? Number(v) : v.toString();
    if (Array.isArray(v)) return v.map(exact);
    if (v && typeof v === 'object') return Object.fromEntries(Object.entries(v).map(([k, x]) => [k, exact(x)]));
    return v;
  };
  return exact(doc.toJS({ maxAliasCount: 50 })) as Record<string, unknown>;
}

function readDefines(y: YamlFile, node: Node | null): DefineSpec[] {
  return mapEntries(y, node, 'define').map(({ key, keyNode, value }) => {
    if (value === null) throw new InputError(`define: "${key}" has no body`, y.nodePos(keyNode), key);
    return { header: key, body: y.exprOf(value, `the definition of ${key}`), pos: y.nodePos(keyNode) };
  });
}

function readIndeterminates(y: YamlFile, node: Node | null): string[] {
  const items = isScalar(node) ? [node] : seqItems(y, node, 'indeterminates');
  return items.map((it) => {
    const name = scalarString(y, it, 'an indeterminate');
    if (!NAME.test(name)) throw new InputError(`"${name}" is not a valid indeterminate name`, y.nodePos(it), name);
    return name;
  });
}

export interface LoadedFile {
  file: string;
  conjectures: ConjectureSpec[];
}

/** The longest conjecture id (it names a file: most file systems allow 255 bytes). */
export const MAX_ID_LENGTH = 200;

export function loadConjectureFile(file: string, source: string): LoadedFile {
  const y = new YamlFile(file, source);
  const fileDefines: DefineSpec[] = [];
  const fileIndeterminates: string[] = [];
  const defineDocuments: Record<string, unknown>[] = [];
  const pending: Array<{ doc: Document.Parsed; node: Node }> = [];

  for (const doc of y.docs) {
    const node = doc.contents as Node | null;
    if (node === null || (isScalar(node) && node.value === null)) continue; // an empty document (e.g. a trailing ---)
    if (!isMap(node)) throw new InputError('a conjecture document must be a mapping with a "conjecture:" key', y.nodePos(node));
    noAliases(y, doc);
    const keys = mapEntries(y, node, 'the document').map((e) => e.key);
    if (keys.includes('conjecture')) pending.push({ doc, node });
    else if (keys.length >= 1 && keys.every((k) => k === 'define' || k === 'indeterminates')) {
      // A define document: shared definitions, and the indeterminates they (and the conjectures) use.
      for (const e of mapEntries(y, node, 'the document')) {
        if (e.key === 'define') fileDefines.push(...readDefines(y, e.value));
        else for (const name of readIndeterminates(y, e.value)) if (!fileIndeterminates.includes(name)) fileIndeterminates.push(name);
      }
      defineDocuments.push(plain(doc));
    } else {
      const entries = mapEntries(y, node, 'the document');
      // Suggest only for a key that is not already right (a misspelt "conjecture:" or "define:").
      const near = entries.find(
        (e) =>
          e.key !== 'define' &&
          e.key !== 'conjecture' &&
          e.key !== 'indeterminates' &&
          nearest(e.key, ['conjecture', 'define']) !== undefined,
      );
      const s = near ? nearest(near.key, ['conjecture', 'define']) : undefined;
      const extra = entries.find((e) => e.key !== 'define' && e.key !== 'indeterminates');
      if (!near && keys.includes('define') && extra)
        throw new InputError(
          `a "define:" document holds only definitions (and the indeterminates: they use); "${extra.key}" belongs in a conjecture document`,
          y.nodePos(extra.keyNode),
          extra.key,
        );
      throw new InputError(
        'a document needs a "conjecture:" key (or only a "define:" key for shared definitions)' +
          (near && s ? `; did you mean "${s}:" for "${near.key}:"?` : ''),
        y.nodePos((near ?? entries[0])?.keyNode ?? node),
        near?.key,
        s,
      );
    }
  }

  const conjectures = pending.map(({ doc, node }) => readConjecture(y, doc, node, fileDefines, defineDocuments, fileIndeterminates));
  return { file, conjectures };
}

function readConjecture(
  y: YamlFile,
  doc: Document.Parsed,
  node: Node,
  fileDefines: DefineSpec[],
  defineDocuments: Record<string, unknown>[],
  fileIndeterminates: string[],
): ConjectureSpec {
  const entries = mapEntries(y, node, 'the conjecture');
  const get = (k: string) => entries.find((e) => e.key === k);
  for (const e of entries)
    if (!(CONJECTURE_KEYS as readonly string[]).includes(e.key)) unknownKey(y, e.key, e.keyNode, CONJECTURE_KEYS, 'a conjecture');

  const idE = get('conjecture')!;
  const id = scalarString(y, idE.value, 'conjecture (the id)');
  if (!ID.test(id)) throw new InputError(`the id "${id}" may use only lowercase letters, digits and '-'`, y.nodePos(idE.value), id);
  // The id names counterexamples/<id>.yaml: keep it well inside every file system's name limit.
  if (id.length > MAX_ID_LENGTH)
    throw new InputError(
      `the id is ${id.length} characters long; an id may have at most ${MAX_ID_LENGTH}`,
      y.nodePos(idE.value),
      id.slice(0, 40) + '...',
    );

  const expectE = get('expect');
  let expect: Expectation = 'open';
  if (expectE) {
    const v = scalarString(y, expectE.value, 'expect');
    if (!(EXPECTATIONS as readonly string[]).includes(v)) {
      const s = nearest(v, EXPECTATIONS);
      throw new InputError(
        `expect must be holds, fails or open, not "${v}"${s ? `; did you mean "${s}"?` : ''}`,
        y.nodePos(expectE.value),
        v,
        s,
      );
    }
    expect = v as Expectation;
  }

  const claimE = get('claim');
  if (!claimE || claimE.value === null) throw new InputError(`conjecture ${id} has no claim`, y.nodePos(idE.keyNode));

  // The file's define documents may declare indeterminates for every conjecture of the file.
  const indeterminates: string[] = [...fileIndeterminates];
  const indE = get('indeterminates');
  if (indE) for (const name of readIndeterminates(y, indE.value)) if (!indeterminates.includes(name)) indeterminates.push(name);

  const forE = get('for');
  const bindings = forE
    ? mapEntries(y, forE.value, 'for').map(({ key, keyNode, value }) => {
        if (!NAME.test(key)) throw new InputError(`"${key}" is not a valid binding name`, y.nodePos(keyNode), key);
        if (value === null) throw new InputError(`the binding ${key} has no range or family`, y.nodePos(keyNode), key);
        return { name: key, source: y.exprOf(value, `the binding ${key}`), pos: y.nodePos(keyNode) };
      })
    : [];
  const seen = new Set<string>();
  for (const b of bindings) {
    if (seen.has(b.name)) throw new InputError(`the binding ${b.name} is given twice`, b.pos, b.name);
    seen.add(b.name);
  }

  const lets = get('let')
    ? mapEntries(y, get('let')!.value, 'let').map(({ key, keyNode, value }) => {
        if (!NAME.test(key)) throw new InputError(`"${key}" is not a valid name`, y.nodePos(keyNode), key);
        if (seen.has(key)) throw new InputError(`the name ${key} is already bound`, y.nodePos(keyNode), key);
        if (value === null) throw new InputError(`let: ${key} has no value`, y.nodePos(keyNode), key);
        seen.add(key);
        return { name: key, expr: y.exprOf(value, `let ${key}`), pos: y.nodePos(keyNode) };
      })
    : [];

  let sample: SampleSpec | null = null;
  const sampleE = get('sample');
  if (sampleE) {
    const ranges = new Map();
    let count: number | null = null;
    const rangeNames = bindings.map((b) => b.name);
    for (const { key, keyNode, value } of mapEntries(y, sampleE.value, 'sample')) {
      if (key === 'count') {
        const c = isScalar(value) ? Number(value.value) : NaN;
        if (!Number.isSafeInteger(c) || c < 0)
          throw new InputError('sample count must be a nonnegative whole number', y.nodePos(value ?? keyNode));
        count = c;
      } else if (rangeNames.includes(key)) {
        if (value === null) throw new InputError(`sample: ${key} has no range`, y.nodePos(keyNode), key);
        ranges.set(key, y.exprOf(value, `the sample range of ${key}`));
      } else unknownKey(y, key, keyNode, ['count', ...rangeNames], 'sample');
    }
    sample = { ranges, count, pos: y.nodePos(sampleE.keyNode) };
  }

  const statementE = get('statement');
  const refsE = get('references');
  const references = refsE
    ? (isScalar(refsE.value) ? [refsE.value] : seqItems(y, refsE.value, 'references')).map((n) => scalarString(y, n, 'a reference'))
    : [];

  return {
    id,
    file: y.file,
    pos: y.nodePos(idE.keyNode),
    statement: statementE ? scalarString(y, statementE.value, 'statement') : '',
    expect,
    indeterminates,
    bindings,
    where: get('where') && get('where')!.value !== null ? y.exprOf(get('where')!.value!, 'where') : null,
    lets,
    claim: y.exprOf(claimE.value, 'claim'),
    sample,
    references,
    defines: [...fileDefines, ...(get('define') ? readDefines(y, get('define')!.value) : [])],
    document: plain(doc),
    defineDocuments,
  };
}
