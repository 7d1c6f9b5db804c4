// Counterexample files (CLI.md): counterexamples/<id>.yaml in the project root, written to be
// mailed to a coauthor: a readable header, the bindings in the record encoding, how the case was
// found, and the whole conjecture (with the file's definitions) exactly as it was checked, so
// that `hunch replay` needs nothing else.

import type { Witness } from '../language/conjecture/witnesses.js';
import { join, relative } from 'node:path';
import { Document, isMap, isScalar, isSeq, parseAllDocuments, stringify, visit } from 'yaml';
import { InputError } from '../base/errors.js';
import { escapeControl } from '../base/escape.js';
import { readInputFile } from '../base/read-input.js';
import type { ConjectureSpec } from '../language/conjecture/conjecture.js';
import type { ConjectureResult, Counterexample } from '../runner/result.js';
import { decodeValue } from '../values/decode.js';
import { valueToText } from '../values/operations.js';
import type { Value } from '../values/value.js';
import { TOOL_VERSION } from '../version.js';
import { writeFileAtomic } from './atomic-write.js';
import { COUNTEREXAMPLE_DIR } from './project-root.js';

export const COUNTEREXAMPLE_FORMAT = 1;

/** A plugin the conjecture needs: its file (relative to its project), its hash and the functions used. */
export interface PluginNeed {
  file: string;
  sha256: string;
  functions: string[];
}

export interface CounterexampleFile {
  format: number;
  tool: string;
  conjecture: string;
  hash: string;
  statement: string;
  expect: string;
  found: {
    phase: string;
    size: Record<string, number>;
    seed: string | null;
    shrinkSteps: number;
    shrunkFrom: Record<string, number> | null;
    failuresAtSize: number | null;
    at: string;
  };
  bindings: Record<string, unknown>;
  values: Record<string, unknown>;
  sides: [unknown, unknown] | null;
  /** What decided the failure (informational: replay computes them again). */
  witnesses?: Witness[];
  plugins: PluginNeed[];
  replay: string;
  /** The file's define documents, then the conjecture document, as checked. */
  defines: Record<string, unknown>[];
  document: Record<string, unknown>;
}

export function counterexamplePath(root: string, id: string): string {
  return join(root, COUNTEREXAMPLE_DIR, `${id}.yaml`);
}

// --- the documents as checked, with every expression as its exact source text -------------------

/**
 * The conjecture document with each expression replaced by its exact text from the spec (plain
 * data would turn a 30-digit integer into a float, and a numeric range bound into a number).
 */
export function exactDocument(spec: ConjectureSpec): Record<string, unknown> {
  const d: Record<string, unknown> = { ...spec.document };
  if (spec.bindings.length) d.for = Object.fromEntries(spec.bindings.map((b) => [b.name, b.source.text]));
  if (spec.where) d.where = spec.where.text;
  if (spec.lets.length) d.let = Object.fromEntries(spec.lets.map((l) => [l.name, l.expr.text]));
  d.claim = spec.claim.text;
  if (spec.sample) {
    const s: Record<string, unknown> = {};
    for (const [k, e] of spec.sample.ranges) s[k] = e.text;
    if (spec.sample.count !== null) s.count = spec.sample.count;
    d.sample = s;
  }
  const fileDefineCount = spec.defineDocuments.reduce((a, doc) => a + Object.keys((doc.define as object) ?? {}).length, 0);
  const own = spec.defines.slice(fileDefineCount);
  if (own.length) d.define = Object.fromEntries(own.map((x) => [x.header, x.body.text]));
  return d;
}

export function exactDefineDocuments(spec: ConjectureSpec): Record<string, unknown>[] {
  let i = 0;
  return spec.defineDocuments.map((doc) => {
    const n = Object.keys((doc.define as object) ?? {}).length;
    const ds = spec.defines.slice(i, i + n);
    i += n;
    return { define: Object.fromEntries(ds.map((x) => [x.header, x.body.text])) };
  });
}

/** The conjecture as a multi-document YAML text that loadConjectureFile reads back. */
export function conjectureText(defines: readonly Record<string, unknown>[], document: Record<string, unknown>): string {
  return [...defines, document].map((d) => stringify(d, { lineWidth: 0 })).join('---\n');
}

// --- writing ------------------------------------------------------------------------------------

function header(f: CounterexampleFile, texts: Record<string, string>): string {
  const found =
    f.found.phase === 'exhaustive'
      ? `by checking every case of ${sizeText(f.found.size)}${f.found.failuresAtSize !== null ? ` (${f.found.failuresAtSize} failing there; this is the simplest)` : ''}`
      : f.found.phase === 'sample'
        ? `at random (seed ${f.found.seed}), then shrunk in ${f.found.shrinkSteps} step${f.found.shrinkSteps === 1 ? '' : 's'}` +
          (f.found.shrunkFrom ? ` from ${sizeText(f.found.shrunkFrom)} to ${sizeText(f.found.size)}` : '')
        : 'by replaying an earlier counterexample';
  const lines = [
    `A counterexample to the conjecture "${f.conjecture}", found by hunch ${f.tool} on ${f.found.at.slice(0, 10)}.`,
    '',
    ...(f.statement ? [`Statement: ${f.statement}`, ''] : []),
    'The case:',
    ...Object.entries(texts).map(([k, v]) => `    ${k} = ${v}`),
    ...(f.sides ? [`The two sides of the claim: ${sideText(f.sides[0])} and ${sideText(f.sides[1])}.`] : []),
    ...(f.witnesses ?? [])
      .filter((w) => w.kind === 'element')
      .map(
        (w) =>
          `Witness: ${w.at} ${w.reducer === 'min' || w.reducer === 'max' ? `= ${sideText(w.value)}` : `is ${w.reducer === 'any' ? 'true' : 'false'}`} at ${Object.entries(
            w.bindings,
          )
            .map(([k, v]) => `${k} = ${sideText(v)}`)
            .join(', ')}.`,
      ),
    `Found ${found}.`,
    '',
    'This file holds everything needed to check it again, including the conjecture as it was checked',
    '(under "document" below). To replay it:',
    `    ${f.replay}`,
    ...(f.plugins.length
      ? ['', `It uses functions from plugins: ${f.plugins.map((p) => `${p.file} (${p.functions.join(', ')})`).join('; ')}.`]
      : []),
  ];
  // Every header line is one comment line: text from input (the statement) keeps no newline or control byte.
  return lines.map((l) => (l ? `# ${escapeControl(l, true)}` : '#')).join('\n') + '\n';
}

function sizeText(size: Record<string, number>): string {
  return (
    Object.entries(size)
      .map(([k, v]) => `${k} = ${v}`)
      .join(', ') || 'the only size'
  );
}

function sideText(x: unknown): string {
  try {
    return valueToText(decodeValue(x));
  } catch {
    return JSON.stringify(x);
  }
}

/** The counterexample record of a failed result. */
export function counterexampleRecord(
  spec: ConjectureSpec,
  hash: string,
  cx: Counterexample,
  replayPath: string,
  plugins: PluginNeed[] = [],
  at: Date = new Date(),
): CounterexampleFile {
  return {
    format: COUNTEREXAMPLE_FORMAT,
    tool: TOOL_VERSION,
    conjecture: spec.id,
    hash,
    statement: spec.statement,
    expect: spec.expect,
    found: {
      phase: cx.phase,
      size: cx.size,
      seed: cx.seed,
      shrinkSteps: cx.shrinkSteps,
      shrunkFrom: cx.shrunkFrom ?? null,
      failuresAtSize: cx.failuresAtSize,
      at: at.toISOString(),
    },
    bindings: cx.bindings,
    values: cx.values,
    sides: cx.sides,
    ...(cx.witnesses?.length ? { witnesses: cx.witnesses } : {}),
    plugins,
    replay: `hunch replay ${replayPath}`,
    defines: exactDefineDocuments(spec),
    document: exactDocument(spec),
  };
}

export function counterexampleText(f: CounterexampleFile, texts?: Record<string, string>): string {
  const t = texts ?? Object.fromEntries(Object.entries(f.bindings).map(([k, v]) => [k, sideText(v)]));
  const { defines, document, ...rest } = f;
  // The readable part first, the conjecture last; values as compact [1, 3, 2] lists.
  const doc = new Document({ ...rest, defines, document });
  for (
    let pass = 0;
    pass < 4;
    pass++ // inner lists first: a tableau [[1, 2], [3]] takes two passes
  )
    visit(doc, {
      Seq(_, node) {
        if (node.items.every((x) => isScalar(x) || (isSeq(x) && x.flow))) node.flow = true;
      },
      Map(_, node) {
        if (node.items.length && node.items.every((p) => isScalar(p.value) && typeof p.value.value === 'number')) node.flow = true;
      },
    });
  return header(f, t) + doc.toString({ lineWidth: 0, flowCollectionPadding: false });
}

/**
 * Write counterexamples/<id>.yaml under the project root, atomically. Returns its path relative to
 * the current folder (for the replay command). A saved case that still fails (phase 'regression')
 * leaves the file as is unless the conjecture changed since it was written.
 */
export function writeCounterexampleFile(
  root: string,
  spec: ConjectureSpec,
  result: ConjectureResult,
  plugins: PluginNeed[] = [],
): string | null {
  const cx = result.counterexample;
  if (!cx) return null;
  const path = counterexamplePath(root, spec.id);
  const shown = relative(process.cwd(), path) || path;
  if (cx.phase === 'regression') {
    // The saved case still fails. Keep the file while it describes the conjecture as it stands;
    // after a change, rewrite it so that it holds the current conjecture (replayable as it is now).
    // A regression case that was shrunk further is a new, simpler case: the file is rewritten.
    try {
      const saved = readCounterexampleFile(path);
      if (saved.hash === result.hash && JSON.stringify(saved.bindings) === JSON.stringify(cx.bindings)) return shown;
    } catch {
      // unreadable: rewrite it below
    }
  }
  writeFileAtomic(path, counterexampleText(counterexampleRecord(spec, result.hash, cx, shown, plugins), cx.text), {
    within: root,
    what: 'the counterexample file',
  });
  return shown;
}

// --- reading ------------------------------------------------------------------------------------

function badFile(path: string, why: string): InputError {
  return new InputError(`${path} is not a readable counterexample file: ${why}`, { file: path, line: 1, column: 1 });
}

const isObj = (x: unknown): x is Record<string, unknown> => !!x && typeof x === 'object' && !Array.isArray(x);

/** Parse and validate the text of a counterexample file. */
export function parseCounterexampleFile(text: string, path: string): CounterexampleFile {
  let data: unknown;
  try {
    const docs = parseAllDocuments(text, { prettyErrors: false });
    const list = Array.isArray(docs) ? docs : [docs];
    if (list.length !== 1) throw badFile(path, 'it should be a single YAML document');
    const d = list[0];
    if (d.errors.length) throw badFile(path, `YAML syntax: ${d.errors[0].message.split('\n')[0]}`);
    if (!isMap(d.contents)) throw badFile(path, 'it is not a mapping');
    // Values are in the record encoding (big integers and rationals are strings), so plain data is exact.
    data = d.toJS({ maxAliasCount: 0 });
  } catch (e) {
    if (e instanceof InputError) throw e;
    throw badFile(path, (e as Error).message);
  }
  const f = data as Record<string, unknown>;
  if (typeof f.format !== 'number') throw badFile(path, 'the "format" key is missing');
  if (f.format > COUNTEREXAMPLE_FORMAT)
    throw badFile(path, `it is of format ${f.format}, written by a newer hunch (this one reads format ${COUNTEREXAMPLE_FORMAT})`);
  if (typeof f.conjecture !== 'string') throw badFile(path, 'the "conjecture" id is missing');
  if (typeof f.hash !== 'string' || !/^[0-9a-f]{64}$/.test(f.hash)) throw badFile(path, 'the "hash" is missing or malformed');
  if (!isObj(f.bindings)) throw badFile(path, '"bindings" must map each binding name to its value');
  if (!isObj(f.document) || typeof f.document.conjecture !== 'string')
    throw badFile(path, '"document" must hold the conjecture as checked');
  if (f.document.conjecture !== f.conjecture)
    throw badFile(path, `"document" holds the conjecture ${f.document.conjecture}, not ${f.conjecture}`);
  if (f.defines !== undefined && (!Array.isArray(f.defines) || !f.defines.every(isObj)))
    throw badFile(path, '"defines" must be a list of define documents');
  if (
    f.plugins !== undefined &&
    (!Array.isArray(f.plugins) || !f.plugins.every((p) => isObj(p) && typeof p.file === 'string' && Array.isArray(p.functions)))
  )
    throw badFile(path, '"plugins" must list {file, sha256, functions}');
  const found = isObj(f.found) ? f.found : {};
  return {
    format: f.format,
    tool: typeof f.tool === 'string' ? f.tool : 'unknown',
    conjecture: f.conjecture,
    hash: f.hash,
    statement: typeof f.statement === 'string' ? f.statement : '',
    expect: typeof f.expect === 'string' ? f.expect : 'open',
    found: {
      phase: typeof found.phase === 'string' ? found.phase : 'unknown',
      size: isObj(found.size) ? (found.size as Record<string, number>) : {},
      seed: typeof found.seed === 'string' ? found.seed : null,
      shrinkSteps: typeof found.shrinkSteps === 'number' ? found.shrinkSteps : 0,
      shrunkFrom: isObj(found.shrunkFrom) ? (found.shrunkFrom as Record<string, number>) : null,
      failuresAtSize: typeof found.failuresAtSize === 'number' ? found.failuresAtSize : null,
      at: typeof found.at === 'string' ? found.at : '',
    },
    bindings: f.bindings,
    values: isObj(f.values) ? f.values : {},
    sides: Array.isArray(f.sides) && f.sides.length === 2 ? (f.sides as [unknown, unknown]) : null,
    ...(Array.isArray(f.witnesses) && f.witnesses.every(isObj) ? { witnesses: f.witnesses as unknown as Witness[] } : {}),
    plugins: (f.plugins as PluginNeed[] | undefined) ?? [],
    replay: typeof f.replay === 'string' ? f.replay : `hunch replay ${path}`,
    defines: (f.defines as Record<string, unknown>[] | undefined) ?? [],
    document: f.document,
  };
}

export function readCounterexampleFile(path: string): CounterexampleFile {
  return parseCounterexampleFile(readInputFile(path, 'the counterexample file'), path);
}

/**
 * The bindings of a counterexample file in the order of `names`, still encoded; null when the
 * file's bindings are not exactly these names (the conjecture's bindings changed since).
 */
export function bindingsInOrder(f: CounterexampleFile, names: readonly string[]): unknown[] | null {
  const keys = Object.keys(f.bindings);
  if (keys.length !== names.length || !names.every((n) => keys.includes(n))) return null;
  return names.map((n) => f.bindings[n]);
}

/**
 * The case of an earlier counterexample to try first (`hunch check`), as encoded binding values
 * in the conjecture's `for` order; null when there is none or it no longer fits the conjecture.
 * A damaged file is reported through `warn` and skipped (it must not stop a check).
 */
/**
 * The saved counterexample's bindings, to be tried first — only when it was found for the
 * conjecture as it stands now (`hash`): after an edit, the old case may no longer be the simplest,
 * so the full check runs instead (and rewrites the file).
 */
export function readRegressionEncoded(
  root: string,
  spec: ConjectureSpec,
  warn?: (message: string) => void,
  hash?: string,
): unknown[] | null {
  const path = counterexamplePath(root, spec.id);
  let f: CounterexampleFile;
  try {
    f = readCounterexampleFile(path);
  } catch (e) {
    if (e instanceof InputError && /ENOENT/.test(e.message)) return null;
    if (e instanceof InputError) {
      warn?.(`${e.message}; it is not tried first`);
      return null;
    }
    throw e;
  }
  if (f.conjecture !== spec.id) return null;
  if (hash !== undefined && f.hash !== hash) return null;
  return bindingsInOrder(
    f,
    spec.bindings.map((b) => b.name),
  );
}

/** Like readRegressionEncoded, decoded to values (for callers in the same thread). */
export function readRegressionCase(root: string, spec: ConjectureSpec, warn?: (message: string) => void): Value[] | null {
  const enc = readRegressionEncoded(root, spec, warn);
  if (!enc) return null;
  try {
    return enc.map(decodeValue);
  } catch (e) {
    warn?.(`the saved counterexample of ${spec.id} cannot be read back (${(e as Error).message}); it is not tried first`);
    return null;
  }
}
