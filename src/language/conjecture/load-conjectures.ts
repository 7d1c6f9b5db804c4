// Finding and loading every conjecture file under the paths a user names.

import { readdirSync, statSync } from 'node:fs';
import { readInputFile } from '../../base/read-input.js';
import { join, relative } from 'node:path';
import { InputError } from '../../base/errors.js';
import type { ConjectureSpec } from './conjecture.js';
import { loadConjectureFile } from './load-file.js';

/** Every .yaml/.yml file under the paths, in a stable order. A missing path is an input error. */
export function conjectureFiles(paths: string[]): string[] {
  const out: string[] = [];
  const walk = (p: string, top: boolean) => {
    let st;
    try {
      st = statSync(p);
    } catch {
      throw new InputError(`no such file or folder: ${p}`);
    }
    if (st.isDirectory()) {
      for (const e of readdirSync(p).sort()) {
        if (e.startsWith('.') || e === 'node_modules' || e === 'counterexamples') continue;
        walk(join(p, e), false);
      }
    } else if (top || /\.ya?ml$/.test(p)) {
      if (/(^|\/)hunch\.ya?ml$/.test(p) && !top) return; // the project config is not a conjecture file
      out.push(p);
    }
  };
  for (const p of paths) walk(p, true);
  return out;
}

export function displayPath(p: string): string {
  const r = relative(process.cwd(), p);
  return r.startsWith('..') ? p : r || p;
}

/** Load every conjecture under the paths; ids must be unique. */
export function loadConjectures(paths: string[]): ConjectureSpec[] {
  const all: ConjectureSpec[] = [];
  const byId = new Map<string, ConjectureSpec>();
  for (const f of conjectureFiles(paths)) {
    let text: string;
    text = readInputFile(f, 'the conjecture file');
    for (const c of loadConjectureFile(displayPath(f), text).conjectures) {
      const prev = byId.get(c.id);
      if (prev) throw new InputError(`the id ${c.id} is used twice (first at ${prev.file}:${prev.pos.line})`, c.pos, c.id);
      byId.set(c.id, c);
      all.push(c);
    }
  }
  return all;
}
