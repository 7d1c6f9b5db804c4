// What an export says about a counterexample file: the statement, the case, its values, how it was
// found, and whether this hunch re-checked it. The file is never believed as it stands: the
// export replays it (as `hunch replay` does) and says what that found.

import { decodeValue } from '../../values/decode.js';
import { valueToText } from '../../values/operations.js';
import type { Value } from '../../values/value.js';
import type { CounterexampleFile } from '../../records/counterexample-file.js';
import type { ReplayResult } from '../../records/replay.js';
import { drawValue } from '../pictures/index.js';
import { sceneOf, type Scene } from '../scenes/index.js';

export interface ShownValue {
  name: string;
  /** The value as an expression of the language. */
  text: string;
  scene: Scene | null;
  /** The terminal picture (Unicode), for Markdown. */
  picture: string | null;
}

export interface CounterexampleModel {
  id: string;
  statement: string;
  claim: string;
  expect: string;
  /** "exhaustive, n = 3 (1 failing case at this size)" */
  found: string;
  bindings: ShownValue[];
  values: ShownValue[];
  sides: [string, string] | null;
  witnesses: Array<{ at: string; value: string; bindings: string }>;
  replay: string;
  /** What re-checking the file here found, in words. */
  recheck: { ok: boolean; text: string };
  tool: string;
}

function decoded(x: unknown): Value | string {
  try {
    return decodeValue(x);
  } catch {
    return JSON.stringify(x);
  }
}

function shown(name: string, x: unknown, reducedWord: boolean): ShownValue {
  const v = decoded(x);
  const text = typeof v === 'string' ? (typeof x === 'string' ? x : v) : valueToText(v);
  if (typeof v === 'string') return { name, text, scene: null, picture: null };
  return { name, text, scene: sceneOf(v, { reducedWord }), picture: drawValue(v, { unicode: true }) };
}

/** The `for` bindings whose source is a reducedWords(...) family: their values are reduced words. */
function reducedWordBindings(doc: Record<string, unknown>): Set<string> {
  const out = new Set<string>();
  const f = doc.for;
  if (f && typeof f === 'object')
    for (const [k, v] of Object.entries(f as Record<string, unknown>))
      if (typeof v === 'string' && /^\s*reducedWords\s*\(/.test(v)) out.add(k);
  return out;
}

function sizeWords(size: Record<string, number>): string {
  return Object.entries(size)
    .map(([k, v]) => `${k} = ${v}`)
    .join(', ');
}

function foundWords(f: CounterexampleFile): string {
  const at = sizeWords(f.found.size);
  if (f.found.phase === 'exhaustive') {
    const k = f.found.failuresAtSize;
    return `exhaustive check${at ? `, ${at}` : ''}${k !== null ? ` (${k} failing case${k === 1 ? '' : 's'} at this size; this is the simplest)` : ''}`;
  }
  if (f.found.phase === 'sample')
    return `random sample${at ? `, ${at}` : ''}, seed ${f.found.seed ?? '?'}, shrunk in ${f.found.shrinkSteps} step${f.found.shrinkSteps === 1 ? '' : 's'}`;
  return `${f.found.phase}${at ? `, ${at}` : ''}`;
}

function recheckWords(r: ReplayResult | null, error: string | null): { ok: boolean; text: string } {
  if (error !== null) return { ok: false, text: `not re-checked: ${error}` };
  if (r === null) return { ok: false, text: 'not re-checked' };
  switch (r.verdict) {
    case 'refutes':
      return { ok: true, text: 're-checked by this export: the case still refutes the conjecture as written in the file' };
    case 'holds':
      return { ok: false, text: 're-checked by this export: the claim HOLDS for this case, so the file does not refute the conjecture' };
    case 'not-a-case':
      return {
        ok: false,
        text: `re-checked by this export: not a case of this conjecture (${r.error ?? 'it is outside its families or ranges'}), so it is not a counterexample`,
      };
    case 'needs-plugins':
      return {
        ok: false,
        text: `not re-checked: the conjecture uses plugin functions this project does not load (${r.missingPlugins.flatMap((p) => p.functions).join(', ')})`,
      };
    case 'stopped':
      return { ok: false, text: `not re-checked: the replay was stopped (${r.error ?? 'budget'}) before the case was evaluated` };
    default:
      return { ok: false, text: `re-checked by this export: the case cannot be evaluated (${r.error ?? 'error'})` };
  }
}

export function counterexampleModel(
  f: CounterexampleFile,
  replay: ReplayResult | null,
  replayError: string | null = null,
): CounterexampleModel {
  const doc = f.document;
  const reduced = reducedWordBindings(doc);
  const witnesses = Array.isArray((f as unknown as Record<string, unknown>).witnesses)
    ? ((f as unknown as Record<string, unknown>).witnesses as Record<string, unknown>[])
    : [];
  return {
    id: f.conjecture,
    statement: f.statement,
    claim: typeof doc.claim === 'string' ? doc.claim : JSON.stringify(doc.claim),
    expect: f.expect,
    found: foundWords(f),
    bindings: Object.entries(f.bindings).map(([k, x]) => shown(k, x, reduced.has(k))),
    values: Object.entries(f.values).map(([k, x]) => shown(k, x, false)),
    sides: f.sides ? [shown('', f.sides[0], false).text, shown('', f.sides[1], false).text] : null,
    witnesses: witnesses.map((w) => ({
      at: String(w.at ?? ''),
      value: shown('', w.value, false).text,
      bindings:
        w.bindings && typeof w.bindings === 'object'
          ? Object.entries(w.bindings as Record<string, unknown>)
              .map(([k, x]) => `${k} = ${shown(k, x, false).text}`)
              .join(', ')
          : '',
    })),
    replay: f.replay,
    recheck: recheckWords(replay, replayError),
    tool: f.tool,
  };
}
