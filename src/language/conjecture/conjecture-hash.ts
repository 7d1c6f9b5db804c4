// The conjecture hash: sha256 of a canonical form of what a conjecture checks, so that a ledger
// record is counted only for the conjecture exactly as it was checked.
//
// What enters: indeterminates, the `for` bindings in order, where, the lets in order, the claim, the
// sample ranges (by binding name), the definitions the conjecture uses (transitively, sorted by
// name), and the file hash of every plugin that provides a function it uses.
// What does not: the id (records carry it apart), statement, references, expect (changing the
// expectation does not change what was verified), the sample count (records carry their case
// counts), key order, YAML layout and comments, and the spelling of expressions (each is parsed and
// printed back, so `a<=b` and `a <= b` are the same conjecture, and so are the body-first
// `sum(i^2 for i in S)` and the binder-first `sum(i in S: i^2)`: the printed form is the fixed
// binder-first one, printHashForm, so hashes recorded before the body-first form existed stay valid).

import { createHash } from 'node:crypto';
import { pluginFileHashes } from '../../library/registry.js';
import type { Expr } from '../expr/ast.js';
import { textOrigin } from '../expr/origin.js';
import { parseDefineHeader, parseExpression } from '../expr/parser.js';
import { printHashForm } from '../expr/printer.js';
import type { ConjectureSpec } from './conjecture.js';
import type { ExprText } from './yaml-reader.js';

/** The version of the canonical form: bump it when the form changes (every record then becomes stale). */
export const HASH_FORM = 'hunch-conjecture-hash/1';

export interface HashExtra {
  /** Plugin function name → sha256 of the plugin file that defines it. */
  pluginHashes?: Record<string, string>;
}

interface Canonical {
  text: string;
  names: Set<string>;
}

/** Every name and callee mentioned in a tree (bound variables included: harmless over-approximation). */
function namesIn(node: unknown, out: Set<string>): void {
  if (Array.isArray(node)) {
    for (const x of node) namesIn(x, out);
    return;
  }
  if (!node || typeof node !== 'object') return;
  const n = node as Record<string, unknown>;
  if (n.type === 'name' && typeof n.name === 'string') out.add(n.name);
  if (n.type === 'call' && typeof n.callee === 'string') out.add(n.callee);
  for (const [k, v] of Object.entries(n)) if (k !== 'src' && v && typeof v === 'object') namesIn(v, out);
}

/** An expression printed back by the language; an unparsable one (which never compiles) by its text. */
function canonical(e: ExprText): Canonical {
  let ast: Expr;
  try {
    ast = parseExpression(e.text, e.origin);
  } catch {
    return { text: `unparsed:${e.text.replace(/\s+/g, ' ').trim()}`, names: new Set() };
  }
  const names = new Set<string>();
  namesIn(ast, names);
  return { text: printHashForm(ast), names };
}

interface CanonicalDefine {
  name: string;
  head: string;
  body: Canonical;
}

function canonicalDefines(spec: ConjectureSpec): CanonicalDefine[] {
  return spec.defines.map((d) => {
    let name: string, head: string;
    try {
      const h = parseDefineHeader(d.header, textOrigin(d.pos.file, d.header, d.pos.line, d.pos.column));
      name = h.name;
      head = `${h.name}(${h.params.join(', ')})`;
    } catch {
      name = head = d.header.replace(/\s+/g, '');
    }
    return { name, head, body: canonical(d.body) };
  });
}

/** The canonical form as plain data (exported for tests and for explaining a mismatch). */
export function canonicalForm(spec: ConjectureSpec, extra: HashExtra = {}): Record<string, unknown> {
  const used = new Set<string>();
  const bindings = spec.bindings.map((b) => {
    const c = canonical(b.source);
    c.names.forEach((n) => used.add(n));
    return [b.name, c.text];
  });
  const where = spec.where ? canonical(spec.where) : null;
  where?.names.forEach((n) => used.add(n));
  const lets = spec.lets.map((l) => {
    const c = canonical(l.expr);
    c.names.forEach((n) => used.add(n));
    return [l.name, c.text];
  });
  const claim = canonical(spec.claim);
  claim.names.forEach((n) => used.add(n));
  const sample = spec.sample
    ? [...spec.sample.ranges.entries()]
        .map(([k, e]) => {
          const c = canonical(e);
          c.names.forEach((n) => used.add(n));
          return [k, c.text];
        })
        .sort((a, b) => (a[0] < b[0] ? -1 : a[0] > b[0] ? 1 : 0))
    : null;

  // Definitions used, transitively: a define's body may use other defines.
  const defs = canonicalDefines(spec);
  const taken = new Set<number>();
  for (let changed = true; changed; ) {
    changed = false;
    defs.forEach((d, i) => {
      if (!taken.has(i) && used.has(d.name)) {
        taken.add(i);
        d.body.names.forEach((n) => used.add(n));
        changed = true;
      }
    });
  }
  // Same-named definitions keep their file order (a later one overrides); otherwise sorted by name.
  const defines = [...taken]
    .sort((a, b) => (defs[a].name < defs[b].name ? -1 : defs[a].name > defs[b].name ? 1 : a - b))
    .map((i) => [defs[i].head, defs[i].body.text]);

  const plugins: Record<string, string> = {};
  for (const name of Object.keys(extra.pluginHashes ?? {}).sort()) if (used.has(name)) plugins[name] = extra.pluginHashes![name];

  return {
    form: HASH_FORM,
    indeterminates: spec.indeterminates,
    for: bindings,
    where: where?.text ?? null,
    let: lets,
    claim: claim.text,
    sample,
    define: defines,
    plugins,
  };
}

/**
 * sha256 (hex) of the canonical form of the conjecture. Without `extra.pluginHashes`, the plugin
 * file hashes are those of the plugin functions registered in this process (the project's).
 */
export function conjectureHash(spec: ConjectureSpec, extra: HashExtra = {}): string {
  const form = canonicalForm(spec, extra.pluginHashes ? extra : { pluginHashes: pluginFileHashes() });
  return createHash('sha256').update(JSON.stringify(form)).digest('hex');
}

/** sha256 (hex) of a file's bytes: a plugin's contribution to the hash. */
export function fileHash(bytes: string | Uint8Array): string {
  return createHash('sha256').update(bytes).digest('hex');
}

/** The names (functions and defines) a conjecture mentions, transitively through its defines. */
export function namesUsed(spec: ConjectureSpec): Set<string> {
  const used = new Set<string>();
  const add = (e: ExprText) => canonical(e).names.forEach((n) => used.add(n));
  spec.bindings.forEach((b) => add(b.source));
  if (spec.where) add(spec.where);
  spec.lets.forEach((l) => add(l.expr));
  add(spec.claim);
  spec.sample?.ranges.forEach((e) => add(e));
  const defs = canonicalDefines(spec);
  for (let changed = true; changed; ) {
    changed = false;
    for (const d of defs) {
      if (used.has(d.name)) {
        for (const n of d.body.names) if (!used.has(n)) used.add(n), (changed = true);
      }
    }
  }
  return used;
}
